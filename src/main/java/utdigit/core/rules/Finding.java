package utdigit.core.rules;

/**
 * The outcome of one applicable rule on one sheet.
 *
 * @param actual the metric's value, or null when it could not be computed
 * @param limit the limit's value, or null when it names a metric that could not be computed
 * @param limitMetric the metric the limit names, or null for a numeric limit
 * @param missing the metric names that were needed and not available, or empty
 */
public record Finding(String ruleId, String title, String metric, Double actual, Double limit,
                      String limitMetric, Comparison comparison, Verdict verdict, String source,
                      java.util.List<String> missing) {
    public Finding {
        missing = java.util.List.copyOf(missing);
    }
}
