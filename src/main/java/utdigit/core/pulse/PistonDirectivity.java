package utdigit.core.pulse;

import java.util.Optional;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.special.BesselJ;
import utdigit.core.common.Checks;
import utdigit.core.common.Decibels;

/**
 * Far-field directivity of a circular piston (a round probe element) and the beam-spread constants
 * solved from it.
 *
 * <p>The far-field pressure of a baffled circular piston of diameter D, relative to the axis, is
 * D(x) = 2 J1(x) / x with x = pi D sin(theta) / lambda (the Fraunhofer integral of a uniform
 * circular aperture, derived in src/docs/methods.md 2.6). A beam-spread half-angle follows from a
 * constant k with sin(theta) = k lambda / D, where x = pi k solves D(x) = level (one-way, transmit
 * or receive alone) or D(x)^2 = level (pulse-echo, two-way: the same element transmits and
 * receives). The first null is the first zero of J1.
 *
 * <p>The constants are solved, not typed in: J1 from Apache Commons Math 3.6.1 {@link BesselJ}, the
 * root by {@link BrentSolver} to {@value #SOLVER_ABSOLUTE_ACCURACY} in x. The pulse-echo -6 dB and
 * -20 dB constants and the first null are solved once, when the class loads. BesselJ computes with
 * Commons Math's FastMath, which is pure Java (its square root is the correctly rounded
 * {@link Math#sqrt}), so the constants are the same bits on every Java 17 platform.
 */
public final class PistonDirectivity {
    private PistonDirectivity() {}

    /** Absolute accuracy in x of the root solver. */
    static final double SOLVER_ABSOLUTE_ACCURACY = 1e-15;
    /** Relative accuracy in x of the root solver. */
    private static final double SOLVER_RELATIVE_ACCURACY = 1e-15;
    private static final int SOLVER_MAX_EVALUATIONS = 500;

    /** A bracket [3, 4.5] of the first zero of J1 (J1(3) > 0 > J1(4.5), no other zero inside). */
    private static final double FIRST_ZERO_BRACKET_LOW = 3.0;
    private static final double FIRST_ZERO_BRACKET_HIGH = 4.5;

    /** j1,1, the first positive zero of J1 (about 3.8317, solved at class load). */
    private static final double FIRST_ZERO_OF_J1 = solveFirstZeroOfJ1();
    /** The first-null constant k = j1,1 / pi (about 1.2197; src/docs/methods.md 11). */
    private static final double FIRST_NULL_CONSTANT = FIRST_ZERO_OF_J1 / StrictMath.PI;
    /** The pulse-echo -6 dB constant (about 0.5137; src/docs/methods.md 11). */
    private static final double TWO_WAY_6DB_CONSTANT = solveConstant(6.0, true);
    /** The pulse-echo -20 dB constant (about 0.8694; src/docs/methods.md 11). */
    private static final double TWO_WAY_20DB_CONSTANT = solveConstant(20.0, true);

    /**
     * The far-field directivity of a circular piston, D(x) = 2 J1(x) / x, with D(0) = 1.
     *
     * @param x pi D sin(theta) / lambda, dimensionless, finite and >= 0
     * @return the pressure relative to the axis, in [-0.133, 1]
     *     <p>Reference: src/docs/methods.md 2.6 (derived there); J1 by Apache Commons
     *     Math 3.6.1 BesselJ.
     */
    public static double directivity(double x) {
        Checks.nonNegative("x", x);
        if (x == 0.0) {
            return 1.0;
        }
        return 2.0 * BesselJ.value(1.0, x) / x;
    }

    /**
     * The first-null constant k = j1,1 / pi (about 1.2197; src/docs/methods.md 11): the first zero of the
     * directivity lies at sin(theta) = k lambda / D, one-way and two-way alike.
     *
     * @return k, dimensionless (solved once from J1)
     */
    public static double firstNullConstant() {
        return FIRST_NULL_CONSTANT;
    }

    /**
     * The pulse-echo (two-way) beam-spread constant of a level: k such that D(pi k)^2 = 10^(-L/20),
     * k in (0, j1,1 / pi). The -6 dB constant is about 0.5137, the -20 dB constant about 0.8694
     * (src/docs/methods.md 11); both are solved once and cached, other levels are solved on each call.
     *
     * @param levelDb the level L below the axis, dB; -6 and 6 both mean 6 dB below; finite, not 0
     * @return k, dimensionless
     */
    public static double twoWayConstant(double levelDb) {
        double belowDb = Checks.positive("level_db", StrictMath.abs(levelDb));
        if (belowDb == 6.0) {
            return TWO_WAY_6DB_CONSTANT;
        }
        if (belowDb == 20.0) {
            return TWO_WAY_20DB_CONSTANT;
        }
        return solveConstant(belowDb, true);
    }

    /**
     * The one-way (transmit or receive alone) beam-spread constant of a level: k such that
     * D(pi k) = 10^(-L/20), k in (0, j1,1 / pi). Solved on each call.
     *
     * @param levelDb the level L below the axis, dB; -6 and 6 both mean 6 dB below; finite, not 0
     * @return k, dimensionless
     */
    public static double oneWayConstant(double levelDb) {
        double belowDb = Checks.positive("level_db", StrictMath.abs(levelDb));
        return solveConstant(belowDb, false);
    }

    /**
     * The beam-spread half-angle of a constant: sin(theta) = k lambda / D.
     *
     * @param constant k (from {@link #twoWayConstant}, {@link #oneWayConstant} or
     *     {@link #firstNullConstant}), > 0
     * @param wavelengthMm wavelength lambda in the part, mm, > 0
     * @param elementDiameterMm element diameter D, mm, > 0
     * @return the half-angle in degrees, in (0, 90); empty when k lambda / D >= 1 (the element is too
     *     small for the wavelength: the beam does not fall to that level in front of the element)
     */
    public static Optional<Double> halfAngleDeg(double constant, double wavelengthMm, double elementDiameterMm) {
        Checks.positive("constant", constant);
        Checks.positive("wavelength_mm", wavelengthMm);
        Checks.positive("element_diameter_mm", elementDiameterMm);
        double sine = sineOfHalfAngle(constant, wavelengthMm, elementDiameterMm);
        if (sine >= 1.0) {
            return Optional.empty();
        }
        return Optional.of(StrictMath.toDegrees(StrictMath.asin(sine)));
    }

    /** k lambda / D: the sine of the half-angle when it is below 1. */
    public static double sineOfHalfAngle(double constant, double wavelengthMm, double elementDiameterMm) {
        return constant * wavelengthMm / elementDiameterMm;
    }

    private static double solveFirstZeroOfJ1() {
        UnivariateFunction j1 = x -> BesselJ.value(1.0, x);
        return newSolver().solve(SOLVER_MAX_EVALUATIONS, j1, FIRST_ZERO_BRACKET_LOW, FIRST_ZERO_BRACKET_HIGH);
    }

    /**
     * Solves D(x) = r (one-way) or D(x)^2 = r (two-way), r = 10^(-belowDb/20), on the main lobe
     * (0, j1,1), where D falls monotonically from 1 to 0, and returns k = x / pi.
     */
    private static double solveConstant(double belowDb, boolean twoWay) {
        double ratio = Decibels.toRatio(-belowDb);
        UnivariateFunction excess = twoWay
                ? x -> {
                    double d = directivity(x);
                    return d * d - ratio;
                }
                : x -> directivity(x) - ratio;
        double x = newSolver().solve(SOLVER_MAX_EVALUATIONS, excess, 0.0, FIRST_ZERO_OF_J1);
        return x / StrictMath.PI;
    }

    private static BrentSolver newSolver() {
        return new BrentSolver(SOLVER_RELATIVE_ACCURACY, SOLVER_ABSOLUTE_ACCURACY);
    }
}
