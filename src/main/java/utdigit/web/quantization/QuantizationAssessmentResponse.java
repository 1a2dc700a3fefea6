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
        @Schema(description = "Number of codes, 2^N", example = "256")
        long levels,
        @Schema(description = "One code step in displayed %FSH (grows with digital gain)", example = "0.78125")
        double lsbPercentFsh,
        @Schema(description = "The largest displayed height the converter can reach to one displayed LSB, "
                + "20 log10(100 / LSB) - max(G, 0) with the converter's LSB and the digital gain G, dB: soft gain "
                + "never raises it", example = "42.14")
        double dynamicRangeDb,
        @Schema(description = "Ideal SQNR of a full-scale sine, 20 log10(2^N) + 10 log10(1.5), dB; null for "
                + "RECTIFIED", example = "49.93", types = {"number", "null"})
        Optional<Double> idealSqnrDb,
        @Schema(description = "Worst reading above the signal height, dB (>= 0)", example = "0.084")
        Double amplitudeErrorOverDb,
        @Schema(description = "Worst reading below the signal height, dB (< 0); null when it does not exist",
                example = "-0.085", types = {"number", "null"})
        Optional<Double> amplitudeErrorUnderDb,
        @Schema(description = "Lowest displayed height read within the tolerance, %FSH", example = "3.6")
        Double minimumHeightPercentFsh,
        @Schema(description = "That height as a level relative to full screen, dB", example = "-28.9")
        Double minimumHeightDb,
        @Schema(description = "Reference height at the evaluation level, %FSH", example = "16")
        Double evaluationHeightPercentFsh,
        @Schema(description = "Worst reading below the evaluation height, dB (< 0); null when it does not exist",
                example = "-0.2", types = {"number", "null"})
        Optional<Double> evaluationErrorUnderDb,
        @Schema(description = "SNR gain of averaging uncorrelated noise, 10 log10(M), dB", example = "6.02")
        Double averagingSnrGainDb,
        @Schema(description = "Each figure compared with a tolerance or requirement of the request: "
                + "amplitude_error_over_db at most amplitude_tolerance_db, amplitude_error_under_db and "
                + "evaluation_error_under_db at least its negative; only with amplitude_tolerance_db")
        List<ToleranceCheck> toleranceChecks,

        @Schema(description = "The normalised request, with every default that has an effect; itself a valid "
                + "request that reproduces this answer")
        QuantizationAssessmentRequest inputs,
        List<WarningView> warnings,
        List<ReferenceView> references) {
}
