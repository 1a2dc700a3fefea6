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
        @Schema(description = "Converter resolution, bits (integer 1 to 32)", example = "12")
        @NotNull(message = InputMessages.REQUIRED) @Min(1) @Max(32)
        Integer bitDepth,

        @Schema(description = "Span of the DAC curve from its highest to its lowest reference point, dB (above 0, at "
                + "most 60)", example = "24")
        @NotNull(message = InputMessages.REQUIRED) @DecimalMin(value = "0", inclusive = false) @DecimalMax("60")
        Double dacSpanDb,

        @Schema(description = "Screen height of the highest reference point, %FSH (> 0, <= 100); 80 is usual",
                example = "80")
        @NotNull(message = InputMessages.REQUIRED) @DecimalMin(value = "0", inclusive = false) @DecimalMax("100")
        Double referenceHeightPercentFsh,

        @Schema(description = "Amplitude tolerance of the evaluation, dB (> 0, <= 40); gives the lowest height read "
                + "within it, the largest span without correction and whether each set-up meets it",
                example = "1")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax("40")
        Double amplitudeToleranceDb,

        @Schema(description = "What is digitized: RF (-100..+100 %FSH) or RECTIFIED (0..100 %FSH); default RF")
        DigitizedSignal digitizedSignal,

        @Schema(description = "ROUNDING (to nearest code) or TRUNCATION (toward minus infinity); default ROUNDING")
        Quantizer quantizer,

        @Schema(description = "How codes map to %FSH: FSR_OVER_2N (LSB = range / 2^N) or MAX_CODE (full screen at "
                + "the largest code); default FSR_OVER_2N")
        CodeMapping codeMapping) {
}
