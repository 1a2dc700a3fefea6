package utdigit.bench;

import java.util.List;
import java.util.Set;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import utdigit.core.rules.Comparison;
import utdigit.core.rules.Condition;
import utdigit.core.rules.Document;
import utdigit.core.rules.Limit;
import utdigit.core.rules.RequirementProfile;
import utdigit.core.rules.Rule;
import utdigit.core.rules.VerificationStatus;
import utdigit.core.sheets.SheetEvaluator;
import utdigit.core.sheets.SheetInput;
import utdigit.core.sheets.SheetResult;
import utdigit.core.sheets.SheetTechnique;

/**
 * A full technique-sheet validation: every calculation the sheet's fields allow (pulse, sampling
 * with the pulse model, quantization, time of flight, thickness, acquisition) and a profile of
 * twelve rules, some with conditions and some with limits naming another metric. Target (README "Performance"):
 * under 200 us. The sheets and the profile are our own examples, built in code.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.SampleTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
public class SheetBenchmarks {
    private RequirementProfile profile;
    private SheetInput phasedArraySheet;
    private SheetInput tofdSheet;

    @Setup
    public void setUp() {
        profile = profile();
        phasedArraySheet = new SheetInput("BENCH-PA-001", "A", SheetTechnique.PHASED_ARRAY,
                new SheetInput.Probe(5.0, 60.0, 10.0, 64),
                new SheetInput.Part(3255.0, null, 1.0, 25.0, 55.0),
                new SheetInput.Digitization(100.0, 2, 12, null, null, null, null, null),
                new SheetInput.Acquisition(2000.0, 48, null, null, null, 1.0, 1500.0, 40.0, 30.0, null,
                        null, 60.0, null),
                null, null,
                new SheetInput.Evaluation(80.0, -6.0, 2.0, 0.2));
        tofdSheet = new SheetInput("BENCH-TOFD-001", "A", SheetTechnique.TOFD,
                new SheetInput.Probe(7.5, 70.0, 6.0, null),
                new SheetInput.Part(5920.0, 30.0, null, 25.0, null),
                new SheetInput.Digitization(100.0, null, 8, null, null, null, null, null),
                new SheetInput.Acquisition(1000.0, null, null, null, 2, 1.0, 2000.0, 50.0, 25.0, null,
                        null, null, null),
                new SheetInput.Tofd(60.0, 20.0), null,
                new SheetInput.Evaluation(80.0, -14.0, 2.0, null));
    }

    @Benchmark
    public SheetResult phasedArraySheet() {
        return SheetEvaluator.evaluate(phasedArraySheet, profile);
    }

    @Benchmark
    public SheetResult tofdSheet() {
        return SheetEvaluator.evaluate(tofdSheet, profile);
    }

    private static RequirementProfile profile() {
        Set<String> all = Set.of();
        Set<String> tofd = Set.of("TOFD");
        Set<String> pulsed = Set.of("PULSE_ECHO", "PHASED_ARRAY");
        List<Rule> rules = List.of(
                rule("min-samples", "samples_per_period", Comparison.AT_LEAST, Limit.of(5.0), all, List.of()),
                rule("min-samples-thin", "samples_per_period", Comparison.AT_LEAST, Limit.of(8.0), all,
                        List.of(new Condition("thickness_mm", Comparison.BELOW, 10.0))),
                rule("pulse-loss", "pulse_amplitude_loss_db", Comparison.AT_MOST, Limit.of(1.0), all, List.of()),
                rule("nyquist-level", "spectral_level_at_nyquist_db", Comparison.AT_MOST, Limit.of(-40.0), all,
                        List.of()),
                rule("bit-depth", "bit_depth", Comparison.AT_LEAST, Limit.of(8.0), all, List.of()),
                rule("evaluation-error", "evaluation_error_magnitude_db", Comparison.AT_MOST, Limit.of(0.5), all,
                        List.of()),
                rule("combined-error", "combined_amplitude_error_db", Comparison.AT_MOST,
                        Limit.ofMetric("amplitude_tolerance_db"), all, List.of()),
                rule("scan-speed", "planned_scan_speed_mm_per_s", Comparison.AT_MOST,
                        Limit.ofMetric("max_scan_speed_mm_per_s"), all, List.of()),
                rule("wraparound", "pulse_repetition_frequency_hz", Comparison.AT_MOST,
                        Limit.ofMetric("max_prf_without_wraparound_hz"), pulsed, List.of()),
                rule("thickness-resolution", "thickness_resolution_mm", Comparison.AT_MOST,
                        Limit.ofMetric("thickness_tolerance_mm"), pulsed,
                        List.of(new Condition("thickness_mm", Comparison.AT_LEAST, 6.0))),
                rule("tofd-depth-step", "depth_resolution_mm", Comparison.AT_MOST, Limit.of(0.5), tofd, List.of()),
                rule("tofd-dead-zone", "dead_zone_depth_mm", Comparison.AT_MOST, Limit.of(5.0), tofd,
                        List.of(new Condition("thickness_mm", Comparison.AT_LEAST, 10.0))));
        return new RequirementProfile("bench-profile", "Benchmark profile (our own example limits)", "1",
                List.of(new Document("benchmark example", "none", "n/a")), VerificationStatus.UNVERIFIED,
                List.of("Example limits for benchmarking only."), rules, "0".repeat(64));
    }

    private static Rule rule(String id, String metric, Comparison comparison, Limit limit, Set<String> techniques,
                             List<Condition> when) {
        return new Rule(id, id.replace('-', ' '), metric, comparison, limit, techniques, when,
                "benchmark example, no published source");
    }
}
