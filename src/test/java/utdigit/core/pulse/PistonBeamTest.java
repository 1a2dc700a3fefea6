package utdigit.core.pulse;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;
import org.apache.commons.math3.special.BesselJ;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class PistonBeamTest {

    /** The numerical maximum is located to about 1e-6 mm (the peak is flat); allow 1e-5 mm. */
    static final double ALLOWED_MAXIMUM_POSITION_ERROR_MM = 1e-5;
    static final double ALLOWED_ROUNDING_ERROR_MM = 1e-12;

    @Test
    @DisplayName("near field, hand-worked: D 10 mm, 5 MHz in steel (lambda 5.92/5 = 1.184 mm): N = 100/4.736 = 21.11 mm")
    void nearFieldOfTenMillimetreElementAtFiveMegahertz() {
        assertThat(PistonBeam.nearFieldLengthMm(10.0, 1.184)).isCloseTo(100.0 / 4.736, within(ALLOWED_ROUNDING_ERROR_MM));
        assertThat(PistonBeam.nearFieldLengthMm(10.0, 1.184)).isCloseTo(21.11, within(0.005));
    }

    @Test
    @DisplayName("near field, hand-worked: D 0.5 in = 12.7 mm, 2.25 MHz in steel (lambda 2.631 mm): N = 161.29/10.524 = 15.33 mm")
    void nearFieldOfHalfInchElementAtTwoPointTwoFiveMegahertz() {
        double wavelengthMm = 5.92 / 2.25;
        assertThat(PistonBeam.nearFieldLengthMm(12.7, wavelengthMm)).isCloseTo(15.33, within(0.005));
    }

    /**
     * The on-axis pressure amplitude of a baffled circular piston of radius a is proportional to
     * |sin(pi/lambda (sqrt(z^2 + a^2) - z))| (Kinsler et al., Fundamentals of Acoustics, from
     * memory). Its last maximum is found here numerically: a scan of the pressure, then Commons Math
     * BrentOptimizer on the last local maximum.
     */
    @ParameterizedTest(name = "D {0} mm, lambda {1} mm")
    @CsvSource({"10.0, 1.184", "12.7, 2.6311", "3.0, 1.5", "1.2, 1.0", "25.0, 0.5", "6.35, 0.2964"})
    @DisplayName("exact near field is the last maximum of the on-axis pressure |sin(pi/lambda (sqrt(z^2 + a^2) - z))| (numerical)")
    void exactNearFieldIsLastOnAxisPressureMaximum(double diameterMm, double wavelengthMm) {
        double a = diameterMm / 2.0;
        UnivariateFunction pressure = z -> Math.abs(Math.sin(Math.PI / wavelengthMm * (Math.sqrt(z * z + a * a) - z)));
        double stepMm = wavelengthMm / 400.0;
        double endMm = 3.0 * PistonBeam.nearFieldLengthMm(diameterMm, wavelengthMm) + wavelengthMm;
        double lastMaximumMm = Double.NaN;
        for (double z = stepMm; z < endMm; z += stepMm) {
            double p = pressure.value(z);
            if (p > pressure.value(z - stepMm) && p >= pressure.value(z + stepMm)) {
                lastMaximumMm = z;
            }
        }
        assertThat(lastMaximumMm).isFinite();
        double refinedMm = new BrentOptimizer(1e-14, 1e-14).optimize(
                new MaxEval(1000),
                new UnivariateObjectiveFunction(pressure),
                GoalType.MAXIMIZE,
                new SearchInterval(lastMaximumMm - stepMm, lastMaximumMm + stepMm)).getPoint();

        assertThat(PistonBeam.exactNearFieldLengthMm(diameterMm, wavelengthMm).orElseThrow())
                .isCloseTo(refinedMm, within(ALLOWED_MAXIMUM_POSITION_ERROR_MM));
    }

    @Test
    @DisplayName("no exact near field when D <= lambda: the on-axis pressure then falls from the face on (at D = lambda "
            + "the formula's 0 is the face itself, not a maximum in front of it)")
    void noExactNearFieldForElementSmallerThanWavelength() {
        assertThat(PistonBeam.exactNearFieldLengthMm(0.9, 1.0)).isEmpty();
        assertThat(PistonBeam.exactNearFieldLengthMm(1.0, 1.0)).isEmpty();
        // |p(z)| ~ |sin(pi/lambda (sqrt(z^2 + a^2) - z))| with a = D/2 = lambda/2: the argument falls from pi/2 at
        // the face, so the pressure only falls in front of the element (no maximum at z > 0).
        double lambda = 1.0;
        double a = 0.5;
        double previous = Math.abs(Math.sin(Math.PI / lambda * a));
        for (int i = 1; i <= 1000; i++) {
            double z = i * 0.01;
            double p = Math.abs(Math.sin(Math.PI / lambda * (Math.sqrt(z * z + a * a) - z)));
            assertThat(p).isLessThan(previous);
            previous = p;
        }
    }

    @Test
    @DisplayName("exact near field approaches D^2/(4 lambda) for large D/lambda, lower by lambda/4")
    void exactNearFieldIsLowerByQuarterWavelength() {
        double n = PistonBeam.nearFieldLengthMm(20.0, 0.5);
        assertThat(PistonBeam.exactNearFieldLengthMm(20.0, 0.5).orElseThrow()).isCloseTo(n - 0.5 / 4, within(1e-12));
    }

    @Test
    @DisplayName("near field in the part, hand-worked: 21.11 mm less 10 mm of acrylic at 2730 m/s counted as 10 x 2730/5920 = 4.61 mm of steel")
    void nearFieldInPartSubtractsEquivalentWedgePath() {
        double n = 100.0 / 4.736;
        assertThat(PistonBeam.nearFieldInPartMm(n, 10.0, 2730.0, 5920.0))
                .isCloseTo(n - 10.0 * 2730.0 / 5920.0, within(ALLOWED_ROUNDING_ERROR_MM));
        assertThat(PistonBeam.nearFieldInPartMm(n, 10.0, 2730.0, 5920.0)).isCloseTo(16.50, within(0.005));
        assertThat(PistonBeam.nearFieldInPartMm(n, 50.0, 2730.0, 5920.0)).isNegative();
    }

    /**
     * At the edge of the -6 dB beam diameter, the direction seen from the element is
     * theta = atan(r / z); there the pulse-echo directivity, written here from BesselJ, is -6 dB.
     */
    @ParameterizedTest(name = "D {0} mm, lambda {1} mm, z {2} mm")
    @CsvSource({"10.0, 1.184, 60.0", "12.7, 2.6311, 40.0", "6.0, 0.5, 200.0"})
    @DisplayName("at the edge of the -6 dB beam diameter the pulse-echo directivity is 10^(-6/20) (Commons Math BesselJ)")
    void beamDiameterEdgeIsAtTheSixDbLevel(double diameterMm, double wavelengthMm, double distanceMm) {
        double halfAngleDeg = PistonDirectivity.halfAngleDeg(
                PistonDirectivity.twoWayConstant(-6.0), wavelengthMm, diameterMm).orElseThrow();
        double radiusMm = PistonBeam.beamDiameterMm(distanceMm, halfAngleDeg) / 2.0;
        double theta = Math.atan(radiusMm / distanceMm);
        double x = Math.PI * diameterMm * Math.sin(theta) / wavelengthMm;
        double d = 2.0 * BesselJ.value(1, x) / x;
        assertThat(d * d).isCloseTo(Math.pow(10.0, -6.0 / 20.0), within(1e-12));
    }
}
