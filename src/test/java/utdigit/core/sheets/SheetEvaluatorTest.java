package utdigit.core.sheets;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import utdigit.core.acquisition.AcquisitionCalculator;
import utdigit.core.acquisition.AcquisitionInput;
import utdigit.core.common.Reference;
import utdigit.core.quantization.QuantizationCalculator;
import utdigit.core.quantization.QuantizationInput;
import utdigit.core.rules.Comparison;
import utdigit.core.rules.Limit;
import utdigit.core.rules.RequirementProfile;
import utdigit.core.rules.Rule;
import utdigit.core.rules.Verdict;
import utdigit.core.rules.VerificationStatus;
import utdigit.core.sampling.SamplingCalculator;
import utdigit.core.sampling.SamplingInput;
import utdigit.core.timing.TimeOfFlightCalculator;
import utdigit.core.timing.TimeOfFlightInput;

/** A sheet's values are the single calculators' values: one implementation of each formula. */
class SheetEvaluatorTest {
    private static final RequirementProfile FIVE_SAMPLES = new RequirementProfile("t", "T", "1", List.of(),
            VerificationStatus.UNVERIFIED, List.of("test caution"),
            List.of(new Rule("spp", "5 samples", "samples_per_period", Comparison.AT_LEAST, Limit.of(5), Set.of(),
                    List.of(), "common practice, no published source"),
                    new Rule("combined", "combined within tolerance", "combined_amplitude_error_db",
                            Comparison.AT_MOST, Limit.ofMetric("amplitude_tolerance_db"), Set.of(), List.of(),
                            "derived")), "0".repeat(64));

    private static SheetInput phasedArraySheet(double fsMhz) {
        return new SheetInput("S-1", "A", SheetTechnique.PHASED_ARRAY,
                new SheetInput.Probe(5.0, 60.0, null, 64),
                new SheetInput.Part(3255.0, null, null, 25.0, 55.0),
                new SheetInput.Digitization(fsMhz, 2, 12, null, null, null, null, null),
                new SheetInput.Acquisition(5000.0, 61, null, null, null, 1.0, 500.0, 20.0, 30.0, null, null, null, null),
                null, null,
                new SheetInput.Evaluation(80.0, -14.0, 2.0, null));
    }

    @Test
    void valuesEqualTheSingleCalculators() {
        SheetResult r = SheetEvaluator.evaluate(phasedArraySheet(100), FIVE_SAMPLES);
        var sampling = SamplingCalculator.compute(SamplingInput.builder(100, 5.0).decimationFactor(2)
                .bandwidthPercent(60.0).build());
        assertThat(r.values().get("samples_per_period")).isEqualTo(sampling.samplesPerPeriod());
        assertThat(r.values().get("pulse_amplitude_loss_db")).isEqualTo(sampling.pulseAmplitudeLossDb().orElseThrow());
        var quantization = QuantizationCalculator.compute(QuantizationInput.builder(12)
                .referenceHeightPercentFsh(80.0)
                .evaluationLevelDb(-14.0).amplitudeToleranceDb(2.0).build());
        assertThat(r.values().get("evaluation_error_under_db"))
                .isEqualTo(quantization.evaluationErrorUnderDb().orElseThrow());
        var tof = TimeOfFlightCalculator.compute(TimeOfFlightInput.builder(100, 3255.0).decimationFactor(2)
                .refractedAngleDeg(55.0).build());
        assertThat(r.values().get("depth_resolution_mm")).isEqualTo(tof.depthResolutionMm());
        var acq = AcquisitionCalculator.compute(AcquisitionInput.builder(100, 12, 1.0, 5000.0).decimationFactor(2)
                .gateLengthUs(30.0).focalLaws(61).scanLengthMm(500.0).plannedScanSpeedMmPerS(20.0).build());
        assertThat(r.values().get("max_scan_speed_mm_per_s")).isEqualTo(acq.maxScanSpeedMmPerS());
        // combined: sampling lowers the peak by r_s, then the quantizer reads LSB/2 low at that lower height:
        // -20 log10(r_s - (LSB/2)/h) (derived; brute-forced in QuantizationCalculatorTest), above the sum in dB
        double rs = Math.pow(10, -sampling.pulseAmplitudeLossDb().orElseThrow() / 20);
        double combined = -20 * Math.log10(rs - quantization.lsbPercentFsh() / 2 / quantization.evaluationHeightPercentFsh());
        assertThat(r.values().get("combined_amplitude_error_db")).isCloseTo(combined, within(1e-12));
        assertThat(r.values().get("combined_amplitude_error_db")).isGreaterThan(
                sampling.pulseAmplitudeLossDb().orElseThrow() + Math.abs(quantization.evaluationErrorUnderDb().orElseThrow()));
    }

    @Test
    void theSheetCitesEachSourceOnceNamingTheCalculationsThatUseIt() {
        SheetResult r = SheetEvaluator.evaluate(phasedArraySheet(100), FIVE_SAMPLES);
        assertThat(r.references()).extracting(Reference::id).doesNotHaveDuplicates();
        // Every source the single sampling calculation cites is cited by the sheet, "sampling" among its topic.
        var sampling = SamplingCalculator.compute(SamplingInput.builder(100, 5.0).decimationFactor(2)
                .bandwidthPercent(60.0).build());
        assertThat(sampling.references()).isNotEmpty();
        for (Reference cited : sampling.references()) {
            Reference inSheet = r.references().stream().filter(x -> x.id().equals(cited.id())).findFirst()
                    .orElseThrow();
            assertThat(inSheet.topic().split("; ")).contains("sampling");
        }
        Set<String> calculations = Set.of("pulse", "sampling", "quantization", "time of flight", "thickness",
                "acquisition", "combined amplitude error", "scan coverage", "array aperture", "DAC", "TOFD set-up");
        for (Reference ref : r.references()) {
            assertThat(calculations).as(ref.toString()).contains(ref.topic().split("; "));
        }
    }

    @Test
    void decimationDecidesTheSamplesPerPeriodRule() {
        // 40 MHz / 2 = 20 MHz effective: 4 samples per 5 MHz period fails "at least 5"; 60 MHz / 2 passes (6).
        assertThat(SheetEvaluator.evaluate(phasedArraySheet(40), FIVE_SAMPLES).findings().get(0).verdict())
                .isEqualTo(Verdict.FAIL);
        assertThat(SheetEvaluator.evaluate(phasedArraySheet(60), FIVE_SAMPLES).findings().get(0).verdict())
                .isEqualTo(Verdict.PASS);
    }

    @Test
    void anEmptySheetIsIncompleteNotPassed() {
        SheetInput empty = new SheetInput(null, null, SheetTechnique.TFM, null, null, null, null, null, null, null);
        SheetResult r = SheetEvaluator.evaluate(empty, FIVE_SAMPLES);
        assertThat(r.verdict()).isEqualTo(Verdict.INCOMPLETE);
        assertThat(r.values()).isEmpty();
        assertThat(r.cautions()).startsWith("test caution").containsAll(SheetEvaluator.SERVICE_CAUTIONS);
    }

    @Test
    void aTofdSheetUsesTheTofdGeometry() {
        SheetInput tofd = new SheetInput("T-1", null, SheetTechnique.TOFD,
                new SheetInput.Probe(10.0, 70.0, null, null), new SheetInput.Part(5920.0, null, null, 25.0, null),
                new SheetInput.Digitization(100.0, null, 8, null, null, null, null, null), null,
                new SheetInput.Tofd(60.0, 12.0), null, null);
        SheetResult r = SheetEvaluator.evaluate(tofd, FIVE_SAMPLES);
        // Lateral wave 2S/v with 2S = 60 mm and v = 5.920 mm/us (Charlesworth & Temple geometry, read second-hand)
        assertThat(r.values().get("lateral_wave_time_us")).isCloseTo(60.0 / 5.920, org.assertj.core.data.Offset.offset(1e-12));
        assertThat(r.values()).containsKeys("dead_zone_depth_mm", "backwall_dead_zone_mm", "depth_resolution_mm");
    }

    @Test
    void everyValueNameIsInTheVocabulary() {
        SheetResult r = SheetEvaluator.evaluate(phasedArraySheet(100), FIVE_SAMPLES);
        assertThat(SheetMetrics.ALL).containsAll(r.values().keySet());
    }
}
