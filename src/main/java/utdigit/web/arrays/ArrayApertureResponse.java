package utdigit.web.arrays;

import io.swagger.v3.oas.annotations.media.Schema;
import java.util.List;
import java.util.Optional;
import utdigit.web.pipeline.ResultNotes.ReferenceView;
import utdigit.web.pipeline.ResultNotes.WarningView;
import utdigit.web.units.Mirrors;
import utdigit.web.units.VelocitySourceView;

/** The answer of POST /api/array-apertures. */
@Schema(name = "ArrayAperture", description = "Near field and beam spread of a linear array's rectangular active "
        + "aperture in the steering plane (and of the element length in the passive plane), and the element pitch "
        + "against grating lobes up to the largest steering angle. Fields whose optional inputs were not given are "
        + "omitted; a value that cannot exist is null with a warning.")
record ArrayApertureResponse(
        double wavelengthMm,
        Double activeApertureMm,
        Double nearFieldLengthMm,
        Optional<Double> beamSpread6dbDeg,
        Optional<Double> beamSpread20dbDeg,
        Optional<Double> beamSpreadNullDeg,
        Double passiveNearFieldLengthMm,
        Optional<Double> passiveBeamSpread6dbDeg,
        double pitchToWavelengthRatio,
        double maxGratingLobeFreePitchMm,
        boolean gratingLobeFree,
        ArrayApertureRequest inputs,
        VelocitySourceView velocitySource,
        List<WarningView> warnings,
        List<ReferenceView> references,
        InInches inInches) {

    /** Inch mirrors of the length results, each the mm result / 25.4. */
    @Schema(name = "ArrayApertureInInches", description = "Inch mirrors of the length "
            + "results (the inch is 25.4 mm exactly)")
    record InInches(
            Double wavelengthIn,
            Double activeApertureIn,
            Double nearFieldLengthIn,
            Double passiveNearFieldLengthIn,
            Double maxGratingLobeFreePitchIn) {

        /** The mirrors, or null (omitted) when the answer has no length result. */
        static InInches of(Double wavelengthIn, Double activeApertureIn, Double nearFieldLengthIn,
                    Double passiveNearFieldLengthIn, Double maxGratingLobeFreePitchIn) {
            return Mirrors.orNone(new InInches(wavelengthIn, activeApertureIn, nearFieldLengthIn,
                    passiveNearFieldLengthIn, maxGratingLobeFreePitchIn));
        }
    }
}
