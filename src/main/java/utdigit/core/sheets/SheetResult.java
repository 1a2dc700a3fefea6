package utdigit.core.sheets;

import java.util.List;
import java.util.Map;
import utdigit.core.common.Reference;
import utdigit.core.common.Warning;
import utdigit.core.rules.Finding;
import utdigit.core.rules.Verdict;

/**
 * The evaluation of a technique sheet against a profile.
 *
 * @param values every metric computed or given, by name, in a stable order
 * @param findings one per applicable rule, in the profile's order
 * @param verdict FAIL, INCOMPLETE or PASS
 * @param cautions the profile's cautions followed by the service's
 * @param warnings the calculators' warnings, each message prefixed with its calculation
 * @param references the calculators' references, without repeats
 */
public record SheetResult(Map<String, Double> values, List<Finding> findings, Verdict verdict,
                          List<String> cautions, List<Warning> warnings, List<Reference> references) {
    public SheetResult {
        values = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(values));
        findings = List.copyOf(findings);
        cautions = List.copyOf(cautions);
        warnings = List.copyOf(warnings);
        references = List.copyOf(references);
    }
}
