package utdigit.core.common;

/** How a catalogue entry was checked. */
public enum SourceCheck {
    /** The cited statement was read in the source itself (its scope, a free preview, its documentation). */
    READ,
    /** The cited statement was read in another text that quotes or reproduces the source, not in the source. */
    READ_SECOND_HAND,
    /** The statement is derived step by step in the methods document; no outside text is relied on. */
    DERIVED,
    /** A practice of the trade: no published source is claimed. */
    NOT_PUBLISHED
}
