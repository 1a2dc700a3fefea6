package utdigit.core.waveform;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import utdigit.core.common.CalculationException;
import utdigit.core.common.Decibels;
import utdigit.core.common.Reference;
import utdigit.core.common.SearchBudget;
import utdigit.core.common.Sources;
import utdigit.core.common.Warning;
import utdigit.core.pulse.CentreFrequencyConvention;
import utdigit.core.pulse.GaussianPulse;
import utdigit.core.sampling.DecimationMode;
import utdigit.core.sampling.PeakReading;
import utdigit.core.sampling.RequiredPulseRate;
import utdigit.core.sampling.SampleClock;
import utdigit.core.sampling.SamplingCalculator;
import utdigit.core.sampling.SamplingInput;
import utdigit.core.sampling.SamplingResult;

/**
 * Measured waveforms (POST /api/waveform-analyses): a recorded pulse's spectrum and envelope, the
 * record's own adequacy, and the sampling adequacy of the real pulse at a target rate beside the
 * Gaussian pulse model of the same centre and bandwidth (whose figures come from
 * {@link SamplingCalculator}, the sampling assessment's one implementation).
 *
 * <p>Spectrum: the record, mean removed (windowed only when the echo is cut by the record's ends),
 * zero-padded to 8 times the power of two at or above its length; |FFT| (numpy.fft.rfft
 * convention); peak at the largest bin; edges by linear interpolation between the bins straddling
 * the level. Envelope: |analytic signal| by the FFT Hilbert transform of scipy.signal.hilbert on the
 * record zero-padded to a power of two at or above twice its length; durations by linear
 * interpolation between the samples straddling the level.
 */
public final class WaveformAnalyzer {
    private WaveformAnalyzer() {}

    /** The echo is cut by the record's ends: the spectrum is windowed. */
    public static final String ECHO_CUT_BY_RECORD = "ECHO_CUT_BY_RECORD";
    /** The record holds energy near its own Nyquist frequency: it may be aliased. */
    public static final String RECORD_ENERGY_NEAR_NYQUIST = "RECORD_ENERGY_NEAR_NYQUIST";
    /** A -20 dB band edge does not exist in the record's band. */
    public static final String EDGE_20DB_NOT_FOUND = "EDGE_20DB_NOT_FOUND";
    /** The envelope does not fall to a level inside the record. */
    public static final String ENVELOPE_LEVEL_NOT_REACHED = "ENVELOPE_LEVEL_NOT_REACHED";
    /** The target rate gives 2 or fewer samples per period of the measured centre: no worst case. */
    public static final String PULSE_LOSS_NOT_DEFINED = "PULSE_LOSS_NOT_DEFINED";
    /** The Gaussian model of the measured band cannot be formed or searched. */
    public static final String MODEL_NOT_AVAILABLE = "MODEL_NOT_AVAILABLE";
    /** The Gaussian model's figures are optimistic against this record. */
    public static final String MODEL_OPTIMISTIC = "MODEL_OPTIMISTIC";

    /** Energy fraction near the record's Nyquist above which a warning is given. */
    public static final double RECORD_NYQUIST_WARNING_FRACTION = 1e-4;
    /** Energy fraction near the record's Nyquist above which the record is refused (422). */
    public static final double RECORD_NYQUIST_REFUSAL_FRACTION = 1e-2;
    /** "Near the record's Nyquist": above this fraction of it. */
    public static final double NEAR_NYQUIST_FRACTION = 0.8;
    /** Zero-padding of the spectrum: 8 times the power of two at or above the record's length. */
    public static final int SPECTRUM_PADDING = 8;
    /** Envelope level (dB below its peak) at a record end above which the echo counts as cut. */
    public static final double CUT_LEVEL_DB = 20.0;
    /** The tapered fraction of the Tukey window. */
    public static final double TUKEY_FRACTION = 0.2;

    /** The analysis of {@code in}, with the contract's defaults applied. */
    public static WaveformResult analyse(WaveformInput in) {
        Objects.requireNonNull(in, "input");
        List<Warning> warnings = new ArrayList<>();
        List<Reference> references = new ArrayList<>();
        boolean withTarget = in.samplingFrequencyMhz() != null;
        if (!withTarget) {
            refuseTargetOptions(in);
        }
        CentreFrequencyConvention convention = in.centreFrequencyConvention() == null
                ? CentreFrequencyConvention.ARITHMETIC : in.centreFrequencyConvention();
        double fsRec = in.recordSamplingFrequencyMhz();
        double[] y = meanRemoved(in.samples());
        Echo echo = echo(y, warnings, references);
        Spectrum spectrum = spectrum(y, echo.cut(), fsRec, references);
        double near = recordAdequacy(spectrum, fsRec, warnings, references);
        Band band = band(spectrum, convention, warnings, references);
        Durations durations = durations(echo, fsRec, band.centreMhz(), warnings, references);
        GaussianPulse pulse = gaussianModel(band, convention, warnings, references);
        WaveformResult.ModelFigures model = modelFigures(pulse);
        BandLimitedRecord record = new BandLimitedRecord(y, fsRec);
        Target target = withTarget
                ? target(in, spectrum, record, band, convention, pulse, warnings, references) : Target.NONE;
        WaveformResult.Figure figure = figure(y, echo.envelope(), target.loss(), spectrum, fsRec);
        return new WaveformResult(y.length, spectrum.resolutionMhz(), echo.window(), spectrum.peakFrequencyMhz(),
                band.lowerMhz(), band.upperMhz(), band.lower20(), band.upper20(), band.centreMhz(),
                band.bandwidthPercent(), durations.duration6(), durations.duration20(), durations.cycles6(), near,
                model, target.figures(), convention, figure, warnings, references);
    }

    private static void refuseTargetOptions(WaveformInput in) {
        notWithoutTarget("decimation_factor", in.decimationFactor());
        notWithoutTarget("decimation_mode", in.decimationMode());
        notWithoutTarget("peak_reading", in.peakReading());
        notWithoutTarget("amplitude_tolerance_db", in.amplitudeToleranceDb());
    }

    /** The record with its mean removed; refused when nothing is left (no pulse). */
    private static double[] meanRemoved(double[] x) {
        int n = x.length;
        double mean = 0.0;
        for (double v : x) {
            mean += v;
        }
        mean /= n;
        double[] y = new double[n];
        double largest = 0.0;
        for (int i = 0; i < n; i++) {
            y[i] = x[i] - mean;
            largest = StrictMath.max(largest, StrictMath.abs(y[i]));
        }
        if (!(largest > 0.0)) {
            throw CalculationException.notApplicable("samples",
                    "the record holds no pulse: its samples are all equal (all zero or a constant offset)");
        }
        return y;
    }

    /** The envelope, its peak, and whether the echo lies wholly inside the record. */
    private record Echo(double[] envelope, int peak, double max, boolean cut) {
        WaveformResult.SpectrumWindow window() {
            return cut ? WaveformResult.SpectrumWindow.TUKEY_20 : WaveformResult.SpectrumWindow.NONE;
        }
    }

    private static Echo echo(double[] y, List<Warning> warnings, List<Reference> references) {
        int n = y.length;
        double[] envelope = envelope(y);
        int envelopePeak = argmax(envelope, 0, n - 1);
        double envelopeMax = envelope[envelopePeak];
        double cutRatio = Decibels.toRatio(-CUT_LEVEL_DB);
        boolean cut = envelope[0] >= cutRatio * envelopeMax || envelope[n - 1] >= cutRatio * envelopeMax;
        if (cut) {
            warnings.add(WaveformMessages.echoCut());
        }
        references.add(Reference.of("record preparation", Sources.WAVEFORM_PREPARATION));
        return new Echo(envelope, envelopePeak, envelopeMax, cut);
    }

    /** The one-sided spectrum of the record: magnitude and power per bin, their sum, and the peak bin. */
    private record Spectrum(double[] magnitude, double[] power, double total, double resolutionMhz, int peakBin) {
        double peakMagnitude() {
            return magnitude[peakBin];
        }

        double peakFrequencyMhz() {
            return peakBin * resolutionMhz;
        }
    }

    private static Spectrum spectrum(double[] y, boolean cut, double fsRec, List<Reference> references) {
        double[] spectral = y.clone();
        if (cut) {
            tukey(spectral, TUKEY_FRACTION);
        }
        int length = StrictMath.max(1024, SPECTRUM_PADDING * Fft.powerOfTwoAtLeast(y.length));
        double[][] transform = Fft.forward(spectral, length);
        int bins = length / 2 + 1;
        double[] magnitude = new double[bins];
        double[] power = new double[bins];
        double total = 0.0;
        for (int k = 0; k < bins; k++) {
            double re = transform[0][k];
            double im = transform[1][k];
            power[k] = (re * re + im * im) * (k == 0 || k == bins - 1 ? 1.0 : 2.0);
            magnitude[k] = StrictMath.sqrt(re * re + im * im);
            total += power[k];
        }
        double resolutionMhz = fsRec / length;
        int peakBin = argmax(magnitude, 0, bins - 1);
        references.add(Reference.of("measured spectrum", Sources.WAVEFORM_SPECTRUM));
        return new Spectrum(magnitude, power, total, resolutionMhz, peakBin);
    }

    /** The energy fraction near the record's own Nyquist frequency: refused above a limit, warned above another. */
    private static double recordAdequacy(Spectrum spectrum, double fsRec, List<Warning> warnings,
            List<Reference> references) {
        double near = energyAbove(spectrum.power(), spectrum.total(), NEAR_NYQUIST_FRACTION * fsRec / 2.0,
                spectrum.resolutionMhz());
        references.add(Reference.of("record adequacy", Sources.WAVEFORM_ADEQUACY));
        if (near > RECORD_NYQUIST_REFUSAL_FRACTION) {
            throw WaveformMessages.recordAliased(near, NEAR_NYQUIST_FRACTION * fsRec / 2.0, fsRec);
        }
        if (near > RECORD_NYQUIST_WARNING_FRACTION) {
            warnings.add(WaveformMessages.energyNearNyquist(near, fsRec / 2.0));
        }
        return near;
    }

    /** The -6 dB and -20 dB edges, and the centre and bandwidth by the convention. */
    private record Band(double lowerMhz, double upperMhz, Optional<Double> lower20, Optional<Double> upper20,
            double centreMhz, double bandwidthPercent) {}

    private static Band band(Spectrum spectrum, CentreFrequencyConvention convention, List<Warning> warnings,
            List<Reference> references) {
        double[] magnitude = spectrum.magnitude();
        int peakBin = spectrum.peakBin();
        double peakMagnitude = spectrum.peakMagnitude();
        double resolutionMhz = spectrum.resolutionMhz();
        Optional<Double> lower6 = lowerEdge(magnitude, peakBin, peakMagnitude * Decibels.toRatio(-6.0), resolutionMhz);
        Optional<Double> upper6 = upperEdge(magnitude, peakBin, peakMagnitude * Decibels.toRatio(-6.0), resolutionMhz);
        if (lower6.isEmpty() || upper6.isEmpty() || !(lower6.get() > 0.0)) {
            throw CalculationException.impossible("the record's spectrum does not fall 6 dB below its peak on both "
                    + "sides inside 0 Hz to the record's Nyquist frequency: no -6 dB band can be measured",
                    "samples");
        }
        double lowerMhz = lower6.get();
        double upperMhz = upper6.get();
        Optional<Double> lower20 = lowerEdge(magnitude, peakBin, peakMagnitude * Decibels.toRatio(-20.0), resolutionMhz);
        Optional<Double> upper20 = upperEdge(magnitude, peakBin, peakMagnitude * Decibels.toRatio(-20.0), resolutionMhz);
        if (lower20.isEmpty() || upper20.isEmpty()) {
            warnings.add(WaveformMessages.edge20NotFound(lower20.isEmpty()));
        }
        double centreMhz = convention.centreFromEdgesMhz(lowerMhz, upperMhz);
        double bandwidthPercent = (upperMhz - lowerMhz) / centreMhz * 100.0;
        references.add(Reference.of("centre frequency and bandwidth", Sources.CENTRE_FREQUENCY));
        return new Band(lowerMhz, upperMhz, lower20, upper20, centreMhz, bandwidthPercent);
    }

    /** The envelope's -6 dB and -20 dB durations and the -6 dB cycles. */
    private record Durations(Optional<Double> duration6, Optional<Double> duration20, Optional<Double> cycles6) {}

    private static Durations durations(Echo echo, double fsRec, double centreMhz, List<Warning> warnings,
            List<Reference> references) {
        double intervalRecUs = 1.0 / fsRec;
        Optional<Double> duration6 = duration(echo.envelope(), echo.peak(), echo.max() * Decibels.toRatio(-6.0),
                intervalRecUs);
        Optional<Double> duration20 = duration(echo.envelope(), echo.peak(), echo.max() * Decibels.toRatio(-20.0),
                intervalRecUs);
        if (duration6.isEmpty() || duration20.isEmpty()) {
            warnings.add(WaveformMessages.envelopeLevelNotReached(duration6.isEmpty()));
        }
        Optional<Double> cycles6 = duration6.map(d -> d * centreMhz);
        references.add(Reference.of("envelope and durations", Sources.WAVEFORM_ENVELOPE));
        return new Durations(duration6, duration20, cycles6);
    }

    /** The Gaussian model of the same centre and bandwidth; null (with a warning) at 200 % or more. */
    private static GaussianPulse gaussianModel(Band band, CentreFrequencyConvention convention,
            List<Warning> warnings, List<Reference> references) {
        GaussianPulse pulse = band.bandwidthPercent() < SamplingInput.MAX_BANDWIDTH_PERCENT_EXCLUSIVE
                ? convention.pulseModel(band.centreMhz(), band.bandwidthPercent() / 100.0) : null;
        if (pulse == null) {
            warnings.add(WaveformMessages.modelNotAvailable());
        } else {
            references.add(Reference.of("Gaussian model beside the record", Sources.WAVEFORM_MODEL));
        }
        return pulse;
    }

    private static WaveformResult.ModelFigures modelFigures(GaussianPulse pulse) {
        return pulse == null
                ? new WaveformResult.ModelFigures(Optional.empty(), Optional.empty())
                : new WaveformResult.ModelFigures(Optional.of(pulse.envelopeDurationUs(6.0)),
                        Optional.of(pulse.cycles(6.0)));
    }

    /** The figures at the target rate, and the record's loss there (whose samples the figure shows). */
    private record Target(WaveformResult.TargetFigures figures, RecordLoss loss) {
        static final Target NONE = new Target(null, RecordLoss.NONE);
    }

    private static Target target(WaveformInput in, Spectrum spectrum, BandLimitedRecord record, Band band,
            CentreFrequencyConvention convention, GaussianPulse pulse, List<Warning> warnings,
            List<Reference> references) {
        TargetClock at = targetClock(in);
        double above = energyAbove(spectrum.power(), spectrum.total(), at.nyquistMhz(), spectrum.resolutionMhz());
        references.add(Reference.of("energy above the target Nyquist frequency", Sources.WAVEFORM_ENERGY));
        RecordLoss loss = recordLoss(record, at, band.centreMhz(), warnings, references);
        Optional<Double> required = recordRequiredRate(in, record, at, band.centreMhz(), warnings, references);
        ModelAtTarget modelAt = pulse == null ? ModelAtTarget.none(in)
                : modelAtTarget(in, at, band, convention, loss.loss(), warnings);
        WaveformResult.TargetFigures figures = new WaveformResult.TargetFigures(
                at.clock().effectiveSamplingFrequencyMhz(), at.clock().effectiveSamplingFrequencyMhz() / band.centreMhz(),
                at.nyquistMhz(), loss.loss(), loss.phaseNs(), above, required, modelAt.loss(), modelAt.above(),
                modelAt.required(), at.m(), at.mode(), at.reading());
        return new Target(figures, loss);
    }

    /** The target clock with its options' defaults. */
    private record TargetClock(int m, DecimationMode mode, PeakReading reading, SampleClock clock) {
        double amplitudeMhz() {
            return clock.amplitudeSamplingFrequencyMhz();
        }

        double nyquistMhz() {
            return amplitudeMhz() / 2.0;
        }
    }

    private static TargetClock targetClock(WaveformInput in) {
        int m = in.decimationFactor() == null ? 1 : in.decimationFactor();
        DecimationMode mode = in.decimationMode() == null ? DecimationMode.DROP : in.decimationMode();
        PeakReading reading = in.peakReading() == null ? PeakReading.ABSOLUTE : in.peakReading();
        return new TargetClock(m, mode, reading, SampleClock.of(in.samplingFrequencyMhz(), m, mode));
    }

    /** The record's worst-phase loss at the target rate, its phase, and the target's samples at that phase. */
    private record RecordLoss(Optional<Double> loss, Optional<Double> phaseNs, double[] times, double[] values) {
        static final RecordLoss NONE = new RecordLoss(Optional.empty(), Optional.empty(), new double[0],
                new double[0]);
    }

    private static RecordLoss recordLoss(BandLimitedRecord record, TargetClock at, double centreMhz,
            List<Warning> warnings, List<Reference> references) {
        double amplitudeMhz = at.amplitudeMhz();
        RecordLoss result = RecordLoss.NONE;
        if (!(amplitudeMhz > 2.0 * centreMhz)) {
            warnings.add(WaveformMessages.pulseLossTooFewSamples(amplitudeMhz, centreMhz));
        } else {
            double[] worst;
            try {
                worst = record.worstCase(1.0 / amplitudeMhz, at.reading(), record.peak(at.reading()),
                        record.secondDerivativeBound(), SearchBudget.of(BandLimitedRecord.LOSS_SEARCH_BUDGET));
            } catch (SearchBudget.Exhausted e) {
                worst = null;
                warnings.add(WaveformMessages.lossSearchBound(e.limit()));
            }
            if (worst == null) {
                // reported above
            } else if (worst[0] > 0.0) {
                double intervalUs = 1.0 / amplitudeMhz;
                int count = (int) StrictMath.floor((record.spanUs() - worst[1]) / intervalUs) + 1;
                double[] targetTimes = new double[count];
                double[] targetValues = new double[count];
                for (int k = 0; k < count; k++) {
                    targetTimes[k] = worst[1] + k * intervalUs;
                    targetValues[k] = record.value(targetTimes[k]);
                }
                result = new RecordLoss(Optional.of(-Decibels.fromRatio(worst[0])), Optional.of(worst[1] * 1000.0),
                        targetTimes, targetValues);
            } else {
                warnings.add(WaveformMessages.noSampleAboveZero());
            }
        }
        references.add(Reference.of("pulse amplitude loss of the record", Sources.WAVEFORM_LOSS));
        return result;
    }

    /** The raw rate at which the record loses the tolerance; null without a tolerance. */
    private static Optional<Double> recordRequiredRate(WaveformInput in, BandLimitedRecord record, TargetClock at,
            double centreMhz, List<Warning> warnings, List<Reference> references) {
        if (in.amplitudeToleranceDb() == null) {
            return null;
        }
        Optional<Double> required = Optional.empty();
        try {
            double rateMhz = record.requiredRateMhz(in.amplitudeToleranceDb(), at.reading(), 2.0 * centreMhz,
                    RequiredPulseRate.SCAN_STEP_FRACTION, RequiredPulseRate.BISECTION_RELATIVE_TOLERANCE,
                    SearchBudget.of(BandLimitedRecord.RATE_SEARCH_BUDGET));
            required = Optional.of(at.clock().rawFrequencyForAmplitudeRateMhz(rateMhz));
        } catch (SearchBudget.Exhausted e) {
            warnings.add(WaveformMessages.rateSearchBound(e.limit()));
        }
        references.add(Reference.of("required sampling frequency for the record", Sources.WAVEFORM_REQUIRED_RATE));
        return required;
    }

    /** The Gaussian model's figures at the target rate (from the sampling assessment). */
    private record ModelAtTarget(Optional<Double> loss, Optional<Double> above, Optional<Double> required) {
        static ModelAtTarget none(WaveformInput in) {
            return new ModelAtTarget(Optional.empty(), Optional.empty(),
                    in.amplitudeToleranceDb() == null ? null : Optional.empty());
        }
    }

    private static ModelAtTarget modelAtTarget(WaveformInput in, TargetClock at, Band band,
            CentreFrequencyConvention convention, Optional<Double> loss, List<Warning> warnings) {
        int m = at.m();
        DecimationMode mode = at.mode();
        PeakReading reading = at.reading();
        double centreMhz = band.centreMhz();
        double bandwidthPercent = band.bandwidthPercent();
        Optional<Double> modelRequired = in.amplitudeToleranceDb() == null ? null : Optional.empty();
        boolean searchable = bandwidthPercent >= SamplingCalculator.MIN_BANDWIDTH_PERCENT_FOR_PULSE_RATE;
        SamplingResult s = SamplingCalculator.compute(SamplingInput
                .builder(in.samplingFrequencyMhz(), centreMhz)
                .decimationFactor(m)
                .decimationMode(mode)
                .bandwidthPercent(bandwidthPercent)
                .centreFrequencyConvention(convention)
                .peakReading(reading)
                .amplitudeToleranceDb(searchable ? in.amplitudeToleranceDb() : null).build());
        Optional<Double> modelLoss = s.pulseAmplitudeLossDb();
        Optional<Double> modelAbove = Optional.ofNullable(s.energyAboveNyquistFraction());
        if (in.amplitudeToleranceDb() != null) {
            modelRequired = s.requiredSamplingFrequencyPulseMhz() == null ? Optional.empty() : s.requiredSamplingFrequencyPulseMhz();
            if (!searchable) {
                warnings.add(WaveformMessages.modelRateNotSearched());
            }
        }
        for (Warning w : s.warnings()) {
            warnings.add(WaveformMessages.ofModel(w));
        }
        if (loss.isPresent() && modelLoss.isPresent() && loss.get() > modelLoss.get() + 0.1) {
            warnings.add(WaveformMessages.modelOptimistic(loss.get(), modelLoss.get()));
        }
        return new ModelAtTarget(modelLoss, modelAbove, modelRequired);
    }

    /** The series of the report figure: the record and its envelope, the target's samples, the spectrum in dB. */
    private static WaveformResult.Figure figure(double[] y, double[] envelope, RecordLoss loss, Spectrum spectrum,
            double fsRec) {
        int n = y.length;
        double intervalRecUs = 1.0 / fsRec;
        double[] times = new double[n];
        for (int i = 0; i < n; i++) {
            times[i] = i * intervalRecUs;
        }
        double[] magnitude = spectrum.magnitude();
        int bins = magnitude.length;
        double[] frequencies = new double[bins];
        double[] levels = new double[bins];
        for (int k = 0; k < bins; k++) {
            frequencies[k] = k * spectrum.resolutionMhz();
            levels[k] = magnitude[k] > 0.0 ? Decibels.fromRatio(magnitude[k] / spectrum.peakMagnitude()) : -400.0;
        }
        return new WaveformResult.Figure(times, y, envelope, loss.times(), loss.values(), frequencies, levels);
    }

    private static void notWithoutTarget(String field, Object value) {
        if (value != null) {
            throw CalculationException.notApplicable(field, field + " applies only with sampling_frequency_mhz (the "
                    + "target rate to judge the record at)");
        }
    }

    /** |analytic signal| of {@code y} (scipy.signal.hilbert), zero-padded to a power of two at or above 2n. */
    static double[] envelope(double[] y) {
        int n = y.length;
        int length = Fft.powerOfTwoAtLeast(2 * n);
        double[][] z = Fft.forward(y, length);
        int half = length / 2;
        for (int k = 1; k < half; k++) {
            z[0][k] *= 2.0;
            z[1][k] *= 2.0;
        }
        for (int k = half + 1; k < length; k++) {
            z[0][k] = 0.0;
            z[1][k] = 0.0;
        }
        Fft.inverseInPlace(z);
        double[] e = new double[n];
        for (int i = 0; i < n; i++) {
            e[i] = StrictMath.hypot(z[0][i], z[1][i]);
        }
        return e;
    }

    /** scipy.signal.windows.tukey(n, alpha), applied in place. */
    static void tukey(double[] y, double alpha) {
        int n = y.length;
        double width = alpha * (n - 1) / 2.0;
        for (int i = 0; i < n; i++) {
            double w = 1.0;
            if (i < width) {
                w = 0.5 * (1.0 + StrictMath.cos(StrictMath.PI * (i / width - 1.0)));
            } else if (i > n - 1 - width) {
                w = 0.5 * (1.0 + StrictMath.cos(StrictMath.PI * ((n - 1 - i) / width - 1.0)));
            }
            y[i] *= w;
        }
    }

    private static int argmax(double[] v, int from, int to) {
        int best = from;
        for (int i = from + 1; i <= to; i++) {
            if (v[i] > v[best]) {
                best = i;
            }
        }
        return best;
    }

    private static double energyAbove(double[] power, double total, double frequencyMhz, double resolutionMhz) {
        double sum = 0.0;
        for (int k = power.length - 1; k >= 0 && k * resolutionMhz > frequencyMhz; k--) {
            sum += power[k];
        }
        return sum / total;
    }

    static Optional<Double> upperEdge(double[] magnitude, int peak, double threshold, double resolutionMhz) {
        for (int k = peak + 1; k < magnitude.length; k++) {
            if (magnitude[k] < threshold) {
                double f = (magnitude[k - 1] - threshold) / (magnitude[k - 1] - magnitude[k]);
                return Optional.of((k - 1 + f) * resolutionMhz);
            }
        }
        return Optional.empty();
    }

    static Optional<Double> lowerEdge(double[] magnitude, int peak, double threshold, double resolutionMhz) {
        for (int k = peak - 1; k >= 0; k--) {
            if (magnitude[k] < threshold) {
                double f = (magnitude[k + 1] - threshold) / (magnitude[k + 1] - magnitude[k]);
                return Optional.of((k + 1 - f) * resolutionMhz);
            }
        }
        return Optional.empty();
    }

    static Optional<Double> duration(double[] envelope, int peak, double threshold, double intervalUs) {
        Optional<Double> left = lowerEdge(envelope, peak, threshold, intervalUs);
        Optional<Double> right = upperEdge(envelope, peak, threshold, intervalUs);
        return left.isPresent() && right.isPresent() ? Optional.of(right.get() - left.get()) : Optional.empty();
    }
}
