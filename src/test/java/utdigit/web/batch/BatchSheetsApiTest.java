package utdigit.web.batch;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.Test;
import tools.jackson.databind.JsonNode;

/** Technique sheets in a batch: the id of each row, and CSV columns dotted into nested sections. */
class BatchSheetsApiTest extends BatchApiTest {
    private static final String SHEETS = "technique-sheet-validations";

    /** An invented phased-array weld sheet (the one of TechniqueSheetValidationApiTest). */
    private static final String SHEET = """
            {"sheet_id": "NWF-PA-001", "revision": "B", "technique": "PHASED_ARRAY",
             "probe": {"frequency_mhz": 5, "bandwidth_percent": 60, "element_count": 64},
             "material": {"material": "carbon-steel", "wave_mode": "SHEAR", "thickness_mm": 25, "refracted_angle_deg": 55},
             "digitization": {"sampling_frequency_mhz": 100, "decimation_factor": 2, "bit_depth": 12},
             "acquisition": {"pulse_repetition_frequency_hz": 5000, "focal_laws": 61, "scan_increment_mm": 1,
                             "scan_length_mm": 500, "planned_scan_speed_mm_per_s": 20, "gate_length_us": 30,
                             "max_sound_path_mm": 100},
             "evaluation": {"reference_height_percent_fsh": 80, "evaluation_level_db": -14,
                            "amplitude_tolerance_db": 2, "thickness_tolerance_mm": 0.1}}""";

    /** The same sheet as CSV: one dotted column per nested field. */
    private static final String CSV_HEADER = "sheet_id,revision,technique,probe.frequency_mhz,probe.bandwidth_percent,"
            + "probe.element_count,material.material,material.wave_mode,material.thickness_mm,"
            + "material.refracted_angle_deg,digitization.sampling_frequency_mhz,digitization.decimation_factor,"
            + "digitization.bit_depth,acquisition.pulse_repetition_frequency_hz,acquisition.focal_laws,"
            + "acquisition.scan_increment_mm,acquisition.scan_length_mm,acquisition.planned_scan_speed_mm_per_s,"
            + "acquisition.gate_length_us,acquisition.max_sound_path_mm,evaluation.reference_height_percent_fsh,"
            + "evaluation.evaluation_level_db,evaluation.amplitude_tolerance_db,evaluation.thickness_tolerance_mm\n";

    private static String csvRow(String sheetId, String frequencyMhz) {
        return sheetId + ",B,PHASED_ARRAY," + frequencyMhz + ",60,64,carbon-steel,SHEAR,25,55,100,2,12,5000,61,1,500,20,"
                + "30,100,80,-14,2,0.1\n";
    }

    @Test
    void everyRowCarriesTheSheetIdAsItsId() {
        List<JsonNode> rows = ndjsonRows(SHEETS, NDJSON, SHEET.replace("\n", " ") + "\n"
                + SHEET.replace("\n", " ").replace("NWF-PA-001", "NWF-PA-002").replace("\"bit_depth\": 12", "\"bit_depth\": 0")
                + "\n{\"revision\": \"A\"}\n");
        assertThat(statuses(rows)).containsExactly("OK", "INVALID", "INVALID");
        assertThat(rows.get(0).path("id").asString()).isEqualTo("NWF-PA-001");
        assertThat(rows.get(1).path("id").asString()).isEqualTo("NWF-PA-002");
        assertThat(pointers(rows.get(1))).containsExactly("/digitization/bit_depth");
        assertThat(rows.get(2).has("id")).as("no sheet_id, no id").isFalse();
    }

    @Test
    void dottedCsvColumnsFillTheNestedSectionsAndGiveTheSingleAnswer() {
        List<JsonNode> rows = ndjsonRows(SHEETS, CSV, CSV_HEADER + csvRow("NWF-PA-001", "5")
                + csvRow("NWF-PA-002", "1001") + csvRow("NWF-PA-003", "5"));
        assertThat(statuses(rows)).containsExactly("OK", "INVALID", "OK");
        Single single = single(SHEETS, SHEET);
        assertThat(single.status()).isEqualTo(200);
        assertThat(rows.get(0).get("result")).isEqualTo(single.body());
        assertThat(pointers(rows.get(1))).containsExactly("/probe/frequency_mhz");
        assertThat(rows.stream().map(r -> r.path("id").asString())).containsExactly("NWF-PA-001", "NWF-PA-002", "NWF-PA-003");
    }

    @Test
    void aRowWithACellThatIsNotANumberKeepsItsId() {
        List<JsonNode> rows = ndjsonRows(SHEETS, CSV, CSV_HEADER + csvRow("NWF-PA-001", "5")
                + csvRow("NWF-PA-002", "abc") + csvRow("NWF-PA-003", "5"));
        assertThat(statuses(rows)).containsExactly("OK", "INVALID", "OK");
        assertThat(pointers(rows.get(1))).containsExactly("/probe/frequency_mhz");
        assertThat(rows.get(1).path("id").asString()).isEqualTo("NWF-PA-002");
    }

    @Test
    void theCsvAnswerHasTheIdColumn() {
        List<String[]> records = csvRecords(batch(SHEETS, CSV, CSV, CSV_HEADER + csvRow("NWF-PA-001", "5")
                + csvRow("NWF-PA-002", "abc")).body());
        List<String> header = List.of(records.get(0));
        assertThat(records).hasSize(3);
        assertThat(records.get(1)[header.indexOf("id")]).isEqualTo("NWF-PA-001");
        assertThat(records.get(1)[header.indexOf("verdict")]).isEqualTo("PASS");
        assertThat(records.get(2)[header.indexOf("id")]).isEqualTo("NWF-PA-002");
        assertThat(records.get(2)[header.indexOf("problem.pointers")]).isEqualTo("/probe/frequency_mhz");
    }

    @Test
    void anUnknownNestedColumnIsA400BeforeAnyRow() {
        JsonNode problem = assertProblem(batch(SHEETS, CSV, NDJSON, CSV_HEADER.replace("probe.element_count",
                "probe.element_cuont") + csvRow("NWF-PA-001", "5")), 400, "/problems/invalid-input");
        assertThat(problem.path("detail").asString()).contains("probe.element_cuont");
    }
    @Test
    void anAngleBeamSheetInCsvGetsTheIncidencePlaneFiguresOfTheSingleAnswer() {
        String header = "sheet_id,technique,probe.frequency_mhz,probe.element_diameter_mm,material.material,"
                + "material.wave_mode,setup.incident_angle_deg,setup.wedge_velocity_in_per_us\n";
        // 2730 m/s as in/us: 2730 / 25400 (25.4 mm per inch exactly, NIST SP 811)
        String row = "AB-1,PULSE_ECHO,5,10,carbon-steel,SHEAR,36," + (2730.0 / 25400.0) + "\n";
        List<JsonNode> rows = ndjsonRows(SHEETS, CSV, header + row);
        assertThat(statuses(rows)).containsExactly("OK");
        Single single = single(SHEETS, """
                {"sheet_id": "AB-1", "technique": "PULSE_ECHO", "probe": {"frequency_mhz": 5, "element_diameter_mm": 10},
                 "material": {"material": "carbon-steel", "wave_mode": "SHEAR"},
                 "setup": {"incident_angle_deg": 36, "wedge_velocity_in_per_us": %s}}""".formatted(2730.0 / 25400.0));
        assertThat(single.status()).isEqualTo(200);
        assertThat(rows.get(0).get("result")).isEqualTo(single.body());
        assertThat(rows.get(0).at("/result/values/incidence_plane_near_field_length_mm").isNumber()).isTrue();
        List<String[]> records = csvRecords(batch(SHEETS, CSV, CSV, header + row).body());
        List<String> columns = List.of(records.get(0));
        assertThat(columns).contains("values.incidence_plane_aperture_mm", "values.incidence_plane_near_field_length_mm",
                "values.incidence_plane_beam_spread_6db_deg");
        assertThat(records.get(1)[columns.indexOf("values.incidence_plane_near_field_length_mm")]).isNotEmpty();
    }
}
