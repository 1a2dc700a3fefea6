package utdigit.core.dac;

import java.util.List;
import java.util.Optional;
import utdigit.core.common.Reference;
import utdigit.core.common.Warning;
import utdigit.core.quantization.CodeMapping;
import utdigit.core.quantization.DigitizedSignal;
import utdigit.core.quantization.Quantizer;

/**
 * A DAC quantization assessment. Errors are the worst reading below the true height (signed,
 * negative dB); an {@link Optional} is empty when the height is at or below the quantizer's low
 * bound (it can read as 0), with a warning. Fields of the tolerance are null without one.
 *
 * @param lsbPercentFsh the converter's LSB, %FSH
 * @param lowestReferenceHeightPercentFsh h_ref 10^(-S/20): the lowest reference point without
 *     correction, %FSH
 * @param uncorrectedErrorUnderDb no correction: the error at the lowest reference height, dB
 * @param analogTcgErrorUnderDb TCG before the converter: every reference point at h_ref, dB
 * @param digitalTcgLsbPercentFsh TCG on digitized data: the displayed LSB at the lowest point,
 *     LSB 10^(S/20), %FSH
 * @param digitalTcgErrorUnderDb TCG on digitized data: the error at h_ref displayed, dB
 * @param minimumHeightPercentFsh with a tolerance: the lowest height read within it, %FSH
 * @param maxUncorrectedSpanDb with a tolerance: the largest span without correction whose lowest
 *     point is still read within it, dB; empty when h_ref itself is not
 */
public record DacQuantizationResult(
        DigitizedSignal digitizedSignal,
        Quantizer quantizer,
        CodeMapping codeMapping,
        double lsbPercentFsh,
        double lowestReferenceHeightPercentFsh,
        Optional<Double> uncorrectedErrorUnderDb,
        Optional<Double> analogTcgErrorUnderDb,
        double digitalTcgLsbPercentFsh,
        Optional<Double> digitalTcgErrorUnderDb,
        Double minimumHeightPercentFsh,
        Optional<Double> maxUncorrectedSpanDb,
        Boolean uncorrectedWithinTolerance,
        Boolean analogTcgWithinTolerance,
        Boolean digitalTcgWithinTolerance,
        List<Warning> warnings,
        List<Reference> references) {

    public DacQuantizationResult {
        warnings = List.copyOf(warnings);
        references = List.copyOf(references);
    }

    public boolean hasWarning(String code) {
        return warnings.stream().anyMatch(w -> w.code().equals(code));
    }
}
