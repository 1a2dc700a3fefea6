package utdigit.bench;

import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import utdigit.core.acquisition.AcquisitionCalculator;
import utdigit.core.acquisition.AcquisitionInput;
import utdigit.core.acquisition.AcquisitionResult;
import utdigit.core.pulse.PulseCalculator;
import utdigit.core.pulse.PulseInput;
import utdigit.core.pulse.PulseResult;
import utdigit.core.quantization.QuantizationCalculator;
import utdigit.core.quantization.QuantizationInput;
import utdigit.core.quantization.QuantizationResult;
import utdigit.core.sampling.SamplingCalculator;
import utdigit.core.sampling.SamplingInput;
import utdigit.core.sampling.SamplingResult;
import utdigit.core.thickness.ThicknessCalculator;
import utdigit.core.thickness.ThicknessInput;
import utdigit.core.thickness.ThicknessResult;
import utdigit.core.timing.Technique;
import utdigit.core.timing.TimeOfFlightCalculator;
import utdigit.core.timing.TimeOfFlightInput;
import utdigit.core.timing.TimeOfFlightResult;

/**
 * The closed-form calculators, one call each with every optional input given (the most work a
 * single request asks of them: every result, its warnings and references) and with the required
 * inputs only. Target (README "Performance"): under 2 us median.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.SampleTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
public class ClosedFormBenchmarks {
    private PulseInput pulse;
    private SamplingInput samplingClosedForm;
    private QuantizationInput quantization;
    private TimeOfFlightInput pulseEcho;
    private TimeOfFlightInput tofd;
    private ThicknessInput thickness;
    private AcquisitionInput acquisition;
    private PulseInput pulseRequired;
    private SamplingInput samplingRequired;
    private QuantizationInput quantizationRequired;
    private TimeOfFlightInput tofdRequired;
    private ThicknessInput thicknessRequired;
    private AcquisitionInput acquisitionRequired;

    @Setup
    public void setUp() {
        // 5 MHz, 60 % probe, 10 mm element on steel through a 20 mm rexolite-like wedge at 40 deg.
        pulse = PulseInput.builder(5.0, 5920.0)
                .bandwidthPercent(60.0)
                .elementDiameterMm(10.0)
                .distanceMm(50.0)
                .wedgePathMm(20.0)
                .wedgeVelocityMPerS(2330.0)
                .incidentAngleDeg(40.0).build();
        // No bandwidth: the sine bound only, with a tolerance (required rate) and a TFM grid.
        samplingClosedForm = SamplingInput.builder(100.0, 5.0)
                .amplitudeToleranceDb(1.0)
                .tfmGridSpacingMm(0.1)
                .velocityMPerS(5920.0).build();
        quantization = QuantizationInput.builder(12)
                .signalHeightPercentFsh(80.0)
                .amplitudeToleranceDb(1.0)
                .referenceHeightPercentFsh(80.0)
                .evaluationLevelDb(-6.0)
                .averaging(4).build();
        pulseEcho = TimeOfFlightInput.builder(100.0, 3255.0)
                .technique(Technique.PULSE_ECHO)
                .refractedAngleDeg(60.0)
                .build();
        tofd = TimeOfFlightInput.builder(100.0, 5920.0)
                .technique(Technique.TOFD)
                .probeCentreSeparationMm(80.0)
                .depthMm(15.0)
                .thicknessMm(25.0)
                .frequencyMhz(5.0)
                .bandwidthPercent(60.0)
                .build();
        thickness = ThicknessInput.builder(100.0, 5920.0, 10.0)
                .velocityUncertaintyPercent(1.0)
                .requiredResolutionMm(0.05)
                .frequencyMhz(5.0)
                .bandwidthPercent(60.0)
                .build();
        acquisition = AcquisitionInput.builder(100.0, 12, 1.0, 1000.0)
                .gateLengthUs(20.0)
                .focalLaws(64)
                .scanLengthMm(1000.0)
                .plannedScanSpeedMmPerS(50.0)
                .maxRoundTripUs(40.0)
                .build();

        pulseRequired = PulseInput.of(5.0, 5920.0);
        samplingRequired = SamplingInput.of(100.0, 5.0);
        quantizationRequired = QuantizationInput.of(12);
        tofdRequired = TimeOfFlightInput.builder(100.0, 5920.0).technique(Technique.TOFD).probeCentreSeparationMm(80.0)
                .build();
        thicknessRequired = ThicknessInput.of(100.0, 5920.0, 10.0);
        acquisitionRequired = AcquisitionInput.builder(100.0, 12, 1.0, 1000.0).gateLengthUs(20.0).build();
    }

    @Benchmark
    public PulseResult pulseParameters() {
        return PulseCalculator.compute(pulse);
    }

    @Benchmark
    public SamplingResult samplingClosedForm() {
        return SamplingCalculator.compute(samplingClosedForm);
    }

    @Benchmark
    public QuantizationResult quantization() {
        return QuantizationCalculator.compute(quantization);
    }

    @Benchmark
    public TimeOfFlightResult timeOfFlightPulseEcho() {
        return TimeOfFlightCalculator.compute(pulseEcho);
    }

    @Benchmark
    public TimeOfFlightResult timeOfFlightTofd() {
        return TimeOfFlightCalculator.compute(tofd);
    }

    @Benchmark
    public ThicknessResult thickness() {
        return ThicknessCalculator.compute(thickness);
    }

    @Benchmark
    public AcquisitionResult acquisition() {
        return AcquisitionCalculator.compute(acquisition);
    }

    @Benchmark
    public PulseResult pulseParametersRequiredOnly() {
        return PulseCalculator.compute(pulseRequired);
    }

    @Benchmark
    public SamplingResult samplingClosedFormRequiredOnly() {
        return SamplingCalculator.compute(samplingRequired);
    }

    @Benchmark
    public QuantizationResult quantizationRequiredOnly() {
        return QuantizationCalculator.compute(quantizationRequired);
    }

    @Benchmark
    public TimeOfFlightResult timeOfFlightTofdRequiredOnly() {
        return TimeOfFlightCalculator.compute(tofdRequired);
    }

    @Benchmark
    public ThicknessResult thicknessRequiredOnly() {
        return ThicknessCalculator.compute(thicknessRequired);
    }

    @Benchmark
    public AcquisitionResult acquisitionRequiredOnly() {
        return AcquisitionCalculator.compute(acquisitionRequired);
    }
}
