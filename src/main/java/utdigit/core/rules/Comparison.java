package utdigit.core.rules;

/**
 * How a rule compares a metric with its limit. Comparisons allow a relative slack of
 * {@link #RELATIVE_SLACK} so that a value computed to equal the limit (25 MHz / 5 MHz = 5 samples
 * per period) is not failed by rounding in the last bit.
 */
public enum Comparison {
    /** actual >= limit. */
    AT_LEAST,
    /** actual <= limit. */
    AT_MOST,
    /** actual == limit (within the slack). */
    EQUALS,
    /** actual > limit (strict; used in conditions such as thickness bands). */
    ABOVE,
    /** actual < limit (strict). */
    BELOW;

    /** Relative slack of every comparison: 1e-9 of the larger magnitude. */
    public static final double RELATIVE_SLACK = 1e-9;

    /** Whether {@code actual} satisfies this comparison with {@code limit}. */
    public boolean holds(double actual, double limit) {
        double slack = RELATIVE_SLACK * Math.max(Math.abs(actual), Math.abs(limit));
        return switch (this) {
            case AT_LEAST -> actual >= limit - slack;
            case AT_MOST -> actual <= limit + slack;
            case EQUALS -> Math.abs(actual - limit) <= slack;
            case ABOVE -> actual > limit + slack;
            case BELOW -> actual < limit - slack;
        };
    }

    /** The snake_case word of the profile format: at_least, at_most, equals, above, below. */
    public String word() {
        return name().toLowerCase(java.util.Locale.ROOT);
    }
}
