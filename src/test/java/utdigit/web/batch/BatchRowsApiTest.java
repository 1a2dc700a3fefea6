package utdigit.web.batch;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.node.ObjectNode;

/** Row by row: bad rows marked and kept, order kept, each row answered exactly as the single endpoint. */
class BatchRowsApiTest extends BatchApiTest {

    @Nested
    class ABadRowInTheMiddle {
        private void assertRowTwoIsInvalidAt(List<JsonNode> rows, String pointer) {
            assertThat(rowNumbers(rows)).containsExactly(1L, 2L, 3L);
            assertThat(statuses(rows)).containsExactly("OK", "INVALID", "OK");
            JsonNode bad = rows.get(1);
            assertThat(bad.has("result")).isFalse();
            assertThat(bad.path("problem").path("type").asString()).isEqualTo("/problems/invalid-input");
            assertThat(bad.path("problem").path("status").asInt()).isEqualTo(400);
            assertThat(pointers(bad)).containsExactly(pointer);
            // its neighbours are intact: 2^8 and 2^10 codes
            assertThat(rows.get(0).path("result").path("levels").asLong()).isEqualTo(256);
            assertThat(rows.get(2).path("result").path("levels").asLong()).isEqualTo(1024);
        }

        @Test
        void inAJsonArray() {
            assertRowTwoIsInvalidAt(ndjsonRows(QUANTIZATION, JSON, """
                    [{"bit_depth": 8}, {"bit_depth": 8, "signal_height_percent_fsh": 101}, {"bit_depth": 10}]"""),
                    "/signal_height_percent_fsh");
        }

        @Test
        void inNdjson() {
            assertRowTwoIsInvalidAt(ndjsonRows(QUANTIZATION, NDJSON, """
                    {"bit_depth": 8}
                    {"bit_depth": 8, "averaging": 0}
                    {"bit_depth": 10}
                    """), "/averaging");
        }

        @Test
        void inCsv() {
            assertRowTwoIsInvalidAt(ndjsonRows(QUANTIZATION, CSV, """
                    bit_depth,digital_gain_db
                    8,
                    8,61
                    10,
                    """), "/digital_gain_db");
        }

        @Test
        void anUnknownFieldIsInvalidAtThatField() {
            assertRowTwoIsInvalidAt(ndjsonRows(QUANTIZATION, NDJSON, """
                    {"bit_depth": 8}
                    {"bit_depth": 8, "bit_depht": 9}
                    {"bit_depth": 10}
                    """), "/bit_depht");
        }

        @Test
        void aRowThatIsNotAnObjectIsInvalid() {
            List<JsonNode> rows = ndjsonRows(QUANTIZATION, JSON, "[{\"bit_depth\": 8}, [8], 42, null, {\"bit_depth\": 10}]");
            assertThat(rowNumbers(rows)).containsExactly(1L, 2L, 3L, 4L, 5L);
            assertThat(statuses(rows)).containsExactly("OK", "INVALID", "INVALID", "INVALID", "OK");
        }

        @Test
        void aRequiredFieldMissingIsInvalidAtIt() {
            List<JsonNode> rows = ndjsonRows(PULSE, NDJSON, """
                    {"frequency_mhz": 5, "velocity_m_per_s": 5920}
                    {"velocity_m_per_s": 5920}
                    {"frequency_mhz": 10, "velocity_m_per_s": 5920}
                    """);
            assertThat(statuses(rows)).containsExactly("OK", "INVALID", "OK");
            assertThat(pointers(rows.get(1))).containsExactly("/frequency_mhz");
        }

        @Test
        void anImpossibleCombinationIsInvalidWithItsOwnProblemType() {
            List<JsonNode> rows = ndjsonRows(PULSE, NDJSON, """
                    {"frequency_mhz": 5, "velocity_m_per_s": 5920}
                    {"frequency_mhz": 5, "material": "water", "wave_mode": "SHEAR"}
                    {"frequency_mhz": 10, "velocity_m_per_s": 5920}
                    """);
            assertThat(statuses(rows)).containsExactly("OK", "INVALID", "OK");
            assertThat(rows.get(1).path("problem").path("type").asString()).isEqualTo("/problems/impossible-combination");
            assertThat(rows.get(1).path("problem").path("status").asInt()).isEqualTo(422);
            assertThat(pointers(rows.get(1))).contains("/wave_mode");
        }
    }

    @Nested
    class NdjsonLines {
        @Test
        void aLineThatIsNotJsonIsInvalidAndTheNextLineIsRead() {
            List<JsonNode> rows = ndjsonRows(QUANTIZATION, NDJSON, """
                    {"bit_depth": 8}
                    this is not JSON
                    {"bit_depth": 9
                    {"bit_depth": 10} {"bit_depth": 11}
                    {"bit_depth": 12, "bit_depth": 13}
                    {"bit_depth": 14}
                    """);
            assertThat(rowNumbers(rows)).containsExactly(1L, 2L, 3L, 4L, 5L, 6L);
            assertThat(statuses(rows)).containsExactly("OK", "INVALID", "INVALID", "INVALID", "INVALID", "OK");
            for (JsonNode bad : rows.subList(1, 5)) {
                assertThat(bad.path("problem").path("type").asString()).isEqualTo("/problems/malformed-body");
                assertThat(pointers(bad)).containsExactly("");
            }
            assertThat(rows.get(4).path("problem").path("detail").asString()).contains("more than once");
            assertThat(rows.get(5).path("result").path("levels").asLong()).isEqualTo(1L << 14);
        }
    }

    @Nested
    class OverlongLines {
        @Test
        void aJsonArraySentAsNdjsonIsOneInvalidRowAndTheNextLineIsRead() {
            // a whole batch on one line (a JSON array posted as NDJSON) is over the line limit: it is
            // skipped unread, not held (regression: such a line was kept whole and ran the heap out)
            StringBuilder array = new StringBuilder("[");
            while (array.length() <= NdjsonSource.MAX_LINE_CHARS) {
                array.append("{\"bit_depth\": 8},");
            }
            array.append("{\"bit_depth\": 8}]");
            List<JsonNode> rows = ndjsonRows(QUANTIZATION, NDJSON,
                    "{\"bit_depth\": 8}\n" + array + "\r\n{\"bit_depth\": 10}\n");
            assertThat(rowNumbers(rows)).containsExactly(1L, 2L, 3L);
            assertThat(statuses(rows)).containsExactly("OK", "INVALID", "OK");
            assertThat(rows.get(1).path("problem").path("type").asString()).isEqualTo("/problems/malformed-body");
            assertThat(rows.get(1).path("problem").path("detail").asString()).contains("longer than");
            assertThat(rows.get(2).path("result").path("levels").asLong()).isEqualTo(1024);
        }

        @Test
        void aLineJustUnderTheLimitIsRead() {
            String line = "{\"bit_depth\": 8}";
            String padded = line.substring(0, line.length() - 1)
                    + " ".repeat(NdjsonSource.MAX_LINE_CHARS - line.length()) + "}";
            assertThat(padded).hasSize(NdjsonSource.MAX_LINE_CHARS);
            List<JsonNode> rows = ndjsonRows(QUANTIZATION, NDJSON, padded + "\r\n" + padded + "\n" + padded);
            assertThat(statuses(rows)).containsExactly("OK", "OK", "OK");
        }

        @Test
        void aLineOneOverTheLimitIsNot() {
            String line = "{\"bit_depth\": 8}";
            String padded = line.substring(0, line.length() - 1)
                    + " ".repeat(NdjsonSource.MAX_LINE_CHARS + 1 - line.length()) + "}";
            List<JsonNode> rows = ndjsonRows(QUANTIZATION, NDJSON, padded + "\r\n" + padded + "\n" + line);
            assertThat(statuses(rows)).containsExactly("INVALID", "INVALID", "OK");
        }
    }

    @Nested
    class OrderAndCount {
        @Test
        void fiveHundredRowsComeBackInOrderOnePerRow() {
            // bit depths cycle 1..32 with one bad row in every 50 (bit_depth 0): none is dropped or moved.
            StringBuilder csv = new StringBuilder("bit_depth\n");
            int rows = 500;
            for (int i = 1; i <= rows; i++) {
                csv.append(i % 50 == 0 ? 0 : 1 + i % 32).append('\n');
            }
            for (String accept : List.of(NDJSON, JSON, CSV)) {
                RawHttp.Response r = batch(QUANTIZATION, CSV, accept, csv.toString());
                assertThat(r.status()).isEqualTo(200);
                List<long[]> answered = new ArrayList<>();
                if (accept.equals(CSV)) {
                    List<String[]> records = csvRecords(r.body());
                    int levels = List.of(records.get(0)).indexOf("levels");
                    for (String[] rec : records.subList(1, records.size())) {
                        answered.add(new long[] {Long.parseLong(rec[0]), rec[levels].isEmpty() ? -1 : Long.parseLong(rec[levels])});
                    }
                } else {
                    Iterable<JsonNode> nodes = accept.equals(JSON) ? MAPPER.readTree(r.body()) : rows(r);
                    for (JsonNode n : nodes) {
                        answered.add(new long[] {n.path("row").asLong(),
                                n.path("status").asString().equals("OK") ? n.path("result").path("levels").asLong() : -1});
                    }
                }
                assertThat(answered).as(accept).hasSize(rows);
                for (int i = 1; i <= rows; i++) {
                    long[] a = answered.get(i - 1);
                    assertThat(a[0]).as(accept + " row number").isEqualTo(i);
                    assertThat(a[1]).as(accept + " levels of row " + i).isEqualTo(i % 50 == 0 ? -1 : 1L << (1 + i % 32));
                }
            }
        }
    }

    /** The batch row's result is the single endpoint's answer, stamp included. */
    @Nested
    class SameAsTheSingleEndpoint {
        private void assertEveryRowAnswersAsTheSingleEndpoint(String calculation, List<String> requests,
                                                              List<String> expectedStatuses) {
            String ndjson = requests.stream().map(s -> s.replace("\n", " ")).collect(Collectors.joining("\n"));
            List<JsonNode> rows = ndjsonRows(calculation, NDJSON, ndjson);
            assertThat(statuses(rows)).containsExactlyElementsOf(expectedStatuses);
            for (int i = 0; i < requests.size(); i++) {
                Single single = single(calculation, requests.get(i));
                JsonNode row = rows.get(i);
                assertThat(row.path("row").asLong()).isEqualTo(i + 1);
                if (single.status() == 200) {
                    assertThat(row.path("status").asString()).isEqualTo("OK");
                    assertThat(row.get("result")).as("row " + (i + 1)).isEqualTo(single.body());
                } else {
                    // the problem of the row is the single endpoint's problem without its instance
                    ObjectNode expected = (ObjectNode) single.body().deepCopy();
                    expected.remove("instance");
                    assertThat(row.path("status").asString()).isEqualTo("INVALID");
                    assertThat(row.get("problem")).as("row " + (i + 1)).isEqualTo(expected);
                    assertThat(row.path("problem").path("status").asInt()).isEqualTo(single.status());
                }
            }
        }

        @Test
        void quantizationAssessments() {
            assertEveryRowAnswersAsTheSingleEndpoint(QUANTIZATION, List.of(
                    """
                    {"bit_depth": 8, "signal_height_percent_fsh": 40, "amplitude_tolerance_db": 1,
                     "reference_height_percent_fsh": 80, "evaluation_level_db": -14, "averaging": 4}""",
                    "{\"bit_depth\": 8, \"digitized_signal\": \"RECTIFIED\"}",
                    """
                    {"bit_depth": 12, "quantizer": "TRUNCATION", "code_mapping": "MAX_CODE", "digital_gain_db": 6,
                     "signal_height_percent_fsh": 5}""",
                    "{\"bit_depth\": 33}",
                    "{\"bit_depth\": 8.5}",
                    "{\"bit_depth\": \"8\"}",
                    "{\"bit_depth\": 16, \"quantizer\": \"NEAREST\"}"),
                    List.of("OK", "OK", "OK", "INVALID", "INVALID", "INVALID", "INVALID"));
        }

        @Test
        void pulseParameters() {
            assertEveryRowAnswersAsTheSingleEndpoint(PULSE, List.of(
                    "{\"frequency_mhz\": 5, \"bandwidth_percent\": 60, \"element_diameter_mm\": 10, "
                            + "\"material\": \"carbon-steel\"}",
                    """
                    {"frequency_mhz": 2.25, "velocity_in_per_us": 0.2331, "element_diameter_in": 0.5,
                     "distance_in": 2, "bandwidth_percent": 80, "centre_frequency_convention": "GEOMETRIC"}""",
                    """
                    {"frequency_mhz": 4, "material": "carbon-steel", "wave_mode": "SHEAR", "element_diameter_mm": 8,
                     "wedge_path_mm": 12, "wedge_velocity_m_per_s": 2730, "incident_angle_deg": 36}""",
                    "{\"frequency_mhz\": 5, \"material\": \"water\", \"temperature_c\": 40}",
                    "{\"frequency_mhz\": 5, \"velocity_m_per_s\": 5920, \"centre_frequency_convention\": \"GEOMETRIC\"}",
                    "{\"frequency_mhz\": 5, \"element_diameter_mm\": 10, \"element_diameter_in\": 0.4, "
                            + "\"velocity_m_per_s\": 5920}",
                    "{\"frequency_mhz\": 5, \"material\": \"water\", \"wave_mode\": \"SHEAR\"}"),
                    List.of("OK", "OK", "OK", "OK", "INVALID", "INVALID", "INVALID"));
        }

        @Test
        void acquisitionBudgets() {
            assertEveryRowAnswersAsTheSingleEndpoint(ACQUISITION, List.of(
                    """
                    {"sampling_frequency_mhz": 100, "decimation_factor": 2, "bit_depth": 12, "gate_length_mm": 75,
                     "material": "carbon-steel", "wave_mode": "SHEAR", "focal_laws": 122, "averaging": 1,
                     "scan_increment_mm": 1, "scan_length_mm": 2900, "pulse_repetition_frequency_hz": 6000,
                     "planned_scan_speed_mm_per_s": 40, "max_sound_path_mm": 120, "wraparound_decay_factor": 1.5,
                     "file_size_limit_megabytes": 2000}""",
                    """
                    {"sampling_frequency_mhz": 100, "bit_depth": 16, "gate_length_us": 20, "fmc_element_count": 64,
                     "capture": "HMC", "scan_increment_in": 0.04, "scan_length_in": 20,
                     "pulse_repetition_frequency_hz": 20000}""",
                    """
                    {"sampling_frequency_mhz": 100, "bit_depth": 8, "gate_length_us": 20, "scan_increment_mm": 1,
                     "pulse_repetition_frequency_hz": 10000, "max_round_trip_us": 40}""",
                    """
                    {"sampling_frequency_mhz": 100, "bit_depth": 8, "scan_increment_mm": 1,
                     "pulse_repetition_frequency_hz": 10000, "gate_length_mm": 50, "material": "water",
                     "wave_mode": "SHEAR"}""",
                    """
                    {"sampling_frequency_mhz": 100, "bit_depth": 0, "gate_length_us": 20, "scan_increment_mm": 1,
                     "pulse_repetition_frequency_hz": 10000}""",
                    """
                    {"sampling_frequency_mhz": 100, "bit_depth": 8, "gate_length_us": 20,
                     "pulse_repetition_frequency_hz": 10000}"""),
                    List.of("OK", "OK", "OK", "INVALID", "INVALID", "INVALID"));
        }

        @Test
        void aCsvRowIsAnsweredAsTheSameRequestInJson() {
            List<JsonNode> rows = ndjsonRows(ACQUISITION, CSV, """
                    sampling_frequency_mhz,bit_depth,gate_length_us,focal_laws,scan_increment_mm,pulse_repetition_frequency_hz
                    100,8,40,120,1,12000
                    """);
            Single single = single(ACQUISITION, """
                    {"sampling_frequency_mhz": 100, "bit_depth": 8, "gate_length_us": 40, "focal_laws": 120,
                     "scan_increment_mm": 1, "pulse_repetition_frequency_hz": 12000}""");
            assertThat(single.status()).isEqualTo(200);
            assertThat(rows).hasSize(1);
            assertThat(rows.get(0).get("result")).isEqualTo(single.body());
        }
    }

    @Nested
    class Streaming {
        @Test
        void theFirstAnswersArriveBeforeTheBodyEnds() throws Exception {
            // The body stops half-way until the first answer line has been read: a service that held the
            // whole batch before answering would never answer, and the test would fail on the latch.
            CountDownLatch firstAnswerRead = new CountDownLatch(1);
            RawHttp.Body body = out -> {
                out.write("bit_depth\n".getBytes(StandardCharsets.UTF_8));
                for (int i = 0; i < 600; i++) {
                    out.write("8\n".getBytes(StandardCharsets.UTF_8));
                }
                out.flush();
                try {
                    firstAnswerRead.await(60, TimeUnit.SECONDS);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                }
                for (int i = 0; i < 600; i++) {
                    out.write("12\n".getBytes(StandardCharsets.UTF_8));
                }
            };
            boolean answeredBeforeTheEnd;
            List<String> lines = new ArrayList<>();
            try (RawHttp.Exchange e = RawHttp.open(port, "/api/" + QUANTIZATION + "/batch",
                    List.of("Content-Type: text/csv", "Accept: application/x-ndjson"), body, -1)) {
                assertThat(e.status).isEqualTo(200);
                BufferedReader reader = new BufferedReader(new InputStreamReader(e.body, StandardCharsets.UTF_8));
                lines.add(reader.readLine());
                answeredBeforeTheEnd = firstAnswerRead.getCount() == 1;
                firstAnswerRead.countDown();
                for (String line = reader.readLine(); line != null; line = reader.readLine()) {
                    lines.add(line);
                }
                assertThat(e.awaitWriter()).isNull();
            }
            assertThat(answeredBeforeTheEnd).isTrue();
            assertThat(lines).hasSize(1200);
            assertThat(lines.get(0)).startsWith("{\"row\":1,\"status\":\"OK\"");
            assertThat(lines.get(599)).contains("\"levels\":256,");
            assertThat(lines.get(600)).startsWith("{\"row\":601,").contains("\"levels\":4096,");
        }
    }
}
