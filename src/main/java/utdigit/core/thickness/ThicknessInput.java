package utdigit.core.thickness;

/**
 * Inputs of a thickness resolution, already normalised to the contract's units (lengths in mm,
 * velocities in m/s, frequencies in MHz). Optional inputs and options are null when not given;
 * {@link ThicknessCalculator#compute} applies the defaults.
 *
 * @param samplingFrequencyMhz the converter's raw rate fs, MHz
 * @param decimationFactor integer &gt;= 1 of the stored rate fs/m; null: 1
 * @param velocityMPerS velocity v of the wave mode used, m/s
 * @param velocityUncertaintyMPerS standard uncertainty of v, m/s (or give the percent, not both);
 *     neither: 0, with a warning
 * @param velocityUncertaintyPercent standard uncertainty of v, percent of v
 * @param nominalThicknessMm the nominal wall thickness d, mm
 * @param measurement null: {@link Measurement#FIRST_ECHO}
 * @param echoSpacing round trips m between the timed echoes, &gt;= 1; null: 1. Other values than 1
 *     apply only to ECHO_TO_ECHO
 * @param requiredResolutionMm the thickness resolution required, mm (optional)
 * @param coverageFactor k of the expanded uncertainty; null: 2
 * @param frequencyMhz nominal probe frequency, MHz (optional, with bandwidthPercent: the pulse
 *     length check)
 * @param bandwidthPercent -6 dB fractional bandwidth, percent (with frequencyMhz)
 */
public record ThicknessInput(
        double samplingFrequencyMhz,
        Integer decimationFactor,
        double velocityMPerS,
        Double velocityUncertaintyMPerS,
        Double velocityUncertaintyPercent,
        double nominalThicknessMm,
        Measurement measurement,
        Integer echoSpacing,
        Double requiredResolutionMm,
        Double coverageFactor,
        Double frequencyMhz,
        Double bandwidthPercent) {

    /** First echo at the raw rate {@code samplingFrequencyMhz}, all options default. */
    public static ThicknessInput of(double samplingFrequencyMhz, double velocityMPerS, double nominalThicknessMm) {
        return builder(samplingFrequencyMhz, velocityMPerS, nominalThicknessMm).build();
    }

    /** A builder with the three required inputs; every other input starts as "not given". */
    public static Builder builder(double samplingFrequencyMhz, double velocityMPerS, double nominalThicknessMm) {
        return new Builder(samplingFrequencyMhz, velocityMPerS, nominalThicknessMm);
    }

    /** Collects the optional inputs; null leaves an input "not given". Not thread-safe. */
    public static final class Builder {
        private final double samplingFrequencyMhz;
        private final double velocityMPerS;
        private final double nominalThicknessMm;
        private Integer decimationFactor;
        private Double velocityUncertaintyMPerS;
        private Double velocityUncertaintyPercent;
        private Measurement measurement;
        private Integer echoSpacing;
        private Double requiredResolutionMm;
        private Double coverageFactor;
        private Double frequencyMhz;
        private Double bandwidthPercent;

        private Builder(double samplingFrequencyMhz, double velocityMPerS, double nominalThicknessMm) {
            this.samplingFrequencyMhz = samplingFrequencyMhz;
            this.velocityMPerS = velocityMPerS;
            this.nominalThicknessMm = nominalThicknessMm;
        }

        public Builder decimationFactor(Integer value) {
            this.decimationFactor = value;
            return this;
        }

        public Builder velocityUncertaintyMPerS(Double value) {
            this.velocityUncertaintyMPerS = value;
            return this;
        }

        public Builder velocityUncertaintyPercent(Double value) {
            this.velocityUncertaintyPercent = value;
            return this;
        }

        public Builder measurement(Measurement value) {
            this.measurement = value;
            return this;
        }

        public Builder echoSpacing(Integer value) {
            this.echoSpacing = value;
            return this;
        }

        public Builder requiredResolutionMm(Double value) {
            this.requiredResolutionMm = value;
            return this;
        }

        public Builder coverageFactor(Double value) {
            this.coverageFactor = value;
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

        public ThicknessInput build() {
            return new ThicknessInput(samplingFrequencyMhz, decimationFactor, velocityMPerS,
                    velocityUncertaintyMPerS, velocityUncertaintyPercent, nominalThicknessMm, measurement,
                    echoSpacing, requiredResolutionMm, coverageFactor, frequencyMhz, bandwidthPercent);
        }
    }
}
