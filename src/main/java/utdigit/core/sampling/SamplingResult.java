package utdigit.core.sampling;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import utdigit.core.common.Reference;
import utdigit.core.common.Warning;
import utdigit.core.pulse.CentreFrequencyConvention;

/**
 * The answer of the sampling assessment (POST /api/sampling-assessments). Conventions: a boxed
 * field is null when its optional inputs were not given; an {@code Optional} field is empty when
 * the value cannot exist for the given inputs, and then a warning says why; a primitive always
 * exists. Losses are positive numbers of dB.
 *
 * @param effectiveSamplingFrequencyMhz the stored rate fs/m, MHz
 * @param samplingIntervalNs dt = m/fs, ns
 * @param samplesPerPeriod fs_eff / f at the nominal frequency
 * @param nyquistFrequencyMhz half the rate that decides amplitude (fs/m for DROP, fs for
 *     PEAK_PRESERVING), MHz
 * @param sineAmplitudeLossDb classic sine bound -20 log10(cos(pi/n)) with n at the rate that decides
 *     amplitude; empty for n <= 2 and for the ENVELOPE signal
 * @param timingErrorNs worst-case error of an instant read at a sample, dt/2, ns
 * @param timingStandardUncertaintyNs dt/sqrt(12), ns
 * @param samplesPerPeriodUpper fs_eff / fu at the upper -6 dB band edge; null without a bandwidth
 * @param spectralLevelAtNyquistDb the pulse model's spectral level at the Nyquist frequency, dB
 *     (<= 0, model value; with the ENVELOPE signal the envelope's spectrum about 0 Hz); null without
 *     a bandwidth
 * @param energyAboveNyquistFraction the fraction of the model's energy above the Nyquist frequency
 *     (model value; with the ENVELOPE signal the envelope's energy at |f| above it); null without a
 *     bandwidth
 * @param pulseAmplitudeLossDb worst case over the sampling phase for the Gaussian pulse model, dB;
 *     null without a bandwidth; empty for RF at or below 2 samples per period of the carrier
 * @param requiredSamplesPerPeriod samples per period for the sine bound to stay within the
 *     tolerance, pi/arccos(10^(-X/20)); null without a tolerance
 * @param requiredSamplingFrequencyMhz the raw sampling frequency to set (same decimation) for the
 *     sine bound at the nominal frequency, MHz; null without a tolerance
 * @param requiredSamplingFrequencyPulseMhz the raw sampling frequency to set (same decimation) above
 *     which every rate keeps the pulse loss within the tolerance, MHz; null without tolerance and
 *     bandwidth; empty when the search reaches its work bound or no finite rate exists
 * @param tfmGridAmplitudeLossDb worst-case loss of the TFM depth step, dB; null without a grid
 *     spacing; empty for an RF image with dz >= lambda/4
 * @param tfmMaxGridSpacingMm the largest depth step within the tolerance, mm; null without grid
 *     spacing and tolerance
 * @param tfmLateralAmplitudeLossDb worst-case loss of the TFM lateral step, dB; null without the
 *     lateral step, aperture and depth
 * @param decimationFactor the decimation factor used (default 1)
 * @param decimationMode the decimation mode used (default DROP)
 * @param signal the sampled signal used (default RF)
 * @param peakReading the peak reading used (default ABSOLUTE); null with the ENVELOPE signal
 * @param centreFrequencyConvention the convention used (default ARITHMETIC); null without a
 *     bandwidth
 * @param tfmImage the TFM image kind used (default RF); null without a grid spacing
 * @param warnings conditions the caller should know about
 * @param references the source of every formula used
 */
public record SamplingResult(
        double effectiveSamplingFrequencyMhz,
        double samplingIntervalNs,
        double samplesPerPeriod,
        double nyquistFrequencyMhz,
        Optional<Double> sineAmplitudeLossDb,
        double timingErrorNs,
        double timingStandardUncertaintyNs,
        Double samplesPerPeriodUpper,
        Double spectralLevelAtNyquistDb,
        Double energyAboveNyquistFraction,
        Optional<Double> pulseAmplitudeLossDb,
        Double requiredSamplesPerPeriod,
        Double requiredSamplingFrequencyMhz,
        Optional<Double> requiredSamplingFrequencyPulseMhz,
        Optional<Double> tfmGridAmplitudeLossDb,
        Double tfmMaxGridSpacingMm,
        Double tfmLateralAmplitudeLossDb,
        int decimationFactor,
        DecimationMode decimationMode,
        SampledSignal signal,
        PeakReading peakReading,
        CentreFrequencyConvention centreFrequencyConvention,
        TfmImage tfmImage,
        List<Warning> warnings,
        List<Reference> references) {

    public SamplingResult {
        Objects.requireNonNull(sineAmplitudeLossDb, "sineAmplitudeLossDb");
        Objects.requireNonNull(decimationMode, "decimationMode");
        Objects.requireNonNull(signal, "signal");
        warnings = List.copyOf(warnings);
        references = List.copyOf(references);
    }

    /** True when a warning with this code was issued. */
    public boolean hasWarning(String code) {
        return warnings.stream().anyMatch(w -> w.code().equals(code));
    }
}
