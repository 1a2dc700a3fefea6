package utdigit.web.references;

import io.swagger.v3.oas.annotations.media.Schema;
import utdigit.core.common.Source;
import utdigit.core.common.SourceCheck;
import utdigit.core.common.SourceKind;

/** A catalogue entry as the API shows it. */
@Schema(name = "Source", description = "One source that answers cite by id: the document, its edition, the clause or "
        + "page, its kind and how the citation was checked")
record SourceView(
        @Schema(description = "Id that answers cite in references[].id", example = "jcgm-100-2008-4.3.7") String id,
        @Schema(description = "STANDARD, BOOK, PAPER, LIBRARY, DERIVATION (written out in the service's methods "
                + "document) or COMMON_PRACTICE (no published source)") SourceKind kind,
        @Schema(description = "The document, or the methods document for a derivation or practice") String document,
        @Schema(description = "Edition, year or version; absent where none applies") String edition,
        @Schema(description = "Clause, table, page or section") String locator,
        @Schema(description = "READ (in the source itself), READ_SECOND_HAND (in a text that reproduces it), "
                + "DERIVED (derivation in the methods document) or NOT_PUBLISHED (common practice)")
        SourceCheck checked,
        @Schema(description = "What was read, where, and what was not") String checkNote) {

    static SourceView of(Source s) {
        return new SourceView(s.id(), s.kind(), s.document(), s.edition(), s.locator(), s.checked(), s.checkNote());
    }
}
