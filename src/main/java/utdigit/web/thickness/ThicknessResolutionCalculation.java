package utdigit.web.thickness;

import org.springframework.stereotype.Component;
import utdigit.core.common.MessageNumbers;
import utdigit.core.common.Units;
import utdigit.core.materials.VelocitySource;
import utdigit.core.thickness.ThicknessCalculator;
import utdigit.core.thickness.ThicknessInput;
import utdigit.core.thickness.ThicknessResult;
import utdigit.web.pipeline.ToleranceCheck;
import utdigit.web.pipeline.Calculation;
import utdigit.web.problem.FieldErrors;
import utdigit.web.json.JsonPointers;
import utdigit.web.units.Mirrors;
import utdigit.web.pipeline.ResultNotes;
import utdigit.web.units.VelocitySourceView;

/**
 * Request to core input, core result to answer, for thickness resolutions. The mm/in mirrors, the
 * velocity's three forms and the velocity uncertainty's two forms (one at most; in m/s at most
 * 20 % of the velocity, the range the percent form has) are resolved here.
 */
@Component
class ThicknessResolutionCalculation implements Calculation<ThicknessResolutionRequest, ThicknessResolutionResponse> {
    static final String NAME = "thickness-resolutions";

    /** Largest velocity uncertainty accepted, percent of the velocity (the contract's ranges, README and OpenAPI). */
    static final double MAX_VELOCITY_UNCERTAINTY_PERCENT = 20.0;
    /** The m/s form's upper bound of the velocity uncertainty (its Bean Validation range). */
    private static final double MAX_VELOCITY_UNCERTAINTY_M_PER_S = 4000.0;

    @Override
    public String name() {
        return NAME;
    }

    @Override
    public Class<ThicknessResolutionRequest> requestType() {
        return ThicknessResolutionRequest.class;
    }

    @Override
    public Class<ThicknessResolutionResponse> answerType() {
        return ThicknessResolutionResponse.class;
    }

    @Override
    public ThicknessResolutionResponse answer(ThicknessResolutionRequest q) {
        FieldErrors errors = FieldErrors.create();
        Double thicknessMm = Mirrors.lengthMm(errors, "nominal_thickness", q.nominalThicknessMm(),
                q.nominalThicknessIn(), true);
        Double requiredResolutionMm = Mirrors.lengthMm(errors, "required_resolution", q.requiredResolutionMm(),
                q.requiredResolutionIn(), false);
        Double givenUncertaintyMPerS = Mirrors.speedMPerS(errors, "velocity_uncertainty",
                q.velocityUncertaintyMPerS(), q.velocityUncertaintyInPerUs(), 0.0, MAX_VELOCITY_UNCERTAINTY_M_PER_S);
        String uncertaintyName = q.velocityUncertaintyInPerUs() != null
                ? "velocity_uncertainty_in_per_us" : "velocity_uncertainty_m_per_s";
        if (givenUncertaintyMPerS != null && q.velocityUncertaintyPercent() != null) {
            errors.notBoth("the velocity uncertainty", uncertaintyName, "velocity_uncertainty_percent");
        }
        VelocitySource velocity = errors.orLater(() -> Mirrors.velocity(errors, q, true));
        if (velocity != null && givenUncertaintyMPerS != null
                && givenUncertaintyMPerS > MAX_VELOCITY_UNCERTAINTY_PERCENT / 100.0 * velocity.velocityMPerS()) {
            double limitMPerS = MAX_VELOCITY_UNCERTAINTY_PERCENT / 100.0 * velocity.velocityMPerS();
            errors.add(uncertaintyName, q.velocityUncertaintyInPerUs() != null
                    ? "must be at most 20 % of the velocity (" + MessageNumbers.rounded(Units.mPerSToInPerUs(limitMPerS))
                            + " in/us here)"
                    : "must be at most 20 % of the velocity (" + MessageNumbers.exact(limitMPerS) + " m/s here)");
        }
        errors.throwIfAny();

        // No velocity uncertainty given and a material that states one: its standard uncertainty is used.
        boolean materialUncertainty = givenUncertaintyMPerS == null && q.velocityUncertaintyPercent() == null
                && velocity.standardUncertaintyMPerS() != null;
        Double velocityUncertaintyMPerS = materialUncertainty
                ? velocity.standardUncertaintyMPerS() : givenUncertaintyMPerS;
        ThicknessResult r = ThicknessCalculator.compute(
                ThicknessInput.builder(q.samplingFrequencyMhz(), velocity.velocityMPerS(), thicknessMm)
                        .decimationFactor(q.decimationFactor())
                        .velocityUncertaintyMPerS(velocityUncertaintyMPerS)
                        .velocityUncertaintyPercent(q.velocityUncertaintyPercent())
                        .measurement(q.measurement())
                        .echoSpacing(q.echoSpacing())
                        .requiredResolutionMm(requiredResolutionMm)
                        .coverageFactor(q.coverageFactor())
                        .frequencyMhz(q.frequencyMhz())
                        .bandwidthPercent(q.bandwidthPercent())
                        .build());

        // The velocity uncertainty keeps the caller's form (a percent follows the velocity, it is not a
        // mirror). None given stays absent: an explicit 0 would add a reference and so not reproduce the answer.
        ThicknessResolutionRequest inputs = new ThicknessResolutionRequest(q.samplingFrequencyMhz(),
                r.decimationFactor(), velocity.velocityMPerS(), null, null, null, null, velocityUncertaintyMPerS,
                q.velocityUncertaintyPercent(), thicknessMm, null, r.measurement(), r.echoSpacing(),
                requiredResolutionMm, null, r.coverageFactor(), q.frequencyMhz(), q.bandwidthPercent(), null);
        return new ThicknessResolutionResponse(r.thicknessResolutionMm(), r.thicknessResolutionIn(),
                r.roundTripTimeUs(), r.samplesAcrossThickness(), r.relativeResolutionPercent(),
                r.timingStandardUncertaintyNs(), r.timingWorstCaseErrorNs(), r.standardUncertaintyMm(),
                r.expandedUncertaintyMm(), r.requiredSamplingFrequencyMhz(),
                ToleranceCheck.builder().atMost("thickness_resolution_mm", r.thicknessResolutionMm(),
                        "required_resolution_mm", requiredResolutionMm).build(),
                inputs,
                materialUncertainty ? VelocitySourceView.usingMaterialUncertainty(velocity) : VelocitySourceView.of(velocity),
                ResultNotes.warnings(r.warnings()), ResultNotes.references(r.references()),
                ThicknessResolutionResponse.InInches.of(Mirrors.inches(r.standardUncertaintyMm()),
                        Mirrors.inches(r.expandedUncertaintyMm())));
    }

    /** The core names lengths by their base name and the velocity as "velocity": point at the form sent. */
    @Override
    public String pointer(String coreField, ThicknessResolutionRequest q) {
        return switch (coreField) {
            case "nominal_thickness" -> Mirrors.lengthPointer(coreField, q.nominalThicknessIn());
            case "required_resolution" -> Mirrors.lengthPointer(coreField, q.requiredResolutionIn());
            case "velocity" -> Mirrors.velocityPointer(q);
            case "velocity_uncertainty_m_per_s" -> JsonPointers.property(q.velocityUncertaintyInPerUs() != null
                    ? "velocity_uncertainty_in_per_us" : "velocity_uncertainty_m_per_s");
            default -> Calculation.super.pointer(coreField, q);
        };
    }
}
