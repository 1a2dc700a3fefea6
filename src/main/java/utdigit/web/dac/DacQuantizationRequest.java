package utdigit.web.dac;

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

/** POST /api/dac-quantizations. */
@Schema(name = "DacQuantizationRequest", description = "The converter's bit depth and code mapping, a DAC curve's "
        + "span and the height of its highest reference point, with the amplitude tolerance to check.")
public record DacQuantizationRequest(
        @NotNull(message = InputMessages.REQUIRED) @Min(1) @Max(32)
        Integer bitDepth,

        @NotNull(message = InputMessages.REQUIRED) @DecimalMin(value = "0", inclusive = false) @DecimalMax("60")
        Double dacSpanDb,

        @NotNull(message = InputMessages.REQUIRED) @DecimalMin(value = "0", inclusive = false) @DecimalMax("100")
        Double referenceHeightPercentFsh,

        @DecimalMin(value = "0", inclusive = false) @DecimalMax("40")
        Double amplitudeToleranceDb,

        DigitizedSignal digitizedSignal,

        Quantizer quantizer,

        CodeMapping codeMapping) {
}
