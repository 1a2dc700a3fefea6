package utdigit.web.arrays;

import org.springframework.stereotype.Component;
import utdigit.core.arrays.ArrayApertureCalculator;
import utdigit.core.arrays.ArrayApertureInput;
import utdigit.core.arrays.ArrayApertureResult;
import utdigit.core.materials.VelocitySource;
import utdigit.web.pipeline.Calculation;
import utdigit.web.problem.FieldErrors;
import utdigit.web.units.Mirrors;
import utdigit.web.pipeline.ResultNotes;
import utdigit.web.units.VelocitySourceView;

/** Request to core input, core result to answer, for array apertures. */
@Component
class ArrayApertureCalculation implements Calculation<ArrayApertureRequest, ArrayApertureResponse> {
    static final String NAME = "array-apertures";

    @Override
    public String name() {
        return NAME;
    }

    @Override
    public Class<ArrayApertureRequest> requestType() {
        return ArrayApertureRequest.class;
    }

    @Override
    public Class<ArrayApertureResponse> answerType() {
        return ArrayApertureResponse.class;
    }

    @Override
    public ArrayApertureResponse answer(ArrayApertureRequest q) {
        FieldErrors errors = FieldErrors.create();
        Double pitchMm = Mirrors.lengthMm(errors, "element_pitch", q.elementPitchMm(), q.elementPitchIn(), true);
        Double apertureMm = Mirrors.lengthMm(errors, "active_aperture", q.activeApertureMm(), q.activeApertureIn(), false);
        Double lengthMm = Mirrors.lengthMm(errors, "element_length", q.elementLengthMm(), q.elementLengthIn(), false);
        VelocitySource velocity = errors.orLater(() -> Mirrors.velocity(errors, q, true));
        errors.throwIfAny();
        ArrayApertureResult r = ArrayApertureCalculator.compute(ArrayApertureInput.builder(q.frequencyMhz(),
                        velocity.velocityMPerS(), pitchMm)
                .activeElements(q.activeElements())
                .activeApertureMm(apertureMm)
                .elementLengthMm(lengthMm)
                .maxSteeringAngleDeg(q.maxSteeringAngleDeg()).build());
        ArrayApertureRequest inputs = new ArrayApertureRequest(q.frequencyMhz(), velocity.velocityMPerS(), null, null,
                null, null, pitchMm, null, q.activeElements(), apertureMm, null, lengthMm, null,
                r.maxSteeringAngleDeg());
        return new ArrayApertureResponse(r.wavelengthMm(), r.activeApertureMm(), r.nearFieldLengthMm(),
                r.beamSpread6dbDeg(), r.beamSpread20dbDeg(), r.beamSpreadNullDeg(), r.passiveNearFieldLengthMm(),
                r.passiveBeamSpread6dbDeg(), r.pitchToWavelengthRatio(), r.maxGratingLobeFreePitchMm(),
                r.gratingLobeFree(), inputs, VelocitySourceView.of(velocity), ResultNotes.warnings(r.warnings()),
                ResultNotes.references(r.references()),
                ArrayApertureResponse.InInches.of(Mirrors.inches(r.wavelengthMm()),
                        Mirrors.inches(r.activeApertureMm()),
                        Mirrors.inches(r.nearFieldLengthMm()),
                        Mirrors.inches(r.passiveNearFieldLengthMm()),
                        Mirrors.inches(r.maxGratingLobeFreePitchMm())));
    }

    @Override
    public String pointer(String coreField, ArrayApertureRequest q) {
        return switch (coreField) {
            case "element_pitch" -> Mirrors.lengthPointer(coreField, q.elementPitchIn());
            case "active_aperture" -> q.activeApertureMm() == null && q.activeApertureIn() == null
                    ? Calculation.super.pointer("active_elements", q)
                    : Mirrors.lengthPointer(coreField, q.activeApertureIn());
            case "element_length" -> Mirrors.lengthPointer(coreField, q.elementLengthIn());
            case "velocity", "velocity_m_per_s" -> Mirrors.velocityPointer(q);
            default -> Calculation.super.pointer(coreField, q);
        };
    }
}
