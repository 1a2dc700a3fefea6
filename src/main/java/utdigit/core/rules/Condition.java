package utdigit.core.rules;

import java.util.Objects;

/**
 * A condition on another metric that decides whether a rule applies, e.g. a thickness band
 * ({@code thickness_mm at_most 75}).
 */
public record Condition(String metric, Comparison comparison, double value) {
    public Condition {
        Objects.requireNonNull(metric);
        Objects.requireNonNull(comparison);
    }
}
