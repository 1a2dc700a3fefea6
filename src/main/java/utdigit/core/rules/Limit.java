package utdigit.core.rules;

import java.util.Map;
import java.util.Objects;

/**
 * The limit of a rule: a number, or the name of another metric of the same sheet (so that
 * "planned_scan_speed_mm_per_s at most max_scan_speed_mm_per_s" is one rule).
 *
 * @param value the number, or null when the limit is a metric
 * @param metric the metric name, or null when the limit is a number
 */
public record Limit(Double value, String metric) {
    public Limit {
        if ((value == null) == (metric == null)) {
            throw new IllegalArgumentException("a limit is a number or a metric name, exactly one");
        }
        if (value != null && !Double.isFinite(value)) {
            throw new IllegalArgumentException("a limit must be finite");
        }
    }

    public static Limit of(double value) {
        return new Limit(value, null);
    }

    public static Limit ofMetric(String metric) {
        return new Limit(null, Objects.requireNonNull(metric));
    }

    /** The limit's value for a sheet's values, or null when it names a metric the sheet lacks. */
    public Double resolve(Map<String, Double> values) {
        return value != null ? value : values.get(metric);
    }

    @Override
    public String toString() {
        return value != null ? String.valueOf(value) : metric;
    }
}
