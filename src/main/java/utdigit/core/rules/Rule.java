package utdigit.core.rules;

import java.util.List;
import java.util.Objects;
import java.util.Set;

/**
 * One requirement of a profile: {@code metric comparison limit}, applicable to some techniques and
 * under conditions on other metrics.
 *
 * @param id stable id within the profile
 * @param title what the rule checks, in words
 * @param metric the snake_case name of a computed value or sheet input
 * @param comparison AT_LEAST, AT_MOST or EQUALS
 * @param limit a number or another metric
 * @param techniques the sheet techniques it applies to; empty: all
 * @param when conditions on other metrics, all of which must hold for the rule to apply
 * @param source where the requirement comes from (document, edition, clause, or common practice)
 */
public record Rule(String id, String title, String metric, Comparison comparison, Limit limit,
                   Set<String> techniques, List<Condition> when, String source) {
    public Rule {
        Objects.requireNonNull(id);
        Objects.requireNonNull(title);
        Objects.requireNonNull(metric);
        Objects.requireNonNull(comparison);
        Objects.requireNonNull(limit);
        Objects.requireNonNull(source);
        techniques = Set.copyOf(techniques);
        when = List.copyOf(when);
    }

    public boolean appliesToTechnique(String technique) {
        return techniques.isEmpty() || techniques.contains(technique);
    }
}
