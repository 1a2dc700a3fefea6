package utdigit.core.dac;

import utdigit.core.quantization.CodeMapping;
import utdigit.core.quantization.DigitizedSignal;
import utdigit.core.quantization.Quantizer;

/**
 * Inputs of a DAC quantization assessment. Options are null when not given (RF, ROUNDING,
 * FSR_OVER_2N, as for a quantization assessment).
 *
 * @param bitDepth converter resolution N, 1 to 32 bits
 * @param dacSpanDb S: the DAC curve's span from its highest to its lowest reference point, dB
 * @param referenceHeightPercentFsh height of the highest reference point on the screen, %FSH
 * @param amplitudeToleranceDb the procedure's amplitude tolerance X, dB; null: not given
 */
public record DacQuantizationInput(
        int bitDepth,
        double dacSpanDb,
        double referenceHeightPercentFsh,
        Double amplitudeToleranceDb,
        DigitizedSignal digitizedSignal,
        Quantizer quantizer,
        CodeMapping codeMapping) {

    /** The required inputs alone, every option at its default. */
    public static DacQuantizationInput of(int bitDepth, double dacSpanDb, double referenceHeightPercentFsh) {
        return builder(bitDepth, dacSpanDb, referenceHeightPercentFsh).build();
    }

    /** A builder with the three required inputs; every other input starts as "not given". */
    public static Builder builder(int bitDepth, double dacSpanDb, double referenceHeightPercentFsh) {
        return new Builder(bitDepth, dacSpanDb, referenceHeightPercentFsh);
    }

    /** Collects the optional inputs; null leaves an input "not given". Not thread-safe. */
    public static final class Builder {
        private final int bitDepth;
        private final double dacSpanDb;
        private final double referenceHeightPercentFsh;
        private Double amplitudeToleranceDb;
        private DigitizedSignal digitizedSignal;
        private Quantizer quantizer;
        private CodeMapping codeMapping;

        private Builder(int bitDepth, double dacSpanDb, double referenceHeightPercentFsh) {
            this.bitDepth = bitDepth;
            this.dacSpanDb = dacSpanDb;
            this.referenceHeightPercentFsh = referenceHeightPercentFsh;
        }

        public Builder amplitudeToleranceDb(Double value) {
            this.amplitudeToleranceDb = value;
            return this;
        }

        public Builder digitizedSignal(DigitizedSignal value) {
            this.digitizedSignal = value;
            return this;
        }

        public Builder quantizer(Quantizer value) {
            this.quantizer = value;
            return this;
        }

        public Builder codeMapping(CodeMapping value) {
            this.codeMapping = value;
            return this;
        }

        public DacQuantizationInput build() {
            return new DacQuantizationInput(bitDepth, dacSpanDb, referenceHeightPercentFsh,
                    amplitudeToleranceDb, digitizedSignal, quantizer, codeMapping);
        }
    }
}
