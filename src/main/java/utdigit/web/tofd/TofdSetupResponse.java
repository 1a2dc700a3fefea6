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
        double lateralWaveTimeUs,
        double backwallTimeUs,
        double gateMarginUs,
        double requiredGateStartUs,
        double requiredGateEndUs,
        Double gateStartMarginUs,
        Double gateEndMarginUs,
        Boolean gateSpansWall,
        Double depthFromTimeMm,
        Double timeOfFlightUs,
        Double timingStandardUncertaintyNs,
        @Schema(types = {"number", "null"})
        Optional<Double> timingDepthUncertaintyMm,
        @Schema(types = {"number", "null"})
        Optional<Double> separationDepthUncertaintyMm,
        @Schema(types = {"number", "null"})
        Optional<Double> combinedDepthUncertaintyMm,
        @Schema(types = {"number", "null"})
        Optional<Double> expandedDepthUncertaintyMm,
        TofdSetupRequest inputs,
        VelocitySourceView velocitySource,
        List<WarningView> warnings,
        List<ReferenceView> references,
        InInches inInches) {

    /** Inch mirrors of the length results, each the mm result / 25.4. */
    @Schema(name = "TofdSetupInInches", description = "Inch mirrors of the length "
            + "results (the inch is 25.4 mm exactly)")
    record InInches(
            @Schema(format = "double")
            Double depthFromTimeIn,
            @Schema(format = "double", types = {"number", "null"})
            Optional<Double> timingDepthUncertaintyIn,
            @Schema(format = "double", types = {"number", "null"})
            Optional<Double> separationDepthUncertaintyIn,
            @Schema(format = "double", types = {"number", "null"})
            Optional<Double> combinedDepthUncertaintyIn,
            @Schema(format = "double", types = {"number", "null"})
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
