package utdigit.core.timing;

/**
 * Inputs of a TOFD set-up check, in the contract's units (lengths in mm, velocity in m/s, times in
 * us, frequency in MHz). Times are in the part, from emission to reception (wedge delays excluded).
 * Optional inputs are null when not given.
 *
 * @param velocityMPerS velocity of the wave mode used (longitudinal for TOFD), m/s
 * @param probeCentreSeparationMm the full probe centre separation 2S, mm
 * @param thicknessMm wall thickness T, mm
 * @param gateStartUs gate opening time, us (with gateEndUs)
 * @param gateEndUs gate closing time, us (with gateStartUs)
 * @param pulseDurationUs signal duration tp, the margin each side of the gate, us; null: no margin
 * @param depthMm tip depth where the depth uncertainty is wanted, mm; or measuredTimeUs (not both)
 * @param measuredTimeUs measured tip arrival time, us: gives the depth and its uncertainty there
 * @param samplingFrequencyMhz converter rate, MHz: the timing uncertainty of the sampling
 * @param decimationFactor stored rate fs / m; null: 1
 * @param timeReference TRIGGER (one quantized instant) or LATERAL_WAVE (a difference of two);
 *     null: TRIGGER
 * @param probeCentreSeparationUncertaintyMm standard uncertainty of the full separation 2S, mm
 * @param coverageFactor k of the expanded uncertainty; null: 2
 */
public record TofdSetupInput(
        double velocityMPerS,
        double probeCentreSeparationMm,
        double thicknessMm,
        Double gateStartUs,
        Double gateEndUs,
        Double pulseDurationUs,
        Double depthMm,
        Double measuredTimeUs,
        Double samplingFrequencyMhz,
        Integer decimationFactor,
        TimeReference timeReference,
        Double probeCentreSeparationUncertaintyMm,
        Double coverageFactor) {

    /** The geometry alone. */
    public static TofdSetupInput of(double velocityMPerS, double probeCentreSeparationMm, double thicknessMm) {
        return builder(velocityMPerS, probeCentreSeparationMm, thicknessMm).build();
    }

    /** A builder with the three required inputs; every other input starts as "not given". */
    public static Builder builder(double velocityMPerS, double probeCentreSeparationMm, double thicknessMm) {
        return new Builder(velocityMPerS, probeCentreSeparationMm, thicknessMm);
    }

    /** A builder that starts from this input's values. */
    public Builder toBuilder() {
        return new Builder(velocityMPerS, probeCentreSeparationMm, thicknessMm)
                .gateStartUs(gateStartUs)
                .gateEndUs(gateEndUs)
                .pulseDurationUs(pulseDurationUs)
                .depthMm(depthMm)
                .measuredTimeUs(measuredTimeUs)
                .samplingFrequencyMhz(samplingFrequencyMhz)
                .decimationFactor(decimationFactor)
                .timeReference(timeReference)
                .probeCentreSeparationUncertaintyMm(probeCentreSeparationUncertaintyMm)
                .coverageFactor(coverageFactor);
    }

    /** Collects the optional inputs; null leaves an input "not given". Not thread-safe. */
    public static final class Builder {
        private final double velocityMPerS;
        private final double probeCentreSeparationMm;
        private final double thicknessMm;
        private Double gateStartUs;
        private Double gateEndUs;
        private Double pulseDurationUs;
        private Double depthMm;
        private Double measuredTimeUs;
        private Double samplingFrequencyMhz;
        private Integer decimationFactor;
        private TimeReference timeReference;
        private Double probeCentreSeparationUncertaintyMm;
        private Double coverageFactor;

        private Builder(double velocityMPerS, double probeCentreSeparationMm, double thicknessMm) {
            this.velocityMPerS = velocityMPerS;
            this.probeCentreSeparationMm = probeCentreSeparationMm;
            this.thicknessMm = thicknessMm;
        }

        public Builder gateStartUs(Double value) {
            this.gateStartUs = value;
            return this;
        }

        public Builder gateEndUs(Double value) {
            this.gateEndUs = value;
            return this;
        }

        public Builder pulseDurationUs(Double value) {
            this.pulseDurationUs = value;
            return this;
        }

        public Builder depthMm(Double value) {
            this.depthMm = value;
            return this;
        }

        public Builder measuredTimeUs(Double value) {
            this.measuredTimeUs = value;
            return this;
        }

        public Builder samplingFrequencyMhz(Double value) {
            this.samplingFrequencyMhz = value;
            return this;
        }

        public Builder decimationFactor(Integer value) {
            this.decimationFactor = value;
            return this;
        }

        public Builder timeReference(TimeReference value) {
            this.timeReference = value;
            return this;
        }

        public Builder probeCentreSeparationUncertaintyMm(Double value) {
            this.probeCentreSeparationUncertaintyMm = value;
            return this;
        }

        public Builder coverageFactor(Double value) {
            this.coverageFactor = value;
            return this;
        }

        public TofdSetupInput build() {
            return new TofdSetupInput(velocityMPerS, probeCentreSeparationMm, thicknessMm, gateStartUs,
                    gateEndUs, pulseDurationUs, depthMm, measuredTimeUs, samplingFrequencyMhz, decimationFactor,
                    timeReference, probeCentreSeparationUncertaintyMm, coverageFactor);
        }
    }
}
