package utdigit.bench;

import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import utdigit.core.arrays.ArrayApertureCalculator;
import utdigit.core.arrays.ArrayApertureInput;
import utdigit.core.arrays.ArrayApertureResult;
import utdigit.core.coverage.ScanCoverageCalculator;
import utdigit.core.coverage.ScanCoverageInput;
import utdigit.core.coverage.ScanCoverageResult;
import utdigit.core.dac.DacQuantizationCalculator;
import utdigit.core.dac.DacQuantizationInput;
import utdigit.core.dac.DacQuantizationResult;
import utdigit.core.timing.TofdSetupCalculator;
import utdigit.core.timing.TofdSetupInput;
import utdigit.core.timing.TofdSetupResult;

/**
 * The scan coverage, array aperture, TOFD set-up and DAC calculators, one call each with every
 * optional input given. Target (src/docs/performance.md): closed form, under 2 us median.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.SampleTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
public class SetupCalculatorBenchmarks {
    private ScanCoverageInput coverage;
    private ArrayApertureInput array;
    private TofdSetupInput tofd;
    private DacQuantizationInput dac;

    @Setup
    public void setUp() {
        coverage = ScanCoverageInput.ofProbe(5.0, 5920.0, 10.0, 60.0).withScanIncrementMm(1.0).withIndexStepMm(4.0)
                .withAngularStepDeg(1.0).withAmplitudeToleranceDb(1.0);
        array = ArrayApertureInput.of(5.0, 5920.0, 0.6).withActiveElements(16).withElementLengthMm(10.0)
                .withMaxSteeringAngleDeg(45.0);
        tofd = TofdSetupInput.of(5920.0, 70.0, 30.0).withGate(10.0, 16.5).withPulseDurationUs(0.4)
                .withMeasuredTimeUs(13.9).withSampling(100.0, null, null).withSeparationUncertaintyMm(0.5);
        dac = DacQuantizationInput.of(8, 30.0, 80.0).withAmplitudeToleranceDb(1.0);
    }

    @Benchmark
    public ScanCoverageResult scanCoverage() {
        return ScanCoverageCalculator.compute(coverage);
    }

    @Benchmark
    public ArrayApertureResult arrayAperture() {
        return ArrayApertureCalculator.compute(array);
    }

    @Benchmark
    public TofdSetupResult tofdSetup() {
        return TofdSetupCalculator.compute(tofd);
    }

    @Benchmark
    public DacQuantizationResult dacQuantization() {
        return DacQuantizationCalculator.compute(dac);
    }
}
