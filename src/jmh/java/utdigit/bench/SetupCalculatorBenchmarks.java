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
        coverage = ScanCoverageInput.builder().frequencyMhz(5.0).velocityMPerS(5920.0).elementDiameterMm(10.0)
                .soundPathMm(60.0).scanIncrementMm(1.0).indexStepMm(4.0)
                .angularStepDeg(1.0).amplitudeToleranceDb(1.0).build();
        array = ArrayApertureInput.builder(5.0, 5920.0, 0.6).activeElements(16).elementLengthMm(10.0)
                .maxSteeringAngleDeg(45.0).build();
        tofd = TofdSetupInput.builder(5920.0, 70.0, 30.0).gateStartUs(10.0).gateEndUs(16.5).pulseDurationUs(0.4)
                .measuredTimeUs(13.9).samplingFrequencyMhz(100.0).probeCentreSeparationUncertaintyMm(0.5).build();
        dac = DacQuantizationInput.builder(8, 30.0, 80.0).amplitudeToleranceDb(1.0).build();
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
