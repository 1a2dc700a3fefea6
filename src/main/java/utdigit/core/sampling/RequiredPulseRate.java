package utdigit.core.sampling;

import java.util.Objects;
import java.util.Optional;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import utdigit.core.common.Checks;
import utdigit.core.common.Decibels;
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

    /** Relative width to which the last passing/failing pair is bisected: 1e-4. */
    public static final double BISECTION_RELATIVE_TOLERANCE = 1e-4;

    /** Relative step of the scan below the answer that looks for slower rates that pass: 0.1 %. */
    public static final double SLOWER_SCAN_STEP_FRACTION = 1e-3;

    /** ln 10, for dB of an exponential. */
    private static final double LN_10 = StrictMath.log(10.0);

    /**
     * The answer for RF sampling.
     *
     * @param amplitudeSamplingFrequencyMhz the rate, MHz, above which every rate keeps the pulse
     *     loss within the tolerance (to {@link #BISECTION_RELATIVE_TOLERANCE} relative)
     * @param slowerPassingRateMhz the highest slower rate found that also passes (the loss is not
     *     monotonic in fs for narrow bands), or empty when the scan found none
     */
    public record RfSolution(double amplitudeSamplingFrequencyMhz, Optional<Double> slowerPassingRateMhz) {
        public RfSolution {
            Objects.requireNonNull(slowerPassingRateMhz, "slowerPassingRateMhz");
        }
    }

    /**
     * The rate above which every rate keeps the RF pulse loss ({@link PulseSamplingLoss#rfLossDb})
     * within X dB.
     *
     * <p>Method (src/docs/methods.md 3.3): start at the rate fs0 where the closed-form bound
     * cos(pi fc/fs) exp(-a/(4 fs^2)) equals 10^(-X/20) (Brent's method, Apache Commons Math
     * BrentSolver; the bound falls monotonically with fs, so every faster rate passes); scan down in
     * steps of {@link #SCAN_STEP_FRACTION} while the loss stays within X; bisect the last passing
     * and the first failing rate to {@link #BISECTION_RELATIVE_TOLERANCE} relative and return the
     * passing end. A failing window narrower than one scan step can be missed. Then scan further
     * down in steps of {@link #SLOWER_SCAN_STEP_FRACTION} for a slower rate that passes, stopping at
     * the first one. Rates at or below 2 fc (2 samples per period of the model's carrier) count as
     * failing: the loss has no bound there. Reference: search of our own (derived).
     *
     * <p>Cost: about 0.2-3 ms for bandwidths of 10-120 %, rising steeply for narrower bands as the
     * pulse tends to a continuous wave (about 125 ms worst case at 1 %, seconds below 0.1 %);
     * {@link SamplingCalculator} runs it from 1 % up.
     *
     * @param pulse the pulse model
     * @param reading how the peak is read
     * @param amplitudeToleranceDb X, dB, > 0
     */
    public static RfSolution forRf(GaussianPulse pulse, PeakReading reading, double amplitudeToleranceDb) {
        Objects.requireNonNull(pulse, "pulse");
        Objects.requireNonNull(reading, "peak_reading");
        Checks.positive("amplitude_tolerance_db", amplitudeToleranceDb);
        double startMhz = closedFormBoundRateMhz(pulse, amplitudeToleranceDb);
        // The closed-form root is exact up to rounding: step up by ulps until the rate really passes,
        // so that the answer read back at its own rate is within the tolerance to the last bit.
        for (int i = 0; i < 64 && !passes(pulse, reading, amplitudeToleranceDb, startMhz); i++) {
            startMhz = StrictMath.nextUp(startMhz * (1.0 + 1e-15));
        }

        double passingMhz = startMhz;
        double failingMhz;
        while (true) {
            double nextMhz = passingMhz * (1.0 - SCAN_STEP_FRACTION);
            if (!passes(pulse, reading, amplitudeToleranceDb, nextMhz)) {
                failingMhz = nextMhz;
                break;
            }
            passingMhz = nextMhz;
        }
        while (passingMhz - failingMhz > BISECTION_RELATIVE_TOLERANCE * passingMhz) {
            double middleMhz = 0.5 * (passingMhz + failingMhz);
            if (passes(pulse, reading, amplitudeToleranceDb, middleMhz)) {
                passingMhz = middleMhz;
            } else {
                failingMhz = middleMhz;
            }
        }

        Optional<Double> slower = Optional.empty();
        double floorMhz = 2.0 * pulse.carrierMhz();
        for (double rateMhz = failingMhz * (1.0 - SLOWER_SCAN_STEP_FRACTION);
                rateMhz > floorMhz;
                rateMhz *= 1.0 - SLOWER_SCAN_STEP_FRACTION) {
            if (passes(pulse, reading, amplitudeToleranceDb, rateMhz)) {
                slower = Optional.of(rateMhz);
                break;
            }
        }
        return new RfSolution(passingMhz, slower);
    }

    /**
     * The rate, MHz, where the closed-form bound of the read RF amplitude,
     * cos(pi fc dt) exp(-a dt^2/4), equals 10^(-X/20): every faster rate keeps the RF pulse loss
     * within X dB. Solved for dt in (0, arccos(10^(-X/20))/(pi fc)] with Brent's method on the log
     * of the bound (Apache Commons Math BrentSolver, 1e-15 relative). Reference: methods.md
     * "Sampling adequacy" (derived).
     */
    public static double closedFormBoundRateMhz(GaussianPulse pulse, double amplitudeToleranceDb) {
        Checks.positive("amplitude_tolerance_db", amplitudeToleranceDb);
        double logRatio = StrictMath.log(Decibels.toRatio(-amplitudeToleranceDb));
        double fc = pulse.carrierMhz();
        double a = pulse.envelopeRatePerUs2();
        // At the sine-only interval the bound is already below the tolerance (envelope factor < 1).
        double sineOnlyIntervalUs = StrictMath.acos(Decibels.toRatio(-amplitudeToleranceDb)) / (StrictMath.PI * fc);
        BrentSolver solver = new BrentSolver(1e-15, sineOnlyIntervalUs * 1e-15);
        double intervalUs = solver.solve(1000,
                dt -> StrictMath.log(StrictMath.cos(StrictMath.PI * fc * dt)) - a * dt * dt / 4.0 - logRatio,
                0.0, sineOnlyIntervalUs);
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

    private static boolean passes(GaussianPulse pulse, PeakReading reading, double toleranceDb, double rateMhz) {
        double intervalUs = 1.0 / rateMhz;
        if (!(1.0 / (pulse.carrierMhz() * intervalUs) > 2.0)) {
            return false; // at or below 2 samples per period of the carrier: no bound
        }
        return PulseSamplingLoss.rfLossWithin(pulse, intervalUs, reading, toleranceDb);
    }
}
