package utdigit.web.quantization;

import org.springframework.stereotype.Component;
import utdigit.core.quantization.QuantizationCalculator;
import utdigit.core.quantization.QuantizationInput;
import utdigit.core.quantization.QuantizationResult;
import utdigit.web.common.Calculation;
import utdigit.web.common.ResultNotes;

/** Request to core input, core result to answer, for quantization assessments. */
@Component
class QuantizationAssessmentCalculation implements Calculation<QuantizationAssessmentRequest> {
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
    public QuantizationAssessmentResponse answer(QuantizationAssessmentRequest q) {
        QuantizationResult r = QuantizationCalculator.compute(new QuantizationInput(q.bitDepth(),
                q.digitizedSignal(), q.quantizer(), q.codeMapping(), q.digitalGainDb(), q.signalHeightPercentFsh(),
                q.amplitudeToleranceDb(), q.referenceHeightPercentFsh(), q.evaluationLevelDb(), q.averaging()));
        QuantizationAssessmentRequest inputs = new QuantizationAssessmentRequest(q.bitDepth(), r.digitizedSignal(),
                r.quantizer(), r.codeMapping(), r.digitalGainDb(), q.signalHeightPercentFsh(),
                q.amplitudeToleranceDb(), q.referenceHeightPercentFsh(), q.evaluationLevelDb(), q.averaging());
        return new QuantizationAssessmentResponse(r.levels(), r.lsbPercentFsh(), r.dynamicRangeDb(),
                r.idealSqnrDb(), r.amplitudeErrorOverDb(), r.amplitudeErrorUnderDb(), r.minimumHeightPercentFsh(),
                r.minimumHeightDb(), r.evaluationHeightPercentFsh(), r.evaluationErrorUnderDb(),
                r.averagingSnrGainDb(), inputs, ResultNotes.warnings(r.warnings()),
                ResultNotes.references(r.references()));
    }
}
