package utdigit.core.pulse;

import java.util.Optional;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import utdigit.core.common.Checks;
import utdigit.core.common.Decibels;

/**
 * The spectrum of the real (two-sided) Gaussian pulse, used to say how far the one-sided model's
 * lower band edges are from the real pulse's.
 *
 * <p>The real pulse exp(-a t^2) cos(2 pi fc t) has the amplitude spectrum, up to a constant,
 * S(f) = G(f - fc) + G(f + fc) with G(x) = exp(-pi^2 x^2 / a) (the Fourier pair
 * exp(-a t^2) and sqrt(pi/a) exp(-pi^2 f^2 / a), shifted to +/- fc by the cosine). The one-sided
 * model of {@link GaussianPulse} keeps G(f - fc) alone. The image G(f + fc) lifts the spectrum at
 * f by the ratio G(f + fc) / G(f - fc) = exp(-4 pi^2 f fc / a), which matters at low frequencies:
 * at 80 % bandwidth the real -20 dB lower edge lies 0.6 % below the model's, at 70 % the -40 dB
 * lower edge 17 % below. Frequencies in MHz, a in 1/us^2.
 *
 * <p>Reference: (derived) from the Fourier transform of the scipy.signal.gausspulse pulse; roots by
 * Apache Commons Math 3.6.1 BrentSolver to {@value #SOLVER_ABSOLUTE_ACCURACY_MHZ} MHz.
 */
public final class RealPulseSpectrum {
    private RealPulseSpectrum() {}

    /** Absolute accuracy of the root solver, MHz. */
    static final double SOLVER_ABSOLUTE_ACCURACY_MHZ = 1e-12;
    private static final double SOLVER_RELATIVE_ACCURACY = 1e-14;
    private static final int SOLVER_MAX_EVALUATIONS = 500;

    /**
     * The amplitude ratio of the negative-frequency image to the one-sided model at a frequency:
     * exp(-4 pi^2 f fc / a).
     *
     * @param model the pulse model
     * @param frequencyMhz frequency f, MHz, >= 0
     * @return the ratio, in (0, 1] for f >= 0
     */
    public static double imageRatio(GaussianPulse model, double frequencyMhz) {
        Checks.nonNegative("frequency_mhz", frequencyMhz);
        return StrictMath.exp(-4.0 * StrictMath.PI * StrictMath.PI * frequencyMhz * model.carrierMhz()
                / model.envelopeRatePerUs2());
    }

    /**
     * First-order estimate of how far below the model's lower edge the real pulse's lies, as a
     * fraction of the edge: the image lifts the level at the model edge f by 20 log10(1 + rho) dB
     * (rho the {@link #imageRatio}), and the model's level rises there at 12 u / h dB per MHz
     * (h = bw fc / 2, u = sqrt(L / 6)), so the edge moves down by about
     * 20 log10(1 + rho) h / (12 u) MHz. Accurate for small shifts (within a few % of the solved
     * shift below 1 %), an underestimate for large ones. Used to skip solving where the shift is
     * negligible.
     *
     * <p>Reference: (derived) from the spectrum above.
     *
     * @param model the pulse model
     * @param levelDb the level L below the peak, dB; not 0
     * @return the estimated fraction (>= 0); NaN when the model's edge is at or below 0 Hz
     */
    public static double estimatedLowerEdgeShiftFraction(GaussianPulse model, double levelDb) {
        double belowDb = Checks.positive("level_db", StrictMath.abs(levelDb));
        double edgeMhz = model.lowerEdgeMhz(belowDb);
        if (!(edgeMhz > 0)) {
            return Double.NaN;
        }
        double liftDb = Decibels.fromRatio(1.0 + imageRatio(model, edgeMhz));
        double halfBandMhz = model.fractionalBandwidth() * model.carrierMhz() / 2.0;
        double slopeDbPerMhz = 12.0 * StrictMath.sqrt(belowDb / 6.0) / halfBandMhz;
        return liftDb / slopeDbPerMhz / edgeMhz;
    }

    /**
     * The real pulse's amplitude spectrum S(f) = G(f - fc) + G(f + fc), G(x) = exp(-pi^2 x^2 / a),
     * unnormalised (S(fc) is about 1).
     *
     * @param model the pulse model
     * @param frequencyMhz frequency f, MHz
     * @return S(f), dimensionless
     */
    public static double amplitude(GaussianPulse model, double frequencyMhz) {
        return gaussian(model, frequencyMhz - model.carrierMhz()) + gaussian(model, frequencyMhz + model.carrierMhz());
    }

    /**
     * The frequency of the real spectrum's peak: the root of S'(f) = 0, that is of
     * (f - fc) G(f - fc) + (f + fc) G(f + fc) = 0, in [fc/2, fc] (for fractional bandwidths below
     * 2 the peak lies there: the image pulls it below fc, at most to fc/2).
     *
     * @param model the pulse model, fractional bandwidth below 2
     * @return the peak frequency, MHz
     */
    public static double peakFrequencyMhz(GaussianPulse model) {
        double fc = model.carrierMhz();
        UnivariateFunction slope = f -> (f - fc) * gaussian(model, f - fc) + (f + fc) * gaussian(model, f + fc);
        if (slope.value(fc) == 0.0) {
            return fc;
        }
        return newSolver().solve(SOLVER_MAX_EVALUATIONS, slope, fc / 2.0, fc);
    }

    /**
     * The real pulse's lower band edge at a level: the frequency below the peak where S(f) is
     * {@code levelDb} below S at the peak.
     *
     * @param model the pulse model, fractional bandwidth below 2
     * @param levelDb the level L below the peak, dB; -20 and 20 both mean 20 dB below; not 0
     * @return the edge in MHz; empty when S(0) is above the level (the real spectrum does not fall
     *     that far above 0 Hz)
     */
    public static Optional<Double> lowerEdgeMhz(GaussianPulse model, double levelDb) {
        double belowDb = Checks.positive("level_db", StrictMath.abs(levelDb));
        double peakMhz = peakFrequencyMhz(model);
        double thresholdAmplitude = amplitude(model, peakMhz) * Decibels.toRatio(-belowDb);
        UnivariateFunction excess = f -> amplitude(model, f) - thresholdAmplitude;
        if (!(excess.value(0.0) < 0)) {
            return Optional.empty();
        }
        return Optional.of(newSolver().solve(SOLVER_MAX_EVALUATIONS, excess, 0.0, peakMhz));
    }

    private static double gaussian(GaussianPulse model, double offsetMhz) {
        return StrictMath.exp(-StrictMath.PI * StrictMath.PI * offsetMhz * offsetMhz / model.envelopeRatePerUs2());
    }

    private static BrentSolver newSolver() {
        return new BrentSolver(SOLVER_RELATIVE_ACCURACY, SOLVER_ABSOLUTE_ACCURACY_MHZ);
    }
}
