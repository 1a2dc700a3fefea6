package utdigit.core.sampling;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.SplittableRandom;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;
import utdigit.core.common.CalculationException;
import utdigit.core.pulse.GaussianPulse;

class PulseSamplingLossTest {

    /** Closed forms evaluated two ways (Math vs StrictMath, direct vs rearranged) agree to this. */
    static final double ALLOWED_ROUNDING_DB = 1e-12;
    /** The accuracy target of the pulse search against a fine brute-force scan. */
    static final double ALLOWED_SEARCH_ERROR_DB = 1e-4;
    /** Values src/docs/methods.md quotes to 4 decimals. */
    static final double QUOTED_4_DECIMALS_DB = 5e-5;
    /** Values src/docs/methods.md quotes to 2 decimals ("about"). */
    static final double QUOTED_2_DECIMALS_DB = 0.005;

    private static double intervalUs(double fcMhz, double samplesPerPeriod) {
        return 1.0 / (samplesPerPeriod * fcMhz);
    }

    @Test
    @DisplayName("sine bound: n = 4 gives 3.0103 dB and n = 5 gives 1.8408 dB (methods.md; classic DSP result)")
    void sineBoundMatchesQuotedValues() {
        assertThat(PulseSamplingLoss.sineBoundLossDb(4.0)).isCloseTo(3.0103, within(QUOTED_4_DECIMALS_DB));
        assertThat(PulseSamplingLoss.sineBoundLossDb(5.0)).isCloseTo(1.8408, within(QUOTED_4_DECIMALS_DB));
    }

    @ParameterizedTest
    @ValueSource(doubles = {2.0001, 2.5, 3.0, 4.0, 5.0, 8.0, 10.0, 33.3, 1000.0})
    @DisplayName("sine bound equals the closed form -20 log10(cos(pi/n)) (peak midway between samples)")
    void sineBoundMatchesClosedForm(double n) {
        assertThat(PulseSamplingLoss.sineBoundLossDb(n))
                .isCloseTo(-20.0 * Math.log10(Math.cos(Math.PI / n)), within(ALLOWED_ROUNDING_DB));
    }

    @Test
    @DisplayName("sine bound: n = 4 is exactly 10 log10(2) (cos(pi/4) = 1/sqrt 2, identity)")
    void sineBoundAtFourIsHalfPower() {
        assertThat(PulseSamplingLoss.sineBoundLossDb(4.0)).isCloseTo(10.0 * Math.log10(2.0), within(ALLOWED_ROUNDING_DB));
    }

    @ParameterizedTest
    @ValueSource(doubles = {0.1, 0.5, 1.0, 1.8408, 2.0, 3.0103, 6.0, 20.0, 40.0})
    @DisplayName("required samples per period inverts the sine bound: pi / arccos(10^(-X/20))")
    void requiredSamplesPerPeriodInvertsTheSineBound(double toleranceDb) {
        double n = PulseSamplingLoss.requiredSamplesPerPeriod(toleranceDb);
        assertThat(n).isCloseTo(Math.PI / Math.acos(Math.pow(10.0, -toleranceDb / 20.0)), within(1e-12 * n));
        assertThat(PulseSamplingLoss.sineBoundLossDb(n)).isCloseTo(toleranceDb, within(1e-9));
    }

    @Test
    @DisplayName("required samples per period for 3.0103 dB is 4 and for 1.8408 dB is 5 (methods.md)")
    void requiredSamplesPerPeriodForQuotedLosses() {
        assertThat(PulseSamplingLoss.requiredSamplesPerPeriod(10.0 * Math.log10(2.0))).isCloseTo(4.0, within(1e-9));
        assertThat(PulseSamplingLoss.requiredSamplesPerPeriod(1.8408)).isCloseTo(5.0, within(1e-3));
    }

    @ParameterizedTest
    @CsvSource({"5, 0.6, 5", "5, 0.3, 4.75", "2.25, 0.1, 3", "10, 1.2, 2.2", "1, 0.05, 40"})
    @DisplayName("envelope loss equals the closed form -20 log10(exp(-a (dt/2)^2)) (Gaussian envelope, methods.md)")
    void envelopeLossMatchesClosedForm(double fcMhz, double bw, double n) {
        double a = BruteForcePulseScan.envelopeRatePerUs2(fcMhz, bw);
        double halfUs = intervalUs(fcMhz, n) / 2.0;
        double expected = -20.0 * Math.log10(Math.exp(-a * halfUs * halfUs));
        assertThat(PulseSamplingLoss.envelopeLossDb(GaussianPulse.of(fcMhz, bw), intervalUs(fcMhz, n)))
                .isCloseTo(expected, within(1e-12 + 1e-12 * expected));
    }

    @Test
    @DisplayName("broadband closed form: 5 MHz, 60 %, n = 5 gives 1.841 + 0.112 = 1.953 dB (methods.md)")
    void broadbandClosedFormMatchesDomainExample() {
        GaussianPulse pulse = GaussianPulse.of(5.0, 0.6);
        double dt = intervalUs(5.0, 5.0);
        assertThat(PulseSamplingLoss.sineBoundLossDb(5.0)).isCloseTo(1.841, within(0.0005));
        assertThat(PulseSamplingLoss.envelopeLossDb(pulse, dt)).isCloseTo(0.112, within(0.0005));
        assertThat(PulseSamplingLoss.closedFormBoundLossDb(pulse, dt)).isCloseTo(1.953, within(0.0005));
        assertThat(PulseSamplingLoss.rfLossDb(pulse, dt, PeakReading.ABSOLUTE)).isCloseTo(1.953, within(0.0005));
    }

    @ParameterizedTest
    @CsvSource({"5, 0.6, 5", "5, 0.6, 4", "5, 0.6, 12", "10, 1.0, 4", "5, 0.8, 6", "2, 1.2, 3.5"})
    @DisplayName("broadband pulses: the search equals the closed form cos(pi/n) exp(-a dt^2/4) (methods.md; "
            + "cases checked equal by a scipy brute-force scan)")
    void broadbandSearchEqualsClosedForm(double fcMhz, double bw, double n) {
        double a = BruteForcePulseScan.envelopeRatePerUs2(fcMhz, bw);
        double dt = intervalUs(fcMhz, n);
        double closedFormDb = -20.0 * Math.log10(Math.cos(Math.PI / n) * Math.exp(-a * dt * dt / 4.0));
        assertThat(PulseSamplingLoss.rfLossDb(GaussianPulse.of(fcMhz, bw), dt, PeakReading.ABSOLUTE))
                .isCloseTo(closedFormDb, within(1e-9));
    }

    @Test
    @DisplayName("narrow band (30 %, ABSOLUTE) is not monotonic: n = 4.75 gives 0.89 dB, n = 6 gives 1.27 dB (methods.md)")
    void narrowBandLossIsNotMonotonic() {
        GaussianPulse pulse = GaussianPulse.of(5.0, 0.3);
        double at475 = PulseSamplingLoss.rfLossDb(pulse, intervalUs(5.0, 4.75), PeakReading.ABSOLUTE);
        double at6 = PulseSamplingLoss.rfLossDb(pulse, intervalUs(5.0, 6.0), PeakReading.ABSOLUTE);
        assertThat(at475).isCloseTo(0.89, within(QUOTED_2_DECIMALS_DB));
        assertThat(at6).isCloseTo(1.27, within(QUOTED_2_DECIMALS_DB));
        assertThat(at475).as("fewer samples per period, yet a smaller loss").isLessThan(at6);
        // and well below the closed form at 4.75 (other samples read higher than the straddling pair)
        assertThat(at475).isLessThan(PulseSamplingLoss.closedFormBoundLossDb(pulse, intervalUs(5.0, 4.75)) - 1.0);
    }

    @ParameterizedTest(name = "{0} MHz, {1}, n = {2}, {3}")
    @CsvFileSource(resources = "/reference/sampling-pulse-loss-scipy.csv", numLinesToSkip = 1)
    @DisplayName("pulse loss equals a brute-force phase scan of scipy.signal.gausspulse (scipy 1.17.1) within 1e-4 dB")
    void pulseLossMatchesScipyBruteForce(double fcMhz, double bw, double n, PeakReading reading, double lossDb) {
        assertThat(PulseSamplingLoss.rfLossDb(GaussianPulse.of(fcMhz, bw), intervalUs(fcMhz, n), reading))
                .isCloseTo(lossDb, within(ALLOWED_SEARCH_ERROR_DB));
    }

    @ParameterizedTest(name = "{0} MHz, {1}, n = {2}, absolute {3}")
    @CsvSource({
        "5, 0.3, 4.75, true", "5, 0.3, 5.5, false", "5, 0.25, 3.1, true", "3.5, 0.4, 2.3, true",
        "2.25, 0.2, 8.7, false", "5, 0.15, 5.9, true", "7.5, 0.5, 3.7, false", "5, 0.12, 2.05, true",
        "5, 0.3, 3.2, true", "2.25, 0.1, 3.5, true"})
    @DisplayName("pulse loss equals the brute-force phase scan written in the test within 1e-4 dB")
    void pulseLossMatchesBruteForceScan(double fcMhz, double bw, double n, boolean absolute) {
        double brute = BruteForcePulseScan.lossDb(fcMhz, bw, n, absolute);
        double search = PulseSamplingLoss.rfLossDb(GaussianPulse.of(fcMhz, bw), intervalUs(fcMhz, n),
                absolute ? PeakReading.ABSOLUTE : PeakReading.POSITIVE_PEAK);
        assertThat(search).isCloseTo(brute, within(ALLOWED_SEARCH_ERROR_DB));
        // a grid can only miss the worst phase, never find a worse one than the exact minimum
        assertThat(search).isGreaterThanOrEqualTo(brute - 1e-9);
    }

    @Test
    @DisplayName("random cases (seeded): loss within the closed form, POSITIVE_PEAK never below ABSOLUTE, "
            + "ENVELOPE below the closed form (methods.md bound)")
    void randomCasesRespectTheBounds() {
        SplittableRandom random = new SplittableRandom(20240601L);
        for (int i = 0; i < 400; i++) {
            double fc = 0.5 + 19.5 * random.nextDouble();
            double bw = 0.05 + 1.5 * random.nextDouble();
            double n = 2.01 + 20.0 * random.nextDouble() * random.nextDouble();
            GaussianPulse pulse = GaussianPulse.of(fc, bw);
            double dt = intervalUs(fc, n);
            double absolute = PulseSamplingLoss.rfLossDb(pulse, dt, PeakReading.ABSOLUTE);
            double positive = PulseSamplingLoss.rfLossDb(pulse, dt, PeakReading.POSITIVE_PEAK);
            double bound = PulseSamplingLoss.closedFormBoundLossDb(pulse, dt);
            String where = "fc " + fc + ", bw " + bw + ", n " + n;
            assertThat(absolute).as(where).isBetween(0.0, bound + 1e-12);
            assertThat(positive).as(where).isBetween(absolute - 1e-12, bound + 1e-12);
            assertThat(PulseSamplingLoss.envelopeLossDb(pulse, dt)).as(where).isLessThanOrEqualTo(bound);
        }
    }

    @Test
    @DisplayName("random cases (seeded) agree with the brute-force scan within 1e-4 dB")
    void randomCasesMatchBruteForce() {
        SplittableRandom random = new SplittableRandom(7L);
        for (int i = 0; i < 6; i++) {
            double fc = 1.0 + 9.0 * random.nextDouble();
            double bw = 0.15 + 1.0 * random.nextDouble();
            double n = 2.2 + 8.0 * random.nextDouble();
            boolean absolute = random.nextBoolean();
            double search = PulseSamplingLoss.rfLossDb(GaussianPulse.of(fc, bw), intervalUs(fc, n),
                    absolute ? PeakReading.ABSOLUTE : PeakReading.POSITIVE_PEAK);
            assertThat(search).as("fc " + fc + ", bw " + bw + ", n " + n + ", absolute " + absolute)
                    .isCloseTo(BruteForcePulseScan.lossDb(fc, bw, n, absolute), within(ALLOWED_SEARCH_ERROR_DB));
        }
    }

    @Test
    @DisplayName("broadband pulse at low n: other samples read higher than the straddling pair, "
            + "so the loss is below the closed form (scipy brute force: 8.9891 dB at 10 MHz, 80 %, n = 2.5)")
    void broadbandAtLowSamplingIsBelowClosedForm() {
        GaussianPulse pulse = GaussianPulse.of(10.0, 0.8);
        double dt = intervalUs(10.0, 2.5);
        assertThat(PulseSamplingLoss.rfLossDb(pulse, dt, PeakReading.ABSOLUTE))
                .isCloseTo(8.989094794383433, within(ALLOWED_SEARCH_ERROR_DB))
                .isLessThan(PulseSamplingLoss.closedFormBoundLossDb(pulse, dt) - 1.0);
    }

    @Test
    @DisplayName("many samples per period: pulse loss tends to the sine bound (envelope term vanishes)")
    void denseSamplingTendsToSineBound() {
        GaussianPulse pulse = GaussianPulse.of(5.0, 0.6);
        double loss = PulseSamplingLoss.rfLossDb(pulse, intervalUs(5.0, 200.0), PeakReading.ABSOLUTE);
        assertThat(loss).isCloseTo(-20.0 * Math.log10(Math.cos(Math.PI / 200.0)), within(1e-4));
    }

    @Nested
    class Rejects {
        @ParameterizedTest
        @ValueSource(doubles = {2.0, 1.5, 0.0, -3.0, Double.NaN, Double.POSITIVE_INFINITY})
        @DisplayName("the sine bound at n <= 2 (or not finite) has no value")
        void sineBoundAtOrBelowTwo(double n) {
            assertThatThrownBy(() -> PulseSamplingLoss.sineBoundLossDb(n)).isInstanceOf(CalculationException.class);
        }

        @Test
        @DisplayName("the RF pulse search at 2 samples per period of the carrier has no value")
        void pulseSearchAtTwoSamplesPerPeriod() {
            assertThatThrownBy(() -> PulseSamplingLoss.rfLossDb(GaussianPulse.of(5.0, 0.3), 0.1, PeakReading.ABSOLUTE))
                    .isInstanceOf(CalculationException.class);
        }

        @ParameterizedTest
        @ValueSource(doubles = {0.0, -1.0, Double.NaN})
        @DisplayName("a tolerance <= 0 or NaN is rejected")
        void toleranceNotPositive(double toleranceDb) {
            assertThatThrownBy(() -> PulseSamplingLoss.requiredSamplesPerPeriod(toleranceDb))
                    .isInstanceOf(CalculationException.class);
        }
    }
}
