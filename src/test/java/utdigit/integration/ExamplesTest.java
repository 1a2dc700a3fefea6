package utdigit.integration;

import static io.restassured.RestAssured.given;
import static org.assertj.core.api.Assertions.assertThat;

import io.restassured.response.Response;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeSet;
import java.util.stream.Stream;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;
import tools.jackson.databind.JsonNode;
import tools.jackson.core.util.DefaultIndenter;
import tools.jackson.core.util.DefaultPrettyPrinter;
import tools.jackson.core.util.Separators;
import tools.jackson.databind.ObjectWriter;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ObjectNode;
import utdigit.web.support.ApiTest;

/**
 * Every example in api-examples/ is run against the service, so none goes stale: each request
 * {@code <name>.json} is posted to {@code /api/<name>} and each GET example to its path, and the
 * whole answer, stamp included, must equal the committed {@code <name>.answer.json} (answers are
 * deterministic: StrictMath, no time, no randomness). Each example also has its curl script
 * {@code <name>.sh} and its entry in requests.http, and every endpoint of the served OpenAPI
 * document has an example.
 *
 * <p>After a deliberate change of answers, regenerate them and review the diff:
 * {@code mvn -B test -Dtest=ExamplesTest -Dexamples.regenerate=true}.
 */
class ExamplesTest extends ApiTest {
    static final Path DIR = Path.of("api-examples");
    static final boolean REGENERATE = Boolean.getBoolean("examples.regenerate");
    static final String HOW_TO_REGENERATE = "If the change is intended, regenerate the answers and review the diff: "
            + "mvn -B test -Dtest=ExamplesTest -Dexamples.regenerate=true";

    /** GET examples, by name: the path (with query) each {@code <name>.sh} calls. */
    static final Map<String, String> GET_EXAMPLES = new LinkedHashMap<>();

    static {
        GET_EXAMPLES.put("materials", "/api/materials");
        GET_EXAMPLES.put("materials-water", "/api/materials/water?temperature_c=40");
        GET_EXAMPLES.put("references", "/api/references");
        GET_EXAMPLES.put("references-gum-rectangular", "/api/references/jcgm-100-2008-4.3.7");
        GET_EXAMPLES.put("requirement-profiles", "/api/requirement-profiles");
        GET_EXAMPLES.put("requirement-profiles-common-practice", "/api/requirement-profiles/common-practice");
        GET_EXAMPLES.put("requirement-profiles-common-practice-scan-speed",
                "/api/requirement-profiles/common-practice/rules/scan-speed");
    }

    /** The stamp verification example verifies this example's committed answer. */
    static final String STAMPED_EXAMPLE = "pulse-parameters";
    static final String STAMP_VERIFICATION = "stamp-verifications";

    private final JsonMapper mapper = JsonMapper.builder().build();
    /** Two-space indents, {@code "name": value}, one array element a line (the style of jq and json.tool). */
    private final ObjectWriter pretty = mapper.writer().with(new DefaultPrettyPrinter()
            .withSeparators(Separators.createDefaultInstance().withObjectNameValueSpacing(Separators.Spacing.AFTER)
                    .withObjectEmptySeparator("").withArrayEmptySeparator(""))
            .withArrayIndenter(DefaultIndenter.SYSTEM_LINEFEED_INSTANCE));

    @TestFactory
    Stream<DynamicTest> everyPostExampleAnswersAsCommitted() throws IOException {
        return postExamples().stream().map(name -> DynamicTest.dynamicTest("POST /api/" + name, () -> {
            if (REGENERATE && name.equals(STAMP_VERIFICATION)) {
                writeStampVerificationRequest();
            }
            String request = Files.readString(DIR.resolve(name + ".json"));
            Response response = given().contentType("application/json").accept("application/json").body(request)
                    .post("/api/" + name);
            check(name, response);
        }));
    }

    @TestFactory
    Stream<DynamicTest> everyGetExampleAnswersAsCommitted() {
        return GET_EXAMPLES.entrySet().stream().map(e -> DynamicTest.dynamicTest("GET " + e.getValue(), () -> {
            Response response = given().accept("application/json").urlEncodingEnabled(false).get(e.getValue());
            check(e.getKey(), response);
        }));
    }

    @Test
    void everyExampleHasItsCurlScriptAndItsEntryInRequestsHttp() throws IOException {
        String http = Files.readString(DIR.resolve("requests.http"));
        List<String> faults = new ArrayList<>();
        for (String name : postExamples()) {
            Optional<String> script = script(name);
            if (script.isEmpty()) {
                faults.add(name + ".sh is missing");
            } else if (!script.get().contains("/api/" + name + "\"") || !script.get().contains("@" + name + ".json")) {
                faults.add(name + ".sh does not post " + name + ".json to /api/" + name);
            }
            if (!http.contains("POST {{base_url}}/api/" + name + "\n") || !http.contains("< ./" + name + ".json")) {
                faults.add("requests.http lacks POST /api/" + name + " with ./" + name + ".json");
            }
        }
        for (Map.Entry<String, String> e : GET_EXAMPLES.entrySet()) {
            Optional<String> script = script(e.getKey());
            if (script.isEmpty() || !script.get().contains(e.getValue() + "\"")) {
                faults.add(e.getKey() + ".sh does not GET " + e.getValue());
            }
            if (!http.contains("GET {{base_url}}" + e.getValue() + "\n")) {
                faults.add("requests.http lacks GET " + e.getValue());
            }
        }
        assertThat(faults).isEmpty();
    }

    @Test
    void everyEndpointOfTheOpenApiDocumentHasAnExample() throws IOException {
        JsonNode doc = mapper.readTree(given().get("/v3/api-docs").then().statusCode(200).extract().asString());
        List<String> posts = postExamples();
        List<String> missing = new ArrayList<>();
        for (Map.Entry<String, JsonNode> path : doc.path("paths").properties()) {
            String p = path.getKey();
            if (path.getValue().has("post")) {
                if (p.endsWith("/batch")) {
                    // The batch endpoint: api-examples/bulk-recalculate.sh and the batch answer example.
                    if (!Files.exists(DIR.resolve("bulk-recalculate.sh"))) {
                        missing.add("POST " + p + " (bulk-recalculate.sh)");
                    }
                } else if (!posts.contains(p.substring("/api/".length()))) {
                    missing.add("POST " + p);
                }
            }
            if (path.getValue().has("get")) {
                String prefix = p.replaceAll("\\{[^}]*}.*", "");
                boolean covered = GET_EXAMPLES.values().stream().anyMatch(g -> p.contains("{")
                        ? g.startsWith(prefix) && g.length() > prefix.length()
                        : g.equals(p) || g.startsWith(p + "?"));
                if (!covered) {
                    missing.add("GET " + p);
                }
            }
        }
        assertThat(missing).as("endpoints without an example in api-examples/").isEmpty();
    }

    private void check(String name, Response response) throws IOException {
        assertThat(response.statusCode()).as(name + ": " + response.asString()).isEqualTo(200);
        JsonNode served = mapper.readTree(response.asString());
        Path answerFile = DIR.resolve(name + ".answer.json");
        if (REGENERATE) {
            Files.writeString(answerFile, pretty.writeValueAsString(served) + "\n", StandardCharsets.UTF_8);
            return;
        }
        assertThat(answerFile).as(name + ": no committed answer. " + HOW_TO_REGENERATE).exists();
        JsonNode committed = mapper.readTree(Files.readString(answerFile));
        Optional<JsonDifference.Difference> difference = JsonDifference.first(committed, served);
        assertThat(difference)
                .as(() -> "The answer to example " + name + " differs from " + answerFile + " "
                        + difference.map(JsonDifference.Difference::describe).orElse("") + ". " + HOW_TO_REGENERATE)
                .isEmpty();
    }

    /** {"document": the stamped example's answer}, so the verification example checks a real answer. */
    private void writeStampVerificationRequest() throws IOException {
        String stamped = given().contentType("application/json").accept("application/json")
                .body(Files.readString(DIR.resolve(STAMPED_EXAMPLE + ".json"))).post("/api/" + STAMPED_EXAMPLE)
                .then().statusCode(200).extract().asString();
        ObjectNode request = mapper.createObjectNode();
        request.set("document", mapper.readTree(stamped));
        Files.writeString(DIR.resolve(STAMP_VERIFICATION + ".json"), pretty.writeValueAsString(request) + "\n",
                StandardCharsets.UTF_8);
    }

    /** The names of the POST examples: every {@code <name>.json} but answers and the OpenAPI document. */
    static List<String> postExamples() throws IOException {
        TreeSet<String> names = new TreeSet<>();
        try (Stream<Path> files = Files.list(DIR)) {
            files.map(f -> f.getFileName().toString())
                    .filter(f -> f.endsWith(".json") && !f.endsWith(".answer.json") && !f.equals("openapi.json"))
                    .forEach(f -> names.add(f.substring(0, f.length() - ".json".length())));
        }
        return new ArrayList<>(names);
    }

    private static Optional<String> script(String name) throws IOException {
        Path p = DIR.resolve(name + ".sh");
        return Files.exists(p) ? Optional.of(Files.readString(p)) : Optional.empty();
    }
}
