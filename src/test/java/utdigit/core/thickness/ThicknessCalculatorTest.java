package utdigit.core.thickness;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;
import utdigit.core.common.CalculationError;
import utdigit.core.common.CalculationException;
import utdigit.core.common.Warning;

class ThicknessCalculatorTest {

    static final double ALLOWED_ERROR_MM = 1e-12;
    static final double ALLOWED_ERROR_US = 1e-12;
    static final double ALLOWED_ERROR_NS = 1e-12;
    static final double ALLOWED_RELATIVE_ERROR = 1e-12;
    /** JCGM 101 check: the Monte Carlo standard deviation within 1 % of the GUM value. */
    static final double MONTE_CARLO_RELATIVE_TOLERANCE = 0.01;
    static final int MONTE_CARLO_DRAWS = 400_000;

    /** ISO 22232-2 steel reference longitudinal velocity, m/s (5.92 mm/us). */
    static final double V_M_PER_S = 5920.0;

    static boolean hasWarning(ThicknessResult r, String code) {
        return r.warnings().stream().map(Warning::code).anyMatch(code::equals);
    }

    static String warningMessage(ThicknessResult r, String code) {
        return r.warnings().stream().filter(w -> w.code().equals(code)).map(Warning::message).findFirst().orElseThrow();
    }

    @Test
    @DisplayName("first echo through 10 mm at 100 MHz: resolution v dt/2, round trip 2d/v, samples and relative resolution (definitions)")
    void firstEchoResolutionFollowsTheDefinitions() {
        // Hand-worked: dt = 0.01 us; v dt / 2 = 5.92 x 0.01 / 2 = 0.0296 mm; 2d/v = 20 / 5.92 = 3.378378 us;
        // samples 3.378378 x 100 = 337.8378; relative 0.0296 / 10 = 0.296 %.
        ThicknessResult r = ThicknessCalculator.compute(ThicknessInput.of(100.0, V_M_PER_S, 10.0));
        assertThat(r.measurement()).isEqualTo(Measurement.FIRST_ECHO);
        assertThat(r.echoSpacing()).isEqualTo(1);
        assertThat(r.thicknessResolutionMm()).isCloseTo(0.0296, within(ALLOWED_ERROR_MM));
        assertThat(r.roundTripTimeUs()).isCloseTo(20.0 / 5.92, within(ALLOWED_ERROR_US));
        assertThat(r.samplesAcrossThickness()).isCloseTo(2000.0 / 5.92, within(1e-10));
        assertThat(r.relativeResolutionPercent()).isCloseTo(0.296, within(1e-12));
        assertThat(r.requiredSamplingFrequencyMhz()).isNull();
    }

    @Test
    @DisplayName("inch mirror: 0.0296 mm is 0.0296/25.4 in (1 in = 25.4 mm exactly)")
    void inchMirrorDividesByTwentyFivePointFour() {
        ThicknessResult r = ThicknessCalculator.compute(ThicknessInput.of(100.0, V_M_PER_S, 10.0));
        assertThat(r.thicknessResolutionIn()).isCloseTo(0.0296 / 25.4, within(1e-15));
        assertThat(r.thicknessResolutionIn()).isCloseTo(0.0011653543, within(1e-10));
    }

    @Test
    @DisplayName("first-echo timing: dt/sqrt(12) and dt/2 (GUM 4.3.7, rectangular of half-width dt/2)")
    void firstEchoTimingIsOneQuantizedInstant() {
        ThicknessResult r = ThicknessCalculator.compute(ThicknessInput.of(100.0, V_M_PER_S, 10.0));
        assertThat(r.timingStandardUncertaintyNs()).isCloseTo(5.0 / Math.sqrt(3.0), within(ALLOWED_ERROR_NS));
        assertThat(r.timingWorstCaseErrorNs()).isCloseTo(5.0, within(ALLOWED_ERROR_NS));
    }

    @Test
    @DisplayName("echo to echo three round trips apart: resolution v dt/6, one round trip still 2d/v, timing dt/sqrt(6) and dt (GUM 4.3.9)")
    void echoToEchoDividesTheResolutionByTheSpacing() {
        ThicknessResult r = ThicknessCalculator.compute(ThicknessInput.builder(100.0, V_M_PER_S, 10.0)
                .measurement(Measurement.ECHO_TO_ECHO).echoSpacing(3).build());
        assertThat(r.echoSpacing()).isEqualTo(3);
        assertThat(r.thicknessResolutionMm()).isCloseTo(0.0296 / 3.0, within(ALLOWED_ERROR_MM));
        assertThat(r.roundTripTimeUs()).isCloseTo(20.0 / 5.92, within(ALLOWED_ERROR_US));
        assertThat(r.timingStandardUncertaintyNs()).isCloseTo(10.0 / Math.sqrt(6.0), within(ALLOWED_ERROR_NS));
        assertThat(r.timingWorstCaseErrorNs()).isCloseTo(10.0, within(ALLOWED_ERROR_NS));
    }

    @Test
    @DisplayName("decimation by 2 doubles dt and the resolution; samples across follow fs/2 (definition)")
    void decimationFollowsTheEffectiveRate() {
        ThicknessResult r = ThicknessCalculator.compute(
                ThicknessInput.builder(100.0, V_M_PER_S, 10.0).decimationFactor(2).build());
        assertThat(r.thicknessResolutionMm()).isCloseTo(0.0592, within(ALLOWED_ERROR_MM));
        assertThat(r.samplesAcrossThickness()).isCloseTo(1000.0 / 5.92, within(1e-10));
        assertThat(r.timingWorstCaseErrorNs()).isCloseTo(10.0, within(ALLOWED_ERROR_NS));
    }

    /**
     * JCGM 100:2008 (GUM) 5.1.2 eq. 10, u_c^2 = sum (df/dx_i)^2 u^2(x_i), applied to the measurement
     * model d = f(v, t) = v t / (2m) with the sensitivity coefficients taken numerically (central
     * differences) from the model, not from the implementation. u_t from GUM 4.3.7 (a/sqrt(3), half-width
     * a = dt/2) or 4.3.9 (a/sqrt(6), triangular half-width a = dt).
     */
    @ParameterizedTest(name = "{0}, m = {1}, d = {2} mm, u_v = {3} m/s, fs {4} MHz / {5}")
    @CsvSource({
        "FIRST_ECHO, 1, 10, 59.2, 100, 1", "FIRST_ECHO, 1, 10, 0, 100, 1", "FIRST_ECHO, 1, 2.5, 5, 25, 1",
        "ECHO_TO_ECHO, 2, 5, 2.96, 100, 1", "ECHO_TO_ECHO, 1, 3, 0, 100, 1", "ECHO_TO_ECHO, 4, 40, 30, 60, 3",
        "FIRST_ECHO, 1, 20, 10, 100, 2"})
    @DisplayName("standard uncertainty is JCGM 100:2008 eq. 10 with numerical sensitivity coefficients of d = v t/(2m)")
    void standardUncertaintyFollowsGumEquationTen(
            Measurement measurement, int m, double dMm, double uvMPerS, double fsMhz, int decimation) {
        double v = V_M_PER_S / 1000.0;
        double uv = uvMPerS / 1000.0;
        double t = m * 2.0 * dMm / v;
        double dtUs = decimation / fsMhz;
        double ut = measurement == Measurement.FIRST_ECHO ? (dtUs / 2.0) / Math.sqrt(3.0) : dtUs / Math.sqrt(6.0);
        double hv = 1e-6 * v;
        double ht = 1e-6 * t;
        double cv = (model(v + hv, t, m) - model(v - hv, t, m)) / (2.0 * hv);
        double ct = (model(v, t + ht, m) - model(v, t - ht, m)) / (2.0 * ht);
        double expectedMm = Math.sqrt(cv * cv * uv * uv + ct * ct * ut * ut);

        ThicknessResult r = ThicknessCalculator.compute(ThicknessInput.builder(fsMhz, V_M_PER_S, dMm)
                .measurement(measurement).echoSpacing(m).decimationFactor(decimation)
                .velocityUncertaintyMPerS(uvMPerS).build());
        assertThat(r.standardUncertaintyMm()).isCloseTo(expectedMm, within(1e-9 * expectedMm));
        // Relative form (GUM 5.1.6, product model): (u_d/d)^2 = (u_v/v)^2 + (u_t/t)^2.
        double relative = Math.sqrt(Math.pow(uv / v, 2) + Math.pow(ut / t, 2));
        assertThat(r.standardUncertaintyMm() / dMm).isCloseTo(relative, within(1e-12));
        assertThat(r.expandedUncertaintyMm()).isCloseTo(2.0 * r.standardUncertaintyMm(), within(1e-15));
    }

    /** The measurement model d = v t / (2m) of the thickness (definition). */
    static double model(double velocityMmPerUs, double timeUs, int echoSpacing) {
        return velocityMmPerUs * timeUs / (2.0 * echoSpacing);
    }

    /**
     * JCGM 101:2008 (propagation of distributions by a Monte Carlo method), seeded: the velocity used
     * is drawn from N(v, u_v); the echoes' true instants sit at an unknown position relative to the
     * sampling grid (a random phase, and for echo-to-echo an unknown sub-sample part of the spacing) and
     * are read at the nearest sample; the thickness error is V t_read / (2m) - v t_true / (2m).
     */
    @ParameterizedTest(name = "{0}, m = {1}, d = {2} mm, u_v = {3} m/s, fs {4} MHz / {5}")
    @CsvSource({
        "FIRST_ECHO, 1, 10, 59.2, 100, 1", "FIRST_ECHO, 1, 10, 0, 100, 1", "FIRST_ECHO, 1, 20, 10, 100, 2",
        "ECHO_TO_ECHO, 2, 5, 2.96, 100, 1", "ECHO_TO_ECHO, 1, 3, 0, 100, 1", "ECHO_TO_ECHO, 4, 40, 30, 60, 3"})
    @DisplayName("standard uncertainty agrees with a seeded Monte Carlo (JCGM 101 approach) within 1 %")
    void standardUncertaintyAgreesWithMonteCarlo(
            Measurement measurement, int m, double dMm, double uvMPerS, double fsMhz, int decimation) {
        double v = V_M_PER_S / 1000.0;
        double uv = uvMPerS / 1000.0;
        double dtUs = decimation / fsMhz;
        double trueSpacingUs = m * 2.0 * dMm / v;
        double firstEchoUs = 3.7; // couplant or delay line before the first back-wall echo (echo to echo)
        Random random = new Random(0x5EEDL + m + (long) (dMm * 1000));
        double sum = 0.0;
        double sumOfSquares = 0.0;
        for (int i = 0; i < MONTE_CARLO_DRAWS; i++) {
            double velocityUsed = v + uv * random.nextGaussian();
            double trueTimeUs;
            double readTimeUs;
            if (measurement == Measurement.FIRST_ECHO) {
                // Trigger at a sample instant (synchronous); the echo's sub-sample position is unknown.
                trueTimeUs = trueSpacingUs + random.nextDouble() * dtUs;
                readTimeUs = dtUs * Math.rint(trueTimeUs / dtUs);
            } else {
                double phaseUs = random.nextDouble() * dtUs;
                double t1 = firstEchoUs + phaseUs;
                trueTimeUs = trueSpacingUs + random.nextDouble() * dtUs;
                double t2 = t1 + trueTimeUs;
                readTimeUs = dtUs * (Math.rint(t2 / dtUs) - Math.rint(t1 / dtUs));
            }
            double errorMm = model(velocityUsed, readTimeUs, m) - model(v, trueTimeUs, m);
            sum += errorMm;
            sumOfSquares += errorMm * errorMm;
        }
        double mean = sum / MONTE_CARLO_DRAWS;
        double monteCarloMm = Math.sqrt(sumOfSquares / MONTE_CARLO_DRAWS - mean * mean);

        ThicknessResult r = ThicknessCalculator.compute(ThicknessInput.builder(fsMhz, V_M_PER_S, dMm)
                .measurement(measurement).echoSpacing(m).decimationFactor(decimation)
                .velocityUncertaintyMPerS(uvMPerS).build());
        assertThat(monteCarloMm / r.standardUncertaintyMm()).isCloseTo(1.0, within(MONTE_CARLO_RELATIVE_TOLERANCE));
    }

    @Test
    @DisplayName("velocity uncertainty in percent is p/100 x v, the same as the m/s value")
    void velocityUncertaintyInPercentIsAFractionOfTheVelocity() {
        ThicknessResult percent = ThicknessCalculator.compute(
                ThicknessInput.builder(100.0, V_M_PER_S, 10.0).velocityUncertaintyPercent(1.0).build());
        ThicknessResult perSecond = ThicknessCalculator.compute(
                ThicknessInput.builder(100.0, V_M_PER_S, 10.0).velocityUncertaintyMPerS(59.2).build());
        assertThat(percent.velocityUncertaintyMPerS()).isCloseTo(59.2, within(1e-12));
        assertThat(percent.standardUncertaintyMm()).isCloseTo(perSecond.standardUncertaintyMm(), within(1e-15));
        assertThat(hasWarning(percent, "VELOCITY_UNCERTAINTY_ZERO")).isFalse();
    }

    @Test
    @DisplayName("coverage factor 3 triples the standard uncertainty (U = k u)")
    void expandedUncertaintyIsCoverageFactorTimesStandardUncertainty() {
        ThicknessResult r = ThicknessCalculator.compute(ThicknessInput.builder(100.0, V_M_PER_S, 10.0)
                .velocityUncertaintyPercent(0.5).coverageFactor(3.0).build());
        assertThat(r.coverageFactor()).isEqualTo(3.0);
        assertThat(r.expandedUncertaintyMm()).isCloseTo(3.0 * r.standardUncertaintyMm(), within(1e-15));
    }

    @Test
    @DisplayName("no velocity uncertainty: 0 with a warning that the result holds sampling alone")
    void missingVelocityUncertaintyIsZeroWithAWarning() {
        ThicknessResult r = ThicknessCalculator.compute(ThicknessInput.of(100.0, V_M_PER_S, 10.0));
        assertThat(r.velocityUncertaintyMPerS()).isZero();
        assertThat(hasWarning(r, "VELOCITY_UNCERTAINTY_ZERO")).isTrue();
        // Sampling alone: v/(2m) x dt/sqrt(12) = 2.96 mm/us x 0.01 us / sqrt(12).
        assertThat(r.standardUncertaintyMm()).isCloseTo(2.96 * 0.01 / Math.sqrt(12.0), within(ALLOWED_ERROR_MM));
    }

    @ParameterizedTest(name = "r = {0} mm, m = {1}, decimation {2}: {3} MHz")
    @CsvSource({"0.01, 1, 1, 296", "0.01, 1, 4, 1184", "0.01, 2, 1, 148", "0.05, 1, 1, 59.2"})
    @DisplayName("required sampling frequency is v/(2 m r) for the raw rate with the decimation (hand-worked)")
    void requiredSamplingFrequencyIsVelocityOverTwiceSpacingTimesResolution(
            double requiredMm, int m, int decimation, double expectedMhz) {
        // e.g. 5.92 mm/us / (2 x 1 x 0.01 mm) = 296 MHz; with decimation 4 the raw rate is 4 x 296 = 1184 MHz.
        ThicknessResult r = ThicknessCalculator.compute(ThicknessInput.builder(100.0, V_M_PER_S, 10.0)
                .measurement(m == 1 ? null : Measurement.ECHO_TO_ECHO).echoSpacing(m).decimationFactor(decimation)
                .requiredResolutionMm(requiredMm).build());
        assertThat(r.requiredSamplingFrequencyMhz()).isCloseTo(expectedMhz, within(1e-9));
    }

    @Test
    @DisplayName("at the required sampling frequency the resolution equals the required one and no warning is raised")
    void requiredSamplingFrequencyReachesTheRequiredResolution() {
        ThicknessInput slow = ThicknessInput.builder(100.0, V_M_PER_S, 10.0).decimationFactor(3)
                .requiredResolutionMm(0.0123).build();
        ThicknessResult first = ThicknessCalculator.compute(slow);
        assertThat(hasWarning(first, "RESOLUTION_COARSER_THAN_REQUIRED")).isTrue();
        assertThat(warningMessage(first, "RESOLUTION_COARSER_THAN_REQUIRED")).contains("required_resolution");

        ThicknessInput atRate = ThicknessInput.builder(first.requiredSamplingFrequencyMhz(), V_M_PER_S, 10.0)
                .decimationFactor(3).requiredResolutionMm(0.0123).build();
        ThicknessResult second = ThicknessCalculator.compute(atRate);
        assertThat(second.thicknessResolutionMm()).isCloseTo(0.0123, within(0.0123 * ALLOWED_RELATIVE_ERROR));
        assertThat(hasWarning(second, "RESOLUTION_COARSER_THAN_REQUIRED")).isFalse();
    }

    @Test
    @DisplayName("wall echoes overlap below the axial resolution v tau(-6 dB)/2 = 0.8678 mm (5 MHz, 60 %), not below v tau")
    void thicknessBelowAxialResolutionIsWarned() {
        // scipy.signal.gausspulse model: tau(-6 dB) = 2 sqrt(0.3 ln10 / a), a = (pi f bw)^2 / (1.2 ln 10),
        // so tau = 1.2 ln 10 / (pi f bw) = 2.763102 / 9.424778 = 0.293175 us. Echoes of a wall d thick are
        // 2d/v apart: they overlap when 2d/v < tau, d < v tau / 2 = 5.92 x 0.293175 / 2 = 0.86780 mm.
        double overlapThicknessMm = 5.92 * 1.2 * Math.log(10.0) / (Math.PI * 5.0 * 0.6) / 2.0;
        assertThat(overlapThicknessMm).isCloseTo(0.86780, within(1e-5));
        ThicknessResult thin = ThicknessCalculator.compute(ThicknessInput.builder(100.0, V_M_PER_S, 0.85)
                .frequencyMhz(5.0).bandwidthPercent(60.0).build());
        // 1.7 mm lies between v tau/2 and v tau: the echoes are 2 x 1.7 / 5.92 = 0.574 us apart, about two
        // pulse durations, and do not overlap; the former threshold v tau warned here.
        ThicknessResult between = ThicknessCalculator.compute(ThicknessInput.builder(100.0, V_M_PER_S, 1.7)
                .frequencyMhz(5.0).bandwidthPercent(60.0).build());
        ThicknessResult justAbove = ThicknessCalculator.compute(ThicknessInput.builder(100.0, V_M_PER_S, 0.88)
                .frequencyMhz(5.0).bandwidthPercent(60.0).build());
        String code = ThicknessCalculator.THICKNESS_BELOW_AXIAL_RESOLUTION;
        assertThat(hasWarning(thin, code)).isTrue();
        assertThat(warningMessage(thin, code)).contains("0.8678 mm");
        assertThat(hasWarning(between, code)).isFalse();
        assertThat(hasWarning(justAbove, code)).isFalse();
    }

    @Test
    @DisplayName("when the rectangular sampling term dominates, a warning says k = 2 covers 100 %, not 95 %")
    void dominantRectangularTermIsWarned() {
        // Rectangular of half-width a: 2u = 2a/sqrt(3) > a, so +/- 2u covers the whole distribution.
        ThicknessResult r = ThicknessCalculator.compute(ThicknessInput.of(100.0, V_M_PER_S, 10.0));
        assertThat(warningMessage(r, "SAMPLING_TERM_DOMINATES")).contains("rectangular").contains("covers 100 %");
        assertThat(r.expandedUncertaintyMm()).isGreaterThan(2.96 * 0.005); // beyond the worst case v/2 x dt/2
        assertThat(r.references()).anyMatch(ref -> ref.topic().equals("expanded uncertainty")
                && ref.id().equals("jcgm-100-2008-6.2"));
    }

    @Test
    @DisplayName("a dominant velocity term raises no coverage warning")
    void dominantVelocityTermIsNotWarned() {
        ThicknessResult r = ThicknessCalculator.compute(
                ThicknessInput.builder(100.0, V_M_PER_S, 10.0).velocityUncertaintyPercent(1.0).build());
        assertThat(hasWarning(r, "SAMPLING_TERM_DOMINATES")).isFalse();
    }

    @Test
    @DisplayName("coverage of +/- k u for a triangular error matches a seeded Monte Carlo of a difference of two uniform errors")
    void triangularCoverageMatchesMonteCarlo() {
        // Analytic: 1 - (1 - 2/sqrt(6))^2 = 0.966326 (triangular of half-width a, u = a/sqrt(6), GUM 4.3.9).
        double u = 1.0 / Math.sqrt(6.0);
        Random random = new Random(42L);
        int inside = 0;
        int draws = 1_000_000;
        for (int i = 0; i < draws; i++) {
            double e = (random.nextDouble() - 0.5) - (random.nextDouble() - 0.5);
            if (Math.abs(e) <= 2.0 * u) {
                inside++;
            }
        }
        double analytic = 1.0 - Math.pow(1.0 - 2.0 / Math.sqrt(6.0), 2);
        assertThat(ThicknessCalculator.samplingAloneCoverageFraction(Measurement.ECHO_TO_ECHO, 2.0, u, 1.0))
                .isCloseTo(analytic, within(1e-15))
                .isCloseTo((double) inside / draws, within(0.002));
        assertThat(ThicknessCalculator.samplingAloneCoverageFraction(Measurement.FIRST_ECHO, 2.0, 0.5 / Math.sqrt(3.0), 0.5))
                .isEqualTo(1.0);
        assertThat(ThicknessCalculator.samplingAloneCoverageFraction(Measurement.FIRST_ECHO, 1.0, 0.5 / Math.sqrt(3.0), 0.5))
                .isCloseTo(1.0 / Math.sqrt(3.0), within(1e-15));
    }

    @Test
    @DisplayName("echo-to-echo with the sampling term dominant reports 96.63 % coverage for k = 2")
    void echoToEchoCoverageIsReported() {
        ThicknessResult r = ThicknessCalculator.compute(ThicknessInput.builder(100.0, V_M_PER_S, 10.0)
                .measurement(Measurement.ECHO_TO_ECHO).build());
        // Triangular distribution of half-width a: u = a / sqrt(6), P(|x| <= 2u) = 1 - (1 - 2 / sqrt(6))^2 = 0.96633
        // (JCGM 100:2008 4.3.9), written to 4 significant digits as every message writes a computed number.
        assertThat(warningMessage(r, "SAMPLING_TERM_DOMINATES")).contains("triangular").contains("96.63 %");
    }

    @Test
    @DisplayName("echo_spacing 1 with FIRST_ECHO is accepted (it is the definition of the first echo)")
    void echoSpacingOneWithFirstEchoIsAccepted() {
        ThicknessResult r = ThicknessCalculator.compute(ThicknessInput.builder(100.0, V_M_PER_S, 10.0)
                .measurement(Measurement.FIRST_ECHO).echoSpacing(1).build());
        assertThat(r.echoSpacing()).isEqualTo(1);
    }

    @Nested
    class Failures {

        @Test
        void echoSpacingZeroIsInvalid() {
            assertFails(ThicknessInput.builder(100.0, V_M_PER_S, 10.0).measurement(Measurement.ECHO_TO_ECHO)
                    .echoSpacing(0).build(), CalculationError.INVALID_INPUT, "echo_spacing");
        }

        @Test
        void echoSpacingAboveOneWithFirstEchoIsNotApplicable() {
            assertFails(ThicknessInput.builder(100.0, V_M_PER_S, 10.0).echoSpacing(2).build(),
                    CalculationError.NOT_APPLICABLE, "echo_spacing");
        }

        @Test
        void bothVelocityUncertaintiesAreRejected() {
            assertFails(ThicknessInput.builder(100.0, V_M_PER_S, 10.0).velocityUncertaintyMPerS(30.0)
                    .velocityUncertaintyPercent(0.5).build(), CalculationError.NOT_APPLICABLE,
                    "velocity_uncertainty_percent");
        }

        @Test
        void negativeVelocityUncertaintyIsInvalid() {
            assertFails(ThicknessInput.builder(100.0, V_M_PER_S, 10.0).velocityUncertaintyMPerS(-1.0).build(),
                    CalculationError.INVALID_INPUT, "velocity_uncertainty_m_per_s");
        }

        @ParameterizedTest(name = "thickness {0} mm")
        @ValueSource(doubles = {0.0, -2.0, Double.NaN})
        void nonPositiveThicknessIsInvalid(double thicknessMm) {
            assertFails(ThicknessInput.of(100.0, V_M_PER_S, thicknessMm), CalculationError.INVALID_INPUT,
                    "nominal_thickness");
        }

        @Test
        void zeroRequiredResolutionIsInvalid() {
            assertFails(ThicknessInput.builder(100.0, V_M_PER_S, 10.0).requiredResolutionMm(0.0).build(),
                    CalculationError.INVALID_INPUT, "required_resolution");
        }

        @Test
        void zeroCoverageFactorIsInvalid() {
            assertFails(ThicknessInput.builder(100.0, V_M_PER_S, 10.0).coverageFactor(0.0).build(),
                    CalculationError.INVALID_INPUT, "coverage_factor");
        }

        @Test
        void frequencyWithoutBandwidthIsRejected() {
            assertFails(ThicknessInput.builder(100.0, V_M_PER_S, 10.0).frequencyMhz(5.0).build(),
                    CalculationError.NOT_APPLICABLE, "bandwidth_percent");
        }

        @Test
        void bandwidthWithoutFrequencyIsRejected() {
            assertFails(ThicknessInput.builder(100.0, V_M_PER_S, 10.0).bandwidthPercent(60.0).build(),
                    CalculationError.NOT_APPLICABLE, "frequency_mhz");
        }

        @Test
        void notANumberVelocityIsInvalid() {
            assertFails(ThicknessInput.of(100.0, Double.NaN, 10.0), CalculationError.INVALID_INPUT, "velocity");
        }

        @Test
        void zeroDecimationIsInvalid() {
            assertFails(ThicknessInput.builder(100.0, V_M_PER_S, 10.0).decimationFactor(0).build(),
                    CalculationError.INVALID_INPUT, "decimation_factor");
        }

        private static void assertFails(ThicknessInput in, CalculationError error, String field) {
            assertThatThrownBy(() -> ThicknessCalculator.compute(in))
                    .isInstanceOfSatisfying(CalculationException.class, e -> {
                        assertThat(e.error()).isEqualTo(error);
                        assertThat(e.fields()).first().isEqualTo(field);
                    });
        }
    }
}
