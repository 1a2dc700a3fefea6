package utdigit.web.openapi;

import static io.restassured.RestAssured.given;
import static org.assertj.core.api.Assertions.assertThat;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;
import utdigit.web.support.ApiTest;

/**
 * The property texts of the served OpenAPI document: every property is described, and every text
 * of {@code contract/properties.yaml} is served where it says (no stale entry). A property that is
 * a {@code $ref}, or an array whose items are one, is described by the schema it refers to (a
 * description beside a {@code $ref} is not written), so that schema must have a description.
 */
class PropertyTextsTest extends ApiTest {
    private final JsonMapper mapper = JsonMapper.builder().build();
    private final PropertyTexts.Texts texts = PropertyTexts.load();
    private JsonNode schemas;

    @BeforeEach
    void fetchServedDocument() {
        String body = given().accept("application/json").get("/v3/api-docs").then().statusCode(200)
                .extract().asString();
        schemas = mapper.readTree(body).path("components").path("schemas");
    }

    @Test
    void everyPropertyOfEveryComponentSchemaIsDescribed() {
        List<String> faults = new ArrayList<>();
        for (Map.Entry<String, JsonNode> schema : schemas.properties()) {
            for (Map.Entry<String, JsonNode> p : schema.getValue().path("properties").properties()) {
                JsonNode property = p.getValue();
                String ref = property.has("$ref") ? property.path("$ref").asString()
                        : property.path("description").isString() ? null : property.path("items").path("$ref").asString(null);
                boolean described = ref != null
                        ? schemas.path(ref.substring(ref.lastIndexOf('/') + 1)).path("description").isString()
                        : !property.path("description").asString("").isBlank();
                if (!described) {
                    faults.add(schema.getKey() + "." + p.getKey());
                }
            }
        }
        assertThat(faults).as("properties without a description").isEmpty();
    }

    @Test
    void everySchemaEntryIsServedAsWritten() {
        List<String> faults = new ArrayList<>();
        texts.schemas().forEach((schema, entries) -> entries.forEach((name, text) -> {
            JsonNode property = schemas.path(schema).path("properties").path(name);
            if (property.isMissingNode()) {
                faults.add(schema + "." + name + ": no such property");
                return;
            }
            if (text.description() != null && !text.description().equals(property.path("description").asString(null))) {
                faults.add(schema + "." + name + ": its record's own description is served instead");
            }
            if (text.example() != null && !sameExample(text.example(), property.path("example"))) {
                faults.add(schema + "." + name + ": its example is not served");
            }
        }));
        assertThat(faults).as("entries of " + PropertyTexts.RESOURCE + " that are stale").isEmpty();
    }

    @Test
    void everyGlossaryEntryIsServedSomewhere() {
        List<String> faults = new ArrayList<>();
        texts.glossary().forEach((name, text) -> {
            boolean description = text.description() == null;
            boolean example = text.example() == null;
            for (JsonNode schema : schemas) {
                JsonNode property = schema.path("properties").path(name);
                description |= text.description() != null
                        && text.description().equals(property.path("description").asString(null));
                example |= text.example() != null && sameExample(text.example(), property.path("example"));
            }
            if (!description || !example) {
                faults.add(name);
            }
        });
        assertThat(faults).as("glossary entries of " + PropertyTexts.RESOURCE + " that no property serves").isEmpty();
    }

    @Test
    void everyInchMirrorNamesALengthOfItsAnswer() {
        List<String> faults = new ArrayList<>();
        int mirrors = 0;
        for (Map.Entry<String, JsonNode> answer : schemas.properties()) {
            String ref = answer.getValue().path("properties").path("in_inches").path("$ref").asString(null);
            if (ref == null) {
                continue;
            }
            JsonNode mirror = schemas.path(ref.substring(ref.lastIndexOf('/') + 1));
            for (Map.Entry<String, JsonNode> p : mirror.path("properties").properties()) {
                mirrors++;
                String mm = p.getKey().endsWith("_in_per_s")
                        ? p.getKey().replaceAll("_in_per_s$", "_mm_per_s") : p.getKey().replaceAll("_in$", "_mm");
                if (!answer.getValue().path("properties").has(mm)
                        || !p.getValue().path("description").asString("").startsWith(mm + " / 25.4, ")) {
                    faults.add(ref + "." + p.getKey());
                }
            }
        }
        assertThat(mirrors).isGreaterThan(30);
        assertThat(faults).as("inch mirrors that name no mm result of their answer").isEmpty();
    }

    @Test
    void theInchFormOfALengthSaysItsMmFormInInches() {
        assertThat(PropertyTexts.derived("depth_in", "depth_mm",
                "Tip depth, mm (> 0, <= 100000); or measured_time_us. Give depth_mm or depth_in"))
                .isEqualTo("Tip depth, in (> 0, at most 100 m); or measured_time_us. Give depth_in or depth_mm");
        assertThat(PropertyTexts.derived("speed_in_per_s", "speed_mm_per_s", "Scan speed, mm/s (> 0, <= 100000)"))
                .isEqualTo("Scan speed, in/s (> 0, at most 3937 in/s)");
        assertThat(PropertyTexts.derived("gap_in", "gap_mm", "A gap in mm")).isNull();
        assertThat(PropertyTexts.mirrorText("max_step_in")).isEqualTo("max_step_mm / 25.4, in; null when it is null");
    }

    private static boolean sameExample(Object expected, JsonNode served) {
        if (expected instanceof String s) {
            return served.isString() && served.asString().equals(s);
        }
        return served.isNumber() && new BigDecimal(expected.toString()).compareTo(served.decimalValue()) == 0;
    }
}
