package utdigit.integration;

import static io.restassured.RestAssured.given;
import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.math.BigDecimal;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.MappingIterator;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.dataformat.csv.CsvMapper;
import tools.jackson.dataformat.csv.CsvSchema;
import utdigit.web.support.ApiTest;

/**
 * The demo library of demo-data/ (an invented fabrication shop's technique sheets) keeps the
 * verdicts that README "Integration" documents: both files, JSON and CSV, are validated in bulk
 * through POST /api/technique-sheet-validations/batch, and every sheet's verdict and its findings
 * that did not pass must equal the README's table.
 */
class DemoLibraryTest extends ApiTest {
    static final Path JSON_LIBRARY = Path.of("demo-data", "technique-sheets.json");
    static final Path CSV_LIBRARY = Path.of("demo-data", "technique-sheets.csv");
    static final Path README = Path.of("README.md");
    static final String TABLE_BEGIN = "<!-- demo-verdicts:begin -->";
    static final String TABLE_END = "<!-- demo-verdicts:end -->";
    private static final String BATCH = "/api/technique-sheet-validations/batch";

    private final JsonMapper mapper = JsonMapper.builder().build();

    @Test
    void theCsvLibraryHoldsTheSameSheetsAsTheJsonLibrary() throws IOException {
        List<Map<String, String>> fromJson = new ArrayList<>();
        for (JsonNode sheet : mapper.readTree(Files.readString(JSON_LIBRARY))) {
            Map<String, String> flat = new LinkedHashMap<>();
            flatten("", sheet, flat);
            fromJson.add(flat);
        }
        List<Map<String, String>> fromCsv = new ArrayList<>();
        CsvMapper csv = CsvMapper.builder().build();
        try (MappingIterator<Map<String, String>> rows = csv.readerForMapOf(String.class)
                .with(CsvSchema.emptySchema().withHeader()).readValues(CSV_LIBRARY.toFile())) {
            while (rows.hasNext()) {
                Map<String, String> row = new LinkedHashMap<>(rows.next());
                row.values().removeIf(String::isEmpty);
                fromCsv.add(row);
            }
        }
        assertThat(fromCsv).hasSameSizeAs(fromJson);
        for (int i = 0; i < fromJson.size(); i++) {
            assertThat(normalised(fromCsv.get(i))).as("CSV row %d", i + 1).isEqualTo(normalised(fromJson.get(i)));
        }
    }

    @Test
    void theJsonLibraryHasTheDocumentedVerdicts() throws IOException {
        String answer = given().contentType("application/json").accept("application/x-ndjson")
                .body(Files.readString(JSON_LIBRARY)).post(BATCH).then().statusCode(200).extract().asString();
        assertThat(verdicts(answer)).isEqualTo(documentedVerdicts());
    }

    @Test
    void theCsvLibraryHasTheDocumentedVerdicts() throws IOException {
        String answer = given().contentType("text/csv").accept("application/x-ndjson")
                .body(Files.readString(CSV_LIBRARY)).post(BATCH).then().statusCode(200).extract().asString();
        assertThat(verdicts(answer)).isEqualTo(documentedVerdicts());
    }

    /** sheet id -> "VERDICT: rule-id VERDICT, ..." over the findings that did not pass. */
    private Map<String, String> verdicts(String ndjson) {
        Map<String, String> out = new LinkedHashMap<>();
        for (String line : ndjson.split("\n")) {
            if (line.isBlank()) {
                continue;
            }
            JsonNode row = mapper.readTree(line);
            assertThat(row.path("status").asString()).as(line).isEqualTo("OK");
            JsonNode result = row.path("result");
            List<String> notPassed = new ArrayList<>();
            for (JsonNode f : result.path("findings")) {
                if (!f.path("verdict").asString().equals("PASS")) {
                    notPassed.add(f.path("rule_id").asString() + " " + f.path("verdict").asString());
                }
            }
            out.put(result.path("sheet_id").asString(), result.path("verdict").asString()
                    + (notPassed.isEmpty() ? "" : ": " + String.join(", ", notPassed)));
        }
        return out;
    }

    /**
     * The README's table between the demo-verdicts markers: | sheet | technique | profile | verdict
     * | findings that did not pass |, backticks ignored.
     */
    static Map<String, String> documentedVerdicts() throws IOException {
        String readme = Files.readString(README);
        int begin = readme.indexOf(TABLE_BEGIN);
        int end = readme.indexOf(TABLE_END);
        assertThat(begin).as("README.md has the demo verdict table between " + TABLE_BEGIN + " and " + TABLE_END)
                .isNotNegative();
        assertThat(end).isGreaterThan(begin);
        Map<String, String> out = new LinkedHashMap<>();
        Pattern row = Pattern.compile("^\\|([^|]*)\\|([^|]*)\\|([^|]*)\\|([^|]*)\\|([^|]*)\\|\\s*$", Pattern.MULTILINE);
        Matcher m = row.matcher(readme.substring(begin, end));
        while (m.find()) {
            String sheet = cell(m.group(1));
            if (sheet.equals("sheet") || sheet.startsWith("---")) {
                continue;
            }
            String findings = cell(m.group(5));
            out.put(sheet, cell(m.group(4)) + (findings.isEmpty() ? "" : ": " + findings));
        }
        assertThat(out).as("rows of the README's demo verdict table").isNotEmpty();
        return out;
    }

    private static String cell(String text) {
        return text.replace("`", "").trim().replaceAll("\\s+", " ");
    }

    private static void flatten(String prefix, JsonNode node, Map<String, String> out) {
        for (Iterator<Map.Entry<String, JsonNode>> it = node.properties().iterator(); it.hasNext(); ) {
            Map.Entry<String, JsonNode> e = it.next();
            String name = prefix.isEmpty() ? e.getKey() : prefix + "." + e.getKey();
            if (e.getValue().isObject()) {
                flatten(name, e.getValue(), out);
            } else if (!e.getValue().isNull()) {
                out.put(name, e.getValue().isString() ? e.getValue().asString() : e.getValue().toString());
            }
        }
    }

    /** Numbers by value (5 and 5.0 are one value), text as it is, whatever the column order. */
    private static Map<String, String> normalised(Map<String, String> fields) {
        Map<String, String> out = new java.util.TreeMap<>();
        fields.forEach((k, v) -> {
            String value = v;
            try {
                value = new BigDecimal(v).stripTrailingZeros().toPlainString();
            } catch (NumberFormatException notANumber) {
                // text
            }
            out.put(k, value);
        });
        return out;
    }
}
