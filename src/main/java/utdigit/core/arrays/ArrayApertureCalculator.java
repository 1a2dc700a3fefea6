package utdigit.core.arrays;

import static utdigit.core.common.MessageNumbers.rounded;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import utdigit.core.common.CalculationException;
import utdigit.core.common.Checks;
import utdigit.core.common.Reference;
import utdigit.core.common.Sources;
import utdigit.core.common.Warning;
import utdigit.core.pulse.Waves;

/**
 * Array aperture assessment (POST /api/array-apertures): the rectangular active aperture of a
 * linear array, its near field and beam spread in the steering plane (and in the passive plane for
 * the element length), and the element pitch against grating lobes over the steering range used.
 */
public final class ArrayApertureCalculator {
    private ArrayApertureCalculator() {}

    public static final String NO_BEAM_SPREAD_6DB = "NO_BEAM_SPREAD_6DB";
    public static final String NO_BEAM_SPREAD_20DB = "NO_BEAM_SPREAD_20DB";
    public static final String NO_BEAM_SPREAD_NULL = "NO_BEAM_SPREAD_NULL";
    public static final String NO_PASSIVE_BEAM_SPREAD_6DB = "NO_PASSIVE_BEAM_SPREAD_6DB";
    public static final String GRATING_LOBE = "GRATING_LOBE";
    public static final String STEERED_BEAM_WIDER = "STEERED_BEAM_WIDER";

    /**
     * @throws CalculationException notApplicable (400) for both active_elements and
     *     active_aperture; impossible (422) for an active aperture shorter than one pitch
     */
    public static ArrayApertureResult compute(ArrayApertureInput in) {
        Objects.requireNonNull(in, "input");
        double pitchMm = Checks.positive("element_pitch", in.elementPitchMm());
        double steeringDeg = in.maxSteeringAngleDeg() == null ? 0.0 : in.maxSteeringAngleDeg();
        Checks.inRangeHalfOpen("max_steering_angle_deg", steeringDeg, 0.0, 90.0);
        if (in.activeElements() != null && in.activeApertureMm() != null) {
            throw CalculationException.notApplicable("active_aperture",
                    "give the active aperture once: active_elements (the aperture is then active_elements x "
                            + "element_pitch) or active_aperture, not both");
        }
        double wavelengthMm = Waves.wavelengthMm(in.velocityMPerS(), in.frequencyMhz());
        List<Warning> warnings = new ArrayList<>();
        List<Reference> references = new ArrayList<>();
        references.add(Reference.of("wavelength", Sources.DEFINITIONS));

        Double apertureMm = null;
        if (in.activeElements() != null) {
            Checks.atLeastOne("active_elements", in.activeElements());
            apertureMm = in.activeElements() * pitchMm;
            references.add(Reference.of("active aperture", Sources.ARRAY_APERTURE));
        } else if (in.activeApertureMm() != null) {
            apertureMm = Checks.positive("active_aperture", in.activeApertureMm());
            if (apertureMm < pitchMm) {
                throw CalculationException.impossible("active_aperture (" + rounded(apertureMm) + " mm) is shorter "
                        + "than one element_pitch (" + rounded(pitchMm) + " mm): an aperture holds at least one element",
                        "active_aperture", "element_pitch");
            }
        }

        Double nearFieldMm = null;
        Optional<Double> spread6 = null;
        Optional<Double> spread20 = null;
        Optional<Double> spreadNull = null;
        if (apertureMm != null) {
            nearFieldMm = nearFieldLengthMm(apertureMm, wavelengthMm);
            spread6 = spread(RectangularDirectivity.twoWayConstant(6.0), wavelengthMm, apertureMm,
                    NO_BEAM_SPREAD_6DB, "beam_spread_6db_deg", "-6 dB", warnings);
            spread20 = spread(RectangularDirectivity.twoWayConstant(20.0), wavelengthMm, apertureMm,
                    NO_BEAM_SPREAD_20DB, "beam_spread_20db_deg", "-20 dB", warnings);
            spreadNull = spread(RectangularDirectivity.firstNullConstant(), wavelengthMm, apertureMm,
                    NO_BEAM_SPREAD_NULL, "beam_spread_null_deg", "first-null", warnings);
            references.add(Reference.of("near field of a rectangular aperture", Sources.RECTANGULAR_NEAR_FIELD));
            references.add(directivityReference());
            if (steeringDeg > 0.0) {
                warnings.add(Warning.of(STEERED_BEAM_WIDER, "the beam-spread angles are those of the unsteered "
                        + "beam; a beam steered by theta is wider, its projected aperture being L cos(theta)"));
            }
        }

        Double passiveNearFieldMm = null;
        Optional<Double> passiveSpread6 = null;
        if (in.elementLengthMm() != null) {
            double lengthMm = Checks.positive("element_length", in.elementLengthMm());
            passiveNearFieldMm = nearFieldLengthMm(lengthMm, wavelengthMm);
            passiveSpread6 = spread(RectangularDirectivity.twoWayConstant(6.0), wavelengthMm, lengthMm,
                    NO_PASSIVE_BEAM_SPREAD_6DB, "passive_beam_spread_6db_deg", "-6 dB", warnings);
            if (apertureMm == null) {
                references.add(Reference.of("near field of a rectangular aperture", Sources.RECTANGULAR_NEAR_FIELD));
                references.add(directivityReference());
            }
        }

        double maxPitchMm = maxGratingLobeFreePitchMm(wavelengthMm, steeringDeg);
        boolean free = pitchMm < maxPitchMm;
        references.add(Reference.of("grating lobes", Sources.GRATING_LOBES));
        if (!free) {
            double sine = StrictMath.sin(StrictMath.toRadians(steeringDeg)) - wavelengthMm / pitchMm;
            double lobeDeg = StrictMath.toDegrees(StrictMath.asin(StrictMath.max(-1.0, sine)));
            warnings.add(Warning.of(GRATING_LOBE, "element_pitch " + rounded(pitchMm) + " mm is not below "
                    + rounded(maxPitchMm) + " mm (lambda / (1 + sin " + rounded(steeringDeg) + " deg)): steered to "
                    + rounded(steeringDeg) + " deg the array sends a grating lobe at " + rounded(lobeDeg)
                    + " deg, on the other side of the normal; echoes it returns are misplaced"));
        }
        return new ArrayApertureResult(steeringDeg, wavelengthMm, apertureMm, nearFieldMm, spread6, spread20,
                spreadNull, passiveNearFieldMm, passiveSpread6, pitchMm / wavelengthMm, maxPitchMm, free,
                warnings, references);
    }

    /** L^2 / (4 lambda), mm. */
    public static double nearFieldLengthMm(double apertureMm, double wavelengthMm) {
        Checks.positive("aperture_mm", apertureMm);
        Checks.positive("wavelength_mm", wavelengthMm);
        return apertureMm * apertureMm / (4.0 * wavelengthMm);
    }

    /** lambda / (1 + sin(theta_max)), mm: the largest pitch with no grating lobe in the medium. */
    public static double maxGratingLobeFreePitchMm(double wavelengthMm, double maxSteeringAngleDeg) {
        Checks.positive("wavelength_mm", wavelengthMm);
        Checks.inRangeHalfOpen("max_steering_angle_deg", maxSteeringAngleDeg, 0.0, 90.0);
        return wavelengthMm / (1.0 + StrictMath.sin(StrictMath.toRadians(maxSteeringAngleDeg)));
    }

    private static Reference directivityReference() {
        return Reference.of("rectangular aperture beam spread", Sources.RECTANGULAR_DIRECTIVITY);
    }

    private static Optional<Double> spread(double constant, double wavelengthMm, double lengthMm, String code,
                                           String field, String level, List<Warning> warnings) {
        Optional<Double> angle = RectangularDirectivity.halfAngleDeg(constant, wavelengthMm, lengthMm);
        if (angle.isEmpty()) {
            warnings.add(Warning.of(code, "the aperture (" + rounded(lengthMm) + " mm) is too short for the wavelength ("
                    + rounded(wavelengthMm) + " mm): the beam does not fall to its " + level + " level in front of it; "
                    + field + " is null"));
        }
        return angle;
    }
}
