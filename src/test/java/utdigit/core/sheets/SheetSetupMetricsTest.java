package utdigit.core.sheets;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import utdigit.core.arrays.ArrayApertureCalculator;
import utdigit.core.arrays.ArrayApertureInput;
import utdigit.core.coverage.ScanCoverageCalculator;
import utdigit.core.dac.DacQuantizationCalculator;
import utdigit.core.dac.DacQuantizationInput;
import utdigit.core.dac.TcgMode;
import utdigit.core.rules.Comparison;
import utdigit.core.rules.Limit;
import utdigit.core.rules.RequirementProfile;
import utdigit.core.rules.Rule;
import utdigit.core.rules.Verdict;
import utdigit.core.rules.VerificationStatus;

/** The set-up metrics of a sheet are the single calculators' values; rules can name them. */
class SheetSetupMetricsTest {
    private static final RequirementProfile PITCH = new RequirementProfile("t", "T", "1", List.of(),
            VerificationStatus.UNVERIFIED, List.of(),
            List.of(new Rule("pitch", "no grating lobe", "element_pitch_mm", Comparison.AT_MOST,
                    Limit.ofMetric("max_grating_lobe_free_pitch_mm"), Set.of(), List.of(), "array theory")),
            "0".repeat(64));

    private static SheetInput phasedArray(SheetSetup setup) {
        return new SheetInput("S-1", "A", SheetTechnique.PHASED_ARRAY,
                new SheetInput.Probe(5.0, 60.0, null, 64),
                new SheetInput.Part(3255.0, null, null, 25.0, 55.0),
                new SheetInput.Digitization(100.0, 2, 8, null, null, null, null, null),
                new SheetInput.Acquisition(5000.0, 61, null, null, null, 1.0, 500.0, 20.0, 30.0, null, null, null, null),
                null, null, new SheetInput.Evaluation(80.0, -14.0, 2.0, null), setup);
    }

    @Test
    void arrayCoverageAndDacValuesEqualTheSingleCalculators() {
        SheetSetup setup = new SheetSetup(6.0, 50.0, 3.0, null, 0.5, 16, 70.0, null, 30.0, TcgMode.ANALOG, null, null);
        SheetResult r = SheetEvaluator.evaluate(phasedArray(setup), PITCH);
        var array = ArrayApertureCalculator.compute(new ArrayApertureInput(5.0, 3255.0, 0.5, 16, null, null, 70.0));
        assertThat(r.values().get("max_grating_lobe_free_pitch_mm")).isEqualTo(array.maxGratingLobeFreePitchMm());
        assertThat(r.values().get("aperture_near_field_length_mm")).isEqualTo(array.nearFieldLengthMm());
        // Shear wavelength 3.255 / 5 = 0.651 mm; steered to 70 deg the largest pitch is 0.651 / 1.940 = 0.3356 mm
        // (array theory), so the 0.5 mm pitch fails.
        assertThat(r.findings().get(0).verdict()).isEqualTo(Verdict.FAIL);
        assertThat(r.values().get("scan_increment_loss_db")).isCloseTo(ScanCoverageCalculator.lossDb(1.0, 6.0),
                within(0.0));
        assertThat(r.values().get("index_step_loss_db")).isCloseTo(ScanCoverageCalculator.lossDb(3.0, 6.0), within(0.0));
        var dac = DacQuantizationCalculator.compute(DacQuantizationInput.of(8, 30.0, 80.0));
        assertThat(r.values().get("dac_error_magnitude_db")).isEqualTo(-dac.analogTcgErrorUnderDb().orElseThrow());
        assertThat(r.values().get("lowest_reference_height_percent_fsh")).isEqualTo(dac.lowestReferenceHeightPercentFsh());
        assertThat(SheetMetrics.ALL).containsAll(r.values().keySet());
        // Steered in a wedge of 2330 m/s instead: lambda = 0.466 mm, the wedge's wavelength decides.
        SheetSetup wedge = new SheetSetup(null, null, null, null, 0.5, 16, 20.0, 2330.0, null, null, null, null);
        assertThat(SheetEvaluator.evaluate(phasedArray(wedge), PITCH).values().get("max_grating_lobe_free_pitch_mm"))
                .isCloseTo(0.466 / (1 + Math.sin(Math.toRadians(20))), within(1e-12));
    }

    @Test
    void aTofdSheetGetsItsBackWallTimeAndGateMargins() {
        SheetInput tofd = new SheetInput("T-1", null, SheetTechnique.TOFD,
                new SheetInput.Probe(10.0, 70.0, null, null), new SheetInput.Part(6000.0, null, null, 40.0, null),
                new SheetInput.Digitization(100.0, null, 8, null, null, null, null, null), null,
                new SheetInput.Tofd(60.0, 20.0), null, null,
                new SheetSetup(null, null, null, null, null, null, null, null, null, null, 9.0, 17.0));
        SheetResult r = SheetEvaluator.evaluate(tofd, PITCH);
        // 2S = 60, T = 40, v = 6 mm/us: lateral wave 10 us, back wall 100/6 us (Charlesworth & Temple 2.3.4).
        assertThat(r.values().get("backwall_time_us")).isCloseTo(100.0 / 6, within(1e-12));
        assertThat(r.values().get("gate_start_margin_us")).isCloseTo(1.0, within(1e-12));
        assertThat(r.values().get("gate_end_margin_us")).isCloseTo(17.0 - 100.0 / 6, within(1e-12));
        assertThat(r.values()).containsKey("tofd_timing_depth_uncertainty_mm");
    }
}
