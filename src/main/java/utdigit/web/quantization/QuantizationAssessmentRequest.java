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
        @NotNull(message = InputMessages.REQUIRED) @Min(1) @Max(32)
        Integer bitDepth,

        DigitizedSignal digitizedSignal,

        Quantizer quantizer,

        CodeMapping codeMapping,

        @DecimalMin("-40") @DecimalMax("60")
        Double digitalGainDb,

        @DecimalMin(value = "0", inclusive = false) @DecimalMax("100")
        Double signalHeightPercentFsh,

        @DecimalMin(value = "0", inclusive = false) @DecimalMax("40")
        Double amplitudeToleranceDb,

        @DecimalMin(value = "0", inclusive = false) @DecimalMax("100")
        Double referenceHeightPercentFsh,

        @DecimalMin("-80") @DecimalMax("20")
        Double evaluationLevelDb,

        @Min(1) @Max(65536)
        Integer averaging) {
}
