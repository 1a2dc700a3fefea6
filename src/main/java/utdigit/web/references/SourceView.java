package utdigit.web.references;

import io.swagger.v3.oas.annotations.media.Schema;
import utdigit.core.common.Source;
import utdigit.core.common.SourceCheck;
import utdigit.core.common.SourceKind;

/** A catalogue entry as the API shows it. */
@Schema(name = "Source", description = "One source that answers cite by id: the document, its edition, the clause or "
        + "page, its kind and how the citation was checked")
record SourceView(
        String id,
        SourceKind kind,
        String document,
        String edition,
        String locator,
        SourceCheck checked,
        String checkNote) {

    static SourceView of(Source s) {
        return new SourceView(s.id(), s.kind(), s.document(), s.edition(), s.locator(), s.checked(), s.checkNote());
    }
}
