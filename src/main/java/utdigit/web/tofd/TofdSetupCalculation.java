package utdigit.web.tofd;

import org.springframework.stereotype.Component;
import utdigit.core.materials.VelocitySource;
import utdigit.core.timing.TofdSetupCalculator;
import utdigit.core.timing.TofdSetupInput;
import utdigit.core.timing.TofdSetupResult;
import utdigit.web.pipeline.Calculation;
import utdigit.web.problem.FieldErrors;
import utdigit.web.units.Mirrors;
import utdigit.web.pipeline.ResultNotes;
import utdigit.web.units.VelocitySourceView;

/** Request to core input, core result to answer, for TOFD set-ups. */
@Component
class TofdSetupCalculation implements Calculation<TofdSetupRequest, TofdSetupResponse> {
    static final String NAME = "tofd-setups";

    @Override
    public String name() {
        return NAME;
    }

    @Override
    public Class<TofdSetupRequest> requestType() {
        return TofdSetupRequest.class;
    }

    @Override
    public Class<TofdSetupResponse> answerType() {
        return TofdSetupResponse.class;
    }

    @Override
    public TofdSetupResponse answer(TofdSetupRequest q) {
        FieldErrors errors = FieldErrors.create();
        Double separationMm = Mirrors.lengthMm(errors, "probe_centre_separation", q.probeCentreSeparationMm(),
                q.probeCentreSeparationIn(), true);
        Double thicknessMm = Mirrors.lengthMm(errors, "thickness", q.thicknessMm(), q.thicknessIn(), true);
        Double depthMm = Mirrors.lengthMm(errors, "depth", q.depthMm(), q.depthIn(), false);
        Double separationUncertaintyMm = separationUncertaintyMm(errors, q);
        VelocitySource velocity = errors.orLater(() -> Mirrors.velocity(errors, q, true));
        errors.throwIfAny();
        TofdSetupResult r = TofdSetupCalculator.compute(TofdSetupInput.builder(velocity.velocityMPerS(), separationMm,
                        thicknessMm)
                .gateStartUs(q.gateStartUs())
                .gateEndUs(q.gateEndUs())
                .pulseDurationUs(q.pulseDurationUs())
                .depthMm(depthMm)
                .measuredTimeUs(q.measuredTimeUs())
                .samplingFrequencyMhz(q.samplingFrequencyMhz())
                .decimationFactor(q.decimationFactor())
                .timeReference(q.timeReference())
                .probeCentreSeparationUncertaintyMm(separationUncertaintyMm)
                .coverageFactor(q.coverageFactor()).build());
        boolean sampled = q.samplingFrequencyMhz() != null;
        boolean atDepth = depthMm != null || q.measuredTimeUs() != null;
        boolean uncertain = atDepth && (sampled || separationUncertaintyMm != null);
        TofdSetupRequest inputs = new TofdSetupRequest(velocity.velocityMPerS(), null, null, null, null, separationMm,
                null, thicknessMm, null, q.gateStartUs(), q.gateEndUs(), q.pulseDurationUs(), depthMm, null,
                q.measuredTimeUs(), q.samplingFrequencyMhz(),
                sampled ? (q.decimationFactor() == null ? 1 : q.decimationFactor()) : null,
                sampled ? r.timeReference() : null, separationUncertaintyMm, null,
                uncertain ? r.coverageFactor() : null);
        return new TofdSetupResponse(r.lateralWaveTimeUs(), r.backwallTimeUs(), r.gateMarginUs(),
                r.requiredGateStartUs(), r.requiredGateEndUs(), r.gateStartMarginUs(), r.gateEndMarginUs(),
                r.gateSpansWall(), r.depthFromTimeMm(), r.timeOfFlightUs(), r.timingStandardUncertaintyNs(),
                r.timingDepthUncertaintyMm(), r.separationDepthUncertaintyMm(), r.combinedDepthUncertaintyMm(),
                r.expandedDepthUncertaintyMm(), inputs, VelocitySourceView.of(velocity),
                ResultNotes.warnings(r.warnings()), ResultNotes.references(r.references()),
                TofdSetupResponse.InInches.of(Mirrors.inches(r.depthFromTimeMm()),
                        Mirrors.inches(r.timingDepthUncertaintyMm()),
                        Mirrors.inches(r.separationDepthUncertaintyMm()),
                        Mirrors.inches(r.combinedDepthUncertaintyMm()),
                        Mirrors.inches(r.expandedDepthUncertaintyMm())));
    }

    /** The separation's uncertainty in mm from its _mm or _in form (0 is allowed, unlike other lengths). */
    private static Double separationUncertaintyMm(FieldErrors errors, TofdSetupRequest q) {
        Double mm = q.probeCentreSeparationUncertaintyMm();
        Double in = q.probeCentreSeparationUncertaintyIn();
        if (mm != null && in != null) {
            errors.notBoth("probe_centre_separation_uncertainty", "probe_centre_separation_uncertainty_mm",
                    "probe_centre_separation_uncertainty_in");
            return null;
        }
        if (in != null) {
            double converted = utdigit.core.common.Units.inToMm(in);
            if (!(converted <= Mirrors.MAX_LENGTH_MM)) {
                errors.add("probe_centre_separation_uncertainty_in", "must be at most "
                        + (Mirrors.MAX_LENGTH_MM / utdigit.core.common.Units.MM_PER_IN) + " in (100 m)");
                return null;
            }
            return converted;
        }
        return mm;
    }

    @Override
    public String pointer(String coreField, TofdSetupRequest q) {
        return switch (coreField) {
            case "probe_centre_separation" -> Mirrors.lengthPointer(coreField, q.probeCentreSeparationIn());
            case "probe_centre_separation_uncertainty" ->
                    Mirrors.lengthPointer(coreField, q.probeCentreSeparationUncertaintyIn());
            case "thickness" -> Mirrors.lengthPointer(coreField, q.thicknessIn());
            case "depth" -> Mirrors.lengthPointer(coreField, q.depthIn());
            case "velocity", "velocity_m_per_s" -> Mirrors.velocityPointer(q);
            default -> Calculation.super.pointer(coreField, q);
        };
    }
}
