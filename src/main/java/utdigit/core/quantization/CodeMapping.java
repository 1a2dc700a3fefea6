package utdigit.core.quantization;

import utdigit.core.common.CalculationException;

/**
 * How the converter's codes map to %FSH, that is the size of one LSB on the screen. The two
 * mappings differ by the factor 2^(N-1) / (2^(N-1) - 1) for RF (128/127, about 0.8 %, at 8 bits)
 * and 2^N / (2^N - 1) for RECTIFIED (256/255, about 0.4 %, at 8 bits).
 */
public enum CodeMapping {
    /**
     * The full-scale range divided into 2^N equal steps: LSB = FSR / 2^N in %FSH, with FSR =
     * 200 %FSH for RF and 100 %FSH for RECTIFIED (8-bit RF: 0.78125 %FSH). Exists for every bit
     * depth 1 to 32. Reference: src/docs/methods.md 4.1 (the code width FSR/2^N, derived there).
     */
    FSR_OVER_2N {
        @Override
        public double lsbPercentFsh(DigitizedSignal signal, int bitDepth) {
            return signal.fullScaleRangePercentFsh() / (double) (1L << bitDepth);
        }
    },
    /**
     * Full screen at the largest code: LSB = 100 / (2^(N-1) - 1) %FSH for RF and 100 / (2^N - 1)
     * %FSH for RECTIFIED (8-bit RF: 100/127 = 0.7874 %FSH). One bit of RF has no positive code
     * (2^0 - 1 = 0): impossible. Reference: common practice, no published source.
     */
    MAX_CODE {
        @Override
        public double lsbPercentFsh(DigitizedSignal signal, int bitDepth) {
            long largestCode = signal.largestCode(bitDepth);
            if (largestCode < 1) {
                throw CalculationException.impossible(
                        "code_mapping MAX_CODE with bit_depth " + bitDepth + " of digitized_signal " + signal
                                + " leaves no positive code (2^(N-1) - 1 = 0) to put at full screen;"
                                + " use FSR_OVER_2N, RECTIFIED or more bits",
                        "code_mapping", "bit_depth", "digitized_signal");
            }
            return 100.0 / (double) largestCode;
        }
    };

    /**
     * One LSB at the converter in %FSH (before any digital gain) for an N-bit converter,
     * {@code bitDepth} 1 to 32.
     *
     * @throws CalculationException (impossible) for MAX_CODE with one bit of RF
     */
    public abstract double lsbPercentFsh(DigitizedSignal signal, int bitDepth);
}
