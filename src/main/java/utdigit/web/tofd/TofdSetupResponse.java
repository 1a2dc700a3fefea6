package utdigit.web.tofd;

import io.swagger.v3.oas.annotations.media.Schema;
import java.util.List;
import java.util.Optional;
import utdigit.web.pipeline.ResultNotes.ReferenceView;
import utdigit.web.pipeline.ResultNotes.WarningView;
import utdigit.web.units.Mirrors;
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
        Optional<Double> timingDepthUncertaintyMm,
        Optional<Double> separationDepthUncertaintyMm,
        Optional<Double> combinedDepthUncertaintyMm,
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
            Double depthFromTimeIn,
            Optional<Double> timingDepthUncertaintyIn,
            Optional<Double> separationDepthUncertaintyIn,
            Optional<Double> combinedDepthUncertaintyIn,
            Optional<Double> expandedDepthUncertaintyIn) {

        /** The mirrors, or null (omitted) when the answer has no length result. */
        static InInches of(Double depthFromTimeIn, Optional<Double> timingDepthUncertaintyIn,
                    Optional<Double> separationDepthUncertaintyIn, Optional<Double> combinedDepthUncertaintyIn,
                    Optional<Double> expandedDepthUncertaintyIn) {
            return Mirrors.orNone(new InInches(depthFromTimeIn, timingDepthUncertaintyIn,
                    separationDepthUncertaintyIn, combinedDepthUncertaintyIn, expandedDepthUncertaintyIn));
        }
    }
}
