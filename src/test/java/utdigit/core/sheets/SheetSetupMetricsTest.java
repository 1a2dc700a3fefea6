package utdigit.core.sheets;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Set;
import org.apache.commons.math3.special.BesselJ;
import org.junit.jupiter.api.Test;
import utdigit.core.arrays.ArrayApertureCalculator;
import utdigit.core.arrays.ArrayApertureInput;
import utdigit.core.coverage.ScanCoverageCalculator;
import utdigit.core.dac.DacQuantizationCalculator;
import utdigit.core.dac.DacQuantizationInput;
import utdigit.core.dac.TcgMode;
import utdigit.core.pulse.PulseCalculator;
import utdigit.core.pulse.PulseInput;
import utdigit.core.pulse.PulseResult;
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
        var array = ArrayApertureCalculator.compute(ArrayApertureInput.builder(5.0, 3255.0, 0.5)
                .activeElements(16).maxSteeringAngleDeg(70.0).build());
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
    /** A 45 deg shear angle beam: 5 MHz, 10 mm element on a 2730 m/s wedge, into steel at 3255 m/s. */
    private static final double STEEL_SHEAR_M_PER_S = 3255.0;
    private static final double WEDGE_M_PER_S = 2730.0;
    private static final double INCIDENT_FOR_45_DEG =
            Math.toDegrees(Math.asin(Math.sin(Math.toRadians(45.0)) * WEDGE_M_PER_S / STEEL_SHEAR_M_PER_S));

    private static final RequirementProfile NEAR_FIELD = new RequirementProfile("t", "T", "1", List.of(),
            VerificationStatus.UNVERIFIED, List.of(),
            List.of(new Rule("nf", "reflector beyond the incidence-plane near field", "sound_path_mm",
                    Comparison.AT_LEAST, Limit.ofMetric("incidence_plane_near_field_length_mm"), Set.of(), List.of(),
                    "test rule")),
            "0".repeat(64));

    private static SheetInput angleBeam(Double elementDiameterMm, Double incidentDeg, Double wedgeMPerS) {
        return new SheetInput("A-1", "A", SheetTechnique.PULSE_ECHO,
                new SheetInput.Probe(5.0, null, elementDiameterMm, null),
                new SheetInput.Part(STEEL_SHEAR_M_PER_S, null, null, 25.0, null), null, null, null, null, null,
                new SheetSetup(null, 60.0, null, null, null, null, null, null, null, null, null, null,
                        incidentDeg, wedgeMPerS));
    }

    /**
     * The projected aperture by ray geometry, written out here: the element's two edge rays (face
     * normal to the incident direction) meet the interface, refract by Snell's law, and the refracted
     * beam's width is their separation measured across them.
     */
    private static double apertureByRays(double diameterMm, double incidentDeg) {
        double alpha = Math.toRadians(incidentDeg);
        double[] edgeA = {0.0, 20.0};
        double[] edgeB = {diameterMm * Math.cos(alpha), 20.0 + diameterMm * Math.sin(alpha)};
        double hitA = edgeA[0] + edgeA[1] * Math.tan(alpha);
        double hitB = edgeB[0] + edgeB[1] * Math.tan(alpha);
        double beta = Math.asin(Math.sin(alpha) * STEEL_SHEAR_M_PER_S / WEDGE_M_PER_S);
        return Math.abs(hitB - hitA) * Math.cos(beta);
    }

    @Test
    void anAngleBeamSheetGetsTheIncidencePlaneFiguresOfThePulseCalculator() {
        SheetResult r = SheetEvaluator.evaluate(angleBeam(10.0, INCIDENT_FOR_45_DEG, WEDGE_M_PER_S), NEAR_FIELD);
        double lambdaMm = STEEL_SHEAR_M_PER_S / 5.0 / 1000.0;
        // Ray geometry (above) for the aperture; D_eff^2 / (4 lambda) for its near field (the piston's N).
        double apertureMm = apertureByRays(10.0, INCIDENT_FOR_45_DEG);
        assertThat(r.values().get("incidence_plane_aperture_mm")).isCloseTo(apertureMm, within(1e-9));
        assertThat(r.values().get("incidence_plane_near_field_length_mm"))
                .isCloseTo(apertureMm * apertureMm / (4 * lambdaMm), within(1e-9));
        // The -6 dB half-angle of the projected aperture: the two-way piston directivity (2 J1(x)/x)^2 there is
        // 10^(-6/20) (Commons Math BesselJ).
        double x = Math.PI * apertureMm * Math.sin(Math.toRadians(r.values().get("incidence_plane_beam_spread_6db_deg")))
                / lambdaMm;
        double oneWay = 2 * BesselJ.value(1, x) / x;
        assertThat(oneWay * oneWay).isCloseTo(Math.pow(10, -6.0 / 20), within(1e-12));
        // The probe's own figures keep D: the plane perpendicular to incidence.
        assertThat(r.values().get("near_field_length_mm")).isCloseTo(100.0 / (4 * lambdaMm), within(1e-9));
        // The same calculator as POST /api/pulse-parameters, bit for bit.
        PulseResult.IncidencePlane plane = PulseCalculator.compute(PulseInput.builder(5.0, STEEL_SHEAR_M_PER_S)
                .elementDiameterMm(10.0).wedgeVelocityMPerS(WEDGE_M_PER_S)
                .incidentAngleDeg(INCIDENT_FOR_45_DEG).build()).incidencePlane();
        assertThat(r.values().get("incidence_plane_near_field_length_mm"))
                .isEqualTo(plane.nearFieldLengthMm().orElseThrow());
        assertThat(r.values().get("incidence_plane_beam_spread_6db_deg")).isEqualTo(plane.beamSpread6dbDeg().orElseThrow());
        // 60 mm sound path against a near field of about 13.3 mm: the rule can rule on the figure.
        assertThat(r.findings().get(0).verdict()).isEqualTo(Verdict.PASS);
        assertThat(r.values()).containsEntry("incident_angle_deg", INCIDENT_FOR_45_DEG)
                .containsEntry("wedge_velocity_m_per_s", WEDGE_M_PER_S);
    }

    @Test
    void withoutTheWedgeVelocityTheRuleNamesTheInputToAdd() {
        SheetResult r = SheetEvaluator.evaluate(angleBeam(10.0, INCIDENT_FOR_45_DEG, null), NEAR_FIELD);
        assertThat(r.values()).doesNotContainKey("incidence_plane_near_field_length_mm");
        assertThat(r.findings().get(0).verdict()).isEqualTo(Verdict.NOT_EVALUATED);
        assertThat(r.findings().get(0).missingInputs()).containsExactly("/setup/wedge_velocity_m_per_s");
        SheetResult noElement = SheetEvaluator.evaluate(angleBeam(null, null, WEDGE_M_PER_S), NEAR_FIELD);
        assertThat(noElement.findings().get(0).missingInputs())
                .containsExactly("/probe/element_diameter_mm", "/setup/incident_angle_deg");
    }

    @Test
    void pastTheCriticalAngleThereAreNoIncidencePlaneFiguresAndAWarningSaysWhy() {
        // Snell: the shear critical angle from a 2730 m/s wedge into 3255 m/s is asin(2730/3255) = 57.0 deg < 60 deg.
        assertThat(Math.toDegrees(Math.asin(WEDGE_M_PER_S / STEEL_SHEAR_M_PER_S))).isLessThan(60.0);
        SheetResult r = SheetEvaluator.evaluate(angleBeam(10.0, 60.0, WEDGE_M_PER_S), NEAR_FIELD);
        assertThat(r.values()).doesNotContainKeys("incidence_plane_aperture_mm", "incidence_plane_near_field_length_mm",
                "incidence_plane_beam_spread_6db_deg");
        assertThat(r.warnings()).anySatisfy(w -> {
            assertThat(w.code()).isEqualTo("PAST_CRITICAL_ANGLE");
            assertThat(w.message()).startsWith("pulse: ");
        });
    }
}
