package utdigit.core.common;

import java.util.Objects;

/**
 * One entry of the reference catalogue: a published text at a clause or page, a library's
 * documented function, a derivation written out in the methods document
 * ({@code src/docs/methods.md}), or a practice of the trade with no published source.
 *
 * @param id stable kebab-case id that answers cite
 * @param kind what sort of source it is
 * @param document the document (title, author or publisher)
 * @param edition the edition, year or version; null where none applies
 * @param locator the clause, table, page or section
 * @param checked how the citation was checked
 * @param checkNote what was read, where, and what was not
 */
public record Source(String id, SourceKind kind, String document, String edition, String locator,
                     SourceCheck checked, String checkNote) {
    public Source {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(document, "document");
        Objects.requireNonNull(locator, "locator");
        Objects.requireNonNull(checked, "checked");
        Objects.requireNonNull(checkNote, "checkNote");
    }
}
