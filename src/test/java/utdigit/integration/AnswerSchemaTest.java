package utdigit.integration;

import static io.restassured.RestAssured.given;
import static org.assertj.core.api.Assertions.assertThat;

import com.networknt.schema.Error;
import com.networknt.schema.SchemaRegistry;
import com.networknt.schema.SpecificationVersion;
import io.restassured.response.Response;
import io.restassured.specification.RequestSpecification;
import java.io.IOException;
import java.nio.file.Files;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ArrayNode;
import tools.jackson.databind.node.JsonNodeFactory;
import tools.jackson.databind.node.ObjectNode;
import utdigit.web.support.ApiTest;

/**
 * Every answer validates against the schema the served OpenAPI document gives it, as a strict
 * generated client would check it: real answers (each api-examples request, each example of the
 * document, requests whose answers hold nulls, problems of every kind, batch rows in every format)
 * are validated with a JSON Schema 2020-12 validator (networknt json-schema-validator) against the
 * schema of the operation's response for the answer's status and media type. Objects are closed for
 * the check (a property the schema does not declare is an error), so an answer cannot carry
 * undocumented fields. The operations and examples are iterated, not listed: a new endpoint, or a
 * new calculation's batch, is checked without changing this test.
 */
class AnswerSchemaTest extends ApiTest {
    private static final JsonMapper MAPPER = JsonMapper.builder().build();
    private static final SchemaRegistry REGISTRY = SchemaRegistry.withDefaultDialect(SpecificationVersion.DRAFT_2020_12);
    private static final String NDJSON = "application/x-ndjson";

    private JsonNode document;
    private JsonNode definitions;

    private JsonNode document() {
        if (document == null) {
            document = MAPPER.readTree(given().accept("application/json").get("/v3/api-docs").then().statusCode(200)
                    .extract().asString());
            // The component schemas as 2020-12 $defs of every schema checked, objects closed.
            String text = MAPPER.writeValueAsString(document.path("components").path("schemas"))
                    .replace("\"#/components/schemas/", "\"#/$defs/");
            definitions = MAPPER.readTree(text);
            for (JsonNode schema : definitions) {
                close(schema);
            }
        }
        return document;
    }

    /** An object schema with properties admits no other property in this check. */
    private static void close(JsonNode schema) {
        if (schema instanceof ObjectNode object) {
            if (object.has("properties") && !object.has("additionalProperties")
                    && !object.has("allOf") && !object.has("anyOf") && !object.has("oneOf")) {
                object.put("additionalProperties", false);
            }
            for (JsonNode child : object) {
                close(child);
            }
        } else if (schema instanceof ArrayNode array) {
            for (JsonNode child : array) {
                close(child);
            }
        }
    }

    // ---- answers to requests -------------------------------------------------------------------

    @TestFactory
    Stream<DynamicTest> everyExampleRequestsAnswerMatchesItsSchema() throws IOException {
        List<DynamicTest> tests = new ArrayList<>();
        for (String name : ExamplesTest.postExamples()) {
            String body = Files.readString(ExamplesTest.DIR.resolve(name + ".json"));
            tests.add(DynamicTest.dynamicTest("POST /api/" + name, () -> assertMatches("POST", "/api/" + name,
                    json().body(body).post("/api/" + name), 200)));
        }
        for (String path : ExamplesTest.GET_EXAMPLES.values()) {
            tests.add(DynamicTest.dynamicTest("GET " + path, () -> assertMatches("GET", path,
                    given().accept("application/json").get(path), 200)));
        }
        return tests.stream();
    }

    /**
     * Each example the document shows (the browsable UI's "try it" body: the media type's example,
     * else the one the UI builds from every property's example) is a valid request whose answer
     * matches its schema.
     */
    @TestFactory
    Stream<DynamicTest> everyExampleOfTheDocumentIsAValidRequest() {
        List<DynamicTest> tests = new ArrayList<>();
        document().path("paths").properties().forEach(path -> path.getValue().properties().forEach(op -> {
            String method = op.getKey().toUpperCase(java.util.Locale.ROOT);
            String concrete = concretePath(path.getKey(), op.getValue());
            if (concrete == null) {
                return;
            }
            for (var media : op.getValue().path("requestBody").path("content").properties()) {
                List<JsonNode> examples = examples(media.getValue());
                if (examples.isEmpty()) {
                    examples = List.of(uiExample(media.getValue().path("schema"), 0));
                }
                for (JsonNode example : examples) {
                    tests.add(DynamicTest.dynamicTest(method + " " + concrete + " " + media.getKey() + " example", () -> {
                        String body = example.isString() ? example.stringValue() : MAPPER.writeValueAsString(example);
                        Response r = given().contentType(media.getKey()).accept(answerType(op.getValue()))
                                .body(body.getBytes(java.nio.charset.StandardCharsets.UTF_8)).request(method, concrete);
                        assertMatches(method, concrete, r, 200);
                    }));
                }
            }
            if (method.equals("GET")) {
                tests.add(DynamicTest.dynamicTest("GET " + concrete, () ->
                        assertMatches("GET", concrete, given().accept("application/json").get(concrete), 200)));
            }
        }));
        assertThat(tests).isNotEmpty();
        return tests.stream();
    }

    /** Each problem answer's example says the status it documents. */
    @Test
    void everyProblemExampleSaysItsOwnStatus() {
        List<String> wrong = new ArrayList<>();
        document().path("paths").properties().forEach(path -> path.getValue().properties().forEach(op ->
                op.getValue().path("responses").properties().forEach(response -> {
                    for (var media : response.getValue().path("content").properties()) {
                        if (!media.getKey().equals("application/problem+json")) {
                            continue;
                        }
                        List<JsonNode> examples = examples(media.getValue());
                        if (examples.isEmpty()) {
                            examples = List.of(uiExample(media.getValue().path("schema"), 0));
                        }
                        for (JsonNode example : examples) {
                            if (!example.path("status").asString().equals(response.getKey())) {
                                wrong.add(op.getKey() + " " + path.getKey() + " " + response.getKey() + ": " + example);
                            }
                        }
                    }
                })));
        assertThat(wrong).as("problem examples whose status is not their response's").isEmpty();
    }

    /**
     * The body a browsable UI builds from a schema: every property, each from its example, else its
     * default, else its first enum value, else a placeholder of its type.
     */
    private JsonNode uiExample(JsonNode schema, int depth) {
        JsonNodeFactory f = JsonNodeFactory.instance;
        if (schema.has("$ref")) {
            String name = schema.get("$ref").asString().substring("#/components/schemas/".length());
            return depth > 8 ? (JsonNode) f.nullNode() : uiExample(document().path("components").path("schemas").path(name), depth + 1);
        }
        for (String key : List.of("example", "default")) {
            if (schema.has(key)) {
                return schema.get(key);
            }
        }
        if (schema.has("examples") && schema.get("examples").isArray() && !schema.get("examples").isEmpty()) {
            return schema.get("examples").get(0);
        }
        if (schema.has("enum")) {
            return schema.get("enum").get(0);
        }
        String type = schema.path("type").isArray() ? schema.path("type").get(0).asString() : schema.path("type").asString("");
        if (schema.has("properties") || type.equals("object")) {
            ObjectNode o = f.objectNode();
            schema.path("properties").properties().forEach(p -> o.set(p.getKey(), uiExample(p.getValue(), depth + 1)));
            return o;
        }
        return switch (type) {
            case "array" -> f.arrayNode().add(uiExample(schema.path("items"), depth + 1));
            case "integer" -> f.numberNode(0);
            case "number" -> f.numberNode(0.0);
            case "boolean" -> f.booleanNode(true);
            case "string" -> f.stringNode("string");
            default -> f.objectNode();
        };
    }

    /**
     * Answers that hold nulls (each checked to hold its null, so the check cannot pass vacuously): a
     * liquid's shear velocity, a signature nobody can check, a metric with no finite value in a
     * sheet's values and in a single answer.
     */
    @TestFactory
    Stream<DynamicTest> answersWithNullsMatchTheirSchema() throws IOException {
        String pulse = Files.readString(ExamplesTest.DIR.resolve(ExamplesTest.STAMPED_EXAMPLE + ".answer.json"));
        record Edge(String method, String path, String nullAt, java.util.function.Supplier<Response> call) {}
        // a tolerance of the smallest positive double: the minimum height for it has no finite value (null)
        String sheet = """
                {"sheet_id": "NULLS-1", "technique": "PULSE_ECHO",
                 "probe": {"frequency_mhz": 5, "bandwidth_percent": 60},
                 "digitization": {"sampling_frequency_mhz": 100, "bit_depth": 8},
                 "evaluation": {"amplitude_tolerance_db": 4.9e-324, "reference_height_percent_fsh": 80,
                                "evaluation_level_db": -14}}""";
        List<Edge> edges = List.of(
                new Edge("GET", "/api/materials/water", "/shear_m_per_s",
                        () -> given().accept("application/json").get("/api/materials/water")),
                // this service has no stamp key in tests: signature_valid is null
                new Edge("POST", "/api/stamp-verifications", "/signature_valid",
                        () -> json().body("{\"document\":" + pulse + "}").post("/api/stamp-verifications")),
                new Edge("POST", "/api/technique-sheet-validations", "/values/minimum_height_percent_fsh",
                        () -> json().body(sheet).post("/api/technique-sheet-validations")),
                new Edge("POST", "/api/quantization-assessments", "/minimum_height_percent_fsh",
                        () -> json().body("{\"bit_depth\": 8, \"amplitude_tolerance_db\": 4.9e-324}")
                                .post("/api/quantization-assessments")));
        return edges.stream().map(edge -> DynamicTest.dynamicTest(edge.method() + " " + edge.path() + " " + edge.nullAt(),
                () -> {
                    Response r = edge.call().get();
                    assertThat(MAPPER.readTree(r.asString()).at(edge.nullAt()).isNull())
                            .as("%s holds null at %s: %s", edge.path(), edge.nullAt(), r.asString()).isTrue();
                    assertMatches(edge.method(), edge.path(), r, 200);
                }));
    }

    // ---- problems ------------------------------------------------------------------------------

    /** Every operation's problems (400, 404, 405, 406, 415) validate against the schema it documents for them. */
    @TestFactory
    Stream<DynamicTest> problemsMatchTheSchemaOfTheirStatus() {
        List<DynamicTest> tests = new ArrayList<>();
        document().path("paths").properties().forEach(path -> path.getValue().properties().forEach(op -> {
            String method = op.getKey().toUpperCase(java.util.Locale.ROOT);
            String concrete = concretePath(path.getKey(), op.getValue());
            if (concrete == null) {
                return;
            }
            String name = method + " " + concrete;
            if (method.equals("POST")) {
                tests.add(problem(name + " a string body", method, concrete, 400,
                        () -> json().body("\"x\"").post(concrete)));
                tests.add(problem(name + " unknown field", method, concrete, 400,
                        () -> json().body("{\"no_such_field_at_all\": 1}").post(concrete)));
                tests.add(problem(name + " text/plain body", method, concrete, 415,
                        () -> given().contentType("text/plain").body("x").post(concrete)));
                tests.add(problem(name + " wants XML", method, concrete, 406,
                        () -> given().contentType("application/json").accept("application/xml").body("{}").post(concrete)));
                tests.add(problem(name + " by DELETE", method, concrete, 405, () -> json().delete(concrete)));
            } else {
                tests.add(problem(name + " wants XML", method, concrete, 406,
                        () -> given().accept("application/xml").get(concrete)));
                tests.add(problem(name + " by DELETE", method, concrete, 405,
                        () -> given().accept("application/json").delete(concrete)));
                if (path.getKey().contains("{")) {
                    String unknown = path.getKey().replaceAll("\\{[^}]+}", "no-such-id");
                    tests.add(problem("GET " + unknown, method, unknown, 404,
                            () -> given().accept("application/json").get(unknown)));
                }
            }
        }));
        return tests.stream();
    }

    private DynamicTest problem(String name, String method, String path, int status,
                                java.util.function.Supplier<Response> call) {
        return DynamicTest.dynamicTest(name + " -> " + status, () -> assertMatches(method, path, call.get(), status));
    }

    // ---- batches ---------------------------------------------------------------------------------

    /** Each calculation's batch, in and out in every format, a bad row included, against its documented rows. */
    @TestFactory
    Stream<DynamicTest> batchRowsMatchTheirSchemaInEveryFormat() throws IOException {
        List<DynamicTest> tests = new ArrayList<>();
        Set<String> batchable = new LinkedHashSet<>();
        for (String name : ExamplesTest.postExamples()) {
            if (json().body("[]").post("/api/" + name + "/batch").getStatusCode() == 200) {
                batchable.add(name);
            }
        }
        assertThat(batchable).as("calculations with a batch and an example").isNotEmpty();
        for (String name : batchable) {
            JsonNode example = MAPPER.readTree(Files.readString(ExamplesTest.DIR.resolve(name + ".json")));
            String path = "/api/" + name + "/batch";
            ArrayNode rows = JsonNodeFactory.instance.arrayNode().add(example).add(JsonNodeFactory.instance.objectNode()
                    .put("no_such_field_at_all", 1));
            String array = MAPPER.writeValueAsString(rows);
            String ndjson = MAPPER.writeValueAsString(example) + "\n{\"no_such_field_at_all\": 1}\n";
            Map<String, String> bodies = new LinkedHashMap<>();
            bodies.put("application/json", array);
            bodies.put(NDJSON, ndjson);
            csv(example).ifPresent(csv -> bodies.put("text/csv", csv));
            for (var body : bodies.entrySet()) {
                for (String accept : List.of(NDJSON, "application/json", "text/csv")) {
                    tests.add(DynamicTest.dynamicTest("POST " + path + " " + body.getKey() + " -> " + accept, () ->
                            assertMatches("POST", path, given().contentType(body.getKey()).accept(accept)
                                    .body(body.getValue().getBytes(java.nio.charset.StandardCharsets.UTF_8)).post(path), 200)));
                }
            }
        }
        return tests.stream();
    }

    /** The example as one CSV row with dotted headers, when it has no arrays. */
    private static java.util.Optional<String> csv(JsonNode example) {
        Map<String, String> cells = new LinkedHashMap<>();
        if (!flatten("", example, cells)) {
            return java.util.Optional.empty();
        }
        return java.util.Optional.of(String.join(",", cells.keySet()) + "\n" + String.join(",", cells.values()) + "\n");
    }

    private static boolean flatten(String prefix, JsonNode node, Map<String, String> cells) {
        for (var e : node.properties()) {
            String name = prefix.isEmpty() ? e.getKey() : prefix + "." + e.getKey();
            if (e.getValue().isObject()) {
                if (!flatten(name, e.getValue(), cells)) {
                    return false;
                }
            } else if (e.getValue().isArray() || e.getValue().asString().contains(",")) {
                return false;
            } else {
                cells.put(name, e.getValue().asString());
            }
        }
        return true;
    }

    // ---- the document itself ---------------------------------------------------------------------

    /** A path parameter has an example, so a client (and this test) can call the operation as documented. */
    @Test
    void everyPathParameterHasAnExample() {
        List<String> without = new ArrayList<>();
        document().path("paths").properties().forEach(path -> path.getValue().properties().forEach(op -> {
            if (concretePath(path.getKey(), op.getValue()) == null) {
                without.add(op.getKey() + " " + path.getKey());
            }
        }));
        assertThat(without).as("operations with a path parameter that has no example").isEmpty();
    }

    /** A schema with properties says it is an object; otherwise any value validates against it. */
    @Test
    void everySchemaWithPropertiesIsAnObject() {
        List<String> untyped = new ArrayList<>();
        untypedObjects("#/components/schemas", document().path("components").path("schemas"), untyped, true);
        untypedObjects("#/paths", document().path("paths"), untyped, false);
        assertThat(untyped).as("schemas with properties but no type object").isEmpty();
    }

    /** An enum lists each value once (a generated client's enum type would not compile otherwise). */
    @Test
    void noEnumListsAValueTwice() {
        List<String> twice = new ArrayList<>();
        duplicateEnums("#", document(), twice);
        assertThat(twice).as("enums with a value listed twice").isEmpty();
    }

    private static void duplicateEnums(String where, JsonNode node, List<String> found) {
        if (node instanceof ObjectNode object) {
            if (object.path("enum").isArray()) {
                Set<String> seen = new java.util.HashSet<>();
                for (JsonNode v : object.get("enum")) {
                    if (!seen.add(v.toString())) {
                        found.add(where + " " + v);
                    }
                }
            }
            for (var e : object.properties()) {
                duplicateEnums(where + "/" + e.getKey(), e.getValue(), found);
            }
        } else if (node instanceof ArrayNode array) {
            for (int i = 0; i < array.size(); i++) {
                duplicateEnums(where + "/" + i, array.get(i), found);
            }
        }
    }

    private static void untypedObjects(String where, JsonNode node, List<String> found, boolean schemaMap) {
        if (node instanceof ObjectNode object) {
            if (!schemaMap && object.has("properties") && object.get("properties").isObject()
                    && !object.path("type").asString("").equals("object")
                    && !(object.path("type").isArray() && object.path("type").toString().contains("\"object\""))) {
                found.add(where);
            }
            for (var e : object.properties()) {
                untypedObjects(where + "/" + e.getKey(), e.getValue(), found,
                        !schemaMap && e.getKey().equals("properties"));
            }
        } else if (node instanceof ArrayNode array) {
            for (int i = 0; i < array.size(); i++) {
                untypedObjects(where + "/" + i, array.get(i), found, false);
            }
        }
    }

    // ---- the check -------------------------------------------------------------------------------

    private static RequestSpecification json() {
        return given().contentType("application/json").accept("application/json");
    }

    /**
     * Asserts the answer's status ({@code expected}, or any when negative) is documented for the
     * operation, and its body validates against the schema documented for that status and media type.
     */
    private void assertMatches(String method, String path, Response response, int expected) {
        String body = response.asString();
        if (expected >= 0) {
            assertThat(response.getStatusCode()).as("%s %s answered %s", method, path, body).isEqualTo(expected);
        }
        JsonNode operation = operation(method, path);
        assertThat(operation).as("%s %s is in the document", method, path).isNotNull();
        String status = String.valueOf(response.getStatusCode());
        JsonNode answer = operation.path("responses").path(status);
        assertThat(answer.isMissingNode()).as("%s %s documents status %s", method, path, status).isFalse();
        String type = response.getContentType().split(";")[0].trim();
        JsonNode media = answer.path("content").path(type);
        assertThat(media.isMissingNode()).as("%s %s documents %s for status %s", method, path, type, status).isFalse();
        List<String> errors = new ArrayList<>();
        if (type.equals(NDJSON)) {
            int line = 0;
            for (String row : body.split("\n")) {
                line++;
                if (!row.isBlank()) {
                    errors.addAll(validate(media.path("schema"), MAPPER.readTree(row), "line " + line + ": "));
                }
            }
        } else if (type.endsWith("json")) {
            errors.addAll(validate(media.path("schema"), MAPPER.readTree(body), ""));
        } else {
            errors.addAll(validate(media.path("schema"), JsonNodeFactory.instance.stringNode(body), ""));
        }
        assertThat(errors).as("%s %s (%s %s) against its schema; answer: %s", method, path, status, type,
                body.length() > 2000 ? body.substring(0, 2000) + "..." : body).isEmpty();
    }

    private List<String> validate(JsonNode schema, JsonNode value, String prefix) {
        document();
        ObjectNode full = schema.isObject() ? (ObjectNode) MAPPER.readTree(MAPPER.writeValueAsString(schema)
                .replace("\"#/components/schemas/", "\"#/$defs/")) : JsonNodeFactory.instance.objectNode();
        close(full);
        full.put("$schema", "https://json-schema.org/draft/2020-12/schema");
        full.set("$defs", definitions);
        List<String> messages = new ArrayList<>();
        for (Error e : REGISTRY.getSchema(full).validate(value)) {
            messages.add(prefix + e.getInstanceLocation() + " " + e.getMessage());
        }
        return messages;
    }

    /** The operation of the document that serves {@code method path}: an exact path first, else a template. */
    private JsonNode operation(String method, String path) {
        String bare = path.split("\\?")[0];
        JsonNode paths = document().path("paths");
        String m = method.toLowerCase(java.util.Locale.ROOT);
        if (paths.has(bare) && paths.get(bare).has(m)) {
            return paths.get(bare).get(m);
        }
        JsonNode best = null;
        int fewest = Integer.MAX_VALUE;
        for (var p : paths.properties()) {
            String regex = "\\Q" + p.getKey().replaceAll("\\{[^}]+}", "\\\\E[^/]+\\\\Q") + "\\E";
            int parameters = p.getKey().split("\\{", -1).length - 1;
            if (Pattern.matches(regex, bare) && p.getValue().has(m) && parameters < fewest) {
                best = p.getValue().get(m);
                fewest = parameters;
            }
        }
        if (best == null && !method.equals("GET") && !method.equals("POST")) {
            // 405: the problem is documented on the path's operations
            for (String other : List.of("get", "post")) {
                JsonNode o = operation(other.toUpperCase(java.util.Locale.ROOT), path);
                if (o != null) {
                    return o;
                }
            }
        }
        return best;
    }

    /**
     * The path with each parameter replaced by its documented example (or the first enum value); null
     * when a path parameter has neither (a failure of its own, see {@link #everyPathParameterHasAnExample}).
     */
    private static String concretePath(String template, JsonNode operation) {
        String path = template;
        StringBuilder query = new StringBuilder();
        for (JsonNode p : operation.path("parameters")) {
            JsonNode example = p.has("example") ? p.get("example") : p.path("schema").path("example");
            if (example.isMissingNode() && p.path("schema").has("enum")) {
                example = p.path("schema").path("enum").get(0);
            }
            if (p.path("in").asString().equals("path")) {
                if (example.isMissingNode()) {
                    return null;
                }
                path = path.replace("{" + p.path("name").asString() + "}", example.asString());
            } else if (p.path("in").asString().equals("query") && !example.isMissingNode()) {
                query.append(query.isEmpty() ? "?" : "&").append(p.path("name").asString()).append('=')
                        .append(example.asString());
            }
        }
        return path + query;
    }

    private static List<JsonNode> examples(JsonNode media) {
        List<JsonNode> found = new ArrayList<>();
        if (media.has("example")) {
            found.add(media.get("example"));
        }
        for (JsonNode e : media.path("examples")) {
            if (e.has("value")) {
                found.add(e.get("value"));
            }
        }
        return found;
    }

    private static String answerType(JsonNode operation) {
        for (var media : operation.path("responses").path("200").path("content").properties()) {
            return media.getKey();
        }
        return "application/json";
    }
}
