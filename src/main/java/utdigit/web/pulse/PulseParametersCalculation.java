package utdigit.web.pulse;

import org.springframework.stereotype.Component;
import utdigit.core.materials.VelocitySource;
import utdigit.core.pulse.PulseCalculator;
import utdigit.core.pulse.PulseInput;
import utdigit.core.pulse.PulseResult;
import utdigit.web.common.Calculation;
import utdigit.web.common.FieldErrors;
import utdigit.web.common.JsonPointers;
import utdigit.web.common.Mirrors;
import utdigit.web.common.ResultNotes;
import utdigit.web.common.VelocitySourceView;

/** Request to core input, core result to answer, for pulse parameters. */
@Component
class PulseParametersCalculation implements Calculation<PulseParametersRequest, PulseParametersResponse> {
    static final String NAME = "pulse-parameters";

    @Override
    public String name() {
        return NAME;
    }

    @Override
    public Class<PulseParametersRequest> requestType() {
        return PulseParametersRequest.class;
    }

    @Override
    public Class<PulseParametersResponse> answerType() {
        return PulseParametersResponse.class;
    }

    @Override
    public String pointer(String coreField, PulseParametersRequest q) {
        return switch (coreField) {
            case "element_diameter_mm", "element_diameter" ->
                    JsonPointers.property(q.elementDiameterIn() != null ? "element_diameter_in" : "element_diameter_mm");
            case "distance_mm", "distance" ->
                    JsonPointers.property(q.distanceIn() != null ? "distance_in" : "distance_mm");
            case "wedge_path_mm", "wedge_path" ->
                    JsonPointers.property(q.wedgePathIn() != null ? "wedge_path_in" : "wedge_path_mm");
            case "velocity_m_per_s", "velocity" -> JsonPointers.property(q.material() != null ? "material"
                    : q.velocityInPerUs() != null ? "velocity_in_per_us" : "velocity_m_per_s");
            default -> JsonPointers.property(coreField);
        };
    }

    @Override
    public PulseParametersResponse answer(PulseParametersRequest q) {
        FieldErrors errors = FieldErrors.create();
        VelocitySource velocity = Mirrors.velocity(errors, q, true);
        Double diameterMm = Mirrors.lengthMm(errors, "element_diameter", q.elementDiameterMm(), q.elementDiameterIn(), false);
        Double distanceMm = Mirrors.lengthMm(errors, "distance", q.distanceMm(), q.distanceIn(), false);
        Double wedgePathMm = Mirrors.lengthMm(errors, "wedge_path", q.wedgePathMm(), q.wedgePathIn(), false);
        // centre_frequency_convention without bandwidth_percent is the core's NOT_APPLICABLE (400
        // inapplicable-input), not a field error of this layer (which would answer invalid-input).
        errors.throwIfAny();

        PulseResult r = PulseCalculator.compute(new PulseInput(q.frequencyMhz(), velocity.velocityMPerS(),
                q.bandwidthPercent(), q.centreFrequencyConvention(), diameterMm, distanceMm, wedgePathMm,
                q.wedgeVelocityMPerS(), q.incidentAngleDeg()));

        PulseParametersRequest inputs = new PulseParametersRequest(q.frequencyMhz(), velocity.velocityMPerS(),
                null, null, null, null, q.bandwidthPercent(),
                q.bandwidthPercent() == null ? null : r.centreFrequencyConvention(),
                diameterMm, null, distanceMm, null, wedgePathMm, null, q.wedgeVelocityMPerS(), q.incidentAngleDeg());
        PulseResult.IncidencePlane plane = r.incidencePlane();
        return new PulseParametersResponse(r.periodUs(), r.wavelengthMm(), r.wavelengthIn(),
                r.lowerFrequencyMhz(), r.upperFrequencyMhz(), r.lowerFrequency20dbMhz(), r.upperFrequency20dbMhz(),
                r.lowerFrequency40dbMhz(), r.upperFrequency40dbMhz(), r.pulseDuration6dbUs(), r.pulseDuration20dbUs(),
                r.cycles6db(), r.spatialPulseLengthMm(), r.axialResolutionMm(), r.nearFieldLengthMm(),
                r.nearFieldLengthExactMm(), r.beamSpread6dbDeg(), r.beamSpread20dbDeg(), r.beamSpreadNullDeg(),
                r.beamDiameter6dbMm(), r.nearFieldInPartMm(), r.refractedAngleDeg(),
                plane == null ? null : plane.apertureMm(), plane == null ? null : plane.nearFieldLengthMm(),
                plane == null ? null : plane.nearFieldInPartMm(), plane == null ? null : plane.beamSpread6dbDeg(),
                plane == null ? null : plane.beamSpread20dbDeg(), plane == null ? null : plane.beamDiameter6dbMm(),
                inputs,
                VelocitySourceView.of(velocity), ResultNotes.warnings(r.warnings()),
                ResultNotes.references(r.references()));
    }
}
