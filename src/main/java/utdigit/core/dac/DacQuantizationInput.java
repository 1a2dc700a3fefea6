package utdigit.core.dac;

import utdigit.core.quantization.CodeMapping;
import utdigit.core.quantization.DigitizedSignal;
import utdigit.core.quantization.Quantizer;

/**
 * Inputs of a DAC quantization assessment. Options are null when not given (RF, ROUNDING,
 * FSR_OVER_2N, as for a quantization assessment).
 *
 * @param bitDepth converter resolution N, 1 to 32 bits
 * @param dacSpanDb S: the DAC curve's span from its highest to its lowest reference point, dB
 * @param referenceHeightPercentFsh height of the highest reference point on the screen, %FSH
 * @param amplitudeToleranceDb the procedure's amplitude tolerance X, dB; null: not given
 */
public record DacQuantizationInput(
        int bitDepth,
        double dacSpanDb,
        double referenceHeightPercentFsh,
        Double amplitudeToleranceDb,
        DigitizedSignal digitizedSignal,
        Quantizer quantizer,
        CodeMapping codeMapping) {

    public static DacQuantizationInput of(int bitDepth, double dacSpanDb, double referenceHeightPercentFsh) {
        return new DacQuantizationInput(bitDepth, dacSpanDb, referenceHeightPercentFsh, null, null, null, null);
    }

    public DacQuantizationInput withAmplitudeToleranceDb(Double v) {
        return new DacQuantizationInput(bitDepth, dacSpanDb, referenceHeightPercentFsh, v, digitizedSignal, quantizer,
                codeMapping);
    }

    public DacQuantizationInput withOptions(DigitizedSignal signal, Quantizer q, CodeMapping mapping) {
        return new DacQuantizationInput(bitDepth, dacSpanDb, referenceHeightPercentFsh, amplitudeToleranceDb, signal,
                q, mapping);
    }
}
