package utdigit.core.timing;

/**
 * Inputs of a time-of-flight resolution, already normalised to the contract's units (lengths in
 * mm, velocity in m/s, times in us, frequencies in MHz). Optional inputs and options are null when
 * not given; {@link TimeOfFlightCalculator#compute} applies the defaults.
 *
 * @param samplingFrequencyMhz the converter's raw rate fs, MHz
 * @param decimationFactor integer m &gt;= 1 of the stored rate fs/m; null: 1
 * @param velocityMPerS velocity of the wave mode used, m/s
 * @param technique null: {@link Technique#PULSE_ECHO}
 * @param refractedAngleDeg pulse-echo only: refracted beam angle, 0 to below 90 deg
 * @param probeCentreSeparationMm TOFD only, required there: the full separation 2S, mm
 * @param depthMm TOFD only: tip depth below the scanning surface, mm
 * @param thicknessMm TOFD only: wall thickness, mm (for the back-wall dead zone)
 * @param pulseDurationUs TOFD only: the signal duration for the dead zones, us; or give
 *     frequencyMhz with bandwidthPercent instead (one source, not both)
 * @param frequencyMhz TOFD only: nominal probe frequency, MHz (with bandwidthPercent)
 * @param bandwidthPercent TOFD only: -6 dB fractional bandwidth, percent (with frequencyMhz)
 * @param timeReference null: {@link TimeReference#TRIGGER}; LATERAL_WAVE for TOFD only
 */
public record TimeOfFlightInput(
        double samplingFrequencyMhz,
        Integer decimationFactor,
        double velocityMPerS,
        Technique technique,
        Double refractedAngleDeg,
        Double probeCentreSeparationMm,
        Double depthMm,
        Double thicknessMm,
        Double pulseDurationUs,
        Double frequencyMhz,
        Double bandwidthPercent,
        TimeReference timeReference) {

    /** The required inputs alone: pulse-echo (straight beam) at the raw rate, all options default. */
    public static TimeOfFlightInput of(double samplingFrequencyMhz, double velocityMPerS) {
        return builder(samplingFrequencyMhz, velocityMPerS).build();
    }

    /** A builder with the two required inputs; every other input starts as "not given". */
    public static Builder builder(double samplingFrequencyMhz, double velocityMPerS) {
        return new Builder(samplingFrequencyMhz, velocityMPerS);
    }

    /** A builder that starts from this input's values. */
    public Builder toBuilder() {
        return new Builder(samplingFrequencyMhz, velocityMPerS)
                .decimationFactor(decimationFactor)
                .technique(technique)
                .refractedAngleDeg(refractedAngleDeg)
                .probeCentreSeparationMm(probeCentreSeparationMm)
                .depthMm(depthMm)
                .thicknessMm(thicknessMm)
                .pulseDurationUs(pulseDurationUs)
                .frequencyMhz(frequencyMhz)
                .bandwidthPercent(bandwidthPercent)
                .timeReference(timeReference);
    }

    /** Collects the optional inputs; null leaves an input "not given". Not thread-safe. */
    public static final class Builder {
        private final double samplingFrequencyMhz;
        private final double velocityMPerS;
        private Integer decimationFactor;
        private Technique technique;
        private Double refractedAngleDeg;
        private Double probeCentreSeparationMm;
        private Double depthMm;
        private Double thicknessMm;
        private Double pulseDurationUs;
        private Double frequencyMhz;
        private Double bandwidthPercent;
        private TimeReference timeReference;

        private Builder(double samplingFrequencyMhz, double velocityMPerS) {
            this.samplingFrequencyMhz = samplingFrequencyMhz;
            this.velocityMPerS = velocityMPerS;
        }

        public Builder decimationFactor(Integer value) {
            this.decimationFactor = value;
            return this;
        }

        public Builder technique(Technique value) {
            this.technique = value;
            return this;
        }

        public Builder refractedAngleDeg(Double value) {
            this.refractedAngleDeg = value;
            return this;
        }

        public Builder probeCentreSeparationMm(Double value) {
            this.probeCentreSeparationMm = value;
            return this;
        }

        public Builder depthMm(Double value) {
            this.depthMm = value;
            return this;
        }

        public Builder thicknessMm(Double value) {
            this.thicknessMm = value;
            return this;
        }

        public Builder pulseDurationUs(Double value) {
            this.pulseDurationUs = value;
            return this;
        }

        public Builder frequencyMhz(Double value) {
            this.frequencyMhz = value;
            return this;
        }

        public Builder bandwidthPercent(Double value) {
            this.bandwidthPercent = value;
            return this;
        }

        public Builder timeReference(TimeReference value) {
            this.timeReference = value;
            return this;
        }

        public TimeOfFlightInput build() {
            return new TimeOfFlightInput(samplingFrequencyMhz, decimationFactor, velocityMPerS, technique,
                    refractedAngleDeg, probeCentreSeparationMm, depthMm, thicknessMm, pulseDurationUs,
                    frequencyMhz, bandwidthPercent, timeReference);
        }
    }
}
