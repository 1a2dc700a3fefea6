package utdigit.core.common;

/** What sort of source a catalogue entry is. */
public enum SourceKind {
    /** A published standard or metrology guide. */
    STANDARD,
    /** A handbook or textbook. */
    BOOK,
    /** A journal paper, application note or published data table. */
    PAPER,
    /** A general-purpose library's documented function. */
    LIBRARY,
    /** A derivation written out in the methods document (src/docs/methods.md). */
    DERIVATION,
    /** A practice of the trade with no published source. */
    COMMON_PRACTICE
}
