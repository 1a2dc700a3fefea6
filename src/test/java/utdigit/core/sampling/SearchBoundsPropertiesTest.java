package utdigit.core.sampling;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.doubles;

import java.util.List;
import java.util.Optional;
import java.util.concurrent.atomic.AtomicLong;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.quicktheories.api.Pair;
import org.quicktheories.core.Gen;
import org.quicktheories.generators.Generate;
import utdigit.core.common.CalculationException;
import utdigit.core.common.SearchBudget;
import utdigit.core.pulse.GaussianPulse;
import utdigit.core.pulse.Waves;

/**
 * The work bounds of the numerical searches, over the whole ranges the contract admits (frequency
 * above 0 to 1000 MHz, sampling frequency above 0 to 100000 MHz, bandwidth above 0 to below 200 %,
 * tolerance above 0 to 40 dB, velocity 100-20000 m/s), their extremes included: the smallest
 * positive double, 1e-300 and the top of each range. Work is counted in values of the pulse s(t)
 * ({@link SearchBudget}), never timed. Seeded: every run checks the same cases.
 */
class SearchBoundsPropertiesTest {
    static final long SEED = 20_261_204L;

    /** The largest work seen by each property, printed after the run (the figures of the README). */
    static final AtomicLong MAX_PHASE_SEARCH_WORK = new AtomicLong();
    static final AtomicLong MAX_RATE_SEARCH_WORK = new AtomicLong();
    static final AtomicLong MAX_REALISTIC_RATE_SEARCH_WORK = new AtomicLong();
    static final AtomicLong PHASE_SEARCHES_AT_BOUND = new AtomicLong();
    static final AtomicLong RATE_SEARCHES_AT_BOUND = new AtomicLong();

    @AfterAll
    static void printFigures() {
        System.out.printf("Search bounds: phase search at most %d of %d values (%d cases reported the bound); rate "
                        + "search at most %d of %d (+%d slower scan; %d cases reported the bound); for bandwidths "
                        + ">= 1 %% and tolerances 1e-6..40 dB at most %d%n",
                MAX_PHASE_SEARCH_WORK.get(), PulseSamplingLoss.PHASE_SEARCH_BUDGET, PHASE_SEARCHES_AT_BOUND.get(),
                MAX_RATE_SEARCH_WORK.get(), RequiredPulseRate.SEARCH_BUDGET, RequiredPulseRate.SLOWER_SCAN_BUDGET,
                RATE_SEARCHES_AT_BOUND.get(), MAX_REALISTIC_RATE_SEARCH_WORK.get());
    }

    /** A value in (0, top]: log-uniform over 1e-300..top most of the time, else one of the extremes. */
    static Gen<Double> positiveUpTo(double top) {
        Gen<Double> logUniform = doubles().between(-300.0, StrictMath.log10(top)).map(e -> StrictMath.pow(10.0, e));
        Gen<Double> extremes = Generate.pick(List.of(Double.MIN_VALUE, 1e-300, 1e-150, top, StrictMath.nextDown(top)));
        return Generate.frequency(Pair.of(5, logUniform), Pair.of(1, extremes));
    }

    /** A value in [lo, hi], log-uniform, with both ends among the cases. */
    static Gen<Double> logBetween(double lo, double hi) {
        Gen<Double> logUniform = doubles().between(StrictMath.log10(lo), StrictMath.log10(hi))
                .map(e -> StrictMath.min(hi, StrictMath.max(lo, StrictMath.pow(10.0, e))));
        return Generate.frequency(Pair.of(8, logUniform), Pair.of(1, Generate.pick(List.of(lo, hi))));
    }

    /**
     * A bandwidth in (0, 200) %: log-uniform over 1e-300..200 % alone would be below 1e-3 % almost
     * always, so half the cases are drawn over 0.01..200 %, where the searches have work to do.
     */
    static Gen<Double> bandwidths() {
        return Generate.frequency(Pair.of(1, positiveUpTo(199.99999999999997)),
                Pair.of(1, logBetween(0.01, 199.99999999999997)));
    }

    static Gen<PeakReading> readings() {
        return Generate.pick(List.of(PeakReading.values()));
    }

    static void recordMax(AtomicLong max, long value) {
        max.accumulateAndGet(value, Math::max);
    }

    @Test
    @DisplayName("phase search, whole ranges: it answers within PHASE_SEARCH_BUDGET values of s(t) or says it "
            + "reached the bound; an answer lies between 0 and the closed form")
    void phaseSearchIsBoundedOverTheWholeRanges() {
        // The sampling frequency as n times the frequency (n log-uniform over 2..1e7, 2 + 1 ulp among
        // the cases), clipped to its range: whole-range pairs of two independent values almost never
        // give a rate near the carrier, where the search has work to do.
        Gen<Double> samplesPerPeriod = Generate.frequency(Pair.of(8, logBetween(2.0, 1e7)),
                Pair.of(1, Generate.pick(List.of(StrictMath.nextUp(2.0), 4.0, 1e7))));
        qt().withFixedSeed(SEED).withExamples(600)
                .forAll(positiveUpTo(1000.0), samplesPerPeriod, bandwidths(), readings())
                .checkAssert((fcMhz, n, bwPercent, reading) -> {
                    double fsMhz = StrictMath.min(n * fcMhz, 100_000.0);
                    double dtUs = 1.0 / fsMhz;
                    if (!(fsMhz / fcMhz > 2.0)) {
                        return; // no worst case exists at 2 samples per period or below (null with a warning)
                    }
                    SearchBudget budget = SearchBudget.of(PulseSamplingLoss.PHASE_SEARCH_BUDGET);
                    try {
                        GaussianPulse pulse = GaussianPulse.of(fcMhz, bwPercent / 100.0);
                        double lossDb = PulseSamplingLoss.rfLossDb(pulse, dtUs, reading, budget);
                        assertThat(lossDb).isBetween(0.0, PulseSamplingLoss.closedFormBoundLossDb(pulse, dtUs) + 1e-9);
                    } catch (SearchBudget.Exhausted reached) {
                        PHASE_SEARCHES_AT_BOUND.incrementAndGet();
                    } catch (CalculationException refused) {
                        // said so: a null with a warning, or a typed refusal (n not finite)
                    }
                    assertThat(budget.spent()).isLessThanOrEqualTo(PulseSamplingLoss.PHASE_SEARCH_BUDGET + 1);
                    recordMax(MAX_PHASE_SEARCH_WORK, budget.spent());
                });
    }

    @Test
    @DisplayName("required pulse rate, whole ranges: it answers within SEARCH_BUDGET (+ SLOWER_SCAN_BUDGET) values "
            + "of s(t) or says it reached the bound")
    void rateSearchIsBoundedOverTheWholeRanges() {
        qt().withFixedSeed(SEED).withExamples(250)
                .forAll(positiveUpTo(1000.0), bandwidths(), positiveUpTo(40.0), readings())
                .checkAssert((fcMhz, bwPercent, toleranceDb, reading) -> {
                    SearchBudget budget = SearchBudget.of(RequiredPulseRate.SEARCH_BUDGET);
                    SearchBudget slower = SearchBudget.of(RequiredPulseRate.SLOWER_SCAN_BUDGET);
                    try {
                        GaussianPulse pulse = GaussianPulse.of(fcMhz, bwPercent / 100.0);
                        RequiredPulseRate.RfSolution solution =
                                RequiredPulseRate.forRf(pulse, reading, toleranceDb, budget, slower);
                        assertThat(solution.amplitudeSamplingFrequencyMhz()).isGreaterThan(2.0 * fcMhz);
                        assertThat(solution.work()).isEqualTo(budget.spent() + slower.spent());
                    } catch (SearchBudget.Exhausted reached) {
                        RATE_SEARCHES_AT_BOUND.incrementAndGet();
                    } catch (CalculationException refused) {
                        // said so
                    }
                    assertThat(budget.spent()).isLessThanOrEqualTo(RequiredPulseRate.SEARCH_BUDGET + 1);
                    assertThat(slower.spent()).isLessThanOrEqualTo(RequiredPulseRate.SLOWER_SCAN_BUDGET + 1);
                    recordMax(MAX_RATE_SEARCH_WORK, budget.spent() + slower.spent());
                });
    }

    @Test
    @DisplayName("required pulse rate, bandwidths of 1 % and above (the search's domain), tolerances 1e-6 to 40 dB, "
            + "frequencies 1e-3 to 1000 MHz: never reaches its bound, with at least a factor 1.5 to spare")
    void rateSearchNeverReachesItsBoundInItsDomain() {
        qt().withFixedSeed(SEED).withExamples(200)
                .forAll(logBetween(1e-3, 1000.0), logBetween(1.0, 199.99999999999997), logBetween(1e-6, 40.0), readings())
                .checkAssert((fcMhz, bwPercent, toleranceDb, reading) -> {
                    GaussianPulse pulse = GaussianPulse.of(fcMhz, bwPercent / 100.0);
                    SearchBudget budget = SearchBudget.of(RequiredPulseRate.SEARCH_BUDGET);
                    SearchBudget slower = SearchBudget.of(RequiredPulseRate.SLOWER_SCAN_BUDGET);
                    RequiredPulseRate.forRf(pulse, reading, toleranceDb, budget, slower);
                    assertThat(budget.spent()).isLessThan((long) (RequiredPulseRate.SEARCH_BUDGET / 1.5));
                    recordMax(MAX_REALISTIC_RATE_SEARCH_WORK, budget.spent());
                });
    }

    @Test
    @DisplayName("the whole assessment, whole ranges (TFM figures included): an answer or a typed refusal; a "
            + "figure whose search reached its bound is null with SEARCH_BOUND_REACHED")
    void assessmentAnswersOverTheWholeRanges() {
        qt().withFixedSeed(SEED).withExamples(300)
                .forAll(positiveUpTo(1000.0), logBetween(1.0, 1e7), bandwidths(), positiveUpTo(40.0))
                .checkAssert((fcMhz, n, bwPercent, toleranceDb) -> {
                    double fsMhz = StrictMath.min(n * fcMhz, 100_000.0);
                    SamplingInput in = SamplingInput.builder(fsMhz, fcMhz).bandwidthPercent(bwPercent)
                            .amplitudeToleranceDb(toleranceDb).tfmGridSpacingMm(0.1).velocityMPerS(5920.0).build();
                    SamplingResult r;
                    try {
                        r = SamplingCalculator.compute(in);
                    } catch (CalculationException refused) {
                        return;
                    }
                    boolean bound = r.hasWarning(SamplingCalculator.SEARCH_BOUND_REACHED);
                    Optional<Double> rate = r.requiredSamplingFrequencyPulseMhz();
                    if (rate != null && rate.isEmpty()) {
                        assertThat(bound).isTrue();
                    }
                    if (r.pulseAmplitudeLossDb() != null && r.pulseAmplitudeLossDb().isEmpty()) {
                        assertThat(bound || r.hasWarning(SamplingCalculator.PULSE_LOSS_NOT_DEFINED)).isTrue();
                    }
                });
    }

    @Test
    @DisplayName("TFM largest depth step, whole ranges: bisection within its evaluation bound (never "
            + "TooManyEvaluations), at most each one-term root, and its loss equal to X where it is not 0")
    void tfmDepthStepIsBoundedOverTheWholeRanges() {
        qt().withFixedSeed(SEED).withExamples(1000)
                .forAll(positiveUpTo(40.0), logBetween(100.0, 20_000.0), positiveUpTo(1000.0), positiveUpTo(199.99999999999997))
                .checkAssert((toleranceDb, velocityMPerS, fcMhz, bwPercent) -> {
                    double wavelengthMm = Waves.wavelengthMm(velocityMPerS, fcMhz);
                    double widthMm;
                    try {
                        widthMm = TfmGridSampling.depthResponseWidthMm(velocityMPerS, GaussianPulse.of(fcMhz, bwPercent / 100.0));
                    } catch (CalculationException refused) {
                        return;
                    }
                    if (!Double.isFinite(wavelengthMm) || !(widthMm > 0.0) || !Double.isFinite(widthMm)) {
                        return; // the web layer refuses such magnitudes as numerically extreme (typed 422)
                    }
                    double stepMm = TfmGridSampling.maxRfDepthStepMm(toleranceDb, wavelengthMm, widthMm);
                    double carrierOnlyMm = TfmGridSampling.maxRfDepthStepMm(toleranceDb, wavelengthMm, null);
                    assertThat(stepMm).isBetween(0.0, StrictMath.min(carrierOnlyMm,
                            TfmGridSampling.maxGaussianStepMm(toleranceDb, widthMm)));
                });
    }

    @Test
    @DisplayName("extremes answer at once: a flat envelope (a = 0 after rounding) is refused before any work; "
            + "a tolerance of 1e-300 dB has no finite rate")
    void extremesAreRefusedWithoutWork() {
        SearchBudget budget = SearchBudget.of(PulseSamplingLoss.PHASE_SEARCH_BUDGET);
        // a = (pi fc bw)^2 / (4 ln 2 ...) underflows to 0 for fc bw below about 1e-154 MHz
        assertThatThrownBy(() -> PulseSamplingLoss.rfLossDb(GaussianPulse.of(1e-300, 0.01), 1.0 / 4.5e-300,
                PeakReading.ABSOLUTE, budget)).isInstanceOf(SearchBudget.Exhausted.class);
        assertThat(budget.spent()).isZero();
        SearchBudget rate = SearchBudget.of(RequiredPulseRate.SEARCH_BUDGET);
        assertThatThrownBy(() -> RequiredPulseRate.forRf(GaussianPulse.of(5.0, 0.6), PeakReading.ABSOLUTE, 1e-300,
                rate, SearchBudget.of(1))).isInstanceOf(SearchBudget.Exhausted.class);
        assertThat(rate.spent()).isZero();
        SamplingResult r = SamplingCalculator.compute(SamplingInput.builder(4.5e-300, 1e-300).bandwidthPercent(1.0)
                .build());
        assertThat(r.pulseAmplitudeLossDb()).isEmpty();
        assertThat(r.hasWarning(SamplingCalculator.SEARCH_BOUND_REACHED)).isTrue();
    }

    @Test
    @DisplayName("an interrupted thread stops the search (the web layer interrupts at its deadline): Cancelled "
            + "within CHECK_INTERVAL values of s(t)")
    void interruptStopsTheSearch() {
        SearchBudget budget = SearchBudget.of(RequiredPulseRate.SEARCH_BUDGET);
        Thread.currentThread().interrupt();
        try {
            assertThatThrownBy(() -> RequiredPulseRate.forRf(GaussianPulse.of(5.0, 0.01), PeakReading.ABSOLUTE, 3.1,
                    budget, SearchBudget.of(RequiredPulseRate.SLOWER_SCAN_BUDGET)))
                    .isInstanceOf(SearchBudget.Cancelled.class);
            assertThat(budget.spent()).isLessThanOrEqualTo(2 * SearchBudget.CHECK_INTERVAL);
        } finally {
            Thread.interrupted();
        }
    }

    @Test
    @DisplayName("a budget counts: it throws on the unit that exceeds it, not before")
    void budgetCounts() {
        SearchBudget budget = SearchBudget.of(10);
        budget.spend(10);
        assertThat(budget.spent()).isEqualTo(10);
        assertThatThrownBy(() -> budget.spend(1)).isInstanceOf(SearchBudget.Exhausted.class);
    }
}
