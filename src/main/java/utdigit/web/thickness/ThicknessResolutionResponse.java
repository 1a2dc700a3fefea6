package utdigit.web.thickness;

import io.swagger.v3.oas.annotations.media.Schema;
import java.util.List;
import java.util.Optional;
import utdigit.web.pipeline.ResultNotes.ReferenceView;
import utdigit.web.pipeline.ToleranceCheck;
import utdigit.web.pipeline.ResultNotes.WarningView;
import utdigit.web.units.Mirrors;
import utdigit.web.units.VelocitySourceView;

/** The answer of POST /api/thickness-resolutions. */
@Schema(name = "ThicknessResolution", description = "How finely one sample of the stored time base resolves the "
        + "wall thickness, and how certainly the thickness is measured (the GUM combination of the velocity's and "
        + "the sampling's standard uncertainties). Fields whose optional inputs were not given are omitted.")
record ThicknessResolutionResponse(
        double thicknessResolutionMm,
        double thicknessResolutionIn,
        double roundTripTimeUs,
        double samplesAcrossThickness,
        double relativeResolutionPercent,
        double timingStandardUncertaintyNs,
        double timingWorstCaseErrorNs,
        double standardUncertaintyMm,
        double expandedUncertaintyMm,
        Double requiredSamplingFrequencyMhz,
        List<ToleranceCheck> toleranceChecks,

        ThicknessResolutionRequest inputs,
        VelocitySourceView velocitySource,
        List<WarningView> warnings,
        List<ReferenceView> references,
        InInches inInches) {

    /** Inch mirrors of the length results, each the mm result / 25.4. */
    @Schema(name = "ThicknessResolutionInInches", description = "Inch mirrors of the length "
            + "results (the inch is 25.4 mm exactly)")
    record InInches(
            Double standardUncertaintyIn,
            Double expandedUncertaintyIn) {

        /** The mirrors, or null (omitted) when the answer has no length result. */
        static InInches of(Double standardUncertaintyIn, Double expandedUncertaintyIn) {
            return Mirrors.orNone(new InInches(standardUncertaintyIn, expandedUncertaintyIn));
        }
    }
}
