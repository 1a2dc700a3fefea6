package utdigit.web.timing;

import io.swagger.v3.oas.annotations.media.Schema;
import java.util.List;
import java.util.Optional;
import utdigit.web.pipeline.ResultNotes.ReferenceView;
import utdigit.web.pipeline.ResultNotes.WarningView;
import utdigit.web.units.Mirrors;
import utdigit.web.units.VelocitySourceView;

/** The answer of POST /api/time-of-flight-resolutions. */
@Schema(name = "TimeOfFlightResolution", description = "What one sample of the stored time base is worth in time "
        + "and in millimetres of sound path, depth and surface distance, and for TOFD the geometry at the given "
        + "depth and thickness. Fields whose optional inputs were not given, or that do not belong to the "
        + "technique, are omitted.")
record TimeOfFlightResolutionResponse(
        double timeResolutionNs,
        double timingErrorNs,
        double timingStandardUncertaintyNs,
        double soundPathResolutionMm,
        Double depthResolutionMm,
        Double surfaceDistanceResolutionMm,
        Double lateralWaveTimeUs,
        Double timeOfFlightUs,
        Double pulseLimitedDepthResolutionMm,
        Double deadZoneDepthMm,
        Double backwallDeadZoneMm,
        Double pulseDurationUsedUs,
        TimeOfFlightResolutionRequest inputs,
        VelocitySourceView velocitySource,
        List<WarningView> warnings,
        List<ReferenceView> references,
        InInches inInches) {

    /** Inch mirrors of the length results, each the mm result / 25.4. */
    @Schema(name = "TimeOfFlightResolutionInInches", description = "Inch mirrors of the length "
            + "results (the inch is 25.4 mm exactly)")
    record InInches(
            Double soundPathResolutionIn,
            Double depthResolutionIn,
            Double surfaceDistanceResolutionIn,
            Double pulseLimitedDepthResolutionIn,
            Double deadZoneDepthIn,
            Double backwallDeadZoneIn) {

        /** The mirrors, or null (omitted) when the answer has no length result. */
        static InInches of(Double soundPathResolutionIn, Double depthResolutionIn,
                    Double surfaceDistanceResolutionIn, Double pulseLimitedDepthResolutionIn, Double deadZoneDepthIn,
                    Double backwallDeadZoneIn) {
            return Mirrors.orNone(new InInches(soundPathResolutionIn, depthResolutionIn, surfaceDistanceResolutionIn,
                    pulseLimitedDepthResolutionIn, deadZoneDepthIn, backwallDeadZoneIn));
        }
    }
}
