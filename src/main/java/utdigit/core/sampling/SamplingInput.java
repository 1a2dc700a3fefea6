package utdigit.core.sampling;

import utdigit.core.common.CalculationException;
import utdigit.core.common.Checks;
import utdigit.core.pulse.CentreFrequencyConvention;

/**
 * The inputs of the sampling assessment (POST /api/sampling-assessments), normalised by the caller:
 * frequencies in MHz, lengths in mm, velocities in m/s. Every optional input and option is a
 * nullable boxed value, null meaning "not given" (the calculator applies the contract's defaults);
 * create with {@link #of} and the {@code with...} methods. Each value is checked on its own here;
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
        return new SamplingInput(samplingFrequencyMhz, frequencyMhz,
                null, null, null, null, null, null, null, null, null, null, null, null, null);
    }

    /** With decimation by {@code factor} in {@code mode}. */
    public SamplingInput withDecimation(Integer factor, DecimationMode mode) {
        return withDecimationFactor(factor).withDecimationMode(mode);
    }

    /** With the TFM lateral figure's three inputs: step dx, aperture A and depth z, mm. */
    public SamplingInput withTfmLateral(Double lateralGridSpacingMm, Double apertureMm, Double depthMm) {
        return withTfmLateralGridSpacingMm(lateralGridSpacingMm).withTfmApertureMm(apertureMm).withTfmDepthMm(depthMm);
    }

    /** With the decimation factor m (integer >= 1). */
    public SamplingInput withDecimationFactor(Integer value) {
        return new SamplingInput(samplingFrequencyMhz, frequencyMhz, value, decimationMode, bandwidthPercent, centreFrequencyConvention, signal, peakReading, amplitudeToleranceDb, tfmGridSpacingMm, velocityMPerS, tfmImage, tfmLateralGridSpacingMm, tfmApertureMm, tfmDepthMm);
    }

    /** With how the m samples are reduced to one. */
    public SamplingInput withDecimationMode(DecimationMode value) {
        return new SamplingInput(samplingFrequencyMhz, frequencyMhz, decimationFactor, value, bandwidthPercent, centreFrequencyConvention, signal, peakReading, amplitudeToleranceDb, tfmGridSpacingMm, velocityMPerS, tfmImage, tfmLateralGridSpacingMm, tfmApertureMm, tfmDepthMm);
    }

    /** With the -6 dB fractional bandwidth, percent, in (0, 200). */
    public SamplingInput withBandwidthPercent(Double value) {
        return new SamplingInput(samplingFrequencyMhz, frequencyMhz, decimationFactor, decimationMode, value, centreFrequencyConvention, signal, peakReading, amplitudeToleranceDb, tfmGridSpacingMm, velocityMPerS, tfmImage, tfmLateralGridSpacingMm, tfmApertureMm, tfmDepthMm);
    }

    /** With the centre-frequency convention (only with a bandwidth). */
    public SamplingInput withCentreFrequencyConvention(CentreFrequencyConvention value) {
        return new SamplingInput(samplingFrequencyMhz, frequencyMhz, decimationFactor, decimationMode, bandwidthPercent, value, signal, peakReading, amplitudeToleranceDb, tfmGridSpacingMm, velocityMPerS, tfmImage, tfmLateralGridSpacingMm, tfmApertureMm, tfmDepthMm);
    }

    /** With what is sampled, RF or ENVELOPE. */
    public SamplingInput withSignal(SampledSignal value) {
        return new SamplingInput(samplingFrequencyMhz, frequencyMhz, decimationFactor, decimationMode, bandwidthPercent, centreFrequencyConvention, value, peakReading, amplitudeToleranceDb, tfmGridSpacingMm, velocityMPerS, tfmImage, tfmLateralGridSpacingMm, tfmApertureMm, tfmDepthMm);
    }

    /** With how an RF peak is read (only with RF). */
    public SamplingInput withPeakReading(PeakReading value) {
        return new SamplingInput(samplingFrequencyMhz, frequencyMhz, decimationFactor, decimationMode, bandwidthPercent, centreFrequencyConvention, signal, value, amplitudeToleranceDb, tfmGridSpacingMm, velocityMPerS, tfmImage, tfmLateralGridSpacingMm, tfmApertureMm, tfmDepthMm);
    }

    /** With the amplitude tolerance X, dB, > 0. */
    public SamplingInput withAmplitudeToleranceDb(Double value) {
        return new SamplingInput(samplingFrequencyMhz, frequencyMhz, decimationFactor, decimationMode, bandwidthPercent, centreFrequencyConvention, signal, peakReading, value, tfmGridSpacingMm, velocityMPerS, tfmImage, tfmLateralGridSpacingMm, tfmApertureMm, tfmDepthMm);
    }

    /** With the TFM grid's depth step dz, mm, > 0. */
    public SamplingInput withTfmGridSpacingMm(Double value) {
        return new SamplingInput(samplingFrequencyMhz, frequencyMhz, decimationFactor, decimationMode, bandwidthPercent, centreFrequencyConvention, signal, peakReading, amplitudeToleranceDb, value, velocityMPerS, tfmImage, tfmLateralGridSpacingMm, tfmApertureMm, tfmDepthMm);
    }

    /** With the part's velocity, m/s (only with TFM figures). */
    public SamplingInput withVelocityMPerS(Double value) {
        return new SamplingInput(samplingFrequencyMhz, frequencyMhz, decimationFactor, decimationMode, bandwidthPercent, centreFrequencyConvention, signal, peakReading, amplitudeToleranceDb, tfmGridSpacingMm, value, tfmImage, tfmLateralGridSpacingMm, tfmApertureMm, tfmDepthMm);
    }

    /** With RF or ENVELOPE image (only with a grid spacing). */
    public SamplingInput withTfmImage(TfmImage value) {
        return new SamplingInput(samplingFrequencyMhz, frequencyMhz, decimationFactor, decimationMode, bandwidthPercent, centreFrequencyConvention, signal, peakReading, amplitudeToleranceDb, tfmGridSpacingMm, velocityMPerS, value, tfmLateralGridSpacingMm, tfmApertureMm, tfmDepthMm);
    }

    /** With the TFM grid's lateral step dx, mm, > 0. */
    public SamplingInput withTfmLateralGridSpacingMm(Double value) {
        return new SamplingInput(samplingFrequencyMhz, frequencyMhz, decimationFactor, decimationMode, bandwidthPercent, centreFrequencyConvention, signal, peakReading, amplitudeToleranceDb, tfmGridSpacingMm, velocityMPerS, tfmImage, value, tfmApertureMm, tfmDepthMm);
    }

    /** With the active aperture A, mm, > 0. */
    public SamplingInput withTfmApertureMm(Double value) {
        return new SamplingInput(samplingFrequencyMhz, frequencyMhz, decimationFactor, decimationMode, bandwidthPercent, centreFrequencyConvention, signal, peakReading, amplitudeToleranceDb, tfmGridSpacingMm, velocityMPerS, tfmImage, tfmLateralGridSpacingMm, value, tfmDepthMm);
    }

    /** With the depth z of the lateral figure, mm, > 0. */
    public SamplingInput withTfmDepthMm(Double value) {
        return new SamplingInput(samplingFrequencyMhz, frequencyMhz, decimationFactor, decimationMode, bandwidthPercent, centreFrequencyConvention, signal, peakReading, amplitudeToleranceDb, tfmGridSpacingMm, velocityMPerS, tfmImage, tfmLateralGridSpacingMm, tfmApertureMm, value);
    }

    private static void positiveIfGiven(String role, Double value) {
        if (value != null) {
            Checks.positive(role, value);
        }
    }
}
