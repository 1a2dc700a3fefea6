package utdigit.core.waveform;

import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;
import utdigit.core.common.CalculationException;
import utdigit.core.common.Decibels;
import utdigit.core.common.MessageNumbers;
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

    private static final MathContext DIGITS = new MathContext(6);

    /** The analysis of {@code in}, with the contract's defaults applied. */
    public static WaveformResult analyse(WaveformInput in) {
        Objects.requireNonNull(in, "input");
        List<Warning> warnings = new ArrayList<>();
        List<Reference> references = new ArrayList<>();
        boolean withTarget = in.samplingFrequencyMhz() != null;
        if (!withTarget) {
            notWithoutTarget("decimation_factor", in.decimationFactor());
            notWithoutTarget("decimation_mode", in.decimationMode());
            notWithoutTarget("peak_reading", in.peakReading());
            notWithoutTarget("amplitude_tolerance_db", in.amplitudeToleranceDb());
        }
        CentreFrequencyConvention convention = in.centreFrequencyConvention() == null
                ? CentreFrequencyConvention.ARITHMETIC : in.centreFrequencyConvention();

        double fsRec = in.recordSamplingFrequencyMhz();
        double[] x = in.samples();
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

        // Envelope, and whether the echo lies wholly inside the record.
        double[] envelope = envelope(y);
        int envelopePeak = argmax(envelope, 0, n - 1);
        double envelopeMax = envelope[envelopePeak];
        double cutRatio = Decibels.toRatio(-CUT_LEVEL_DB);
        boolean cut = envelope[0] >= cutRatio * envelopeMax || envelope[n - 1] >= cutRatio * envelopeMax;
        WaveformResult.SpectrumWindow window = cut ? WaveformResult.SpectrumWindow.TUKEY_20
                : WaveformResult.SpectrumWindow.NONE;
        if (cut) {
            warnings.add(Warning.of(ECHO_CUT_BY_RECORD, String.format(Locale.ROOT,
                    "the envelope at an end of the record is within %s dB of its peak: the echo is cut by the record, "
                            + "so the spectrum is taken through a Tukey window (%s %% tapered) and its figures are "
                            + "approximate; record the whole echo", num(CUT_LEVEL_DB), num(100 * TUKEY_FRACTION))));
        }
        references.add(Reference.of("record preparation", Sources.WAVEFORM_PREPARATION));

        // Spectrum.
        double[] spectral = y.clone();
        if (cut) {
            tukey(spectral, TUKEY_FRACTION);
        }
        int length = StrictMath.max(1024, SPECTRUM_PADDING * Fft.powerOfTwoAtLeast(n));
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
        double peakMagnitude = magnitude[peakBin];
        double peakFrequencyMhz = peakBin * resolutionMhz;
        references.add(Reference.of("measured spectrum", Sources.WAVEFORM_SPECTRUM));

        double near = energyAbove(power, total, NEAR_NYQUIST_FRACTION * fsRec / 2.0, resolutionMhz);
        references.add(Reference.of("record adequacy", Sources.WAVEFORM_ADEQUACY));
        if (near > RECORD_NYQUIST_REFUSAL_FRACTION) {
            throw CalculationException.impossible(String.format(Locale.ROOT,
                    "the record holds %s of its spectral energy above %s MHz (0.8 of its own Nyquist frequency, "
                            + "record_sampling_frequency_mhz %s): it is sampled too slowly for its pulse (or the "
                            + "rate is wrong), so its spectrum may be aliased; record it at a higher rate",
                    num(near), num(NEAR_NYQUIST_FRACTION * fsRec / 2.0), num(fsRec)),
                    "samples", "record_sampling_frequency_mhz");
        }
        if (near > RECORD_NYQUIST_WARNING_FRACTION) {
            warnings.add(Warning.of(RECORD_ENERGY_NEAR_NYQUIST, String.format(Locale.ROOT,
                    "the record holds %s of its spectral energy above 0.8 of its own Nyquist frequency (%s MHz): "
                            + "noise or an under-sampled record; the measured figures may be affected",
                    num(near), num(fsRec / 2.0))));
        }

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
            warnings.add(Warning.of(EDGE_20DB_NOT_FOUND, "the spectrum does not fall 20 dB below its peak "
                    + (lower20.isEmpty() ? "above 0 Hz" : "below the record's Nyquist frequency")
                    + ": that -20 dB edge is null"));
        }
        double centreMhz = convention.centreFromEdgesMhz(lowerMhz, upperMhz);
        double bandwidthPercent = (upperMhz - lowerMhz) / centreMhz * 100.0;
        references.add(Reference.of("centre frequency and bandwidth", Sources.CENTRE_FREQUENCY));

        // Envelope durations.
        double intervalRecUs = 1.0 / fsRec;
        Optional<Double> duration6 = duration(envelope, envelopePeak, envelopeMax * Decibels.toRatio(-6.0), intervalRecUs);
        Optional<Double> duration20 = duration(envelope, envelopePeak, envelopeMax * Decibels.toRatio(-20.0), intervalRecUs);
        if (duration6.isEmpty() || duration20.isEmpty()) {
            warnings.add(Warning.of(ENVELOPE_LEVEL_NOT_REACHED, "the envelope does not fall "
                    + (duration6.isEmpty() ? "6" : "20") + " dB below its peak on both sides inside the record: "
                    + (duration6.isEmpty() ? "pulse_duration_6db_us, cycles_6db and pulse_duration_20db_us are null"
                    : "pulse_duration_20db_us is null")));
        }
        Optional<Double> cycles6 = duration6.map(d -> d * centreMhz);
        references.add(Reference.of("envelope and durations", Sources.WAVEFORM_ENVELOPE));

        // The Gaussian model of the same centre and bandwidth.
        GaussianPulse pulse = bandwidthPercent < SamplingInput.MAX_BANDWIDTH_PERCENT_EXCLUSIVE
                ? convention.pulseModel(centreMhz, bandwidthPercent / 100.0) : null;
        WaveformResult.ModelFigures model = pulse == null
                ? new WaveformResult.ModelFigures(Optional.empty(), Optional.empty())
                : new WaveformResult.ModelFigures(Optional.of(pulse.envelopeDurationUs(6.0)),
                        Optional.of(pulse.cycles(6.0)));
        if (pulse == null) {
            warnings.add(Warning.of(MODEL_NOT_AVAILABLE, "the measured bandwidth is 200 % or more: no Gaussian "
                    + "pulse model of it is formed, so the model_ figures are null"));
        } else {
            references.add(Reference.of("Gaussian model beside the record", Sources.WAVEFORM_MODEL));
        }

        BandLimitedRecord record = new BandLimitedRecord(y, fsRec);
        WaveformResult.TargetFigures target = null;
        double[] targetTimes = new double[0];
        double[] targetValues = new double[0];
        if (withTarget) {
            int m = in.decimationFactor() == null ? 1 : in.decimationFactor();
            DecimationMode mode = in.decimationMode() == null ? DecimationMode.DROP : in.decimationMode();
            PeakReading reading = in.peakReading() == null ? PeakReading.ABSOLUTE : in.peakReading();
            SampleClock clock = SampleClock.of(in.samplingFrequencyMhz(), m, mode);
            double amplitudeMhz = clock.amplitudeSamplingFrequencyMhz();
            double nyquistMhz = amplitudeMhz / 2.0;
            double samplesPerPeriod = clock.effectiveSamplingFrequencyMhz() / centreMhz;
            double above = energyAbove(power, total, nyquistMhz, resolutionMhz);
            references.add(Reference.of("energy above the target Nyquist frequency", Sources.WAVEFORM_ENERGY));
            double peak = record.peak(reading);
            double m2 = record.secondDerivativeBound();
            Optional<Double> loss = Optional.empty();
            Optional<Double> phaseNs = Optional.empty();
            if (!(amplitudeMhz > 2.0 * centreMhz)) {
                warnings.add(Warning.of(PULSE_LOSS_NOT_DEFINED, String.format(Locale.ROOT,
                        "pulse_amplitude_loss_db is null: the rate that decides amplitude (%s MHz) gives 2 or fewer "
                                + "samples per period of the measured centre frequency (%s MHz)",
                        num(amplitudeMhz), num(centreMhz))));
            } else {
                double[] worst;
                try {
                    worst = record.worstCase(1.0 / amplitudeMhz, reading, peak, m2,
                            SearchBudget.of(BandLimitedRecord.LOSS_SEARCH_BUDGET));
                } catch (SearchBudget.Exhausted e) {
                    worst = null;
                    warnings.add(Warning.of(SamplingCalculator.SEARCH_BOUND_REACHED, String.format(Locale.ROOT,
                            "pulse_amplitude_loss_db is null: the search over the sampling phase reached its bound "
                                    + "of %d values of the reconstructed record", e.limit())));
                }
                if (worst == null) {
                    // reported above
                } else if (worst[0] > 0.0) {
                    loss = Optional.of(-Decibels.fromRatio(worst[0]));
                    phaseNs = Optional.of(worst[1] * 1000.0);
                    double intervalUs = 1.0 / amplitudeMhz;
                    int count = (int) StrictMath.floor((record.spanUs() - worst[1]) / intervalUs) + 1;
                    targetTimes = new double[count];
                    targetValues = new double[count];
                    for (int k = 0; k < count; k++) {
                        targetTimes[k] = worst[1] + k * intervalUs;
                        targetValues[k] = record.value(targetTimes[k]);
                    }
                } else {
                    warnings.add(Warning.of(PULSE_LOSS_NOT_DEFINED, "pulse_amplitude_loss_db is null: at some "
                            + "sampling phase no sample reads above zero"));
                }
            }
            references.add(Reference.of("pulse amplitude loss of the record", Sources.WAVEFORM_LOSS));

            Optional<Double> required = null;
            if (in.amplitudeToleranceDb() != null) {
                required = Optional.empty();
                try {
                    double rateMhz = record.requiredRateMhz(in.amplitudeToleranceDb(), reading, 2.0 * centreMhz,
                            RequiredPulseRate.SCAN_STEP_FRACTION, RequiredPulseRate.BISECTION_RELATIVE_TOLERANCE,
                            SearchBudget.of(BandLimitedRecord.RATE_SEARCH_BUDGET));
                    required = Optional.of(clock.rawFrequencyForAmplitudeRateMhz(rateMhz));
                } catch (SearchBudget.Exhausted e) {
                    warnings.add(Warning.of(SamplingCalculator.SEARCH_BOUND_REACHED, String.format(Locale.ROOT,
                            "required_sampling_frequency_pulse_mhz is null: the search for the record's rate reached "
                                    + "its bound of %d values of the reconstructed record (amplitude_tolerance_db too "
                                    + "small to resolve on this record)", e.limit())));
                }
                references.add(Reference.of("required sampling frequency for the record", Sources.WAVEFORM_REQUIRED_RATE));
            }

            Optional<Double> modelLoss = Optional.empty();
            Optional<Double> modelAbove = Optional.empty();
            Optional<Double> modelRequired = in.amplitudeToleranceDb() == null ? null : Optional.empty();
            if (pulse != null) {
                boolean searchable = bandwidthPercent >= SamplingCalculator.MIN_BANDWIDTH_PERCENT_FOR_PULSE_RATE;
                SamplingResult s = SamplingCalculator.compute(SamplingInput
                        .builder(in.samplingFrequencyMhz(), centreMhz)
                        .decimationFactor(m)
                        .decimationMode(mode)
                        .bandwidthPercent(bandwidthPercent)
                        .centreFrequencyConvention(convention)
                        .peakReading(reading)
                        .amplitudeToleranceDb(searchable ? in.amplitudeToleranceDb() : null).build());
                modelLoss = s.pulseAmplitudeLossDb();
                modelAbove = Optional.ofNullable(s.energyAboveNyquistFraction());
                if (in.amplitudeToleranceDb() != null) {
                    modelRequired = s.requiredSamplingFrequencyPulseMhz() == null ? Optional.empty() : s.requiredSamplingFrequencyPulseMhz();
                    if (!searchable) {
                        warnings.add(Warning.of(MODEL_NOT_AVAILABLE, "model_required_sampling_frequency_pulse_mhz is "
                                + "null: the model's rate search covers bandwidths of 1 % and above"));
                    }
                }
                for (Warning w : s.warnings()) {
                    warnings.add(Warning.of(w.code(), "Gaussian model: " + w.message()));
                }
                if (loss.isPresent() && modelLoss.isPresent() && loss.get() > modelLoss.get() + 0.1) {
                    warnings.add(Warning.of(MODEL_OPTIMISTIC, String.format(Locale.ROOT,
                            "the record loses %s dB at this rate, the Gaussian model of its band %s dB: the model is "
                                    + "optimistic for this probe; judge the setting on the record",
                            num(loss.get()), num(modelLoss.get()))));
                }
            }
            target = new WaveformResult.TargetFigures(clock.effectiveSamplingFrequencyMhz(), samplesPerPeriod,
                    nyquistMhz, loss, phaseNs, above, required, modelLoss, modelAbove, modelRequired, m, mode,
                    reading);
        }

        // Figure series.
        double[] times = new double[n];
        for (int i = 0; i < n; i++) {
            times[i] = i * intervalRecUs;
        }
        double[] frequencies = new double[bins];
        double[] levels = new double[bins];
        for (int k = 0; k < bins; k++) {
            frequencies[k] = k * resolutionMhz;
            levels[k] = magnitude[k] > 0.0 ? Decibels.fromRatio(magnitude[k] / peakMagnitude) : -400.0;
        }
        WaveformResult.Figure figure = new WaveformResult.Figure(times, y, envelope, targetTimes, targetValues,
                frequencies, levels);
        return new WaveformResult(n, resolutionMhz, window, peakFrequencyMhz, lowerMhz, upperMhz, lower20, upper20,
                centreMhz, bandwidthPercent, duration6, duration20, cycles6, near, model, target, convention, figure,
                warnings, references);
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

    private static String num(double value) {
        return MessageNumbers.plain(value, DIGITS);
    }
}
