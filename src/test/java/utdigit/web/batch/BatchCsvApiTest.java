package utdigit.web.batch;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import tools.jackson.databind.JsonNode;

/** text/csv bodies (RFC 4180, UTF-8 with or without BOM, CRLF or LF) and text/csv answers. */
class BatchCsvApiTest extends BatchApiTest {
    private static final byte[] UTF8_BOM = {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF};

    @Nested
    class Encoding {
        @Test
        void aByteOrderMarkAndCrlfLineEndsAreRead() {
            ByteArrayOutputStream body = new ByteArrayOutputStream();
            body.writeBytes(UTF8_BOM);
            body.writeBytes("bit_depth,quantizer\r\n8,TRUNCATION\r\n12,ROUNDING\r\n".getBytes(StandardCharsets.UTF_8));
            RawHttp.Response r = batch(QUANTIZATION, CSV, NDJSON, body.toByteArray(), false);
            List<JsonNode> rows = rows(r);
            assertThat(statuses(rows)).containsExactly("OK", "OK");
            // the BOM is not part of the first column's name, the CR not part of the last cell
            assertThat(rows.get(0).path("result").path("inputs").path("bit_depth").asInt()).isEqualTo(8);
            assertThat(rows.get(0).path("result").path("inputs").path("quantizer").asString()).isEqualTo("TRUNCATION");
            assertThat(rows.get(1).path("result").path("levels").asLong()).isEqualTo(4096);
        }

        @Test
        void withAndWithoutBomAndCrlfTheAnswersAreTheSame() {
            String lf = "bit_depth,signal_height_percent_fsh\n8,40\n10,20\n";
            ByteArrayOutputStream bomCrlf = new ByteArrayOutputStream();
            bomCrlf.writeBytes(UTF8_BOM);
            bomCrlf.writeBytes(lf.replace("\n", "\r\n").getBytes(StandardCharsets.UTF_8));
            assertThat(rows(batch(QUANTIZATION, CSV, NDJSON, bomCrlf.toByteArray(), false)))
                    .isEqualTo(ndjsonRows(QUANTIZATION, CSV, lf));
        }

        @Test
        void quotedFieldsAndHeaderNamesAreRead() {
            List<JsonNode> rows = ndjsonRows(QUANTIZATION, CSV, """
                    "bit_depth","quantizer","digitized_signal"
                    "8","TRUNCATION","RECTIFIED"
                    10,"ROUND""ING",RF
                    "12","ROUNDING, TRUNCATION",RF
                    "16",ROUNDING,"RF"
                    """);
            assertThat(statuses(rows)).containsExactly("OK", "INVALID", "INVALID", "OK");
            assertThat(rows.get(0).path("result").path("inputs").path("digitized_signal").asString())
                    .isEqualTo("RECTIFIED");
            // an escaped quote and a quoted comma stay inside their cell: the enum is wrong, at its field
            assertThat(pointers(rows.get(1))).containsExactly("/quantizer");
            assertThat(pointers(rows.get(2))).containsExactly("/quantizer");
            assertThat(rows.get(3).path("result").path("levels").asLong()).isEqualTo(1L << 16);
        }

        @Test
        void aQuotedCellSpanningLinesIsOneCell() {
            List<JsonNode> rows = ndjsonRows(QUANTIZATION, CSV, "bit_depth,quantizer\n8,\"ROUND\nING\"\n10,ROUNDING\n");
            assertThat(rowNumbers(rows)).containsExactly(1L, 2L);
            assertThat(statuses(rows)).containsExactly("INVALID", "OK");
            assertThat(pointers(rows.get(0))).containsExactly("/quantizer");
        }

        @Test
        void spacesAroundHeaderNamesAreIgnored() {
            List<JsonNode> rows = ndjsonRows(QUANTIZATION, CSV, " bit_depth , averaging\n8,4\n");
            assertThat(statuses(rows)).containsExactly("OK");
            assertThat(rows.get(0).path("result").path("inputs").path("averaging").asInt()).isEqualTo(4);
        }

        @Test
        void aMalformedRowIsInvalidAndTheNextRowIsRead() {
            List<JsonNode> rows = ndjsonRows(QUANTIZATION, CSV, "bit_depth,quantizer\n8,\"ROUNDING\"x\n10,ROUNDING\n");
            assertThat(statuses(rows)).containsExactly("INVALID", "OK");
            assertThat(rows.get(0).path("problem").path("type").asString()).isEqualTo("/problems/malformed-body");
            assertThat(rows.get(1).path("row").asLong()).isEqualTo(2);
        }
    }

    @Nested
    class WholeBody {
        @Test
        void anUnknownColumnIsA400BeforeAnyRow() {
            JsonNode problem = assertProblem(batch(QUANTIZATION, CSV, NDJSON, "bit_depth,bit_dept\n8,8\n"), 400,
                    "/problems/invalid-input");
            assertThat(problem.path("detail").asString()).contains("bit_dept");
        }

        @Test
        void aDottedColumnOfANestedSectionThisCalculationDoesNotHaveIsA400() {
            // Dotted names address nested sections (probe.frequency_mhz of a sheet); the flat requests of
            // pulse parameters have none, so the column is unknown, not silently dropped.
            JsonNode problem = assertProblem(batch(PULSE, CSV, NDJSON,
                    "probe.frequency_mhz,velocity_m_per_s\n5,5920\n"), 400, "/problems/invalid-input");
            assertThat(problem.path("detail").asString()).contains("probe.frequency_mhz");
            // nor does a dotted form of a flat field exist
            assertProblem(batch(PULSE, CSV, NDJSON, "frequency.mhz,velocity_m_per_s\n5,5920\n"), 400,
                    "/problems/invalid-input");
        }

        @Test
        void aColumnTwiceIsA400() {
            JsonNode problem = assertProblem(batch(QUANTIZATION, CSV, NDJSON, "bit_depth,bit_depth\n8,9\n"), 400,
                    "/problems/invalid-input");
            assertThat(problem.path("detail").asString()).contains("twice");
        }

        @Test
        void anEmptyBodyIsA400() {
            assertProblem(batch(QUANTIZATION, CSV, NDJSON, ""), 400, "/problems/invalid-input");
            assertProblem(batch(QUANTIZATION, CSV, NDJSON, UTF8_BOM, false), 400, "/problems/invalid-input");
        }

        @ParameterizedTest
        @ValueSource(strings = {"bit_depth\n", "bit_depth", "bit_depth\r\n", "bit_depth,averaging\n\n\n"})
        void aHeaderWithoutRowsIsAnEmptyAnswer(String body) {
            // Choice: a header alone is a well-formed batch of zero rows (200, nothing answered), not a 400.
            RawHttp.Response r = batch(QUANTIZATION, CSV, NDJSON, body);
            assertThat(r.status()).isEqualTo(200);
            assertThat(r.lines()).isEmpty();
            assertThat(csvRecords(batch(QUANTIZATION, CSV, CSV, body).body())).hasSize(1);
        }
    }

    @Nested
    class Cells {
        @Test
        void anEmptyCellIsAnAbsentField() {
            List<JsonNode> rows = ndjsonRows(QUANTIZATION, CSV, "bit_depth,signal_height_percent_fsh\n8,\n,40\n");
            assertThat(statuses(rows)).containsExactly("OK", "INVALID");
            assertThat(rows.get(0).path("result").has("amplitude_error_over_db")).isFalse();
            assertThat(pointers(rows.get(1))).containsExactly("/bit_depth");
            assertThat(rows.get(1).path("problem").path("errors").get(0).path("detail").asString())
                    .isEqualTo("is required");
        }

        @ParameterizedTest
        @ValueSource(strings = {"abc", "NaN", "Infinity", "-Infinity", "0x10", "40%", "1e999", "4 0", "40d", "--40"})
        void aCellThatIsNotANumberInANumberColumnIsInvalidAtItsField(String cell) {
            List<JsonNode> rows = ndjsonRows(QUANTIZATION, CSV,
                    "bit_depth,signal_height_percent_fsh\n8,40\n8,\"" + cell + "\"\n8,20\n");
            assertThat(statuses(rows)).containsExactly("OK", "INVALID", "OK");
            assertThat(rows.get(1).path("problem").path("type").asString()).isEqualTo("/problems/invalid-input");
            assertThat(pointers(rows.get(1))).containsExactly("/signal_height_percent_fsh");
        }

        @ParameterizedTest
        @ValueSource(strings = {"40", "40.0", "4e1", "+40", " 40 ", ".4e2"})
        void aDecimalNumberInANumberColumnIsRead(String cell) {
            List<JsonNode> rows = ndjsonRows(QUANTIZATION, CSV, "bit_depth,signal_height_percent_fsh\n8,\"" + cell + "\"\n");
            assertThat(statuses(rows)).containsExactly("OK");
            assertThat(rows.get(0).path("result").path("inputs").path("signal_height_percent_fsh").asDouble())
                    .isEqualTo(40.0);
        }

        @ParameterizedTest
        @ValueSource(strings = {"8.5", "7.999", "abc", "1e10", "8,0"})
        void aFractionOrNonNumberInAnIntegerColumnIsInvalidAtItsField(String cell) {
            List<JsonNode> rows = ndjsonRows(QUANTIZATION, CSV, "bit_depth\n8\n\"" + cell + "\"\n10\n");
            assertThat(statuses(rows)).containsExactly("OK", "INVALID", "OK");
            assertThat(pointers(rows.get(1))).containsExactly("/bit_depth");
        }

        @Test
        void aWholeNumberWrittenAsDecimalIsAnIntegerAsInJson() {
            // the single endpoint takes {"bit_depth": 8.0}; the CSV cell 8.0 is the same request
            List<JsonNode> rows = ndjsonRows(QUANTIZATION, CSV, "bit_depth,averaging\n8.0,4.0\n");
            assertThat(statuses(rows)).containsExactly("OK");
            assertThat(rows.get(0).get("result")).isEqualTo(single(QUANTIZATION, "{\"bit_depth\": 8, \"averaging\": 4}").body());
        }

        @Test
        void anIntegerColumnOutOfRangeIsInvalidByTheSameRuleAsJson() {
            List<JsonNode> rows = ndjsonRows(QUANTIZATION, CSV, "bit_depth\n33\n0\n");
            assertThat(statuses(rows)).containsExactly("INVALID", "INVALID");
            assertThat(pointers(rows.get(0))).containsExactly("/bit_depth");
            assertThat(pointers(rows.get(1))).containsExactly("/bit_depth");
        }

        @Test
        void anUnknownEnumValueIsInvalidAtItsField() {
            List<JsonNode> rows = ndjsonRows(QUANTIZATION, CSV, "bit_depth,code_mapping\n8,FSR_OVER_2N\n8,fsr\n8,MAX_CODE\n");
            assertThat(statuses(rows)).containsExactly("OK", "INVALID", "OK");
            assertThat(pointers(rows.get(1))).containsExactly("/code_mapping");
        }

        @Test
        void twoBadCellsInARowAreBothNamed() {
            List<JsonNode> rows = ndjsonRows(QUANTIZATION, CSV, "bit_depth,signal_height_percent_fsh\n8.5,abc\n");
            assertThat(statuses(rows)).containsExactly("INVALID");
            assertThat(pointers(rows.get(0))).containsExactlyInAnyOrder("/bit_depth", "/signal_height_percent_fsh");
        }

        @Test
        void aRowWithTooFewOrTooManyCellsIsInvalidAndItsNeighboursAreIntact() {
            List<JsonNode> rows = ndjsonRows(QUANTIZATION, CSV, "bit_depth,averaging\n8,1\n9\n10,1,7\n11,2\n");
            assertThat(rowNumbers(rows)).containsExactly(1L, 2L, 3L, 4L);
            assertThat(statuses(rows)).containsExactly("OK", "INVALID", "INVALID", "OK");
            assertThat(rows.get(3).path("result").path("levels").asLong()).isEqualTo(1L << 11);
        }
    }

    @Nested
    class BlankLines {
        @Test
        void aBlankLineIsNotARowAndDoesNotCount() {
            for (String body : List.of("bit_depth\n\n8\n\n\r\n10\n\n", "bit_depth,averaging\n\n8,1\n\n\r\n10,1\n\n")) {
                List<JsonNode> rows = ndjsonRows(QUANTIZATION, CSV, body);
                String header = body.substring(0, body.indexOf('\n'));
                assertThat(rowNumbers(rows)).as(header).containsExactly(1L, 2L);
                assertThat(statuses(rows)).as(header).containsExactly("OK", "OK");
                assertThat(rows.get(1).path("result").path("levels").asLong()).isEqualTo(1024);
            }
        }

        @Test
        void manyBlankLinesInARowAreSkipped() {
            // regression: each blank line used to be skipped by a recursive call; 100,000 of them overflowed
            // the stack and the batch ended in a 500
            String body = "bit_depth,averaging\n8,1\n" + "\n".repeat(100_000) + "10,2\n";
            List<JsonNode> rows = ndjsonRows(QUANTIZATION, CSV, body);
            assertThat(rowNumbers(rows)).containsExactly(1L, 2L);
            assertThat(statuses(rows)).containsExactly("OK", "OK");
        }
    }

    @Nested
    class CsvAnswers {
        private void assertEveryResultLeafIsAColumnWithTheSameValue(String calculation, String request) {
            JsonNode single = single(calculation, request).body();
            String ndjson = request.replace("\n", " ") + "\n";
            List<String[]> records = csvRecords(batch(calculation, NDJSON, CSV, ndjson).body());
            assertThat(records).hasSize(2);
            List<String> header = List.of(records.get(0));
            String[] cells = records.get(1);
            Map<String, JsonNode> leaves = new LinkedHashMap<>();
            flatten("", single, leaves);
            assertThat(leaves).isNotEmpty();
            for (Map.Entry<String, JsonNode> leaf : leaves.entrySet()) {
                String column = leaf.getKey();
                assertThat(header).as("column for " + column).contains(column);
                String cell = cells[header.indexOf(column)];
                JsonNode value = leaf.getValue();
                if (value.isNull()) {
                    assertThat(cell).as(column).isEmpty();
                } else if (value.isNumber()) {
                    assertThat(Double.parseDouble(cell)).as(column).isEqualTo(value.asDouble());
                } else if (value.isArray()) {
                    // tolerance checks: figure=WITHIN or figure=OUTSIDE, ';'-separated
                    List<String> items = new java.util.ArrayList<>();
                    value.forEach(c -> items.add(c.path("figure").asString() + "="
                            + (c.path("within").asBoolean() ? "WITHIN" : "OUTSIDE")));
                    assertThat(cell).as(column).isEqualTo(String.join(";", items));
                } else {
                    assertThat(cell).as(column).isEqualTo(value.asString());
                }
            }
            // the warnings column holds the codes, ';'-separated
            StringBuilder codes = new StringBuilder();
            for (JsonNode w : single.path("warnings")) {
                codes.append(codes.isEmpty() ? "" : ";").append(w.path("code").asString());
            }
            assertThat(cells[header.indexOf("warnings")]).isEqualTo(codes.toString());
        }

        /** Leaves of an answer, dotted; the echoed inputs, the references and the stamp's own fields left out. */
        private static void flatten(String prefix, JsonNode node, Map<String, JsonNode> out) {
            for (Iterator<Map.Entry<String, JsonNode>> it = node.properties().iterator(); it.hasNext(); ) {
                Map.Entry<String, JsonNode> e = it.next();
                String name = prefix + e.getKey();
                if (name.equals("inputs") || name.equals("references") || name.equals("warnings")
                        || name.equals("stamp.calculation") || name.equals("stamp.service_version")
                        || name.equals("velocity_source.source")) {
                    continue;
                }
                if (e.getValue().isObject()) {
                    flatten(name + ".", e.getValue(), out);
                } else {
                    out.put(name, e.getValue());
                }
            }
        }

        @Test
        void quantizationAnswerColumns() {
            assertEveryResultLeafIsAColumnWithTheSameValue(QUANTIZATION, """
                    {"bit_depth": 8, "digitized_signal": "RECTIFIED", "signal_height_percent_fsh": 40,
                     "amplitude_tolerance_db": 1, "reference_height_percent_fsh": 80, "evaluation_level_db": -14,
                     "averaging": 4}""");
        }

        @Test
        void pulseAnswerColumns() {
            assertEveryResultLeafIsAColumnWithTheSameValue(PULSE, """
                    {"frequency_mhz": 4, "material": "carbon-steel", "wave_mode": "SHEAR", "element_diameter_mm": 8,
                     "bandwidth_percent": 60, "distance_mm": 50, "wedge_path_mm": 12,
                     "wedge_velocity_m_per_s": 2730, "incident_angle_deg": 36}""");
        }

        @Test
        void acquisitionAnswerColumns() {
            assertEveryResultLeafIsAColumnWithTheSameValue(ACQUISITION, """
                    {"sampling_frequency_mhz": 100, "decimation_factor": 2, "bit_depth": 12, "gate_length_mm": 75,
                     "material": "carbon-steel", "wave_mode": "SHEAR", "focal_laws": 122, "averaging": 1,
                     "scan_increment_mm": 1, "scan_length_mm": 2900, "pulse_repetition_frequency_hz": 6000,
                     "planned_scan_speed_mm_per_s": 40, "max_sound_path_mm": 120, "wraparound_decay_factor": 1.5,
                     "file_size_limit_megabytes": 2000}""");
        }
    }
}
