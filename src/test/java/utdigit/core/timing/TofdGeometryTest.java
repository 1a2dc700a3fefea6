package utdigit.core.timing;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.doubles;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;
import org.junit.jupiter.params.provider.CsvSource;
import utdigit.core.common.CalculationError;
import utdigit.core.common.CalculationException;

/**
 * The TOFD geometry against Charlesworth &amp; Temple, Engineering Applications of Ultrasonic
 * Time-of-Flight Diffraction, 2nd ed., 2.3.4 (read second-hand), with our own numbers worked by hand,
 * and against brute-force numerics written here.
 */
class TofdGeometryTest {

    static final double ALLOWED_ERROR_US = 1e-12;
    static final double ALLOWED_ERROR_MM = 1e-9;
    /** Bisection stops when its bracket is this narrow, mm. */
    static final double BISECTION_WIDTH_MM = 1e-13;

    /** Hand-worked example shared by several checks: v = 5900 m/s = 5.9 mm/us, PCS = 60 mm (S = 30 mm). */
    static final double V_MM_PER_US = 5.9;
    static final double S_MM = 30.0;

    /** The test's own t(d) = 2 sqrt(S^2 + d^2) / v (Charlesworth &amp; Temple 2.3.4, read second-hand). */
    static double timeUs(double halfSeparationMm, double depthMm, double velocityMmPerUs) {
        return 2.0 * Math.sqrt(halfSeparationMm * halfSeparationMm + depthMm * depthMm) / velocityMmPerUs;
    }

    /** Brute-force inversion of t(d) by bisection: the depth whose time is {@code timeUs}. */
    static double depthByBisectionMm(double halfSeparationMm, double timeUs, double velocityMmPerUs) {
        double lo = 0.0;
        double hi = velocityMmPerUs * timeUs / 2.0; // d < R = v t / 2
        while (hi - lo > BISECTION_WIDTH_MM) {
            double mid = 0.5 * (lo + hi);
            if (mid == lo || mid == hi) {
                break;
            }
            if (timeUs(halfSeparationMm, mid, velocityMmPerUs) < timeUs) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return 0.5 * (lo + hi);
    }

    @ParameterizedTest(name = "PCS {0} mm, depth {1} mm, path {2} mm at {3} m/s")
    @CsvFileSource(resources = "/reference/timing-tofd-geometry.csv")
    @DisplayName("arrival times and depths match the Charlesworth & Temple geometry on hand-worked Pythagorean triples")
    void timesAndDepthMatchHandWorkedTriples(double pcsMm, double depthMm, double onePathMm, double velocityMPerS) {
        double v = velocityMPerS / 1000.0;
        double s = pcsMm / 2.0;
        // t = 2R / v with R exact from the triple; lateral wave t_L = 2S / v = PCS / v.
        assertThat(TofdGeometry.timeOfFlightUs(s, depthMm, v)).isCloseTo(2.0 * onePathMm / v, within(ALLOWED_ERROR_US));
        assertThat(TofdGeometry.lateralWaveTimeUs(s, v)).isCloseTo(pcsMm / v, within(ALLOWED_ERROR_US));
        assertThat(TofdGeometry.depthMm(s, 2.0 * onePathMm / v, v)).isCloseTo(depthMm, within(ALLOWED_ERROR_MM));
    }

    @Test
    @DisplayName("depth step at 16 mm is the hand-worked forward difference, not the linearised slope")
    void depthStepAtSixteenMillimetresIsTheHandWorkedForwardDifference() {
        // Hand-worked (Charlesworth & Temple 2.3.4 geometry): S = 30, d = 16 -> R = 34 mm, t = 68/5.9 us.
        // dt = 0.01 us (100 MHz): R' = v (t + dt)/2 = 34 + 0.0295 = 34.0295 mm,
        // d' = sqrt(34.0295^2 - 30^2) = sqrt(1158.00687025 - 900) = sqrt(258.00687025) = 16.0625923 mm,
        // step 0.0625923 mm; the linearised dt v R/(2d) = 0.01 x 5.9 x 34 / 32 = 0.0626875 mm is larger.
        double expectedMm = Math.sqrt(34.0295 * 34.0295 - 900.0) - 16.0;
        double stepMm = TofdGeometry.depthStepMm(S_MM, 16.0, 0.01, V_MM_PER_US);
        assertThat(stepMm).isCloseTo(expectedMm, within(ALLOWED_ERROR_MM));
        assertThat(stepMm).isCloseTo(0.0625923, within(1e-7));
        assertThat(stepMm).isLessThan(0.01 * 5.9 * 34.0 / 32.0);
    }

    @ParameterizedTest(name = "S {0} mm, d {1} mm, dt {2} us")
    @CsvSource({
        "30, 0.1, 0.01", "30, 0.5, 0.01", "30, 1, 0.01", "30, 5, 0.02", "30, 16, 0.01", "30, 40, 0.1",
        "10, 2, 0.001", "60, 100, 0.005", "5, 300, 0.04", "45, 0.02, 0.00001", "45, 25, 0.00001"})
    @DisplayName("depth step per sample equals a brute-force bisection of t(d) at t + dt")
    void depthStepMatchesBruteForceInversion(double halfSeparationMm, double depthMm, double dtUs) {
        double t = timeUs(halfSeparationMm, depthMm, V_MM_PER_US);
        double bruteForceMm = depthByBisectionMm(halfSeparationMm, t + dtUs, V_MM_PER_US) - depthMm;
        assertThat(TofdGeometry.depthStepMm(halfSeparationMm, depthMm, dtUs, V_MM_PER_US))
                .isCloseTo(bruteForceMm, within(ALLOWED_ERROR_MM));
    }

    @Test
    @DisplayName("depth step is below the linearised slope dt v R/(2d) everywhere (d(t) is concave) and matches bisection")
    void depthStepIsBelowTheLinearisedSlopeAndMatchesBisection() {
        // Derivation: d(t) = sqrt((v t/2)^2 - S^2) has d'' < 0, so the forward difference is below dt d'(t).
        qt().withFixedSeed(20240611L).withExamples(500)
                .forAll(doubles().between(1.0, 100.0), doubles().between(0.05, 200.0), doubles().between(1e-4, 0.1))
                .checkAssert((s, d, dt) -> {
                    double step = TofdGeometry.depthStepMm(s, d, dt, V_MM_PER_US);
                    double linearised = dt * V_MM_PER_US * Math.sqrt(s * s + d * d) / (2.0 * d);
                    assertThat(step).isLessThan(linearised);
                    double t = timeUs(s, d, V_MM_PER_US);
                    assertThat(step).isCloseTo(depthByBisectionMm(s, t + dt, V_MM_PER_US) - d, within(ALLOWED_ERROR_MM));
                });
    }

    @Test
    @DisplayName("near the surface the linearised slope is far too high (here 33 % at 1 mm)")
    void linearisedSlopeOverstatesTheStepNearTheSurface() {
        // Hand-worked: S = 30, d = 1 -> R = sqrt(901) = 30.0166620 mm, R' = R + 0.0295,
        // d' = sqrt(R'^2 - 900) = 1.6648884, step 0.6648884 mm; linearised 0.01 x 5.9 x R / 2 = 0.8854915 mm.
        double stepMm = TofdGeometry.depthStepMm(S_MM, 1.0, 0.01, V_MM_PER_US);
        double r = Math.sqrt(901.0);
        assertThat(stepMm).isCloseTo(Math.sqrt((r + 0.0295) * (r + 0.0295) - 900.0) - 1.0, within(ALLOWED_ERROR_MM));
        assertThat(0.01 * 5.9 * r / 2.0 / stepMm).isCloseTo(1.3318, within(1e-4));
    }

    @Test
    @DisplayName("dead zone is the hand-worked sqrt((S + v tp/2)^2 - S^2) and arrives exactly tp after the lateral wave")
    void deadZoneIsHandWorkedAndArrivesOnePulseAfterTheLateralWave() {
        // tp = 0.2 us: v tp/2 = 0.59 mm, sqrt(30.59^2 - 30^2) = sqrt(935.7481 - 900) = sqrt(35.7481) = 5.9789715 mm.
        double zoneMm = TofdGeometry.deadZoneDepthMm(S_MM, 0.2, V_MM_PER_US);
        assertThat(zoneMm).isCloseTo(Math.sqrt(35.7481), within(ALLOWED_ERROR_MM));
        assertThat(zoneMm).isCloseTo(5.9789715, within(1e-7));
        // Definition: the tip at the dead-zone depth arrives one pulse duration after the lateral wave.
        assertThat(timeUs(S_MM, zoneMm, V_MM_PER_US) - 2.0 * S_MM / V_MM_PER_US).isCloseTo(0.2, within(ALLOWED_ERROR_US));
    }

    @Test
    @DisplayName("pulse-limited depth resolution at 16 mm is hand-worked and spans exactly one pulse duration")
    void pulseLimitedResolutionIsHandWorkedAndSpansOnePulse() {
        // R = 34, R + v tp/2 = 34.59: sqrt(34.59^2 - 900) - 16 = sqrt(296.4681) - 16 = 1.2182490 mm.
        double resolutionMm = TofdGeometry.pulseLimitedDepthResolutionMm(S_MM, 16.0, 0.2, V_MM_PER_US);
        assertThat(resolutionMm).isCloseTo(Math.sqrt(296.4681) - 16.0, within(ALLOWED_ERROR_MM));
        assertThat(timeUs(S_MM, 16.0 + resolutionMm, V_MM_PER_US) - timeUs(S_MM, 16.0, V_MM_PER_US))
                .isCloseTo(0.2, within(ALLOWED_ERROR_US));
    }

    @Test
    @DisplayName("back-wall dead zone of 40 mm is hand-worked and ends exactly one pulse before the back wall")
    void backwallDeadZoneIsHandWorkedAndEndsOnePulseBeforeTheBackWall() {
        // T = 40 -> R_T = 50, R_T - v tp/2 = 49.41: 40 - sqrt(49.41^2 - 900) = 40 - sqrt(1541.3481) = 0.7399936 mm.
        double zoneMm = TofdGeometry.backwallDeadZoneMm(S_MM, 40.0, 0.2, V_MM_PER_US);
        assertThat(zoneMm).isCloseTo(40.0 - Math.sqrt(1541.3481), within(ALLOWED_ERROR_MM));
        assertThat(zoneMm).isCloseTo(0.7399936, within(1e-7));
        assertThat(timeUs(S_MM, 40.0, V_MM_PER_US) - timeUs(S_MM, 40.0 - zoneMm, V_MM_PER_US))
                .isCloseTo(0.2, within(ALLOWED_ERROR_US));
        assertThat(TofdGeometry.backwallPulseReachesLateralWave(S_MM, 40.0, 0.2, V_MM_PER_US)).isFalse();
    }

    @Test
    @DisplayName("back-wall dead zone is the whole thickness when t_T - tp falls at or before the lateral wave")
    void backwallDeadZoneIsTheWholeThicknessWhenThePulseReachesTheLateralWave() {
        // T = 4 mm under S = 30: R_T = sqrt(916) = 30.2655 mm; R_T - S = 0.2655 mm < v tp/2 = 0.59 mm.
        assertThat(TofdGeometry.backwallPulseReachesLateralWave(S_MM, 4.0, 0.2, V_MM_PER_US)).isTrue();
        assertThat(TofdGeometry.backwallDeadZoneMm(S_MM, 4.0, 0.2, V_MM_PER_US)).isEqualTo(4.0);
        // T = 6 mm: R_T - S = sqrt(936) - 30 = 0.5948 mm > 0.59 mm: a sliver of 6 - sqrt(0.0048...) survives.
        assertThat(TofdGeometry.backwallPulseReachesLateralWave(S_MM, 6.0, 0.2, V_MM_PER_US)).isFalse();
        double rest = Math.sqrt((Math.sqrt(936.0) - 0.59) * (Math.sqrt(936.0) - 0.59) - 900.0);
        assertThat(TofdGeometry.backwallDeadZoneMm(S_MM, 6.0, 0.2, V_MM_PER_US)).isCloseTo(6.0 - rest, within(1e-9));
    }

    @Test
    @DisplayName("dd/dS = -S/d matches a central difference of d = sqrt((v t/2)^2 - S^2) at a fixed time (derivation)")
    void separationSensitivityMatchesCentralDifference() {
        double t = timeUs(S_MM, 16.0, V_MM_PER_US);
        double h = 1e-4;
        double numerical = (TofdGeometry.depthMm(S_MM + h, t, V_MM_PER_US) - TofdGeometry.depthMm(S_MM - h, t, V_MM_PER_US))
                / (2.0 * h);
        assertThat(TofdGeometry.depthPerHalfSeparationRatio(S_MM, 16.0)).isEqualTo(-30.0 / 16.0);
        assertThat(numerical).isCloseTo(-30.0 / 16.0, within(1e-6));
    }

    @ParameterizedTest(name = "offset {0} mm along the probe axis")
    @CsvSource({"1", "5", "15", "29"})
    @DisplayName("a tip off the centre line reads deeper than it lies with the symmetric formula (derived)")
    void tipOffTheCentreLineReadsDeeperThanItLies(double offsetMm) {
        double d = 16.0;
        double t = (Math.hypot(S_MM - offsetMm, d) + Math.hypot(S_MM + offsetMm, d)) / V_MM_PER_US;
        assertThat(TofdGeometry.depthMm(S_MM, t, V_MM_PER_US)).isGreaterThan(d);
    }

    @Nested
    class Failures {
        @Test
        void timeBeforeTheLateralWaveIsRejected() {
            assertThatThrownBy(() -> TofdGeometry.depthMm(S_MM, 2.0 * S_MM / V_MM_PER_US * 0.99, V_MM_PER_US))
                    .isInstanceOfSatisfying(CalculationException.class,
                            e -> assertThat(e.error()).isEqualTo(CalculationError.INVALID_INPUT));
        }

        @Test
        void notANumberDepthIsRejected() {
            assertThatThrownBy(() -> TofdGeometry.depthStepMm(S_MM, Double.NaN, 0.01, V_MM_PER_US))
                    .isInstanceOfSatisfying(CalculationException.class,
                            e -> assertThat(e.fields()).containsExactly("depth"));
        }

        @Test
        void zeroSeparationIsRejected() {
            assertThatThrownBy(() -> TofdGeometry.lateralWaveTimeUs(0.0, V_MM_PER_US))
                    .isInstanceOfSatisfying(CalculationException.class,
                            e -> assertThat(e.fields()).containsExactly("probe_centre_separation"));
        }
    }
}
