package utdigit.web.sheets;

import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonProperty;
import io.swagger.v3.oas.annotations.media.Schema;
import java.util.List;
import java.util.Map;
import utdigit.core.rules.Comparison;
import utdigit.core.rules.VerificationStatus;
import utdigit.core.rules.Verdict;
import utdigit.web.pipeline.ResultNotes.ReferenceView;
import utdigit.web.pipeline.ResultNotes.WarningView;
import utdigit.web.units.VelocitySourceView;

/** The answer of POST /api/technique-sheet-validations. */
@Schema(name = "TechniqueSheetValidation", description = "The sheet's verdict: FAIL when a feasibility check of "
        + "the service or any applicable rule of a profile fails; else INCOMPLETE when a rule could not be evaluated "
        + "from the sheet's fields; else NOT_COVERED when a profile has no rule that applies to the sheet (nothing "
        + "was checked); else PASS (at least one applicable rule of each profile, all passed). Under several "
        + "profiles the verdict is the worst of theirs. A sheet that breaks rules, or whose settings are impossible "
        + "together, is a 200 answer with findings.")
record TechniqueSheetValidationResponse(
        String sheetId,
        String revision,
        List<ProfileRef> profiles,
        @Schema(implementation = String.class, allowableValues = {"PASS", "FAIL", "INCOMPLETE", "NOT_COVERED"}) Verdict verdict,
        List<FindingView> findings,
        Map<String, Number> values,
        List<String> cautions,
        TechniqueSheetRequest inputs,
        VelocitySourceView velocitySource,
        List<WarningView> warnings,
        List<ReferenceView> references) {

    /** A profile a sheet was checked against, with its verdict. */
    @Schema(name = "ProfileReference",
            description = "The profiles the sheet was checked against, in the order asked, each with its own "
            + "verdict")
    record ProfileRef(
            String id,
            String version,
            @JsonProperty("sha256") String sha256,
            VerificationStatus verificationStatus,
            @Schema(implementation = String.class, allowableValues = {"PASS", "FAIL", "INCOMPLETE", "NOT_COVERED"}) Verdict verdict) {}

    /** The outcome of one rule, or of a failed feasibility check. */
    @Schema(name = "Finding",
            description = "The failed feasibility checks of the service (profile_id service-feasibility) first, "
            + "then one finding per applicable rule of each profile, in the profiles' order. A finding "
            + "names its rule (profile_id, rule_id) and gives the figures compared; the rule's title "
            + "and source are at GET /api/requirement-profiles/{profile_id}/rules/{rule_id}")
    record FindingView(
            String profileId,
            String ruleId,
            String title,
            String metric,
            @JsonInclude(JsonInclude.Include.ALWAYS) Double actual,
            @JsonInclude(JsonInclude.Include.ALWAYS) Double limit,
            String limitMetric,
            Comparison comparison,
            @Schema(implementation = String.class, allowableValues = {"PASS", "FAIL", "NOT_EVALUATED"})
            Verdict verdict,
            List<String> missing,
            List<String> missingInputs,
            String reason,
            List<String> settings) {}
}
