package utdigit.web.arrays;

import io.swagger.v3.oas.annotations.media.Schema;
import java.util.List;
import java.util.Optional;
import utdigit.web.pipeline.ResultNotes.ReferenceView;
import utdigit.web.pipeline.ResultNotes.WarningView;
import utdigit.web.units.VelocitySourceView;

/** The answer of POST /api/array-apertures. */
@Schema(name = "ArrayAperture", description = "Near field and beam spread of a linear array's rectangular active "
        + "aperture in the steering plane (and of the element length in the passive plane), and the element pitch "
        + "against grating lobes up to the largest steering angle. Fields whose optional inputs were not given are "
        + "omitted; a value that cannot exist is null with a warning.")
record ArrayApertureResponse(
        @Schema(description = "Wavelength in the medium of the steering, v / f, mm", example = "1.184")
        double wavelengthMm,
        @Schema(description = "Active aperture L used: active_elements x element_pitch, or as given, mm",
                example = "9.6")
        Double activeApertureMm,
        @Schema(description = "Steering plane: near field L^2 / (4 lambda), mm", example = "19.46")
        Double nearFieldLengthMm,
        @Schema(description = "Steering plane, unsteered beam: pulse-echo -6 dB half-angle where (sin x / x)^2 falls "
                + "to -6 dB, x = pi L sin(theta) / lambda, deg; null when the aperture is too short",
                example = "3.13", types = {"number", "null"})
        Optional<Double> beamSpread6dbDeg,
        @Schema(description = "Steering plane, unsteered beam: pulse-echo -20 dB half-angle, deg; null when the "
                + "aperture is too short", example = "5.2", types = {"number", "null"})
        Optional<Double> beamSpread20dbDeg,
        @Schema(description = "Steering plane, unsteered beam: first null, sin(theta) = lambda / L, deg; null when "
                + "the aperture is too short", example = "7.09", types = {"number", "null"})
        Optional<Double> beamSpreadNullDeg,
        @Schema(description = "Passive plane: near field W^2 / (4 lambda) of the element length W, mm",
                example = "21.1")
        Double passiveNearFieldLengthMm,
        @Schema(description = "Passive plane: pulse-echo -6 dB half-angle, deg; null when the element is too short",
                example = "3.0", types = {"number", "null"})
        Optional<Double> passiveBeamSpread6dbDeg,
        @Schema(description = "Element pitch over wavelength, p / lambda", example = "0.507")
        double pitchToWavelengthRatio,
        @Schema(description = "Largest pitch with no grating lobe in the medium up to the largest steering angle, "
                + "lambda / (1 + sin(theta_max)), mm", example = "0.694")
        double maxGratingLobeFreePitchMm,
        @Schema(description = "Whether element_pitch is below max_grating_lobe_free_pitch_mm")
        boolean gratingLobeFree,
        @Schema(description = "The normalised request (lengths in mm, velocity in m/s, max_steering_angle_deg "
                + "filled in); itself a valid request that reproduces this answer")
        ArrayApertureRequest inputs,
        VelocitySourceView velocitySource,
        List<WarningView> warnings,
        List<ReferenceView> references,
        @Schema(description = "Inch mirrors of the length results: each x_mm result as x_in = x_mm / 25.4 (the "
                + "inch is 25.4 mm exactly), a speed x_mm_per_s as x_in_per_s; each present when its mm field is, "
                + "null when it is null; omitted when the answer has no length result")
        InInches inInches) {

    /** Inch mirrors of the length results, each the mm result / 25.4. */
    @Schema(name = "ArrayApertureInInches", description = "Inch mirrors of the length "
            + "results (the inch is 25.4 mm exactly)")
    record InInches(
            @Schema(description = "wavelength_mm / 25.4, in", format = "double")
            Double wavelengthIn,
            @Schema(description = "active_aperture_mm / 25.4, in", format = "double")
            Double activeApertureIn,
            @Schema(description = "near_field_length_mm / 25.4, in", format = "double")
            Double nearFieldLengthIn,
            @Schema(description = "passive_near_field_length_mm / 25.4, in", format = "double")
            Double passiveNearFieldLengthIn,
            @Schema(description = "max_grating_lobe_free_pitch_mm / 25.4, in", format = "double")
            Double maxGratingLobeFreePitchIn) {

        /** The mirrors, or null (omitted) when the answer has no length result. */
        static InInches of(Double wavelengthIn, Double activeApertureIn, Double nearFieldLengthIn,
                    Double passiveNearFieldLengthIn, Double maxGratingLobeFreePitchIn) {
            return wavelengthIn == null && activeApertureIn == null && nearFieldLengthIn == null &&
                    passiveNearFieldLengthIn == null && maxGratingLobeFreePitchIn == null ? null
                    : new InInches(wavelengthIn, activeApertureIn, nearFieldLengthIn, passiveNearFieldLengthIn,
                    maxGratingLobeFreePitchIn);
        }
    }
}
