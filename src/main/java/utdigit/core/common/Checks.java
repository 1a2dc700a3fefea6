package utdigit.core.common;

/**
 * Preconditions of the core formulas. Written as {@code !(x > 0)} so that NaN fails too. The web
 * layer validates ranges before calling the core; these checks guard the core when it is used
 * directly (benchmarks, sheets, tests).
 */
public final class Checks {
    private Checks() {}

    /** Returns {@code x} when it is finite and > 0. */
    public static double positive(String role, double x) {
        if (!(x > 0) || Double.isInfinite(x)) {
            throw CalculationException.invalid(role, x, "must be finite and > 0");
        }
        return x;
    }

    /** Returns {@code x} when it is finite and >= 0. */
    public static double nonNegative(String role, double x) {
        if (!(x >= 0) || Double.isInfinite(x)) {
            throw CalculationException.invalid(role, x, "must be finite and >= 0");
        }
        return x;
    }

    /** Returns {@code x} when it is finite. */
    public static double finite(String role, double x) {
        if (!Double.isFinite(x)) {
            throw CalculationException.invalid(role, x, "must be finite");
        }
        return x;
    }

    /** Returns {@code n} when it is >= 1. */
    public static int atLeastOne(String role, int n) {
        if (n < 1) {
            throw CalculationException.invalid(role, n, "must be >= 1");
        }
        return n;
    }

    /** Returns {@code x} when {@code lowInclusive <= x < highExclusive}. */
    public static double inRangeHalfOpen(String role, double x, double lowInclusive, double highExclusive) {
        if (!(x >= lowInclusive && x < highExclusive)) {
            throw CalculationException.invalid(
                    role, x, "must be >= " + lowInclusive + " and < " + highExclusive);
        }
        return x;
    }
}
