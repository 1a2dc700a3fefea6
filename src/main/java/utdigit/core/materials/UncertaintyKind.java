package utdigit.core.materials;

/** How a tabulated velocity's +/- value is to be read. */
public enum UncertaintyKind {
    /** The +/- value is a half-width of the range the source gives, not a standard uncertainty. */
    HALF_WIDTH,
    /** The +/- value is a standard uncertainty (one standard deviation). */
    STANDARD,
    /** The source states no uncertainty: the value is nominal; measure the part. */
    NOT_STATED
}
