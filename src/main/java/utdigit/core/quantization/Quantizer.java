package utdigit.core.quantization;

/**
 * How the converter turns an amplitude into a code, which decides how far a peak's reading can
 * lie from the true height h. Bounds are in LSB (the displayed LSB when a digital gain applies)
 * and hold inside the code range (clipping at full scale is not modelled).
 */
public enum Quantizer {
    /**
     * Rounding to the nearest level: the reading lies within +/- LSB/2 of h, for RF and RECTIFIED.
     * Worst errors 20 log10((h + LSB/2)/h) over and 20 log10((h - LSB/2)/h) under, dB; the under
     * error exists for h > LSB/2. Reference: src/docs/methods.md 4.3 (the +/- q/2 error of an ideal
     * quantizer, derived there).
     */
    ROUNDING(0.5, 0.5, 0.5),
    /**
     * Truncation toward minus infinity (floor): a positive peak reads up to 1 LSB low; a negative
     * half-wave of RF, read as |s|, reads up to 1 LSB high; RECTIFIED data (s >= 0) never reads
     * high. Worst errors 20 log10((h + LSB)/h) over (0 for RECTIFIED) and 20 log10((h - LSB)/h)
     * under, dB; the under error exists for h > LSB. Reference: common practice, no published
     * source (derived from floor).
     */
    TRUNCATION(1.0, 1.0, 0.0);

    private final double lowBoundLsbFraction;
    private final double highBoundRfLsbFraction;
    private final double highBoundRectifiedLsbFraction;

    Quantizer(double lowBoundLsbFraction, double highBoundRfLsbFraction, double highBoundRectifiedLsbFraction) {
        this.lowBoundLsbFraction = lowBoundLsbFraction;
        this.highBoundRfLsbFraction = highBoundRfLsbFraction;
        this.highBoundRectifiedLsbFraction = highBoundRectifiedLsbFraction;
    }

    /** How far below h a reading can lie, as a fraction of one LSB: 1/2 (ROUNDING), 1 (TRUNCATION). */
    public double lowBoundLsbFraction() {
        return lowBoundLsbFraction;
    }

    /**
     * How far above h a reading can lie, as a fraction of one LSB: 1/2 (ROUNDING), 1 (TRUNCATION of
     * RF), 0 (TRUNCATION of RECTIFIED).
     */
    public double highBoundLsbFraction(DigitizedSignal signal) {
        return signal == DigitizedSignal.RF ? highBoundRfLsbFraction : highBoundRectifiedLsbFraction;
    }
}
