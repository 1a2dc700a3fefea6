package utdigit.core.timing;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import utdigit.core.common.CalculationError;
import utdigit.core.common.CalculationException;

class TofdSetupCalculatorTest {
    /** Our own set-up: PCS 2S = 60 mm (S = 30), wall 40 mm, 6000 m/s = 6 mm/us. */
    private static final TofdSetupInput SETUP = TofdSetupInput.of(6000.0, 60.0, 40.0);

    /** d(t, S) = sqrt((v t / 2)^2 - S^2) (Charlesworth & Temple, 2nd ed., 2.3.4), written out in the test. */
    private static double depth(double tUs, double s) {
        double r = 6.0 * tUs / 2;
        return Math.sqrt(r * r - s * s);
    }

    @Test
    void arrivalTimesOfAHandWorkedSetUp() {
        TofdSetupResult r = TofdSetupCalculator.compute(SETUP.toBuilder().pulseDurationUs(0.5).build());
        // Lateral wave 2S / v = 60 / 6 = 10 us; back wall 2 sqrt(30^2 + 40^2) / 6 = 100 / 6 us
        // (Charlesworth & Temple 2.3.4, a 3-4-5 triangle).
        assertThat(r.lateralWaveTimeUs()).isCloseTo(10.0, within(1e-12));
        assertThat(r.backwallTimeUs()).isCloseTo(100.0 / 6.0, within(1e-12));
        assertThat(r.requiredGateStartUs()).isCloseTo(9.5, within(1e-12));
        assertThat(r.requiredGateEndUs()).isCloseTo(100.0 / 6.0 + 0.5, within(1e-12));
    }

    @Test
    void theGateMustSpanLateralWaveToBackWallWithThePulseDurationEachSide() {
        TofdSetupResult ok = TofdSetupCalculator.compute(SETUP.toBuilder().pulseDurationUs(0.5).gateStartUs(9.0)
                .gateEndUs(17.5).build());
        assertThat(ok.gateSpansWall()).isTrue();
        assertThat(ok.gateStartMarginUs()).isCloseTo(1.0, within(1e-12));
        TofdSetupResult late = TofdSetupCalculator.compute(SETUP.toBuilder().pulseDurationUs(0.5).gateStartUs(9.8)
                .gateEndUs(17.5).build());
        assertThat(late.gateSpansWall()).isFalse();
        assertThat(late.hasWarning(TofdSetupCalculator.GATE_MISSES_WALL)).isTrue();
        assertThatThrownBy(() -> TofdSetupCalculator.compute(SETUP.toBuilder().gateStartUs(17.0).gateEndUs(9.0)
                .build()))
                .isInstanceOfSatisfying(CalculationException.class,
                        e -> assertThat(e.error()).isEqualTo(CalculationError.IMPOSSIBLE_COMBINATION));
    }

    @Test
    void depthFromAMeasuredTime() {
        // t = 2 x 50 / 6 us gives back the 40 mm of the 3-4-5 triangle; 2 sqrt(30^2 + 20^2) / 6 gives 20 mm.
        TofdSetupResult r = TofdSetupCalculator.compute(SETUP.toBuilder().measuredTimeUs(2 * Math.sqrt(1300) / 6)
                .build());
        assertThat(r.depthFromTimeMm()).isCloseTo(20.0, within(1e-9));
        assertThatThrownBy(() -> TofdSetupCalculator.compute(SETUP.toBuilder().measuredTimeUs(9.0).build()))
                .isInstanceOfSatisfying(CalculationException.class,
                        e -> assertThat(e.fields()).containsExactly("measured_time_us"));
    }

    @Test
    void uncertaintyComponentsMatchNumericalSensitivityCoefficients() {
        // GUM (JCGM 100:2008) 5.1.3: sensitivity coefficients by central differences of d(t, S) in the test
        // (step 1e-6: their truncation and rounding stay below 1e-7 mm here).
        double d = 20.0;
        double t = 2 * Math.sqrt(900 + d * d) / 6;
        double h = 1e-6;
        double ddt = (depth(t + h, 30) - depth(t - h, 30)) / (2 * h);
        double dds = (depth(t, 30 + h) - depth(t, 30 - h)) / (2 * h);
        // fs 100 MHz from the trigger: u_t = 10 ns / sqrt(12) (GUM 4.3.7); u(2S) = 0.5 mm, so u_S = 0.25 mm.
        double uT = 0.01 / Math.sqrt(12);
        TofdSetupResult r = TofdSetupCalculator.compute(SETUP.toBuilder().depthMm(d)
                .samplingFrequencyMhz(100.0).probeCentreSeparationUncertaintyMm(0.5).build());
        assertThat(r.timingDepthUncertaintyMm().orElseThrow()).isCloseTo(Math.abs(ddt) * uT, within(1e-7));
        assertThat(r.separationDepthUncertaintyMm().orElseThrow()).isCloseTo(Math.abs(dds) * 0.25, within(1e-7));
        double combined = Math.hypot(ddt * uT, dds * 0.25);
        assertThat(r.combinedDepthUncertaintyMm().orElseThrow()).isCloseTo(combined, within(1e-7));
        assertThat(r.expandedDepthUncertaintyMm().orElseThrow()).isCloseTo(2 * combined, within(1e-7));
        assertThat(r.timeOfFlightUs()).isCloseTo(t, within(1e-12));
    }

    @Test
    void combinedUncertaintyAgreesWithAMonteCarloPropagation() {
        // JCGM 101:2008 (propagation of distributions by Monte Carlo), in the test: t rectangular over one sample
        // difference from the lateral wave (two rectangular instants, dt = 0.05 us), 2S normal with u = 0.5 mm (u_S = 0.25 mm).
        // At 15 mm the separation term dominates; S stays below the one-leg path 33.5 mm out past 10 sigma.
        SplittableRandom random = new SplittableRandom(20261204L);
        double d = 15.0;
        double t = 2 * Math.sqrt(900 + d * d) / 6;
        int n = 400_000;
        double sum = 0;
        double sumSq = 0;
        for (int i = 0; i < n; i++) {
            double tt = t + 0.05 * (random.nextDouble() - 0.5) - 0.05 * (random.nextDouble() - 0.5);
            double s = 30 + 0.25 * random.nextGaussian();
            double di = depth(tt, s);
            sum += di;
            sumSq += di * di;
        }
        double mean = sum / n;
        double sd = Math.sqrt(sumSq / n - mean * mean);
        TofdSetupResult r = TofdSetupCalculator.compute(SETUP.toBuilder().depthMm(d)
                .samplingFrequencyMhz(20.0).timeReference(TimeReference.LATERAL_WAVE)
                .probeCentreSeparationUncertaintyMm(0.5).build());
        assertThat(r.timingStandardUncertaintyNs()).isCloseTo(50.0 / Math.sqrt(6), within(1e-9));
        // Linearisation against the distribution's standard deviation: within 3 %.
        assertThat(r.combinedDepthUncertaintyMm().orElseThrow()).isCloseTo(sd, within(0.03 * sd));
    }

    @Test
    void aDepthBelowTheBackWallIsImpossibleAndBothDepthFormsAreRefused() {
        assertThatThrownBy(() -> TofdSetupCalculator.compute(SETUP.toBuilder().depthMm(41.0).build()))
                .isInstanceOfSatisfying(CalculationException.class,
                        e -> assertThat(e.error()).isEqualTo(CalculationError.IMPOSSIBLE_COMBINATION));
        assertThatThrownBy(() -> TofdSetupCalculator.compute(SETUP.toBuilder().depthMm(10.0).measuredTimeUs(12.0)
                .build()))
                .isInstanceOfSatisfying(CalculationException.class,
                        e -> assertThat(e.error()).isEqualTo(CalculationError.NOT_APPLICABLE));
    }

    @Test
    void aTipAtTheSurfaceHasNoFiniteDepthUncertainty() {
        TofdSetupResult r = TofdSetupCalculator.compute(SETUP.toBuilder().measuredTimeUs(10.0)
                .samplingFrequencyMhz(100.0).build());
        assertThat(r.depthFromTimeMm()).isEqualTo(0.0);
        assertThat(r.timingDepthUncertaintyMm()).isEmpty();
        assertThat(r.hasWarning(TofdSetupCalculator.TIP_AT_SURFACE)).isTrue();
    }
}
