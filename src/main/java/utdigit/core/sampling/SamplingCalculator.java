package utdigit.core.sampling;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.apache.commons.math3.special.Erf;
import utdigit.core.common.CalculationException;
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
        Options o = Options.of(in);
        SampleClock clock = SampleClock.of(in.samplingFrequencyMhz(), o.m(), o.mode());
        Period period = period(clock, in.frequencyMhz(), o.signal(), warnings, references);
        Optional<Double> sineLoss = sineLoss(o.signal(), period.amplitudeSamplesPerPeriod(), warnings, references);
        PulseFigures pulse = PulseFigures.NONE;
        if (o.withBandwidth()) {
            pulse = pulseFigures(in, o, clock, period.nyquistMhz(), warnings, references);
        }
        if (!o.withBandwidth() && o.signal() == SampledSignal.RF) {
            compressedDataAliasing(clock, in.frequencyMhz(), "frequency_mhz", warnings);
        }
        RequiredRates required = RequiredRates.NONE;
        if (in.amplitudeToleranceDb() != null) {
            required = requiredRates(in, o, clock, pulse.model(), warnings, references);
        }
        TfmFigures tfm = tfmFigures(in, o, pulse.model(), warnings, references);
        return new SamplingResult(
                clock.effectiveSamplingFrequencyMhz(),
                clock.samplingIntervalNs(),
                period.samplesPerPeriod(),
                period.nyquistMhz(),
                sineLoss,
                clock.singleInstantWorstCaseNs(),
                clock.singleInstantStandardUncertaintyNs(),
                pulse.samplesPerPeriodUpper(),
                pulse.spectralLevelAtNyquistDb(),
                pulse.energyAboveNyquistFraction(),
                pulse.loss(),
                required.samplesPerPeriod(),
                required.samplingFrequencyMhz(),
                required.samplingFrequencyPulseMhz(),
                tfm.gridLoss(),
                tfm.maxGridSpacingMm(),
                tfm.lateralLossDb(),
                o.m(),
                o.mode(),
                o.signal(),
                o.reading(),
                o.convention(),
                tfm.image(),
                warnings,
                references);
    }

    /** The options with their defaults, after the checks of their parents. */
    private record Options(int m, DecimationMode mode, SampledSignal signal, PeakReading reading,
            boolean withBandwidth, CentreFrequencyConvention convention, TfmInputs tfm) {
        static Options of(SamplingInput in) {
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
            return new Options(m, mode, signal, reading, withBandwidth, convention, tfm);
        }
    }

    /** Samples per period at the effective rate and at the rate that decides amplitude, and the Nyquist frequency. */
    private record Period(double samplesPerPeriod, double amplitudeSamplesPerPeriod, double nyquistMhz) {}

    private static Period period(SampleClock clock, double f, SampledSignal signal, List<Warning> warnings,
            List<Reference> references) {
        double effectiveMhz = clock.effectiveSamplingFrequencyMhz();
        double amplitudeMhz = clock.amplitudeSamplingFrequencyMhz();
        double samplesPerPeriod = effectiveMhz / f;
        double amplitudeSamplesPerPeriod = amplitudeMhz / f;
        double nyquistMhz = amplitudeMhz / 2.0;
        references.add(Reference.of("sampling interval, samples per period, decimation", Sources.DECIMATION));
        references.add(Reference.of("timing error and uncertainty", Sources.GUM_RECTANGULAR));
        if (samplesPerPeriod <= 2.0) {
            warnings.add(SamplingMessages.samplesPerPeriodAtMost2(samplesPerPeriod,
                    signal == SampledSignal.RF && amplitudeSamplesPerPeriod <= 2.0));
        }
        return new Period(samplesPerPeriod, amplitudeSamplesPerPeriod, nyquistMhz);
    }

    private static Optional<Double> sineLoss(SampledSignal signal, double amplitudeSamplesPerPeriod,
            List<Warning> warnings, List<Reference> references) {
        if (signal == SampledSignal.ENVELOPE) {
            warnings.add(SamplingMessages.sineBoundNotApplicable());
            return Optional.empty();
        } else if (amplitudeSamplesPerPeriod > 2.0) {
            Optional<Double> sineLoss = Optional.of(PulseSamplingLoss.sineBoundLossDb(amplitudeSamplesPerPeriod));
            references.add(Reference.of("sine amplitude loss", Sources.SINE_BOUND));
            return sineLoss;
        } else {
            return Optional.empty(); // explained by SAMPLES_PER_PERIOD_AT_MOST_2 (n_amp <= 2 implies n <= 2)
        }
    }

    /** The pulse model's figures (with a bandwidth); the boxed ones null and the model absent without. */
    private record PulseFigures(Double samplesPerPeriodUpper, Double spectralLevelAtNyquistDb,
            Double energyAboveNyquistFraction, Optional<Double> loss, GaussianPulse model) {
        static final PulseFigures NONE = new PulseFigures(null, null, null, null, null);
    }

    private static PulseFigures pulseFigures(SamplingInput in, Options o, SampleClock clock, double nyquistMhz,
            List<Warning> warnings, List<Reference> references) {
        double f = in.frequencyMhz();
        double amplitudeMhz = clock.amplitudeSamplingFrequencyMhz();
        double bandwidthFraction = in.bandwidthPercent() / 100.0;
        double upperMhz = o.convention().bandEdgesMhz(f, bandwidthFraction)[1];
        GaussianPulse pulse = o.convention().pulseModel(f, bandwidthFraction);
        references.add(Reference.of("band edges and centre frequency", Sources.CENTRE_FREQUENCY));
        references.add(Reference.of("pulse model", Sources.SCIPY_GAUSSPULSE));
        if (in.bandwidthPercent() > 100.0) {
            warnings.add(SamplingMessages.bandwidthAbove100Percent());
        }
        double samplesPerPeriodUpper = clock.effectiveSamplingFrequencyMhz() / upperMhz;
        boolean envelope = o.signal() == SampledSignal.ENVELOPE;
        // The sampled spectrum: the carrier band for RF, the detected envelope's (centred at 0 Hz) for ENVELOPE.
        double envelopeEdgeMhz = pulse.edgeOffsetMhz(-6.0);
        double bandTopMhz = envelope ? envelopeEdgeMhz : upperMhz;
        if (amplitudeMhz <= 2.0 * bandTopMhz) {
            warnings.add(envelope ? SamplingMessages.envelopeAliasing(amplitudeMhz, envelopeEdgeMhz)
                    : SamplingMessages.bandAliasing(amplitudeMhz, upperMhz));
        }
        double spectralLevelAtNyquistDb = envelope
                ? pulse.envelopeSpectralLevelDb(nyquistMhz)
                : pulse.spectralLevelDb(nyquistMhz);
        if (spectralLevelAtNyquistDb > NYQUIST_LEVEL_WARNING_DB) {
            warnings.add(SamplingMessages.nyquistLevelAboveLimit(spectralLevelAtNyquistDb, envelope));
        }
        double energyAboveNyquistFraction = envelope
                ? envelopeEnergyAboveFraction(pulse, nyquistMhz)
                : energyAboveFraction(pulse, nyquistMhz);
        references.add(Reference.of("spectral level at Nyquist", envelope ? Sources.ENVELOPE_SPECTRAL_MODEL : Sources.SPECTRAL_MODEL));
        references.add(Reference.of("energy above Nyquist", envelope ? Sources.ENVELOPE_SPECTRAL_MODEL : Sources.SPECTRAL_MODEL));
        compressedDataAliasing(clock, bandTopMhz, envelope ? "the detected envelope's -6 dB edge"
                : "the upper -6 dB band edge", warnings);
        Optional<Double> pulseLoss = pulseLoss(pulse, o.signal(), o.reading(), clock, warnings, references);
        return new PulseFigures(samplesPerPeriodUpper, spectralLevelAtNyquistDb, energyAboveNyquistFraction,
                pulseLoss, pulse);
    }

    /** The rates needed for the amplitude tolerance: the sine model's, and the pulse model's with a bandwidth. */
    private record RequiredRates(Double samplesPerPeriod, Double samplingFrequencyMhz,
            Optional<Double> samplingFrequencyPulseMhz) {
        static final RequiredRates NONE = new RequiredRates(null, null, null);
    }

    private static RequiredRates requiredRates(SamplingInput in, Options o, SampleClock clock, GaussianPulse pulse,
            List<Warning> warnings, List<Reference> references) {
        double toleranceDb = in.amplitudeToleranceDb();
        double requiredSamplesPerPeriod = PulseSamplingLoss.requiredSamplesPerPeriod(toleranceDb);
        double requiredSamplingFrequencyMhz =
                clock.rawFrequencyForAmplitudeRateMhz(requiredSamplesPerPeriod * in.frequencyMhz());
        references.add(Reference.of("required samples per period and sampling frequency", Sources.REQUIRED_RATE));
        Optional<Double> requiredSamplingFrequencyPulseMhz = null;
        if (o.withBandwidth()) {
            requiredSamplingFrequencyPulseMhz =
                    requiredPulseRate(pulse, o.signal(), o.reading(), toleranceDb, clock, warnings, references);
        }
        return new RequiredRates(requiredSamplesPerPeriod, requiredSamplingFrequencyMhz,
                requiredSamplingFrequencyPulseMhz);
    }

    /** The TFM image's spatial sampling figures; null where their inputs were not given. */
    private record TfmFigures(Optional<Double> gridLoss, Double maxGridSpacingMm, Double lateralLossDb,
            TfmImage image) {}

    private static TfmFigures tfmFigures(SamplingInput in, Options o, GaussianPulse pulse, List<Warning> warnings,
            List<Reference> references) {
        Optional<Double> tfmGridLoss = null;
        Double tfmMaxGridSpacingMm = null;
        Double tfmLateralLossDb = null;
        TfmImage image = null;
        if (o.tfm().withGrid() || o.tfm().withLateral()) {
            double wavelengthMm = Waves.wavelengthMm(in.velocityMPerS(), in.frequencyMhz());
            references.add(Reference.of("wavelength", Sources.DEFINITIONS));
            if (o.tfm().withGrid()) {
                image = in.tfmImage() == null ? TfmImage.RF : in.tfmImage();
                Double widthMm = o.withBandwidth()
                        ? TfmGridSampling.depthResponseWidthMm(in.velocityMPerS(), pulse) : null;
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
            if (o.tfm().withLateral()) {
                double lateralWidthMm = TfmGridSampling.lateralWidthMm(
                        wavelengthMm, in.tfmDepthMm(), in.tfmApertureMm());
                double stepMm = in.tfmLateralGridSpacingMm();
                tfmLateralLossDb = TfmGridSampling.gaussianStepLossDb(stepMm, lateralWidthMm);
                if (stepMm >= lateralWidthMm) {
                    warnings.add(SamplingMessages.stepNotBelowWidth("tfm_lateral_grid_spacing_mm", stepMm,
                            lateralWidthMm));
                }
                references.add(Reference.of("TFM lateral grid", Sources.TFM_GRID));
            }
        }
        return new TfmFigures(tfmGridLoss, tfmMaxGridSpacingMm, tfmLateralLossDb, image);
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
            warnings.add(SamplingMessages.compressedDataAliasing(clock.effectiveSamplingFrequencyMhz(), what,
                    bandTopMhz));
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
            warnings.add(SamplingMessages.pulseLossNotDefined(amplitudeMhz, carrierSamples, pulse.carrierMhz()));
            return Optional.empty();
        }
        if (clock.decimationFactor() > 1 && clock.decimationMode() == DecimationMode.PEAK_PRESERVING
                && reading == PeakReading.POSITIVE_PEAK) {
            warnings.add(SamplingMessages.peakPreservingPositivePeak());
        }
        references.add(Reference.of("pulse amplitude loss", Sources.PULSE_SAMPLING_LOSS));
        try {
            return Optional.of(PulseSamplingLoss.rfLossDb(pulse, intervalUs, reading,
                    SearchBudget.of(PulseSamplingLoss.PHASE_SEARCH_BUDGET)));
        } catch (SearchBudget.Exhausted e) {
            warnings.add(SamplingMessages.lossSearchBound(e.limit()));
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
            warnings.add(SamplingMessages.rateSearchBound(e.limit()));
            return Optional.empty();
        }
        double rawMhz = clock.rawFrequencyForAmplitudeRateMhz(solution.amplitudeSamplingFrequencyMhz());
        references.add(Reference.of("required sampling frequency for the pulse", Sources.REQUIRED_RATE));
        solution.slowerPassingRateMhz().ifPresent(slowerMhz -> warnings.add(SamplingMessages.slowerRatesAlsoPass(
                rawMhz, clock.rawFrequencyForAmplitudeRateMhz(slowerMhz))));
        return Optional.of(rawMhz);
    }

    private static Optional<Double> tfmDepthLoss(TfmImage image, double stepMm, double wavelengthMm, Double widthMm,
                                                 List<Warning> warnings) {
        if (widthMm != null && stepMm >= widthMm) {
            warnings.add(SamplingMessages.stepNotBelowWidth("tfm_grid_spacing_mm", stepMm, widthMm));
        }
        if (image == TfmImage.ENVELOPE) {
            return Optional.of(TfmGridSampling.gaussianStepLossDb(stepMm, widthMm));
        }
        if (!(stepMm < wavelengthMm / 4.0)) {
            warnings.add(SamplingMessages.tfmStepAtOrAboveQuarterWavelength(stepMm, wavelengthMm / 4.0));
            return Optional.empty();
        }
        double lossDb = TfmGridSampling.carrierDepthLossDb(stepMm, wavelengthMm);
        if (widthMm == null) {
            warnings.add(SamplingMessages.tfmEnvelopeTermOmitted());
        } else {
            lossDb += TfmGridSampling.gaussianStepLossDb(stepMm, widthMm);
        }
        return Optional.of(lossDb);
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
