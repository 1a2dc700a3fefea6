package utdigit.web.pulse;

import org.springframework.stereotype.Component;
import utdigit.core.materials.VelocitySource;
import utdigit.core.pulse.PulseCalculator;
import utdigit.core.pulse.PulseInput;
import utdigit.core.pulse.PulseResult;
import utdigit.web.pipeline.Calculation;
import utdigit.web.problem.FieldErrors;
import utdigit.web.json.JsonPointers;
import utdigit.web.units.Mirrors;
import utdigit.web.units.VelocityFields;
import utdigit.web.pipeline.ResultNotes;
import utdigit.web.units.VelocitySourceView;

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
            case "element_diameter_mm", "element_diameter" -> Mirrors.lengthPointer("element_diameter", q.elementDiameterIn());
            case "distance_mm", "distance" -> Mirrors.lengthPointer("distance", q.distanceIn());
            case "wedge_path_mm", "wedge_path" -> Mirrors.lengthPointer("wedge_path", q.wedgePathIn());
            case "wedge_velocity_m_per_s", "wedge_velocity" -> JsonPointers.property(
                    q.wedgeVelocityInPerUs() != null ? "wedge_velocity_in_per_us" : "wedge_velocity_m_per_s");
            case "velocity_m_per_s", "velocity" -> Mirrors.velocityPointer(q);
            default -> JsonPointers.property(coreField);
        };
    }

    @Override
    public PulseParametersResponse answer(PulseParametersRequest q) {
        FieldErrors errors = FieldErrors.create();
        VelocitySource velocity = errors.orLater(() -> Mirrors.velocity(errors, q, true));
        Double diameterMm = Mirrors.lengthMm(errors, "element_diameter", q.elementDiameterMm(), q.elementDiameterIn(), false);
        Double distanceMm = Mirrors.lengthMm(errors, "distance", q.distanceMm(), q.distanceIn(), false);
        Double wedgePathMm = Mirrors.lengthMm(errors, "wedge_path", q.wedgePathMm(), q.wedgePathIn(), false);
        Double wedgeVelocityMPerS = Mirrors.speedMPerS(errors, "wedge_velocity", q.wedgeVelocityMPerS(),
                q.wedgeVelocityInPerUs(), VelocityFields.MIN_M_PER_S, VelocityFields.MAX_M_PER_S);
        // centre_frequency_convention without bandwidth_percent is the core's NOT_APPLICABLE (400
        // inapplicable-input), not a field error of this layer (which would answer invalid-input).
        errors.throwIfAny();

        PulseResult r = PulseCalculator.compute(PulseInput.builder(q.frequencyMhz(), velocity.velocityMPerS())
                .bandwidthPercent(q.bandwidthPercent())
                .centreFrequencyConvention(q.centreFrequencyConvention())
                .elementDiameterMm(diameterMm)
                .distanceMm(distanceMm)
                .wedgePathMm(wedgePathMm)
                .wedgeVelocityMPerS(wedgeVelocityMPerS)
                .incidentAngleDeg(q.incidentAngleDeg()).build());

        PulseParametersRequest inputs = new PulseParametersRequest(q.frequencyMhz(), velocity.velocityMPerS(),
                null, null, null, null, q.bandwidthPercent(),
                q.bandwidthPercent() == null ? null : r.centreFrequencyConvention(),
                diameterMm, null, distanceMm, null, wedgePathMm, null, wedgeVelocityMPerS, q.incidentAngleDeg(), null);
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
                ResultNotes.references(r.references()),
                PulseParametersResponse.InInches.of(Mirrors.inches(r.spatialPulseLengthMm()),
                        Mirrors.inches(r.axialResolutionMm()),
                        Mirrors.inches(r.nearFieldLengthMm()),
                        Mirrors.inches(r.nearFieldLengthExactMm()),
                        Mirrors.inches(r.beamDiameter6dbMm()),
                        Mirrors.inches(r.nearFieldInPartMm()),
                        Mirrors.inches(plane == null ? null : plane.apertureMm()),
                        Mirrors.inches(plane == null ? null : plane.nearFieldLengthMm()),
                        Mirrors.inches(plane == null ? null : plane.nearFieldInPartMm()),
                        Mirrors.inches(plane == null ? null : plane.beamDiameter6dbMm())));
    }
}
