package utdigit.core.quantization;

/**
 * What the converter digitizes, which decides the full-scale range in %FSH and the largest code
 * that reaches full screen.
 */
public enum DigitizedSignal {
    /**
     * The RF waveform, spanning -100..+100 %FSH: full-scale range FSR = 200 %FSH; the largest
     * positive two's-complement code of N bits is 2^(N-1) - 1. Rectifying the record after
     * digitizing leaves 2^(N-1) levels for 0..100 %FSH, one bit fewer than a rectified input
     * (derived from the code range).
     */
    RF(200.0) {
        @Override
        public long largestCode(int bitDepth) {
            return (1L << (bitDepth - 1)) - 1L;
        }
    },
    /**
     * The rectified (or video) signal, spanning 0..100 %FSH: full-scale range FSR = 100 %FSH; the
     * largest code of N bits is 2^N - 1, and all 2^N levels fall on 0..100 %FSH.
     */
    RECTIFIED(100.0) {
        @Override
        public long largestCode(int bitDepth) {
            return (1L << bitDepth) - 1L;
        }
    };

    private final double fullScaleRangePercentFsh;

    DigitizedSignal(double fullScaleRangePercentFsh) {
        this.fullScaleRangePercentFsh = fullScaleRangePercentFsh;
    }

    /** Full-scale range FSR of the converter in %FSH: 200 for RF, 100 for RECTIFIED. */
    public double fullScaleRangePercentFsh() {
        return fullScaleRangePercentFsh;
    }

    /**
     * The largest code of an N-bit converter on the positive side: 2^(N-1) - 1 for RF, 2^N - 1 for
     * RECTIFIED; {@code bitDepth} 1 to 32 (0 for one bit of RF).
     */
    public abstract long largestCode(int bitDepth);
}
