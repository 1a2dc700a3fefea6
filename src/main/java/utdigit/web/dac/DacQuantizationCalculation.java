package utdigit.web.dac;

import org.springframework.stereotype.Component;
import utdigit.core.dac.DacQuantizationCalculator;
import utdigit.core.dac.DacQuantizationInput;
import utdigit.core.dac.DacQuantizationResult;
import utdigit.web.pipeline.Calculation;
import utdigit.web.pipeline.ResultNotes;
import utdigit.web.pipeline.ToleranceCheck;

/** Request to core input, core result to answer, for DAC quantizations. */
@Component
class DacQuantizationCalculation implements Calculation<DacQuantizationRequest, DacQuantizationResponse> {
    static final String NAME = "dac-quantizations";

    @Override
    public String name() {
        return NAME;
    }

    @Override
    public Class<DacQuantizationRequest> requestType() {
        return DacQuantizationRequest.class;
    }

    @Override
    public Class<DacQuantizationResponse> answerType() {
        return DacQuantizationResponse.class;
    }

    @Override
    public DacQuantizationResponse answer(DacQuantizationRequest q) {
        DacQuantizationResult r = DacQuantizationCalculator.compute(DacQuantizationInput.builder(q.bitDepth(),
                        q.dacSpanDb(), q.referenceHeightPercentFsh())
                .amplitudeToleranceDb(q.amplitudeToleranceDb())
                .digitizedSignal(q.digitizedSignal())
                .quantizer(q.quantizer())
                .codeMapping(q.codeMapping()).build());
        DacQuantizationRequest inputs = new DacQuantizationRequest(q.bitDepth(), q.dacSpanDb(),
                q.referenceHeightPercentFsh(), q.amplitudeToleranceDb(), r.digitizedSignal(), r.quantizer(),
                r.codeMapping());
        Double below = q.amplitudeToleranceDb() == null ? null : -q.amplitudeToleranceDb();
        return new DacQuantizationResponse(r.lsbPercentFsh(), r.lowestReferenceHeightPercentFsh(),
                r.uncorrectedErrorUnderDb(), r.analogTcgErrorUnderDb(), r.digitalTcgLsbPercentFsh(),
                r.digitalTcgErrorUnderDb(), r.minimumHeightPercentFsh(), r.maxUncorrectedSpanDb(),
                r.uncorrectedWithinTolerance(), r.analogTcgWithinTolerance(), r.digitalTcgWithinTolerance(),
                ToleranceCheck.builder()
                        .atLeast("uncorrected_error_under_db", r.uncorrectedErrorUnderDb(), "amplitude_tolerance_db", below)
                        .atLeast("analog_tcg_error_under_db", r.analogTcgErrorUnderDb(), "amplitude_tolerance_db", below)
                        .atLeast("digital_tcg_error_under_db", r.digitalTcgErrorUnderDb(), "amplitude_tolerance_db", below)
                        .build(),
                inputs,
                ResultNotes.warnings(r.warnings()), ResultNotes.references(r.references()));
    }

    /** The quantization core names the heights it was given; here they are the reference height. */
    @Override
    public String pointer(String coreField, DacQuantizationRequest q) {
        return switch (coreField) {
            case "signal_height_percent_fsh", "evaluation_level_db" -> Calculation.super.pointer(
                    coreField.equals("evaluation_level_db") ? "dac_span_db" : "reference_height_percent_fsh", q);
            case "digital_gain_db" -> Calculation.super.pointer("dac_span_db", q);
            default -> Calculation.super.pointer(coreField, q);
        };
    }
}
