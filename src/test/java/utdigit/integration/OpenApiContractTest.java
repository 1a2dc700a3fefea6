package utdigit.integration;

import static io.restassured.RestAssured.given;
import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Pattern;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;
import utdigit.web.support.ApiTest;

/**
 * The contract changes only on purpose: the served OpenAPI document must equal the committed
 * {@code api-examples/openapi.json}, and it must keep the conventions of the API (README "Conventions"): documented operations with their problem answers, kebab-case paths, snake_case
 * properties, UPPER_SNAKE_CASE enum values.
 */
class OpenApiContractTest extends ApiTest {
    static final Path COMMITTED = Path.of("api-examples", "openapi.json");
    static final String REGENERATE = "If the change is intended, regenerate the committed copy and commit it with the "
            + "change: mvn -B -DskipTests package && bash api-examples/regenerate-openapi.sh";

    private static final Pattern KEBAB_SEGMENT = Pattern.compile("[a-z0-9]+(-[a-z0-9]+)*|\\{[a-z_]+}");
    private static final Pattern SNAKE = Pattern.compile("[a-z][a-z0-9]*(_[a-z0-9]+)*");
    private static final Pattern UPPER_SNAKE = Pattern.compile("[A-Z][A-Z0-9]*(_[A-Z0-9]+)*");
    private static final String PROBLEM_REF = "#/components/schemas/Problem";

    private final JsonMapper mapper = JsonMapper.builder().build();
    private JsonNode served;

    @BeforeEach
    void fetchServedDocument() {
        String body = given().accept("application/json").get("/v3/api-docs").then().statusCode(200)
                .extract().asString();
        served = mapper.readTree(body);
    }

    @Test
    @DisplayName("the served document equals api-examples/openapi.json")
    void servedDocumentEqualsTheCommittedOne() throws IOException {
        assertThat(COMMITTED).as("the committed OpenAPI document; create it: " + REGENERATE).exists();
        JsonNode committed = mapper.readTree(Files.readString(COMMITTED));
        Optional<JsonDifference.Difference> difference = JsonDifference.first(committed, served);
        assertThat(difference)
                .as(() -> "The served /v3/api-docs differs from " + COMMITTED + " "
                        + difference.map(JsonDifference.Difference::describe).orElse("") + ". " + REGENERATE)
                .isEmpty();
    }

    @Test
    @DisplayName("the served document is the same on every request (no port, no time, no random order)")
    void servedDocumentIsStable() {
        String again = given().accept("application/json").get("/v3/api-docs").then().statusCode(200)
                .extract().asString();
        assertThat(mapper.readTree(again)).isEqualTo(served);
        assertThat(served.path("servers")).hasSize(1);
        assertThat(served.path("servers").get(0).path("url").asString()).isEqualTo("/");
    }

    @Test
    void infoHasDescriptionVersionAndLicense() {
        JsonNode info = served.path("info");
        assertThat(info.path("title").asString()).isNotBlank();
        assertThat(info.path("description").asString()).isNotBlank();
        assertThat(info.path("version").asString()).isNotBlank();
        assertThat(info.path("license").path("name").asString()).isNotBlank();
    }

    @Test
    void everyOperationHasSummaryDescriptionTagsAndItsProblemAnswers() {
        List<String> faults = new ArrayList<>();
        for (Map.Entry<String, JsonNode> path : served.path("paths").properties()) {
            for (Map.Entry<String, JsonNode> op : path.getValue().properties()) {
                String where = op.getKey().toUpperCase() + " " + path.getKey();
                JsonNode o = op.getValue();
                if (o.path("summary").asString("").isBlank()) {
                    faults.add(where + ": no summary");
                }
                if (o.path("description").asString("").isBlank()) {
                    faults.add(where + ": no description");
                }
                if (o.path("tags").isEmpty()) {
                    faults.add(where + ": no tags");
                }
                if (!o.path("responses").has("200")) {
                    faults.add(where + ": no 200 answer");
                }
                List<String> problems = new ArrayList<>(List.of("405", "406", "500"));
                if (op.getKey().equals("post")) {
                    problems.addAll(List.of("400", "413", "415", "422"));
                }
                for (String status : problems) {
                    JsonNode answer = o.path("responses").path(status);
                    if (answer.isMissingNode()) {
                        faults.add(where + ": no " + status + " answer");
                    } else if (!PROBLEM_REF.equals(answer.path("content").path("application/problem+json")
                            .path("schema").path("$ref").asString(""))) {
                        faults.add(where + ": the " + status + " answer is not an application/problem+json Problem");
                    }
                }
            }
        }
        assertThat(faults).as("operations lacking documentation").isEmpty();
    }

    @Test
    void pathsAreKebabCase() {
        List<String> faults = new ArrayList<>();
        for (String path : served.path("paths").propertyNames()) {
            for (String segment : path.substring(1).split("/")) {
                if (!KEBAB_SEGMENT.matcher(segment.replaceAll(":[^}]*}", "}")).matches()) {
                    faults.add(path + " (segment '" + segment + "')");
                }
            }
        }
        assertThat(faults).as("path segments that are not kebab-case").isEmpty();
    }

    @Test
    void propertiesAndParametersAreSnakeCase() {
        List<String> faults = new ArrayList<>();
        walk(served, "", (pointer, node) -> {
            if (node.path("properties").isObject()) {
                for (String name : node.path("properties").propertyNames()) {
                    if (!SNAKE.matcher(name).matches()) {
                        faults.add(pointer + "/properties/" + name);
                    }
                }
            }
            if (node.has("in") && node.path("name").isString() && !node.path("in").asString().equals("header")
                    && !SNAKE.matcher(node.path("name").asString()).matches()) {
                faults.add(pointer + " (parameter " + node.path("name").asString() + ")");
            }
        });
        assertThat(faults).as("property or parameter names that are not snake_case").isEmpty();
    }

    @Test
    void enumValuesAreUpperSnakeCase() {
        List<String> faults = new ArrayList<>();
        walk(served, "", (pointer, node) -> {
            if (node.path("enum").isArray()) {
                for (JsonNode value : node.path("enum")) {
                    if (value.isString() && !UPPER_SNAKE.matcher(value.asString()).matches()) {
                        faults.add(pointer + "/enum: " + value.asString());
                    }
                }
            }
        });
        assertThat(faults).as("enum values that are not UPPER_SNAKE_CASE").isEmpty();
    }

    @Test
    void everyCalculationAnswerCarriesTheStamp() {
        List<String> faults = new ArrayList<>();
        for (Map.Entry<String, JsonNode> schema : served.path("components").path("schemas").properties()) {
            JsonNode properties = schema.getValue().path("properties");
            if (properties.has("references") && properties.has("warnings") && !properties.has("stamp")) {
                faults.add(schema.getKey());
            }
        }
        assertThat(faults).as("answer schemas without stamp").isEmpty();
    }

    private interface Visitor {
        void visit(String pointer, JsonNode node);
    }

    private static void walk(JsonNode node, String pointer, Visitor visitor) {
        if (node.isObject()) {
            visitor.visit(pointer, node);
            for (Map.Entry<String, JsonNode> e : node.properties()) {
                walk(e.getValue(), pointer + "/" + e.getKey().replace("~", "~0").replace("/", "~1"), visitor);
            }
        } else if (node.isArray()) {
            for (int i = 0; i < node.size(); i++) {
                walk(node.get(i), pointer + "/" + i, visitor);
            }
        }
    }
}
