package utdigit.core.rules;

import java.util.List;

/**
 * The outcome of one applicable rule on one sheet, or of one of the service's own feasibility
 * checks.
 *
 * <p>A finding names its rule by profile and rule id and carries the figures compared; the rule's
 * wording and source stay in the profile (one copy, not one per sheet).
 *
 * @param profileId the profile the rule belongs to; {@link #FEASIBILITY} for the service's checks
 * @param title what a feasibility check checks, in words (no profile holds it); null for a profile's
 *     rule, whose title and source the profile gives
 * @param actual the metric's value, or null when it could not be computed (or for a feasibility check)
 * @param limit the limit's value, or null when it names a metric that could not be computed
 * @param limitMetric the metric the limit names, or null for a numeric limit
 * @param missing the metric names that were needed and not available, or empty
 * @param missingInputs JSON Pointers of the sheet inputs to add so that the missing metrics can be
 *     computed, or empty
 * @param reason why a feasibility check failed, in words; null for a profile's rule
 * @param settings JSON Pointers of the sheet settings a failed feasibility check found impossible
 *     together; empty for a profile's rule
 */
public record Finding(String profileId, String ruleId, String title, String metric, Double actual, Double limit,
                      String limitMetric, Comparison comparison, Verdict verdict,
                      List<String> missing, List<String> missingInputs, String reason, List<String> settings) {

    /** The profile id of the service's own feasibility checks (reserved: no profile may take it). */
    public static final String FEASIBILITY = "service-feasibility";

    public Finding {
        missing = List.copyOf(missing);
        missingInputs = List.copyOf(missingInputs);
        settings = List.copyOf(settings);
    }

    /** The same finding with the sheet inputs to add. */
    public Finding withMissingInputs(List<String> pointers) {
        return new Finding(profileId, ruleId, title, metric, actual, limit, limitMetric, comparison, verdict,
                missing, pointers, reason, settings);
    }
}
