package utdigit.core.sampling;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;
import utdigit.core.pulse.GaussianPulse;

class RequiredPulseRateTest {

    /** The tolerance of the inverse: 1e-4 relative (one bisection width, plus slack for the check). */
    static final double ALLOWED_RELATIVE_ERROR = 2e-4;

    private static double lossAt(GaussianPulse pulse, double rateMhz, PeakReading reading) {
        return PulseSamplingLoss.rfLossDb(pulse, 1.0 / rateMhz, reading);
    }

    @ParameterizedTest
    @ValueSource(doubles = {0.1, 1.0, 2.0, 6.0, 20.0, 40.0})
    @DisplayName("the start rate is where the closed form cos(pi/n) exp(-a dt^2/4) meets the tolerance (methods.md)")
    void startRateMeetsTheClosedForm(double toleranceDb) {
        GaussianPulse pulse = GaussianPulse.of(5.0, 0.3);
        double a = BruteForcePulseScan.envelopeRatePerUs2(5.0, 0.3);
        double dt = 1.0 / RequiredPulseRate.closedFormBoundRateMhz(pulse, toleranceDb);
        double boundDb = -20.0 * Math.log10(Math.cos(Math.PI * 5.0 * dt) * Math.exp(-a * dt * dt / 4.0));
        assertThat(boundDb).isCloseTo(toleranceDb, within(1e-9));
    }

    @ParameterizedTest(name = "{0} MHz, {1}, fs {2} MHz")
    @CsvSource({"5, 0.6, 20", "5, 0.6, 25", "5, 0.6, 60", "10, 1.0, 40", "2.25, 0.8, 15"})
    @DisplayName("broadband round trip fs -> loss -> fs returns fs within 1e-4 relative (monotonic closed form)")
    void broadbandRoundTrip(double fcMhz, double bw, double rateMhz) {
        GaussianPulse pulse = GaussianPulse.of(fcMhz, bw);
        double lossDb = lossAt(pulse, rateMhz, PeakReading.ABSOLUTE);
        RequiredPulseRate.RfSolution solution = RequiredPulseRate.forRf(pulse, PeakReading.ABSOLUTE, lossDb);
        assertThat(solution.amplitudeSamplingFrequencyMhz()).isCloseTo(rateMhz, within(ALLOWED_RELATIVE_ERROR * rateMhz));
        solution.slowerPassingRateMhz().ifPresent(slower ->
                assertThat(lossAt(pulse, slower, PeakReading.ABSOLUTE)).isLessThanOrEqualTo(lossDb));
    }

    @Test
    @DisplayName("broadband, well sampled (60 %, n = 8): no slower rate passes (the closed form is exact down to n = 4)")
    void broadbandWellSampledHasNoSlowerPassingRate() {
        GaussianPulse pulse = GaussianPulse.of(5.0, 0.6);
        double lossDb = lossAt(pulse, 40.0, PeakReading.ABSOLUTE);
        assertThat(RequiredPulseRate.forRf(pulse, PeakReading.ABSOLUTE, lossDb).slowerPassingRateMhz()).isEmpty();
    }

    @Test
    @DisplayName("even 60 % is not monotonic at low n: n = 4 reads 3.1848 dB, n = 3.5 reads 2.9573 dB "
            + "(scipy.signal.gausspulse brute-force scan, run by us), so a slower rate is reported")
    void broadbandAtLowSamplingHasSlowerPassingRate() {
        GaussianPulse pulse = GaussianPulse.of(5.0, 0.6);
        assertThat(lossAt(pulse, 20.0, PeakReading.ABSOLUTE)).isCloseTo(3.1848177224138197, within(1e-4));
        assertThat(lossAt(pulse, 17.5, PeakReading.ABSOLUTE)).isCloseTo(2.957278452259027, within(1e-4));
        RequiredPulseRate.RfSolution solution = RequiredPulseRate.forRf(pulse, PeakReading.ABSOLUTE, 3.1848177224138197);
        assertThat(solution.amplitudeSamplingFrequencyMhz()).isCloseTo(20.0, within(ALLOWED_RELATIVE_ERROR * 20.0));
        assertThat(solution.slowerPassingRateMhz()).hasValueSatisfying(slower -> assertThat(slower).isLessThan(20.0));
    }

    @ParameterizedTest(name = "{0} MHz, {1}, {2} dB, {3}")
    @CsvSource({"5, 0.3, 1.0, ABSOLUTE", "5, 0.3, 0.5, POSITIVE_PEAK", "3.5, 0.2, 2.0, ABSOLUTE",
        "5, 0.45, 1.5, ABSOLUTE"})
    @DisplayName("narrow band: the answer is the rate above which every rate passes, against an independent scan "
            + "in 1e-5 steps from the closed-form start (src/docs/methods.md 3.4)")
    void narrowBandAnswerMatchesFineScan(double fcMhz, double bw, double toleranceDb, PeakReading reading) {
        GaussianPulse pulse = GaussianPulse.of(fcMhz, bw);
        double answerMhz = RequiredPulseRate.forRf(pulse, reading, toleranceDb).amplitudeSamplingFrequencyMhz();
        // Every faster rate passes: from the closed-form start (which passes by the bound) down in fine steps.
        double rateMhz = RequiredPulseRate.closedFormBoundRateMhz(pulse, toleranceDb);
        double firstFailingMhz = Double.NaN;
        while (rateMhz > 2.0 * fcMhz) {
            if (lossAt(pulse, rateMhz, reading) > toleranceDb) {
                firstFailingMhz = rateMhz;
                break;
            }
            rateMhz *= 1.0 - 1e-5;
        }
        assertThat(lossAt(pulse, answerMhz, reading)).isLessThanOrEqualTo(toleranceDb);
        assertThat(firstFailingMhz).isCloseTo(answerMhz, within(ALLOWED_RELATIVE_ERROR * answerMhz));
        assertThat(firstFailingMhz).isLessThan(answerMhz);
    }

    @ParameterizedTest(name = "{0} MHz, {1}, {2} dB, {3}")
    @CsvSource({"5, 0.01, 3.0, ABSOLUTE", "5, 0.02, 3.0, ABSOLUTE", "5, 0.02, 3.0, POSITIVE_PEAK",
        "5, 0.05, 3.0, ABSOLUTE", "5, 0.02, 1.0, ABSOLUTE", "5, 0.03, 2.0, POSITIVE_PEAK", "2.25, 0.04, 0.5, ABSOLUTE",
        "10, 0.01, 0.1, ABSOLUTE"})
    @DisplayName("narrow bands of 1-5 %: the answer is the rate above which every rate passes, against a scan in "
            + "1e-5 steps from the closed-form start (a failing band at 1 % is about 2e-4 wide: 20 scan steps)")
    void veryNarrowBandAnswerMatchesFineScan(double fcMhz, double bw, double toleranceDb, PeakReading reading) {
        GaussianPulse pulse = GaussianPulse.of(fcMhz, bw);
        double answerMhz = RequiredPulseRate.forRf(pulse, reading, toleranceDb).amplitudeSamplingFrequencyMhz();
        double rateMhz = RequiredPulseRate.closedFormBoundRateMhz(pulse, toleranceDb);
        double lastPassingMhz = rateMhz;
        while (lossAt(pulse, rateMhz, reading) <= toleranceDb) {
            lastPassingMhz = rateMhz;
            rateMhz *= 1.0 - 1e-5;
        }
        double firstFailingMhz = rateMhz;
        assertThat(lossAt(pulse, answerMhz, reading)).isLessThanOrEqualTo(toleranceDb);
        // The answer lies between the scan's first failing rate and its last passing rate, to the bisection's 1e-6.
        assertThat(answerMhz).isGreaterThan(firstFailingMhz);
        assertThat(answerMhz).isLessThanOrEqualTo(lastPassingMhz * (1.0 + 2e-6));
    }

    @Test
    @DisplayName("5 MHz, 2 %, 3 dB: 20.000 MHz fails (an independent brute-force phase scan reads 3.0105 dB: n = 4 "
            + "holds every sample of a near-continuous wave at cos(pi/4) or below), so the answer is just above "
            + "20 MHz: 20.0085 MHz, and 20.0042 MHz at 1 % (the figures of an independent numpy/scipy derivation)")
    void narrowBandFailingBandAtFourSamplesPerPeriod() {
        GaussianPulse two = GaussianPulse.of(5.0, 0.02);
        // BruteForcePulseScan: no symmetry, no bound, no log-concavity used; phases over [0, dt) on a grid.
        assertThat(BruteForcePulseScan.lossDb(5.0, 0.02, 4.0, true)).isCloseTo(3.0105, within(1e-4));
        assertThat(RequiredPulseRate.forRf(two, PeakReading.ABSOLUTE, 3.0).amplitudeSamplingFrequencyMhz())
                .isCloseTo(20.0085, within(1e-4));
        assertThat(RequiredPulseRate.forRf(GaussianPulse.of(5.0, 0.01), PeakReading.ABSOLUTE, 3.0)
                .amplitudeSamplingFrequencyMhz()).isCloseTo(20.0042, within(1e-4));
    }

    @ParameterizedTest(name = "{0} dB, {1}")
    @CsvSource({"3.0, ABSOLUTE, 4", "3.0103, ABSOLUTE, 2", "1.0, ABSOLUTE, 6", "1.3, ABSOLUTE, 4",
        "3.0, POSITIVE_PEAK, 4", "6.1, POSITIVE_PEAK, 2", "5.0, POSITIVE_PEAK, 3", "0.1, ABSOLUTE, 20",
        "0.1, POSITIVE_PEAK, 20"})
    @DisplayName("the highest failing resonance: the largest p (even for ABSOLUTE) with -20 log10(cos(pi/p)) > X, "
            + "else 2 (sine bound: n = 4 gives 3.0103 dB, n = 6 gives 1.2494 dB, n = 3 gives 6.0206 dB, n = 20 gives "
            + "0.1073 dB, n = 21 gives 0.0973 dB)")
    void highestFailingResonance(double toleranceDb, PeakReading reading, double expected) {
        assertThat(RequiredPulseRate.highestFailingResonance(reading, toleranceDb)).isEqualTo(expected);
    }

    @Test
    @DisplayName("30 %, 1 dB: slower rates pass (n = 4.75 reads 0.89 dB, n = 6 reads 1.27 dB; methods.md), and some "
            + "rate between them and the answer fails")
    void narrowBandWarnsOfSlowerPassingRates() {
        GaussianPulse pulse = GaussianPulse.of(5.0, 0.3);
        RequiredPulseRate.RfSolution solution = RequiredPulseRate.forRf(pulse, PeakReading.ABSOLUTE, 1.0);
        double answerMhz = solution.amplitudeSamplingFrequencyMhz();
        assertThat(answerMhz).as("n = 6 fails 1 dB").isGreaterThan(6.0 * 5.0);
        assertThat(solution.slowerPassingRateMhz()).isPresent();
        double slowerMhz = solution.slowerPassingRateMhz().get();
        assertThat(slowerMhz).isLessThan(answerMhz);
        assertThat(lossAt(pulse, slowerMhz, PeakReading.ABSOLUTE)).isLessThanOrEqualTo(1.0);
        assertThat(lossAt(pulse, 6.0 * 5.0, PeakReading.ABSOLUTE)).isGreaterThan(1.0);
        assertThat(slowerMhz).isLessThan(6.0 * 5.0);
    }

    @ParameterizedTest
    @ValueSource(doubles = {0.5, 2.0, 40.0})
    @DisplayName("the answer stays above 2 samples per period of the carrier, where no bound exists")
    void answerStaysAboveTwoSamplesPerPeriod(double toleranceDb) {
        GaussianPulse pulse = GaussianPulse.of(5.0, 0.3);
        RequiredPulseRate.RfSolution solution = RequiredPulseRate.forRf(pulse, PeakReading.ABSOLUTE, toleranceDb);
        assertThat(solution.amplitudeSamplingFrequencyMhz()).isGreaterThan(10.0);
        solution.slowerPassingRateMhz().ifPresent(slower -> assertThat(slower).isGreaterThan(10.0));
    }

    @ParameterizedTest
    @CsvSource({"5, 0.6, 0.5", "5, 0.3, 1.0", "2.25, 0.1, 3.0", "10, 1.2, 0.2"})
    @DisplayName("envelope: the rate is the closed form 1/(2 sqrt(X ln 10/(20 a))) and round-trips to X dB")
    void envelopeRateMatchesClosedFormAndRoundTrips(double fcMhz, double bw, double toleranceDb) {
        GaussianPulse pulse = GaussianPulse.of(fcMhz, bw);
        double a = BruteForcePulseScan.envelopeRatePerUs2(fcMhz, bw);
        double rateMhz = RequiredPulseRate.forEnvelope(pulse, toleranceDb);
        assertThat(rateMhz).isCloseTo(1.0 / (2.0 * Math.sqrt(toleranceDb * Math.log(10.0) / (20.0 * a))),
                within(1e-12 * rateMhz));
        assertThat(PulseSamplingLoss.envelopeLossDb(pulse, 1.0 / rateMhz)).isCloseTo(toleranceDb, within(1e-9));
    }
}
