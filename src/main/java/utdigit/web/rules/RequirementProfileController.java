package utdigit.web.rules;

import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.Parameter;
import io.swagger.v3.oas.annotations.media.Content;
import io.swagger.v3.oas.annotations.media.Schema;
import io.swagger.v3.oas.annotations.responses.ApiResponse;
import io.swagger.v3.oas.annotations.tags.Tag;
import org.springframework.http.MediaType;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RestController;
import utdigit.core.rules.RequirementProfile;
import utdigit.core.rules.Rule;
import utdigit.web.problem.NotFoundProblem;
import utdigit.web.rules.ProfileViews.ProfileList;
import utdigit.web.rules.ProfileViews.ProfileRuleView;
import utdigit.web.rules.ProfileViews.ProfileView;

@RestController
@RequestMapping(path = "/api/requirement-profiles", produces = MediaType.APPLICATION_JSON_VALUE)
@Tag(name = "Requirement profiles", description = "The rules technique sheets are validated against, with their "
        + "sources and verification status")
class RequirementProfileController {
    private static final String CAUTION = " Caution: the governing code edition, local codes and the written "
            + "procedure decide; the example profiles are UNVERIFIED transcriptions to verify against the edition "
            + "the contract invokes, and common-practice holds rules of thumb, not code requirements.";

    private final ProfileCatalog catalog;

    RequirementProfileController(ProfileCatalog catalog) {
        this.catalog = catalog;
    }

    @GetMapping
    @Operation(summary = "List the requirement profiles",
            description = "The built-in profiles and those of the operator's directory (utdigit.profiles.directory, "
                    + "UTDIGIT_PROFILES_DIRECTORY), with their verification status and sha256." + CAUTION)
    @ApiResponse(responseCode = "200", description = "Every loaded profile",
            content = @Content(schema = @Schema(implementation = ProfileList.class)))
    ProfileList list() {
        return ProfileList.of(catalog.all());
    }

    @GetMapping("/{id}")
    @Operation(summary = "Show one requirement profile",
            description = "The profile with its documents, cautions, rules (metric, comparison, limit or "
                    + "limit_metric, techniques, conditions, source) and sha256. Unknown id: 404 problem." + CAUTION)
    @ApiResponse(responseCode = "200", description = "The profile",
            content = @Content(schema = @Schema(implementation = ProfileView.class)))
    ProfileView one(@Parameter(description = "Profile id, kebab-case", example = "common-practice")
                    @PathVariable String id) {
        return ProfileView.of(profile(id));
    }

    @GetMapping("/{id}/rules/{rule_id}")
    @Operation(summary = "Show one rule of a requirement profile",
            description = "The rule a technique-sheet finding names by profile_id and rule_id: its title, metric, "
                    + "comparison, limit or limit_metric, techniques, conditions and source, with the profile's "
                    + "version and sha256 to match the sheet answer's profiles entry. Unknown profile or rule: 404 "
                    + "problem (service-feasibility is not a profile: its checks are described in the findings "
                    + "themselves)." + CAUTION)
    @ApiResponse(responseCode = "200", description = "The rule",
            content = @Content(schema = @Schema(implementation = ProfileRuleView.class)))
    ProfileRuleView rule(@Parameter(description = "Profile id, kebab-case", example = "common-practice")
                         @PathVariable String id,
                         @Parameter(description = "Rule id within the profile, kebab-case", example = "scan-speed")
                         @PathVariable("rule_id") String ruleId) {
        RequirementProfile profile = profile(id);
        return profile.rules().stream().filter(r -> r.id().equals(ruleId)).findFirst()
                .map(r -> ProfileRuleView.of(profile, r))
                .orElseThrow(() -> new NotFoundProblem("no rule '" + ruleId + "' in requirement profile '" + id
                        + "'; its rules: " + String.join(", ", profile.rules().stream().map(Rule::id).toList())));
    }

    private RequirementProfile profile(String id) {
        return catalog.find(id).orElseThrow(() -> new NotFoundProblem(
                "no requirement profile '" + id + "'; loaded: " + String.join(", ", catalog.ids())));
    }
}
