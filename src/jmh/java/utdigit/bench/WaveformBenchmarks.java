package utdigit.bench;

import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import utdigit.core.pulse.GaussianPulse;
import utdigit.core.waveform.WaveformAnalyzer;
import utdigit.core.waveform.WaveformInput;
import utdigit.core.waveform.WaveformResult;

/**
 * Measured waveforms: the analysis of a recorded pulse (spectrum, envelope, worst-phase loss at a
 * target rate by band-limited reconstruction) and with a tolerance (the rate search on the record).
 * A 5 MHz, 60 % Gaussian record at 100 MHz judged at 25 MHz within 1 dB, of 400 samples and of the
 * largest record, 8192 samples (the bound on the work of one answer).
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.SampleTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class WaveformBenchmarks {
    @Param({"400", "8192"})
    public int samples;

    private WaveformInput analysis;
    private WaveformInput analysisWithTolerance;

    @Setup
    public void setUp() {
        GaussianPulse g = GaussianPulse.of(5.0, 0.6);
        double[] x = new double[samples];
        for (int i = 0; i < samples; i++) {
            x[i] = g.amplitude((i - samples / 2.0 - 0.3) / 100.0);
        }
        analysis = WaveformInput.builder(x, 100.0).samplingFrequencyMhz(25.0).build();
        analysisWithTolerance = WaveformInput.builder(x, 100.0).samplingFrequencyMhz(25.0).amplitudeToleranceDb(1.0)
                .build();
    }

    /** Spectrum, envelope and the loss at the target rate. */
    @Benchmark
    public WaveformResult waveformAnalysis() {
        return WaveformAnalyzer.analyse(analysis);
    }

    /** The same with the rate for a 1 dB tolerance searched on the record. */
    @Benchmark
    public WaveformResult waveformAnalysisWithTolerance() {
        return WaveformAnalyzer.analyse(analysisWithTolerance);
    }
}
