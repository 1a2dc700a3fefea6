package utdigit.core.arrays;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import utdigit.core.common.CalculationError;
import utdigit.core.common.CalculationException;

class ArrayApertureCalculatorTest {

    /** Bisection in the test, with Math.sin, on the main lobe of (sin x / x)^2 = r: independent of the solver. */
    private static double bruteForceTwoWayConstant(double belowDb) {
        double r = Math.pow(10.0, -belowDb / 20.0);
        double lo = 1e-9;
        double hi = Math.PI;
        for (int i = 0; i < 200; i++) {
            double mid = (lo + hi) / 2;
            double s = Math.sin(mid) / mid;
            if (s * s > r) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return (lo + hi) / 2 / Math.PI;
    }

    @Test
    void twoWayConstantsMatchABruteForceBisectionOfTheSinc() {
        // Brute-force bisection in the test (200 halvings of (0, pi)).
        assertThat(RectangularDirectivity.twoWayConstant(6.0)).isCloseTo(bruteForceTwoWayConstant(6.0), within(1e-12));
        assertThat(RectangularDirectivity.twoWayConstant(20.0)).isCloseTo(bruteForceTwoWayConstant(20.0), within(1e-12));
        assertThat(RectangularDirectivity.twoWayConstant(-12.0)).isCloseTo(bruteForceTwoWayConstant(12.0), within(1e-12));
    }

    @Test
    void twoWaySixDbIsTheOneWayHalfPowerBeamwidthOfAUniformAperture() {
        // Array-theory textbook relation: the half-power (-3 dB one-way) full beamwidth of a uniform aperture
        // is 0.886 lambda / L (H. L. Van Trees, Optimum Array Processing, 2002, 2.4, from memory). Half power one-way
        // is sinc = 1/sqrt(2), i.e. sinc^2 = 1/2 two-way, 20 log10(2) = 6.0206 dB: k = 0.886 / 2 = 0.443 to the
        // digits quoted.
        assertThat(RectangularDirectivity.twoWayConstant(20 * Math.log10(2))).isCloseTo(0.886 / 2, within(0.0005));
        // First null of sin(x)/x at x = pi (definition of the sine's zero): k = 1.
        assertThat(Math.sin(Math.PI * RectangularDirectivity.firstNullConstant())).isCloseTo(0.0, within(1e-15));
    }

    @Test
    void nearFieldAndBeamSpreadOfAHandWorkedAperture() {
        // Our own case: 5 MHz in steel 5920 m/s, lambda = 5.92 / 5 = 1.184 mm; 16 elements at 0.6 mm: L = 9.6 mm.
        ArrayApertureResult r = ArrayApertureCalculator.compute(
                ArrayApertureInput.builder(5.0, 5920.0, 0.6).activeElements(16).elementLengthMm(10.0).build());
        double lambda = 1.184;
        assertThat(r.wavelengthMm()).isCloseTo(lambda, within(1e-12));
        assertThat(r.activeApertureMm()).isCloseTo(9.6, within(1e-12));
        // L^2 / (4 lambda) = 92.16 / 4.736 (common practice for the steering plane).
        assertThat(r.nearFieldLengthMm()).isCloseTo(92.16 / 4.736, within(1e-9));
        // sin(theta) = k lambda / L with k from the brute-force bisection.
        assertThat(r.beamSpread6dbDeg()).hasValueSatisfying(a -> assertThat(a).isCloseTo(
                Math.toDegrees(Math.asin(bruteForceTwoWayConstant(6.0) * lambda / 9.6)), within(1e-9)));
        assertThat(r.beamSpreadNullDeg()).hasValueSatisfying(a -> assertThat(a).isCloseTo(
                Math.toDegrees(Math.asin(lambda / 9.6)), within(1e-9)));
        assertThat(r.passiveNearFieldLengthMm()).isCloseTo(100.0 / 4.736, within(1e-9));
    }

    @Test
    void anApertureShorterThanTheWavelengthHasNoBeamSpreadAngle() {
        // 1 MHz in steel: lambda = 5.92 mm; aperture 2 x 1 mm = 2 mm: k lambda / L > 1 for every level.
        ArrayApertureResult r = ArrayApertureCalculator.compute(
                ArrayApertureInput.builder(1.0, 5920.0, 1.0).activeElements(2).build());
        assertThat(r.beamSpread6dbDeg()).isEmpty();
        assertThat(r.beamSpreadNullDeg()).isEmpty();
        assertThat(r.hasWarning(ArrayApertureCalculator.NO_BEAM_SPREAD_6DB)).isTrue();
    }

    /**
     * Brute-force array factor of N point elements steered to theta_s (array theory: AF(theta) =
     * |sum_n exp(i 2 pi n p (sin theta - sin theta_s) / lambda)|), scanned over -90..90 deg in the test:
     * the largest value outside the main lobe, relative to N.
     */
    private static double largestSecondaryPeak(double pitchMm, double lambdaMm, double steeringDeg, int n) {
        double sinS = Math.sin(Math.toRadians(steeringDeg));
        double best = 0;
        for (int i = 0; i <= 180_000; i++) {
            double theta = Math.toRadians(-90.0 + i * 0.001);
            double u = Math.sin(theta) - sinS;
            if (Math.abs(u) < 2 * lambdaMm / (n * pitchMm)) {
                continue; // the main lobe, out to its first nulls
            }
            double re = 0;
            double im = 0;
            for (int k = 0; k < n; k++) {
                double phase = 2 * Math.PI * k * pitchMm * u / lambdaMm;
                re += Math.cos(phase);
                im += Math.sin(phase);
            }
            best = Math.max(best, Math.hypot(re, im) / n);
        }
        return best;
    }

    @Test
    void largestGratingLobeFreePitchAgreesWithABruteForceArrayFactor() {
        // 5 MHz, 5920 m/s, steering up to 45 deg: the largest pitch is lambda / (1 + sin 45).
        double lambda = 1.184;
        ArrayApertureResult r = ArrayApertureCalculator.compute(
                ArrayApertureInput.builder(5.0, 5920.0, 0.6).maxSteeringAngleDeg(45.0).build());
        double maxPitch = lambda / (1 + Math.sin(Math.toRadians(45)));
        assertThat(r.maxGratingLobeFreePitchMm()).isCloseTo(maxPitch, within(1e-12));
        assertThat(r.gratingLobeFree()).isTrue();
        // Brute-force array factor of 32 elements: 10 % below the pitch no secondary peak reaches half the main
        // lobe (the side lobes of a uniform array stay near -13 dB, 0.22); 10 % above a full-height grating lobe
        // enters the scan.
        assertThat(largestSecondaryPeak(0.9 * maxPitch, lambda, 45.0, 32)).isLessThan(0.5);
        assertThat(largestSecondaryPeak(1.1 * maxPitch, lambda, 45.0, 32)).isGreaterThan(0.99);
        ArrayApertureResult coarse = ArrayApertureCalculator.compute(
                ArrayApertureInput.builder(5.0, 5920.0, 1.1 * maxPitch).maxSteeringAngleDeg(45.0).build());
        assertThat(coarse.gratingLobeFree()).isFalse();
        assertThat(coarse.hasWarning(ArrayApertureCalculator.GRATING_LOBE)).isTrue();
    }

    @Test
    void bothApertureFormsAreRefusedAndAnApertureBelowOnePitchIsImpossible() {
        assertThatThrownBy(() -> ArrayApertureCalculator.compute(
                ArrayApertureInput.builder(5.0, 5920.0, 0.6).activeElements(16).activeApertureMm(9.6).build()))
                .isInstanceOfSatisfying(CalculationException.class,
                        e -> assertThat(e.error()).isEqualTo(CalculationError.NOT_APPLICABLE));
        assertThatThrownBy(() -> ArrayApertureCalculator.compute(
                ArrayApertureInput.builder(5.0, 5920.0, 0.6).activeApertureMm(0.5).build()))
                .isInstanceOfSatisfying(CalculationException.class,
                        e -> assertThat(e.error()).isEqualTo(CalculationError.IMPOSSIBLE_COMBINATION));
    }
}
