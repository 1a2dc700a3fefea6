package utdigit.core.quantization;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import utdigit.core.common.CalculationException;
import utdigit.core.common.Checks;
import utdigit.core.common.Decibels;
import utdigit.core.common.Reference;
import utdigit.core.common.Sources;
import utdigit.core.common.Warning;

/**
 * Amplitude digitization: how finely an N-bit converter knows an echo's height, and whether a
 * height (an echo, or a reference reflector at an evaluation level) is read within a dB tolerance.
 *
 * <p>Every height is a displayed height in %FSH, after a digital gain G applied to the data (soft
 * gain). Soft gain scales heights and the LSB alike (LSB_displayed = LSB 10^(G/20)), so every
 * error figure is the same as at the converter: soft gain adds no resolution. A displayed height
 * the converter could not have recorded (h 10^(-G/20) above 100 %FSH) is impossible.
 */
public final class QuantizationCalculator {

    /** The signal height lies below the lowest height read within the tolerance. */
    public static final String SIGNAL_HEIGHT_BELOW_MINIMUM = "SIGNAL_HEIGHT_BELOW_MINIMUM";
    /** The signal height is smaller than one displayed LSB. */
    public static final String SIGNAL_HEIGHT_BELOW_ONE_LSB = "SIGNAL_HEIGHT_BELOW_ONE_LSB";
    /** The signal height is within the quantizer's low bound: its reading can be 0, no finite dB. */
    public static final String AMPLITUDE_ERROR_UNDER_UNDEFINED = "AMPLITUDE_ERROR_UNDER_UNDEFINED";
    /** The evaluation height lies below the lowest height read within the tolerance. */
    public static final String EVALUATION_HEIGHT_BELOW_MINIMUM = "EVALUATION_HEIGHT_BELOW_MINIMUM";
    /** The evaluation height is smaller than one displayed LSB. */
    public static final String EVALUATION_HEIGHT_BELOW_ONE_LSB = "EVALUATION_HEIGHT_BELOW_ONE_LSB";
    /** The evaluation height is within the quantizer's low bound: no finite dB. */
    public static final String EVALUATION_ERROR_UNDER_UNDEFINED = "EVALUATION_ERROR_UNDER_UNDEFINED";
    /** The evaluation height is above full screen on the display, though within the converter's range. */
    public static final String EVALUATION_HEIGHT_ABOVE_FULL_SCREEN = "EVALUATION_HEIGHT_ABOVE_FULL_SCREEN";
    /** The minimum height for the tolerance lies above the highest height that can be displayed. */
    public static final String MINIMUM_HEIGHT_ABOVE_FULL_SCREEN = "MINIMUM_HEIGHT_ABOVE_FULL_SCREEN";
    /** The ideal SQNR of a full-scale sine is not defined for rectified data. */
    public static final String IDEAL_SQNR_NOT_APPLICABLE = "IDEAL_SQNR_NOT_APPLICABLE";
    /** What averaging improves and what it does not. */
    public static final String AVERAGING_NOISE_ONLY = "AVERAGING_NOISE_ONLY";

    /** Full screen height, %FSH. */
    static final double FULL_SCREEN_PERCENT_FSH = 100.0;

    /**
     * Relative allowance above full scale when checking that the converter could reach a displayed
     * height, so that h = 100 10^(G/20) computed in floating point is not rejected for one ulp.
     */
    static final double FULL_SCALE_RELATIVE_ALLOWANCE = 1e-12;

    /** 10 log10(1.5) dB: the power ratio of a full-scale sine (A^2/2) to q^2/12 beyond 2^(2N). */
    private static final double SINE_TO_UNIFORM_NOISE_DB = 10.0 * StrictMath.log10(1.5);

    /** 20 / ln(10): dB of an amplitude ratio per unit of its natural logarithm. */
    private static final double DB_PER_NEPER_OF_AMPLITUDE = 20.0 / StrictMath.log(10.0);

    private QuantizationCalculator() {}

    /**
     * Computes the assessment, applying the contract's defaults.
     *
     * @throws CalculationException notApplicable (400) when only one of reference height and
     *     evaluation level is given; impossible (422) for MAX_CODE with one bit of RF, or for a
     *     displayed height (signal, reference or evaluation) the converter could not reach;
     *     invalid for inputs outside a formula's domain (the web layer checks ranges first)
     */
    public static QuantizationResult compute(QuantizationInput in) {
        java.util.Objects.requireNonNull(in, "input");
        int bitDepth = in.bitDepth();
        if (bitDepth < 1 || bitDepth > 32) {
            throw CalculationException.invalid("bit_depth", bitDepth, "must be an integer from 1 to 32");
        }
        DigitizedSignal signal = in.digitizedSignal() == null ? DigitizedSignal.RF : in.digitizedSignal();
        Quantizer quantizer = in.quantizer() == null ? Quantizer.ROUNDING : in.quantizer();
        CodeMapping mapping = in.codeMapping() == null ? CodeMapping.FSR_OVER_2N : in.codeMapping();
        double gainDb = in.digitalGainDb() == null ? 0.0 : Checks.finite("digital_gain_db", in.digitalGainDb());
        checkOptionalInputs(in);
        Double signalHeight = in.signalHeightPercentFsh();
        Double toleranceDb = in.amplitudeToleranceDb();
        Double referenceHeight = in.referenceHeightPercentFsh();
        Integer averaging = in.averaging();

        List<Warning> warnings = new ArrayList<>();
        List<Reference> references = new ArrayList<>();
        Scale scale = scale(bitDepth, signal, quantizer, mapping, gainDb, references);
        Optional<Double> idealSqnrDb = idealSqnrDb(signal, bitDepth);
        if (idealSqnrDb.isPresent()) {
            references.add(Reference.of("ideal SQNR", Sources.IDEAL_SQNR));
        } else {
            warnings.add(QuantizationMessages.idealSqnrNotApplicable());
        }
        Double errorOverDb = null;
        Optional<Double> errorUnderDb = null;
        if (signalHeight != null) {
            requireReachable(signalHeight, scale.gainRatio(), gainDb, "signal_height_percent_fsh");
            references.add(errorReference(quantizer, signal));
            errorOverDb = overErrorDb(signalHeight, scale.highBoundPercentFsh());
            errorUnderDb = underErrorDb(signalHeight, scale.lowBoundPercentFsh());
            signalHeightWarnings(signalHeight, errorUnderDb, scale, quantizer, warnings);
        }
        Double minimumHeight = null;
        Double minimumHeightDb = null;
        if (toleranceDb != null) {
            minimumHeight = minimumHeightPercentFsh(scale.lowBoundPercentFsh(), toleranceDb);
            minimumHeightDb = Decibels.fromRatio(minimumHeight / FULL_SCREEN_PERCENT_FSH);
            references.add(minimumHeightReference(quantizer));
            minimumHeightWarnings(minimumHeight, toleranceDb, signalHeight, scale, warnings);
        }
        Evaluation evaluation = Evaluation.NONE;
        if (referenceHeight != null) {
            evaluation = evaluation(in, minimumHeight, scale, quantizer, signal, gainDb, warnings, references);
        }
        Double averagingSnrGainDb = null;
        if (averaging != null) {
            averagingSnrGainDb = averagingSnrGainDb(averaging);
            references.add(Reference.of("averaging", Sources.SOFT_GAIN));
            warnings.add(QuantizationMessages.averagingNoiseOnly(averaging, averagingSnrGainDb));
        }
        return new QuantizationResult(signal, quantizer, mapping, gainDb, scale.levels(), scale.lsb(),
                scale.dynamicRangeDb(), idealSqnrDb, errorOverDb, errorUnderDb, minimumHeight, minimumHeightDb,
                evaluation.height(), evaluation.errorUnderDb(), averagingSnrGainDb, warnings, references);
    }

    /** The optional inputs' own checks, and the reference height and evaluation level that go together. */
    private static void checkOptionalInputs(QuantizationInput in) {
        Double signalHeight = in.signalHeightPercentFsh();
        if (signalHeight != null) {
            Checks.positive("signal_height_percent_fsh", signalHeight);
        }
        Double toleranceDb = in.amplitudeToleranceDb();
        if (toleranceDb != null) {
            Checks.positive("amplitude_tolerance_db", toleranceDb);
        }
        Double referenceHeight = in.referenceHeightPercentFsh();
        Double evaluationLevelDb = in.evaluationLevelDb();
        if (referenceHeight != null && evaluationLevelDb == null) {
            throw CalculationException.notApplicable("reference_height_percent_fsh",
                    "reference_height_percent_fsh applies only together with evaluation_level_db");
        }
        if (evaluationLevelDb != null && referenceHeight == null) {
            throw CalculationException.notApplicable("evaluation_level_db",
                    "evaluation_level_db applies only together with reference_height_percent_fsh");
        }
        if (referenceHeight != null) {
            Checks.positive("reference_height_percent_fsh", referenceHeight);
            Checks.finite("evaluation_level_db", evaluationLevelDb);
        }
        Integer averaging = in.averaging();
        if (averaging != null) {
            Checks.atLeastOne("averaging", averaging);
        }
    }

    /**
     * The converter's scale as displayed: levels, the gain as a ratio, the displayed LSB, the dynamic
     * range, and how far below and above a height the quantizer can read (%FSH).
     */
    private record Scale(long levels, double gainRatio, double lsb, double dynamicRangeDb,
            double lowBoundPercentFsh, double highBoundPercentFsh) {}

    private static Scale scale(int bitDepth, DigitizedSignal signal, Quantizer quantizer, CodeMapping mapping,
            double gainDb, List<Reference> references) {
        long levels = 1L << bitDepth;
        double gainRatio = Decibels.toRatio(gainDb);
        double converterLsb = mapping.lsbPercentFsh(signal, bitDepth);
        double lsb = converterLsb * gainRatio;
        double dynamicRangeDb = dynamicRangeDb(converterLsb, gainDb);
        double lowBoundPercentFsh = quantizer.lowBoundLsbFraction() * lsb;
        double highBoundPercentFsh = quantizer.highBoundLsbFraction(signal) * lsb;
        references.add(Reference.of("levels", Sources.DEFINITIONS));
        references.add(lsbReference(signal, mapping));
        if (signal == DigitizedSignal.RF) {
            references.add(Reference.of("rectifying RF after digitizing", Sources.CODE_MAPPING));
        }
        if (gainDb != 0.0) {
            references.add(Reference.of("digital gain", Sources.SOFT_GAIN));
        }
        references.add(Reference.of("dynamic range", Sources.DYNAMIC_RANGE));
        return new Scale(levels, gainRatio, lsb, dynamicRangeDb, lowBoundPercentFsh, highBoundPercentFsh);
    }

    private static void signalHeightWarnings(double signalHeight, Optional<Double> errorUnderDb, Scale scale,
            Quantizer quantizer, List<Warning> warnings) {
        if (signalHeight < scale.lsb()) {
            warnings.add(QuantizationMessages.signalHeightBelowOneLsb(signalHeight, scale.lsb()));
        }
        if (errorUnderDb.isEmpty()) {
            warnings.add(QuantizationMessages.errorUnderUndefined(signalHeight, scale.lowBoundPercentFsh(),
                    quantizer));
        }
    }

    private static void minimumHeightWarnings(double minimumHeight, double toleranceDb, Double signalHeight,
            Scale scale, List<Warning> warnings) {
        double highestDisplayable = FULL_SCREEN_PERCENT_FSH * StrictMath.min(1.0, scale.gainRatio());
        if (minimumHeight > highestDisplayable) {
            warnings.add(QuantizationMessages.minimumHeightAboveFullScreen(minimumHeight, highestDisplayable,
                    toleranceDb));
        }
        if (signalHeight != null && signalHeight < minimumHeight) {
            warnings.add(QuantizationMessages.signalHeightBelowMinimum(signalHeight, minimumHeight, toleranceDb));
        }
    }

    /** The evaluation height (reference height at the evaluation level) and its worst reading below. */
    private record Evaluation(Double height, Optional<Double> errorUnderDb) {
        static final Evaluation NONE = new Evaluation(null, null);
    }

    private static Evaluation evaluation(QuantizationInput in, Double minimumHeight, Scale scale,
            Quantizer quantizer, DigitizedSignal signal, double gainDb, List<Warning> warnings,
            List<Reference> references) {
        double referenceHeight = in.referenceHeightPercentFsh();
        double evaluationLevelDb = in.evaluationLevelDb();
        requireReachable(referenceHeight, scale.gainRatio(), gainDb, "reference_height_percent_fsh");
        double evaluationHeight = referenceHeight * Decibels.toRatio(evaluationLevelDb);
        requireReachableEvaluation(evaluationHeight, referenceHeight, evaluationLevelDb, scale.gainRatio(), gainDb);
        references.add(Reference.of("evaluation height", Sources.DEFINITIONS));
        if (in.signalHeightPercentFsh() == null) {
            references.add(errorReference(quantizer, signal));
        }
        Optional<Double> evaluationErrorUnderDb = underErrorDb(evaluationHeight, scale.lowBoundPercentFsh());
        if (evaluationHeight > FULL_SCREEN_PERCENT_FSH) {
            warnings.add(QuantizationMessages.evaluationHeightAboveFullScreen(evaluationHeight));
        }
        if (evaluationHeight < scale.lsb()) {
            warnings.add(QuantizationMessages.evaluationHeightBelowOneLsb(evaluationHeight, referenceHeight,
                    evaluationLevelDb, scale.lsb()));
        }
        if (evaluationErrorUnderDb.isEmpty()) {
            warnings.add(QuantizationMessages.evaluationErrorUnderUndefined(evaluationHeight,
                    scale.lowBoundPercentFsh(), quantizer));
        }
        if (minimumHeight != null && evaluationHeight < minimumHeight) {
            warnings.add(QuantizationMessages.evaluationHeightBelowMinimum(evaluationHeight, minimumHeight,
                    in.amplitudeToleranceDb()));
        }
        return new Evaluation(evaluationHeight, evaluationErrorUnderDb);
    }

    /**
     * Ideal signal-to-quantization-noise ratio of a full-scale sine through an ideal N-bit mid-rise
     * quantizer: 20 log10(2^N) + 10 log10(1.5) dB, the exact form of 6.02 N + 1.76 dB (signal power
     * A^2/2 over the uniform noise q^2/12 with q = 2A/2^N); 1.76 dB at 0 bits rising 6.02 dB per bit.
     * Does not depend on the code mapping or on a gain after digitizing. Empty for RECTIFIED data,
     * where a full-scale sine does not exist. Reference: src/docs/methods.md 4.2 (derived there).
     */
    static Optional<Double> idealSqnrDb(DigitizedSignal signal, int bitDepth) {
        if (signal != DigitizedSignal.RF) {
            return Optional.empty();
        }
        return Optional.of(20.0 * StrictMath.log10((double) (1L << bitDepth)) + SINE_TO_UNIFORM_NOISE_DB);
    }

    /**
     * Worst case of sampling and quantization together, as a positive loss in dB: sampling first
     * lowers the read peak of an echo of height h to r_s h, r_s = 10^(-L_s/20), then the quantizer
     * reads that lower height up to b below it (b = LSB/2 for ROUNDING, LSB for TRUNCATION), so the
     * reading can be r_s h - b: -20 log10(r_s - b/h). This exceeds the sum of the two losses in dB,
     * L_s - 20 log10(1 - b/h), because the quantizer's b weighs more at the lower height (8-bit RF at
     * 10 %FSH, 5 MHz 60 % at 5 samples per period: 2.389 dB, the sum 2.299 dB). Empty when
     * r_s h <= b (the reading can be 0). Reference: derived from the two worst cases; checked by a
     * brute-force simulation of a sampled, quantized echo in the tests.
     *
     * @param samplingLossDb the sampled-peak loss L_s, dB, >= 0
     * @param heightPercentFsh the true (displayed) height h, %FSH, > 0
     * @param lowBoundPercentFsh how far below a height the quantizer can read, b, %FSH, >= 0
     */
    public static Optional<Double> combinedErrorDb(double samplingLossDb, double heightPercentFsh,
                                                   double lowBoundPercentFsh) {
        Checks.nonNegative("pulse_amplitude_loss_db", samplingLossDb);
        Checks.positive("evaluation_height_percent_fsh", heightPercentFsh);
        Checks.nonNegative("lsb_percent_fsh", lowBoundPercentFsh);
        double readRatio = Decibels.toRatio(-samplingLossDb) - lowBoundPercentFsh / heightPercentFsh;
        if (!(readRatio > 0.0)) {
            return Optional.empty();
        }
        return Optional.of(-Decibels.fromRatio(readRatio));
    }

    /**
     * Dynamic range of the displayed data: from the largest displayed height the converter can
     * reach to one displayed LSB, 20 log10(100 / LSB) - max(G, 0) dB with the converter's LSB. A
     * positive gain G pushes full scale off the screen (the screen's top stays the largest height)
     * while the displayed LSB grows by G; a negative gain shrinks the largest reachable height and
     * the LSB alike, so it leaves the converter's range. Soft gain never adds range. Reference:
     * definition of dynamic range (derived for gain after digitizing).
     */
    static double dynamicRangeDb(double converterLsbPercentFsh, double gainDb) {
        return Decibels.fromRatio(FULL_SCREEN_PERCENT_FSH / converterLsbPercentFsh) - StrictMath.max(gainDb, 0.0);
    }

    /**
     * Worst reading above a height h when a reading can lie up to b above it: 20 log10((h + b)/h)
     * dB, >= 0 (0 when b = 0), computed as 20 log1p(b/h) / ln(10) to keep its digits when b/h is
     * small. Heights and b in the same %FSH. Reference: (derived) from the quantizer's error bound.
     */
    static double overErrorDb(double heightPercentFsh, double highBoundPercentFsh) {
        return DB_PER_NEPER_OF_AMPLITUDE * StrictMath.log1p(highBoundPercentFsh / heightPercentFsh);
    }

    /**
     * Worst reading below a height h when a reading can lie up to b below it: 20 log10((h - b)/h)
     * dB, negative, computed as 20 log1p(-b/h) / ln(10); exists for h > b (at h <= b the reading can
     * be 0: empty). Heights and b in the same %FSH. Reference: (derived) from the quantizer's error
     * bound.
     */
    static Optional<Double> underErrorDb(double heightPercentFsh, double lowBoundPercentFsh) {
        if (!(heightPercentFsh > lowBoundPercentFsh)) {
            return Optional.empty();
        }
        return Optional.of(DB_PER_NEPER_OF_AMPLITUDE * StrictMath.log1p(-lowBoundPercentFsh / heightPercentFsh));
    }

    /**
     * Lowest height whose worst reading stays within X dB: h_min = b / (1 - 10^(-X/20)) %FSH for a
     * low bound b (LSB/2 for ROUNDING, LSB for TRUNCATION), X > 0 dB. The under error decides: for
     * every height |20 log10(1 - b/h)| exceeds 20 log10(1 + b/h). 1 - 10^(-X/20) is computed as
     * -expm1(-X ln(10)/20) to keep its digits at small X. Reference: the inverse of the worst-case
     * error (derived).
     */
    static double minimumHeightPercentFsh(double lowBoundPercentFsh, double toleranceDb) {
        double oneMinusRatio = -StrictMath.expm1(-toleranceDb * StrictMath.log(10.0) / 20.0);
        return lowBoundPercentFsh / oneMinusRatio;
    }

    /**
     * Signal-to-noise gain of averaging M acquisitions with uncorrelated noise: 10 log10(M) dB,
     * M >= 1. Reference: (derived) the noise power of a mean of M uncorrelated samples is 1/M.
     */
    static double averagingSnrGainDb(int averaging) {
        return 10.0 * StrictMath.log10(averaging);
    }

    private static void requireReachable(double heightPercentFsh, double gainRatio, double gainDb, String field) {
        double atConverterPercentFsh = heightPercentFsh / gainRatio;
        if (atConverterPercentFsh > FULL_SCREEN_PERCENT_FSH * (1.0 + FULL_SCALE_RELATIVE_ALLOWANCE)) {
            throw QuantizationMessages.heightNotReachable(field, heightPercentFsh, gainDb, atConverterPercentFsh);
        }
    }

    private static void requireReachableEvaluation(double evaluationHeightPercentFsh, double referenceHeightPercentFsh,
            double evaluationLevelDb, double gainRatio, double gainDb) {
        double atConverterPercentFsh = evaluationHeightPercentFsh / gainRatio;
        if (atConverterPercentFsh > FULL_SCREEN_PERCENT_FSH * (1.0 + FULL_SCALE_RELATIVE_ALLOWANCE)) {
            throw QuantizationMessages.evaluationNotReachable(referenceHeightPercentFsh, evaluationLevelDb,
                    evaluationHeightPercentFsh, atConverterPercentFsh, gainDb);
        }
    }

    private static Reference lsbReference(DigitizedSignal signal, CodeMapping mapping) {
        if (mapping == CodeMapping.FSR_OVER_2N) {
            return Reference.of("LSB size", Sources.CODE_MAPPING);
        }
        return Reference.of("LSB size", Sources.MAX_CODE);
    }

    private static Reference errorReference(Quantizer quantizer, DigitizedSignal signal) {
        return Reference.of("amplitude error", Sources.QUANTIZATION_ERROR);
    }

    private static Reference minimumHeightReference(Quantizer quantizer) {
        return Reference.of("minimum height", Sources.QUANTIZATION_ERROR);
    }
}
