package utdigit.web.pulse;

import io.swagger.v3.oas.annotations.media.Schema;
import java.util.List;
import java.util.Optional;
import utdigit.web.pipeline.ResultNotes.ReferenceView;
import utdigit.web.pipeline.ResultNotes.WarningView;
import utdigit.web.units.Mirrors;
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
        Optional<Double> lowerFrequency20dbMhz,
        Double upperFrequency20dbMhz,
        Optional<Double> lowerFrequency40dbMhz,
        Double upperFrequency40dbMhz,
        Double pulseDuration6dbUs,
        Double pulseDuration20dbUs,
        Double cycles6db,
        Double spatialPulseLengthMm,
        Double axialResolutionMm,
        Double nearFieldLengthMm,
        Optional<Double> nearFieldLengthExactMm,
        Optional<Double> beamSpread6dbDeg,
        Optional<Double> beamSpread20dbDeg,
        Optional<Double> beamSpreadNullDeg,
        Optional<Double> beamDiameter6dbMm,
        Double nearFieldInPartMm,
        Optional<Double> refractedAngleDeg,
        Optional<Double> incidencePlaneApertureMm,
        Optional<Double> incidencePlaneNearFieldLengthMm,
        Optional<Double> incidencePlaneNearFieldInPartMm,
        Optional<Double> incidencePlaneBeamSpread6dbDeg,
        Optional<Double> incidencePlaneBeamSpread20dbDeg,
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
            Double spatialPulseLengthIn,
            Double axialResolutionIn,
            Double nearFieldLengthIn,
            Optional<Double> nearFieldLengthExactIn,
            Optional<Double> beamDiameter6dbIn,
            Double nearFieldInPartIn,
            Optional<Double> incidencePlaneApertureIn,
            Optional<Double> incidencePlaneNearFieldLengthIn,
            Optional<Double> incidencePlaneNearFieldInPartIn,
            Optional<Double> incidencePlaneBeamDiameter6dbIn) {

        /** The mirrors, or null (omitted) when the answer has no length result. */
        static InInches of(Double spatialPulseLengthIn, Double axialResolutionIn, Double nearFieldLengthIn,
                    Optional<Double> nearFieldLengthExactIn, Optional<Double> beamDiameter6dbIn,
                    Double nearFieldInPartIn, Optional<Double> incidencePlaneApertureIn,
                    Optional<Double> incidencePlaneNearFieldLengthIn,
                    Optional<Double> incidencePlaneNearFieldInPartIn,
                    Optional<Double> incidencePlaneBeamDiameter6dbIn) {
            return Mirrors.orNone(new InInches(spatialPulseLengthIn, axialResolutionIn, nearFieldLengthIn,
                    nearFieldLengthExactIn, beamDiameter6dbIn, nearFieldInPartIn, incidencePlaneApertureIn,
                    incidencePlaneNearFieldLengthIn, incidencePlaneNearFieldInPartIn,
                    incidencePlaneBeamDiameter6dbIn));
        }
    }
}
