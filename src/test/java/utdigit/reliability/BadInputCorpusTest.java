package utdigit.reliability;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ObjectNode;
import utdigit.web.pipeline.CalculationRunner;
import utdigit.web.support.ApiTest;

/**
 * A corpus of bad requests over every endpoint the service documents, single and batch: malformed
 * JSON, wrong types, unknown and duplicated fields, huge strings, deep nesting, huge arrays, NaN and
 * overflow, out-of-range values, missing required fields, wrong media types, wrong methods. Every
 * one must be refused with a 4xx problem that carries no implementation detail (for batches: a 4xx,
 * or rows that are all INVALID); none may be a 5xx, none may be accepted. Single-field mutations are
 * made on a request the endpoint accepts (checked first), so each refusal is due to the mutation.
 */
class BadInputCorpusTest extends ApiTest {
    private static final JsonMapper JSON = JsonMapper.builder().build();
    private static final String DEEP = "[".repeat(1000) + "]".repeat(1000);
    private static final String HUGE_STRING = "\"" + "a".repeat(20_000) + "\"";
    private static final String HUGE_ARRAY = "[" + "1,".repeat(100_000) + "1]";
    private static final List<String> LEAKS = List.of("Exception", "tools.jackson", "com.fasterxml", "org.springframework",
            "java.lang", "jakarta.", "at utdigit.", "org.apache");

    @Autowired
    CalculationRunner runner;

    private final HttpClient http = HttpClient.newBuilder().version(HttpClient.Version.HTTP_1_1)
            .connectTimeout(Duration.ofSeconds(5)).build();

    record Case(String label, String method, String path, String contentType, byte[] body, boolean batch,
                String pointer) {}

    @Test
    void everyBadRequestIsRefusedWithAProblemAndNoneIsA5xx() throws Exception {
        JsonNode doc = JSON.readTree(get("/v3/api-docs"));
        List<Case> corpus = new ArrayList<>();
        Set<String> endpoints = new TreeSet<>();
        Set<String> withoutBase = new TreeSet<>();
        for (var path : doc.path("paths").properties()) {
            JsonNode post = path.getValue().path("post");
            if (path.getKey().contains("{") || path.getKey().endsWith("/batch")) {
                continue; // batches: their own cases below, one per calculation
            }
            if (post.isMissingNode()) {
                // GET endpoints: wrong methods and bad ids only
                corpus.add(new Case("POST on a GET endpoint", "POST", path.getKey(), "application/json",
                        bytes("{}"), false, null));
                corpus.add(new Case("DELETE on a GET endpoint", "DELETE", path.getKey(), null, new byte[0], false, null));
                continue;
            }
            endpoints.add(path.getKey());
            JsonNode schema = resolve(doc, post.path("requestBody").path("content").path("application/json").path("schema"));
            ObjectNode base = validBase(path.getKey());
            if (base == null) {
                withoutBase.add(path.getKey());
            }
            singleCases(corpus, path.getKey(), schema, base);
        }
        for (String name : runner.names()) {
            batchCases(corpus, "/api/" + name + "/batch");
        }
        corpus.add(new Case("bad material id", "GET", "/api/materials/%00", null, new byte[0], false, null));
        corpus.add(new Case("unknown material id", "GET", "/api/materials/" + "x".repeat(5000), null, new byte[0], false, null));

        int fiveHundreds = 0;
        int accepted = 0;
        int notProblem = 0;
        int leaking = 0;
        int pointerMissing = 0;
        int wholeBodyPointer = 0;
        Map<String, List<String>> failures = new java.util.TreeMap<>();
        for (Case c : corpus) {
            HttpResponse<String> r = send(c);
            int status = r.statusCode();
            String body = r.body();
            String type = r.headers().firstValue("Content-Type").orElse("");
            List<String> broken = new ArrayList<>();
            if (status >= 500) {
                fiveHundreds++;
                broken.add("5xx");
            }
            boolean ok;
            if (c.batch() && status == 200) {
                ok = body.contains("\"status\":\"OK\"") || body.contains(",OK,") || body.contains("/problems/internal-error");
            } else {
                ok = status < 400;
            }
            if (ok) {
                accepted++;
                broken.add("accepted");
            }
            if (status >= 400 && !type.startsWith("application/problem+json")) {
                notProblem++;
                broken.add("not problem+json");
            }
            if (LEAKS.stream().anyMatch(body::contains)) {
                leaking++;
                broken.add("implementation detail");
            }
            boolean pointed = body.contains("\"pointer\":\"" + c.pointer() + "\"")
                    || body.contains("\"pointer\":\"" + c.pointer() + "/");
            if (c.pointer() != null && status == 400 && !pointed && c.label().endsWith("100 digits")
                    && body.contains("\"pointer\":\"\"")) {
                // A number over the length limit is refused by the parser before the field is known.
                wholeBodyPointer++;
            } else if (c.pointer() != null && status == 400 && !pointed) {
                pointerMissing++;
                broken.add("no pointer " + c.pointer());
            }
            for (String b : broken) {
                String kind = b.startsWith("no pointer") ? "no pointer" : b;
                List<String> examples = failures.computeIfAbsent(kind + ": " + c.label().replaceFirst("^[a-z0-9_]+: ", ""),
                        k -> new ArrayList<>());
                if (examples.size() < 2) {
                    examples.add(c.method() + " " + c.path() + " -> " + status + " "
                            + body.substring(0, Math.min(240, body.length())));
                }
            }
        }
        failures.forEach((kind, examples) -> System.out.println("  corpus failure " + kind + " " + examples));
        System.out.printf("Bad-input corpus: %d sent over %d single endpoints and %d batch endpoints "
                        + "(%d single endpoints without an accepted base request: %s); %d x 5xx, %d accepted, "
                        + "%d not problem+json, %d with implementation detail, %d without the field's pointer "
                        + "(%d numbers over the length limit pointed at the whole body)%n",
                corpus.size(), endpoints.size(), runner.names().size(), withoutBase.size(), withoutBase,
                fiveHundreds, accepted, notProblem, leaking, pointerMissing, wholeBodyPointer);
        assertThat(failures.keySet()).as("kinds of bad requests that failed a check").isEmpty();
        assertThat(corpus.size()).isGreaterThan(1000);
    }

    private void singleCases(List<Case> corpus, String path, JsonNode schema, ObjectNode base) {
        ObjectNode start = base == null ? JSON.createObjectNode() : base;
        String json = "application/json";
        String baseText = start.toString();
        // The body as a whole
        Map<String, String> whole = new LinkedHashMap<>();
        whole.put("empty body", "");
        whole.put("truncated object", baseText.substring(0, Math.max(1, baseText.length() - 1)));
        whole.put("trailing tokens", baseText + " " + baseText);
        whole.put("trailing garbage", baseText + " x");
        whole.put("array at top level", "[" + baseText + "]");
        whole.put("string at top level", "\"" + baseText.replace("\"", "'") + "\"");
        whole.put("number at top level", "42");
        whole.put("null at top level", "null");
        whole.put("boolean at top level", "true");
        whole.put("single quotes", baseText.replace('"', '\''));
        whole.put("unquoted keys", baseText.replaceAll("\"([a-z0-9_]+)\":", "$1:"));
        whole.put("comment", baseText.replaceFirst("\\{", "{/* comment */"));
        whole.put("unknown property", with(start, "not_a_field", "1"));
        whole.put("unknown nested property", with(start, "zz", "{\"a\": 1}"));
        whole.put("many unknown properties", manyProperties(start, 5000));
        whole.put("long property name", with(start, "p".repeat(300), "1"));
        whole.put("deep array nesting", with(start, "zz", DEEP));
        whole.put("deep object nesting", with(start, "zz", "{\"a\":".repeat(200) + "1" + "}".repeat(200)));
        whole.put("huge string in an unknown field", with(start, "zz", HUGE_STRING));
        whole.put("huge array in an unknown field", with(start, "zz", HUGE_ARRAY));
        whole.put("form encoding as JSON", "bit_depth=8&frequency_mhz=5");
        whole.put("XML as JSON", "<request><bit_depth>8</bit_depth></request>");
        for (var e : whole.entrySet()) {
            corpus.add(new Case(e.getKey(), "POST", path, json, bytes(e.getValue()), false, null));
        }
        corpus.add(new Case("invalid UTF-8", "POST", path, json,
                concat(bytes("{\"zz\": \""), new byte[] {(byte) 0xC3, (byte) 0x28, (byte) 0xFF}, bytes("\"}")), false, null));
        corpus.add(new Case("control character in a string", "POST", path, json, bytes("{\"zz\": \"a\u0001b\"}"), false, null));
        // Media types and methods
        for (String mediaType : List.of("text/plain", "application/xml", "application/x-www-form-urlencoded",
                "multipart/form-data; boundary=x", "application/x-ndjson", "text/csv")) {
            corpus.add(new Case("media type " + mediaType, "POST", path, mediaType, bytes(baseText), false, null));
        }
        corpus.add(new Case("no media type", "POST", path, null, bytes(baseText), false, null));
        for (String method : List.of("GET", "PUT", "DELETE", "PATCH")) {
            corpus.add(new Case("method " + method, method, path, json, bytes(baseText), false, null));
        }
        // One field at a time
        JsonNode properties = schema.path("properties");
        Set<String> required = new TreeSet<>();
        schema.path("required").forEach(r -> required.add(r.asString()));
        for (var p : properties.properties()) {
            String name = p.getKey();
            String pointer = "/" + name;
            JsonNode s = p.getValue();
            for (var e : fieldMutations(s).entrySet()) {
                corpus.add(new Case(name + ": " + e.getKey(), "POST", path, json, bytes(with(start, name, e.getValue())),
                        false, pointer));
            }
            corpus.add(new Case(name + ": duplicated", "POST", path, json,
                    bytes(with(start, name, "null").replaceFirst("\\{", "{\"" + name + "\": null, ")), false, null));
            if (required.contains(name)) {
                corpus.add(new Case(name + ": null though required", "POST", path, json, bytes(with(start, name, "null")),
                        false, pointer));
                ObjectNode without = start.deepCopy();
                without.remove(name);
                corpus.add(new Case(name + ": missing though required", "POST", path, json, bytes(without.toString()),
                        false, pointer));
            }
        }
    }

    /** Values that break the property's schema, whatever the rest of the request. */
    private static Map<String, String> fieldMutations(JsonNode s) {
        Map<String, String> m = new LinkedHashMap<>();
        String type = s.path("type").isString() ? s.path("type").asString()
                : s.path("type").isArray() ? s.path("type").get(0).asString() : (s.has("$ref") ? "object" : "");
        m.put("object for a " + type, "{\"value\": 1}");
        m.put("array for a " + type, "[1]");
        m.put("huge string", HUGE_STRING);
        m.put("huge array", HUGE_ARRAY);
        m.put("deep nesting", DEEP);
        if (!type.equals("boolean")) {
            m.put("boolean", "true");
        }
        if (type.equals("number") || type.equals("integer")) {
            m.put("text", "\"abc\"");
            m.put("quoted number", "\"8\"");
            m.put("quoted NaN", "\"NaN\"");
            m.put("quoted Infinity", "\"Infinity\"");
            m.put("NaN literal", "NaN");
            m.put("Infinity literal", "Infinity");
            m.put("-Infinity literal", "-Infinity");
            m.put("overflow 1e400", "1e400");
            m.put("overflow -1e400", "-1e400");
            m.put("100 digits", "1" + "0".repeat(99));
            m.put("leading zero", "08");
            m.put("plus sign", "+1");
            m.put("hex", "0x10");
            m.put("bare fraction", ".5");
            if (s.has("minimum")) {
                m.put("below minimum", Double.toString(s.get("minimum").asDouble() - 1));
            }
            if (s.has("exclusiveMinimum")) {
                m.put("at exclusive minimum", s.get("exclusiveMinimum").asString());
                m.put("below exclusive minimum", Double.toString(s.get("exclusiveMinimum").asDouble() - 1));
            }
            if (s.has("maximum")) {
                m.put("above maximum", Double.toString(s.get("maximum").asDouble() + 1));
            }
            if (s.has("exclusiveMaximum")) {
                m.put("at exclusive maximum", s.get("exclusiveMaximum").asString());
            }
        }
        if (type.equals("integer")) {
            m.put("fraction", "1.5");
            m.put("beyond 64 bits", "1" + "0".repeat(30));
            m.put("beyond 32 bits", "10000000000");
        }
        if (type.equals("string")) {
            m.put("number", "1");
            if (s.has("enum")) {
                String first = s.get("enum").get(0).asString();
                m.put("lower-case enum", "\"" + first.toLowerCase(java.util.Locale.ROOT) + "\"");
                m.put("unknown enum", "\"NOT_A_VALUE\"");
            }
        }
        return m;
    }

    private void batchCases(List<Case> corpus, String path) {
        String nd = "application/x-ndjson";
        String bad = "{\"not_a_field\": 1}";
        Map<String, String[]> bodies = new LinkedHashMap<>();
        bodies.put("JSON object instead of an array", new String[] {"application/json", "{\"a\": 1}"});
        bodies.put("JSON array of numbers", new String[] {"application/json", "[1, 2, 3]"});
        bodies.put("JSON array of unknown fields", new String[] {"application/json", "[" + bad + "," + bad + "]"});
        bodies.put("JSON array broken", new String[] {"application/json", "[{\"a\": 1},"});
        bodies.put("JSON array with NaN", new String[] {"application/json", "[{\"zz\": NaN}]"});
        bodies.put("JSON array deep", new String[] {"application/json", "[" + DEEP + "]"});
        bodies.put("JSON array trailing", new String[] {"application/json", "[] []"});
        bodies.put("NDJSON bad lines", new String[] {nd, bad + "\nnot json\n[1]\n42\n{\"zz\": NaN}\n" + "{\"a\":".repeat(100)
                + "1" + "}".repeat(100) + "\n{\"zz\": " + HUGE_STRING + "}\n{\"a\": 1, \"a\": 2}\n"});
        bodies.put("NDJSON huge array row", new String[] {nd, "{\"zz\": " + HUGE_ARRAY + "}\n"});
        bodies.put("CSV unknown column", new String[] {"text/csv", "not_a_column\n1\n"});
        bodies.put("CSV empty", new String[] {"text/csv", ""});
        bodies.put("CSV header only garbage", new String[] {"text/csv", "\"unterminated\n"});
        bodies.put("media type text/plain", new String[] {"text/plain", bad});
        bodies.put("media type application/xml", new String[] {"application/xml", "<a/>"});
        bodies.put("no media type", new String[] {null, bad});
        for (var e : bodies.entrySet()) {
            corpus.add(new Case("batch: " + e.getKey(), "POST", path, e.getValue()[0], bytes(e.getValue()[1]), true, null));
        }
        corpus.add(new Case("batch: invalid UTF-8 row", "POST", path, nd,
                concat(bytes("{\"zz\": \""), new byte[] {(byte) 0xFF, (byte) 0xFE}, bytes("\"}\n")), true, null));
        for (String method : List.of("GET", "PUT", "DELETE")) {
            corpus.add(new Case("batch: method " + method, method, path, nd, bytes(bad), true, null));
        }
    }

    private ObjectNode validBase(String path) throws IOException, InterruptedException {
        String name = path.substring(path.lastIndexOf('/') + 1);
        Path example = Path.of("api-examples", name + ".json");
        String text = Files.exists(example) ? Files.readString(example) : switch (name) {
            case "quantization-assessments" -> "{\"bit_depth\": 8}";
            case "pulse-parameters" -> "{\"frequency_mhz\": 5, \"material\": \"carbon-steel\"}";
            case "sampling-assessments" -> "{\"sampling_frequency_mhz\": 100, \"frequency_mhz\": 5}";
            default -> null;
        };
        if (text == null) {
            return null;
        }
        HttpResponse<String> r = send(new Case("base", "POST", path, "application/json", bytes(text), false, null));
        return r.statusCode() == 200 ? (ObjectNode) JSON.readTree(text) : null;
    }

    private static String with(ObjectNode base, String name, String rawValue) {
        ObjectNode copy = base.deepCopy();
        copy.remove(name);
        String text = copy.toString();
        String field = "\"" + name + "\": " + rawValue;
        return text.equals("{}") ? "{" + field + "}" : "{" + field + ", " + text.substring(1);
    }

    private static String manyProperties(ObjectNode base, int count) {
        StringBuilder b = new StringBuilder("{");
        for (int i = 0; i < count; i++) {
            b.append("\"zz").append(i).append("\": 1, ");
        }
        String text = base.toString();
        return text.equals("{}") ? b.substring(0, b.length() - 2) + "}" : b + text.substring(1);
    }

    private String get(String path) throws IOException, InterruptedException {
        return http.send(HttpRequest.newBuilder(uri(path)).GET().build(), HttpResponse.BodyHandlers.ofString()).body();
    }

    private HttpResponse<String> send(Case c) throws IOException, InterruptedException {
        HttpRequest.Builder b = HttpRequest.newBuilder(uri(c.path())).timeout(Duration.ofSeconds(30))
                .method(c.method(), c.body().length == 0 && !c.method().equals("POST")
                        ? HttpRequest.BodyPublishers.noBody() : HttpRequest.BodyPublishers.ofByteArray(c.body()));
        if (c.contentType() != null) {
            b.header("Content-Type", c.contentType());
        }
        return http.send(b.build(), HttpResponse.BodyHandlers.ofString(StandardCharsets.UTF_8));
    }

    private URI uri(String path) {
        return URI.create("http://127.0.0.1:" + port + path);
    }

    private static JsonNode resolve(JsonNode doc, JsonNode schema) {
        if (schema.has("$ref")) {
            String name = schema.get("$ref").asString().replace("#/components/schemas/", "");
            return doc.path("components").path("schemas").path(name);
        }
        return schema;
    }

    private static byte[] bytes(String s) {
        return s.getBytes(StandardCharsets.UTF_8);
    }

    private static byte[] concat(byte[]... parts) {
        int n = 0;
        for (byte[] p : parts) {
            n += p.length;
        }
        byte[] out = new byte[n];
        int at = 0;
        for (byte[] p : parts) {
            System.arraycopy(p, 0, out, at, p.length);
            at += p.length;
        }
        return out;
    }
}
