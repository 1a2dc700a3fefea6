package utdigit.core.quantization;

import java.util.List;
import java.util.Optional;
import utdigit.core.common.Reference;
import utdigit.core.common.Warning;

/**
 * Result of a quantization assessment. Three kinds of field: a primitive always exists; a boxed
 * value is null when its optional input was not given; an {@code Optional} is null when its input
 * was not given and {@link Optional#empty()} when the value cannot exist for the given inputs (a
 * warning then says why). Heights and the LSB are displayed values (after the digital gain).
 *
 * @param digitizedSignal the signal option used (default RF)
 * @param quantizer the quantizer option used (default ROUNDING)
 * @param codeMapping the code mapping option used (default FSR_OVER_2N)
 * @param digitalGainDb the digital gain used, dB (default 0)
 * @param levels number of codes 2^N (4294967296 at 32 bits)
 * @param lsbPercentFsh one LSB in displayed %FSH: LSB 10^(G/20)
 * @param dynamicRangeDb the largest reachable displayed height to one displayed LSB:
 *     20 log10(100 / LSB) - max(G, 0) with the converter's LSB, dB (soft gain never raises it)
 * @param idealSqnrDb ideal SQNR of a full-scale sine, dB; empty for RECTIFIED
 * @param amplitudeErrorOverDb worst reading above the signal height, dB (>= 0); null without height
 * @param amplitudeErrorUnderDb worst reading below the signal height, dB (< 0); null without height,
 *     empty when the height is within the low bound of the quantizer (the reading can be 0)
 * @param minimumHeightPercentFsh lowest displayed height read within the tolerance, %FSH; null
 *     without tolerance
 * @param minimumHeightDb that height as a level relative to full screen, 20 log10(h_min / 100), dB
 * @param evaluationHeightPercentFsh displayed height at the evaluation level, h_ref 10^(L/20), %FSH;
 *     null without reference and level
 * @param evaluationErrorUnderDb worst reading below the evaluation height, dB (< 0); null without
 *     reference and level, empty when the evaluation height is within the low bound
 * @param averagingSnrGainDb SNR gain of averaging M acquisitions, 10 log10(M), dB; null without
 *     averaging
 * @param warnings conditions the caller should know about
 * @param references the source of every formula used
 */
public record QuantizationResult(
        DigitizedSignal digitizedSignal,
        Quantizer quantizer,
        CodeMapping codeMapping,
        double digitalGainDb,
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
        List<Warning> warnings,
        List<Reference> references) {

    public QuantizationResult {
        java.util.Objects.requireNonNull(idealSqnrDb, "idealSqnrDb");
        warnings = List.copyOf(warnings);
        references = List.copyOf(references);
    }

    /** True when a warning with this code was raised. */
    public boolean hasWarning(String code) {
        return warnings.stream().anyMatch(w -> w.code().equals(code));
    }
}
