package utdigit.core.sampling;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;
import org.apache.commons.math3.special.Erf;
import utdigit.core.common.CalculationException;
import utdigit.core.common.MessageNumbers;
import utdigit.core.common.Reference;
import utdigit.core.common.SearchBudget;
import utdigit.core.common.Sources;
import utdigit.core.common.Warning;
import utdigit.core.pulse.CentreFrequencyConvention;
import utdigit.core.pulse.GaussianPulse;
import utdigit.core.pulse.Waves;

/**
 * Sampling adequacy of a digitizer setting for a probe (POST /api/sampling-assessments): sampling
 * interval, samples per period, Nyquist, sampled-peak losses of the sine and of the Gaussian pulse
 * model, timing quantization, the rates needed for an amplitude tolerance, and the spatial sampling
 * of a TFM image. Formulas and conventions: src/docs/methods.md, section 3 (sampling and the spatial sampling of a
 * TFM image".
 */
public final class SamplingCalculator {
    private SamplingCalculator() {}

    /** Samples per period (effective rate) at or below 2: the sine bound has no value. */
    public static final String SAMPLES_PER_PERIOD_AT_MOST_2 = "SAMPLES_PER_PERIOD_AT_MOST_2";
    /** The ENVELOPE signal: the sine bound does not apply. */
    public static final String SINE_BOUND_NOT_APPLICABLE = "SINE_BOUND_NOT_APPLICABLE";
    /** The rate deciding amplitude is at or below twice the upper -6 dB edge. */
    public static final String BAND_ALIASING = "BAND_ALIASING";
    /** The model's spectral level at the Nyquist frequency is above -40 dB. */
    public static final String NYQUIST_LEVEL_ABOVE_MINUS_40_DB = "NYQUIST_LEVEL_ABOVE_MINUS_40_DB";
    /** Bandwidth above 100 %: the one-sided pulse model's lower edge moves. */
    public static final String BANDWIDTH_ABOVE_100_PERCENT = "BANDWIDTH_ABOVE_100_PERCENT";
    /** RF pulse loss without a value: 2 or fewer samples per period of the model's carrier. */
    public static final String PULSE_LOSS_NOT_DEFINED = "PULSE_LOSS_NOT_DEFINED";
    /** PEAK_PRESERVING with POSITIVE_PEAK: a positive peak can be displaced by a larger negative one. */
    public static final String PEAK_PRESERVING_POSITIVE_PEAK = "PEAK_PRESERVING_POSITIVE_PEAK";
    /**
     * PEAK_PRESERVING: processing of the compressed data sees fs/m, and the band reaches above
     * fs/(2m).
     */
    public static final String COMPRESSED_DATA_ALIASING = "COMPRESSED_DATA_ALIASING";
    /** The pulse loss is not monotonic: slower rates than the required one also pass. */
    public static final String SLOWER_RATES_ALSO_PASS = "SLOWER_RATES_ALSO_PASS";
    /** A numerical search reached its work bound (or no finite answer exists): its figure is null. */
    public static final String SEARCH_BOUND_REACHED = "SEARCH_BOUND_REACHED";
    /** RF TFM depth loss without a bandwidth: the envelope term is omitted. */
    public static final String TFM_ENVELOPE_TERM_OMITTED = "TFM_ENVELOPE_TERM_OMITTED";
    /** RF TFM depth step at or beyond lambda/4: no bound. */
    public static final String TFM_GRID_STEP_AT_OR_ABOVE_QUARTER_WAVELENGTH = "TFM_GRID_STEP_AT_OR_ABOVE_QUARTER_WAVELENGTH";
    /** A TFM step at or above the response's -6 dB width: the quadratic model is rough there. */
    public static final String TFM_STEP_NOT_BELOW_RESPONSE_WIDTH = "TFM_STEP_NOT_BELOW_RESPONSE_WIDTH";

    /**
     * The narrowest bandwidth, percent, for which the RF pulse-rate search
     * (required_sampling_frequency_pulse_mhz) is run: its cost grows steeply as the pulse tends to a
     * continuous wave; from 1 % up it stays well within its work bound
     * ({@link RequiredPulseRate#SEARCH_BUDGET}), below it would often reach it.
     */
    public static final double MIN_BANDWIDTH_PERCENT_FOR_PULSE_RATE = 1.0;

    /** The spectral level at Nyquist above which a warning is issued, dB. */
    public static final double NYQUIST_LEVEL_WARNING_DB = -40.0;

    /** The assessment for {@code in}, with the contract's defaults applied. */
    public static SamplingResult compute(SamplingInput in) {
        Objects.requireNonNull(in, "input");
        List<Warning> warnings = new ArrayList<>();
        List<Reference> references = new ArrayList<>();

        // Options and their parents.
        int m = in.decimationFactor() == null ? 1 : in.decimationFactor();
        DecimationMode mode = in.decimationMode() == null ? DecimationMode.DROP : in.decimationMode();
        SampledSignal signal = in.signal() == null ? SampledSignal.RF : in.signal();
        if (signal == SampledSignal.ENVELOPE && in.peakReading() != null) {
            throw CalculationException.notApplicable("peak_reading",
                    "peak_reading applies only to signal RF; with signal ENVELOPE the envelope samples are read");
        }
        PeakReading reading = signal == SampledSignal.RF
                ? (in.peakReading() == null ? PeakReading.ABSOLUTE : in.peakReading())
                : null;
        boolean withBandwidth = in.bandwidthPercent() != null;
        if (!withBandwidth && in.centreFrequencyConvention() != null) {
            throw CalculationException.notApplicable("centre_frequency_convention",
                    "centre_frequency_convention applies only with bandwidth_percent");
        }
        CentreFrequencyConvention convention = withBandwidth
                ? (in.centreFrequencyConvention() == null
                        ? CentreFrequencyConvention.ARITHMETIC : in.centreFrequencyConvention())
                : null;
        TfmInputs tfm = TfmInputs.check(in, withBandwidth);
        if (withBandwidth && in.amplitudeToleranceDb() != null && signal == SampledSignal.RF
                && !(in.bandwidthPercent() >= MIN_BANDWIDTH_PERCENT_FOR_PULSE_RATE)) {
            throw CalculationException.invalid("bandwidth_percent", in.bandwidthPercent(),
                    "must be >= 1 with amplitude_tolerance_db and signal RF: the search for "
                            + "required_sampling_frequency_pulse_mhz covers bandwidths of 1 % and above");
        }

        // Clock, period and timing.
        SampleClock clock = SampleClock.of(in.samplingFrequencyMhz(), m, mode);
        double f = in.frequencyMhz();
        double effectiveMhz = clock.effectiveSamplingFrequencyMhz();
        double amplitudeMhz = clock.amplitudeSamplingFrequencyMhz();
        double samplesPerPeriod = effectiveMhz / f;
        double amplitudeSamplesPerPeriod = amplitudeMhz / f;
        double nyquistMhz = amplitudeMhz / 2.0;
        references.add(Reference.of("sampling interval, samples per period, decimation", Sources.DECIMATION));
        references.add(Reference.of("timing error and uncertainty", Sources.GUM_RECTANGULAR));
        if (samplesPerPeriod <= 2.0) {
            warnings.add(Warning.of(SAMPLES_PER_PERIOD_AT_MOST_2, String.format(Locale.ROOT,
                    "samples_per_period is %s: 2 or fewer samples per period of frequency_mhz undersample the "
                            + "carrier (an echo can be missed or read at an alias)%s",
                    num(samplesPerPeriod),
                    signal == SampledSignal.RF && amplitudeSamplesPerPeriod <= 2.0
                            ? "; sine_amplitude_loss_db is null: the sine bound has no value at n <= 2" : "")));
        }

        Optional<Double> sineLoss;
        if (signal == SampledSignal.ENVELOPE) {
            sineLoss = Optional.empty();
            warnings.add(Warning.of(SINE_BOUND_NOT_APPLICABLE,
                    "sine_amplitude_loss_db is null: with signal ENVELOPE the envelope is sampled, not the carrier, "
                            + "so the sine bound does not apply (see pulse_amplitude_loss_db, which needs "
                            + "bandwidth_percent); required_samples_per_period and required_sampling_frequency_mhz "
                            + "stay the sine model's figures for comparison with code rules"));
        } else if (amplitudeSamplesPerPeriod > 2.0) {
            sineLoss = Optional.of(PulseSamplingLoss.sineBoundLossDb(amplitudeSamplesPerPeriod));
            references.add(Reference.of("sine amplitude loss", Sources.SINE_BOUND));
        } else {
            sineLoss = Optional.empty(); // explained by SAMPLES_PER_PERIOD_AT_MOST_2 (n_amp <= 2 implies n <= 2)
        }

        // With a bandwidth: the pulse model.
        Double samplesPerPeriodUpper = null;
        Double spectralLevelAtNyquistDb = null;
        Double energyAboveNyquistFraction = null;
        Optional<Double> pulseLoss = null;
        GaussianPulse pulse = null;
        if (withBandwidth) {
            double bandwidthFraction = in.bandwidthPercent() / 100.0;
            double upperMhz = convention.bandEdgesMhz(f, bandwidthFraction)[1];
            pulse = convention.pulseModel(f, bandwidthFraction);
            references.add(Reference.of("band edges and centre frequency", Sources.CENTRE_FREQUENCY));
            references.add(Reference.of("pulse model", Sources.SCIPY_GAUSSPULSE));
            if (in.bandwidthPercent() > 100.0) {
                warnings.add(Warning.of(BANDWIDTH_ABOVE_100_PERCENT,
                        "bandwidth_percent is above 100: the real pulse's negative-frequency image moves the lower "
                                + "band edge of the one-sided model; pulse figures are less reliable"));
            }
            samplesPerPeriodUpper = effectiveMhz / upperMhz;
            boolean envelope = signal == SampledSignal.ENVELOPE;
            // The sampled spectrum: the carrier band for RF, the detected envelope's (centred at 0 Hz) for ENVELOPE.
            double envelopeEdgeMhz = pulse.edgeOffsetMhz(-6.0);
            double bandTopMhz = envelope ? envelopeEdgeMhz : upperMhz;
            if (amplitudeMhz <= 2.0 * bandTopMhz) {
                warnings.add(Warning.of(BAND_ALIASING, envelope
                        ? String.format(Locale.ROOT,
                                "the rate that decides amplitude (%s MHz) is at or below twice the -6 dB edge of the "
                                        + "detected envelope's spectrum (%s MHz, centred at 0 Hz): the envelope aliases",
                                num(amplitudeMhz), num(envelopeEdgeMhz))
                        : String.format(Locale.ROOT,
                                "the rate that decides amplitude (%s MHz) is at or below twice the upper -6 dB band edge "
                                        + "(%s MHz): the probe's band aliases", num(amplitudeMhz), num(upperMhz))));
            }
            spectralLevelAtNyquistDb = envelope
                    ? pulse.envelopeSpectralLevelDb(nyquistMhz)
                    : pulse.spectralLevelDb(nyquistMhz);
            if (spectralLevelAtNyquistDb > NYQUIST_LEVEL_WARNING_DB) {
                warnings.add(Warning.of(NYQUIST_LEVEL_ABOVE_MINUS_40_DB, String.format(Locale.ROOT,
                        "spectral_level_at_nyquist_db is %s, above %s dB: the pulse model%s has significant energy "
                                + "at the Nyquist frequency (a model value; the anti-alias filter decides)",
                        num(spectralLevelAtNyquistDb), num(NYQUIST_LEVEL_WARNING_DB),
                        envelope ? "'s detected envelope" : "")));
            }
            energyAboveNyquistFraction = envelope
                    ? envelopeEnergyAboveFraction(pulse, nyquistMhz)
                    : energyAboveFraction(pulse, nyquistMhz);
            references.add(Reference.of("spectral level at Nyquist", envelope ? Sources.ENVELOPE_SPECTRAL_MODEL : Sources.SPECTRAL_MODEL));
            references.add(Reference.of("energy above Nyquist", envelope ? Sources.ENVELOPE_SPECTRAL_MODEL : Sources.SPECTRAL_MODEL));
            compressedDataAliasing(clock, bandTopMhz, envelope ? "the detected envelope's -6 dB edge"
                    : "the upper -6 dB band edge", warnings);
            pulseLoss = pulseLoss(pulse, signal, reading, clock, warnings, references);
        }

        if (!withBandwidth && signal == SampledSignal.RF) {
            compressedDataAliasing(clock, f, "frequency_mhz", warnings);
        }

        // With a tolerance: the required rates.
        Double requiredSamplesPerPeriod = null;
        Double requiredSamplingFrequencyMhz = null;
        Optional<Double> requiredSamplingFrequencyPulseMhz = null;
        if (in.amplitudeToleranceDb() != null) {
            double toleranceDb = in.amplitudeToleranceDb();
            requiredSamplesPerPeriod = PulseSamplingLoss.requiredSamplesPerPeriod(toleranceDb);
            requiredSamplingFrequencyMhz = clock.rawFrequencyForAmplitudeRateMhz(requiredSamplesPerPeriod * f);
            references.add(Reference.of("required samples per period and sampling frequency", Sources.REQUIRED_RATE));
            if (withBandwidth) {
                requiredSamplingFrequencyPulseMhz =
                        requiredPulseRate(pulse, signal, reading, toleranceDb, clock, warnings, references);
            }
        }

        // TFM spatial sampling.
        Optional<Double> tfmGridLoss = null;
        Double tfmMaxGridSpacingMm = null;
        Double tfmLateralLossDb = null;
        TfmImage image = null;
        if (tfm.withGrid() || tfm.withLateral()) {
            double wavelengthMm = Waves.wavelengthMm(in.velocityMPerS(), f);
            references.add(Reference.of("wavelength", Sources.DEFINITIONS));
            if (tfm.withGrid()) {
                image = in.tfmImage() == null ? TfmImage.RF : in.tfmImage();
                Double widthMm = withBandwidth ? TfmGridSampling.depthResponseWidthMm(in.velocityMPerS(), pulse) : null;
                double stepMm = in.tfmGridSpacingMm();
                tfmGridLoss = tfmDepthLoss(image, stepMm, wavelengthMm, widthMm, warnings);
                if (in.amplitudeToleranceDb() != null) {
                    tfmMaxGridSpacingMm = image == TfmImage.RF
                            ? TfmGridSampling.maxRfDepthStepMm(in.amplitudeToleranceDb(), wavelengthMm, widthMm)
                            : TfmGridSampling.maxGaussianStepMm(in.amplitudeToleranceDb(), widthMm);
                    references.add(Reference.of("TFM largest depth step", Sources.TFM_GRID));
                }
                references.add(Reference.of("TFM depth grid", Sources.TFM_GRID));
            }
            if (tfm.withLateral()) {
                double lateralWidthMm = TfmGridSampling.lateralWidthMm(
                        wavelengthMm, in.tfmDepthMm(), in.tfmApertureMm());
                double stepMm = in.tfmLateralGridSpacingMm();
                tfmLateralLossDb = TfmGridSampling.gaussianStepLossDb(stepMm, lateralWidthMm);
                if (stepMm >= lateralWidthMm) {
                    warnings.add(stepNotBelowWidth("tfm_lateral_grid_spacing_mm", stepMm, lateralWidthMm));
                }
                references.add(Reference.of("TFM lateral grid", Sources.TFM_GRID));
            }
        }

        return new SamplingResult(
                effectiveMhz,
                clock.samplingIntervalNs(),
                samplesPerPeriod,
                nyquistMhz,
                sineLoss,
                clock.singleInstantWorstCaseNs(),
                clock.singleInstantStandardUncertaintyNs(),
                samplesPerPeriodUpper,
                spectralLevelAtNyquistDb,
                energyAboveNyquistFraction,
                pulseLoss,
                requiredSamplesPerPeriod,
                requiredSamplingFrequencyMhz,
                requiredSamplingFrequencyPulseMhz,
                tfmGridLoss,
                tfmMaxGridSpacingMm,
                tfmLateralLossDb,
                m,
                mode,
                signal,
                reading,
                convention,
                image,
                warnings,
                references);
    }

    /**
     * Fraction of the pulse model's energy above {@code frequencyMhz}: its power spectrum is a
     * Gaussian of standard deviation sigma_f = sqrt(a)/(2 pi) about fc, so the fraction is
     * 0.5 erfc((f - fc)/(sigma_f sqrt 2)), in [0, 1] (one-sided model: the negative-frequency image
     * is neglected). erfc: Apache Commons Math 3.6.1 {@link Erf#erfc(double)} (regularized gamma
     * continued fraction in pure-Java arithmetic, so platform-independent). Model value, optimistic
     * for real probes; reference: src/docs/methods.md 3.3.
     */
    static double energyAboveFraction(GaussianPulse pulse, double frequencyMhz) {
        double z = (frequencyMhz - pulse.carrierMhz()) / (pulse.powerSpectrumSigmaMhz() * StrictMath.sqrt(2.0));
        return 0.5 * Erf.erfc(z);
    }

    /**
     * Fraction of the energy of the model's detected envelope exp(-a t^2) at |f| above
     * {@code frequencyMhz}: its power spectrum is a Gaussian of standard deviation
     * sigma_f = sqrt(a)/(2 pi) about 0 Hz, so both tails together are erfc(f/(sigma_f sqrt 2)), in
     * [0, 1]. Model value; reference: src/docs/methods.md 3.5 (ENVELOPE).
     */
    static double envelopeEnergyAboveFraction(GaussianPulse pulse, double frequencyMhz) {
        return Erf.erfc(frequencyMhz / (pulse.powerSpectrumSigmaMhz() * StrictMath.sqrt(2.0)));
    }

    /**
     * PEAK_PRESERVING keeps the amplitude figures at the raw rate, but whatever processes the
     * compressed data (TFM, SAFT, filtering, FFT) sees fs/m and aliases above fs/(2m): warn when the
     * band's top reaches it.
     */
    private static void compressedDataAliasing(SampleClock clock, double bandTopMhz, String what,
                                               List<Warning> warnings) {
        if (clock.decimationFactor() > 1 && clock.decimationMode() == DecimationMode.PEAK_PRESERVING
                && clock.effectiveSamplingFrequencyMhz() <= 2.0 * bandTopMhz) {
            warnings.add(Warning.of(COMPRESSED_DATA_ALIASING, String.format(Locale.ROOT,
                    "decimation_mode PEAK_PRESERVING keeps each group's largest sample, so the amplitude figures follow "
                            + "the raw rate; but processing of the compressed data (TFM, SAFT, filtering, FFT) sees "
                            + "fs/m = %s MHz and aliases above fs/(2m) = %s MHz, at or below %s (%s MHz)",
                    num(clock.effectiveSamplingFrequencyMhz()), num(clock.effectiveSamplingFrequencyMhz() / 2.0),
                    what, num(bandTopMhz))));
        }
    }

    private static Optional<Double> pulseLoss(GaussianPulse pulse, SampledSignal signal, PeakReading reading,
                                              SampleClock clock, List<Warning> warnings,
                                              List<Reference> references) {
        double amplitudeMhz = clock.amplitudeSamplingFrequencyMhz();
        double intervalUs = 1.0 / amplitudeMhz;
        if (signal == SampledSignal.ENVELOPE) {
            references.add(Reference.of("pulse amplitude loss", Sources.PULSE_SAMPLING_LOSS));
            return Optional.of(PulseSamplingLoss.envelopeLossDb(pulse, intervalUs));
        }
        double carrierSamples = 1.0 / (pulse.carrierMhz() * intervalUs);
        if (!(carrierSamples > 2.0)) {
            warnings.add(Warning.of(PULSE_LOSS_NOT_DEFINED, String.format(Locale.ROOT,
                    "pulse_amplitude_loss_db is null: the rate that decides amplitude (%s MHz) gives %s samples per "
                            + "period of the pulse model's carrier (%s MHz); at 2 or fewer a sample can fall on every "
                            + "zero crossing and no worst case exists",
                    num(amplitudeMhz), num(carrierSamples), num(pulse.carrierMhz()))));
            return Optional.empty();
        }
        if (clock.decimationFactor() > 1 && clock.decimationMode() == DecimationMode.PEAK_PRESERVING
                && reading == PeakReading.POSITIVE_PEAK) {
            warnings.add(Warning.of(PEAK_PRESERVING_POSITIVE_PEAK,
                    "decimation_mode PEAK_PRESERVING keeps the largest |sample| of each group of decimation_factor "
                            + "samples: a positive peak can be displaced by a larger negative half-wave of the same group, "
                            + "which pulse_amplitude_loss_db (at the raw rate) does not model"));
        }
        references.add(Reference.of("pulse amplitude loss", Sources.PULSE_SAMPLING_LOSS));
        try {
            return Optional.of(PulseSamplingLoss.rfLossDb(pulse, intervalUs, reading,
                    SearchBudget.of(PulseSamplingLoss.PHASE_SEARCH_BUDGET)));
        } catch (SearchBudget.Exhausted e) {
            warnings.add(Warning.of(SEARCH_BOUND_REACHED, String.format(Locale.ROOT,
                    "pulse_amplitude_loss_db is null: the search over the sampling phase reached its bound of %d "
                            + "pulse values (the pulse model is close to a continuous wave at this bandwidth and "
                            + "frequency); the closed form cos(pi/n) exp(-a dt^2/4) bounds the loss from above",
                    e.limit())));
            return Optional.empty();
        }
    }

    private static Optional<Double> requiredPulseRate(GaussianPulse pulse, SampledSignal signal, PeakReading reading,
                                            double toleranceDb, SampleClock clock, List<Warning> warnings,
                                            List<Reference> references) {
        if (signal == SampledSignal.ENVELOPE) {
            references.add(Reference.of("required sampling frequency for the pulse", Sources.REQUIRED_RATE));
            return Optional.of(clock.rawFrequencyForAmplitudeRateMhz(RequiredPulseRate.forEnvelope(pulse, toleranceDb)));
        }
        RequiredPulseRate.RfSolution solution;
        try {
            solution = RequiredPulseRate.forRf(pulse, reading, toleranceDb);
        } catch (SearchBudget.Exhausted e) {
            warnings.add(Warning.of(SEARCH_BOUND_REACHED, String.format(Locale.ROOT,
                    "required_sampling_frequency_pulse_mhz is null: no finite rate was found within the search's "
                            + "bound of %d pulse values (amplitude_tolerance_db too small to resolve, or a pulse "
                            + "model too close to a continuous wave); required_sampling_frequency_mhz gives the sine "
                            + "model's rate", e.limit())));
            return Optional.empty();
        }
        double rawMhz = clock.rawFrequencyForAmplitudeRateMhz(solution.amplitudeSamplingFrequencyMhz());
        references.add(Reference.of("required sampling frequency for the pulse", Sources.REQUIRED_RATE));
        solution.slowerPassingRateMhz().ifPresent(slowerMhz -> warnings.add(Warning.of(SLOWER_RATES_ALSO_PASS,
                String.format(Locale.ROOT,
                        "the pulse loss is not monotonic in the sampling frequency: slower rates than "
                                + "required_sampling_frequency_pulse_mhz (%s MHz) also pass, e.g. %s MHz, but some rates "
                                + "in between do not",
                        num(rawMhz), num(clock.rawFrequencyForAmplitudeRateMhz(slowerMhz))))));
        return Optional.of(rawMhz);
    }

    private static Optional<Double> tfmDepthLoss(TfmImage image, double stepMm, double wavelengthMm, Double widthMm,
                                                 List<Warning> warnings) {
        if (widthMm != null && stepMm >= widthMm) {
            warnings.add(stepNotBelowWidth("tfm_grid_spacing_mm", stepMm, widthMm));
        }
        if (image == TfmImage.ENVELOPE) {
            return Optional.of(TfmGridSampling.gaussianStepLossDb(stepMm, widthMm));
        }
        if (!(stepMm < wavelengthMm / 4.0)) {
            warnings.add(Warning.of(TFM_GRID_STEP_AT_OR_ABOVE_QUARTER_WAVELENGTH, String.format(Locale.ROOT,
                    "tfm_grid_amplitude_loss_db is null: tfm_grid_spacing_mm (%s mm) is at or above a quarter "
                            + "wavelength (%s mm); a grid point can fall on a zero of the RF image, so no bound exists",
                    num(stepMm), num(wavelengthMm / 4.0))));
            return Optional.empty();
        }
        double lossDb = TfmGridSampling.carrierDepthLossDb(stepMm, wavelengthMm);
        if (widthMm == null) {
            warnings.add(Warning.of(TFM_ENVELOPE_TERM_OMITTED,
                    "tfm_grid_amplitude_loss_db holds the carrier term only: without bandwidth_percent the envelope "
                            + "term 6 (dz/w)^2 is omitted and the loss is underestimated"));
        } else {
            lossDb += TfmGridSampling.gaussianStepLossDb(stepMm, widthMm);
        }
        return Optional.of(lossDb);
    }

    private static Warning stepNotBelowWidth(String field, double stepMm, double widthMm) {
        return Warning.of(TFM_STEP_NOT_BELOW_RESPONSE_WIDTH, String.format(Locale.ROOT,
                "%s (%s mm) is not below the image response's -6 dB width (%s mm): the quadratic loss 6 (d/w)^2 "
                        + "is a rough model there, and the reflector may be missed",
                field, num(stepMm), num(widthMm)));
    }


    /** A number for a message: 6 significant digits, no exponent for ordinary magnitudes. */
    private static String num(double value) {
        return MessageNumbers.plain(value, 6);
    }

    /** The TFM inputs after the checks of their parents. */
    private record TfmInputs(boolean withGrid, boolean withLateral) {
        static TfmInputs check(SamplingInput in, boolean withBandwidth) {
            boolean withGrid = in.tfmGridSpacingMm() != null;
            if (!withGrid && in.tfmImage() != null) {
                throw CalculationException.notApplicable("tfm_image", "tfm_image applies only with tfm_grid_spacing");
            }
            int lateralCount = (in.tfmLateralGridSpacingMm() != null ? 1 : 0) + (in.tfmApertureMm() != null ? 1 : 0)
                    + (in.tfmDepthMm() != null ? 1 : 0);
            if (lateralCount != 0 && lateralCount != 3) {
                String given = in.tfmLateralGridSpacingMm() != null ? "tfm_lateral_grid_spacing_mm"
                        : in.tfmApertureMm() != null ? "tfm_aperture_mm" : "tfm_depth_mm";
                throw CalculationException.notApplicable(given,
                        "tfm_lateral_grid_spacing, tfm_aperture and tfm_depth go together: give all three or none");
            }
            boolean withLateral = lateralCount == 3;
            if (withGrid || withLateral) {
                if (in.velocityMPerS() == null) {
                    throw CalculationException.notApplicable(withGrid ? "tfm_grid_spacing_mm" : "tfm_lateral_grid_spacing_mm",
                            "the TFM grid figures need a velocity (velocity_m_per_s, velocity_in_per_us or material)");
                }
            } else if (in.velocityMPerS() != null) {
                throw CalculationException.notApplicable("velocity_m_per_s",
                        "a velocity applies only to the TFM grid figures (tfm_grid_spacing, or tfm_lateral_grid_spacing "
                                + "with tfm_aperture and tfm_depth)");
            }
            if (withGrid && in.tfmImage() == TfmImage.ENVELOPE && !withBandwidth) {
                throw CalculationException.notApplicable("tfm_image",
                        "tfm_image ENVELOPE needs bandwidth_percent: its depth loss 6 (dz/w)^2 uses the pulse's -6 dB "
                                + "duration");
            }
            return new TfmInputs(withGrid, withLateral);
        }
    }
}
