package utdigit.core.pulse;

import static utdigit.core.pulse.PulseCalculator.BANDWIDTH_ABOVE_100_PERCENT;
import static utdigit.core.pulse.PulseCalculator.DISTANCE_IN_INCIDENCE_PLANE_NEAR_FIELD;
import static utdigit.core.pulse.PulseCalculator.DISTANCE_IN_NEAR_FIELD;
import static utdigit.core.pulse.PulseCalculator.NO_BEAM_DIAMETER_6DB;
import static utdigit.core.pulse.PulseCalculator.NO_EXACT_NEAR_FIELD;
import static utdigit.core.pulse.PulseCalculator.NO_INCIDENCE_PLANE_BEAM_DIAMETER_6DB;
import static utdigit.core.pulse.PulseCalculator.PART_IN_FAR_FIELD_ONLY;
import static utdigit.core.pulse.PulseCalculator.PAST_CRITICAL_ANGLE;
import static utdigit.core.pulse.PulseCalculator.REAL_LOWER_EDGE_BELOW_MODEL;

import java.math.MathContext;
import java.util.Optional;
import utdigit.core.common.MessageNumbers;
import utdigit.core.common.Warning;

/** Every warning and failure text of the pulse and beam parameters, one factory per condition. */
final class PulseMessages {
    private PulseMessages() {}

    /** A number for a message: 4 significant digits, no exponent. */
    private static final MathContext MESSAGE_DIGITS = new MathContext(4);

    static Warning bandwidthAbove100Percent(double bandwidthPercent, double modelLowerMhz,
            Optional<Double> realLowerMhz) {
        return Warning.of(BANDWIDTH_ABOVE_100_PERCENT, "bandwidth_percent " + fmt(bandwidthPercent)
                + " is above 100 %: the real model pulse's negative-frequency image raises its spectrum at "
                + "low frequencies, so its -6 dB lower edge is not at lower_frequency_mhz (" + fmt(modelLowerMhz)
                + " MHz) but " + realLowerMhz.map(f -> fmt(f) + " MHz").orElse("absent (it stays above -6 dB "
                + "down to 0 Hz)") + "; the model values (durations, cycles, -20 and -40 dB edges) then "
                + "describe a pulse whose real band is wider than the stated one");
    }

    static Warning noLowerEdge(String code, double levelDb, double edgeMhz, String field) {
        return Warning.of(code, "the pulse model's spectrum does not fall " + fmt(-levelDb)
                + " dB below its peak above 0 Hz (the edge would lie at " + fmt(edgeMhz) + " MHz): "
                + field + " does not exist");
    }

    static Warning realLowerEdgeBelowModel(String field, double levelDb, double edgeMhz,
            Optional<Double> realMhz) {
        String why = realMhz.isEmpty()
                ? "keeps its spectrum above " + fmt(levelDb) + " dB down to 0 Hz, so the real pulse has "
                        + "no such lower edge"
                : "lifts its spectrum at low frequencies, so its " + fmt(levelDb) + " dB lower edge lies at "
                        + fmt(realMhz.get()) + " MHz, " + fmt(100.0 * (edgeMhz - realMhz.get()) / edgeMhz)
                        + " % lower";
        return Warning.of(REAL_LOWER_EDGE_BELOW_MODEL, field + " " + fmt(edgeMhz)
                + " MHz is the one-sided model's edge; the real pulse's negative-frequency image " + why);
    }

    static Warning noBeamSpread(String code, double diameterMm, double wavelengthMm, double sineOfHalfAngle,
            String what, String field) {
        return Warning.of(code, "element_diameter_mm " + fmt(diameterMm) + " is too small for the "
                + "wavelength " + fmt(wavelengthMm) + " mm: k lambda / D = "
                + fmt(sineOfHalfAngle)
                + " is not below 1, so the beam does not fall to " + what + " at any angle and "
                + field + " does not exist");
    }

    static Warning noExactNearField(double diameterMm, double wavelengthMm) {
        return Warning.of(NO_EXACT_NEAR_FIELD, "element_diameter_mm " + fmt(diameterMm)
                + " is not larger than the wavelength " + fmt(wavelengthMm)
                + " mm: the on-axis pressure has no maximum in front of the element, so "
                + "near_field_length_exact_mm does not exist");
    }

    static Warning partInFarFieldOnly(double nearFieldLengthMm, double wedgePathMm, double wedgeVelocityMPerS) {
        return Warning.of(PART_IN_FAR_FIELD_ONLY, "the near field ("
                + fmt(nearFieldLengthMm) + " mm in the part's material) ends inside the wedge "
                + "or delay line (wedge_path_mm " + fmt(wedgePathMm)
                + " at wedge_velocity_m_per_s " + fmt(wedgeVelocityMPerS)
                + "): near_field_in_part_mm is negative and the part sees only far field");
    }

    static Warning noBeamDiameter6db() {
        return Warning.of(NO_BEAM_DIAMETER_6DB, "without a pulse-echo -6 dB beam-spread "
                + "angle the far-field beam does not narrow to a -6 dB width: "
                + "beam_diameter_6db_mm does not exist");
    }

    static Warning distanceInNearField(double distanceMm, double nearFieldAheadMm, boolean inPart) {
        return Warning.of(DISTANCE_IN_NEAR_FIELD, "distance_mm " + fmt(distanceMm)
                + " lies inside the near field (" + fmt(nearFieldAheadMm) + " mm"
                + (inPart ? " left in the part" : "")
                + "): the far-field cone 2 z tan(theta) does not hold there, so beam_diameter_6db_mm "
                + "is null (there the beam is of the order of the element's diameter and narrows towards "
                + "the end of the near field)");
    }

    static Warning pastCriticalAngle(double incidentDeg, double criticalDeg, double wedgeVelocityMPerS,
            double velocityMPerS, boolean withElement) {
        return Warning.of(PAST_CRITICAL_ANGLE, "incident_angle_deg " + fmt(incidentDeg)
                + " is at or past the critical angle " + fmt(criticalDeg) + " deg (wedge_velocity_m_per_s "
                + fmt(wedgeVelocityMPerS) + " into velocity_m_per_s " + fmt(velocityMPerS)
                + "): no refracted wave of this mode enters the part, refracted_angle_deg does not exist"
                + (withElement ? ", nor do the incidence_plane_* figures" : ""));
    }

    static Warning noIncidencePlaneBeamDiameter(double apertureMm) {
        return Warning.of(NO_INCIDENCE_PLANE_BEAM_DIAMETER_6DB, "without a pulse-echo -6 dB beam-spread "
                + "angle of the projected aperture (" + fmt(apertureMm) + " mm) the beam does not narrow to a "
                + "-6 dB width in the incidence plane: incidence_plane_beam_diameter_6db_mm does not exist");
    }

    static Warning distanceInIncidencePlaneNearField(double distanceMm, double nearFieldAheadMm, boolean inPart,
            double apertureMm) {
        return Warning.of(DISTANCE_IN_INCIDENCE_PLANE_NEAR_FIELD, "distance_mm " + fmt(distanceMm)
                + " lies inside the incidence plane's near field (" + fmt(nearFieldAheadMm) + " mm"
                + (inPart ? " left in the part" : "") + ", projected aperture "
                + fmt(apertureMm) + " mm): the far-field cone does not hold there, so "
                + "incidence_plane_beam_diameter_6db_mm is null");
    }

    private static String fmt(double x) {
        return MessageNumbers.plain(x, MESSAGE_DIGITS);
    }
}
