package utdigit.web.batch;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.function.IntFunction;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.springframework.test.context.TestPropertySource;
import tools.jackson.databind.JsonNode;

/**
 * utdigit.batch.max-body-bytes: a Content-Length above it is a 413 before any row; a chunked body
 * that grows past it ends the answer with one LIMIT_REACHED row naming the first row not processed.
 */
@TestPropertySource(properties = "utdigit.batch.max-body-bytes=" + BatchBodyLimitApiTest.LIMIT)
class BatchBodyLimitApiTest extends BatchApiTest {
    static final int LIMIT = 100_000;

    /** A body of {@code rows} rows, each padded with spaces to about 1000 bytes so the answer stays small. */
    private static byte[] body(String format, int rows) {
        String pad = " ".repeat(990);
        IntFunction<String> row = switch (format) {
            case CSV -> i -> pad + (1 + i % 32) + "\n";
            case NDJSON -> i -> "{\"bit_depth\":" + pad + (1 + i % 32) + "}\n";
            default -> i -> (i == 0 ? "" : ",") + "{\"bit_depth\":" + pad + (1 + i % 32) + "}\n";
        };
        StringBuilder b = new StringBuilder(switch (format) {
            case CSV -> "bit_depth\n";
            case NDJSON -> "";
            default -> "[";
        });
        for (int i = 0; i < rows; i++) {
            b.append(row.apply(i));
        }
        if (format.equals(JSON)) {
            b.append("]");
        }
        return b.toString().getBytes(StandardCharsets.UTF_8);
    }

    @ParameterizedTest
    @ValueSource(strings = {CSV, NDJSON, JSON})
    void aContentLengthOverTheLimitIsA413BeforeAnyRow(String format) {
        byte[] body = body(format, 300);
        assertThat(body.length).isGreaterThan(LIMIT);
        JsonNode problem = assertProblem(batch(QUANTIZATION, format, NDJSON, body, false), 413,
                "/problems/payload-too-large");
        assertThat(problem.path("detail").asString()).contains(String.valueOf(LIMIT));
    }

    @Test
    void aBodyOfExactlyTheLimitIsAnswered() {
        byte[] rows = body(CSV, 90);
        String padded = new String(rows, StandardCharsets.UTF_8) + "\n".repeat(LIMIT - rows.length);
        byte[] body = padded.getBytes(StandardCharsets.UTF_8);
        assertThat(body.length).isEqualTo(LIMIT);
        for (boolean chunked : new boolean[] {false, true}) {
            List<JsonNode> answered = rows(batch(QUANTIZATION, CSV, NDJSON, body, chunked));
            assertThat(answered).hasSize(90);
            assertThat(answered).allSatisfy(r -> assertThat(r.path("status").asString()).isEqualTo("OK"));
        }
    }

    @ParameterizedTest
    @ValueSource(strings = {CSV, NDJSON, JSON})
    void aChunkedBodyOverTheLimitEndsWithOneLimitRow(String format) {
        // regression (CSV, JSON): the parsers wrapped the limit's IOException and the batch ended with
        // rows "not well-formed" instead of the LIMIT_REACHED row
        int sent = 300;
        List<JsonNode> rows = rows(batch(QUANTIZATION, format, NDJSON, body(format, sent), true));
        JsonNode last = rows.get(rows.size() - 1);
        assertThat(last.path("status").asString()).isEqualTo("LIMIT_REACHED");
        long firstUnprocessed = last.path("first_unprocessed_row").asLong();
        // every row before it answered OK, in order; it lies inside the batch and past no byte limit
        assertThat(rows).hasSize((int) firstUnprocessed);
        for (int i = 0; i < rows.size() - 1; i++) {
            assertThat(rows.get(i).path("row").asLong()).isEqualTo(i + 1);
            assertThat(rows.get(i).path("status").asString()).isEqualTo("OK");
            assertThat(rows.get(i).path("result").path("levels").asLong()).isEqualTo(1L << (1 + i % 32));
        }
        assertThat(firstUnprocessed).isBetween(1L, (long) LIMIT / 1000 + 1);
        assertThat(last.path("row").asLong()).isEqualTo(firstUnprocessed);
        assertThat(last.path("problem").path("type").asString()).isEqualTo("/problems/payload-too-large");
        assertThat(last.path("problem").path("detail").asString()).contains("resume from row " + firstUnprocessed);
    }

    @ParameterizedTest
    @ValueSource(strings = {CSV, JSON})
    void aChunkedBodyPassingTheLimitBeforeItsFirstRowIsA413(String format) {
        // regression: a CSV header (or the white space before a JSON array) past the limit read as a
        // malformed body, a 400
        String body = format.equals(CSV) ? " ".repeat(LIMIT + 1) + "bit_depth\n8\n" : " ".repeat(LIMIT + 1) + "[]";
        assertProblem(batch(QUANTIZATION, format, NDJSON, body.getBytes(StandardCharsets.UTF_8), true), 413,
                "/problems/payload-too-large");
    }
}
