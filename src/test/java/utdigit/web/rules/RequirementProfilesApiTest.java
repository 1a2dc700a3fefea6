package utdigit.web.rules;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.contains;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.everyItem;
import static org.hamcrest.Matchers.hasItems;
import static org.hamcrest.Matchers.hasKey;
import static org.hamcrest.Matchers.matchesPattern;
import static org.hamcrest.Matchers.not;

import java.nio.file.Path;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import utdigit.web.support.ApiTest;

class RequirementProfilesApiTest extends ApiTest {
    private static final String HEX_SHA256 = "[0-9a-f]{64}";

    /** The same files loaded without Spring: the API shows what the catalog holds. */
    private static final ProfileCatalog CATALOG = new ProfileCatalog((Path) null);

    @Test
    void listShowsEveryBuiltInProfileWithItsStatusAndHash() {
        given().get("/api/requirement-profiles").then().statusCode(200)
                .contentType("application/json")
                .body("profiles.id", contains("common-practice", "example-paut", "example-tfm",
                        "example-tofd-signal-processing", "example-tofd"))
                .body("profiles.verification_status", everyItem(equalTo("UNVERIFIED")))
                .body("profiles.sha256", everyItem(matchesPattern(HEX_SHA256)))
                .body("profiles[0].sha256", equalTo(CATALOG.find("common-practice").orElseThrow().sha256()))
                .body("profiles[0].title", equalTo("Common practice for digitized UT technique sheets"))
                .body("profiles[0].version", equalTo("2"))
                .body("profiles[0]", not(hasKey("rules")));
    }

    @Test
    void oneShowsTheWholeProfile() {
        given().get("/api/requirement-profiles/common-practice").then().statusCode(200)
                .body("id", equalTo("common-practice"))
                .body("verification_status", equalTo("UNVERIFIED"))
                .body("documents.size()", equalTo(0))
                .body("cautions[0]", containsString("Rules of thumb of the trade"))
                .body("sha256", equalTo(CATALOG.find("common-practice").orElseThrow().sha256()))
                .body("rules.id", hasItems("samples-per-period", "scan-speed", "combined-amplitude-error"))
                .body("rules[0].metric", equalTo("samples_per_period"))
                .body("rules[0].comparison", equalTo("AT_LEAST"))
                .body("rules[0].limit", equalTo(5.0))
                .body("rules[0]", not(hasKey("limit_metric")))
                .body("rules[0].techniques", contains("PULSE_ECHO", "PHASED_ARRAY", "TOFD", "TFM"))
                .body("rules[0].when.size()", equalTo(0))
                .body("rules[0].source", equalTo("common practice, no published source"))
                .body("rules[1].comparison", equalTo("AT_MOST"))
                .body("rules[1].limit_metric", equalTo("max_scan_speed_mm_per_s"))
                .body("rules[1]", not(hasKey("limit")));
    }

    @Test
    void oneShowsDocumentsTechniquesAndConditions() {
        given().get("/api/requirement-profiles/example-paut").then().statusCode(200)
                .body("documents[0].edition", equalTo("2013"))
                .body("documents[0].clause", equalTo("clause not verified"))
                .body("rules[1].techniques", contains("PHASED_ARRAY"))
                .body("rules[1].when[0].metric", equalTo("thickness_mm"))
                .body("rules[1].when[0].comparison", equalTo("AT_MOST"))
                .body("rules[1].when[0].value", equalTo(75.0))
                .body("rules[2].when[0].comparison", equalTo("ABOVE"))
                .body("rules[2].limit", equalTo(2.0));
    }

    @Test
    void oneRuleAsASheetFindingNamesIt() {
        // The rule a finding {profile_id common-practice, rule_id scan-speed} names: the same text the whole
        // profile gives, with the profile's version and hash to match the sheet answer's profiles entry.
        given().get("/api/requirement-profiles/common-practice/rules/scan-speed").then().statusCode(200)
                .body("profile_id", equalTo("common-practice"))
                .body("profile_version", equalTo("2"))
                .body("profile_sha256", equalTo(CATALOG.find("common-practice").orElseThrow().sha256()))
                .body("verification_status", equalTo("UNVERIFIED"))
                .body("rule.id", equalTo("scan-speed"))
                .body("rule.title", equalTo(CATALOG.find("common-practice").orElseThrow().rules().stream()
                        .filter(r -> r.id().equals("scan-speed")).findFirst().orElseThrow().title()))
                .body("rule.metric", equalTo("planned_scan_speed_mm_per_s"))
                .body("rule.comparison", equalTo("AT_MOST"))
                .body("rule.limit_metric", equalTo("max_scan_speed_mm_per_s"))
                .body("rule.source", containsString("common practice, no published source"));
    }

    @Test
    void openApiDocumentsBothOperations() {
        given().get("/v3/api-docs").then().statusCode(200)
                .body("paths.'/api/requirement-profiles'.get.summary", equalTo("List the requirement profiles"))
                .body("paths.'/api/requirement-profiles/{id}'.get.description", containsString("UNVERIFIED"))
                .body("paths.'/api/requirement-profiles/{id}'.get.responses", hasKey("404"))
                .body("components.schemas.RequirementProfile.properties", hasKey("sha256"))
                .body("components.schemas.RequirementRule.properties", hasKey("limit_metric"));
    }

    @Nested
    class Rejected {
        @Test
        void unknownIdIsA404Problem() {
            given().get("/api/requirement-profiles/no-such-profile").then().statusCode(404)
                    .contentType("application/problem+json")
                    .body("type", equalTo("/problems/not-found"))
                    .body("title", equalTo("Not found"))
                    .body("detail", containsString("no-such-profile"))
                    .body("detail", containsString("common-practice"));
        }

        @Test
        void unknownRuleOrProfileOfARuleIsA404Problem() {
            given().get("/api/requirement-profiles/common-practice/rules/no-such-rule").then().statusCode(404)
                    .contentType("application/problem+json")
                    .body("type", equalTo("/problems/not-found"))
                    .body("detail", containsString("no-such-rule"))
                    .body("detail", containsString("samples-per-period"));
            given().get("/api/requirement-profiles/service-feasibility/rules/gate-within-firing-period").then()
                    .statusCode(404).body("detail", containsString("service-feasibility"));
        }

        @Test
        void postIsA405Problem() {
            given().post("/api/requirement-profiles").then().statusCode(405)
                    .body("type", equalTo("/problems/method-not-allowed"));
        }
    }
}
