package utdigit.core.quantization;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** The ideal SQNR of a full-scale sine against a published rule and against a brute-force quantizer. */
class IdealSqnrTest {

    /** MT-001 rounds 20 log10(2) = 6.0206 dB to 6.02 dB per bit. */
    static final double MT001_ROUNDING_DB_PER_BIT = 0.0006;
    /** MT-001 rounds 10 log10(1.5) = 1.7609 dB to 1.76 dB. */
    static final double MT001_ROUNDING_OFFSET_DB = 0.001;
    static final double ALLOWED_ERROR_DB = 1e-9;

    /** Number of samples of the numerical check; the phases it visits are equidistributed. */
    static final int SAMPLES = 1_000_000;
    /**
     * Cycles per sample, (sqrt(5) - 1)/2 / 37: irrational, so the samples never repeat a phase
     * (a frequency close to a fraction with a small denominator, such as 10/81, visits only a few
     * phases and gives a meaningless SQNR).
     */
    static final double CYCLES_PER_SAMPLE = (Math.sqrt(5.0) - 1.0) / 2.0 / 37.0;

    @ParameterizedTest(name = "{0} bits")
    @ValueSource(ints = {1, 2, 4, 6, 8, 10, 12, 14, 16, 20, 24, 32})
    @DisplayName("ideal SQNR is 6.02 N + 1.76 dB (W. Kester, Analog Devices MT-001), within MT-001's rounding of the constants")
    void idealSqnrMatchesKesterRule(int bitDepth) {
        double kester = 6.02 * bitDepth + 1.76;

        double sqnr = QuantizationCalculator.compute(QuantizationInput.of(bitDepth)).idealSqnrDb().orElseThrow();

        assertThat(sqnr).isCloseTo(kester,
                within(MT001_ROUNDING_DB_PER_BIT * bitDepth + MT001_ROUNDING_OFFSET_DB));
    }

    @ParameterizedTest(name = "{0} bits")
    @ValueSource(ints = {8, 12, 16})
    @DisplayName("a full-scale sine quantized by a mid-rise rounding quantizer (brute force in this test) sits within 0.2 dB below the formula")
    void numericallyQuantizedFullScaleSineSitsSlightlyBelowTheFormula(int bitDepth) {
        NumericalSqnr numerical = NumericalSqnr.of(bitDepth);

        double formula = sqnr(bitDepth);

        // Why below: the formula assumes the error is uniform on +/- q/2 in every code cell. A sine
        // dwells near its peaks (the arcsine density of its values is largest at +/- A), and the
        // outermost cells of a mid-rise quantizer with a finite code range end exactly at +/- A:
        // there the sine's values crowd toward the cell's outer edge, so the error crowds toward
        // q/2 and its mean square exceeds q^2/12. Clipping of the top code adds nothing measurable
        // (the sine reaches +/- A only at isolated instants). The excess falls as sqrt(q): about
        // 0.14 dB at 8 bits, 0.035 dB at 12, 0.009 dB at 16 (src/docs/methods.md: 0.01-0.14 dB).
        assertThat(numerical.sqnrDb()).isLessThan(formula);
        assertThat(numerical.sqnrDb()).isCloseTo(formula, within(0.2));
        // the explanation holds: the interior cells are uniform, the outermost ones are not
        assertThat(numerical.interiorMeanSquareOverUniform()).isCloseTo(1.0, within(0.01));
        assertThat(numerical.outermostMeanSquareOverUniform()).isGreaterThan(1.2);
    }

    @Test
    void idealSqnrDoesNotDependOnTheCodeMapping() {
        QuantizationInput in = QuantizationInput.of(8);
        assertThat(QuantizationCalculator.compute(in.toBuilder().codeMapping(CodeMapping.MAX_CODE)
                .build()).idealSqnrDb())
                .isEqualTo(QuantizationCalculator.compute(in).idealSqnrDb());
    }

    @Test
    void idealSqnrOfRectifiedDataIsNullWithAWarning() {
        QuantizationResult r = QuantizationCalculator.compute(
                QuantizationInput.builder(8).digitizedSignal(DigitizedSignal.RECTIFIED).build());

        assertThat(r.idealSqnrDb()).isEmpty();
        assertThat(r.hasWarning(QuantizationCalculator.IDEAL_SQNR_NOT_APPLICABLE)).isTrue();
    }

    @Test
    void eachBitAddsTwentyLogTwo() {
        assertThat(sqnr(13) - sqnr(12)).isCloseTo(20 * Math.log10(2), within(ALLOWED_ERROR_DB));
    }

    private static double sqnr(int bitDepth) {
        return QuantizationCalculator.compute(QuantizationInput.of(bitDepth)).idealSqnrDb().orElseThrow();
    }

    /**
     * Brute force: x_k = A sin(2 pi f k + 0.3) with A = 1 (full scale), quantized by a mid-rise
     * rounding quantizer with q = 2A/2^N: code = floor(x/q) clipped to -2^(N-1)..2^(N-1) - 1,
     * reading q (code + 1/2). SQNR = 10 log10((A^2/2) / mean((reading - x)^2)).
     */
    record NumericalSqnr(double sqnrDb, double interiorMeanSquareOverUniform, double outermostMeanSquareOverUniform) {
        static NumericalSqnr of(int bitDepth) {
            double amplitude = 1.0;
            double q = 2.0 * amplitude / Math.pow(2, bitDepth);
            long lowestCode = -(1L << (bitDepth - 1));
            long highestCode = (1L << (bitDepth - 1)) - 1;
            double sumAll = 0;
            double sumInterior = 0;
            double sumOutermost = 0;
            long interior = 0;
            long outermost = 0;
            for (int k = 0; k < SAMPLES; k++) {
                double x = amplitude * Math.sin(2 * Math.PI * CYCLES_PER_SAMPLE * k + 0.3);
                long code = Math.max(lowestCode, Math.min(highestCode, (long) Math.floor(x / q)));
                double error = q * (code + 0.5) - x;
                double squared = error * error;
                sumAll += squared;
                if (code == lowestCode || code == highestCode) {
                    sumOutermost += squared;
                    outermost++;
                } else {
                    sumInterior += squared;
                    interior++;
                }
            }
            double uniform = q * q / 12;
            double noise = sumAll / SAMPLES;
            return new NumericalSqnr(10 * Math.log10(amplitude * amplitude / 2 / noise),
                    sumInterior / interior / uniform, sumOutermost / outermost / uniform);
        }
    }
}
