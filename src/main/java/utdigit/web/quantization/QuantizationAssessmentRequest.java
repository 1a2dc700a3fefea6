package utdigit.web.quantization;

import io.swagger.v3.oas.annotations.media.Schema;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotNull;
import utdigit.core.quantization.CodeMapping;
import utdigit.core.quantization.DigitizedSignal;
import utdigit.core.quantization.Quantizer;
import utdigit.web.json.InputMessages;

/** POST /api/quantization-assessments. */
@Schema(name = "QuantizationAssessmentRequest", description = "The converter's bit depth and how its codes map "
        + "to screen height, with optional heights and tolerances to check.")
public record QuantizationAssessmentRequest(
        @Schema(description = "Converter resolution, bits (integer 1 to 32)", example = "8")
        @NotNull(message = InputMessages.REQUIRED) @Min(1) @Max(32)
        Integer bitDepth,

        @Schema(description = "What is digitized: RF (-100..+100 %FSH) or RECTIFIED (0..100 %FSH); default RF")
        DigitizedSignal digitizedSignal,

        @Schema(description = "ROUNDING (to nearest code) or TRUNCATION (toward minus infinity); default ROUNDING")
        Quantizer quantizer,

        @Schema(description = "How codes map to %FSH: FSR_OVER_2N (LSB = range / 2^N) or MAX_CODE (full screen at "
                + "the largest code); default FSR_OVER_2N")
        CodeMapping codeMapping,

        @Schema(description = "Gain applied after digitizing (soft gain), dB (-40 to +60); default 0. Heights are "
                + "displayed heights; soft gain adds no resolution", example = "0")
        @DecimalMin("-40") @DecimalMax("60")
        Double digitalGainDb,

        @Schema(description = "Displayed signal height to assess, %FSH (> 0, <= 100)", example = "40")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax("100")
        Double signalHeightPercentFsh,

        @Schema(description = "Amplitude tolerance of the evaluation, dB (> 0, <= 40)", example = "1")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax("40")
        Double amplitudeToleranceDb,

        @Schema(description = "Reference echo height, %FSH (> 0, <= 100); with evaluation_level_db", example = "80")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax("100")
        Double referenceHeightPercentFsh,

        @Schema(description = "Evaluation level relative to the reference, dB (-80 to +20); -14 is 14 dB below",
                example = "-14")
        @DecimalMin("-80") @DecimalMax("20")
        Double evaluationLevelDb,

        @Schema(description = "Number of acquisitions averaged (integer 1 to 65536)", example = "4")
        @Min(1) @Max(65536)
        Integer averaging) {
}
