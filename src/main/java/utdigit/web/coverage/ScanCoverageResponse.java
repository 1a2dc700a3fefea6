package utdigit.web.coverage;

import io.swagger.v3.oas.annotations.media.Schema;
import utdigit.web.pipeline.ToleranceCheck;
import java.util.List;
import java.util.Optional;
import utdigit.web.pipeline.ResultNotes.ReferenceView;
import utdigit.web.pipeline.ResultNotes.WarningView;
import utdigit.web.units.Mirrors;
import utdigit.web.units.VelocitySourceView;

/** The answer of POST /api/scan-coverages. */
@Schema(name = "ScanCoverage", description = "The amplitude a reflector midway between two scan positions loses, "
        + "6 (step / w)^2 dB with the pulse-echo -6 dB beam width w (Gaussian main lobe; a model of ours), and the "
        + "largest step for a tolerance. Fields whose optional inputs were not given are omitted; a value that "
        + "cannot be known (the reflector inside the probe's near field) is null with a warning.")
record ScanCoverageResponse(
        Optional<Double> beamWidth6dbMm,
        Optional<Double> scanIncrementLossDb,
        Optional<Double> indexStepLossDb,
        Optional<Double> angularStepLossDb,
        Optional<Double> maxStepMm,
        Optional<Double> maxAngularStepDeg,
        Optional<Boolean> scanIncrementWithinTolerance,
        Optional<Boolean> indexStepWithinTolerance,
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
            Optional<Double> beamWidth6dbIn,
            Optional<Double> maxStepIn) {

        /** The mirrors, or null (omitted) when the answer has no length result. */
        static InInches of(Optional<Double> beamWidth6dbIn, Optional<Double> maxStepIn) {
            return Mirrors.orNone(new InInches(beamWidth6dbIn, maxStepIn));
        }
    }
}
