package utdigit.core.sampling;

import utdigit.core.common.Checks;
import utdigit.core.common.Source;
import utdigit.core.common.Sources;

/**
 * The digitizer's clock after decimation: the one place where sampling interval and timing
 * quantization are computed, shared by every calculation (sampling, time of flight, thickness,
 * acquisition).
 *
 * @param rawSamplingFrequencyMhz the converter's rate fs, MHz
 * @param decimationFactor integer m >= 1 (1: no decimation)
 * @param decimationMode how the m samples are reduced to one
 */
public record SampleClock(double rawSamplingFrequencyMhz, int decimationFactor, DecimationMode decimationMode) {

    /** sqrt(12): the rectangular distribution's standard deviation is width / sqrt(12). */
    private static final double SQRT_12 = StrictMath.sqrt(12.0);
    /** sqrt(6): the triangular distribution of a difference of two quantized instants. */
    private static final double SQRT_6 = StrictMath.sqrt(6.0);

    public SampleClock {
        Checks.positive("sampling_frequency_mhz", rawSamplingFrequencyMhz);
        Checks.atLeastOne("decimation_factor", decimationFactor);
        java.util.Objects.requireNonNull(decimationMode, "decimation_mode");
    }

    public static SampleClock of(double rawSamplingFrequencyMhz, int decimationFactor, DecimationMode mode) {
        return new SampleClock(rawSamplingFrequencyMhz, decimationFactor, mode);
    }

    /** Effective (stored) sampling frequency fs/m, MHz. */
    public double effectiveSamplingFrequencyMhz() {
        return rawSamplingFrequencyMhz / decimationFactor;
    }

    /**
     * The rate that decides amplitude losses, Nyquist and the spectral figures, MHz: fs/m for DROP,
     * the raw fs for PEAK_PRESERVING.
     */
    public double amplitudeSamplingFrequencyMhz() {
        return decimationMode == DecimationMode.DROP ? effectiveSamplingFrequencyMhz() : rawSamplingFrequencyMhz;
    }

    /** Sampling interval of the stored samples dt = m / fs, us. */
    public double samplingIntervalUs() {
        return 1.0 / effectiveSamplingFrequencyMhz();
    }

    /** Sampling interval dt, ns. */
    public double samplingIntervalNs() {
        return 1000.0 / effectiveSamplingFrequencyMhz();
    }

    /** Worst-case error of one instant read at the nearest sample: dt/2, ns. */
    public double singleInstantWorstCaseNs() {
        return samplingIntervalNs() / 2.0;
    }

    /**
     * Standard uncertainty of one quantized instant: dt / sqrt(12), ns (rectangular distribution of
     * width dt, JCGM 100:2008 (GUM) 4.3.7).
     */
    public double singleInstantStandardUncertaintyNs() {
        return samplingIntervalNs() / SQRT_12;
    }

    /** Worst-case error of a difference of two quantized instants: dt, ns. */
    public double differenceWorstCaseNs() {
        return samplingIntervalNs();
    }

    /**
     * Standard uncertainty of a difference of two independently quantized instants: dt / sqrt(6),
     * ns (triangular distribution of half-width dt, JCGM 100:2008 (GUM) 4.3.9).
     */
    public double differenceStandardUncertaintyNs() {
        return samplingIntervalNs() / SQRT_6;
    }

    /**
     * The timing of a reading: one instant read at the nearest sample (rectangular: dt/2, dt/sqrt(12)),
     * or the difference of two such instants (triangular: dt, dt/sqrt(6)), with the GUM clause that
     * gives its standard uncertainty.
     */
    public Timing timing(boolean difference) {
        return difference
                ? new Timing(differenceWorstCaseNs(), differenceStandardUncertaintyNs(), Sources.GUM_TRIANGULAR)
                : new Timing(singleInstantWorstCaseNs(), singleInstantStandardUncertaintyNs(), Sources.GUM_RECTANGULAR);
    }

    /** Worst-case error and standard uncertainty of a reading's timing, ns, and their source. */
    public record Timing(double worstCaseNs, double standardUncertaintyNs, Source source) {}

    /**
     * The raw sampling frequency to set, MHz, so that the rate deciding amplitude
     * ({@link #amplitudeSamplingFrequencyMhz()}) equals {@code amplitudeRateMhz} with this
     * clock's decimation.
     */
    public double rawFrequencyForAmplitudeRateMhz(double amplitudeRateMhz) {
        return decimationMode == DecimationMode.DROP ? amplitudeRateMhz * decimationFactor : amplitudeRateMhz;
    }
}
