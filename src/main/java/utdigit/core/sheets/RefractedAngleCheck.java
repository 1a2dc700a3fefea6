package utdigit.core.sheets;

import static utdigit.core.common.MessageNumbers.rounded;

import java.util.List;
import java.util.Optional;
import utdigit.core.common.MessageNumbers;
import utdigit.core.common.Warning;

/**
 * An angle-beam sheet may state its beam angle twice: as the wedge (setup.incident_angle_deg and
 * setup.wedge_velocity, from which the pulse calculation takes the refracted angle by Snell's law,
 * src/docs/methods.md 2.8) and as material.refracted_angle_deg, which the sound-path, depth and TOFD
 * figures use. When the two differ by more than {@link #TOLERANCE_DEG}, the sheet's figures rest on
 * two different beams: a warning names both angles and what to check. It is a warning, not a
 * finding: the wedge's nominal velocity or the part's tabulated one may be what is off, and a
 * beam angle measured on a reference block decides.
 */
final class RefractedAngleCheck {
    private RefractedAngleCheck() {}

    /** The warning's code. */
    static final String REFRACTED_ANGLE_NOT_SNELL = "REFRACTED_ANGLE_NOT_SNELL";

    /**
     * The largest difference, deg, between the stated and the Snell angle without a warning: an
     * angle probe's measured beam angle is usually accepted within 2 deg of its nominal (catalogue id
     * {@code beam-angle-tolerance}; common practice, no published source read here).
     */
    static final double TOLERANCE_DEG = 2.0;

    /**
     * The warning, if any.
     *
     * @param statedDeg material.refracted_angle_deg, or null
     * @param snellDeg the pulse calculation's refracted angle (null without a wedge, empty past the
     *     critical angle, which the pulse calculation warns of itself)
     * @param setup the sheet's set-up (incident angle and wedge velocity)
     * @param partVelocityMPerS the part's velocity of the sheet's wave mode
     */
    static List<Warning> check(Double statedDeg, Optional<Double> snellDeg, SheetSetup setup,
                               double partVelocityMPerS) {
        if (statedDeg == null || snellDeg == null || snellDeg.isEmpty()) {
            return List.of();
        }
        double difference = Math.abs(statedDeg - snellDeg.get());
        if (!(difference > TOLERANCE_DEG)) {
            return List.of();
        }
        return List.of(Warning.of(REFRACTED_ANGLE_NOT_SNELL, "material.refracted_angle_deg ("
                + MessageNumbers.exact(statedDeg) + " deg) differs by " + rounded(difference) + " deg, more than "
                + MessageNumbers.exact(TOLERANCE_DEG) + " deg, from the refracted angle the wedge gives by Snell's law ("
                + rounded(snellDeg.get()) + " deg from setup.incident_angle_deg "
                + MessageNumbers.exact(setup.incidentAngleDeg()) + " deg, wedge "
                + MessageNumbers.exact(setup.wedgeVelocityMPerS()) + " m/s, part "
                + MessageNumbers.exact(partVelocityMPerS) + " m/s): the sound-path, depth and TOFD figures use "
                + "material.refracted_angle_deg, the incidence-plane figures the Snell angle; check the wedge and "
                + "part velocities, or measure the beam angle on a reference block"));
    }
}
