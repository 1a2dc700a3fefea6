package utdigit.web.batch;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import tools.jackson.databind.JsonNode;

/** The body formats the batch endpoints read and the answer formats they write. */
class BatchFormatApiTest extends BatchApiTest {
    /** Three rows, the same in every body format: 8 bits at 40 %FSH, 12 bits truncating, 1 bit. */
    private static final String JSON_ROWS = """
            [{"bit_depth": 8, "signal_height_percent_fsh": 40},
             {"bit_depth": 12, "quantizer": "TRUNCATION"},
             {"bit_depth": 1}]""";
    private static final String NDJSON_ROWS = """
            {"bit_depth": 8, "signal_height_percent_fsh": 40}
            {"bit_depth": 12, "quantizer": "TRUNCATION"}
            {"bit_depth": 1}
            """;
    private static final String CSV_ROWS = """
            bit_depth,signal_height_percent_fsh,quantizer
            8,40,
            12,,TRUNCATION
            1,,
            """;

    private static void assertTheThreeRows(List<JsonNode> rows) {
        assertThat(rowNumbers(rows)).containsExactly(1L, 2L, 3L);
        assertThat(statuses(rows)).containsExactly("OK", "OK", "OK");
        // levels = 2^N codes of an N-bit converter (definition)
        assertThat(rows.stream().map(r -> r.path("result").path("levels").asLong()))
                .containsExactly(1L << 8, 1L << 12, 1L << 1);
        assertThat(rows.get(0).path("result").path("inputs").path("signal_height_percent_fsh").asDouble())
                .isEqualTo(40.0);
        assertThat(rows.get(1).path("result").path("inputs").path("quantizer").asString()).isEqualTo("TRUNCATION");
        assertThat(rows.get(2).path("result").path("inputs").path("quantizer").asString()).isEqualTo("ROUNDING");
        for (JsonNode row : rows) {
            assertThat(row.has("problem")).isFalse();
            assertThat(row.has("id")).as("only sheets have an id").isFalse();
            assertThat(row.path("result").path("stamp").path("sha256").asString()).matches("[0-9a-f]{64}");
        }
    }

    @Nested
    class BodyFormats {
        @Test
        void jsonArrayBodyAnswersEveryRow() {
            assertTheThreeRows(ndjsonRows(QUANTIZATION, JSON, JSON_ROWS));
        }

        @Test
        void ndjsonBodyAnswersEveryRow() {
            assertTheThreeRows(ndjsonRows(QUANTIZATION, NDJSON, NDJSON_ROWS));
        }

        @Test
        void ndjsonBodyWithCrlfAndBlankLinesAnswersEveryRow() {
            // Blank lines are not rows: the row numbers stay those of the objects.
            String body = "\r\n" + NDJSON_ROWS.replace("\n", "\r\n\r\n");
            assertTheThreeRows(ndjsonRows(QUANTIZATION, NDJSON, body));
        }

        @Test
        void csvBodyAnswersEveryRow() {
            assertTheThreeRows(ndjsonRows(QUANTIZATION, CSV, CSV_ROWS));
        }

        @Test
        void contentTypeParametersAreAccepted() {
            assertTheThreeRows(ndjsonRows(QUANTIZATION, "text/csv; charset=utf-8; header=present", CSV_ROWS));
            assertTheThreeRows(ndjsonRows(QUANTIZATION, "application/json;charset=UTF-8", JSON_ROWS));
        }

        @Test
        void everyBodyFormatGivesTheSameAnswerRows() {
            List<JsonNode> json = ndjsonRows(QUANTIZATION, JSON, JSON_ROWS);
            assertThat(ndjsonRows(QUANTIZATION, NDJSON, NDJSON_ROWS)).isEqualTo(json);
            assertThat(ndjsonRows(QUANTIZATION, CSV, CSV_ROWS)).isEqualTo(json);
        }

        @ParameterizedTest
        @ValueSource(strings = {"application/xml", "text/plain", "application/x-www-form-urlencoded",
                "application/problem+json"})
        void aContentTypeTheServiceCannotReadIs415(String contentType) {
            JsonNode problem = assertProblem(batch(QUANTIZATION, contentType, NDJSON, NDJSON_ROWS), 415,
                    "/problems/unsupported-media-type");
            assertThat(problem.path("detail").asString()).contains("text/csv");
        }

        @Test
        void noContentTypeIs415() {
            assertProblem(batch(QUANTIZATION, null, NDJSON, NDJSON_ROWS), 415, "/problems/unsupported-media-type");
        }

        @Test
        void anUnknownCalculationIs404() {
            assertThat(batch("no-such-calculations", NDJSON, NDJSON, NDJSON_ROWS).status()).isEqualTo(404);
        }
    }

    @Nested
    class AnswerFormats {
        @Test
        void noAcceptHeaderGivesNdjson() {
            RawHttp.Response r = batch(QUANTIZATION, NDJSON, null, NDJSON_ROWS);
            assertThat(r.status()).isEqualTo(200);
            assertThat(r.header("content-type")).startsWith(NDJSON);
            assertTheThreeRows(rows(r));
        }

        @ParameterizedTest
        @ValueSource(strings = {"*/*", "application/x-ndjson", "application/*", "text/html;q=0, */*;q=0.5",
                "application/x-ndjson;q=0.9, text/csv;q=0.1"})
        void ndjsonIsTheDefaultAndCanBeAskedFor(String accept) {
            RawHttp.Response r = batch(QUANTIZATION, NDJSON, accept, NDJSON_ROWS);
            assertThat(r.status()).as(r.body()).isEqualTo(200);
            assertThat(r.header("content-type")).startsWith(NDJSON);
            assertThat(r.header("cache-control")).isEqualTo("no-store");
            assertTheThreeRows(rows(r));
        }

        @Test
        void jsonAnswerIsOneArrayOfTheSameRows() {
            RawHttp.Response r = batch(QUANTIZATION, NDJSON, JSON, NDJSON_ROWS);
            assertThat(r.status()).isEqualTo(200);
            assertThat(r.header("content-type")).startsWith(JSON);
            JsonNode array = MAPPER.readTree(r.body());
            assertThat(array.isArray()).isTrue();
            List<JsonNode> rows = java.util.stream.StreamSupport.stream(array.spliterator(), false).toList();
            assertTheThreeRows(rows);
            assertThat(rows).isEqualTo(ndjsonRows(QUANTIZATION, NDJSON, NDJSON_ROWS));
        }

        @Test
        void jsonAnswerOfAnEmptyBatchIsAnEmptyArray() {
            RawHttp.Response r = batch(QUANTIZATION, NDJSON, JSON, "");
            assertThat(r.status()).isEqualTo(200);
            assertThat(MAPPER.readTree(r.body()).isArray()).isTrue();
            assertThat(MAPPER.readTree(r.body()).size()).isZero();
        }

        @Test
        void csvAnswerHasOneRecordPerRowUnderAFixedHeader() {
            RawHttp.Response r = batch(QUANTIZATION, NDJSON, "text/csv", NDJSON_ROWS + "{\"bit_depth\": 0}\n");
            assertThat(r.status()).isEqualTo(200);
            assertThat(r.header("content-type")).startsWith("text/csv");
            List<String[]> records = csvRecords(r.body());
            List<String> header = Arrays.asList(records.get(0));
            assertThat(header.subList(0, 3)).containsExactly("row", "id", "status");
            assertThat(header.subList(header.size() - 3, header.size()))
                    .containsExactly("problem.type", "problem.detail", "problem.pointers");
            assertThat(header).contains("levels", "lsb_percent_fsh", "amplitude_error_over_db", "warnings",
                    "stamp.sha256");
            assertThat(records).hasSize(5);
            for (String[] record : records) {
                assertThat(record).hasSameSizeAs(records.get(0));
            }
            int levels = header.indexOf("levels");
            int status = header.indexOf("status");
            assertThat(records.stream().skip(1).map(rec -> rec[0])).containsExactly("1", "2", "3", "4");
            assertThat(records.stream().skip(1).map(rec -> rec[status])).containsExactly("OK", "OK", "OK", "INVALID");
            assertThat(records.get(1)[levels]).isEqualTo("256");
            assertThat(records.get(2)[levels]).isEqualTo("4096");
            // an INVALID row has no result cells and names its field in problem.pointers
            assertThat(records.get(4)[levels]).isEmpty();
            assertThat(records.get(4)[header.indexOf("problem.type")]).isEqualTo("/problems/invalid-input");
            assertThat(records.get(4)[header.indexOf("problem.pointers")]).isEqualTo("/bit_depth");
        }

        @Test
        void csvHeaderIsTheSameWhateverTheRows() {
            String allOk = batch(QUANTIZATION, NDJSON, CSV, NDJSON_ROWS).body();
            String allInvalid = batch(QUANTIZATION, NDJSON, CSV, "{\"bit_depth\": 0}\n").body();
            String none = batch(QUANTIZATION, NDJSON, CSV, "").body();
            String[] header = csvRecords(allOk).get(0);
            assertThat(csvRecords(allInvalid).get(0)).isEqualTo(header);
            assertThat(csvRecords(none)).hasSize(1);
            assertThat(csvRecords(none).get(0)).isEqualTo(header);
        }

        @ParameterizedTest
        @ValueSource(strings = {"application/xml", "text/html", "application/problem+json", "image/*",
                "application/x-ndjson;q=0"})
        void anAcceptTheServiceCannotProduceIs406(String accept) {
            assertProblem(batch(QUANTIZATION, NDJSON, accept, NDJSON_ROWS), 406, "/problems/not-acceptable");
        }

        @Test
        void qualityValuesChooseTheAnswerFormat() {
            RawHttp.Response r = batch(QUANTIZATION, NDJSON, "application/x-ndjson;q=0.2, text/csv;q=0.8", NDJSON_ROWS);
            assertThat(r.header("content-type")).startsWith("text/csv");
            r = batch(QUANTIZATION, NDJSON, "text/*, application/json;q=0.5", NDJSON_ROWS);
            assertThat(r.header("content-type")).startsWith("text/csv");
        }
    }
}
