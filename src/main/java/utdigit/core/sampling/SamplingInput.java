package utdigit.core.sampling;

import utdigit.core.common.CalculationException;
import utdigit.core.common.Checks;
import utdigit.core.pulse.CentreFrequencyConvention;

/**
 * The inputs of the sampling assessment (POST /api/sampling-assessments), normalised by the caller:
 * frequencies in MHz, lengths in mm, velocities in m/s. Every optional input and option is a
 * nullable boxed value, null meaning "not given" (the calculator applies the contract's defaults);
 * build with {@link #builder}. Each value is checked on its own here;
 * combinations are checked by {@link SamplingCalculator}.
 *
 * @param samplingFrequencyMhz the converter's (raw) sampling frequency fs, MHz, > 0
 * @param frequencyMhz the nominal probe frequency f, MHz, > 0
 * @param decimationFactor the decimation factor m (integer >= 1), or null (1)
 * @param decimationMode how the m samples are reduced to one, or null (DROP)
 * @param bandwidthPercent the -6 dB fractional bandwidth, percent, in (0, 200), or null
 * @param centreFrequencyConvention the centre-frequency convention (only with a bandwidth), or null (ARITHMETIC)
 * @param signal what is sampled, RF or ENVELOPE, or null (RF)
 * @param peakReading how an RF peak is read (only with RF), or null (ABSOLUTE)
 * @param amplitudeToleranceDb the amplitude tolerance X, dB, > 0, or null
 * @param tfmGridSpacingMm the TFM grid's depth step dz, mm, > 0, or null
 * @param velocityMPerS the part's velocity, m/s (only with TFM figures), or null
 * @param tfmImage RF or ENVELOPE image (only with a grid spacing), or null (RF)
 * @param tfmLateralGridSpacingMm the TFM grid's lateral step dx, mm, > 0, or null (with aperture and depth)
 * @param tfmApertureMm the active aperture A, mm, > 0, or null (with the lateral step and depth)
 * @param tfmDepthMm the depth z of the lateral figure, mm, > 0, or null (with the lateral step and aperture)
 */
public record SamplingInput(
        double samplingFrequencyMhz,
        double frequencyMhz,
        Integer decimationFactor,
        DecimationMode decimationMode,
        Double bandwidthPercent,
        CentreFrequencyConvention centreFrequencyConvention,
        SampledSignal signal,
        PeakReading peakReading,
        Double amplitudeToleranceDb,
        Double tfmGridSpacingMm,
        Double velocityMPerS,
        TfmImage tfmImage,
        Double tfmLateralGridSpacingMm,
        Double tfmApertureMm,
        Double tfmDepthMm) {

    /** The bandwidth is below this, exclusive (the contract's range 0-200 %). */
    public static final double MAX_BANDWIDTH_PERCENT_EXCLUSIVE = 200.0;

    public SamplingInput {
        Checks.positive("sampling_frequency_mhz", samplingFrequencyMhz);
        Checks.positive("frequency_mhz", frequencyMhz);
        if (decimationFactor != null) {
            Checks.atLeastOne("decimation_factor", decimationFactor);
        }
        if (bandwidthPercent != null) {
            double percent = Checks.positive("bandwidth_percent", bandwidthPercent);
            if (!(percent < MAX_BANDWIDTH_PERCENT_EXCLUSIVE)) {
                throw CalculationException.invalid("bandwidth_percent", percent, "must be > 0 and < 200");
            }
        }
        positiveIfGiven("amplitude_tolerance_db", amplitudeToleranceDb);
        positiveIfGiven("tfm_grid_spacing_mm", tfmGridSpacingMm);
        positiveIfGiven("velocity_m_per_s", velocityMPerS);
        positiveIfGiven("tfm_lateral_grid_spacing_mm", tfmLateralGridSpacingMm);
        positiveIfGiven("tfm_aperture_mm", tfmApertureMm);
        positiveIfGiven("tfm_depth_mm", tfmDepthMm);
    }

    /** The required inputs alone, every option at its default. */
    public static SamplingInput of(double samplingFrequencyMhz, double frequencyMhz) {
        return builder(samplingFrequencyMhz, frequencyMhz).build();
    }

    /** A builder with the two required inputs; every other input starts as "not given". */
    public static Builder builder(double samplingFrequencyMhz, double frequencyMhz) {
        return new Builder(samplingFrequencyMhz, frequencyMhz);
    }

    /** A builder that starts from this input's values. */
    public Builder toBuilder() {
        return new Builder(samplingFrequencyMhz, frequencyMhz)
                .decimationFactor(decimationFactor)
                .decimationMode(decimationMode)
                .bandwidthPercent(bandwidthPercent)
                .centreFrequencyConvention(centreFrequencyConvention)
                .signal(signal)
                .peakReading(peakReading)
                .amplitudeToleranceDb(amplitudeToleranceDb)
                .tfmGridSpacingMm(tfmGridSpacingMm)
                .velocityMPerS(velocityMPerS)
                .tfmImage(tfmImage)
                .tfmLateralGridSpacingMm(tfmLateralGridSpacingMm)
                .tfmApertureMm(tfmApertureMm)
                .tfmDepthMm(tfmDepthMm);
    }

    /** Collects the optional inputs; null leaves an input "not given". Not thread-safe. */
    public static final class Builder {
        private final double samplingFrequencyMhz;
        private final double frequencyMhz;
        private Integer decimationFactor;
        private DecimationMode decimationMode;
        private Double bandwidthPercent;
        private CentreFrequencyConvention centreFrequencyConvention;
        private SampledSignal signal;
        private PeakReading peakReading;
        private Double amplitudeToleranceDb;
        private Double tfmGridSpacingMm;
        private Double velocityMPerS;
        private TfmImage tfmImage;
        private Double tfmLateralGridSpacingMm;
        private Double tfmApertureMm;
        private Double tfmDepthMm;

        private Builder(double samplingFrequencyMhz, double frequencyMhz) {
            this.samplingFrequencyMhz = samplingFrequencyMhz;
            this.frequencyMhz = frequencyMhz;
        }

        public Builder decimationFactor(Integer value) {
            this.decimationFactor = value;
            return this;
        }

        public Builder decimationMode(DecimationMode value) {
            this.decimationMode = value;
            return this;
        }

        public Builder bandwidthPercent(Double value) {
            this.bandwidthPercent = value;
            return this;
        }

        public Builder centreFrequencyConvention(CentreFrequencyConvention value) {
            this.centreFrequencyConvention = value;
            return this;
        }

        public Builder signal(SampledSignal value) {
            this.signal = value;
            return this;
        }

        public Builder peakReading(PeakReading value) {
            this.peakReading = value;
            return this;
        }

        public Builder amplitudeToleranceDb(Double value) {
            this.amplitudeToleranceDb = value;
            return this;
        }

        public Builder tfmGridSpacingMm(Double value) {
            this.tfmGridSpacingMm = value;
            return this;
        }

        public Builder velocityMPerS(Double value) {
            this.velocityMPerS = value;
            return this;
        }

        public Builder tfmImage(TfmImage value) {
            this.tfmImage = value;
            return this;
        }

        public Builder tfmLateralGridSpacingMm(Double value) {
            this.tfmLateralGridSpacingMm = value;
            return this;
        }

        public Builder tfmApertureMm(Double value) {
            this.tfmApertureMm = value;
            return this;
        }

        public Builder tfmDepthMm(Double value) {
            this.tfmDepthMm = value;
            return this;
        }

        public SamplingInput build() {
            return new SamplingInput(samplingFrequencyMhz, frequencyMhz, decimationFactor, decimationMode,
                    bandwidthPercent, centreFrequencyConvention, signal, peakReading, amplitudeToleranceDb,
                    tfmGridSpacingMm, velocityMPerS, tfmImage, tfmLateralGridSpacingMm, tfmApertureMm,
                    tfmDepthMm);
        }
    }

    private static void positiveIfGiven(String role, Double value) {
        if (value != null) {
            Checks.positive(role, value);
        }
    }
}
