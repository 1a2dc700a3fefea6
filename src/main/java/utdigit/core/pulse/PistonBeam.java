package utdigit.core.pulse;

import java.util.Optional;
import utdigit.core.common.Checks;

/**
 * Near field and beam geometry of a circular probe element (a piston) radiating into a part.
 */
public final class PistonBeam {
    private PistonBeam() {}

    /**
     * Near-field length of a circular piston, the distance along the axis beyond which the pressure
     * falls steadily: N = D^2 / (4 lambda).
     *
     * <p>Reference: the trade's formula, common practice (the approximation of
     * {@link #exactNearFieldLengthMm} for D much larger than lambda).
     *
     * @param elementDiameterMm element diameter D, mm, > 0
     * @param wavelengthMm wavelength lambda in the part, mm, > 0
     * @return N in mm
     */
    public static double nearFieldLengthMm(double elementDiameterMm, double wavelengthMm) {
        Checks.positive("element_diameter_mm", elementDiameterMm);
        Checks.positive("wavelength_mm", wavelengthMm);
        return elementDiameterMm * elementDiameterMm / (4.0 * wavelengthMm);
    }

    /**
     * The exact near-field length: the last maximum of the on-axis pressure of a circular piston,
     * |p(z)| proportional to |sin(pi/lambda (sqrt(z^2 + a^2) - z))| with a = D/2, which lies where
     * sqrt(z^2 + a^2) - z = lambda/2: z = (D^2 - lambda^2) / (4 lambda).
     *
     * <p>Reference: src/docs/methods.md 2.5 (derived there).
     *
     * @param elementDiameterMm element diameter D, mm, > 0
     * @param wavelengthMm wavelength lambda in the part, mm, > 0
     * @return the distance in mm, > 0; empty when D <= lambda (the on-axis pressure then has no
     *     maximum in front of the element: at D = lambda the formula's 0 is the face itself, not a
     *     maximum in front of it)
     */
    public static Optional<Double> exactNearFieldLengthMm(double elementDiameterMm, double wavelengthMm) {
        Checks.positive("element_diameter_mm", elementDiameterMm);
        Checks.positive("wavelength_mm", wavelengthMm);
        if (!(elementDiameterMm > wavelengthMm)) {
            return Optional.empty();
        }
        double numeratorMm2 = (elementDiameterMm - wavelengthMm) * (elementDiameterMm + wavelengthMm);
        return Optional.of(numeratorMm2 / (4.0 * wavelengthMm));
    }

    /**
     * The near field left in the part behind a wedge or delay line: the wedge path w of velocity
     * v_w counts as the part path w v_w / v, so N_part = N - w v_w / v.
     *
     * <p>Reference: common practice, no published source (src/docs/methods.md 2.5).
     *
     * @param nearFieldLengthMm N in the part's material, mm, > 0
     * @param wedgePathMm sound path w in the wedge or delay line, mm, > 0
     * @param wedgeVelocityMPerS velocity v_w in the wedge, m/s, > 0
     * @param partVelocityMPerS velocity v in the part, m/s, > 0
     * @return N_part in mm; negative when the near field ends inside the wedge (the part then sees
     *     only far field)
     */
    public static double nearFieldInPartMm(
            double nearFieldLengthMm, double wedgePathMm, double wedgeVelocityMPerS, double partVelocityMPerS) {
        Checks.positive("near_field_length_mm", nearFieldLengthMm);
        Checks.positive("wedge_path_mm", wedgePathMm);
        Checks.positive("wedge_velocity_m_per_s", wedgeVelocityMPerS);
        Checks.positive("velocity_m_per_s", partVelocityMPerS);
        return nearFieldLengthMm - wedgePathMm * wedgeVelocityMPerS / partVelocityMPerS;
    }

    /**
     * Beam diameter at a distance z in the far field between the points at the half-angle theta:
     * 2 z tan(theta). With the pulse-echo -6 dB half-angle it is the -6 dB beam diameter. Inside
     * the near field the far-field cone does not hold.
     *
     * <p>Reference: far-field geometry of a spreading beam, common practice.
     *
     * @param distanceMm distance z from the element, mm, > 0
     * @param halfAngleDeg half-angle theta, degrees, in [0, 90)
     * @return the diameter in mm
     */
    public static double beamDiameterMm(double distanceMm, double halfAngleDeg) {
        Checks.positive("distance_mm", distanceMm);
        Checks.inRangeHalfOpen("half_angle_deg", halfAngleDeg, 0.0, 90.0);
        return 2.0 * distanceMm * StrictMath.tan(StrictMath.toRadians(halfAngleDeg));
    }

    /**
     * The aperture an angle beam's part sees in the incidence plane: the element's width D projected
     * through the refracting interface, D_eff = D cos(beta) / cos(alpha) (alpha the incident angle in
     * the wedge, beta the refracted angle in the part). The plane perpendicular to incidence keeps D.
     *
     * <p>Reference: src/docs/methods.md 2.9 (derived there from the ray geometry at the interface:
     * the beam's width along the interface is D/cos(alpha) on both sides).
     *
     * @param elementDiameterMm element diameter D, mm, > 0
     * @param incidentAngleDeg alpha, degrees, in [0, 90)
     * @param refractedAngleDeg beta, degrees, in [0, 90]
     * @return D_eff in mm
     */
    public static double projectedApertureMm(double elementDiameterMm, double incidentAngleDeg,
                                             double refractedAngleDeg) {
        Checks.positive("element_diameter_mm", elementDiameterMm);
        Checks.inRangeHalfOpen("incident_angle_deg", incidentAngleDeg, 0.0, 90.0);
        return elementDiameterMm * StrictMath.cos(StrictMath.toRadians(refractedAngleDeg))
                / StrictMath.cos(StrictMath.toRadians(incidentAngleDeg));
    }

    /**
     * The part path equivalent, in the incidence plane, to a wedge path w: w (v_w / v) cos^2(beta) /
     * cos^2(alpha). In the plane perpendicular to incidence it is w v_w / v, as at normal incidence.
     * The factor is the tangential-plane transfer of a paraxial beam through a plane interface (its
     * complex beam parameter scales by (v_w / v) cos^2(beta) / cos^2(alpha)); it makes the near field
     * of the element in the wedge's material, carried into the part, equal the projected aperture's
     * near field D_eff^2 / (4 lambda).
     *
     * <p>Reference: paraxial beam transfer through an oblique plane interface, the tangential-plane
     * ray matrix diag(cos(beta)/cos(alpha), (v cos(alpha))/(v_w cos(beta))), applied to sound
     * (derived in src/docs/methods.md 2.9).
     *
     * @param wedgePathMm sound path w in the wedge, mm, > 0
     * @param wedgeVelocityMPerS v_w, m/s, > 0
     * @param partVelocityMPerS v of the refracted mode, m/s, > 0
     * @param incidentAngleDeg alpha, degrees, in [0, 90)
     * @param refractedAngleDeg beta, degrees, in [0, 90]
     * @return the equivalent path in the part, mm
     */
    public static double incidencePlaneWedgePathInPartMm(double wedgePathMm, double wedgeVelocityMPerS,
            double partVelocityMPerS, double incidentAngleDeg, double refractedAngleDeg) {
        Checks.positive("wedge_path_mm", wedgePathMm);
        Checks.positive("wedge_velocity_m_per_s", wedgeVelocityMPerS);
        Checks.positive("velocity_m_per_s", partVelocityMPerS);
        double ratio = StrictMath.cos(StrictMath.toRadians(refractedAngleDeg))
                / StrictMath.cos(StrictMath.toRadians(incidentAngleDeg));
        return wedgePathMm * wedgeVelocityMPerS / partVelocityMPerS * ratio * ratio;
    }
}
