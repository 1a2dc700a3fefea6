package utdigit.core.sheets;

import java.util.List;
import java.util.Map;
import utdigit.core.common.Reference;
import utdigit.core.common.Warning;
import utdigit.core.rules.Finding;
import utdigit.core.rules.RequirementProfile;
import utdigit.core.rules.Verdict;

/**
 * The evaluation of a technique sheet against one or more profiles.
 *
 * @param values every metric computed or given, by name, in a stable order
 * @param findings the failed feasibility checks first, then one per applicable rule of each profile,
 *     in the profiles' order
 * @param verdict the worst of the profiles' verdicts, FAIL when a feasibility check failed
 * @param profiles each profile with its own verdict, in the order asked
 * @param cautions the profiles' cautions (without repeats) followed by the service's
 * @param warnings the calculators' warnings, each message prefixed with its calculation
 * @param references the calculators' references, without repeats
 */
public record SheetResult(Map<String, Double> values, List<Finding> findings, Verdict verdict,
                          List<ProfileVerdict> profiles, List<String> cautions, List<Warning> warnings,
                          List<Reference> references) {
    public SheetResult {
        values = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(values));
        findings = List.copyOf(findings);
        profiles = List.copyOf(profiles);
        cautions = List.copyOf(cautions);
        warnings = List.copyOf(warnings);
        references = List.copyOf(references);
    }

    /** A profile and its verdict on the sheet: FAIL, INCOMPLETE, NOT_COVERED or PASS. */
    public record ProfileVerdict(RequirementProfile profile, Verdict verdict) {}
}
