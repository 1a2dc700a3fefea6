package utdigit.core.quantization;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;
import org.junit.jupiter.params.provider.ValueSource;
import utdigit.core.common.CalculationError;
import utdigit.core.common.CalculationException;

/**
 * Closed-form checks of the quantization assessment. Expected values are written as their
 * derivation from the formulas of the trade (src/docs/methods.md 4), never copied from the
 * implementation.
 */
class QuantizationCalculatorTest {

    static final double ALLOWED_ERROR_DB = 1e-9;
    static final double ALLOWED_RELATIVE_ERROR = 1e-12;

    /** 8-bit RF, FSR_OVER_2N: 200 %FSH / 256 codes. */
    static final double LSB_8_BIT_RF_PERCENT_FSH = 200.0 / 256.0;

    static double db(double amplitudeRatio) {
        return 20.0 * Math.log10(amplitudeRatio);
    }

    static QuantizationResult compute(QuantizationInput in) {
        return QuantizationCalculator.compute(in);
    }

    @Nested
    class LevelsAndLsb {

        @ParameterizedTest(name = "{0} bits {1} {2}: {3} levels, LSB {4}/{5} %FSH")
        @DisplayName("levels and LSB match the hand-typed closed forms (IEEE Std 1241 from memory; MAX_CODE common practice)")
        @CsvFileSource(resources = "/reference/quantization-lsb.csv")
        void levelsAndLsbMatchClosedForms(int bitDepth, DigitizedSignal signal, CodeMapping mapping, long levels,
                double lsbNumeratorPercentFsh, double lsbDenominator) {
            QuantizationResult r = compute(QuantizationInput.builder(bitDepth)
                    .digitizedSignal(signal).codeMapping(mapping).build());

            assertThat(r.levels()).isEqualTo(levels);
            assertThat(r.lsbPercentFsh())
                    .isCloseTo(lsbNumeratorPercentFsh / lsbDenominator,
                            within(ALLOWED_RELATIVE_ERROR * lsbNumeratorPercentFsh / lsbDenominator));
        }

        @Test
        void thirtyTwoBitsGiveTwoToTheThirtySecondLevelsWithoutOverflow() {
            assertThat(compute(QuantizationInput.of(32)).levels()).isEqualTo(4_294_967_296L);
        }

        @Test
        void defaultsAreRfRoundingFsrOver2nAndNoGain() {
            QuantizationResult r = compute(QuantizationInput.of(8));

            assertThat(r.digitizedSignal()).isEqualTo(DigitizedSignal.RF);
            assertThat(r.quantizer()).isEqualTo(Quantizer.ROUNDING);
            assertThat(r.codeMapping()).isEqualTo(CodeMapping.FSR_OVER_2N);
            assertThat(r.digitalGainDb()).isZero();
            assertThat(r.lsbPercentFsh()).isEqualTo(LSB_8_BIT_RF_PERCENT_FSH);
        }

        @Test
        @DisplayName("dynamic range is full screen to one LSB: 8-bit RF 20 log10(128), RECTIFIED 20 log10(256) (definition)")
        void dynamicRangeIsFullScreenOverOneLsb() {
            assertThat(compute(QuantizationInput.of(8)).dynamicRangeDb())
                    .isCloseTo(20 * Math.log10(128), within(ALLOWED_ERROR_DB));
            assertThat(compute(QuantizationInput.builder(8).digitizedSignal(DigitizedSignal.RECTIFIED).build())
                    .dynamicRangeDb()).isCloseTo(20 * Math.log10(256), within(ALLOWED_ERROR_DB));
        }

        @Test
        @DisplayName("MAX_CODE LSB is 128/127 of FSR_OVER_2N for 8-bit RF (about 0.8 %) and 256/255 for RECTIFIED (about 0.4 %)")
        void codeMappingsDifferByTheLargestCodeRatio() {
            double rfFsr = compute(QuantizationInput.of(8)).lsbPercentFsh();
            double rfMax = compute(QuantizationInput.builder(8).codeMapping(CodeMapping.MAX_CODE)
                    .build()).lsbPercentFsh();
            QuantizationInput rectified = QuantizationInput.builder(8).digitizedSignal(DigitizedSignal.RECTIFIED)
                    .build();
            double recFsr = compute(rectified).lsbPercentFsh();
            double recMax = compute(rectified.toBuilder().codeMapping(CodeMapping.MAX_CODE).build()).lsbPercentFsh();

            assertThat(rfMax / rfFsr).isCloseTo(128.0 / 127.0, within(ALLOWED_RELATIVE_ERROR));
            assertThat(recMax / recFsr).isCloseTo(256.0 / 255.0, within(ALLOWED_RELATIVE_ERROR));
            // src/docs/methods.md: "the two differ by about 0.8 % at 8 bits" (true of RF: 0.787 %)
            assertThat((rfMax / rfFsr - 1) * 100).isBetween(0.75, 0.85);
        }

        @ParameterizedTest(name = "{0} bits")
        @ValueSource(ints = {2, 4, 8, 12, 16, 24, 32})
        @DisplayName("RF has one bit less dynamic range than RECTIFIED: 20 log10(2) = 6.02 dB (derived from FSR 200 vs 100 %FSH)")
        void rfAndRectifiedDifferByOneBitOfDynamicRange(int bitDepth) {
            double rf = compute(QuantizationInput.of(bitDepth)).dynamicRangeDb();
            double rectified = compute(QuantizationInput.builder(bitDepth)
                    .digitizedSignal(DigitizedSignal.RECTIFIED).build()).dynamicRangeDb();

            assertThat(rectified - rf).isCloseTo(20 * Math.log10(2), within(ALLOWED_ERROR_DB));
        }

        @ParameterizedTest(name = "{0} bits")
        @ValueSource(ints = {8, 12, 16, 32})
        @DisplayName("with MAX_CODE RF and RECTIFIED differ by 20 log10((2^N - 1)/(2^(N-1) - 1)), about 6.02 dB")
        void rfAndRectifiedDifferByAboutOneBitWithMaxCode(int bitDepth) {
            QuantizationInput maxCode = QuantizationInput.builder(bitDepth).codeMapping(CodeMapping.MAX_CODE).build();
            double rf = compute(maxCode).dynamicRangeDb();
            double rectified = compute(maxCode.toBuilder().digitizedSignal(DigitizedSignal.RECTIFIED)
                    .build()).dynamicRangeDb();
            double largestRectifiedCode = Math.pow(2, bitDepth) - 1;
            double largestRfCode = Math.pow(2, bitDepth - 1) - 1;

            assertThat(rectified - rf).isCloseTo(db(largestRectifiedCode / largestRfCode), within(ALLOWED_ERROR_DB));
            assertThat(rectified - rf).isCloseTo(6.02, within(0.05));
        }
    }

    @Nested
    class AmplitudeErrors {

        @Test
        @DisplayName("ROUNDING at 50 %FSH, 8-bit RF: +/- LSB/2 (W. Kester, MT-001, from memory)")
        void roundingReadsWithinHalfAnLsb() {
            QuantizationResult r = compute(QuantizationInput.builder(8).signalHeightPercentFsh(50.0).build());
            double halfLsb = LSB_8_BIT_RF_PERCENT_FSH / 2;

            assertThat(r.amplitudeErrorOverDb()).isCloseTo(db((50 + halfLsb) / 50), within(ALLOWED_ERROR_DB));
            assertThat(r.amplitudeErrorUnderDb()).hasValueSatisfying(
                    under -> assertThat(under).isCloseTo(db((50 - halfLsb) / 50), within(ALLOWED_ERROR_DB)));
            assertThat(r.amplitudeErrorOverDb()).isPositive();
            assertThat(r.amplitudeErrorUnderDb().orElseThrow()).isNegative();
        }

        @Test
        @DisplayName("TRUNCATION of RF: positive peaks up to 1 LSB low, negative half-waves up to 1 LSB high (floor, derived)")
        void truncationOfRfReadsWithinOneLsbEitherWay() {
            QuantizationResult r = compute(QuantizationInput.builder(8).quantizer(Quantizer.TRUNCATION)
                    .signalHeightPercentFsh(50.0).build());
            double lsb = LSB_8_BIT_RF_PERCENT_FSH;

            assertThat(r.amplitudeErrorOverDb()).isCloseTo(db((50 + lsb) / 50), within(ALLOWED_ERROR_DB));
            assertThat(r.amplitudeErrorUnderDb().orElseThrow()).isCloseTo(db((50 - lsb) / 50), within(ALLOWED_ERROR_DB));
        }

        @Test
        @DisplayName("TRUNCATION of RECTIFIED data never reads high (floor of s >= 0, derived)")
        void truncationOfRectifiedNeverReadsHigh() {
            QuantizationResult r = compute(QuantizationInput.builder(8).quantizer(Quantizer.TRUNCATION)
                    .digitizedSignal(DigitizedSignal.RECTIFIED).signalHeightPercentFsh(50.0).build());
            double lsb = 100.0 / 256.0;

            assertThat(r.amplitudeErrorOverDb()).isEqualTo(0.0);
            assertThat(r.amplitudeErrorUnderDb().orElseThrow()).isCloseTo(db((50 - lsb) / 50), within(ALLOWED_ERROR_DB));
        }

        @ParameterizedTest(name = "{0} %FSH")
        @ValueSource(doubles = {5.0, 20.0, 80.0})
        @DisplayName("TRUNCATION errs about twice as far below as ROUNDING (bound LSB vs LSB/2, derived)")
        void truncationErrsAboutTwiceAsFarBelowAsRounding(double heightPercentFsh) {
            QuantizationInput in = QuantizationInput.builder(10).signalHeightPercentFsh(heightPercentFsh).build();
            double rounding = compute(in).amplitudeErrorUnderDb().orElseThrow();
            double truncation = compute(in.toBuilder().quantizer(Quantizer.TRUNCATION)
                    .build()).amplitudeErrorUnderDb().orElseThrow();

            assertThat(truncation).isLessThan(rounding);
            // for small LSB/h, 20 log10(1 - e) ~ -8.686 e: twice the bound, about twice the dB
            assertThat(truncation / rounding).isCloseTo(2.0, within(0.05));
        }

        @Test
        void underErrorDoesNotExistWhenTheHeightIsWithinHalfAnLsbOfZero() {
            QuantizationResult r = compute(QuantizationInput.builder(8)
                    .signalHeightPercentFsh(LSB_8_BIT_RF_PERCENT_FSH / 2).build());

            assertThat(r.amplitudeErrorUnderDb()).isEmpty();
            assertThat(r.hasWarning(QuantizationCalculator.AMPLITUDE_ERROR_UNDER_UNDEFINED)).isTrue();
            assertThat(r.hasWarning(QuantizationCalculator.SIGNAL_HEIGHT_BELOW_ONE_LSB)).isTrue();
            assertThat(r.amplitudeErrorOverDb()).isCloseTo(db(2.0), within(ALLOWED_ERROR_DB));
        }

        @Test
        void underErrorOfTruncationDoesNotExistAtOneLsb() {
            QuantizationResult r = compute(QuantizationInput.builder(8).quantizer(Quantizer.TRUNCATION)
                    .signalHeightPercentFsh(LSB_8_BIT_RF_PERCENT_FSH).build());

            assertThat(r.amplitudeErrorUnderDb()).isEmpty();
            assertThat(r.hasWarning(QuantizationCalculator.AMPLITUDE_ERROR_UNDER_UNDEFINED)).isTrue();
        }

        @Test
        void heightBelowOneLsbWarnsButKeepsAFiniteUnderErrorAboveHalfAnLsb() {
            QuantizationResult r = compute(QuantizationInput.builder(8).signalHeightPercentFsh(0.5).build());

            assertThat(r.hasWarning(QuantizationCalculator.SIGNAL_HEIGHT_BELOW_ONE_LSB)).isTrue();
            assertThat(r.hasWarning(QuantizationCalculator.AMPLITUDE_ERROR_UNDER_UNDEFINED)).isFalse();
            assertThat(r.amplitudeErrorUnderDb().orElseThrow())
                    .isCloseTo(db((0.5 - LSB_8_BIT_RF_PERCENT_FSH / 2) / 0.5), within(ALLOWED_ERROR_DB));
        }

        @Test
        void heightAboveOneLsbRaisesNoHeightWarning() {
            QuantizationResult r = compute(QuantizationInput.builder(8).signalHeightPercentFsh(1.0).build());

            assertThat(r.warnings()).isEmpty();
        }
    }

    @Nested
    class MinimumHeight {

        @Test
        @DisplayName("ROUNDING: h_min = (LSB/2)/(1 - 10^(-X/20)) and 20 log10(h_min/100) (src/docs/methods.md 4.3)")
        void roundingMinimumHeightMatchesClosedForm() {
            QuantizationResult r = compute(QuantizationInput.builder(8).amplitudeToleranceDb(1.0).build());
            double expected = (LSB_8_BIT_RF_PERCENT_FSH / 2) / (1 - Math.pow(10, -1.0 / 20));

            assertThat(r.minimumHeightPercentFsh()).isCloseTo(expected, within(ALLOWED_RELATIVE_ERROR * expected));
            assertThat(r.minimumHeightDb()).isCloseTo(db(expected / 100), within(ALLOWED_ERROR_DB));
        }

        @Test
        @DisplayName("TRUNCATION: h_min = LSB/(1 - 10^(-X/20)), twice the ROUNDING value (src/docs/methods.md 4.3)")
        void truncationMinimumHeightIsTwiceRounding() {
            QuantizationInput in = QuantizationInput.builder(12).amplitudeToleranceDb(0.5).build();
            double rounding = compute(in).minimumHeightPercentFsh();
            double truncation = compute(in.toBuilder().quantizer(Quantizer.TRUNCATION)
                    .build()).minimumHeightPercentFsh();
            double expected = (200.0 / 4096) / (1 - Math.pow(10, -0.5 / 20));

            assertThat(truncation).isCloseTo(expected, within(ALLOWED_RELATIVE_ERROR * expected));
            assertThat(truncation / rounding).isCloseTo(2.0, within(ALLOWED_RELATIVE_ERROR));
        }

        @ParameterizedTest(name = "X = {0} dB")
        @ValueSource(doubles = {0.01, 0.5, 1.0, 2.0, 6.0, 20.0, 40.0})
        @DisplayName("the inverse round-trips: the under error at h_min is -X dB")
        void underErrorAtMinimumHeightIsMinusTheTolerance(double toleranceDb) {
            for (Quantizer quantizer : Quantizer.values()) {
                QuantizationInput in = QuantizationInput.builder(16).quantizer(quantizer)
                        .amplitudeToleranceDb(toleranceDb).build();
                double minimumHeight = compute(in).minimumHeightPercentFsh();
                QuantizationResult atMinimum = compute(in.toBuilder().signalHeightPercentFsh(minimumHeight).build());

                assertThat(atMinimum.amplitudeErrorUnderDb().orElseThrow())
                        .as("%s", quantizer).isCloseTo(-toleranceDb, within(ALLOWED_ERROR_DB));
                assertThat(atMinimum.amplitudeErrorOverDb()).isLessThan(toleranceDb);
            }
        }

        @Test
        void signalHeightBelowTheMinimumWarns() {
            QuantizationInput in = QuantizationInput.builder(8).amplitudeToleranceDb(1.0).build();
            double minimumHeight = compute(in).minimumHeightPercentFsh();

            assertThat(compute(in.toBuilder().signalHeightPercentFsh(minimumHeight * 0.99).build())
                    .hasWarning(QuantizationCalculator.SIGNAL_HEIGHT_BELOW_MINIMUM)).isTrue();
            assertThat(compute(in.toBuilder().signalHeightPercentFsh(minimumHeight * 1.01).build())
                    .hasWarning(QuantizationCalculator.SIGNAL_HEIGHT_BELOW_MINIMUM)).isFalse();
        }

        @Test
        void minimumHeightAboveFullScreenIsReturnedWithAWarning() {
            // 1-bit RF: LSB 100 %FSH, h_min = 50/(1 - 10^(-1/20)) = 460 %FSH
            QuantizationResult r = compute(QuantizationInput.builder(1).amplitudeToleranceDb(1.0).build());

            assertThat(r.minimumHeightPercentFsh()).isCloseTo(50 / (1 - Math.pow(10, -1.0 / 20)), within(1e-9));
            assertThat(r.minimumHeightDb()).isPositive();
            assertThat(r.hasWarning(QuantizationCalculator.MINIMUM_HEIGHT_ABOVE_FULL_SCREEN)).isTrue();
        }

        @Test
        void minimumHeightOnScreenRaisesNoWarning() {
            assertThat(compute(QuantizationInput.builder(8).amplitudeToleranceDb(1.0).build()).warnings()).isEmpty();
        }
    }

    @Nested
    class Evaluation {

        @Test
        @DisplayName("evaluation height h_ref 10^(L/20): 80 %FSH at -14 dB (definition of a dB level)")
        void evaluationHeightIsReferenceTimesLevel() {
            QuantizationResult r = compute(QuantizationInput.builder(8).referenceHeightPercentFsh(80.0)
                    .evaluationLevelDb(-14.0).build());
            double expected = 80 * Math.pow(10, -14.0 / 20);

            assertThat(r.evaluationHeightPercentFsh()).isCloseTo(expected, within(ALLOWED_RELATIVE_ERROR * expected));
            assertThat(r.evaluationErrorUnderDb().orElseThrow())
                    .isCloseTo(db((expected - LSB_8_BIT_RF_PERCENT_FSH / 2) / expected), within(ALLOWED_ERROR_DB));
            assertThat(r.warnings()).isEmpty();
        }

        @Test
        void evaluationHeightBelowOneLsbWarns() {
            // 80 10^(-42/20) = 0.635 %FSH < 0.78125 %FSH
            QuantizationResult r = compute(QuantizationInput.builder(8).referenceHeightPercentFsh(80.0)
                    .evaluationLevelDb(-42.0).build());

            assertThat(r.hasWarning(QuantizationCalculator.EVALUATION_HEIGHT_BELOW_ONE_LSB)).isTrue();
            assertThat(r.evaluationErrorUnderDb()).isPresent();
        }

        @Test
        void evaluationErrorDoesNotExistWithinHalfAnLsbOfZero() {
            QuantizationResult r = compute(QuantizationInput.builder(8).referenceHeightPercentFsh(50.0)
                    .evaluationLevelDb(-80.0).build());

            assertThat(r.evaluationErrorUnderDb()).isEmpty();
            assertThat(r.hasWarning(QuantizationCalculator.EVALUATION_ERROR_UNDER_UNDEFINED)).isTrue();
        }

        @Test
        void evaluationHeightBelowTheMinimumForTheToleranceWarns() {
            // 8-bit RF, 1 dB: h_min = 3.59 %FSH; 80 %FSH at -30 dB is 2.53 %FSH
            QuantizationResult r = compute(QuantizationInput.builder(8).amplitudeToleranceDb(1.0)
                    .referenceHeightPercentFsh(80.0)
                    .evaluationLevelDb(-30.0).build());

            assertThat(r.hasWarning(QuantizationCalculator.EVALUATION_HEIGHT_BELOW_MINIMUM)).isTrue();
            assertThat(r.evaluationErrorUnderDb().orElseThrow()).isLessThan(-1.0);
        }

        @Test
        void evaluationHeightLiftedOffScreenByGainIsKeptWithAWarning() {
            // +6 dB soft gain: 80 %FSH displayed at +6 dB is 159.6 %FSH displayed, 80 %FSH at the converter
            QuantizationResult r = compute(QuantizationInput.builder(8).digitalGainDb(6.0)
                    .referenceHeightPercentFsh(80.0)
                    .evaluationLevelDb(6.0).build());

            assertThat(r.evaluationHeightPercentFsh()).isCloseTo(80 * Math.pow(10, 0.3), within(1e-9));
            assertThat(r.hasWarning(QuantizationCalculator.EVALUATION_HEIGHT_ABOVE_FULL_SCREEN)).isTrue();
        }
    }

    @Nested
    class DigitalGain {

        @Test
        @DisplayName("soft gain of 20 dB makes the displayed LSB ten times larger (definition of 20 dB)")
        void gainScalesTheDisplayedLsb() {
            QuantizationResult r = compute(QuantizationInput.builder(8).digitalGainDb(20.0).build());

            assertThat(r.lsbPercentFsh()).isCloseTo(10 * LSB_8_BIT_RF_PERCENT_FSH, within(1e-12));
            assertThat(r.dynamicRangeDb()).isCloseTo(20 * Math.log10(128) - 20, within(ALLOWED_ERROR_DB));
            assertThat(r.idealSqnrDb()).isEqualTo(compute(QuantizationInput.of(8)).idealSqnrDb());
        }

        @Test
        @DisplayName("soft gain below 0 dB cannot raise the dynamic range above the converter's 20 log10(128) (8-bit RF)")
        void negativeGainDoesNotRaiseTheDynamicRange() {
            // -12 dB shrinks the displayed LSB to a quarter, but also the largest reachable height to 25 %FSH:
            // from there to one displayed LSB is still 128 LSB, 42.14 dB (derived from the definition).
            QuantizationResult r = compute(QuantizationInput.builder(8).digitalGainDb(-12.0).build());
            assertThat(r.lsbPercentFsh()).isCloseTo(LSB_8_BIT_RF_PERCENT_FSH * Math.pow(10, -12.0 / 20), within(1e-12));
            double reachablePercentFsh = 100.0 * Math.pow(10, -12.0 / 20);
            assertThat(r.dynamicRangeDb()).isCloseTo(20 * Math.log10(reachablePercentFsh / r.lsbPercentFsh()),
                    within(ALLOWED_ERROR_DB));
            assertThat(r.dynamicRangeDb()).isCloseTo(20 * Math.log10(128), within(ALLOWED_ERROR_DB));
        }

        @Test
        void displayedHeightAtTheConvertersFullScaleIsAccepted() {
            double gainDb = 6.0;
            double fullScaleDisplayed = 100 * Math.pow(10, gainDb / 20);

            QuantizationResult r = compute(QuantizationInput.builder(8).digitalGainDb(gainDb)
                    .signalHeightPercentFsh(fullScaleDisplayed).build());

            assertThat(r.amplitudeErrorOverDb()).isPositive();
        }
    }

    @Nested
    class Averaging {

        @Test
        @DisplayName("averaging M gives 10 log10(M): 4 acquisitions 6.02 dB (uncorrelated noise power / M)")
        void averagingGainIsTenLogM() {
            QuantizationResult r = compute(QuantizationInput.builder(8).averaging(4).build());

            assertThat(r.averagingSnrGainDb()).isCloseTo(10 * Math.log10(4), within(ALLOWED_ERROR_DB));
            assertThat(r.hasWarning(QuantizationCalculator.AVERAGING_NOISE_ONLY)).isTrue();
        }

        @Test
        void averagingOneAcquisitionGainsNothing() {
            assertThat(compute(QuantizationInput.builder(8).averaging(1).build()).averagingSnrGainDb()).isZero();
        }

        @Test
        void averagingDoesNotChangeTheQuantizationFigures() {
            QuantizationInput in = QuantizationInput.builder(8).signalHeightPercentFsh(10.0)
                    .amplitudeToleranceDb(1.0).build();
            QuantizationResult single = compute(in);
            QuantizationResult averaged = compute(in.toBuilder().averaging(256).build());

            assertThat(averaged.lsbPercentFsh()).isEqualTo(single.lsbPercentFsh());
            assertThat(averaged.amplitudeErrorUnderDb()).isEqualTo(single.amplitudeErrorUnderDb());
            assertThat(averaged.minimumHeightPercentFsh()).isEqualTo(single.minimumHeightPercentFsh());
        }
    }

    @Nested
    class OptionalInputs {

        @Test
        void resultsOfOptionalInputsNotGivenAreNull() {
            QuantizationResult r = compute(QuantizationInput.of(8));

            assertThat(r.amplitudeErrorOverDb()).isNull();
            assertThat(r.amplitudeErrorUnderDb()).isNull();
            assertThat(r.minimumHeightPercentFsh()).isNull();
            assertThat(r.minimumHeightDb()).isNull();
            assertThat(r.evaluationHeightPercentFsh()).isNull();
            assertThat(r.evaluationErrorUnderDb()).isNull();
            assertThat(r.averagingSnrGainDb()).isNull();
            assertThat(r.warnings()).isEmpty();
        }

        @Test
        void everyResultNamesItsReferences() {
            QuantizationResult r = compute(QuantizationInput.builder(8).signalHeightPercentFsh(50.0)
                    .amplitudeToleranceDb(1.0).referenceHeightPercentFsh(80.0).evaluationLevelDb(-6.0).averaging(4)
                    .digitalGainDb(3.0).build());

            assertThat(r.references()).extracting(ref -> ref.topic()).contains("levels", "LSB size", "dynamic range",
                    "ideal SQNR", "amplitude error", "minimum height", "evaluation height", "averaging",
                    "digital gain", "rectifying RF after digitizing");
            assertThat(r.references()).filteredOn(ref -> ref.topic().equals("rectifying RF after digitizing"))
                    .singleElement().satisfies(ref -> assertThat(ref.id()).isEqualTo("quantizer-code-mapping"));
        }
    }

    @Nested
    class Failures {

        @Test
        @DisplayName("MAX_CODE with one bit of RF leaves 2^0 - 1 = 0 positive codes: impossible (422)")
        void maxCodeWithOneBitOfRfIsImpossible() {
            assertThatThrownBy(() -> compute(QuantizationInput.builder(1).codeMapping(CodeMapping.MAX_CODE).build()))
                    .isInstanceOfSatisfying(CalculationException.class, e -> {
                        assertThat(e.error()).isEqualTo(CalculationError.IMPOSSIBLE_COMBINATION);
                        assertThat(e.error().category()).isEqualTo(CalculationError.Category.IMPOSSIBLE);
                        assertThat(e.fields()).contains("code_mapping", "bit_depth");
                    });
        }

        @Test
        void maxCodeWithOneBitOfRectifiedPutsFullScreenAtCodeOne() {
            QuantizationResult r = compute(QuantizationInput.builder(1).codeMapping(CodeMapping.MAX_CODE)
                    .digitizedSignal(DigitizedSignal.RECTIFIED).build());

            assertThat(r.lsbPercentFsh()).isEqualTo(100.0);
        }

        @Test
        void signalHeightTheConverterCouldNotReachIsImpossible() {
            // -6 dB soft gain: 80 %FSH displayed needs 159.6 %FSH at the converter
            assertImpossible(QuantizationInput.builder(8).digitalGainDb(-6.0).signalHeightPercentFsh(80.0).build(),
                    "signal_height_percent_fsh");
            assertThatThrownBy(() -> compute(QuantizationInput.builder(8).digitalGainDb(-6.0)
                    .signalHeightPercentFsh(80.0).build())).isInstanceOfSatisfying(CalculationException.class,
                            e -> assertThat(e.fields()).containsExactly("signal_height_percent_fsh", "digital_gain_db"));
        }

        @Test
        void referenceHeightTheConverterCouldNotReachIsImpossible() {
            assertImpossible(QuantizationInput.builder(8).digitalGainDb(-6.0).referenceHeightPercentFsh(80.0)
                    .evaluationLevelDb(-20.0).build(),
                    "reference_height_percent_fsh");
        }

        @Test
        void evaluationHeightTheConverterCouldNotReachIsImpossible() {
            // 80 %FSH at +6 dB is 159.6 %FSH with no gain
            assertImpossible(QuantizationInput.builder(8).referenceHeightPercentFsh(80.0).evaluationLevelDb(6.0)
                    .build(), "evaluation_level_db");
            assertThatThrownBy(() -> compute(QuantizationInput.builder(8).referenceHeightPercentFsh(80.0)
                    .evaluationLevelDb(6.0).build()))
                    .isInstanceOfSatisfying(CalculationException.class, e -> assertThat(e.fields())
                            .containsExactly("evaluation_level_db", "reference_height_percent_fsh"));
        }

        @Test
        void referenceHeightWithoutEvaluationLevelIsNotApplicable() {
            assertNotApplicable(QuantizationInput.builder(8).referenceHeightPercentFsh(80.0).build(),
                    "reference_height_percent_fsh");
        }

        @Test
        void evaluationLevelWithoutReferenceHeightIsNotApplicable() {
            assertNotApplicable(QuantizationInput.builder(8).evaluationLevelDb(-6.0).build(), "evaluation_level_db");
        }

        @ParameterizedTest(name = "bit_depth {0}")
        @ValueSource(ints = {0, -1, 33, 64})
        void bitDepthOutsideOneToThirtyTwoIsInvalid(int bitDepth) {
            assertInvalid(QuantizationInput.of(bitDepth), "bit_depth");
        }

        @Test
        void nonPositiveOrNanInputsAreInvalid() {
            assertInvalid(QuantizationInput.builder(8).signalHeightPercentFsh(0.0)
                    .build(), "signal_height_percent_fsh");
            assertInvalid(QuantizationInput.builder(8).signalHeightPercentFsh(Double.NaN).build(),
                    "signal_height_percent_fsh");
            assertInvalid(QuantizationInput.builder(8).amplitudeToleranceDb(-1.0).build(), "amplitude_tolerance_db");
            assertInvalid(QuantizationInput.builder(8).digitalGainDb(Double.NaN).build(), "digital_gain_db");
            assertInvalid(QuantizationInput.builder(8).referenceHeightPercentFsh(80.0)
                    .evaluationLevelDb(Double.POSITIVE_INFINITY).build(),
                    "evaluation_level_db");
            assertInvalid(QuantizationInput.builder(8).averaging(0).build(), "averaging");
        }

        private void assertImpossible(QuantizationInput in, String firstField) {
            assertThatThrownBy(() -> compute(in)).isInstanceOfSatisfying(CalculationException.class, e -> {
                assertThat(e.error()).isEqualTo(CalculationError.IMPOSSIBLE_COMBINATION);
                assertThat(e.fields()).first().isEqualTo(firstField);
                assertThat(e.getMessage()).contains(firstField);
            });
        }

        private void assertNotApplicable(QuantizationInput in, String field) {
            assertThatThrownBy(() -> compute(in)).isInstanceOfSatisfying(CalculationException.class, e -> {
                assertThat(e.error()).isEqualTo(CalculationError.NOT_APPLICABLE);
                assertThat(e.error().category()).isEqualTo(CalculationError.Category.INVALID_INPUT);
                assertThat(e.fields()).containsExactly(field);
            });
        }

        private void assertInvalid(QuantizationInput in, String field) {
            assertThatThrownBy(() -> compute(in)).isInstanceOfSatisfying(CalculationException.class, e -> {
                assertThat(e.error()).isEqualTo(CalculationError.INVALID_INPUT);
                assertThat(e.fields()).containsExactly(field);
            });
        }
    }
}
