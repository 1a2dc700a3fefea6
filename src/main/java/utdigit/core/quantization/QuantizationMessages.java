package utdigit.core.quantization;

import static utdigit.core.common.MessageNumbers.rounded;
import static utdigit.core.quantization.QuantizationCalculator.AMPLITUDE_ERROR_UNDER_UNDEFINED;
import static utdigit.core.quantization.QuantizationCalculator.AVERAGING_NOISE_ONLY;
import static utdigit.core.quantization.QuantizationCalculator.EVALUATION_ERROR_UNDER_UNDEFINED;
import static utdigit.core.quantization.QuantizationCalculator.EVALUATION_HEIGHT_ABOVE_FULL_SCREEN;
import static utdigit.core.quantization.QuantizationCalculator.EVALUATION_HEIGHT_BELOW_MINIMUM;
import static utdigit.core.quantization.QuantizationCalculator.EVALUATION_HEIGHT_BELOW_ONE_LSB;
import static utdigit.core.quantization.QuantizationCalculator.IDEAL_SQNR_NOT_APPLICABLE;
import static utdigit.core.quantization.QuantizationCalculator.MINIMUM_HEIGHT_ABOVE_FULL_SCREEN;
import static utdigit.core.quantization.QuantizationCalculator.SIGNAL_HEIGHT_BELOW_MINIMUM;
import static utdigit.core.quantization.QuantizationCalculator.SIGNAL_HEIGHT_BELOW_ONE_LSB;

import java.util.Locale;
import utdigit.core.common.CalculationException;
import utdigit.core.common.Warning;

/** Every warning and failure text of the amplitude digitization, one factory per condition. */
final class QuantizationMessages {
    private QuantizationMessages() {}

    static CalculationException heightNotReachable(String field, double heightPercentFsh, double gainDb,
            double atConverterPercentFsh) {
        String message = String.format(Locale.ROOT,
                "%s %s displayed with digital_gain_db %s needs %s %%FSH at the converter, above its full scale"
                        + " of 100 %%FSH: the converter could not have recorded it",
                field, rounded(heightPercentFsh), rounded(gainDb), rounded(atConverterPercentFsh));
        return gainDb == 0.0
                ? CalculationException.impossible(message, field)
                : CalculationException.impossible(message, field, "digital_gain_db");
    }

    static CalculationException evaluationNotReachable(double referenceHeightPercentFsh, double evaluationLevelDb,
            double evaluationHeightPercentFsh, double atConverterPercentFsh, double gainDb) {
        String message = String.format(Locale.ROOT,
                "the evaluation height (reference_height_percent_fsh %s at evaluation_level_db %s) is %s %%FSH"
                        + " displayed and needs %s %%FSH at the converter with digital_gain_db %s, above its full"
                        + " scale of 100 %%FSH: the converter could not have recorded it",
                rounded(referenceHeightPercentFsh), rounded(evaluationLevelDb), rounded(evaluationHeightPercentFsh),
                rounded(atConverterPercentFsh), rounded(gainDb));
        return gainDb == 0.0
                ? CalculationException.impossible(message, "evaluation_level_db", "reference_height_percent_fsh")
                : CalculationException.impossible(message,
                        "evaluation_level_db", "reference_height_percent_fsh", "digital_gain_db");
    }

    static Warning idealSqnrNotApplicable() {
        return Warning.of(IDEAL_SQNR_NOT_APPLICABLE,
                "ideal_sqnr_db is the ratio of a full-scale sine to its quantization noise and does not apply to"
                        + " digitized_signal RECTIFIED; it is null");
    }

    static Warning signalHeightBelowOneLsb(double signalHeight, double lsb) {
        return Warning.of(SIGNAL_HEIGHT_BELOW_ONE_LSB, String.format(Locale.ROOT,
                "signal_height_percent_fsh %s is below one LSB (%s %%FSH displayed): the echo spans"
                        + " less than one code", rounded(signalHeight), rounded(lsb)));
    }

    static Warning errorUnderUndefined(double signalHeight, double lowBoundPercentFsh, Quantizer quantizer) {
        return atLowBound(AMPLITUDE_ERROR_UNDER_UNDEFINED, "signal_height_percent_fsh", signalHeight,
                lowBoundPercentFsh, quantizer, "amplitude_error_under_db");
    }

    static Warning minimumHeightAboveFullScreen(double minimumHeight, double highestDisplayable, double toleranceDb) {
        return Warning.of(MINIMUM_HEIGHT_ABOVE_FULL_SCREEN, String.format(Locale.ROOT,
                "minimum_height_percent_fsh %s is above the highest height that can be displayed and"
                        + " recorded (%s %%FSH): no echo is read within amplitude_tolerance_db %s",
                rounded(minimumHeight), rounded(highestDisplayable), rounded(toleranceDb)));
    }

    static Warning signalHeightBelowMinimum(double signalHeight, double minimumHeight, double toleranceDb) {
        return belowMinimum(SIGNAL_HEIGHT_BELOW_MINIMUM, "signal_height_percent_fsh", signalHeight, minimumHeight,
                "its reading can be off by more than", toleranceDb);
    }

    static Warning evaluationHeightAboveFullScreen(double evaluationHeight) {
        return Warning.of(EVALUATION_HEIGHT_ABOVE_FULL_SCREEN, String.format(Locale.ROOT,
                "evaluation_height_percent_fsh %s is above full screen on the display: digital_gain_db lifts"
                        + " it off the screen; the recorded data hold it",
                rounded(evaluationHeight)));
    }

    static Warning evaluationHeightBelowOneLsb(double evaluationHeight, double referenceHeight,
            double evaluationLevelDb, double lsb) {
        return Warning.of(EVALUATION_HEIGHT_BELOW_ONE_LSB, String.format(Locale.ROOT,
                "evaluation_height_percent_fsh %s (reference_height_percent_fsh %s at evaluation_level_db"
                        + " %s) is below one LSB (%s %%FSH displayed)",
                rounded(evaluationHeight), rounded(referenceHeight), rounded(evaluationLevelDb), rounded(lsb)));
    }

    static Warning evaluationErrorUnderUndefined(double evaluationHeight, double lowBoundPercentFsh,
            Quantizer quantizer) {
        return atLowBound(EVALUATION_ERROR_UNDER_UNDEFINED, "evaluation_height_percent_fsh", evaluationHeight,
                lowBoundPercentFsh, quantizer, "evaluation_error_under_db");
    }

    static Warning evaluationHeightBelowMinimum(double evaluationHeight, double minimumHeight, double toleranceDb) {
        return belowMinimum(EVALUATION_HEIGHT_BELOW_MINIMUM, "evaluation_height_percent_fsh", evaluationHeight,
                minimumHeight, "the evaluation level is not read within", toleranceDb);
    }

    /** A height (signal or evaluation) at or below the quantizer's low bound: its under error has no value. */
    private static Warning atLowBound(String code, String heightField, double heightPercentFsh,
            double lowBoundPercentFsh, Quantizer quantizer, String errorField) {
        return Warning.of(code, String.format(Locale.ROOT,
                "%s %s is at or below the quantizer's low bound (%s %%FSH with %s): it can read as 0, so %s has no"
                        + " finite value; it is null",
                heightField, rounded(heightPercentFsh), rounded(lowBoundPercentFsh), quantizer, errorField));
    }

    /** A height (signal or evaluation) below the minimum height read within the tolerance. */
    private static Warning belowMinimum(String code, String heightField, double heightPercentFsh,
            double minimumHeightPercentFsh, String consequence, double toleranceDb) {
        return Warning.of(code, String.format(Locale.ROOT,
                "%s %s is below minimum_height_percent_fsh %s: %s amplitude_tolerance_db %s",
                heightField, rounded(heightPercentFsh), rounded(minimumHeightPercentFsh), consequence, rounded(toleranceDb)));
    }

    static Warning averagingNoiseOnly(int averaging, double averagingSnrGainDb) {
        return Warning.of(AVERAGING_NOISE_ONLY, String.format(Locale.ROOT,
                "averaging %d improves the SNR of uncorrelated noise by averaging_snr_gain_db %s; it does not"
                        + " shrink the quantization step of a single shot, which every other figure here holds",
                averaging, rounded(averagingSnrGainDb)));
    }
}
