package utdigit.core.dac;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import utdigit.core.quantization.CodeMapping;
import utdigit.core.quantization.DigitizedSignal;
import utdigit.core.quantization.Quantizer;

class DacQuantizationCalculatorTest {
    /** 8-bit RF, FSR 200 %FSH over 2^8 codes: LSB = 0.78125 %FSH (IEEE Std 1241, LSB = FSR / 2^N, from memory). */
    private static final double LSB = 200.0 / 256.0;

    /** Worst reading below h of a rounding quantizer, +/- LSB/2 (W. Kester, Analog Devices MT-001), in the test. */
    private static double underDb(double h, double lsb) {
        return 20 * Math.log10((h - lsb / 2) / h);
    }

    @Test
    void thirtyDbOfDacAtEightBitsThreeSetUps() {
        // Our own case: highest DAC point at 80 %FSH, the curve spans 30 dB, tolerance 1 dB.
        DacQuantizationResult r = DacQuantizationCalculator.compute(
                DacQuantizationInput.builder(8, 30.0, 80.0).amplitudeToleranceDb(1.0).build());
        double lowest = 80.0 * Math.pow(10, -30.0 / 20);
        assertThat(r.lsbPercentFsh()).isCloseTo(LSB, within(1e-15));
        assertThat(r.lowestReferenceHeightPercentFsh()).isCloseTo(lowest, within(1e-12));
        assertThat(r.uncorrectedErrorUnderDb().orElseThrow()).isCloseTo(underDb(lowest, LSB), within(1e-12));
        assertThat(r.analogTcgErrorUnderDb().orElseThrow()).isCloseTo(underDb(80.0, LSB), within(1e-12));
        // Gain after the converter scales the displayed LSB with the height: the same error as no correction.
        assertThat(r.digitalTcgLsbPercentFsh()).isCloseTo(LSB * Math.pow(10, 30.0 / 20), within(1e-12));
        assertThat(r.digitalTcgErrorUnderDb().orElseThrow()).isCloseTo(underDb(lowest, LSB), within(1e-12));
        // h_min = (LSB/2) / (1 - 10^(-1/20)) = 3.595 %FSH: 2.53 %FSH falls short, 80 %FSH does not.
        double hMin = LSB / 2 / (1 - Math.pow(10, -1.0 / 20));
        assertThat(r.minimumHeightPercentFsh()).isCloseTo(hMin, within(1e-12));
        assertThat(r.uncorrectedWithinTolerance()).isFalse();
        assertThat(r.analogTcgWithinTolerance()).isTrue();
        assertThat(r.digitalTcgWithinTolerance()).isFalse();
        assertThat(r.maxUncorrectedSpanDb().orElseThrow()).isCloseTo(20 * Math.log10(80.0 / hMin), within(1e-12));
    }

    /** Bisection in the test on the span whose uncorrected lowest point errs by exactly the tolerance. */
    @Test
    void theLargestUncorrectedSpanAgreesWithABisectionOnTheSpan() {
        double lo = 0.01;
        double hi = 60;
        for (int i = 0; i < 100; i++) {
            double mid = (lo + hi) / 2;
            double lowest = 80.0 * Math.pow(10, -mid / 20);
            if (-underDb(lowest, LSB) <= 0.5) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        DacQuantizationResult r = DacQuantizationCalculator.compute(
                DacQuantizationInput.builder(8, 10.0, 80.0).amplitudeToleranceDb(0.5).build());
        assertThat(r.maxUncorrectedSpanDb().orElseThrow()).isCloseTo(lo, within(1e-9));
        assertThat(r.uncorrectedWithinTolerance()).isTrue();
    }

    @Test
    void aLowestPointBelowHalfAnLsbReadsAsZero() {
        // 4-bit RECTIFIED, MAX_CODE: LSB = 100 / 15 %FSH; 80 %FSH - 40 dB = 0.8 %FSH < LSB/2 = 3.33 %FSH.
        DacQuantizationResult r = DacQuantizationCalculator.compute(DacQuantizationInput.builder(4, 40.0, 80.0)
                .amplitudeToleranceDb(2.0)
                .digitizedSignal(DigitizedSignal.RECTIFIED)
                .quantizer(Quantizer.ROUNDING)
                .codeMapping(CodeMapping.MAX_CODE).build());
        assertThat(r.lsbPercentFsh()).isCloseTo(100.0 / 15, within(1e-12));
        assertThat(r.uncorrectedErrorUnderDb()).isEmpty();
        assertThat(r.digitalTcgErrorUnderDb()).isEmpty();
        assertThat(r.uncorrectedWithinTolerance()).isFalse();
        assertThat(r.hasWarning(DacQuantizationCalculator.READS_AS_ZERO)).isTrue();
    }
}
