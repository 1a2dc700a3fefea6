package utdigit.core.sampling;

import java.util.Objects;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import utdigit.core.common.CalculationException;
import utdigit.core.common.Checks;
import utdigit.core.common.Decibels;
import utdigit.core.common.SearchBudget;
import utdigit.core.pulse.GaussianPulse;

/**
 * How low a sampled echo's peak is read, for the classic sine model and for the Gaussian pulse
 * model of {@link GaussianPulse}. Losses are positive numbers of dB (a read amplitude of 0.8 of the
 * true peak is a loss of 1.94 dB).
 *
 * <p>All figures are worst cases over the sampling phase phi, the unknown offset of the sample
 * grid from the echo's peak.
 */
public final class PulseSamplingLoss {
    private PulseSamplingLoss() {}

    /** ln 10, for dB of an exponential: -20 log10(exp(-x)) = 20 x / ln 10. */
    private static final double LN_10 = StrictMath.log(10.0);

    /** Recursion depth at which the phase search counts as exhausted (its budget is reached). */
    private static final int MAX_DEPTH = 200;

    /**
     * The work bound of one phase search ({@link #rfLossDb}), in values of the pulse s(t)
     * computed: 1,000,000 (some tens of ms on one core; a search at 1 % bandwidth needs a few ten thousand). A search that would need more reports
     * {@link SearchBudget.Exhausted}; that happens only for pulses close to a continuous wave
     * (bandwidths far below 1 %), whose walk over the samples of one phase alone is long. The
     * bound is a count, not a time, so an answer never depends on the machine's load.
     */
    public static final long PHASE_SEARCH_BUDGET = 1_000_000;

    /** Brent's method's own evaluation limit at one crossing of two sample curves. */
    private static final int CROSSING_MAX_EVALUATIONS = 200;

    /**
     * Two candidate maxima are treated as tied within this relative difference (rounding of
     * exp and cos is about 1e-16).
     */
    private static final double TIE_RELATIVE = 1e-13;

    /**
     * A threshold search stops only when a phase reads below the threshold by more than this
     * relative margin, so that the final decision stays the one of {@link #rfLossDb} in dB.
     */
    private static final double STOP_MARGIN_RELATIVE = 1e-12;

    /**
     * Classic sine bound: a single peak sampled n times per period is read low by at most
     * -20 log10(cos(pi / n)) dB, the peak falling midway between two samples.
     *
     * <p>Valid for real n > 2 (at n <= 2 a sample can fall on every zero crossing: no bound).
     * n = 4 gives 3.0103 dB, n = 5 gives 1.8408 dB. Reference: standard sampled-peak result of
     * digital signal processing (derived: the nearer of the two samples straddling the peak is at
     * most dt/2 = T/(2n) away from it).
     *
     * @param samplesPerPeriod n = fs / f at the rate that decides amplitude, > 2
     * @return the loss in dB, > 0
     */
    public static double sineBoundLossDb(double samplesPerPeriod) {
        requireAboveTwo(samplesPerPeriod);
        return 0.0 - Decibels.fromRatio(StrictMath.cos(StrictMath.PI / samplesPerPeriod));
    }

    /**
     * Samples per period needed for the sine bound to stay within a tolerance of X dB: the inverse
     * of {@link #sineBoundLossDb}, n = pi / arccos(10^(-X/20)).
     *
     * <p>Continuous (not rounded up); always > 2 for X > 0. Reference: inverse of the classic
     * sine bound (derived).
     *
     * @param amplitudeToleranceDb X, dB, > 0
     */
    public static double requiredSamplesPerPeriod(double amplitudeToleranceDb) {
        Checks.positive("amplitude_tolerance_db", amplitudeToleranceDb);
        return StrictMath.PI / StrictMath.acos(Decibels.toRatio(-amplitudeToleranceDb));
    }

    /**
     * Loss of an envelope sampled with interval dt, worst case with the peak midway between two
     * samples: -20 log10(exp(-a (dt/2)^2)) = 20 a (dt/2)^2 / ln 10 dB.
     *
     * <p>Exact for the Gaussian envelope at every dt > 0 (the envelope falls monotonically on each
     * side of its peak). Reference: Gaussian pulse model (scipy.signal.gausspulse
     * parameterisation), worst phase (derived).
     *
     * @param pulse the pulse model (its envelope constant a, 1/us^2)
     * @param samplingIntervalUs dt at the rate that decides amplitude, us, > 0
     */
    public static double envelopeLossDb(GaussianPulse pulse, double samplingIntervalUs) {
        Checks.positive("sampling_interval_us", samplingIntervalUs);
        double halfUs = samplingIntervalUs / 2.0;
        return 20.0 * pulse.envelopeRatePerUs2() * halfUs * halfUs / LN_10;
    }

    /**
     * The closed-form lower bound of the read RF amplitude, as a ratio of the true peak:
     * cos(pi fc dt) exp(-a dt^2 / 4), from the two samples straddling the peak alone.
     *
     * <p>Valid for n = 1/(fc dt) > 2: |s| falls within a quarter period of the peak, so the nearer
     * of the two (at most dt/2 away) reads at least this high, also as a positive peak. It equals
     * the exact worst case for broadband pulses. Reference: src/docs/methods.md 3.3 (derived).
     *
     * @param pulse the pulse model (carrier fc, MHz; envelope constant a, 1/us^2)
     * @param samplingIntervalUs dt at the rate that decides amplitude, us, with fc dt < 1/2
     */
    public static double closedFormBoundRatio(GaussianPulse pulse, double samplingIntervalUs) {
        Checks.positive("sampling_interval_us", samplingIntervalUs);
        requireAboveTwo(1.0 / (pulse.carrierMhz() * samplingIntervalUs));
        double a = pulse.envelopeRatePerUs2();
        return StrictMath.cos(StrictMath.PI * pulse.carrierMhz() * samplingIntervalUs)
                * StrictMath.exp(-a * samplingIntervalUs * samplingIntervalUs / 4.0);
    }

    /** {@link #closedFormBoundRatio} as a loss in dB: the sine bound plus the envelope loss. */
    public static double closedFormBoundLossDb(GaussianPulse pulse, double samplingIntervalUs) {
        return 0.0 - Decibels.fromRatio(closedFormBoundRatio(pulse, samplingIntervalUs));
    }

    /**
     * Worst case over the sampling phase of the read RF amplitude of the Gaussian pulse, as a loss
     * in dB: -20 log10(min over phi of max_k r(s(k dt + phi))), r = |.| for
     * {@link PeakReading#ABSOLUTE}, the signed value for {@link PeakReading#POSITIVE_PEAK}; the
     * true peak is s(0) = 1.
     *
     * <p>Never above {@link #closedFormBoundLossDb} and equal to it for broadband pulses; for
     * narrow bands samples of neighbouring cycles read higher, and the loss is not monotonic in dt.
     * Valid for n = 1/(fc dt) > 2. Method (exact up to rounding, no phase grid): by the symmetry
     * s(-t) = s(t) the read amplitude R(phi) satisfies R(phi) = R(dt - phi), so phi in [0, dt/2]
     * suffices. Each sample's curve g_k(phi) is log-concave between the carrier's zero crossings
     * (d^2/dt^2 ln|s| = -2a - (2 pi fc)^2 / cos^2 < 0), so on a phase interval where g_k has no
     * zero its minimum is at an end. The minimum of R = max_k g_k therefore lies at an end of the
     * interval or where two curves cross: the interval is split at zeros of the curves that hold
     * the maximum at its ends and at their crossing (Brent's method, Apache Commons Math
     * BrentSolver, to 1e-15 of dt), recursively until the maximum at the crossing is one of the two
     * curves. Only samples whose envelope exceeds the current maximum are visited. Cost grows as
     * 1/bandwidth. Reference: Gaussian pulse model (scipy.signal.gausspulse parameterisation),
     * search of our own (derived).
     *
     * @param pulse the pulse model (carrier fc, MHz; envelope constant a, 1/us^2)
     * @param samplingIntervalUs dt at the rate that decides amplitude, us, with fc dt < 1/2
     * @param reading how the peak is read
     * @return the loss in dB, >= 0
     */
    public static double rfLossDb(GaussianPulse pulse, double samplingIntervalUs, PeakReading reading) {
        return 0.0 - Decibels.fromRatio(rfReadRatio(pulse, samplingIntervalUs, reading));
    }

    /**
     * {@link #rfLossDb} within a work bound.
     *
     * @throws SearchBudget.Exhausted when the search would exceed {@code budget}
     * @throws SearchBudget.Cancelled when the running thread is interrupted
     */
    public static double rfLossDb(GaussianPulse pulse, double samplingIntervalUs, PeakReading reading,
                                  SearchBudget budget) {
        return 0.0 - Decibels.fromRatio(rfReadRatio(pulse, samplingIntervalUs, reading, budget));
    }

    /**
     * The worst-case read amplitude of {@link #rfLossDb} as a ratio of the true peak, in (0, 1].
     */
    public static double rfReadRatio(GaussianPulse pulse, double samplingIntervalUs, PeakReading reading) {
        return rfReadRatio(pulse, samplingIntervalUs, reading, SearchBudget.of(PHASE_SEARCH_BUDGET));
    }

    /** {@link #rfReadRatio} within a work bound (see {@link #rfLossDb(GaussianPulse, double, PeakReading, SearchBudget)}). */
    public static double rfReadRatio(GaussianPulse pulse, double samplingIntervalUs, PeakReading reading,
                                     SearchBudget budget) {
        Objects.requireNonNull(pulse, "pulse");
        Objects.requireNonNull(reading, "peak_reading");
        double bound = closedFormBoundRatio(pulse, samplingIntervalUs);
        return new PhaseSearch(pulse, samplingIntervalUs, reading, bound, budget).minimumReadRatio();
    }

    /**
     * An upper bound of the samples one evaluation of the read amplitude visits: the walk stops at
     * the first |t| where the envelope exp(-a t^2) falls to the closed-form bound B (the sample
     * nearest the peak already reads at least B), so it visits at most 2 sqrt(-ln B / a)/dt + 3
     * samples; about 2.35/bw + 3 for a fractional bandwidth bw, whatever the rate. Infinite when
     * the envelope does not fall (a = 0 after rounding, a bandwidth near 1e-300).
     */
    static double walkLengthBound(double envelopeRatePerUs2, double samplingIntervalUs, double boundRatio) {
        double minusLogBound = -StrictMath.log(boundRatio);
        if (!(minusLogBound > 0.0)) {
            return 3.0; // B = 1 to the last bit: the first sample reads 1 and the walk stops
        }
        double half = StrictMath.sqrt(minusLogBound / envelopeRatePerUs2) / samplingIntervalUs; // +infinity when a = 0
        return 2.0 * half + 3.0;
    }

    /**
     * Whether the worst-case RF loss ({@link #rfLossDb}) stays within {@code toleranceDb}. Same
     * search, but it stops as soon as any phase reads clearly below 10^(-X/20) (the worst case is
     * at most that): exact, and cheap for rates that fail.
     */
    static boolean rfLossWithin(GaussianPulse pulse, double samplingIntervalUs, PeakReading reading,
                                double toleranceDb, SearchBudget budget) {
        double bound = closedFormBoundRatio(pulse, samplingIntervalUs);
        if (-Decibels.fromRatio(bound) <= toleranceDb) {
            return true; // the loss never exceeds the closed form
        }
        PhaseSearch search = new PhaseSearch(pulse, samplingIntervalUs, reading, bound, budget);
        search.stopBelow = Decibels.toRatio(-toleranceDb) * (1.0 - STOP_MARGIN_RELATIVE);
        double ratio = search.minimumReadRatio();
        return !(ratio < search.stopBelow) && -Decibels.fromRatio(ratio) <= toleranceDb;
    }

    private static void requireAboveTwo(double samplesPerPeriod) {
        if (!(samplesPerPeriod > 2.0) || Double.isInfinite(samplesPerPeriod)) {
            throw CalculationException.invalid(
                    "samples_per_period", samplesPerPeriod, "must be finite and > 2 for a sampled-peak bound");
        }
    }

    /** One phase search: the pulse, the interval and the running result of the last evaluation. */
    private static final class PhaseSearch {
        private final double envelopeRatePerUs2;
        private final double carrierMhz;
        private final double angularFrequencyRadPerUs;
        private final double samplingIntervalUs;
        private final boolean absolute;
        private final double boundRatio;
        private final SearchBudget budget;
        private BrentSolver solver;

        /** The search may stop at the first phase reading below this (no threshold: -infinity). */
        double stopBelow = Double.NEGATIVE_INFINITY;

        /** Maximum and the index of the sample holding it, set by {@link #evaluate}. */
        private double lastMaximum;
        private int lastIndex;

        PhaseSearch(GaussianPulse pulse, double samplingIntervalUs, PeakReading reading, double boundRatio,
                    SearchBudget budget) {
            this.envelopeRatePerUs2 = pulse.envelopeRatePerUs2();
            this.carrierMhz = pulse.carrierMhz();
            this.angularFrequencyRadPerUs = 2.0 * StrictMath.PI * pulse.carrierMhz();
            this.samplingIntervalUs = samplingIntervalUs;
            this.absolute = reading == PeakReading.ABSOLUTE;
            this.boundRatio = boundRatio;
            this.budget = Objects.requireNonNull(budget, "budget");
        }

        double minimumReadRatio() {
            // Refuse at once what cannot fit: the two end evaluations alone would exceed the budget.
            if (budget.wouldExceed(2.0 * walkLengthBound(envelopeRatePerUs2, samplingIntervalUs, boundRatio))) {
                throw SearchBudget.Exhausted.predicted(budget);
            }
            double right = samplingIntervalUs / 2.0;
            evaluate(0.0);
            double leftMaximum = lastMaximum;
            int leftIndex = lastIndex;
            evaluate(right);
            if (lastMaximum < stopBelow) {
                return lastMaximum;
            }
            double minimum = minimumOver(0.0, leftMaximum, leftIndex, right, lastMaximum, lastIndex, 0);
            if (minimum < stopBelow) {
                return minimum;
            }
            // The bound holds by construction; keep rounding from reporting below it or above 1.
            return StrictMath.min(1.0, StrictMath.max(minimum, boundRatio));
        }

        /** The read value of sample k at phase phi: |s| or s at t = k dt + phi. */
        double sampleValue(int k, double phaseUs) {
            budget.spend(1);
            double t = k * samplingIntervalUs + phaseUs;
            double v = StrictMath.exp(-envelopeRatePerUs2 * t * t) * StrictMath.cos(angularFrequencyRadPerUs * t);
            return absolute ? StrictMath.abs(v) : v;
        }

        /**
         * R(phi) = max_k of the read sample values, for phi in [0, dt/2]. Samples are visited in
         * order of |t| (k = 0, -1, 1, -2, 2, ...), so the envelope falls monotonically and the walk
         * stops at the first sample whose envelope cannot beat the maximum so far.
         */
        void evaluate(double phaseUs) {
            double maximum = Double.NEGATIVE_INFINITY;
            int index = 0;
            for (int j = 0; ; j++) {
                budget.spend(1); // bounds the walk: the envelope may not fall within any budget
                int k = (j & 1) == 0 ? j / 2 : -(j + 1) / 2;
                double t = k * samplingIntervalUs + phaseUs;
                double envelope = StrictMath.exp(-envelopeRatePerUs2 * t * t);
                if (envelope <= maximum) {
                    break;
                }
                double v = envelope * StrictMath.cos(angularFrequencyRadPerUs * t);
                if (absolute) {
                    v = StrictMath.abs(v);
                }
                if (v > maximum) {
                    maximum = v;
                    index = k;
                }
            }
            lastMaximum = maximum;
            lastIndex = index;
        }

        /**
         * The phase in (left, right) where sample k's carrier crosses zero, or NaN when there is
         * none (there is at most one: the interval is shorter than a quarter period).
         */
        double zeroInside(int k, double leftUs, double rightUs) {
            // cos(2 pi fc t) = 0 where 2 fc t - 1/2 is an integer.
            double offsetUs = k * samplingIntervalUs;
            double jLeft = StrictMath.floor(2.0 * carrierMhz * (offsetUs + leftUs) - 0.5);
            double jRight = StrictMath.floor(2.0 * carrierMhz * (offsetUs + rightUs) - 0.5);
            if (jLeft == jRight) {
                return Double.NaN;
            }
            double zeroUs = (jRight + 0.5) / (2.0 * carrierMhz) - offsetUs;
            return zeroUs > leftUs && zeroUs < rightUs ? zeroUs : Double.NaN;
        }

        /**
         * The minimum of R over [left, right], given R and the index holding it at both ends.
         */
        double minimumOver(double leftUs, double leftMaximum, int leftIndex,
                           double rightUs, double rightMaximum, int rightIndex, int depth) {
            if (depth > MAX_DEPTH) {
                throw SearchBudget.Exhausted.predicted(budget); // not reached in the tests' ranges
            }
            double zeroUs = zeroInside(leftIndex, leftUs, rightUs);
            if (Double.isNaN(zeroUs)) {
                zeroUs = zeroInside(rightIndex, leftUs, rightUs);
            }
            if (!Double.isNaN(zeroUs)) {
                return split(leftUs, leftMaximum, leftIndex, zeroUs, rightUs, rightMaximum, rightIndex, depth);
            }
            double endMinimum = StrictMath.min(leftMaximum, rightMaximum);
            if (leftIndex == rightIndex) {
                return endMinimum; // one log-concave curve bounds R from below on the interval
            }
            double crossingUs = crossing(leftIndex, rightIndex, leftUs, leftMaximum, rightUs, rightMaximum);
            double leftCurve = sampleValue(leftIndex, crossingUs);
            double rightCurve = sampleValue(rightIndex, crossingUs);
            evaluate(crossingUs);
            double crossingMaximum = lastMaximum;
            if (crossingMaximum < stopBelow) {
                return crossingMaximum;
            }
            if (crossingMaximum <= StrictMath.max(leftCurve, rightCurve) * (1.0 + TIE_RELATIVE)) {
                // R >= g_left on [left, crossing] and R >= g_right on [crossing, right], both
                // log-concave there: the minimum is at an end or at the crossing.
                return StrictMath.min(endMinimum, crossingMaximum);
            }
            return split(leftUs, leftMaximum, leftIndex, crossingUs, rightUs, rightMaximum, rightIndex, depth);
        }

        private double split(double leftUs, double leftMaximum, int leftIndex, double middleUs,
                             double rightUs, double rightMaximum, int rightIndex, int depth) {
            evaluate(middleUs);
            double middleMaximum = lastMaximum;
            int middleIndex = lastIndex;
            if (middleMaximum < stopBelow) {
                return middleMaximum;
            }
            double left = minimumOver(leftUs, leftMaximum, leftIndex, middleUs, middleMaximum, middleIndex, depth + 1);
            if (left < stopBelow) {
                return left;
            }
            double right = minimumOver(middleUs, middleMaximum, middleIndex, rightUs, rightMaximum, rightIndex, depth + 1);
            return StrictMath.min(left, right);
        }

        /** Where g_left = g_right in [left, right]: g_left - g_right goes from >= 0 to <= 0. */
        private double crossing(int leftIndex, int rightIndex, double leftUs, double leftMaximum,
                                double rightUs, double rightMaximum) {
            double atLeft = leftMaximum - sampleValue(rightIndex, leftUs);
            double atRight = sampleValue(leftIndex, rightUs) - rightMaximum;
            if (atLeft <= 0.0) {
                return leftUs;
            }
            if (atRight >= 0.0) {
                return rightUs;
            }
            if (solver == null) {
                solver = new BrentSolver(2e-16, samplingIntervalUs * 1e-15);
            }
            try {
                return solver.solve(CROSSING_MAX_EVALUATIONS,
                        phase -> sampleValue(leftIndex, phase) - sampleValue(rightIndex, phase), leftUs, rightUs);
            } catch (TooManyEvaluationsException e) {
                throw SearchBudget.Exhausted.predicted(budget);
            }
        }
    }
}
