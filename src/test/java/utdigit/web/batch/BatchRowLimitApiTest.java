package utdigit.web.batch;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.springframework.test.context.TestPropertySource;
import tools.jackson.databind.JsonNode;

/** utdigit.batch.max-rows: rows past it are not processed, and the answer says where to resume. */
@TestPropertySource(properties = "utdigit.batch.max-rows=3")
class BatchRowLimitApiTest extends BatchApiTest {
    private static final String FIVE_ROWS = "bit_depth\n1\n2\n3\n4\n5\n";

    private static void assertThreeRowsThenTheLimit(List<JsonNode> rows) {
        assertThat(rowNumbers(rows)).containsExactly(1L, 2L, 3L, 4L);
        assertThat(statuses(rows)).containsExactly("OK", "OK", "OK", "LIMIT_REACHED");
        JsonNode limit = rows.get(3);
        assertThat(limit.path("first_unprocessed_row").asLong()).isEqualTo(4);
        assertThat(limit.has("result")).isFalse();
        assertThat(limit.path("problem").path("type").asString()).isEqualTo("/problems/payload-too-large");
        assertThat(limit.path("problem").path("detail").asString()).contains("row 4").contains("3");
        // the three rows answered are the first three: 2^1, 2^2, 2^3 codes
        assertThat(rows.subList(0, 3).stream().map(r -> r.path("result").path("levels").asLong()))
                .containsExactly(2L, 4L, 8L);
    }

    @Test
    void aFiveRowBatchAnswersThreeRowsThenOneLimitRow() {
        assertThreeRowsThenTheLimit(ndjsonRows(QUANTIZATION, CSV, FIVE_ROWS));
        assertThreeRowsThenTheLimit(ndjsonRows(QUANTIZATION, NDJSON,
                "{\"bit_depth\": 1}\n{\"bit_depth\": 2}\n{\"bit_depth\": 3}\n{\"bit_depth\": 4}\n{\"bit_depth\": 5}\n"));
        assertThreeRowsThenTheLimit(ndjsonRows(QUANTIZATION, JSON,
                "[{\"bit_depth\": 1}, {\"bit_depth\": 2}, {\"bit_depth\": 3}, {\"bit_depth\": 4}, {\"bit_depth\": 5}]"));
    }

    @Test
    void aBatchOfExactlyTheLimitHasNoLimitRow() {
        List<JsonNode> rows = ndjsonRows(QUANTIZATION, CSV, "bit_depth\n1\n2\n3\n");
        assertThat(statuses(rows)).containsExactly("OK", "OK", "OK");
        // blank lines after the last row are not rows
        assertThat(statuses(ndjsonRows(QUANTIZATION, CSV, "bit_depth\n1\n2\n3\n\n\n"))).containsExactly("OK", "OK", "OK");
    }

    @Test
    void invalidRowsCountAsRows() {
        List<JsonNode> rows = ndjsonRows(QUANTIZATION, CSV, "bit_depth\n1\n0\n3\n4\n");
        assertThat(statuses(rows)).containsExactly("OK", "INVALID", "OK", "LIMIT_REACHED");
        assertThat(rows.get(3).path("first_unprocessed_row").asLong()).isEqualTo(4);
    }

    @Test
    void theJsonAnswerIsStillOneWellFormedArray() {
        RawHttp.Response r = batch(QUANTIZATION, CSV, JSON, FIVE_ROWS);
        assertThat(r.status()).isEqualTo(200);
        JsonNode array = MAPPER.readTree(r.body());
        assertThat(array.isArray()).isTrue();
        assertThreeRowsThenTheLimit(java.util.stream.StreamSupport.stream(array.spliterator(), false).toList());
    }

    @Test
    void theCsvAnswerEndsWithTheLimitRecordNamingTheRowToResumeFrom() {
        List<String[]> records = csvRecords(batch(QUANTIZATION, CSV, CSV, FIVE_ROWS).body());
        List<String> header = List.of(records.get(0));
        assertThat(records).hasSize(5);
        String[] limit = records.get(4);
        assertThat(limit[header.indexOf("row")]).isEqualTo("4");
        assertThat(limit[header.indexOf("status")]).isEqualTo("LIMIT_REACHED");
        assertThat(limit[header.indexOf("problem.type")]).isEqualTo("/problems/payload-too-large");
        assertThat(limit[header.indexOf("problem.detail")]).contains("resume from row 4");
    }
}
