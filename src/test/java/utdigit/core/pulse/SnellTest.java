package utdigit.core.pulse;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** Snell's law sin(theta_r) / v_part = sin(theta_i) / v_wedge at a wedge on a part. */
class SnellTest {

    static final double ALLOWED_ANGLE_ERROR_DEG = 1e-9;

    /** A wedge of 2730 m/s (an example value of ours; wedge materials vary, src/docs/methods.md). */
    static final double WEDGE_M_PER_S = 2730.0;
    /** ISO 22232-2 steel reference values (read in its scope). */
    static final double STEEL_SHEAR_M_PER_S = 3255.0;
    static final double STEEL_LONGITUDINAL_M_PER_S = 5920.0;

    @Test
    @DisplayName("the incident angle for a 45 deg shear wave in steel refracts back to 45 deg")
    void incidentAngleForFortyFiveDegreesRefractsToFortyFive() {
        double incidentDeg = Math.toDegrees(Math.asin(Math.sin(Math.toRadians(45.0)) * WEDGE_M_PER_S / STEEL_SHEAR_M_PER_S));
        assertThat(Snell.refractedAngleDeg(incidentDeg, WEDGE_M_PER_S, STEEL_SHEAR_M_PER_S).orElseThrow())
                .isCloseTo(45.0, within(ALLOWED_ANGLE_ERROR_DEG));
    }

    @Test
    @DisplayName("normal incidence is not refracted")
    void normalIncidenceStaysNormal() {
        assertThat(Snell.refractedAngleDeg(0.0, WEDGE_M_PER_S, STEEL_SHEAR_M_PER_S).orElseThrow()).isEqualTo(0.0);
    }

    @Test
    @DisplayName("critical angle of 2730 m/s into steel shear 3255 m/s is asin(2730/3255), about 57.0 deg; just past it no shear wave refracts")
    void shearCriticalAngle() {
        double criticalDeg = Math.toDegrees(Math.asin(WEDGE_M_PER_S / STEEL_SHEAR_M_PER_S));
        assertThat(criticalDeg).isCloseTo(57.0, within(0.05));
        assertThat(Snell.criticalAngleDeg(WEDGE_M_PER_S, STEEL_SHEAR_M_PER_S).orElseThrow())
                .isCloseTo(criticalDeg, within(ALLOWED_ANGLE_ERROR_DEG));
        assertThat(Snell.refractedAngleDeg(criticalDeg - 0.01, WEDGE_M_PER_S, STEEL_SHEAR_M_PER_S)).isPresent();
        assertThat(Snell.refractedAngleDeg(criticalDeg + 0.01, WEDGE_M_PER_S, STEEL_SHEAR_M_PER_S)).isEmpty();
        assertThat(Snell.refractedAngleDeg(60.0, WEDGE_M_PER_S, STEEL_SHEAR_M_PER_S)).isEmpty();
    }

    @Test
    @DisplayName("first critical angle into steel longitudinal 5920 m/s is asin(2730/5920), about 27.5 deg")
    void longitudinalCriticalAngle() {
        double criticalDeg = Math.toDegrees(Math.asin(WEDGE_M_PER_S / STEEL_LONGITUDINAL_M_PER_S));
        assertThat(Snell.criticalAngleDeg(WEDGE_M_PER_S, STEEL_LONGITUDINAL_M_PER_S).orElseThrow())
                .isCloseTo(criticalDeg, within(ALLOWED_ANGLE_ERROR_DEG));
        assertThat(criticalDeg).isCloseTo(27.5, within(0.05));
        assertThat(Snell.refractedAngleDeg(30.0, WEDGE_M_PER_S, STEEL_LONGITUDINAL_M_PER_S)).isEmpty();
        assertThat(Snell.refractedAngleDeg(20.0, WEDGE_M_PER_S, STEEL_LONGITUDINAL_M_PER_S)).isPresent();
    }

    @Test
    @DisplayName("into a slower medium every angle refracts and there is no critical angle")
    void slowerMediumHasNoCriticalAngle() {
        assertThat(Snell.criticalAngleDeg(STEEL_SHEAR_M_PER_S, WEDGE_M_PER_S)).isEmpty();
        assertThat(Snell.criticalAngleDeg(WEDGE_M_PER_S, WEDGE_M_PER_S)).isEmpty();
        assertThat(Snell.refractedAngleDeg(89.9, STEEL_SHEAR_M_PER_S, WEDGE_M_PER_S)).isPresent();
    }

    @Test
    @DisplayName("seeded random cases keep sin(theta_r)/v_part = sin(theta_i)/v_wedge to 1e-12")
    void snellInvariantHolds() {
        Random random = new Random(20240601L);
        int refracted = 0;
        for (int i = 0; i < 2000; i++) {
            double incidentDeg = 89.99 * random.nextDouble();
            double wedge = 1000 + 5000 * random.nextDouble();
            double part = 1000 + 5000 * random.nextDouble();
            var angle = Snell.refractedAngleDeg(incidentDeg, wedge, part);
            double sineRatio = Math.sin(Math.toRadians(incidentDeg)) * part / wedge;
            assertThat(angle.isPresent()).isEqualTo(sineRatio < 1.0);
            if (angle.isPresent()) {
                refracted++;
                assertThat(Math.sin(Math.toRadians(angle.get())) / part)
                        .isCloseTo(Math.sin(Math.toRadians(incidentDeg)) / wedge, within(1e-12 / wedge));
            }
        }
        assertThat(refracted).isBetween(100, 1900);
    }
}
