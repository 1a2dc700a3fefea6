package utdigit.core.waveform;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.apache.commons.math3.special.Erf;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.MethodSource;
import utdigit.core.common.CalculationException;
import utdigit.core.pulse.CentreFrequencyConvention;
import utdigit.core.pulse.GaussianPulse;
import utdigit.core.pulse.RealPulseSpectrum;
import utdigit.core.sampling.PeakReading;
import utdigit.core.sampling.PulseSamplingLoss;
import utdigit.core.sampling.RequiredPulseRate;

/**
 * The measured-waveform analysis against outside sources: NumPy and SciPy figures of test waveforms
 * (src/test/resources/reference/waveforms, made by src/test/python/waveform_reference.py: numpy.fft,
 * scipy.signal.hilbert, scipy.signal.resample with a brute-force phase search), and the closed forms of
 * the Gaussian pulse model (scipy.signal.gausspulse parameterisation) for records of that pulse: a
 * Gaussian record must give the model back.
 */
class WaveformAnalyzerTest {
    private static final Path REFERENCE = Path.of("src/test/resources/reference/waveforms");
    private static final double RECORD_MHZ = 100.0;
    private static final double TARGET_MHZ = 25.0;

    // ---------------------------------------------------------------- NumPy / SciPy references

    static Stream<Map<String, String>> numpyReferences() throws IOException {
        List<String> lines = Files.readAllLines(REFERENCE.resolve("waveform-numpy-scipy.csv")).stream()
                .filter(l -> !l.startsWith("#")).toList();
        String[] header = lines.get(0).split(",", -1);
        return lines.stream().skip(1).map(l -> {
            String[] cells = l.split(",", -1);
            Map<String, String> row = new HashMap<>();
            for (int i = 0; i < header.length; i++) {
                row.put(header[i], cells[i]);
            }
            return row;
        });
    }

    static double[] samples(String name) throws IOException {
        return Files.readAllLines(REFERENCE.resolve(name + ".csv")).stream().skip(1)
                .mapToDouble(Double::parseDouble).toArray();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("numpyReferences")
    void agreesWithNumpyAndScipy(Map<String, String> ref) throws IOException {
        String name = ref.get("name");
        WaveformResult r = WaveformAnalyzer.analyse(WaveformInput.builder(samples(name), RECORD_MHZ)
                .samplingFrequencyMhz(TARGET_MHZ).build());
        WaveformResult p = WaveformAnalyzer.analyse(WaveformInput.builder(samples(name), RECORD_MHZ)
                .samplingFrequencyMhz(TARGET_MHZ)
                .peakReading(PeakReading.POSITIVE_PEAK).build());
        // numpy.fft.rfft on the same zero-padded length: the same bin, edges to rounding.
        assertThat(r.spectrumWindow().name()).as("window").isEqualTo(ref.get("window"));
        assertThat(r.peakFrequencyMhz()).as("peak").isCloseTo(d(ref, "peak_frequency_mhz"), within(1e-12));
        assertThat(r.lowerFrequencyMhz()).as("fl").isCloseTo(d(ref, "lower_frequency_mhz"), within(1e-9));
        assertThat(r.upperFrequencyMhz()).as("fu").isCloseTo(d(ref, "upper_frequency_mhz"), within(1e-9));
        assertThat(r.lowerFrequency20dbMhz().orElseThrow()).isCloseTo(d(ref, "lower_frequency_20db_mhz"), within(1e-9));
        assertThat(r.upperFrequency20dbMhz().orElseThrow()).isCloseTo(d(ref, "upper_frequency_20db_mhz"), within(1e-9));
        assertThat(r.energyNearRecordNyquistFraction()).as("near Nyquist")
                .isCloseTo(d(ref, "energy_near_record_nyquist_fraction"),
                        within(1e-9 * d(ref, "energy_near_record_nyquist_fraction") + 1e-15));
        assertThat(r.target().energyAboveNyquistFraction()).as("above target Nyquist")
                .isCloseTo(d(ref, "energy_above_nyquist_fraction"), within(1e-9 * d(ref, "energy_above_nyquist_fraction") + 1e-15));
        // scipy.signal.hilbert on the same padded length.
        assertThat(r.pulseDuration6dbUs().orElseThrow()).as("-6 dB duration")
                .isCloseTo(d(ref, "pulse_duration_6db_us"), within(1e-9));
        if (ref.get("pulse_duration_20db_us").isEmpty()) {
            assertThat(r.pulseDuration20dbUs()).isEmpty();
            assertThat(r.hasWarning(WaveformAnalyzer.ENVELOPE_LEVEL_NOT_REACHED)).isTrue();
        } else {
            assertThat(r.pulseDuration20dbUs().orElseThrow()).isCloseTo(d(ref, "pulse_duration_20db_us"), within(1e-9));
        }
        // scipy.signal.resample, 1024 points per sample, brute force over every fine phase: its own
        // discretisation is within about 0.001 dB of the continuous worst case.
        assertThat(r.target().pulseAmplitudeLossDb().orElseThrow()).as("ABSOLUTE loss")
                .isCloseTo(d(ref, "loss_absolute_db"), within(0.002));
        assertThat(p.target().pulseAmplitudeLossDb().orElseThrow()).as("POSITIVE_PEAK loss")
                .isCloseTo(d(ref, "loss_positive_peak_db"), within(0.002));
    }

    private static double d(Map<String, String> row, String column) {
        return Double.parseDouble(row.get(column));
    }

    // ---------------------------------------------------------------- a Gaussian record gives the model back

    /** A record of the Gaussian pulse model, peak off the sample grid. */
    static double[] gaussianRecord(GaussianPulse g, int n, double recordMhz) {
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = g.amplitude((i - n / 2.0 - 0.37) / recordMhz);
        }
        return x;
    }

    /**
     * Stated tolerances of a Gaussian record against the model: edges within 0.3 % of fc (the linear
     * interpolation between bins of the zero-padded spectrum), durations within 0.2 % (linear
     * interpolation between envelope samples at 20 samples per period; 1 % above 80 % bandwidth),
     * losses within 0.002 dB (0.005 dB above 80 %)
     * (reconstruction and phase search), required rate within 3e-4 (both bisected to 1e-4; 1e-3 above 80 %).
     */
    @ParameterizedTest(name = "{0} MHz, {1} %, {2}")
    @CsvSource({"5, 60, ARITHMETIC", "5, 30, ARITHMETIC", "2.25, 90, ARITHMETIC", "10, 45, GEOMETRIC", "5, 60, GEOMETRIC"})
    void aGaussianRecordGivesTheModelBack(double fcMhz, double bandwidthPercent, CentreFrequencyConvention convention) {
        GaussianPulse g = GaussianPulse.of(fcMhz, bandwidthPercent / 100.0);
        double recordMhz = 20.0 * fcMhz;
        int n = (int) StrictMath.ceil(12.0 * g.envelopeDurationUs(40.0) * recordMhz / 2.0) * 2;
        double targetMhz = 4.6 * fcMhz;
        WaveformResult r = WaveformAnalyzer.analyse(WaveformInput.builder(gaussianRecord(g, n, recordMhz), recordMhz)
                .centreFrequencyConvention(convention)
                .samplingFrequencyMhz(targetMhz)
                .amplitudeToleranceDb(1.0).build());
        double tolMhz = 0.003 * fcMhz;
        // Model edges (scipy.signal.gausspulse parameterisation): -6 dB at fc(1 -/+ bw/2); the real pulse's
        // lower edges from its two-sided spectrum (RealPulseSpectrum, solved by Commons Math BrentSolver).
        assertThat(r.lowerFrequencyMhz()).isCloseTo(RealPulseSpectrum.lowerEdgeMhz(g, 6.0).orElseThrow(), within(tolMhz));
        assertThat(r.upperFrequencyMhz()).isCloseTo(g.upperEdgeMhz(6.0), within(tolMhz));
        assertThat(r.lowerFrequency20dbMhz().orElseThrow())
                .isCloseTo(RealPulseSpectrum.lowerEdgeMhz(g, 20.0).orElseThrow(), within(tolMhz));
        assertThat(r.upperFrequency20dbMhz().orElseThrow()).isCloseTo(g.upperEdgeMhz(20.0), within(tolMhz));
        // The top of a broad spectrum is flat (1 % of fc off the peak is 0.003 dB down at 90 %), so the small
        // ripple of the mean removal moves the largest bin: the peak within 1 % of fc.
        assertThat(r.peakFrequencyMhz()).isCloseTo(RealPulseSpectrum.peakFrequencyMhz(g), within(0.01 * fcMhz));
        double fl = r.lowerFrequencyMhz();
        double fu = r.upperFrequencyMhz();
        double expectedCentre = convention == CentreFrequencyConvention.ARITHMETIC ? (fl + fu) / 2 : StrictMath.sqrt(fl * fu);
        assertThat(r.centreFrequencyMhz()).isCloseTo(expectedCentre, within(1e-12));
        assertThat(r.bandwidthPercent()).isCloseTo((fu - fl) / expectedCentre * 100, within(1e-9));
        // Envelope duration 2 sqrt(-ln r / a) of the model; for broad bands the analytic-signal envelope departs
        // from exp(-a t^2) as the spectrum reaches 0 Hz (Bedrosian's condition fails): 0.4 % (-6 dB) and 0.6 % (-20 dB) at 90 %.
        double durationTolerance = bandwidthPercent > 80 ? 0.01 : 0.002;
        assertThat(r.pulseDuration6dbUs().orElseThrow()).isCloseTo(g.envelopeDurationUs(6.0),
                within(durationTolerance * g.envelopeDurationUs(6.0)));
        assertThat(r.pulseDuration20dbUs().orElseThrow()).isCloseTo(g.envelopeDurationUs(20.0),
                within(durationTolerance * g.envelopeDurationUs(20.0)));
        // Worst phase of the model pulse (PulseSamplingLoss, checked against scipy in the sampling tests).
        double modelLoss = PulseSamplingLoss.rfLossDb(g, 1.0 / targetMhz, PeakReading.ABSOLUTE);
        // Above 80 % the pulse holds DC (its spectrum at 0 Hz is 2 exp(-4 ln 2/bw^2) of the peak, 0.065 at 90 %): the
        // mean removed from the record shifts it by about 1e-3 of its peak, so 0.005 dB there.
        double lossTolerance = bandwidthPercent > 80 ? 0.005 : 0.002;
        assertThat(r.target().pulseAmplitudeLossDb().orElseThrow()).isCloseTo(modelLoss, within(lossTolerance));
        double required = RequiredPulseRate.forRf(g, PeakReading.ABSOLUTE, 1.0).amplitudeSamplingFrequencyMhz();
        assertThat(r.target().requiredSamplingFrequencyPulseMhz().orElseThrow()).isCloseTo(required,
                within((bandwidthPercent > 80 ? 1e-3 : 3e-4) * required));
        // The model figures beside them are the sampling calculator's for the measured band, so they
        // agree with the true model's to the band's measurement error.
        assertThat(r.target().modelPulseAmplitudeLossDb().orElseThrow()).isCloseTo(modelLoss, within(0.01));
        assertThat(r.hasWarning(WaveformAnalyzer.MODEL_OPTIMISTIC)).isFalse();
    }

    @Test
    void energyAboveTheTargetNyquistIsTheModelsForAGaussianRecord() {
        GaussianPulse g = GaussianPulse.of(5.0, 0.6);
        WaveformResult r = WaveformAnalyzer.analyse(
                WaveformInput.builder(gaussianRecord(g, 800, RECORD_MHZ), RECORD_MHZ).samplingFrequencyMhz(12.0).build());
        // 0.5 erfc((fs/2 - fc)/(sigma_f sqrt 2)), sigma_f = sqrt(a)/(2 pi) (Gaussian power spectrum; Commons Math
        // Erf); the negative-frequency image adds about 1e-9 at 60 % (RealPulseSpectrum.imageRatio).
        double z = (6.0 - 5.0) / (g.powerSpectrumSigmaMhz() * StrictMath.sqrt(2.0));
        assertThat(r.target().energyAboveNyquistFraction()).isCloseTo(0.5 * Erf.erfc(z), within(1e-4));
        assertThat(r.target().modelEnergyAboveNyquistFraction().orElseThrow()).isCloseTo(0.5 * Erf.erfc(z), within(1e-3));
    }

    @Test
    void theRequiredRateKeepsTheLossWithinTheToleranceAndASlightlySlowerOneDoesNot() throws IOException {
        // The definition (the rate above which every rate passes), read back at the answer for the ringing record.
        double[] x = samples("ringing-5mhz");
        WaveformResult r = WaveformAnalyzer.analyse(WaveformInput.builder(x, RECORD_MHZ).samplingFrequencyMhz(25.0)
                .amplitudeToleranceDb(1.0).build());
        double rate = r.target().requiredSamplingFrequencyPulseMhz().orElseThrow();
        double at = WaveformAnalyzer.analyse(WaveformInput.builder(x, RECORD_MHZ).samplingFrequencyMhz(rate).build())
                .target().pulseAmplitudeLossDb().orElseThrow();
        double below = WaveformAnalyzer.analyse(WaveformInput.builder(x, RECORD_MHZ)
                .samplingFrequencyMhz(rate * (1 - 3e-4)).build()).target().pulseAmplitudeLossDb().orElseThrow();
        assertThat(at).isLessThanOrEqualTo(1.0);
        assertThat(below).isGreaterThan(1.0);
    }

    @Test
    void aDcOffsetChangesNothing() throws IOException {
        WaveformResult plain = WaveformAnalyzer.analyse(WaveformInput.builder(samples("gaussian-5mhz-60"), RECORD_MHZ)
                .samplingFrequencyMhz(TARGET_MHZ)
                .amplitudeToleranceDb(1.0).build());
        WaveformResult offset = WaveformAnalyzer.analyse(
                WaveformInput.builder(samples("gaussian-5mhz-60-dc-offset"), RECORD_MHZ)
                        .samplingFrequencyMhz(TARGET_MHZ).amplitudeToleranceDb(1.0).build());
        // Removing the mean (definition): the same record up to the rounding of the offset.
        assertThat(offset.lowerFrequencyMhz()).isCloseTo(plain.lowerFrequencyMhz(), within(1e-9));
        assertThat(offset.pulseDuration6dbUs().orElseThrow()).isCloseTo(plain.pulseDuration6dbUs().orElseThrow(), within(1e-9));
        assertThat(offset.target().pulseAmplitudeLossDb().orElseThrow())
                .isCloseTo(plain.target().pulseAmplitudeLossDb().orElseThrow(), within(1e-9));
    }

    @Test
    void anEchoCutByTheRecordIsWindowedAndSaidSo() throws IOException {
        WaveformResult r = WaveformAnalyzer.analyse(WaveformInput.of(samples("gaussian-cut-by-record"), RECORD_MHZ));
        assertThat(r.spectrumWindow()).isEqualTo(WaveformResult.SpectrumWindow.TUKEY_20);
        assertThat(r.hasWarning(WaveformAnalyzer.ECHO_CUT_BY_RECORD)).isTrue();
    }

    @Test
    void noiseNearTheRecordsNyquistIsWarnedAbout() throws IOException {
        WaveformResult r = WaveformAnalyzer.analyse(WaveformInput.of(samples("gaussian-5mhz-60-noise"), RECORD_MHZ));
        // numpy: 8.0e-4 of the energy above 40 MHz, over the warning threshold 1e-4, under the refusal 1e-2.
        assertThat(r.hasWarning(WaveformAnalyzer.RECORD_ENERGY_NEAR_NYQUIST)).isTrue();
    }

    @Test
    void anUndersampledRecordIsRefused() {
        GaussianPulse g = GaussianPulse.of(5.0, 0.6);
        // At 12 MHz the 5 MHz, 60 % band (upper -20 dB edge 7.7 MHz) folds past 0.8 x 6 MHz.
        assertThatThrownBy(() -> WaveformAnalyzer.analyse(WaveformInput.of(gaussianRecord(g, 128, 12.0), 12.0)))
                .isInstanceOf(CalculationException.class).hasMessageContaining("Nyquist");
    }

    @Test
    void boundedInputIsRefusedAtItsField() {
        assertThatThrownBy(() -> WaveformInput.of(new double[WaveformInput.MIN_SAMPLES - 1], RECORD_MHZ))
                .isInstanceOf(CalculationException.class).hasMessageContaining("samples");
        assertThatThrownBy(() -> WaveformInput.of(new double[WaveformInput.MAX_SAMPLES + 1], RECORD_MHZ))
                .isInstanceOf(CalculationException.class).hasMessageContaining("samples");
        double[] nan = new double[32];
        nan[3] = Double.NaN;
        assertThatThrownBy(() -> WaveformInput.of(nan, RECORD_MHZ)).isInstanceOf(CalculationException.class);
        assertThatThrownBy(() -> WaveformAnalyzer.analyse(WaveformInput.of(new double[32], RECORD_MHZ)))
                .isInstanceOf(CalculationException.class).hasMessageContaining("no pulse");
        assertThatThrownBy(() -> WaveformAnalyzer.analyse(
                WaveformInput.builder(gaussianRecord(GaussianPulse.of(5, 0.6), 64, RECORD_MHZ), RECORD_MHZ)
                        .decimationFactor(2).build()))
                .isInstanceOf(CalculationException.class).hasMessageContaining("decimation_factor");
    }

    @Test
    void theLargestRecordIsAnalysedWithATolerance() {
        // Bounded work: the largest record with a tolerance search completes (speed is a benchmark's matter).
        GaussianPulse g = GaussianPulse.of(5.0, 0.6);
        WaveformResult r = WaveformAnalyzer.analyse(WaveformInput.builder(gaussianRecord(g, WaveformInput.MAX_SAMPLES,
                RECORD_MHZ), RECORD_MHZ).samplingFrequencyMhz(TARGET_MHZ).amplitudeToleranceDb(1.0).build());
        assertThat(r.target().pulseAmplitudeLossDb().orElseThrow())
                .isCloseTo(PulseSamplingLoss.rfLossDb(g, 1.0 / TARGET_MHZ, PeakReading.ABSOLUTE), within(0.002));
    }
}
