package utdigit.web.common;

import static io.restassured.RestAssured.given;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import io.restassured.http.ContentType;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ObjectNode;
import utdigit.web.support.ApiTest;

/**
 * Every answer with length results carries their inch mirrors in {@code in_inches}: x_in = x_mm / 25.4
 * (the inch is 25.4 mm exactly, NIST SP 811 B.8), present and null exactly as its mm field; the
 * warnings quote the inch value beside each length in mm; an answer to a request in inches is
 * reproducible from its own (mm) inputs (stamp verification).
 */
class InchMirrorsApiTest extends ApiTest {
    private static final JsonMapper JSON = JsonMapper.builder().build();

    private static JsonNode answer(String path, String body) {
        return JSON.readTree(post(path, body).statusCode(200).extract().asString());
    }

    /** Each x_mm (and x_mm_per_s) of the answer against its mirror; the names of the mirrors checked. */
    private static List<String> checkMirrors(JsonNode answer) {
        JsonNode mirrors = answer.path("in_inches");
        List<String> checked = new ArrayList<>();
        for (Map.Entry<String, JsonNode> field : answer.properties()) {
            String name = field.getKey();
            String mirror = name.endsWith("_mm_per_s") ? name.replace("_mm_per_s", "_in_per_s")
                    : name.endsWith("_mm") ? name.substring(0, name.length() - 3) + "_in" : null;
            if (mirror == null || answer.has(mirror)) {
                continue; // not a length, or its inch form is a field of its own (wavelength_in)
            }
            JsonNode mm = field.getValue();
            assertThat(mirrors.has(mirror)).as(mirror).isTrue();
            if (mm.isNull()) {
                assertThat(mirrors.get(mirror).isNull()).as(mirror + " null as " + name).isTrue();
            } else {
                assertThat(mirrors.get(mirror).doubleValue() * 25.4).as(mirror)
                        .isCloseTo(mm.doubleValue(), within(4 * Math.ulp(mm.doubleValue())));
            }
            checked.add(mirror);
        }
        // nothing else in in_inches: every mirror has its mm field
        mirrors.propertyNames().forEach(n -> assertThat(checked).as("mirror without its mm field").contains(n));
        return checked;
    }

    @ParameterizedTest
    @ValueSource(strings = {"pulse-parameters", "array-apertures", "scan-coverages", "acquisition-budgets",
            "sampling-assessments", "thickness-resolutions", "time-of-flight-resolutions", "tofd-setups"})
    void theExampleAnswersMirrorEveryLengthResult(String calculation) throws Exception {
        String request = Files.readString(Path.of("api-examples", calculation + ".json"));
        assertThat(checkMirrors(answer("/api/" + calculation, request))).isNotEmpty();
    }

    @Test
    void anAnswerWithoutLengthResultsHasNoMirrors() {
        JsonNode a = answer("/api/pulse-parameters", """
                {"frequency_mhz": 5, "velocity_m_per_s": 5920}""");
        assertThat(a.has("in_inches")).isFalse();
    }

    @Test
    void aRequestInInchesGetsMirrorsNullsAndMessagesInBothUnitsAndStaysReproducible() {
        // 10 mm element (0.3937 in), distance 10 mm inside the 21.1 mm near field (N = D^2 f / (4 v)):
        // beam_diameter_6db_mm is null, and so is its mirror.
        String body = String.format(java.util.Locale.ROOT, """
                {"frequency_mhz": 5, "velocity_m_per_s": 5920, "element_diameter_in": %s, "distance_in": %s,
                 "wedge_velocity_in_per_us": %s, "incident_angle_deg": 10}""",
                10.0 / 25.4, 10.0 / 25.4, 2730.0 / 25400.0);
        String text = post("/api/pulse-parameters", body).statusCode(200).extract().asString();
        JsonNode a = JSON.readTree(text);
        checkMirrors(a);
        assertThat(a.get("in_inches").get("beam_diameter_6db_in").isNull()).isTrue();
        assertThat(a.get("in_inches").get("near_field_length_in").doubleValue())
                .isCloseTo(100.0 * 5 / (4 * 5.92) / 25.4, within(1e-12));
        // the warning quotes the caller's distance in inches too: 10 mm = 0.3937 in (4 significant digits)
        assertThat(a.get("warnings").valueStream().map(w -> w.get("message").asString()))
                .anySatisfy(m -> assertThat(m).contains("distance_mm 10 (0.3937 in)"));
        ObjectNode request = JSON.createObjectNode();
        request.set("document", a);
        String verification = given().contentType(ContentType.JSON).body(request.toString())
                .post("/api/stamp-verifications").then().statusCode(200).extract().asString();
        assertThat(JSON.readTree(verification).get("reproducible").asBoolean()).isTrue();
    }
}
