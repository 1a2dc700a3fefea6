package utdigit.core.dac;

/** How a DAC curve's span is corrected before the evaluation. */
public enum TcgMode {
    /** No correction: the lowest reference point stands the span below the highest. */
    NONE,
    /** Time-corrected gain before the converter: the span costs no resolution. */
    ANALOG,
    /** Time-corrected gain applied to digitized data: the displayed LSB grows with the gain. */
    DIGITAL
}
