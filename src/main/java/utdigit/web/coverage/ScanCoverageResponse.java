package utdigit.web.coverage;

import io.swagger.v3.oas.annotations.media.Schema;
import utdigit.web.pipeline.ToleranceCheck;
import java.util.List;
import java.util.Optional;
import utdigit.web.pipeline.ResultNotes.ReferenceView;
import utdigit.web.pipeline.ResultNotes.WarningView;
import utdigit.web.units.VelocitySourceView;

/** The answer of POST /api/scan-coverages. */
@Schema(name = "ScanCoverage", description = "The amplitude a reflector midway between two scan positions loses, "
        + "6 (step / w)^2 dB with the pulse-echo -6 dB beam width w (Gaussian main lobe; a model of ours), and the "
        + "largest step for a tolerance. Fields whose optional inputs were not given are omitted; a value that "
        + "cannot be known (the reflector inside the probe's near field) is null with a warning.")
record ScanCoverageResponse(
        @Schema(types = {"number", "null"})
        Optional<Double> beamWidth6dbMm,
        @Schema(types = {"number", "null"})
        Optional<Double> scanIncrementLossDb,
        @Schema(types = {"number", "null"})
        Optional<Double> indexStepLossDb,
        @Schema(types = {"number", "null"})
        Optional<Double> angularStepLossDb,
        @Schema(types = {"number", "null"})
        Optional<Double> maxStepMm,
        @Schema(types = {"number", "null"})
        Optional<Double> maxAngularStepDeg,
        @Schema(types = {"boolean", "null"})
        Optional<Boolean> scanIncrementWithinTolerance,
        @Schema(types = {"boolean", "null"})
        Optional<Boolean> indexStepWithinTolerance,
        @Schema(types = {"boolean", "null"})
        Optional<Boolean> angularStepWithinTolerance,
        List<ToleranceCheck> toleranceChecks,
        ScanCoverageRequest inputs,
        VelocitySourceView velocitySource,
        List<WarningView> warnings,
        List<ReferenceView> references,
        InInches inInches) {

    /** Inch mirrors of the length results, each the mm result / 25.4. */
    @Schema(name = "ScanCoverageInInches", description = "Inch mirrors of the length "
            + "results (the inch is 25.4 mm exactly)")
    record InInches(
            @Schema(format = "double", types = {"number", "null"})
            Optional<Double> beamWidth6dbIn,
            @Schema(format = "double", types = {"number", "null"})
            Optional<Double> maxStepIn) {

        /** The mirrors, or null (omitted) when the answer has no length result. */
        static InInches of(Optional<Double> beamWidth6dbIn, Optional<Double> maxStepIn) {
            return beamWidth6dbIn == null && maxStepIn == null ? null
                    : new InInches(beamWidth6dbIn, maxStepIn);
        }
    }
}
