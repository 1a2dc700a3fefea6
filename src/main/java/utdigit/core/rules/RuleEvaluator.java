package utdigit.core.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * Checks a sheet's values against a profile. A rule applies when the sheet's technique is one of
 * its techniques and all its conditions hold; a condition on a metric the sheet lacks leaves the
 * rule NOT_EVALUATED (it might apply). The profile's verdict is FAIL when any applicable rule fails,
 * else INCOMPLETE when any could not be evaluated, else NOT_COVERED when no rule applies, else PASS:
 * PASS needs at least one applicable rule, and all of them passed.
 */
public final class RuleEvaluator {
    private RuleEvaluator() {}

    /** The findings of every rule that applies or might apply, in the profile's order. */
    public static List<Finding> evaluate(RequirementProfile profile, String technique, Map<String, Double> values) {
        List<Finding> findings = new ArrayList<>();
        for (Rule rule : profile.rules()) {
            if (!rule.appliesToTechnique(technique)) {
                continue;
            }
            List<String> missing = new ArrayList<>();
            boolean applies = true;
            for (Condition c : rule.when()) {
                Double v = values.get(c.metric());
                if (v == null) {
                    missing.add(c.metric());
                } else if (!c.comparison().holds(v, c.value())) {
                    applies = false;
                }
            }
            if (!applies) {
                continue;
            }
            Double actual = values.get(rule.metric());
            Double limit = rule.limit().resolve(values);
            if (actual == null) {
                missing.add(rule.metric());
            }
            if (limit == null) {
                missing.add(rule.limit().metric());
            }
            Verdict verdict = !missing.isEmpty() ? Verdict.NOT_EVALUATED
                    : rule.comparison().holds(actual, limit) ? Verdict.PASS : Verdict.FAIL;
            findings.add(new Finding(profile.id(), rule.id(), null, rule.metric(), actual, limit,
                    rule.limit().metric(), rule.comparison(), verdict, missing, List.of(), null, List.of()));
        }
        return findings;
    }

    /**
     * FAIL if any finding failed; else INCOMPLETE if any was not evaluated; else NOT_COVERED when
     * there is no finding (no rule applies); else PASS.
     */
    public static Verdict verdict(List<Finding> findings) {
        if (findings.isEmpty()) {
            return Verdict.NOT_COVERED;
        }
        boolean incomplete = false;
        for (Finding f : findings) {
            if (f.verdict() == Verdict.FAIL) {
                return Verdict.FAIL;
            }
            if (f.verdict() == Verdict.NOT_EVALUATED) {
                incomplete = true;
            }
        }
        return incomplete ? Verdict.INCOMPLETE : Verdict.PASS;
    }
}
