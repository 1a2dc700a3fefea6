package utdigit.web.coverage;

import org.springframework.stereotype.Component;
import utdigit.core.coverage.ScanCoverageCalculator;
import utdigit.core.coverage.ScanCoverageInput;
import utdigit.core.coverage.ScanCoverageResult;
import utdigit.core.materials.VelocitySource;
import utdigit.web.pipeline.Calculation;
import utdigit.web.problem.FieldErrors;
import utdigit.web.units.Mirrors;
import utdigit.web.pipeline.ResultNotes;
import utdigit.web.pipeline.ToleranceCheck;
import utdigit.web.units.VelocitySourceView;

/** Request to core input, core result to answer, for scan coverages. */
@Component
class ScanCoverageCalculation implements Calculation<ScanCoverageRequest, ScanCoverageResponse> {
    static final String NAME = "scan-coverages";

    @Override
    public String name() {
        return NAME;
    }

    @Override
    public Class<ScanCoverageRequest> requestType() {
        return ScanCoverageRequest.class;
    }

    @Override
    public Class<ScanCoverageResponse> answerType() {
        return ScanCoverageResponse.class;
    }

    @Override
    public ScanCoverageResponse answer(ScanCoverageRequest q) {
        FieldErrors errors = FieldErrors.create();
        Double widthMm = Mirrors.lengthMm(errors, "beam_width_6db", q.beamWidth6dbMm(), q.beamWidth6dbIn(), false);
        Double diameterMm = Mirrors.lengthMm(errors, "element_diameter", q.elementDiameterMm(), q.elementDiameterIn(), false);
        Double pathMm = Mirrors.lengthMm(errors, "sound_path", q.soundPathMm(), q.soundPathIn(), false);
        Double incrementMm = Mirrors.lengthMm(errors, "scan_increment", q.scanIncrementMm(), q.scanIncrementIn(), false);
        Double indexMm = Mirrors.lengthMm(errors, "index_step", q.indexStepMm(), q.indexStepIn(), false);
        VelocitySource velocity = errors.orLater(() -> Mirrors.velocity(errors, q, false));
        errors.throwIfAny();
        Double velocityMPerS = velocity == null ? null : velocity.velocityMPerS();
        ScanCoverageResult r = ScanCoverageCalculator.compute(ScanCoverageInput.builder()
                .beamWidth6dbMm(widthMm)
                .frequencyMhz(q.frequencyMhz())
                .velocityMPerS(velocityMPerS)
                .elementDiameterMm(diameterMm)
                .soundPathMm(pathMm)
                .scanIncrementMm(incrementMm)
                .indexStepMm(indexMm)
                .angularStepDeg(q.angularStepDeg())
                .amplitudeToleranceDb(q.amplitudeToleranceDb()).build());
        ScanCoverageRequest inputs = new ScanCoverageRequest(widthMm, null, q.frequencyMhz(), velocityMPerS, null, null,
                null, null, diameterMm, null, pathMm, null, incrementMm, null, indexMm, null, q.angularStepDeg(),
                q.amplitudeToleranceDb());
        return new ScanCoverageResponse(r.beamWidth6dbMm(), r.scanIncrementLossDb(), r.indexStepLossDb(),
                r.angularStepLossDb(), r.maxStepMm(), r.maxAngularStepDeg(), r.scanIncrementWithinTolerance(),
                r.indexStepWithinTolerance(), r.angularStepWithinTolerance(),
                ToleranceCheck.builder()
                        .atMost("scan_increment_loss_db", r.scanIncrementLossDb(), "amplitude_tolerance_db", q.amplitudeToleranceDb())
                        .atMost("index_step_loss_db", r.indexStepLossDb(), "amplitude_tolerance_db", q.amplitudeToleranceDb())
                        .atMost("angular_step_loss_db", r.angularStepLossDb(), "amplitude_tolerance_db", q.amplitudeToleranceDb())
                        .build(),
                inputs, VelocitySourceView.of(velocity),
                ResultNotes.warnings(r.warnings()), ResultNotes.references(r.references()),
                ScanCoverageResponse.InInches.of(Mirrors.inches(r.beamWidth6dbMm()),
                        Mirrors.inches(r.maxStepMm())));
    }

    @Override
    public String pointer(String coreField, ScanCoverageRequest q) {
        return switch (coreField) {
            case "beam_width_6db" -> Mirrors.lengthPointer(coreField, q.beamWidth6dbIn());
            case "element_diameter" -> Mirrors.lengthPointer(coreField, q.elementDiameterIn());
            case "sound_path" -> Mirrors.lengthPointer(coreField, q.soundPathIn());
            case "scan_increment" -> Mirrors.lengthPointer(coreField, q.scanIncrementIn());
            case "index_step" -> Mirrors.lengthPointer(coreField, q.indexStepIn());
            case "velocity", "velocity_m_per_s" -> Mirrors.velocityPointer(q);
            default -> Calculation.super.pointer(coreField, q);
        };
    }
}
