package utdigit.core.pulse;

import static utdigit.core.common.MessageNumbers.rounded;
import static utdigit.core.pulse.PulseCalculator.BANDWIDTH_ABOVE_100_PERCENT;
import static utdigit.core.pulse.PulseCalculator.DISTANCE_IN_INCIDENCE_PLANE_NEAR_FIELD;
import static utdigit.core.pulse.PulseCalculator.DISTANCE_IN_NEAR_FIELD;
import static utdigit.core.pulse.PulseCalculator.NO_BEAM_DIAMETER_6DB;
import static utdigit.core.pulse.PulseCalculator.NO_EXACT_NEAR_FIELD;
import static utdigit.core.pulse.PulseCalculator.NO_INCIDENCE_PLANE_BEAM_DIAMETER_6DB;
import static utdigit.core.pulse.PulseCalculator.PART_IN_FAR_FIELD_ONLY;
import static utdigit.core.pulse.PulseCalculator.PAST_CRITICAL_ANGLE;
import static utdigit.core.pulse.PulseCalculator.REAL_LOWER_EDGE_BELOW_MODEL;

import java.util.Optional;
import utdigit.core.common.Warning;

/** Every warning and failure text of the pulse and beam parameters, one factory per condition. */
final class PulseMessages {
    private PulseMessages() {}

    static Warning bandwidthAbove100Percent(double bandwidthPercent, double modelLowerMhz,
            Optional<Double> realLowerMhz) {
        return Warning.of(BANDWIDTH_ABOVE_100_PERCENT, "bandwidth_percent " + rounded(bandwidthPercent)
                + " is above 100 %: the real model pulse's negative-frequency image raises its spectrum at "
                + "low frequencies, so its -6 dB lower edge is not at lower_frequency_mhz (" + rounded(modelLowerMhz)
                + " MHz) but " + realLowerMhz.map(f -> rounded(f) + " MHz").orElse("absent (it stays above -6 dB "
                + "down to 0 Hz)") + "; the model values (durations, cycles, -20 and -40 dB edges) then "
                + "describe a pulse whose real band is wider than the stated one");
    }

    static Warning noLowerEdge(String code, double levelDb, double edgeMhz, String field) {
        return Warning.of(code, "the pulse model's spectrum does not fall " + rounded(-levelDb)
                + " dB below its peak above 0 Hz (the edge would lie at " + rounded(edgeMhz) + " MHz): "
                + field + " does not exist");
    }

    static Warning realLowerEdgeBelowModel(String field, double levelDb, double edgeMhz,
            Optional<Double> realMhz) {
        String why = realMhz.isEmpty()
                ? "keeps its spectrum above " + rounded(levelDb) + " dB down to 0 Hz, so the real pulse has "
                        + "no such lower edge"
                : "lifts its spectrum at low frequencies, so its " + rounded(levelDb) + " dB lower edge lies at "
                        + rounded(realMhz.get()) + " MHz, " + rounded(100.0 * (edgeMhz - realMhz.get()) / edgeMhz)
                        + " % lower";
        return Warning.of(REAL_LOWER_EDGE_BELOW_MODEL, field + " " + rounded(edgeMhz)
                + " MHz is the one-sided model's edge; the real pulse's negative-frequency image " + why);
    }

    static Warning noBeamSpread(String code, double diameterMm, double wavelengthMm, double sineOfHalfAngle,
            String what, String field) {
        return Warning.of(code, "element_diameter_mm " + rounded(diameterMm) + " is too small for the "
                + "wavelength " + rounded(wavelengthMm) + " mm: k lambda / D = "
                + rounded(sineOfHalfAngle)
                + " is not below 1, so the beam does not fall to " + what + " at any angle and "
                + field + " does not exist");
    }

    static Warning noExactNearField(double diameterMm, double wavelengthMm) {
        return Warning.of(NO_EXACT_NEAR_FIELD, "element_diameter_mm " + rounded(diameterMm)
                + " is not larger than the wavelength " + rounded(wavelengthMm)
                + " mm: the on-axis pressure has no maximum in front of the element, so "
                + "near_field_length_exact_mm does not exist");
    }

    static Warning partInFarFieldOnly(double nearFieldLengthMm, double wedgePathMm, double wedgeVelocityMPerS) {
        return Warning.of(PART_IN_FAR_FIELD_ONLY, "the near field ("
                + rounded(nearFieldLengthMm) + " mm in the part's material) ends inside the wedge "
                + "or delay line (wedge_path_mm " + rounded(wedgePathMm)
                + " at wedge_velocity_m_per_s " + rounded(wedgeVelocityMPerS)
                + "): near_field_in_part_mm is negative and the part sees only far field");
    }

    static Warning noBeamDiameter6db() {
        return Warning.of(NO_BEAM_DIAMETER_6DB, "without a pulse-echo -6 dB beam-spread "
                + "angle the far-field beam does not narrow to a -6 dB width: "
                + "beam_diameter_6db_mm does not exist");
    }

    static Warning distanceInNearField(double distanceMm, double nearFieldAheadMm, boolean inPart) {
        return Warning.of(DISTANCE_IN_NEAR_FIELD, "distance_mm " + rounded(distanceMm)
                + " lies inside the near field (" + rounded(nearFieldAheadMm) + " mm"
                + (inPart ? " left in the part" : "")
                + "): the far-field cone 2 z tan(theta) does not hold there, so beam_diameter_6db_mm "
                + "is null (there the beam is of the order of the element's diameter and narrows towards "
                + "the end of the near field)");
    }

    static Warning pastCriticalAngle(double incidentDeg, double criticalDeg, double wedgeVelocityMPerS,
            double velocityMPerS, boolean withElement) {
        return Warning.of(PAST_CRITICAL_ANGLE, "incident_angle_deg " + rounded(incidentDeg)
                + " is at or past the critical angle " + rounded(criticalDeg) + " deg (wedge_velocity_m_per_s "
                + rounded(wedgeVelocityMPerS) + " into velocity_m_per_s " + rounded(velocityMPerS)
                + "): no refracted wave of this mode enters the part, refracted_angle_deg does not exist"
                + (withElement ? ", nor do the incidence_plane_* figures" : ""));
    }

    static Warning noIncidencePlaneBeamDiameter(double apertureMm) {
        return Warning.of(NO_INCIDENCE_PLANE_BEAM_DIAMETER_6DB, "without a pulse-echo -6 dB beam-spread "
                + "angle of the projected aperture (" + rounded(apertureMm) + " mm) the beam does not narrow to a "
                + "-6 dB width in the incidence plane: incidence_plane_beam_diameter_6db_mm does not exist");
    }

    static Warning distanceInIncidencePlaneNearField(double distanceMm, double nearFieldAheadMm, boolean inPart,
            double apertureMm) {
        return Warning.of(DISTANCE_IN_INCIDENCE_PLANE_NEAR_FIELD, "distance_mm " + rounded(distanceMm)
                + " lies inside the incidence plane's near field (" + rounded(nearFieldAheadMm) + " mm"
                + (inPart ? " left in the part" : "") + ", projected aperture "
                + rounded(apertureMm) + " mm): the far-field cone does not hold there, so "
                + "incidence_plane_beam_diameter_6db_mm is null");
    }
}
