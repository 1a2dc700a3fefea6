package utdigit.web.rules;

import com.fasterxml.jackson.annotation.JsonProperty;
import io.swagger.v3.oas.annotations.media.Schema;
import java.util.List;
import utdigit.core.rules.Comparison;
import utdigit.core.rules.Condition;
import utdigit.core.rules.Document;
import utdigit.core.rules.RequirementProfile;
import utdigit.core.rules.Rule;
import utdigit.core.rules.VerificationStatus;

/** What GET /api/requirement-profiles, /{id} and /{id}/rules/{rule_id} answer. */
final class ProfileViews {
    private ProfileViews() {}

    private static final String SHA256 = "Lower-case hex SHA-256 of the RFC 8785 canonical JSON of the profile file's "
            + "parsed content: it changes with any value, not with comments or layout";

    @Schema(name = "RequirementProfileList")
    record ProfileList(@Schema(description = "Every loaded profile: built-in ones first, then the operator's")
                       List<Summary> profiles) {
        static ProfileList of(List<RequirementProfile> profiles) {
            return new ProfileList(profiles.stream().map(Summary::of).toList());
        }
    }

    @Schema(name = "RequirementProfileSummary")
    record Summary(
            @Schema(description = "Kebab-case id, to use as profile_id of a technique sheet", example = "common-practice")
            String id,
            @Schema(description = "What the profile holds", example = "Common practice for digitized UT technique sheets")
            String title,
            @Schema(description = "The profile's own version, as its author writes it", example = "1")
            String version,
            @Schema(description = "VERIFIED: checked by a qualified person against the cited edition; UNVERIFIED: a "
                    + "transcription or recollection to verify before relying on it")
            VerificationStatus verificationStatus,
            @Schema(description = SHA256, pattern = "^[0-9a-f]{64}$")
            @JsonProperty("sha256")
            String sha256) {
        static Summary of(RequirementProfile p) {
            return new Summary(p.id(), p.title(), p.version(), p.verificationStatus(), p.sha256());
        }
    }

    @Schema(name = "RequirementProfile", description = "A named set of rules a technique sheet is checked against. "
            + "The governing code edition decides; example profiles are UNVERIFIED transcriptions.")
    record ProfileView(
            @Schema(description = "Kebab-case id", example = "example-paut")
            String id,
            @Schema(description = "What the profile holds")
            String title,
            @Schema(description = "The profile's own version", example = "1")
            String version,
            @Schema(description = "The documents the profile transcribes; empty for common practice")
            List<DocumentView> documents,
            @Schema(description = "VERIFIED or UNVERIFIED")
            VerificationStatus verificationStatus,
            @Schema(description = "What the reader must know before relying on the profile")
            List<String> cautions,
            @Schema(description = "The rules, in the profile's order")
            List<RuleView> rules,
            @Schema(description = SHA256, pattern = "^[0-9a-f]{64}$")
            @JsonProperty("sha256")
            String sha256) {
        static ProfileView of(RequirementProfile p) {
            return new ProfileView(p.id(), p.title(), p.version(), p.documents().stream().map(DocumentView::of).toList(),
                    p.verificationStatus(), p.cautions(), p.rules().stream().map(RuleView::of).toList(), p.sha256());
        }
    }

    @Schema(name = "RequirementProfileRule", description = "One rule of a profile, with the profile it belongs to")
    record ProfileRuleView(
            @Schema(description = "The profile's id", example = "common-practice")
            String profileId,
            @Schema(description = "The profile's own version", example = "2")
            String profileVersion,
            @Schema(description = SHA256 + " (the profile's)", pattern = "^[0-9a-f]{64}$")
            @JsonProperty("profile_sha256")
            String profileSha256,
            @Schema(description = "VERIFIED or UNVERIFIED (the profile's)")
            VerificationStatus verificationStatus,
            RuleView rule) {
        static ProfileRuleView of(RequirementProfile p, Rule r) {
            return new ProfileRuleView(p.id(), p.version(), p.sha256(), p.verificationStatus(), RuleView.of(r));
        }
    }

    @Schema(name = "RequirementDocument")
    record DocumentView(
            @Schema(description = "The document", example = "ASME Boiler and Pressure Vessel Code, Section V, Article 4")
            String name,
            @Schema(description = "Its edition, or 'edition not verified'", example = "2013")
            String edition,
            @Schema(description = "Its clause, or 'clause not verified'", example = "clause not verified")
            String clause) {
        static DocumentView of(Document d) {
            return new DocumentView(d.name(), d.edition(), d.clause());
        }
    }

    @Schema(name = "RequirementRule", description = "metric comparison limit, for the techniques listed, when every "
            + "condition holds")
    record RuleView(
            @Schema(description = "Kebab-case id, unique in the profile; findings carry it as rule_id",
                    example = "samples-per-period")
            String id,
            @Schema(description = "What the rule checks, in words")
            String title,
            @Schema(description = "The snake_case name of a sheet input or computed value", example = "samples_per_period")
            String metric,
            @Schema(description = "How the metric is compared with the limit", implementation = String.class,
                    allowableValues = {"AT_LEAST", "AT_MOST", "EQUALS"})
            Comparison comparison,
            @Schema(description = "The limit when it is a number; omitted when it is a metric", format = "double",
                    example = "5")
            Double limit,
            @Schema(description = "The metric of the same sheet that is the limit; omitted for a number",
                    example = "max_scan_speed_mm_per_s")
            String limitMetric,
            @Schema(description = "The sheet techniques the rule applies to, of PULSE_ECHO, PHASED_ARRAY, TOFD, TFM "
                    + "(all four when the profile names none)")
            List<String> techniques,
            @Schema(description = "Conditions on other metrics; the rule applies when all hold")
            List<ConditionView> when,
            @Schema(description = "Where the requirement comes from: document, edition, clause, or common practice")
            String source) {
        static RuleView of(Rule r) {
            List<String> techniques = ProfileYaml.TECHNIQUES.stream().filter(r::appliesToTechnique).toList();
            return new RuleView(r.id(), r.title(), r.metric(), r.comparison(), r.limit().value(), r.limit().metric(),
                    techniques, r.when().stream().map(ConditionView::of).toList(), r.source());
        }
    }

    @Schema(name = "RequirementCondition")
    record ConditionView(
            @Schema(description = "The metric the condition is on", example = "thickness_mm")
            String metric,
            @Schema(description = "How the metric is compared with the value", implementation = String.class,
                    allowableValues = {"AT_LEAST", "AT_MOST", "ABOVE", "BELOW", "EQUALS"})
            Comparison comparison,
            @Schema(description = "The value", format = "double", example = "75")
            double value) {
        static ConditionView of(Condition c) {
            return new ConditionView(c.metric(), c.comparison(), c.value());
        }
    }
}
