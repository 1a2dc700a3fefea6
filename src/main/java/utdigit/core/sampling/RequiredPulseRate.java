package utdigit.core.sampling;

import java.util.Objects;
import java.util.Optional;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BisectionSolver;
import utdigit.core.common.Checks;
import utdigit.core.common.Decibels;
import utdigit.core.common.SearchBudget;
import utdigit.core.pulse.GaussianPulse;

/**
 * The sampling rate a Gaussian pulse needs so that its worst-case sampled peak stays within a
 * tolerance of X dB: the inverse of {@link PulseSamplingLoss}. Rates here are the rate that decides
 * amplitude ({@link SampleClock#amplitudeSamplingFrequencyMhz()}); convert with
 * {@link SampleClock#rawFrequencyForAmplitudeRateMhz(double)}.
 */
public final class RequiredPulseRate {
    private RequiredPulseRate() {}

    /** Relative step of the downward scan from the closed-form start: 0.1 %. */
    public static final double SCAN_STEP_FRACTION = 1e-3;

    /** Relative width to which the last passing/failing pair is bisected: 1e-6. */
    public static final double BISECTION_RELATIVE_TOLERANCE = 1e-6;

    /** Relative step of the scan below the answer that looks for slower rates that pass: 0.1 %. */
    public static final double SLOWER_SCAN_STEP_FRACTION = 1e-3;

    /**
     * The work bound of the whole search ({@link #forRf}), in values of the pulse s(t) computed:
     * 4,000,000 (about twice the most the search needs for bandwidths of 1 % and above: at most a few hundred ms on one core). The search for slower passing rates has a
     * bound of its own, {@link #SLOWER_SCAN_BUDGET}, so that running out there never costs the
     * answer.
     */
    public static final long SEARCH_BUDGET = 4_000_000;

    /** The work bound of the scan for slower passing rates: 1,000,000 values of s(t). */
    public static final long SLOWER_SCAN_BUDGET = 1_000_000;

    /** ln 10, for dB of an exponential. */
    private static final double LN_10 = StrictMath.log(10.0);

    /**
     * The answer for RF sampling.
     *
     * @param amplitudeSamplingFrequencyMhz the rate, MHz, above which every rate keeps the pulse
     *     loss within the tolerance (to {@link #BISECTION_RELATIVE_TOLERANCE} relative)
     * @param slowerPassingRateMhz the highest slower rate found that also passes (the loss is not
     *     monotonic in fs for narrow bands), or empty when the scan found none
     * @param work the values of s(t) the search computed (its cost, for tests and benchmarks)
     */
    public record RfSolution(double amplitudeSamplingFrequencyMhz, Optional<Double> slowerPassingRateMhz, long work) {
        public RfSolution {
            Objects.requireNonNull(slowerPassingRateMhz, "slowerPassingRateMhz");
        }
    }

    /**
     * The rate above which every rate keeps the RF pulse loss ({@link PulseSamplingLoss#rfLossDb})
     * within X dB.
     *
     * <p>Method: the answer lies between two rates known without a search. Above: the rate fs0
     * where the closed-form bound cos(pi fc/fs) exp(-a/(4 fs^2)) equals 10^(-X/20) (bisection,
     * Apache Commons Math BisectionSolver; the bound falls monotonically with fs, so every
     * faster rate passes). Below: the highest resonant rate {@link #highestFailingResonance}
     * n = p samples per carrier period whose sine bound exceeds X, which fails for every pulse
     * (at n = p/q the samples fall on a lattice of carrier phases 1/p apart, so a phase exists
     * where every sample is read at most cos(pi/p_eff) of its envelope; p_eff = p for
     * POSITIVE_PEAK, p for even and 2p for odd p with ABSOLUTE) and is the highest of all such
     * p/q. Between the two, scan down from fs0 in steps of {@link #SCAN_STEP_FRACTION} while the
     * loss stays within X, stopping at the resonance at the latest; bisect the last passing and
     * the first failing rate to {@link #BISECTION_RELATIVE_TOLERANCE} relative and return the
     * passing end. For narrow bands the failing band around the resonance is far narrower than a
     * scan step (about 0.04 % at 2 % bandwidth), but it is found: the scan ends on the resonance
     * itself. A failing window between the resonance and fs0 that is narrower than one step
     * (none is known: the bands of narrow pulses sit at resonances, and broad pulses fail on wide
     * ranges) could still be missed. Then scan further down in steps of
     * {@link #SLOWER_SCAN_STEP_FRACTION} for a slower rate that passes, stopping at the first one.
     * Rates at or below 2 fc count as failing: the loss has no bound there. Reference: search of
     * our own (derived; src/docs/methods.md 3.4).
     *
     * <p>Work: bounded by {@link #SEARCH_BUDGET} values of s(t) (plus {@link #SLOWER_SCAN_BUDGET}
     * for slower rates); each phase search costs about 2.35/bw samples per evaluation.
     *
     * @param pulse the pulse model
     * @param reading how the peak is read
     * @param amplitudeToleranceDb X, dB, > 0
     * @throws SearchBudget.Exhausted when the search reaches its bound, or when no finite rate
     *     meets X (a tolerance so small that 10^(-X/20) rounds to 1)
     * @throws SearchBudget.Cancelled when the running thread is interrupted
     */
    public static RfSolution forRf(GaussianPulse pulse, PeakReading reading, double amplitudeToleranceDb) {
        return forRf(pulse, reading, amplitudeToleranceDb, SearchBudget.of(SEARCH_BUDGET),
                SearchBudget.of(SLOWER_SCAN_BUDGET));
    }

    /** {@link #forRf(GaussianPulse, PeakReading, double)} with the caller's bounds. */
    public static RfSolution forRf(GaussianPulse pulse, PeakReading reading, double amplitudeToleranceDb,
                                   SearchBudget budget, SearchBudget slowerBudget) {
        Objects.requireNonNull(pulse, "pulse");
        Objects.requireNonNull(reading, "peak_reading");
        Checks.positive("amplitude_tolerance_db", amplitudeToleranceDb);
        if (!(Decibels.toRatio(-amplitudeToleranceDb) < 1.0)) {
            throw SearchBudget.Exhausted.predicted(budget); // no finite rate: the tolerance rounds to 0 dB
        }
        double startMhz = closedFormBoundRateMhz(pulse, amplitudeToleranceDb);
        if (!Double.isFinite(startMhz)) {
            throw SearchBudget.Exhausted.predicted(budget);
        }
        // The closed-form root is exact up to rounding: step up by ulps until the rate really passes,
        // so that the answer read back at its own rate is within the tolerance to the last bit.
        for (int i = 0; i < 64 && !passes(pulse, reading, amplitudeToleranceDb, startMhz, budget); i++) {
            startMhz = StrictMath.nextUp(startMhz * (1.0 + 1e-15));
        }

        double resonanceMhz = highestFailingResonance(reading, amplitudeToleranceDb) * pulse.carrierMhz();
        double passingMhz = startMhz;
        double failingMhz;
        while (true) {
            budget.spend(1); // every step costs, even one that needs no phase search
            double nextMhz = passingMhz * (1.0 - SCAN_STEP_FRACTION);
            if (!(nextMhz > resonanceMhz)) {
                failingMhz = resonanceMhz; // fails for every pulse: the scan ends here
                break;
            }
            if (!passes(pulse, reading, amplitudeToleranceDb, nextMhz, budget)) {
                failingMhz = nextMhz;
                break;
            }
            passingMhz = nextMhz;
        }
        while (passingMhz - failingMhz > BISECTION_RELATIVE_TOLERANCE * passingMhz) {
            budget.spend(1);
            double middleMhz = 0.5 * (passingMhz + failingMhz);
            if (passes(pulse, reading, amplitudeToleranceDb, middleMhz, budget)) {
                passingMhz = middleMhz;
            } else {
                failingMhz = middleMhz;
            }
        }

        Optional<Double> slower = Optional.empty();
        double floorMhz = 2.0 * pulse.carrierMhz();
        try {
            for (double rateMhz = failingMhz * (1.0 - SLOWER_SCAN_STEP_FRACTION);
                    rateMhz > floorMhz;
                    rateMhz *= 1.0 - SLOWER_SCAN_STEP_FRACTION) {
                slowerBudget.spend(1);
                if (passes(pulse, reading, amplitudeToleranceDb, rateMhz, slowerBudget)) {
                    slower = Optional.of(rateMhz);
                    break;
                }
            }
        } catch (SearchBudget.Exhausted e) {
            slower = Optional.empty(); // the answer stands; slower passing rates were not looked for further
        }
        return new RfSolution(passingMhz, slower, budget.spent() + slowerBudget.spent());
    }

    /**
     * The highest resonant number of samples per carrier period whose rate fails X dB for every
     * pulse: the largest integer p > 2 (even p with {@link PeakReading#ABSOLUTE}, any p with
     * {@link PeakReading#POSITIVE_PEAK}) whose sine bound -20 log10(cos(pi/p)) exceeds X; 2 when
     * there is none (at 2 samples per period and below no bound exists: failing by convention).
     * No other resonance p/q (q > 1, or odd p read as ABSOLUTE, p_eff = 2p) lies higher with a
     * sine bound above X. Reference: derived (sample lattice of carrier phases).
     */
    static double highestFailingResonance(PeakReading reading, double amplitudeToleranceDb) {
        // sine(n) falls with n and equals X at the sine-only n: the answer is the largest multiple of
        // the step strictly below it (capped far below 2^53, where integers stay exact doubles).
        double sineOnly = StrictMath.min(PulseSamplingLoss.requiredSamplesPerPeriod(amplitudeToleranceDb), 1e15);
        double step = reading == PeakReading.ABSOLUTE ? 2.0 : 1.0;
        double p = step * (StrictMath.ceil(sineOnly / step) - 1.0);
        // Rounding of cos near 1 can disagree with the exact comparison by a step or two: a bounded check.
        for (int i = 0; i < 4 && p > 2.0 && !(PulseSamplingLoss.sineBoundLossDb(p) > amplitudeToleranceDb); i++) {
            p -= step;
        }
        return StrictMath.max(p, 2.0);
    }

    /**
     * The rate, MHz, where the closed-form bound of the read RF amplitude,
     * cos(pi fc dt) exp(-a dt^2/4), equals 10^(-X/20): every faster rate keeps the RF pulse loss
     * within X dB. Solved for dt in (0, arccos(10^(-X/20))/(pi fc)] by bisection on the log of
     * the bound (Apache Commons Math BisectionSolver, to 1e-15 of the bracket: at most 120 values); NaN when the interval is not
     * a finite positive double. Reference: src/docs/methods.md 3.4, derived (the bound of {@link PulseSamplingLoss#closedFormBoundRatio}).
     */
    public static double closedFormBoundRateMhz(GaussianPulse pulse, double amplitudeToleranceDb) {
        Checks.positive("amplitude_tolerance_db", amplitudeToleranceDb);
        double logRatio = StrictMath.log(Decibels.toRatio(-amplitudeToleranceDb));
        double fc = pulse.carrierMhz();
        double a = pulse.envelopeRatePerUs2();
        // At the sine-only interval the bound is already below the tolerance (envelope factor < 1).
        double sineOnlyIntervalUs = StrictMath.acos(Decibels.toRatio(-amplitudeToleranceDb)) / (StrictMath.PI * fc);
        if (!(sineOnlyIntervalUs > 0.0) || Double.isInfinite(sineOnlyIntervalUs)) {
            return Double.NaN; // a tolerance that rounds to 0 dB, or a carrier beyond double range: no finite rate
        }
        UnivariateFunction excess =
                dt -> StrictMath.log(StrictMath.cos(StrictMath.PI * fc * dt)) - a * dt * dt / 4.0 - logRatio;
        if (!(excess.value(sineOnlyIntervalUs) < 0.0)) {
            return 1.0 / sineOnlyIntervalUs; // the envelope factor rounds to 1: the sine-only interval is the root
        }
        // Bisection halves the bracket each time: at most 51 halvings of 2 values to 1e-15 of it.
        double accuracyUs = StrictMath.max(sineOnlyIntervalUs * 1e-15, 2.0 * StrictMath.ulp(sineOnlyIntervalUs));
        double intervalUs = new BisectionSolver(accuracyUs).solve(120, excess, 0.0, sineOnlyIntervalUs);
        return 1.0 / intervalUs;
    }

    /**
     * The rate, MHz, at which the sampled envelope's worst-case loss 20 a (dt/2)^2 / ln 10 equals
     * X dB: fs = 1/dt with dt = 2 sqrt(X ln 10 / (20 a)). The loss falls monotonically with fs, so
     * every faster rate passes. Reference: inverse of {@link PulseSamplingLoss#envelopeLossDb}
     * (derived).
     */
    public static double forEnvelope(GaussianPulse pulse, double amplitudeToleranceDb) {
        Checks.positive("amplitude_tolerance_db", amplitudeToleranceDb);
        double intervalUs = 2.0 * StrictMath.sqrt(amplitudeToleranceDb * LN_10 / (20.0 * pulse.envelopeRatePerUs2()));
        double rateMhz = 1.0 / intervalUs;
        // Rounding may leave the loss at this rate a few ulps above X: step up until it is within.
        for (int i = 0; i < 64 && PulseSamplingLoss.envelopeLossDb(pulse, 1.0 / rateMhz) > amplitudeToleranceDb; i++) {
            rateMhz = StrictMath.nextUp(rateMhz * (1.0 + 1e-15));
        }
        return rateMhz;
    }

    private static boolean passes(GaussianPulse pulse, PeakReading reading, double toleranceDb, double rateMhz,
                                  SearchBudget budget) {
        double intervalUs = 1.0 / rateMhz;
        if (!(1.0 / (pulse.carrierMhz() * intervalUs) > 2.0)) {
            return false; // at or below 2 samples per period of the carrier: no bound
        }
        return PulseSamplingLoss.rfLossWithin(pulse, intervalUs, reading, toleranceDb, budget);
    }
}
