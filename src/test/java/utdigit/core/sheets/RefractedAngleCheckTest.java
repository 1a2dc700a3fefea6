package utdigit.core.sheets;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import utdigit.core.common.Warning;
import utdigit.core.rules.RequirementProfile;
import utdigit.core.rules.VerificationStatus;

/**
 * A sheet whose stated refracted angle and wedge disagree says so. The Snell angle is written out
 * here: sin(beta) / v_part = sin(alpha) / v_wedge (Snell's law, src/docs/methods.md 2.8), for a
 * 2730 m/s wedge on steel of 3255 m/s shear velocity (ISO 22232-2's reference steel).
 */
class RefractedAngleCheckTest {
    private static final double STEEL_SHEAR_M_PER_S = 3255.0;
    private static final double WEDGE_M_PER_S = 2730.0;
    private static final double INCIDENT_DEG = 36.0;
    private static final double SNELL_DEG = Math.toDegrees(Math.asin(
            Math.sin(Math.toRadians(INCIDENT_DEG)) * STEEL_SHEAR_M_PER_S / WEDGE_M_PER_S));
    private static final RequirementProfile NO_RULE = new RequirementProfile("t", "T", "1", List.of(),
            VerificationStatus.UNVERIFIED, List.of(), List.of(), "0".repeat(64));

    private static SheetResult sheet(Double statedDeg) {
        return SheetEvaluator.evaluate(new SheetInput("A-2", "A", SheetTechnique.PULSE_ECHO,
                new SheetInput.Probe(4.0, null, 8.0, null),
                new SheetInput.Part(STEEL_SHEAR_M_PER_S, null, null, 20.0, statedDeg), null, null, null, null, null,
                new SheetSetup(null, null, null, null, null, null, null, null, null, null, null, null,
                        INCIDENT_DEG, WEDGE_M_PER_S)), NO_RULE);
    }

    private static List<Warning> angleWarnings(SheetResult r) {
        return r.warnings().stream().filter(w -> w.code().equals(RefractedAngleCheck.REFRACTED_ANGLE_NOT_SNELL))
                .toList();
    }

    @Test
    void aStatedAngleWithinTwoDegreesOfTheWedgesSnellAngleGivesNoWarning() {
        // 36 deg in 2730 m/s into 3255 m/s shear: about 44.5 deg, the wedge of a nominal 45 deg probe.
        assertThat(SNELL_DEG).isBetween(44.0, 45.0);
        assertThat(angleWarnings(sheet(45.0))).isEmpty();
        assertThat(angleWarnings(sheet(SNELL_DEG - 1.9))).isEmpty();
        assertThat(angleWarnings(sheet(null))).isEmpty();
    }

    @Test
    void aStatedAngleFurtherOffIsAWarningOfThePulseCalculationNamingBothAngles() {
        List<Warning> ws = angleWarnings(sheet(60.0));
        assertThat(ws).hasSize(1);
        String expectedDifference = utdigit.core.common.MessageNumbers.rounded(60.0 - SNELL_DEG);
        assertThat(ws.get(0).message()).startsWith("pulse: material.refracted_angle_deg (60 deg) differs by "
                + expectedDifference + " deg")
                .contains("setup.incident_angle_deg 36 deg, wedge 2730 m/s, part 3255 m/s");
        assertThat(sheet(60.0).references()).anySatisfy(r -> assertThat(r.id()).isEqualTo("beam-angle-tolerance"));
        assertThat(angleWarnings(sheet(SNELL_DEG - 2.1))).hasSize(1);
    }

    @Test
    void theToleranceIsInclusiveAndPastTheCriticalAngleOnlyThePulseWarningSpeaks() {
        SheetSetup setup = new SheetSetup(null, null, null, null, null, null, null, null, null, null, null, null,
                INCIDENT_DEG, WEDGE_M_PER_S);
        assertThat(RefractedAngleCheck.check(47.0, Optional.of(45.0), setup, STEEL_SHEAR_M_PER_S)).isEmpty();
        assertThat(RefractedAngleCheck.check(47.5, Optional.of(45.0), setup, STEEL_SHEAR_M_PER_S)).hasSize(1);
        assertThat(RefractedAngleCheck.check(70.0, Optional.empty(), setup, STEEL_SHEAR_M_PER_S)).isEmpty();
        assertThat(RefractedAngleCheck.check(70.0, null, setup, STEEL_SHEAR_M_PER_S)).isEmpty();
    }
}
