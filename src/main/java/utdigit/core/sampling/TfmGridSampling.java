package utdigit.core.sampling;

import org.apache.commons.math3.analysis.solvers.BisectionSolver;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import utdigit.core.common.CalculationException;
import utdigit.core.common.Checks;
import utdigit.core.common.Decibels;
import utdigit.core.common.Units;
import utdigit.core.pulse.GaussianPulse;

/**
 * Amplitude lost by the pixel grid of a TFM image: a reflector between two grid points is read at
 * the nearer one. Every figure here is a derived model; the code's own amplitude-fidelity check on
 * a reference reflector governs (src/docs/methods.md 3.7).
 */
public final class TfmGridSampling {
    private TfmGridSampling() {}

    /**
     * The lateral -6 dB width factor k of w_lat = k lambda z / A: twice the root x of
     * sinc(x)^2 = 10^(-6/20), sinc(x) = sin(pi x)/(pi x), i.e. the full width where the one-way
     * sinc directivity of an aperture A at depth z falls to -3 dB, two-way -6 dB (paraxial).
     * Solved at class load (Brent's method, Apache Commons Math BrentSolver, to 1e-15); about
     * 0.8845 (src/docs/methods.md 11: "about 0.884"). Reference: paraxial line-aperture directivity (derived).
     */
    public static final double LATERAL_WIDTH_FACTOR = solveLateralWidthFactor();

    /** The evaluation bound of the largest-depth-step search: 51 halvings of 2 values, with margin. */
    public static final int BISECTION_MAX_EVALUATIONS = 120;

    /**
     * The -6 dB width in depth of a pulse-echo image's response, w = v tau(-6 dB) / 2, mm, with
     * tau the pulse model's -6 dB envelope duration (halved: the depth axis is a round trip).
     * Reference: src/docs/methods.md 3.7 (derived).
     */
    public static double depthResponseWidthMm(double velocityMPerS, GaussianPulse pulse) {
        Checks.positive("velocity_m_per_s", velocityMPerS);
        return Units.mPerSToMmPerUs(velocityMPerS) * pulse.envelopeDurationUs(6.0) / 2.0;
    }

    /**
     * Worst-case loss of the carrier of an RF image sampled in depth with step dz:
     * -20 log10(cos(2 pi dz / lambda)) dB (the RF image repeats every lambda/2 in pulse-echo; the
     * reflector midway between two grid points is read dz/2 off its peak).
     *
     * <p>Valid for 0 < dz < lambda/4 (no bound at and beyond lambda/4: a grid point can fall on a
     * zero of the RF image). Reference: derived model.
     *
     * @param stepMm dz, mm
     * @param wavelengthMm lambda, mm
     */
    public static double carrierDepthLossDb(double stepMm, double wavelengthMm) {
        Checks.positive("tfm_grid_spacing_mm", stepMm);
        Checks.positive("wavelength_mm", wavelengthMm);
        if (!(stepMm < wavelengthMm / 4.0)) {
            throw CalculationException.invalid("tfm_grid_spacing_mm", stepMm, "must be below lambda/4 for a bound");
        }
        return 0.0 - Decibels.fromRatio(StrictMath.cos(2.0 * StrictMath.PI * stepMm / wavelengthMm));
    }

    /**
     * Worst-case loss of a Gaussian response of -6 dB full width w sampled with step d, read at
     * d/2 from its peak: 6 (d/w)^2 dB (the response's level at offset x is -6 (2x/w)^2 dB).
     *
     * <p>Used for the envelope in depth (w = v tau(-6 dB)/2) and for the lateral step
     * (w = w_lat). Exact for a Gaussian response; the quadratic is a model beyond d ~ w.
     * Reference: derived model.
     *
     * @param stepMm d, mm, > 0
     * @param widthMm w, mm, > 0
     */
    public static double gaussianStepLossDb(double stepMm, double widthMm) {
        Checks.positive("step_mm", stepMm);
        Checks.positive("width_mm", widthMm);
        double ratio = stepMm / widthMm;
        return 6.0 * ratio * ratio;
    }

    /**
     * The largest depth step of an RF image whose worst-case loss stays within X dB: the root of
     * -20 log10(cos(2 pi dz/lambda)) + 6 (dz/w)^2 = X, or without a width (envelope term omitted)
     * the closed form dz = lambda arccos(10^(-X/20)) / (2 pi).
     *
     * <p>The loss rises monotonically from 0 at dz = 0; each one-term root bounds the root from
     * above. Solved by bisection (Apache Commons Math BisectionSolver) to 1e-15 of the bracket: a
     * bound of {@value #BISECTION_MAX_EVALUATIONS} evaluations that holds for every input.
     * Reference: derived model, solved numerically.
     *
     * @param amplitudeToleranceDb X, dB, > 0
     * @param wavelengthMm lambda, mm
     * @param depthWidthMm w, mm, or null to omit the envelope term
     */
    public static double maxRfDepthStepMm(double amplitudeToleranceDb, double wavelengthMm, Double depthWidthMm) {
        Checks.positive("amplitude_tolerance_db", amplitudeToleranceDb);
        Checks.positive("wavelength_mm", wavelengthMm);
        double carrierOnlyMm = wavelengthMm * StrictMath.acos(Decibels.toRatio(-amplitudeToleranceDb))
                / (2.0 * StrictMath.PI);
        if (depthWidthMm == null) {
            return carrierOnlyMm;
        }
        double widthMm = Checks.positive("width_mm", depthWidthMm);
        // Each term alone reaches X no later than the sum: the root lies below both one-term roots,
        // where both terms are finite whatever the magnitudes (no overflow of (dz/w)^2).
        double upperMm = StrictMath.min(carrierOnlyMm, maxGaussianStepMm(amplitudeToleranceDb, widthMm));
        if (!(upperMm > 0.0)) {
            return upperMm; // both one-term roots underflow to 0: so does the root
        }
        // Bisection halves the bracket each time: at most log2(1e15) + 1 = 51 halvings, 2 values each.
        double accuracyMm = StrictMath.max(upperMm * 1e-15, 2.0 * StrictMath.ulp(upperMm));
        return new BisectionSolver(accuracyMm).solve(BISECTION_MAX_EVALUATIONS,
                dz -> -Decibels.fromRatio(StrictMath.cos(2.0 * StrictMath.PI * dz / wavelengthMm))
                        + 6.0 * (dz / widthMm) * (dz / widthMm) - amplitudeToleranceDb,
                0.0, upperMm);
    }

    /**
     * The largest step of a Gaussian response of -6 dB width w within X dB: d = w sqrt(X / 6),
     * the inverse of {@link #gaussianStepLossDb}. Reference: derived model.
     */
    public static double maxGaussianStepMm(double amplitudeToleranceDb, double widthMm) {
        Checks.positive("amplitude_tolerance_db", amplitudeToleranceDb);
        Checks.positive("width_mm", widthMm);
        return widthMm * StrictMath.sqrt(amplitudeToleranceDb / 6.0);
    }

    /**
     * Lateral -6 dB width of a focused TFM image point (paraxial): w_lat = k lambda z / A with
     * k = {@link #LATERAL_WIDTH_FACTOR}, mm.
     *
     * @param wavelengthMm lambda, mm, > 0
     * @param depthMm z, mm, > 0
     * @param apertureMm A, mm, > 0
     */
    public static double lateralWidthMm(double wavelengthMm, double depthMm, double apertureMm) {
        Checks.positive("wavelength_mm", wavelengthMm);
        Checks.positive("tfm_depth_mm", depthMm);
        Checks.positive("tfm_aperture_mm", apertureMm);
        return LATERAL_WIDTH_FACTOR * wavelengthMm * depthMm / apertureMm;
    }

    private static double solveLateralWidthFactor() {
        double target = Decibels.toRatio(-6.0);
        BrentSolver solver = new BrentSolver(1e-15, 1e-16);
        double x = solver.solve(1000, v -> {
            double sinc = StrictMath.sin(StrictMath.PI * v) / (StrictMath.PI * v);
            return sinc * sinc - target;
        }, 0.1, 0.9);
        return 2.0 * x;
    }
}
