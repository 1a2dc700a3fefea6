package utdigit.core.pulse;

import java.util.Optional;
import utdigit.core.common.Checks;

/**
 * Refraction of a bulk wave at a plane interface (a wedge on a part): Snell's law.
 */
public final class Snell {
    private Snell() {}

    /**
     * The refracted angle of a wave crossing a plane interface: sin(theta_r) / v_2 = sin(theta_i) /
     * v_1, so theta_r = asin(sin(theta_i) v_2 / v_1). Angles from the interface normal.
     *
     * <p>Reference: Snell's law of refraction.
     *
     * @param incidentAngleDeg incident angle theta_i in medium 1 (the wedge), degrees, in [0, 90)
     * @param incidentVelocityMPerS velocity v_1 of the incident wave (the wedge's), m/s, > 0
     * @param refractedVelocityMPerS velocity v_2 of the refracted mode (the part's), m/s, > 0
     * @return theta_r in degrees, in [0, 90); empty at or past the critical angle (sin(theta_r) >= 1:
     *     no refracted wave of that mode enters the part)
     */
    public static Optional<Double> refractedAngleDeg(
            double incidentAngleDeg, double incidentVelocityMPerS, double refractedVelocityMPerS) {
        Checks.inRangeHalfOpen("incident_angle_deg", incidentAngleDeg, 0.0, 90.0);
        Checks.positive("wedge_velocity_m_per_s", incidentVelocityMPerS);
        Checks.positive("velocity_m_per_s", refractedVelocityMPerS);
        double sine = StrictMath.sin(StrictMath.toRadians(incidentAngleDeg))
                * refractedVelocityMPerS / incidentVelocityMPerS;
        if (sine >= 1.0) {
            return Optional.empty();
        }
        return Optional.of(StrictMath.toDegrees(StrictMath.asin(sine)));
    }

    /**
     * The critical angle, the incident angle whose refracted wave grazes the interface:
     * theta_c = asin(v_1 / v_2), existing only when v_2 > v_1.
     *
     * <p>Reference: Snell's law of refraction.
     *
     * @param incidentVelocityMPerS velocity v_1 of the incident wave, m/s, > 0
     * @param refractedVelocityMPerS velocity v_2 of the refracted mode, m/s, > 0
     * @return theta_c in degrees, in (0, 90); empty when v_2 <= v_1 (every incident angle refracts)
     */
    public static Optional<Double> criticalAngleDeg(double incidentVelocityMPerS, double refractedVelocityMPerS) {
        Checks.positive("wedge_velocity_m_per_s", incidentVelocityMPerS);
        Checks.positive("velocity_m_per_s", refractedVelocityMPerS);
        if (!(refractedVelocityMPerS > incidentVelocityMPerS)) {
            return Optional.empty();
        }
        return Optional.of(StrictMath.toDegrees(StrictMath.asin(incidentVelocityMPerS / refractedVelocityMPerS)));
    }
}
