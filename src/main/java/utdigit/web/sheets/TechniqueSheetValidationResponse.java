package utdigit.web.sheets;

import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonProperty;
import io.swagger.v3.oas.annotations.media.Schema;
import java.util.List;
import java.util.Map;
import utdigit.core.rules.Comparison;
import utdigit.core.rules.VerificationStatus;
import utdigit.core.rules.Verdict;
import utdigit.web.common.ResultNotes.ReferenceView;
import utdigit.web.common.ResultNotes.WarningView;
import utdigit.web.common.VelocitySourceView;

/** The answer of POST /api/technique-sheet-validations. */
@Schema(name = "TechniqueSheetValidation", description = "The sheet's verdict against the profile: FAIL when any "
        + "applicable rule fails, else INCOMPLETE when any could not be evaluated from the sheet's fields, else PASS. "
        + "A sheet that breaks rules is a 200 answer with findings.")
record TechniqueSheetValidationResponse(
        @Schema(description = "The sheet's identifier, as sent") String sheetId,
        @Schema(description = "The sheet's revision, as sent") String revision,
        @Schema(description = "The profile the sheet was checked against") ProfileRef profile,
        @Schema(description = "PASS, FAIL or INCOMPLETE", implementation = String.class,
                allowableValues = {"PASS", "FAIL", "INCOMPLETE"})
        Verdict verdict,
        @Schema(description = "One finding per applicable rule, in the profile's order") List<FindingView> findings,
        @Schema(description = "Every metric computed or given, by name (lengths in mm, velocity in m/s)")
        Map<String, Double> values,
        @Schema(description = "The profile's cautions, then the service's") List<String> cautions,
        @Schema(description = "The normalised sheet; itself a valid request that reproduces this answer")
        TechniqueSheetRequest inputs,
        VelocitySourceView velocitySource,
        List<WarningView> warnings,
        List<ReferenceView> references) {

    /** The profile a sheet was checked against. */
    @Schema(name = "ProfileReference")
    record ProfileRef(
            @Schema(description = "Profile id", example = "common-practice") String id,
            @Schema(description = "Profile version", example = "1") String version,
            @Schema(description = "SHA-256 of the profile's canonical content") @JsonProperty("sha256") String sha256,
            @Schema(description = "VERIFIED or UNVERIFIED") VerificationStatus verificationStatus) {}

    /** The outcome of one rule. */
    @Schema(name = "Finding")
    record FindingView(
            @Schema(description = "Rule id within the profile") String ruleId,
            @Schema(description = "What the rule checks") String title,
            @Schema(description = "The metric checked") String metric,
            @Schema(description = "The metric's value; null when it could not be computed", format = "double",
                    types = {"number", "null"})
            @JsonInclude(JsonInclude.Include.ALWAYS) Double actual,
            @Schema(description = "The limit's value; null when it names a metric that could not be computed",
                    format = "double", types = {"number", "null"})
            @JsonInclude(JsonInclude.Include.ALWAYS) Double limit,
            @Schema(description = "The metric the limit names, when the limit is a metric") String limitMetric,
            @Schema(description = "AT_LEAST, AT_MOST or EQUALS") Comparison comparison,
            @Schema(description = "PASS, FAIL or NOT_EVALUATED", implementation = String.class,
                    allowableValues = {"PASS", "FAIL", "NOT_EVALUATED"})
            Verdict verdict,
            @Schema(description = "Where the requirement comes from") String source,
            @Schema(description = "Metrics the rule needed that the sheet does not give or allow to compute")
            List<String> missing) {}
}
