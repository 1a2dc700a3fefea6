package utdigit.core.waveform;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import utdigit.core.common.Reference;
import utdigit.core.common.Warning;
import utdigit.core.pulse.CentreFrequencyConvention;

/**
 * The answer of a waveform analysis. A boxed field is null when its optional input was not given;
 * an {@code Optional} is empty when the value does not exist for this record (a warning says why).
 *
 * @param sampleCount the record's samples
 * @param frequencyResolutionMhz the bin spacing of the zero-padded spectrum, MHz
 * @param spectrumWindow the window applied before the spectrum
 * @param peakFrequencyMhz the frequency of the spectrum's largest bin, MHz
 * @param lowerFrequencyMhz lower -6 dB edge, MHz
 * @param upperFrequencyMhz upper -6 dB edge, MHz
 * @param lowerFrequency20dbMhz lower -20 dB edge, MHz
 * @param upperFrequency20dbMhz upper -20 dB edge, MHz
 * @param centreFrequencyMhz the centre by the convention, MHz
 * @param bandwidthPercent (fu - fl)/fc x 100
 * @param pulseDuration6dbUs the envelope's -6 dB duration, us
 * @param pulseDuration20dbUs the envelope's -20 dB duration, us
 * @param cycles6db the -6 dB duration x the centre frequency
 * @param energyNearRecordNyquistFraction the fraction of the record's spectral energy above 0.8 of its own Nyquist frequency
 * @param model the Gaussian model of the same centre and bandwidth (its durations)
 * @param target the figures at the target rate; null without a target
 * @param centreFrequencyConvention the convention used
 * @param figure the series of the report figure (not part of the JSON answer)
 * @param warnings conditions the caller should know about
 * @param references the source of every method used
 */
public record WaveformResult(
        int sampleCount,
        double frequencyResolutionMhz,
        SpectrumWindow spectrumWindow,
        double peakFrequencyMhz,
        double lowerFrequencyMhz,
        double upperFrequencyMhz,
        Optional<Double> lowerFrequency20dbMhz,
        Optional<Double> upperFrequency20dbMhz,
        double centreFrequencyMhz,
        double bandwidthPercent,
        Optional<Double> pulseDuration6dbUs,
        Optional<Double> pulseDuration20dbUs,
        Optional<Double> cycles6db,
        double energyNearRecordNyquistFraction,
        ModelFigures model,
        TargetFigures target,
        CentreFrequencyConvention centreFrequencyConvention,
        Figure figure,
        List<Warning> warnings,
        List<Reference> references) {

    public WaveformResult {
        Objects.requireNonNull(model, "model");
        Objects.requireNonNull(figure, "figure");
        warnings = List.copyOf(warnings);
        references = List.copyOf(references);
    }

    /** True when a warning with this code was issued. */
    public boolean hasWarning(String code) {
        return warnings.stream().anyMatch(w -> w.code().equals(code));
    }

    /** The window applied to the record before its spectrum. */
    public enum SpectrumWindow {
        /** None: the echo lies wholly inside the record (its envelope falls 20 dB at both ends). */
        NONE,
        /** Tukey (tapered cosine, 20 % of the record tapered): the echo is cut by the record's ends. */
        TUKEY_20
    }

    /**
     * The Gaussian pulse model of the measured centre and bandwidth (the model's durations).
     *
     * @param pulseDuration6dbUs its -6 dB envelope duration, us; empty when no model exists
     * @param cycles6db its -6 dB cycles
     */
    public record ModelFigures(Optional<Double> pulseDuration6dbUs, Optional<Double> cycles6db) {}

    /**
     * The figures at a target rate: measured on the record, and by the Gaussian model beside them.
     *
     * @param effectiveSamplingFrequencyMhz fs/m, MHz
     * @param samplesPerPeriod fs/m over the measured centre frequency
     * @param nyquistFrequencyMhz half the rate that decides amplitude, MHz
     * @param pulseAmplitudeLossDb the worst case over the sampling phase of the record's read peak, dB
     * @param worstPhaseNs the sampling phase of that worst case, ns from the record's first sample
     * @param energyAboveNyquistFraction the fraction of the record's spectral energy above the Nyquist frequency
     * @param requiredSamplingFrequencyPulseMhz the raw rate above which every rate keeps the record's loss within the tolerance; null without a tolerance
     * @param modelPulseAmplitudeLossDb the Gaussian model's loss, dB
     * @param modelEnergyAboveNyquistFraction the Gaussian model's energy above Nyquist
     * @param modelRequiredSamplingFrequencyPulseMhz the Gaussian model's required rate; null without a tolerance, empty when the model has none
     */
    public record TargetFigures(
            double effectiveSamplingFrequencyMhz,
            double samplesPerPeriod,
            double nyquistFrequencyMhz,
            Optional<Double> pulseAmplitudeLossDb,
            Optional<Double> worstPhaseNs,
            double energyAboveNyquistFraction,
            Optional<Double> requiredSamplingFrequencyPulseMhz,
            Optional<Double> modelPulseAmplitudeLossDb,
            Optional<Double> modelEnergyAboveNyquistFraction,
            Optional<Double> modelRequiredSamplingFrequencyPulseMhz,
            int decimationFactor,
            utdigit.core.sampling.DecimationMode decimationMode,
            utdigit.core.sampling.PeakReading peakReading) {}

    /**
     * The series of the report figure, in the record's time and frequency.
     *
     * @param timesUs the record's sample times, us from its first sample
     * @param centred the record, mean removed
     * @param envelope its envelope |analytic signal|
     * @param targetTimesUs the target rate's sample times at the worst phase (empty without a target)
     * @param targetValues the reconstructed pulse at those times
     * @param frequenciesMhz the spectrum's bins, MHz (0 to the record's Nyquist frequency)
     * @param spectrumDb the spectrum, dB relative to its peak
     */
    public record Figure(double[] timesUs, double[] centred, double[] envelope, double[] targetTimesUs,
                         double[] targetValues, double[] frequenciesMhz, double[] spectrumDb) {}
}
