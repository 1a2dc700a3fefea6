package utdigit.web.pulse;

import io.swagger.v3.oas.annotations.media.Schema;
import java.util.List;
import java.util.Optional;
import utdigit.web.pipeline.ResultNotes.ReferenceView;
import utdigit.web.pipeline.ResultNotes.WarningView;
import utdigit.web.units.VelocitySourceView;

/** The answer of POST /api/pulse-parameters. */
@Schema(name = "PulseParameters", description = "Period, wavelength, the Gaussian pulse model's band and durations, "
        + "and the circular piston's near field and beam spread. Fields whose optional inputs were not given are "
        + "omitted; a value that cannot exist is null with a warning.")
record PulseParametersResponse(
        double periodUs,
        double wavelengthMm,
        double wavelengthIn,
        Double lowerFrequencyMhz,
        Double upperFrequencyMhz,
        @Schema(types = {"number", "null"})
        Optional<Double> lowerFrequency20dbMhz,
        Double upperFrequency20dbMhz,
        @Schema(types = {"number", "null"})
        Optional<Double> lowerFrequency40dbMhz,
        Double upperFrequency40dbMhz,
        Double pulseDuration6dbUs,
        Double pulseDuration20dbUs,
        Double cycles6db,
        Double spatialPulseLengthMm,
        Double axialResolutionMm,
        Double nearFieldLengthMm,
        @Schema(types = {"number", "null"})
        Optional<Double> nearFieldLengthExactMm,
        @Schema(types = {"number", "null"})
        Optional<Double> beamSpread6dbDeg,
        @Schema(types = {"number", "null"})
        Optional<Double> beamSpread20dbDeg,
        @Schema(types = {"number", "null"})
        Optional<Double> beamSpreadNullDeg,
        @Schema(types = {"number", "null"})
        Optional<Double> beamDiameter6dbMm,
        Double nearFieldInPartMm,
        @Schema(types = {"number", "null"})
        Optional<Double> refractedAngleDeg,
        @Schema(types = {"number", "null"})
        Optional<Double> incidencePlaneApertureMm,
        @Schema(types = {"number", "null"})
        Optional<Double> incidencePlaneNearFieldLengthMm,
        @Schema(types = {"number", "null"})
        Optional<Double> incidencePlaneNearFieldInPartMm,
        @Schema(types = {"number", "null"})
        Optional<Double> incidencePlaneBeamSpread6dbDeg,
        @Schema(types = {"number", "null"})
        Optional<Double> incidencePlaneBeamSpread20dbDeg,
        @Schema(types = {"number", "null"})
        Optional<Double> incidencePlaneBeamDiameter6dbMm,
        PulseParametersRequest inputs,
        VelocitySourceView velocitySource,
        List<WarningView> warnings,
        List<ReferenceView> references,
        InInches inInches) {

    /** Inch mirrors of the length results, each the mm result / 25.4. */
    @Schema(name = "PulseParametersInInches", description = "Inch mirrors of the length "
            + "results (the inch is 25.4 mm exactly)")
    record InInches(
            @Schema(format = "double")
            Double spatialPulseLengthIn,
            @Schema(format = "double")
            Double axialResolutionIn,
            @Schema(format = "double")
            Double nearFieldLengthIn,
            @Schema(format = "double", types = {"number", "null"})
            Optional<Double> nearFieldLengthExactIn,
            @Schema(format = "double", types = {"number", "null"})
            Optional<Double> beamDiameter6dbIn,
            @Schema(format = "double")
            Double nearFieldInPartIn,
            @Schema(format = "double", types = {"number", "null"})
            Optional<Double> incidencePlaneApertureIn,
            @Schema(format = "double", types = {"number", "null"})
            Optional<Double> incidencePlaneNearFieldLengthIn,
            @Schema(format = "double", types = {"number", "null"})
            Optional<Double> incidencePlaneNearFieldInPartIn,
            @Schema(format = "double", types = {"number", "null"})
            Optional<Double> incidencePlaneBeamDiameter6dbIn) {

        /** The mirrors, or null (omitted) when the answer has no length result. */
        static InInches of(Double spatialPulseLengthIn, Double axialResolutionIn, Double nearFieldLengthIn,
                    Optional<Double> nearFieldLengthExactIn, Optional<Double> beamDiameter6dbIn,
                    Double nearFieldInPartIn, Optional<Double> incidencePlaneApertureIn,
                    Optional<Double> incidencePlaneNearFieldLengthIn,
                    Optional<Double> incidencePlaneNearFieldInPartIn,
                    Optional<Double> incidencePlaneBeamDiameter6dbIn) {
            return spatialPulseLengthIn == null && axialResolutionIn == null && nearFieldLengthIn == null &&
                    nearFieldLengthExactIn == null && beamDiameter6dbIn == null && nearFieldInPartIn == null &&
                    incidencePlaneApertureIn == null && incidencePlaneNearFieldLengthIn == null &&
                    incidencePlaneNearFieldInPartIn == null && incidencePlaneBeamDiameter6dbIn == null ? null
                    : new InInches(spatialPulseLengthIn, axialResolutionIn, nearFieldLengthIn,
                    nearFieldLengthExactIn, beamDiameter6dbIn, nearFieldInPartIn, incidencePlaneApertureIn,
                    incidencePlaneNearFieldLengthIn, incidencePlaneNearFieldInPartIn,
                    incidencePlaneBeamDiameter6dbIn);
        }
    }
}
