package utdigit.web.timing;

import io.swagger.v3.oas.annotations.media.Schema;
import java.util.List;
import java.util.Optional;
import utdigit.web.pipeline.ResultNotes.ReferenceView;
import utdigit.web.pipeline.ResultNotes.WarningView;
import utdigit.web.units.VelocitySourceView;

/** The answer of POST /api/time-of-flight-resolutions. */
@Schema(name = "TimeOfFlightResolution", description = "What one sample of the stored time base is worth in time "
        + "and in millimetres of sound path, depth and surface distance, and for TOFD the geometry at the given "
        + "depth and thickness. Fields whose optional inputs were not given, or that do not belong to the "
        + "technique, are omitted.")
record TimeOfFlightResolutionResponse(
        @Schema(description = "One sample of the stored time base dt = decimation_factor / sampling_frequency_mhz, ns",
                example = "10")
        double timeResolutionNs,
        @Schema(description = "Worst-case timing error: dt/2 from the trigger, dt from the lateral wave, ns",
                example = "5")
        double timingErrorNs,
        @Schema(description = "Standard uncertainty of the timing: dt/sqrt(12) from the trigger (rectangular), "
                + "dt/sqrt(6) from the lateral wave (triangular), ns", example = "2.887")
        double timingStandardUncertaintyNs,
        @Schema(description = "Sound path of one sample: v dt/2 pulse-echo (one way), v dt through-transmission, "
                + "v dt TOFD (both legs together), mm", example = "0.0296")
        double soundPathResolutionMm,
        @Schema(description = "PULSE_ECHO with refracted_angle_deg: depth per sample, sound_path_resolution_mm x "
                + "cos(angle); TOFD with depth: the depth step of one sample at that depth (exact forward "
                + "difference d(t + dt) - d(t)), mm", example = "0.0148")
        Double depthResolutionMm,
        @Schema(description = "PULSE_ECHO with refracted_angle_deg: surface distance per sample, "
                + "sound_path_resolution_mm x sin(angle), mm", example = "0.0256")
        Double surfaceDistanceResolutionMm,
        @Schema(description = "TOFD: lateral wave arrival 2S/v in the part, us", example = "9.8")
        Double lateralWaveTimeUs,
        @Schema(description = "TOFD with depth: tip signal arrival 2 sqrt(S^2 + d^2)/v in the part, us",
                example = "11.6")
        Double timeOfFlightUs,
        @Schema(description = "TOFD with depth and a pulse duration: the depth range within one pulse duration "
                + "after the tip signal, sqrt((v (t + tp)/2)^2 - S^2) - d, mm", example = "1.2")
        Double pulseLimitedDepthResolutionMm,
        @Schema(description = "TOFD with a pulse duration: near-surface dead zone sqrt((S + v tp/2)^2 - S^2), mm",
                example = "6.4")
        Double deadZoneDepthMm,
        @Schema(description = "TOFD with thickness and a pulse duration: back-wall dead zone, the depths above the "
                + "back wall whose tip signal arrives within tp before the back-wall signal, mm",
                example = "0.9")
        Double backwallDeadZoneMm,
        @Schema(description = "TOFD with a pulse duration: the pulse duration tp used, pulse_duration_us as given "
                + "or the model's -20 dB envelope duration from frequency_mhz and bandwidth_percent, us",
                example = "0.3")
        Double pulseDurationUsedUs,
        @Schema(description = "The normalised request (lengths in mm, velocity in m/s, technique, "
                + "decimation_factor and for TOFD time_reference filled in); itself a valid request that "
                + "reproduces this answer")
        TimeOfFlightResolutionRequest inputs,
        VelocitySourceView velocitySource,
        List<WarningView> warnings,
        List<ReferenceView> references,
        @Schema(description = "Inch mirrors of the length results: each x_mm result as x_in = x_mm / 25.4 (the "
                + "inch is 25.4 mm exactly), a speed x_mm_per_s as x_in_per_s; each present when its mm field is, "
                + "null when it is null; omitted when the answer has no length result")
        InInches inInches) {

    /** Inch mirrors of the length results, each the mm result / 25.4. */
    @Schema(name = "TimeOfFlightResolutionInInches", description = "Inch mirrors of the length "
            + "results (the inch is 25.4 mm exactly)")
    record InInches(
            @Schema(description = "sound_path_resolution_mm / 25.4, in", format = "double")
            Double soundPathResolutionIn,
            @Schema(description = "depth_resolution_mm / 25.4, in", format = "double")
            Double depthResolutionIn,
            @Schema(description = "surface_distance_resolution_mm / 25.4, in", format = "double")
            Double surfaceDistanceResolutionIn,
            @Schema(description = "pulse_limited_depth_resolution_mm / 25.4, in", format = "double")
            Double pulseLimitedDepthResolutionIn,
            @Schema(description = "dead_zone_depth_mm / 25.4, in", format = "double")
            Double deadZoneDepthIn,
            @Schema(description = "backwall_dead_zone_mm / 25.4, in", format = "double")
            Double backwallDeadZoneIn) {

        /** The mirrors, or null (omitted) when the answer has no length result. */
        static InInches of(Double soundPathResolutionIn, Double depthResolutionIn,
                    Double surfaceDistanceResolutionIn, Double pulseLimitedDepthResolutionIn, Double deadZoneDepthIn,
                    Double backwallDeadZoneIn) {
            return soundPathResolutionIn == null && depthResolutionIn == null &&
                    surfaceDistanceResolutionIn == null && pulseLimitedDepthResolutionIn == null &&
                    deadZoneDepthIn == null && backwallDeadZoneIn == null ? null
                    : new InInches(soundPathResolutionIn, depthResolutionIn, surfaceDistanceResolutionIn,
                    pulseLimitedDepthResolutionIn, deadZoneDepthIn, backwallDeadZoneIn);
        }
    }
}
