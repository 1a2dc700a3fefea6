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
        @Schema(description = "Pulse-echo -6 dB beam width used: as given, or 2 z tan(theta_6dB) of the round probe "
                + "(far field only; null inside the near field), mm", example = "8",
                types = {"number", "null"})
        Optional<Double> beamWidth6dbMm,
        @Schema(description = "With scan_increment: worst loss midway between positions, 6 (dx / w)^2, dB",
                example = "0.094", types = {"number", "null"})
        Optional<Double> scanIncrementLossDb,
        @Schema(description = "With index_step: worst loss midway between scan lines, 6 (dx / w)^2, dB",
                example = "1.5", types = {"number", "null"})
        Optional<Double> indexStepLossDb,
        @Schema(description = "With angular_step_deg: worst loss midway between beams, 6 (z dtheta / w)^2, dB",
                example = "1.03", types = {"number", "null"})
        Optional<Double> angularStepLossDb,
        @Schema(description = "With amplitude_tolerance_db: largest scan increment or index step, w sqrt(X / 6), mm",
                example = "3.27", types = {"number", "null"})
        Optional<Double> maxStepMm,
        @Schema(description = "With amplitude_tolerance_db and sound_path: largest angular step, w sqrt(X / 6) / z "
                + "in degrees", example = "3.1", types = {"number", "null"})
        Optional<Double> maxAngularStepDeg,
        @Schema(description = "With scan_increment and amplitude_tolerance_db: whether its loss is at most the "
                + "tolerance", types = {"boolean", "null"})
        Optional<Boolean> scanIncrementWithinTolerance,
        @Schema(description = "With index_step and amplitude_tolerance_db: whether its loss is at most the tolerance",
                types = {"boolean", "null"})
        Optional<Boolean> indexStepWithinTolerance,
        @Schema(description = "With angular_step_deg and amplitude_tolerance_db: whether its loss is at most the "
                + "tolerance", types = {"boolean", "null"})
        Optional<Boolean> angularStepWithinTolerance,
        @Schema(description = "Each figure compared with a tolerance of the request, the same shape as on every "
                + "endpoint: scan_increment_loss_db, index_step_loss_db and angular_step_loss_db at most amplitude_tolerance_db; only with amplitude_tolerance_db")
        List<ToleranceCheck> toleranceChecks,
        @Schema(description = "The normalised request (lengths in mm, velocity in m/s); itself a valid request that "
                + "reproduces this answer")
        ScanCoverageRequest inputs,
        VelocitySourceView velocitySource,
        List<WarningView> warnings,
        List<ReferenceView> references,
        @Schema(description = "Inch mirrors of the length results: each x_mm result as x_in = x_mm / 25.4 (the "
                + "inch is 25.4 mm exactly), a speed x_mm_per_s as x_in_per_s; each present when its mm field is, "
                + "null when it is null; omitted when the answer has no length result")
        InInches inInches) {

    /** Inch mirrors of the length results, each the mm result / 25.4. */
    @Schema(name = "ScanCoverageInInches", description = "Inch mirrors of the length "
            + "results (the inch is 25.4 mm exactly)")
    record InInches(
            @Schema(description = "beam_width_6db_mm / 25.4, in; null when it is null", format = "double",
                    types = {"number", "null"})
            Optional<Double> beamWidth6dbIn,
            @Schema(description = "max_step_mm / 25.4, in; null when it is null", format = "double",
                    types = {"number", "null"})
            Optional<Double> maxStepIn) {

        /** The mirrors, or null (omitted) when the answer has no length result. */
        static InInches of(Optional<Double> beamWidth6dbIn, Optional<Double> maxStepIn) {
            return beamWidth6dbIn == null && maxStepIn == null ? null
                    : new InInches(beamWidth6dbIn, maxStepIn);
        }
    }
}
