package utdigit.core.arrays;

import java.util.Optional;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import utdigit.core.common.Checks;
import utdigit.core.common.Decibels;

/**
 * Far-field directivity of a uniformly excited rectangular aperture along one side of length L,
 * and the beam-spread constants solved from it.
 *
 * <p>Along a side of length L the far-field pressure relative to the axis is
 * sinc(x) = sin(x) / x with x = pi L sin(theta) / lambda (Fraunhofer diffraction of a uniform slit;
 * array theory, any phased-array text). A beam-spread half-angle follows from a constant k with
 * sin(theta) = k lambda / L, where x = pi k solves sinc(x)^2 = level (pulse-echo, the same aperture
 * transmits and receives). The first null is at x = pi exactly: k = 1.
 *
 * <p>The constants are solved, not typed in: the root by Commons Math's {@link BrentSolver} on the
 * main lobe (0, pi), where sinc falls monotonically from 1 to 0, with at most
 * {@value #SOLVER_MAX_EVALUATIONS} evaluations for every level; the -6 dB and -20 dB constants once,
 * when the class loads.
 */
public final class RectangularDirectivity {
    private RectangularDirectivity() {}

    private static final double SOLVER_ACCURACY = 1e-15;
    static final int SOLVER_MAX_EVALUATIONS = 200;
    /** Below this x, sin(x)/x is 1 - x^2/6 to double precision. */
    private static final double SMALL_X = 1e-8;

    private static final double TWO_WAY_6DB_CONSTANT = solveTwoWayConstant(6.0);
    private static final double TWO_WAY_20DB_CONSTANT = solveTwoWayConstant(20.0);

    /** sinc(x) = sin(x) / x with sinc(0) = 1; x finite and &gt;= 0. */
    public static double directivity(double x) {
        Checks.nonNegative("x", x);
        if (x < SMALL_X) {
            return 1.0 - x * x / 6.0;
        }
        return StrictMath.sin(x) / x;
    }

    /**
     * The pulse-echo (two-way) beam-spread constant of a level L dB below the axis: k in (0, 1) such
     * that sinc(pi k)^2 = 10^(-L/20).
     *
     * @param levelDb the level below the axis, dB; -6 and 6 both mean 6 dB below; finite, not 0
     */
    public static double twoWayConstant(double levelDb) {
        double belowDb = Checks.positive("level_db", StrictMath.abs(levelDb));
        if (belowDb == 6.0) {
            return TWO_WAY_6DB_CONSTANT;
        }
        if (belowDb == 20.0) {
            return TWO_WAY_20DB_CONSTANT;
        }
        return solveTwoWayConstant(belowDb);
    }

    /** The first-null constant: sinc has its first zero at x = pi, so k = 1 exactly. */
    public static double firstNullConstant() {
        return 1.0;
    }

    /**
     * The half-angle of a constant k: sin(theta) = k lambda / L, degrees; empty when
     * k lambda / L &gt;= 1 (the aperture is too short for the wavelength: the beam does not fall to
     * that level in front of it).
     */
    public static Optional<Double> halfAngleDeg(double constant, double wavelengthMm, double apertureMm) {
        Checks.positive("constant", constant);
        Checks.positive("wavelength_mm", wavelengthMm);
        Checks.positive("aperture_mm", apertureMm);
        double sine = constant * wavelengthMm / apertureMm;
        if (sine >= 1.0) {
            return Optional.empty();
        }
        return Optional.of(StrictMath.toDegrees(StrictMath.asin(sine)));
    }

    private static double solveTwoWayConstant(double belowDb) {
        double ratio = Decibels.toRatio(-belowDb);
        UnivariateFunction excess = x -> {
            double d = directivity(x);
            return d * d - ratio;
        };
        double x = new BrentSolver(SOLVER_ACCURACY, SOLVER_ACCURACY)
                .solve(SOLVER_MAX_EVALUATIONS, excess, 0.0, StrictMath.PI);
        return x / StrictMath.PI;
    }
}
