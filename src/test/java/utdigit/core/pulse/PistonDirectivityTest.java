package utdigit.core.pulse;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.apache.commons.math3.special.BesselJ;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import utdigit.core.common.CalculationException;

/**
 * Beam-spread constants of the circular piston against Apache Commons Math BesselJ evaluated here
 * directly: D(x) = 2 J1(x)/x, x = pi k.
 */
class PistonDirectivityTest {

    /** The defining equation holds to this, in amplitude ratio. */
    static final double ALLOWED_LEVEL_ERROR = 1e-12;
    /** Tolerance of the constants recalled from memory (four decimals). */
    static final double ALLOWED_FROM_MEMORY_ERROR = 1e-3;

    /** The piston's directivity, written here from BesselJ: 2 J1(pi k) / (pi k). */
    static double directivityOfConstant(double k) {
        double x = Math.PI * k;
        return 2.0 * BesselJ.value(1, x) / x;
    }

    static double ratioOfLevel(double levelDb) {
        return Math.pow(10.0, -Math.abs(levelDb) / 20.0);
    }

    @Test
    @DisplayName("the pulse-echo -6 dB constant satisfies D(pi k)^2 = 10^(-6/20) (Commons Math BesselJ)")
    void twoWaySixDbConstantSolvesDirectivitySquared() {
        double k = PistonDirectivity.twoWayConstant(-6.0);
        double d = directivityOfConstant(k);
        assertThat(d * d).isCloseTo(ratioOfLevel(6), within(ALLOWED_LEVEL_ERROR));
    }

    @Test
    @DisplayName("the pulse-echo -20 dB constant satisfies D(pi k)^2 = 10^(-20/20) (Commons Math BesselJ)")
    void twoWayTwentyDbConstantSolvesDirectivitySquared() {
        double k = PistonDirectivity.twoWayConstant(-20.0);
        double d = directivityOfConstant(k);
        assertThat(d * d).isCloseTo(0.1, within(ALLOWED_LEVEL_ERROR));
    }

    @Test
    @DisplayName("the first-null constant is a zero of J1 (Commons Math BesselJ) and J1 has none before it")
    void firstNullConstantIsFirstZeroOfJ1() {
        double k = PistonDirectivity.firstNullConstant();
        assertThat(BesselJ.value(1, Math.PI * k)).isCloseTo(0.0, within(ALLOWED_LEVEL_ERROR));
        for (double x = 1e-3; x < Math.PI * k - 1e-3; x += 1e-3) {
            assertThat(BesselJ.value(1, x)).as("J1(%s)", x).isPositive();
        }
    }

    @Test
    @DisplayName("cross-check, from memory: two-way -6 dB k = 0.5137, two-way -20 dB k = 0.8694, first null k = 1.2197 (j1,1 = 3.8317)")
    void constantsAgreeWithValuesFromMemory() {
        assertThat(PistonDirectivity.twoWayConstant(-6.0)).isCloseTo(0.5137, within(ALLOWED_FROM_MEMORY_ERROR));
        assertThat(PistonDirectivity.twoWayConstant(-20.0)).isCloseTo(0.8694, within(ALLOWED_FROM_MEMORY_ERROR));
        assertThat(PistonDirectivity.firstNullConstant()).isCloseTo(1.2197, within(ALLOWED_FROM_MEMORY_ERROR));
        assertThat(PistonDirectivity.firstNullConstant() * Math.PI).isCloseTo(3.8317, within(ALLOWED_FROM_MEMORY_ERROR));
    }

    @ParameterizedTest(name = "{0} dB")
    @ValueSource(doubles = {-0.5, -1, -3, -6, -10, -12, -20, -26, -40, -60, -80})
    @DisplayName("any level: the two-way constant solves D(pi k)^2 = level and the one-way constant D(pi k) = level, on the main lobe")
    void constantsSolveTheirEquationOnTheMainLobe(double levelDb) {
        double twoWay = PistonDirectivity.twoWayConstant(levelDb);
        double oneWay = PistonDirectivity.oneWayConstant(levelDb);
        double d2 = directivityOfConstant(twoWay);
        assertThat(d2 * d2).isCloseTo(ratioOfLevel(levelDb), within(ALLOWED_LEVEL_ERROR));
        assertThat(directivityOfConstant(oneWay)).isCloseTo(ratioOfLevel(levelDb), within(ALLOWED_LEVEL_ERROR));
        assertThat(twoWay).isBetween(0.0, PistonDirectivity.firstNullConstant());
        assertThat(oneWay).isBetween(twoWay, PistonDirectivity.firstNullConstant());
    }

    @Test
    @DisplayName("two-way at L dB is one-way at L/2 dB (D^2 = r is D = sqrt r)")
    void twoWayIsOneWayAtHalfTheLevel() {
        assertThat(PistonDirectivity.twoWayConstant(-6.0))
                .isCloseTo(PistonDirectivity.oneWayConstant(-3.0), within(1e-13));
        assertThat(PistonDirectivity.twoWayConstant(-20.0))
                .isCloseTo(PistonDirectivity.oneWayConstant(-10.0), within(1e-13));
    }

    @Test
    @DisplayName("the sign of the level does not matter: -6 and 6 both mean 6 dB below the axis")
    void signOfLevelDoesNotMatter() {
        assertThat(PistonDirectivity.twoWayConstant(6.0)).isEqualTo(PistonDirectivity.twoWayConstant(-6.0));
        assertThat(PistonDirectivity.oneWayConstant(12.0)).isEqualTo(PistonDirectivity.oneWayConstant(-12.0));
    }

    @Test
    @DisplayName("the cached -6 dB constant equals the constant solved on demand at a level a hair away")
    void cachedConstantIsTheSolvedOne() {
        assertThat(PistonDirectivity.twoWayConstant(-6.0))
                .isCloseTo(PistonDirectivity.twoWayConstant(-6.000000001), within(1e-9));
        assertThat(PistonDirectivity.twoWayConstant(-20.0))
                .isCloseTo(PistonDirectivity.twoWayConstant(-19.999999999), within(1e-9));
    }

    @Test
    @DisplayName("directivity is 1 on the axis and 2 J1(x)/x elsewhere (Commons Math BesselJ)")
    void directivityIsTwoJ1OverX() {
        assertThat(PistonDirectivity.directivity(0.0)).isEqualTo(1.0);
        assertThat(PistonDirectivity.directivity(2.0)).isCloseTo(BesselJ.value(1, 2.0), within(1e-15));
        // small-argument series 2 J1(x)/x = 1 - x^2/8 + x^4/192 (Abramowitz & Stegun 9.1.10, from memory)
        assertThat(PistonDirectivity.directivity(1e-3)).isCloseTo(1 - 1e-6 / 8 + 1e-12 / 192, within(1e-15));
    }

    @Test
    @DisplayName("the half-angle is asin(k lambda / D), empty when k lambda / D >= 1")
    void halfAngleIsArcsineOfConstantTimesWavelengthOverDiameter() {
        double k = PistonDirectivity.twoWayConstant(-6.0);
        assertThat(PistonDirectivity.halfAngleDeg(k, 1.184, 10.0).orElseThrow())
                .isCloseTo(Math.toDegrees(Math.asin(k * 1.184 / 10.0)), within(1e-12));
        assertThat(PistonDirectivity.halfAngleDeg(k, 1.0, k)).isEmpty();
        assertThat(PistonDirectivity.halfAngleDeg(k, 1.0, k * 0.99)).isEmpty();
        assertThat(PistonDirectivity.halfAngleDeg(k, 1.0, k * 1.01)).isPresent();
    }

    @Nested
    class RejectsImpossibleLevels {
        @Test
        void zeroLevelIsInvalid() {
            assertThatThrownBy(() -> PistonDirectivity.twoWayConstant(0.0)).isInstanceOf(CalculationException.class);
        }

        @Test
        void nanLevelIsInvalid() {
            assertThatThrownBy(() -> PistonDirectivity.oneWayConstant(Double.NaN))
                    .isInstanceOf(CalculationException.class);
        }

        @Test
        void negativeArgumentIsInvalid() {
            assertThatThrownBy(() -> PistonDirectivity.directivity(-1.0)).isInstanceOf(CalculationException.class);
        }
    }
}
