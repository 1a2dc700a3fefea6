package utdigit.web.batch;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.LongStream;
import org.junit.jupiter.api.Test;
import org.springframework.test.context.TestPropertySource;
import tools.jackson.databind.JsonNode;

/**
 * utdigit.batch.workers: rows answered on several worker threads still come out in input order,
 * each the single endpoint's answer, with bad rows in their place, past the 256-row window and
 * across the flushes (every 7 rows here).
 */
@TestPropertySource(properties = {"utdigit.batch.workers=4", "utdigit.batch.flush-every-rows=7"})
class BatchWorkersApiTest extends BatchApiTest {
    private static final int ROWS = 1_500;

    /** Row i (1-based): a pulse-model search of varied cost; every 11th row has no frequency (INVALID). */
    private static String row(int i) {
        if (i % 11 == 0) {
            return "{\"sampling_frequency_mhz\": 100}";
        }
        // bandwidths from 20 % to 119 % and rates from 4 to 53 samples per period: searches of different length
        return "{\"sampling_frequency_mhz\": " + (20 + i % 50) + ", \"frequency_mhz\": 5, \"bandwidth_percent\": "
                + (20 + i % 100) + "}";
    }

    @Test
    void manyRowsOnFourWorkersComeOutInOrderAndEqualTheSingleAnswers() {
        StringBuilder body = new StringBuilder();
        for (int i = 1; i <= ROWS; i++) {
            body.append(row(i)).append('\n');
        }
        List<JsonNode> rows = ndjsonRows("sampling-assessments", NDJSON, body.toString());

        assertThat(rowNumbers(rows)).containsExactlyElementsOf(LongStream.rangeClosed(1, ROWS).boxed().toList());
        List<String> expected = new ArrayList<>();
        for (int i = 1; i <= ROWS; i++) {
            expected.add(i % 11 == 0 ? "INVALID" : "OK");
        }
        assertThat(statuses(rows)).containsExactlyElementsOf(expected);
        assertThat(pointers(rows.get(10))).containsExactly("/frequency_mhz");
        // a sample of rows through the single endpoint: the same answer, stamp included
        for (int i : new int[] {1, 2, 255, 256, 257, 258, 700, 1499}) {
            Single single = single("sampling-assessments", row(i));
            assertThat(single.status()).isEqualTo(200);
            assertThat(rows.get(i - 1).path("result")).as("row %d", i).isEqualTo(single.body());
        }
    }

    @Test
    void theCsvAnswerHasEveryRowInOrderAcrossTheFlushes() {
        StringBuilder body = new StringBuilder("bit_depth\n");
        for (int i = 1; i <= ROWS; i++) {
            body.append(i % 13 == 0 ? 0 : 1 + i % 24).append('\n'); // 0 bits is INVALID
        }
        RawHttp.Response r = batch(QUANTIZATION, CSV, CSV, body.toString());
        assertThat(r.status()).isEqualTo(200);
        List<String[]> records = csvRecords(r.body());
        assertThat(records).hasSize(ROWS + 1); // the header first
        for (int i = 1; i <= ROWS; i++) {
            String[] record = records.get(i);
            assertThat(record[0]).isEqualTo(Integer.toString(i));
            assertThat(record[2]).isEqualTo(i % 13 == 0 ? "INVALID" : "OK");
        }
    }
}
