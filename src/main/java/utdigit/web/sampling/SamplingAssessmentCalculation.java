package utdigit.web.sampling;

import java.util.List;
import org.springframework.stereotype.Component;
import utdigit.core.common.ReportingFloors;
import utdigit.core.common.CalculationException;
import utdigit.core.materials.VelocitySource;
import utdigit.core.sampling.SamplingCalculator;
import utdigit.core.sampling.SamplingInput;
import utdigit.core.sampling.SamplingResult;
import utdigit.web.pipeline.ToleranceCheck;
import utdigit.web.pipeline.Calculation;
import utdigit.web.problem.FieldErrors;
import utdigit.web.units.Mirrors;
import utdigit.web.pipeline.ResultNotes;
import utdigit.web.units.VelocitySourceView;

/**
 * Request to core input, core result to answer, for sampling assessments. The inch mirrors of the
 * TFM lengths and the velocity's three forms are resolved here, so that the core sees lengths in mm
 * and a velocity in m/s; a failure the core reports on a millimetre input the caller gave in inches
 * is pointed at the inch input.
 */
@Component
class SamplingAssessmentCalculation implements Calculation<SamplingAssessmentRequest, SamplingAssessmentResponse> {
    static final String NAME = "sampling-assessments";

    /** Said when a velocity comes without a TFM figure that uses it (as the core says it). */
    private static final String VELOCITY_NOT_APPLICABLE = "a velocity applies only to the TFM grid figures "
            + "(tfm_grid_spacing, or tfm_lateral_grid_spacing with tfm_aperture and tfm_depth)";

    @Override
    public String name() {
        return NAME;
    }

    @Override
    public Class<SamplingAssessmentRequest> requestType() {
        return SamplingAssessmentRequest.class;
    }

    @Override
    public Class<SamplingAssessmentResponse> answerType() {
        return SamplingAssessmentResponse.class;
    }

    /**
     * A core input named in mm (tfm_grid_spacing_mm) or by its base name points at the form the
     * caller sent (tfm_grid_spacing_in when given in inches); a velocity at its source.
     */
    @Override
    public String pointer(String coreField, SamplingAssessmentRequest q) {
        String base = coreField.endsWith("_mm") ? coreField.substring(0, coreField.length() - 3) : coreField;
        return switch (base) {
            case "tfm_grid_spacing" -> Mirrors.lengthPointer(base, q.tfmGridSpacingIn());
            case "tfm_lateral_grid_spacing" -> Mirrors.lengthPointer(base, q.tfmLateralGridSpacingIn());
            case "tfm_aperture" -> Mirrors.lengthPointer(base, q.tfmApertureIn());
            case "tfm_depth" -> Mirrors.lengthPointer(base, q.tfmDepthIn());
            case "velocity", "velocity_m_per_s" -> Mirrors.velocityPointer(q);
            default -> Calculation.super.pointer(coreField, q);
        };
    }

    @Override
    public SamplingAssessmentResponse answer(SamplingAssessmentRequest q) {
        FieldErrors errors = FieldErrors.create();
        Double gridMm = Mirrors.lengthMm(errors, "tfm_grid_spacing", q.tfmGridSpacingMm(), q.tfmGridSpacingIn(), false);
        Double lateralMm = Mirrors.lengthMm(errors, "tfm_lateral_grid_spacing", q.tfmLateralGridSpacingMm(),
                q.tfmLateralGridSpacingIn(), false);
        Double apertureMm = Mirrors.lengthMm(errors, "tfm_aperture", q.tfmApertureMm(), q.tfmApertureIn(), false);
        Double depthMm = Mirrors.lengthMm(errors, "tfm_depth", q.tfmDepthMm(), q.tfmDepthIn(), false);
        boolean tfmGiven = q.tfmGridSpacingMm() != null || q.tfmGridSpacingIn() != null
                || q.tfmLateralGridSpacingMm() != null || q.tfmLateralGridSpacingIn() != null
                || q.tfmApertureMm() != null || q.tfmApertureIn() != null
                || q.tfmDepthMm() != null || q.tfmDepthIn() != null;
        VelocitySource velocity = errors.orLater(() -> {
            try {
                return Mirrors.velocity(errors, q, false);
            } catch (CalculationException e) {
                throw tfmGiven ? e : CalculationException.notApplicable("velocity", VELOCITY_NOT_APPLICABLE);
            }
        });
        errors.throwIfAny();
        Double velocityMPerS = velocity == null ? null : velocity.velocityMPerS();

        SamplingResult r = SamplingCalculator.compute(SamplingInput.builder(q.samplingFrequencyMhz(), q.frequencyMhz())
                .decimationFactor(q.decimationFactor())
                .decimationMode(q.decimationMode())
                .bandwidthPercent(q.bandwidthPercent())
                .centreFrequencyConvention(q.centreFrequencyConvention())
                .signal(q.signal())
                .peakReading(q.peakReading())
                .amplitudeToleranceDb(q.amplitudeToleranceDb())
                .tfmGridSpacingMm(gridMm)
                .velocityMPerS(velocityMPerS)
                .tfmImage(q.tfmImage())
                .tfmLateralGridSpacingMm(lateralMm)
                .tfmApertureMm(apertureMm)
                .tfmDepthMm(depthMm).build());

        SamplingAssessmentRequest inputs = new SamplingAssessmentRequest(q.samplingFrequencyMhz(), q.frequencyMhz(),
                r.decimationFactor(), r.decimationMode(), q.bandwidthPercent(), r.centreFrequencyConvention(),
                r.signal(), r.peakReading(), q.amplitudeToleranceDb(), gridMm, null, velocityMPerS, null, null, null,
                null, r.tfmImage(), lateralMm, null, apertureMm, null, depthMm, null);
        return new SamplingAssessmentResponse(r.effectiveSamplingFrequencyMhz(), r.samplingIntervalNs(),
                r.samplesPerPeriod(), r.samplesPerPeriodUpper(), r.nyquistFrequencyMhz(),
                ReportingFloors.level(r.spectralLevelAtNyquistDb()), ReportingFloors.fraction(r.energyAboveNyquistFraction()), r.sineAmplitudeLossDb(), r.pulseAmplitudeLossDb(), r.timingErrorNs(),
                r.timingStandardUncertaintyNs(), r.requiredSamplesPerPeriod(), r.requiredSamplingFrequencyMhz(),
                r.requiredSamplingFrequencyPulseMhz(), r.tfmGridAmplitudeLossDb(), r.tfmMaxGridSpacingMm(),
                r.tfmLateralAmplitudeLossDb(), tolerance(r, q.amplitudeToleranceDb()), inputs,
                VelocitySourceView.of(velocity),
                ResultNotes.warnings(r.warnings()), ResultNotes.references(r.references()),
                SamplingAssessmentResponse.InInches.of(Mirrors.inches(r.tfmMaxGridSpacingMm())));
    }

    /** Each loss at most the caller's amplitude tolerance. */
    private static List<ToleranceCheck> tolerance(SamplingResult r, Double toleranceDb) {
        String field = "amplitude_tolerance_db";
        return ToleranceCheck.builder()
                .atMost("sine_amplitude_loss_db", r.sineAmplitudeLossDb(), field, toleranceDb)
                .atMost("pulse_amplitude_loss_db", r.pulseAmplitudeLossDb(), field, toleranceDb)
                .atMost("tfm_grid_amplitude_loss_db", r.tfmGridAmplitudeLossDb(), field, toleranceDb)
                .atMost("tfm_lateral_amplitude_loss_db", r.tfmLateralAmplitudeLossDb(), field, toleranceDb)
                .build();
    }
}
