package utdigit.web.tofd;

import io.swagger.v3.oas.annotations.media.Schema;
import java.util.List;
import java.util.Optional;
import utdigit.web.pipeline.ResultNotes.ReferenceView;
import utdigit.web.pipeline.ResultNotes.WarningView;
import utdigit.web.units.VelocitySourceView;

/** The answer of POST /api/tofd-setups. */
@Schema(name = "TofdSetup", description = "Arrival times of a TOFD set-up, whether its gate spans the wall, a "
        + "measured time's depth and the depth uncertainty from sampling and probe separation. Times are in the part "
        + "(wedge delays excluded). Fields whose optional inputs were not given are omitted; a value that cannot "
        + "exist is null with a warning.")
record TofdSetupResponse(
        @Schema(description = "Lateral wave arrival 2S / v, us", example = "11.82")
        double lateralWaveTimeUs,
        @Schema(description = "Back-wall arrival 2 sqrt(S^2 + T^2) / v, us", example = "15.5")
        double backwallTimeUs,
        @Schema(description = "Margin the gate needs each side: pulse_duration_us, or 0 without it, us",
                example = "0.4")
        double gateMarginUs,
        @Schema(description = "Latest gate opening, lateral wave less the margin, us", example = "11.42")
        double requiredGateStartUs,
        @Schema(description = "Earliest gate closing, back wall plus the margin, us", example = "15.9")
        double requiredGateEndUs,
        @Schema(description = "With the gate: lateral wave less gate_start_us, us (negative: the gate opens after "
                + "the lateral wave)", example = "1.82")
        Double gateStartMarginUs,
        @Schema(description = "With the gate: gate_end_us less the back wall, us (negative: the gate closes before "
                + "the back wall)", example = "0.5")
        Double gateEndMarginUs,
        @Schema(description = "With the gate: whether it opens at least the margin before the lateral wave and closes "
                + "at least the margin after the back wall")
        Boolean gateSpansWall,
        @Schema(description = "With measured_time_us: tip depth sqrt((v t / 2)^2 - S^2), mm", example = "15.1")
        Double depthFromTimeMm,
        @Schema(description = "With depth: tip arrival 2 sqrt(S^2 + d^2) / v, us", example = "13.9")
        Double timeOfFlightUs,
        @Schema(description = "With sampling_frequency_mhz: timing standard uncertainty, dt/sqrt(12) from the "
                + "trigger, dt/sqrt(6) from the lateral wave, ns", example = "2.887")
        Double timingStandardUncertaintyNs,
        @Schema(description = "With a depth or time and sampling_frequency_mhz: depth standard uncertainty from the "
                + "timing, (v^2 t / (4 d)) u_t, mm; null for a tip at the surface",
                example = "0.0116", types = {"number", "null"})
        Optional<Double> timingDepthUncertaintyMm,
        @Schema(description = "With a depth or time and the separation's uncertainty: depth standard uncertainty from "
                + "it, (S / d) u(2S) / 2, mm; null for a tip at the surface", example = "0.58",
                types = {"number", "null"})
        Optional<Double> separationDepthUncertaintyMm,
        @Schema(description = "Combined standard uncertainty of the depth, root sum of squares of the components "
                + "given (GUM eq. 10), mm; null for a tip at the surface", example = "0.58",
                types = {"number", "null"})
        Optional<Double> combinedDepthUncertaintyMm,
        @Schema(description = "Expanded uncertainty, coverage_factor x combined, mm; null for a tip at the surface",
                example = "1.16", types = {"number", "null"})
        Optional<Double> expandedDepthUncertaintyMm,
        @Schema(description = "The normalised request (lengths in mm, velocity in m/s, defaults that have an effect "
                + "filled in); itself a valid request that reproduces this answer")
        TofdSetupRequest inputs,
        VelocitySourceView velocitySource,
        List<WarningView> warnings,
        List<ReferenceView> references,
        @Schema(description = "Inch mirrors of the length results: each x_mm result as x_in = x_mm / 25.4 (the "
                + "inch is 25.4 mm exactly), a speed x_mm_per_s as x_in_per_s; each present when its mm field is, "
                + "null when it is null; omitted when the answer has no length result")
        InInches inInches) {

    /** Inch mirrors of the length results, each the mm result / 25.4. */
    @Schema(name = "TofdSetupInInches", description = "Inch mirrors of the length "
            + "results (the inch is 25.4 mm exactly)")
    record InInches(
            @Schema(description = "depth_from_time_mm / 25.4, in", format = "double")
            Double depthFromTimeIn,
            @Schema(description = "timing_depth_uncertainty_mm / 25.4, in; null when it is null", format = "double",
                    types = {"number", "null"})
            Optional<Double> timingDepthUncertaintyIn,
            @Schema(description = "separation_depth_uncertainty_mm / 25.4, in; null when it is null", format = "double",
                    types = {"number", "null"})
            Optional<Double> separationDepthUncertaintyIn,
            @Schema(description = "combined_depth_uncertainty_mm / 25.4, in; null when it is null", format = "double",
                    types = {"number", "null"})
            Optional<Double> combinedDepthUncertaintyIn,
            @Schema(description = "expanded_depth_uncertainty_mm / 25.4, in; null when it is null", format = "double",
                    types = {"number", "null"})
            Optional<Double> expandedDepthUncertaintyIn) {

        /** The mirrors, or null (omitted) when the answer has no length result. */
        static InInches of(Double depthFromTimeIn, Optional<Double> timingDepthUncertaintyIn,
                    Optional<Double> separationDepthUncertaintyIn, Optional<Double> combinedDepthUncertaintyIn,
                    Optional<Double> expandedDepthUncertaintyIn) {
            return depthFromTimeIn == null && timingDepthUncertaintyIn == null &&
                    separationDepthUncertaintyIn == null && combinedDepthUncertaintyIn == null &&
                    expandedDepthUncertaintyIn == null ? null
                    : new InInches(depthFromTimeIn, timingDepthUncertaintyIn, separationDepthUncertaintyIn,
                    combinedDepthUncertaintyIn, expandedDepthUncertaintyIn);
        }
    }
}
