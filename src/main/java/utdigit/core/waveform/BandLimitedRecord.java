package utdigit.core.waveform;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;
import utdigit.core.common.Decibels;
import utdigit.core.common.SearchBudget;
import utdigit.core.sampling.PeakReading;

/**
 * The band-limited reconstruction of a record, and the worst case over the sampling phase of its
 * peak read at another rate.
 *
 * <p>Reconstruction: the mean-removed record, zero-padded to a power of two at or above twice its
 * length (so that the periodic reconstruction does not wrap one end onto the other), is resampled
 * {@value #UPSAMPLING} times finer by zero-padding its discrete Fourier transform (the method of
 * scipy.signal.resample, the Nyquist bin split in half); between those points the pulse is read by
 * 4-point Lagrange (cubic) interpolation. At the record's own Nyquist frequency the fine grid holds
 * 64 points per period, so the cubic reads a sinusoid within about 2e-6 of its amplitude, and the
 * pulse's band (well below that) far closer.
 *
 * <p>Worst case over the phase phi of the read peak max_k g(phi + k dt) (g = |s| for ABSOLUTE,
 * s for POSITIVE_PEAK): every sample set holds a sample within dt/2 of the peak, which reads at
 * least L0 = peak - M2 dt^2/8 (M2 the largest |s''|); samples that read below L0 are never the
 * maximum, so only the stretches of the record above L0 are visited. The phase is scanned in steps
 * no wider than the fine grid, and each of the lowest local minima is refined by Brent's method
 * (Apache Commons Math BrentOptimizer). The work of one loss is at most one visit of every fine
 * point (at most 32 x 2 x {@link WaveformInput#MAX_SAMPLES}), whatever the rate.
 */
final class BandLimitedRecord {
    /** The fine grid's points per record sample. */
    static final int UPSAMPLING = 32;
    /** Local minima of the phase scan that are refined. */
    private static final int REFINED_MINIMA = 4;
    /**
     * Work bound of one worst-case search over the sampling phase, in values of the reconstruction
     * read (about 20 ns each warm): the search answers or reports its bound for every record and rate.
     */
    public static final long LOSS_SEARCH_BUDGET = 3_000_000;
    /**
     * Units charged for each phase evaluation besides its values read (the call, the stretches, an
     * optimizer step): keeps the count proportional to the time where few values are read.
     */
    static final long READ_OVERHEAD = 64;
    /** Work bound of the required-rate search (its scan and bisection), in values of the reconstruction. */
    public static final long RATE_SEARCH_BUDGET = 12_000_000;
    /** Margin on the largest second derivative read from the fine grid's second differences. */
    private static final double SECOND_DERIVATIVE_MARGIN = 1.02;

    private final double[] fine;
    private final double fineIntervalUs;
    private final double spanUs;

    /**
     * @param centred the record, mean removed
     * @param recordSamplingFrequencyMhz its rate, MHz
     */
    BandLimitedRecord(double[] centred, double recordSamplingFrequencyMhz) {
        int n = centred.length;
        int padded = Fft.powerOfTwoAtLeast(2 * n);
        double[][] x = Fft.forward(centred, padded);
        int m = padded * UPSAMPLING;
        double[][] z = new double[2][m];
        int half = padded / 2;
        for (int k = 0; k < half; k++) {
            z[0][k] = x[0][k];
            z[1][k] = x[1][k];
        }
        for (int k = half + 1; k < padded; k++) {
            z[0][m - padded + k] = x[0][k];
            z[1][m - padded + k] = x[1][k];
        }
        z[0][half] = x[0][half] / 2.0;
        z[1][half] = x[1][half] / 2.0;
        z[0][m - half] += x[0][half] / 2.0;
        z[1][m - half] += x[1][half] / 2.0;
        Fft.inverseInPlace(z);
        int span = UPSAMPLING * (n - 1) + 1;
        fine = new double[span];
        for (int j = 0; j < span; j++) {
            fine[j] = z[0][j] * UPSAMPLING;
        }
        fineIntervalUs = 1.0 / (recordSamplingFrequencyMhz * UPSAMPLING);
        spanUs = (span - 1) * fineIntervalUs;
    }

    /** The interval of the fine grid, us. */
    double fineIntervalUs() {
        return fineIntervalUs;
    }

    /** The duration the record spans, us (first to last sample). */
    double spanUs() {
        return spanUs;
    }

    /** The reconstructed pulse at {@code timeUs} from the record's first sample (0 outside the record). */
    double value(double timeUs) {
        if (timeUs < 0.0 || timeUs > spanUs) {
            return 0.0;
        }
        double u = timeUs / fineIntervalUs;
        int j = (int) StrictMath.floor(u);
        if (j >= fine.length - 1) {
            return fine[fine.length - 1];
        }
        double d = u - j;
        double pm1 = at(j - 1);
        double p0 = fine[j];
        double p1 = fine[j + 1];
        double p2 = at(j + 2);
        // 4-point Lagrange through j-1, j, j+1, j+2 at j + d.
        return -d * (d - 1) * (d - 2) / 6.0 * pm1
                + (d + 1) * (d - 1) * (d - 2) / 2.0 * p0
                - (d + 1) * d * (d - 2) / 2.0 * p1
                + (d + 1) * d * (d - 1) / 6.0 * p2;
    }

    private double at(int j) {
        return j < 0 || j >= fine.length ? 0.0 : fine[j];
    }

    /** The read value of the pulse: |s| or s. */
    private static double read(double value, PeakReading reading) {
        return reading == PeakReading.ABSOLUTE ? StrictMath.abs(value) : value;
    }

    /** The true peak of the read pulse (max |s| or max s), refined by a parabola through the grid's top. */
    double peak(PeakReading reading) {
        int best = 0;
        for (int j = 1; j < fine.length; j++) {
            if (read(fine[j], reading) > read(fine[best], reading)) {
                best = j;
            }
        }
        double b = read(fine[best], reading);
        if (best == 0 || best == fine.length - 1) {
            return b;
        }
        double a = read(fine[best - 1], reading);
        double c = read(fine[best + 1], reading);
        double curvature = a - 2.0 * b + c;
        if (!(curvature < 0.0)) {
            return b;
        }
        double offset = 0.5 * (a - c) / curvature;
        return StrictMath.max(b, b - 0.25 * (a - c) * offset);
    }

    /** The largest |s''| of the reconstruction, per us^2, from the fine grid's second differences with a margin. */
    double secondDerivativeBound() {
        double h2 = fineIntervalUs * fineIntervalUs;
        double max = 0.0;
        for (int j = 1; j < fine.length - 1; j++) {
            max = StrictMath.max(max, StrictMath.abs(fine[j + 1] - 2.0 * fine[j] + fine[j - 1]));
        }
        return max / h2 * SECOND_DERIVATIVE_MARGIN;
    }

    /**
     * The worst case over the sampling phase of the read peak at interval {@code intervalUs}.
     *
     * @return {ratio of the worst read peak to the true peak, the worst phase in us from the record's first sample}
     */
    double[] worstCase(double intervalUs, PeakReading reading, double peak, double secondDerivative,
                       SearchBudget budget) {
        budget.spend(fine.length);
        double floor = peak - secondDerivative * intervalUs * intervalUs / 8.0;
        double slack = secondDerivative * fineIntervalUs * fineIntervalUs;
        List<double[]> stretches = new ArrayList<>();
        int start = -1;
        for (int j = 0; j <= fine.length; j++) {
            boolean active = j < fine.length && (floor <= 0.0 || read(fine[j], reading) >= floor - slack);
            if (active && start < 0) {
                start = j;
            } else if (!active && start >= 0) {
                stretches.add(new double[] {StrictMath.max(0, start - 1) * fineIntervalUs,
                        StrictMath.min(fine.length - 1, j) * fineIntervalUs});
                start = -1;
            }
        }
        if (stretches.isEmpty()) {
            stretches.add(new double[] {0.0, spanUs});
        }
        double[][] parts = stretches.toArray(new double[0][]);
        int phases = (int) StrictMath.max(16, StrictMath.ceil(intervalUs / fineIntervalUs));
        double step = intervalUs / phases;
        budget.spend(phases);
        double[] r = new double[phases];
        for (int p = 0; p < phases; p++) {
            r[p] = readPeak(p * step, intervalUs, reading, parts, budget);
        }
        // The lowest local minima of the (periodic) scan, refined.
        Integer[] order = new Integer[phases];
        for (int p = 0; p < phases; p++) {
            order[p] = p;
        }
        Arrays.sort(order, (i, j) -> Double.compare(r[i], r[j]));
        double worst = r[order[0]];
        double worstPhase = order[0] * step;
        BrentOptimizer optimizer = new BrentOptimizer(1e-12, intervalUs * 1e-12);
        int refined = 0;
        for (int i = 0; i < phases && refined < REFINED_MINIMA; i++) {
            int p = order[i];
            double before = r[(p - 1 + phases) % phases];
            double after = r[(p + 1) % phases];
            if (r[p] > before || r[p] > after) {
                continue;
            }
            refined++;
            double centre = p * step;
            var point = optimizer.optimize(new MaxEval(400), GoalType.MINIMIZE,
                    new UnivariateObjectiveFunction(phi -> readPeak(phi, intervalUs, reading, parts, budget)),
                    new SearchInterval(centre - step, centre + step, centre));
            if (point.getValue() < worst) {
                worst = point.getValue();
                worstPhase = point.getPoint();
            }
        }
        worstPhase = worstPhase - StrictMath.floor(worstPhase / intervalUs) * intervalUs;
        return new double[] {StrictMath.min(1.0, worst / peak), worstPhase};
    }

    /** max over samples phi + k dt inside the stretches of the read value. */
    private double readPeak(double phaseUs, double intervalUs, PeakReading reading, double[][] parts,
                            SearchBudget budget) {
        double max = Double.NEGATIVE_INFINITY;
        for (double[] part : parts) {
            long from = (long) StrictMath.ceil((part[0] - phaseUs) / intervalUs);
            long to = (long) StrictMath.floor((part[1] - phaseUs) / intervalUs);
            if (budget.wouldExceed((double) to - from + 1.0 + READ_OVERHEAD)) {
                throw SearchBudget.Exhausted.predicted(budget);
            }
            budget.spend(StrictMath.max(0L, to - from + 1) + READ_OVERHEAD);
            for (long k = from; k <= to; k++) {
                max = StrictMath.max(max, read(value(phaseUs + k * intervalUs), reading));
            }
        }
        return max;
    }

    /**
     * The rate, MHz, above which every rate keeps the worst-case loss within {@code toleranceDb}:
     * start where the curvature bound peak - M2 dt^2/8 meets 10^(-X/20) of the peak (every faster rate
     * passes), scan down in {@code scanStep} relative steps while the loss passes, then bisect the
     * last passing and first failing rate to {@code bisection} relative. Rates at or below
     * {@code floorMhz} count as failing. Every evaluation spends from {@code budget}.
     *
     * @throws SearchBudget.Exhausted when the search reaches its bound
     */
    double requiredRateMhz(double toleranceDb, PeakReading reading, double floorMhz, double scanStep,
                           double bisection, SearchBudget budget) {
        double peak = peak(reading);
        double m2 = secondDerivativeBound();
        double ratio = Decibels.toRatio(-toleranceDb);
        double passing = 1.0 / StrictMath.sqrt(8.0 * peak * (1.0 - ratio) / m2);
        for (int i = 0; i < 64 && !passes(passing, toleranceDb, reading, peak, m2, floorMhz, budget); i++) {
            passing *= 1.01; // interpolation rounding at the bound itself
        }
        double failing;
        while (true) {
            double next = passing * (1.0 - scanStep);
            if (!passes(next, toleranceDb, reading, peak, m2, floorMhz, budget)) {
                failing = next;
                break;
            }
            passing = next;
        }
        while (passing - failing > bisection * passing) {
            double middle = 0.5 * (passing + failing);
            if (passes(middle, toleranceDb, reading, peak, m2, floorMhz, budget)) {
                passing = middle;
            } else {
                failing = middle;
            }
        }
        return passing;
    }

    private boolean passes(double rateMhz, double toleranceDb, PeakReading reading, double peak, double m2,
                           double floorMhz, SearchBudget budget) {
        if (!(rateMhz > floorMhz)) {
            return false;
        }
        double ratio = worstCase(1.0 / rateMhz, reading, peak, m2, budget)[0];
        return ratio > 0.0 && -Decibels.fromRatio(ratio) <= toleranceDb;
    }
}
