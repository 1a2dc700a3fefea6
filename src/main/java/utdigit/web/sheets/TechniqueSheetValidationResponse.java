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
        @Schema(description = "The sheet's identifier, as sent") String sheetId,
        @Schema(description = "The sheet's revision, as sent") String revision,
        @Schema(description = "The profiles the sheet was checked against, in the order asked, each with its own "
                + "verdict") List<ProfileRef> profiles,
        @Schema(description = "PASS, FAIL, INCOMPLETE or NOT_COVERED: the worst of the profiles' verdicts, FAIL "
                + "when a feasibility check failed", implementation = String.class,
                allowableValues = {"PASS", "FAIL", "INCOMPLETE", "NOT_COVERED"}) Verdict verdict,
        @Schema(description = "The failed feasibility checks of the service (profile_id service-feasibility) "
                + "first, then one finding per applicable rule of each profile, in the profiles' order. A finding "
                + "names its rule (profile_id, rule_id) and gives the figures compared; the rule's title and source "
                + "are at GET /api/requirement-profiles/{profile_id}/rules/{rule_id}")
        List<FindingView> findings,
        @Schema(description = "Every metric computed or given, by name (lengths in mm, velocity in m/s); counts "
                + "(bit_depth, focal_laws, levels, samples_per_a_scan, bytes_per_position...) as integers")
        Map<String, Number> values,
        @Schema(description = "The profiles' cautions, then the service's") List<String> cautions,
        @Schema(description = "The normalised sheet; itself a valid request that reproduces this answer")
        TechniqueSheetRequest inputs,
        VelocitySourceView velocitySource,
        List<WarningView> warnings,
        @Schema(description = "Each source the sheet's figures use, once, by its catalogue id (the full citation at "
                + "GET /api/references/{id}); its topic names the sheet's calculations that cite it (pulse, sampling, "
                + "quantization, time of flight, thickness, acquisition, combined amplitude error and the set-up's "
                + "calculations), the single endpoint of each calculation names the figures")
        List<ReferenceView> references) {

    /** A profile a sheet was checked against, with its verdict. */
    @Schema(name = "ProfileReference")
    record ProfileRef(
            @Schema(description = "Profile id", example = "common-practice") String id,
            @Schema(description = "Profile version", example = "1") String version,
            @Schema(description = "SHA-256 of the profile's canonical content") @JsonProperty("sha256") String sha256,
            @Schema(description = "VERIFIED or UNVERIFIED") VerificationStatus verificationStatus,
            @Schema(description = "The profile's verdict on the sheet: FAIL, INCOMPLETE, NOT_COVERED (no rule of "
                    + "the profile applies to the sheet) or PASS", implementation = String.class,
                    allowableValues = {"PASS", "FAIL", "INCOMPLETE", "NOT_COVERED"}) Verdict verdict) {}

    /** The outcome of one rule, or of a failed feasibility check. */
    @Schema(name = "Finding")
    record FindingView(
            @Schema(description = "The profile of the rule; service-feasibility for the service's own "
                    + "feasibility checks, which every sheet gets (settings physically impossible together: the same "
                    + "check a single endpoint answers with 422)") String profileId,
            @Schema(description = "Rule id within the profile; its title and source are the profile's "
                    + "(GET /api/requirement-profiles/{profile_id}/rules/{rule_id})") String ruleId,
            @Schema(description = "What a feasibility check checks; only on the service's feasibility checks, "
                    + "whose text no profile holds") String title,
            @Schema(description = "The metric checked; absent for a feasibility check") String metric,
            @Schema(description = "The metric's value; null when it could not be computed or for a feasibility "
                    + "check", format = "double", types = {"number", "null"})
            @JsonInclude(JsonInclude.Include.ALWAYS) Double actual,
            @Schema(description = "The limit's value; null when it names a metric that could not be computed or "
                    + "for a feasibility check", format = "double", types = {"number", "null"})
            @JsonInclude(JsonInclude.Include.ALWAYS) Double limit,
            @Schema(description = "The metric the limit names, when the limit is a metric") String limitMetric,
            @Schema(description = "AT_LEAST, AT_MOST or EQUALS; absent for a feasibility check") Comparison comparison,
            @Schema(description = "PASS, FAIL or NOT_EVALUATED", implementation = String.class,
                    allowableValues = {"PASS", "FAIL", "NOT_EVALUATED"})
            Verdict verdict,
            @Schema(description = "Metrics the rule needed that the sheet does not give or allow to compute")
            List<String> missing,
            @Schema(description = "JSON Pointers of the sheet inputs to add so that the missing metrics can be "
                    + "computed (each names the mm, m/s or us form; its inch form, or material for a velocity, "
                    + "does as well; for a wrap-around limit a max_round_trip_us does instead of max_sound_path_mm, "
                    + "for a gate a gate_length_mm instead of gate_length_us)")
            List<String> missingInputs,
            @Schema(description = "Why a feasibility check failed, quoting the settings (lengths in mm, each "
                    + "followed by its inch value)") String reason,
            @Schema(description = "JSON Pointers of the sheet settings a failed feasibility check found impossible "
                    + "together") List<String> settings) {}
}
