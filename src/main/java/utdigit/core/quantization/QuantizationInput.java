package utdigit.core.quantization;

/**
 * Inputs of a quantization assessment, in the contract's units. Options and optional inputs are
 * nullable: null means "not given" and the calculator applies the contract's default (RF,
 * ROUNDING, FSR_OVER_2N, 0 dB) or leaves the dependent results out. Heights are displayed heights,
 * after the digital gain.
 *
 * @param bitDepth converter resolution N, 1 to 32 bits
 * @param digitizedSignal RF (-100..+100 %FSH) or RECTIFIED (0..100 %FSH); null: RF
 * @param quantizer ROUNDING or TRUNCATION; null: ROUNDING
 * @param codeMapping FSR_OVER_2N or MAX_CODE; null: FSR_OVER_2N
 * @param digitalGainDb gain applied after digitizing (soft gain), dB, -40 to +60; null: 0
 * @param signalHeightPercentFsh displayed echo height h, above 0 and at most 100 %FSH; null: not given
 * @param amplitudeToleranceDb the procedure's amplitude tolerance X, above 0 and at most 40 dB;
 *     null: not given
 * @param referenceHeightPercentFsh displayed height of the reference reflector, above 0 and at most
 *     100 %FSH; given together with {@code evaluationLevelDb} or not at all
 * @param evaluationLevelDb evaluation level L relative to the reference, dB (-14 is 14 dB below),
 *     -80 to +20; given together with {@code referenceHeightPercentFsh} or not at all
 * @param averaging number M of acquisitions averaged, 1 to 65536; null: not given
 */
public record QuantizationInput(
        int bitDepth,
        DigitizedSignal digitizedSignal,
        Quantizer quantizer,
        CodeMapping codeMapping,
        Double digitalGainDb,
        Double signalHeightPercentFsh,
        Double amplitudeToleranceDb,
        Double referenceHeightPercentFsh,
        Double evaluationLevelDb,
        Integer averaging) {

    /** Only the bit depth; every option at its default, no optional input. */
    public static QuantizationInput of(int bitDepth) {
        return builder(bitDepth).build();
    }

    /** A builder with the required input; every other input starts as "not given". */
    public static Builder builder(int bitDepth) {
        return new Builder(bitDepth);
    }

    /** A builder that starts from this input's values. */
    public Builder toBuilder() {
        return new Builder(bitDepth)
                .digitizedSignal(digitizedSignal)
                .quantizer(quantizer)
                .codeMapping(codeMapping)
                .digitalGainDb(digitalGainDb)
                .signalHeightPercentFsh(signalHeightPercentFsh)
                .amplitudeToleranceDb(amplitudeToleranceDb)
                .referenceHeightPercentFsh(referenceHeightPercentFsh)
                .evaluationLevelDb(evaluationLevelDb)
                .averaging(averaging);
    }

    /** Collects the optional inputs; null leaves an input "not given". Not thread-safe. */
    public static final class Builder {
        private final int bitDepth;
        private DigitizedSignal digitizedSignal;
        private Quantizer quantizer;
        private CodeMapping codeMapping;
        private Double digitalGainDb;
        private Double signalHeightPercentFsh;
        private Double amplitudeToleranceDb;
        private Double referenceHeightPercentFsh;
        private Double evaluationLevelDb;
        private Integer averaging;

        private Builder(int bitDepth) {
            this.bitDepth = bitDepth;
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

        public Builder digitalGainDb(Double value) {
            this.digitalGainDb = value;
            return this;
        }

        public Builder signalHeightPercentFsh(Double value) {
            this.signalHeightPercentFsh = value;
            return this;
        }

        public Builder amplitudeToleranceDb(Double value) {
            this.amplitudeToleranceDb = value;
            return this;
        }

        public Builder referenceHeightPercentFsh(Double value) {
            this.referenceHeightPercentFsh = value;
            return this;
        }

        public Builder evaluationLevelDb(Double value) {
            this.evaluationLevelDb = value;
            return this;
        }

        public Builder averaging(Integer value) {
            this.averaging = value;
            return this;
        }

        public QuantizationInput build() {
            return new QuantizationInput(bitDepth, digitizedSignal, quantizer, codeMapping, digitalGainDb,
                    signalHeightPercentFsh, amplitudeToleranceDb, referenceHeightPercentFsh, evaluationLevelDb,
                    averaging);
        }
    }
}
