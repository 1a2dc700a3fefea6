package utdigit.web.timing;

import org.springframework.stereotype.Component;
import utdigit.core.materials.VelocitySource;
import utdigit.core.timing.Technique;
import utdigit.core.timing.TimeOfFlightCalculator;
import utdigit.core.timing.TimeOfFlightInput;
import utdigit.core.timing.TimeOfFlightResult;
import utdigit.web.pipeline.Calculation;
import utdigit.web.problem.FieldErrors;
import utdigit.web.units.Mirrors;
import utdigit.web.pipeline.ResultNotes;
import utdigit.web.units.VelocitySourceView;

/**
 * Request to core input, core result to answer, for time-of-flight resolutions. The mm/in mirrors
 * and the velocity's three forms are resolved here; TOFD's required probe_centre_separation is
 * checked here too, so that its absence is reported with the other field errors.
 */
@Component
class TimeOfFlightResolutionCalculation implements Calculation<TimeOfFlightResolutionRequest, TimeOfFlightResolutionResponse> {
    static final String NAME = "time-of-flight-resolutions";

    @Override
    public String name() {
        return NAME;
    }

    @Override
    public Class<TimeOfFlightResolutionRequest> requestType() {
        return TimeOfFlightResolutionRequest.class;
    }

    @Override
    public Class<TimeOfFlightResolutionResponse> answerType() {
        return TimeOfFlightResolutionResponse.class;
    }

    @Override
    public TimeOfFlightResolutionResponse answer(TimeOfFlightResolutionRequest q) {
        FieldErrors errors = FieldErrors.create();
        Technique technique = q.technique() == null ? TimeOfFlightCalculator.DEFAULT_TECHNIQUE : q.technique();
        Double separationMm = Mirrors.lengthMm(errors, "probe_centre_separation",
                q.probeCentreSeparationMm(), q.probeCentreSeparationIn(), false);
        if (technique == Technique.TOFD && q.probeCentreSeparationMm() == null && q.probeCentreSeparationIn() == null) {
            errors.add("probe_centre_separation_mm", "is required for technique TOFD: give probe_centre_separation_mm "
                    + "or probe_centre_separation_in (the full separation 2S between the probe indices)");
        }
        Double depthMm = Mirrors.lengthMm(errors, "depth", q.depthMm(), q.depthIn(), false);
        Double thicknessMm = Mirrors.lengthMm(errors, "thickness", q.thicknessMm(), q.thicknessIn(), false);
        VelocitySource velocity = errors.orLater(() -> Mirrors.velocity(errors, q, true));
        errors.throwIfAny();

        TimeOfFlightResult r = TimeOfFlightCalculator.compute(
                TimeOfFlightInput.builder(q.samplingFrequencyMhz(), velocity.velocityMPerS())
                        .decimationFactor(q.decimationFactor())
                        .technique(q.technique())
                        .refractedAngleDeg(q.refractedAngleDeg())
                        .probeCentreSeparationMm(separationMm)
                        .depthMm(depthMm)
                        .thicknessMm(thicknessMm)
                        .pulseDurationUs(q.pulseDurationUs())
                        .frequencyMhz(q.frequencyMhz())
                        .bandwidthPercent(q.bandwidthPercent())
                        .timeReference(q.timeReference())
                        .build());

        // time_reference is a choice only for TOFD; elsewhere it is always the trigger and is not echoed.
        TimeOfFlightResolutionRequest inputs = new TimeOfFlightResolutionRequest(q.samplingFrequencyMhz(),
                r.decimationFactor(), velocity.velocityMPerS(), null, null, null, null, r.technique(),
                q.refractedAngleDeg(), separationMm, null, depthMm, null, thicknessMm, null, q.pulseDurationUs(),
                q.frequencyMhz(), q.bandwidthPercent(), r.technique() == Technique.TOFD ? r.timeReference() : null);
        return new TimeOfFlightResolutionResponse(r.timeResolutionNs(), r.timingErrorNs(),
                r.timingStandardUncertaintyNs(), r.soundPathResolutionMm(), r.depthResolutionMm(),
                r.surfaceDistanceResolutionMm(), r.lateralWaveTimeUs(), r.timeOfFlightUs(),
                r.pulseLimitedDepthResolutionMm(), r.deadZoneDepthMm(), r.backwallDeadZoneMm(),
                r.pulseDurationUsedUs(), inputs, VelocitySourceView.of(velocity),
                ResultNotes.warnings(r.warnings()), ResultNotes.references(r.references()),
                TimeOfFlightResolutionResponse.InInches.of(Mirrors.inches(r.soundPathResolutionMm()),
                        Mirrors.inches(r.depthResolutionMm()),
                        Mirrors.inches(r.surfaceDistanceResolutionMm()),
                        Mirrors.inches(r.pulseLimitedDepthResolutionMm()),
                        Mirrors.inches(r.deadZoneDepthMm()),
                        Mirrors.inches(r.backwallDeadZoneMm())));
    }

    /** The core names lengths by their base name and the velocity as "velocity": point at the form sent. */
    @Override
    public String pointer(String coreField, TimeOfFlightResolutionRequest q) {
        return switch (coreField) {
            case "probe_centre_separation" -> Mirrors.lengthPointer(coreField, q.probeCentreSeparationIn());
            case "depth" -> Mirrors.lengthPointer(coreField, q.depthIn());
            case "thickness" -> Mirrors.lengthPointer(coreField, q.thicknessIn());
            case "velocity" -> Mirrors.velocityPointer(q);
            default -> Calculation.super.pointer(coreField, q);
        };
    }

}
