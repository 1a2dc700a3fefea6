package utdigit.web.thickness;

import java.util.List;
import java.util.Locale;
import org.springframework.stereotype.Component;
import utdigit.core.common.CalculationException;
import utdigit.core.materials.VelocitySource;
import utdigit.core.thickness.ThicknessCalculator;
import utdigit.core.thickness.ThicknessInput;
import utdigit.core.thickness.ThicknessResult;
import utdigit.web.common.ToleranceCheck;
import utdigit.web.common.Calculation;
import utdigit.web.common.FieldErrors;
import utdigit.web.common.JsonPointers;
import utdigit.web.common.Mirrors;
import utdigit.web.common.ResultNotes;
import utdigit.web.common.VelocityFields;
import utdigit.web.common.VelocitySourceView;

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
        if (q.velocityUncertaintyMPerS() != null && q.velocityUncertaintyPercent() != null) {
            String detail = "give the velocity uncertainty once: velocity_uncertainty_m_per_s or "
                    + "velocity_uncertainty_percent, not both";
            errors.add("velocity_uncertainty_m_per_s", detail).add("velocity_uncertainty_percent", detail);
        }
        VelocitySource velocity = null;
        CalculationException velocityImpossible = null;
        try {
            velocity = Mirrors.velocity(errors, q, true);
        } catch (CalculationException e) {
            velocityImpossible = e; // a 422 (water with SHEAR) waits for the 400s of the other fields
        }
        if (velocity != null && q.velocityUncertaintyMPerS() != null
                && q.velocityUncertaintyMPerS() > MAX_VELOCITY_UNCERTAINTY_PERCENT / 100.0 * velocity.velocityMPerS()) {
            errors.add("velocity_uncertainty_m_per_s", String.format(Locale.ROOT,
                    "must be at most 20 %% of the velocity (%s m/s here)",
                    number(MAX_VELOCITY_UNCERTAINTY_PERCENT / 100.0 * velocity.velocityMPerS())));
        }
        errors.throwIfAny();
        if (velocityImpossible != null) {
            throw velocityImpossible;
        }

        // No velocity uncertainty given and a material that states one: its standard uncertainty is used.
        boolean materialUncertainty = q.velocityUncertaintyMPerS() == null && q.velocityUncertaintyPercent() == null
                && velocity.standardUncertaintyMPerS() != null;
        Double velocityUncertaintyMPerS = materialUncertainty
                ? velocity.standardUncertaintyMPerS() : q.velocityUncertaintyMPerS();
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
                requiredResolutionMm, null, r.coverageFactor(), q.frequencyMhz(), q.bandwidthPercent());
        return new ThicknessResolutionResponse(r.thicknessResolutionMm(), r.thicknessResolutionIn(),
                r.roundTripTimeUs(), r.samplesAcrossThickness(), r.relativeResolutionPercent(),
                r.timingStandardUncertaintyNs(), r.timingWorstCaseErrorNs(), r.standardUncertaintyMm(),
                r.expandedUncertaintyMm(), r.requiredSamplingFrequencyMhz(),
                ToleranceCheck.builder().atMost("thickness_resolution_mm", r.thicknessResolutionMm(),
                        "required_resolution_mm", requiredResolutionMm).build(),
                inputs,
                materialUncertainty ? VelocitySourceView.usingMaterialUncertainty(velocity) : VelocitySourceView.of(velocity),
                ResultNotes.warnings(r.warnings()), ResultNotes.references(r.references()));
    }

    /** The core names lengths by their base name and the velocity as "velocity": point at the form sent. */
    @Override
    public String pointer(String coreField, ThicknessResolutionRequest q) {
        return switch (coreField) {
            case "nominal_thickness" -> Mirrors.lengthPointer(coreField, q.nominalThicknessIn());
            case "required_resolution" -> Mirrors.lengthPointer(coreField, q.requiredResolutionIn());
            case "velocity" -> Mirrors.velocityPointer(q);
            default -> Calculation.super.pointer(coreField, q);
        };
    }


    private static String number(double value) {
        return value == StrictMath.rint(value) ? String.valueOf((long) value) : String.valueOf(value);
    }
}
