package utdigit.web.batch;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.dataformat.csv.CsvMapper;
import tools.jackson.dataformat.csv.CsvReadFeature;
import utdigit.web.support.ApiTest;

/** Helpers of the batch HTTP tests: raw requests with exact headers, NDJSON and CSV answers parsed. */
abstract class BatchApiTest extends ApiTest {
    static final String NDJSON = "application/x-ndjson";
    static final String CSV = "text/csv";
    static final String JSON = "application/json";

    static final String QUANTIZATION = "quantization-assessments";
    static final String PULSE = "pulse-parameters";
    static final String ACQUISITION = "acquisition-budgets";

    /** A plain mapper of the test's own: it reads what the service wrote, nothing more. */
    static final JsonMapper MAPPER = JsonMapper.builder().build();
    private static final CsvMapper CSV_MAPPER = CsvMapper.builder().build();

    /** POSTs a batch; {@code accept} null sends no Accept header. */
    RawHttp.Response batch(String calculation, String contentType, String accept, String body) {
        return batch(calculation, contentType, accept, body.getBytes(StandardCharsets.UTF_8), false);
    }

    RawHttp.Response batch(String calculation, String contentType, String accept, byte[] body, boolean chunked) {
        List<String> headers = new ArrayList<>();
        if (contentType != null) {
            headers.add("Content-Type: " + contentType);
        }
        if (accept != null) {
            headers.add("Accept: " + accept);
        }
        return RawHttp.post(port, "/api/" + calculation + "/batch", headers, body, chunked);
    }

    /** POSTs a batch answered as NDJSON and returns its rows, checking the answer is a 200 NDJSON stream. */
    List<JsonNode> ndjsonRows(String calculation, String contentType, String body) {
        RawHttp.Response r = batch(calculation, contentType, NDJSON, body);
        assertThat(r.status()).as(r.body()).isEqualTo(200);
        assertThat(r.header("content-type")).startsWith(NDJSON);
        return rows(r);
    }

    static List<JsonNode> rows(RawHttp.Response r) {
        List<JsonNode> rows = new ArrayList<>();
        for (String line : r.lines()) {
            rows.add(MAPPER.readTree(line));
        }
        return rows;
    }

    /** The answer of the single endpoint: its status and body. */
    Single single(String calculation, String json) {
        RawHttp.Response r = RawHttp.post(port, "/api/" + calculation,
                List.of("Content-Type: application/json", "Accept: application/json"),
                json.getBytes(StandardCharsets.UTF_8), false);
        return new Single(r.status(), MAPPER.readTree(r.body()));
    }

    record Single(int status, JsonNode body) {}

    /** Parses a CSV text into its records (header first). */
    static List<String[]> csvRecords(String text) {
        List<String[]> out = new ArrayList<>();
        try (var it = CSV_MAPPER.readerFor(String[].class).with(CsvReadFeature.WRAP_AS_ARRAY)
                .<String[]>readValues(text)) {
            while (it.hasNext()) {
                out.add(it.next());
            }
        }
        return out;
    }

    /** Asserts an answer is an RFC 9457 problem of {@code status} and type, with no row in it. */
    static JsonNode assertProblem(RawHttp.Response r, int status, String type) {
        assertThat(r.status()).as(r.body()).isEqualTo(status);
        assertThat(r.header("content-type")).startsWith("application/problem+json");
        JsonNode problem = MAPPER.readTree(r.body());
        assertThat(problem.path("type").asString()).isEqualTo(type);
        assertThat(problem.path("status").asInt()).isEqualTo(status);
        assertThat(problem.has("row")).isFalse();
        return problem;
    }

    /** The pointers of a row's problem. */
    static List<String> pointers(JsonNode row) {
        List<String> out = new ArrayList<>();
        for (JsonNode e : row.path("problem").path("errors")) {
            out.add(e.path("pointer").asString());
        }
        return out;
    }

    static List<Long> rowNumbers(List<JsonNode> rows) {
        return rows.stream().map(r -> r.path("row").asLong()).toList();
    }

    static List<String> statuses(List<JsonNode> rows) {
        return rows.stream().map(r -> r.path("status").asString()).toList();
    }
}
