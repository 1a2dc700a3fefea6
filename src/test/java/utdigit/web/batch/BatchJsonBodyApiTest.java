package utdigit.web.batch;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import tools.jackson.databind.JsonNode;

/** application/json bodies: one array of request objects, read element by element. */
class BatchJsonBodyApiTest extends BatchApiTest {

    @ParameterizedTest
    @ValueSource(strings = {"{\"bit_depth\": 8}", "8", "\"rows\"", "null", "", "   ", "not json", "{\"rows\": [{}]}"})
    void aBodyThatIsNotAnArrayIsA400BeforeAnyRow(String body) {
        assertProblem(batch(QUANTIZATION, JSON, NDJSON, body), 400, "/problems/invalid-input");
    }

    @Test
    void anEmptyArrayIsAnEmptyAnswer() {
        RawHttp.Response r = batch(QUANTIZATION, JSON, NDJSON, " [ ] ");
        assertThat(r.status()).isEqualTo(200);
        assertThat(r.lines()).isEmpty();
    }

    @Test
    void oneRowArrayIsAnswered() {
        // regression: the strict mapper's trailing-token check read the rest of the array as trailing
        // content, so every JSON array batch ended at its first row with a malformed-body row
        List<JsonNode> rows = ndjsonRows(QUANTIZATION, JSON, "[{\"bit_depth\": 8}]");
        assertThat(statuses(rows)).containsExactly("OK");
    }

    @Test
    void anArrayBrokenAfterTwoRowsAnswersThemThenOneMalformedRow() {
        List<JsonNode> rows = ndjsonRows(QUANTIZATION, JSON, """
                [{"bit_depth": 8}, {"bit_depth": 10}, {"bit_depth": 12, "quantizer": ROUNDING}, {"bit_depth": 14}]""");
        assertThat(rowNumbers(rows)).containsExactly(1L, 2L, 3L);
        assertThat(statuses(rows)).containsExactly("OK", "OK", "INVALID");
        JsonNode broken = rows.get(2);
        assertThat(broken.path("problem").path("type").asString()).isEqualTo("/problems/malformed-body");
        assertThat(broken.path("problem").path("detail").asString()).contains("row 3");
    }

    @Test
    void anArrayCutOffAfterTwoRowsAnswersThemThenOneMalformedRow() {
        for (String body : List.of("[{\"bit_depth\": 8}, {\"bit_depth\": 10}, {\"bit_de",
                "[{\"bit_depth\": 8}, {\"bit_depth\": 10}", "[{\"bit_depth\": 8}, {\"bit_depth\": 10},")) {
            List<JsonNode> rows = ndjsonRows(QUANTIZATION, JSON, body);
            assertThat(rowNumbers(rows)).as(body).containsExactly(1L, 2L, 3L);
            assertThat(statuses(rows)).as(body).containsExactly("OK", "OK", "INVALID");
            assertThat(rows.get(2).path("problem").path("type").asString()).isEqualTo("/problems/malformed-body");
        }
    }

    @Test
    void contentAfterTheArrayEndsTheAnswerWithOneMalformedRow() {
        List<JsonNode> rows = ndjsonRows(QUANTIZATION, JSON, "[{\"bit_depth\": 8}, {\"bit_depth\": 10}] [{}]");
        assertThat(rowNumbers(rows)).containsExactly(1L, 2L, 3L);
        assertThat(statuses(rows)).containsExactly("OK", "OK", "INVALID");
        assertThat(rows.get(2).path("problem").path("type").asString()).isEqualTo("/problems/malformed-body");
    }

    @Test
    void aNestedArrayIsOneInvalidRowAndTheNextElementIsRead() {
        // [[...]]: a batch wrapped once more. Skipped token by token, not built (regression: a large
        // one was built whole as a tree and ran the heap out)
        StringBuilder nested = new StringBuilder("[");
        for (int i = 0; i < 50_000; i++) {
            nested.append("{\"bit_depth\": 8},");
        }
        nested.append("[[{}]]]");
        List<JsonNode> rows = ndjsonRows(QUANTIZATION, JSON, "[{\"bit_depth\": 8}, " + nested + ", {\"bit_depth\": 10}]");
        assertThat(rowNumbers(rows)).containsExactly(1L, 2L, 3L);
        assertThat(statuses(rows)).containsExactly("OK", "INVALID", "OK");
        // the same problem as any element that is not an object
        assertThat(rows.get(1).get("problem"))
                .isEqualTo(ndjsonRows(QUANTIZATION, JSON, "[8]").get(0).get("problem"));
        assertThat(pointers(rows.get(1))).containsExactly("");
        assertThat(rows.get(2).path("result").path("levels").asLong()).isEqualTo(1024);
    }

    @Test
    void anElementOverTheLineLimitIsOneInvalidRowNotBuiltAndTheNextElementIsRead() {
        // One object of about 1.6 MB (an array of 800,000 numbers inside it, nested two deep), over
        // the 1 MiB an NDJSON line may have: skipped token by token, never built as a tree.
        StringBuilder huge = new StringBuilder("{\"bit_depth\": 8, \"extra\": {\"numbers\": [");
        for (int i = 0; i < 800_000; i++) {
            huge.append(i % 10).append(',');
        }
        huge.append("0]}}");
        assertThat(huge.length()).isGreaterThan((int) JsonArraySource.MAX_ELEMENT_BYTES);
        List<JsonNode> rows = ndjsonRows(QUANTIZATION, JSON, "[{\"bit_depth\": 8}, " + huge + ", {\"bit_depth\": 10}]");
        assertThat(rowNumbers(rows)).containsExactly(1L, 2L, 3L);
        assertThat(statuses(rows)).containsExactly("OK", "INVALID", "OK");
        assertThat(rows.get(1).path("problem").path("type").asString()).isEqualTo("/problems/malformed-body");
        assertThat(rows.get(1).path("problem").path("detail").asString()).contains("larger than 1048576 bytes");
        assertThat(rows.get(2).path("result").path("levels").asLong()).isEqualTo(1024);
        // just under the limit an element is read as usual (and refused for its unknown field)
        StringBuilder large = new StringBuilder("{\"bit_depth\": 8, \"extra\": [");
        for (int i = 0; i < 400_000; i++) {
            large.append(i % 10).append(',');
        }
        large.append("0]}");
        List<JsonNode> underLimit = ndjsonRows(QUANTIZATION, JSON, "[" + large + "]");
        assertThat(statuses(underLimit)).containsExactly("INVALID");
        assertThat(pointers(underLimit.get(0))).containsExactly("/extra");
    }

    @Test
    void aDuplicateKeyInAnElementIsMalformed() {
        List<JsonNode> rows = ndjsonRows(QUANTIZATION, JSON, "[{\"bit_depth\": 8}, {\"bit_depth\": 8, \"bit_depth\": 9}]");
        assertThat(statuses(rows)).containsExactly("OK", "INVALID");
        assertThat(rows.get(1).path("problem").path("type").asString()).isEqualTo("/problems/malformed-body");
    }

    @Test
    void aByteOrderMarkBeforeTheArrayIsSkipped() {
        byte[] text = "[{\"bit_depth\": 8}]".getBytes(java.nio.charset.StandardCharsets.UTF_8);
        byte[] body = new byte[text.length + 3];
        body[0] = (byte) 0xEF;
        body[1] = (byte) 0xBB;
        body[2] = (byte) 0xBF;
        System.arraycopy(text, 0, body, 3, text.length);
        RawHttp.Response r = batch(QUANTIZATION, JSON, NDJSON, body, false);
        assertThat(statuses(rows(r))).containsExactly("OK");
    }

    @Test
    void anElementIsAnsweredAsTheSameRowOnAnNdjsonLineWouldBe() {
        // Elements are read into the request record from their tokens (a tree only to explain one that
        // fails); NDJSON lines from their text. The same requests must give the same rows, problems and
        // pointers included: valid ones, wrong types, unknown fields, numbers beyond double range, a
        // lone surrogate, null, a scalar, an empty object, a sheet with its id.
        List<String> elements = List.of("{\"bit_depth\": 8}", "{\"bit_depth\": 8.5}", "{\"bit_depth\": \"8\"}",
                "{\"bit_depth\": 8, \"no_such_field\": 1}", "{\"bit_depth\": 1e400}", "{\"bit_depth\": 1e-400}",
                "{\"bit_depth\": 8, \"quantizer\": \"\\ud800\"}", "null", "8", "\"text\"", "{}",
                "{\"bit_depth\": 12, \"signal_height_percent_fsh\": -0.0}",
                "{\"bit_depth\": 12, \"full_scale_range_percent_fsh\": 100000000000000000000000000000000000000000}");
        List<JsonNode> fromArray = ndjsonRows(QUANTIZATION, JSON, "[" + String.join(", ", elements) + "]");
        List<JsonNode> fromLines = ndjsonRows(QUANTIZATION, NDJSON, String.join("\n", elements) + "\n");
        assertThat(fromArray).hasSize(elements.size());
        for (int i = 0; i < elements.size(); i++) {
            JsonNode a = fromArray.get(i);
            JsonNode b = fromLines.get(i);
            assertThat(a.path("status")).as(elements.get(i)).isEqualTo(b.path("status"));
            assertThat(a.path("problem")).as(elements.get(i)).isEqualTo(b.path("problem"));
            assertThat(a.path("result")).as(elements.get(i)).isEqualTo(b.path("result"));
        }
        assertThat(statuses(fromArray).get(0)).isEqualTo("OK");
    }
}
