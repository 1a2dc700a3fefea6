package utdigit.web.quantization;

import io.swagger.v3.oas.annotations.media.Schema;
import java.util.List;
import java.util.Optional;
import utdigit.web.pipeline.ResultNotes.ReferenceView;
import utdigit.web.pipeline.ToleranceCheck;
import utdigit.web.pipeline.ResultNotes.WarningView;

/** The answer of POST /api/quantization-assessments. */
@Schema(name = "QuantizationAssessment", description = "Amplitude resolution of the converter in %FSH and dB. "
        + "Fields whose optional inputs were not given are omitted; a value that cannot exist is null with a warning.")
record QuantizationAssessmentResponse(
        long levels,
        double lsbPercentFsh,
        double dynamicRangeDb,
        Optional<Double> idealSqnrDb,
        Double amplitudeErrorOverDb,
        Optional<Double> amplitudeErrorUnderDb,
        Double minimumHeightPercentFsh,
        Double minimumHeightDb,
        Double evaluationHeightPercentFsh,
        Optional<Double> evaluationErrorUnderDb,
        Double averagingSnrGainDb,
        List<ToleranceCheck> toleranceChecks,

        QuantizationAssessmentRequest inputs,
        List<WarningView> warnings,
        List<ReferenceView> references) {
}
