package utdigit.core.timing;

import java.util.List;
import java.util.Objects;
import utdigit.core.common.Reference;
import utdigit.core.common.Warning;

/**
 * A time-of-flight resolution: the contract's result fields of POST /api/time-of-flight-resolutions
 * (camelCase of the snake_case names), the options used, warnings and references. A field whose
 * optional inputs were not given (or that does not belong to the technique) is null.
 *
 * @param technique the technique used (default PULSE_ECHO)
 * @param timeReference the time reference used (default TRIGGER)
 * @param decimationFactor the decimation factor used (default 1)
 * @param timeResolutionNs one sample of the stored time base dt, ns
 * @param timingErrorNs worst-case timing error: dt/2 from the trigger, dt from the lateral wave, ns
 * @param timingStandardUncertaintyNs dt/sqrt(12) from the trigger, dt/sqrt(6) from the lateral wave, ns
 * @param soundPathResolutionMm sound path of one sample: v dt/2 pulse-echo (one way), v dt
 *     through-transmission, v dt TOFD (both legs), mm
 * @param depthResolutionMm pulse-echo with refracted_angle_deg: x cos(theta); TOFD with depth: the
 *     depth step of one sample at that depth (exact forward difference), mm
 * @param surfaceDistanceResolutionMm pulse-echo with refracted_angle_deg: x sin(theta), mm
 * @param lateralWaveTimeUs TOFD: 2S/v, us
 * @param timeOfFlightUs TOFD with depth: 2 sqrt(S^2 + d^2)/v, us
 * @param pulseLimitedDepthResolutionMm TOFD with depth and a pulse duration, mm
 * @param deadZoneDepthMm TOFD with a pulse duration: near-surface dead zone, mm
 * @param backwallDeadZoneMm TOFD with thickness and a pulse duration, mm
 * @param pulseDurationUsedUs TOFD with a pulse duration: the caller's pulse_duration_us or the
 *     model's -20 dB envelope duration, us
 * @param warnings conditions the caller should know about
 * @param references the source of every formula used
 */
public record TimeOfFlightResult(
        Technique technique,
        TimeReference timeReference,
        int decimationFactor,
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
        List<Warning> warnings,
        List<Reference> references) {

    public TimeOfFlightResult {
        Objects.requireNonNull(technique, "technique");
        Objects.requireNonNull(timeReference, "timeReference");
        warnings = List.copyOf(warnings);
        references = List.copyOf(references);
    }
}
