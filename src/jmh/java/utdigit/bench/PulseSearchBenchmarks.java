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
import utdigit.core.sampling.PeakReading;
import utdigit.core.sampling.RequiredPulseRate;
import utdigit.core.sampling.SamplingCalculator;
import utdigit.core.sampling.SamplingInput;
import utdigit.core.sampling.SamplingResult;

/**
 * The numerical pulse model: the sampling assessment with a bandwidth (the worst sampled peak of
 * the Gaussian pulse over the sampling phase; target under 50 us) and its inverse, the rate that
 * keeps that loss within a dB tolerance (target under 5 ms). A 5 MHz probe sampled at 25 MHz
 * (5 samples per period), at 60 % and 30 % bandwidth; a 1 dB tolerance.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.SampleTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
public class PulseSearchBenchmarks {
    @Param({"60", "30"})
    public double bandwidthPercent;

    private SamplingInput search;
    private SamplingInput searchAndInverse;
    private GaussianPulse pulse;

    @Setup
    public void setUp() {
        search = SamplingInput.builder(25.0, 5.0).bandwidthPercent(bandwidthPercent).build();
        searchAndInverse = search.toBuilder().amplitudeToleranceDb(1.0).build();
        pulse = GaussianPulse.of(5.0, bandwidthPercent / 100.0);
    }

    /** The sampling assessment with a bandwidth: pulse loss, band edges, aliasing figures. */
    @Benchmark
    public SamplingResult samplingPulseModel() {
        return SamplingCalculator.compute(search);
    }

    /** The inverse alone: the amplitude-deciding rate for a 1 dB limit, RF, absolute peak. */
    @Benchmark
    public RequiredPulseRate.RfSolution requiredPulseRate() {
        return RequiredPulseRate.forRf(pulse, PeakReading.ABSOLUTE, 1.0);
    }

    /** A whole request that asks for both (what POST /api/sampling-assessments does). */
    @Benchmark
    public SamplingResult samplingPulseModelWithTolerance() {
        return SamplingCalculator.compute(searchAndInverse);
    }
}
