package utdigit.web.quantization;

import java.util.List;
import org.springframework.stereotype.Component;
import utdigit.core.quantization.QuantizationCalculator;
import utdigit.core.quantization.QuantizationInput;
import utdigit.core.quantization.QuantizationResult;
import utdigit.web.pipeline.ToleranceCheck;
import utdigit.web.pipeline.Calculation;
import utdigit.web.pipeline.ResultNotes;

/** Request to core input, core result to answer, for quantization assessments. */
@Component
class QuantizationAssessmentCalculation implements Calculation<QuantizationAssessmentRequest, QuantizationAssessmentResponse> {
    static final String NAME = "quantization-assessments";

    @Override
    public String name() {
        return NAME;
    }

    @Override
    public Class<QuantizationAssessmentRequest> requestType() {
        return QuantizationAssessmentRequest.class;
    }

    @Override
    public Class<QuantizationAssessmentResponse> answerType() {
        return QuantizationAssessmentResponse.class;
    }

    @Override
    public QuantizationAssessmentResponse answer(QuantizationAssessmentRequest q) {
        QuantizationResult r = QuantizationCalculator.compute(QuantizationInput.builder(q.bitDepth())
                .digitizedSignal(q.digitizedSignal())
                .quantizer(q.quantizer())
                .codeMapping(q.codeMapping())
                .digitalGainDb(q.digitalGainDb())
                .signalHeightPercentFsh(q.signalHeightPercentFsh())
                .amplitudeToleranceDb(q.amplitudeToleranceDb())
                .referenceHeightPercentFsh(q.referenceHeightPercentFsh())
                .evaluationLevelDb(q.evaluationLevelDb())
                .averaging(q.averaging()).build());
        QuantizationAssessmentRequest inputs = new QuantizationAssessmentRequest(q.bitDepth(), r.digitizedSignal(),
                r.quantizer(), r.codeMapping(), r.digitalGainDb(), q.signalHeightPercentFsh(),
                q.amplitudeToleranceDb(), q.referenceHeightPercentFsh(), q.evaluationLevelDb(), q.averaging());
        return new QuantizationAssessmentResponse(r.levels(), r.lsbPercentFsh(), r.dynamicRangeDb(),
                r.idealSqnrDb(), r.amplitudeErrorOverDb(), r.amplitudeErrorUnderDb(), r.minimumHeightPercentFsh(),
                r.minimumHeightDb(), r.evaluationHeightPercentFsh(), r.evaluationErrorUnderDb(),
                r.averagingSnrGainDb(), tolerance(r, q.amplitudeToleranceDb()), inputs,
                ResultNotes.warnings(r.warnings()),
                ResultNotes.references(r.references()));
    }

    /** Each reading error within the caller's amplitude tolerance: over at most +X dB, under at least -X dB. */
    private static List<ToleranceCheck> tolerance(QuantizationResult r, Double toleranceDb) {
        String field = "amplitude_tolerance_db";
        Double below = toleranceDb == null ? null : -toleranceDb;
        return ToleranceCheck.builder()
                .atMost("amplitude_error_over_db", r.amplitudeErrorOverDb(), field, toleranceDb)
                .atLeast("amplitude_error_under_db", r.amplitudeErrorUnderDb(), field, below)
                .atLeast("evaluation_error_under_db", r.evaluationErrorUnderDb(), field, below)
                .build();
    }
}
