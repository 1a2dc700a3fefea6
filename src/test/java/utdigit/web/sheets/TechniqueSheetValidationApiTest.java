package utdigit.web.sheets;

import static org.assertj.core.api.Assertions.assertThat;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.contains;

import io.restassured.path.json.JsonPath;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ObjectNode;
import utdigit.web.support.ApiTest;

/**
 * Technique sheets against the built-in common-practice profile. The sheet is an invented phased
 * array weld examination; every rule passes, and each variant below breaks exactly one rule.
 */
class TechniqueSheetValidationApiTest extends ApiTest {
    private static final String PATH = "/api/technique-sheet-validations";
    private static final JsonMapper JSON = JsonMapper.builder().build();

    /*
     * Hand check of the passing sheet (common practice, no published source for the rules):
     * samples per period 100 MHz / 2 / 5 MHz = 10 >= 5; maximum scan speed 5000 Hz x 1 mm / 61 laws
     * = 81.97 mm/s >= 20 planned; wrap-around limit 1 / (2 x 100 mm / 3.255 mm/us) = 16 275 Hz
     * >= 5000; thickness resolution 3.255 mm/us x 0.02 us / 2 = 0.0326 mm <= 0.1; 12-bit LSB
     * 200/4096 %FSH at the evaluation height 80 x 10^(-14/20) = 15.96 %FSH reads at most
     * 20 log10(1 - 0.0244/15.96) = -0.013 dB; the pulse sampling loss at 10 samples per period is
     * about 20 log10 cos(pi/10) = 0.44 dB plus the envelope term, so the combined error < 2 dB.
     */
    static final String PASSING = """
            {"sheet_id": "NWF-PA-001", "revision": "B", "technique": "PHASED_ARRAY",
             "probe": {"frequency_mhz": 5, "bandwidth_percent": 60, "element_count": 64},
             "material": {"material": "carbon-steel", "wave_mode": "SHEAR", "thickness_mm": 25, "refracted_angle_deg": 55},
             "digitization": {"sampling_frequency_mhz": 100, "decimation_factor": 2, "bit_depth": 12},
             "acquisition": {"pulse_repetition_frequency_hz": 5000, "focal_laws": 61, "scan_increment_mm": 1,
                             "scan_length_mm": 500, "planned_scan_speed_mm_per_s": 20, "gate_length_us": 30,
                             "max_sound_path_mm": 100},
             "evaluation": {"reference_height_percent_fsh": 80, "evaluation_level_db": -14,
                            "amplitude_tolerance_db": 2, "thickness_tolerance_mm": 0.1}}""";

    private static String variant(String section, String field, Object value) {
        ObjectNode sheet = (ObjectNode) JSON.readTree(PASSING);
        ObjectNode s = (ObjectNode) sheet.get(section);
        if (value instanceof Integer i) {
            s.put(field, i);
        } else {
            s.put(field, ((Number) value).doubleValue());
        }
        return sheet.toString();
    }

    private static Map<String, String> verdicts(JsonPath answer) {
        List<Map<String, Object>> findings = answer.getList("findings");
        java.util.Map<String, String> out = new java.util.LinkedHashMap<>();
        for (Map<String, Object> f : findings) {
            out.put((String) f.get("rule_id"), (String) f.get("verdict"));
        }
        return out;
    }

    @Test
    void aSoundSheetPassesEveryCommonPracticeRule() {
        JsonPath answer = post(PATH, PASSING).statusCode(200)
                .body("sheet_id", equalTo("NWF-PA-001"))
                .body("revision", equalTo("B"))
                .body("profiles.id", contains("common-practice"))
                .body("profiles[0].verification_status", equalTo("UNVERIFIED"))
                .body("profiles[0].verdict", equalTo("PASS"))
                .body("stamp.calculation", equalTo("technique-sheet-validations"))
                .extract().jsonPath();
        assertThat(answer.getString("verdict")).isEqualTo("PASS");
        assertThat(verdicts(answer)).containsOnlyKeys("samples-per-period", "scan-speed", "prf-without-wraparound",
                "thickness-resolution", "evaluation-error", "combined-amplitude-error").containsValue("PASS")
                .doesNotContainValue("FAIL");
        assertThat(answer.getDouble("values.samples_per_period")).isEqualTo(10.0);
        assertThat(answer.getDouble("values.max_scan_speed_mm_per_s")).isCloseTo(5000.0 / 61, org.assertj.core.data.Offset.offset(1e-9));
        assertThat(answer.getList("cautions", String.class)).anyMatch(c -> c.contains("qualified examiner"));
    }

    @ParameterizedTest(name = "{0} fails when {1}.{2} = {3}")
    @CsvSource({
            // 100 MHz / 5 = 20 MHz effective: 4 samples per 5 MHz period; the pulse then loses more than
            // 20 log10 cos(pi/4) = 3.01 dB, so the combined error breaks the 2 dB tolerance as well
            "samples-per-period, digitization, decimation_factor, 5, combined-amplitude-error",
            // 100 mm/s planned > 81.97 mm/s
            "scan-speed, acquisition, planned_scan_speed_mm_per_s, 100, ",
            // 20 kHz > 16.3 kHz wrap-around limit
            "prf-without-wraparound, acquisition, pulse_repetition_frequency_hz, 20000, ",
            // 0.0326 mm per sample > 0.02 mm tolerance
            "thickness-resolution, evaluation, thickness_tolerance_mm, 0.02, ",
            // 0.47 dB combined > 0.3 dB, the quantization term alone (0.013 dB) passes
            "combined-amplitude-error, evaluation, amplitude_tolerance_db, 0.3, "})
    void eachRuleFailsOnItsOwnCause(String rule, String section, String field, double value, String alsoFails) {
        Object v = field.equals("decimation_factor") ? (Object) (int) value : (Object) value;
        JsonPath answer = post(PATH, variant(section, field, v)).statusCode(200).extract().jsonPath();
        assertThat(answer.getString("verdict")).isEqualTo("FAIL");
        Map<String, String> verdicts = verdicts(answer);
        assertThat(verdicts.get(rule)).isEqualTo("FAIL");
        List<String> expected = alsoFails == null ? List.of(rule) : List.of(rule, alsoFails);
        assertThat(verdicts.entrySet().stream().filter(e -> e.getValue().equals("FAIL")).map(Map.Entry::getKey))
                .containsExactlyInAnyOrderElementsOf(expected);
    }

    @Test
    void fourBitsFailTheEvaluationErrorRule() {
        // 4 bits: LSB 12.5 %FSH; at 15.96 %FSH the reading may be 20 log10((15.96 - 6.25)/15.96) = -4.3 dB
        JsonPath answer = post(PATH, variant("digitization", "bit_depth", 4)).statusCode(200).extract().jsonPath();
        assertThat(verdicts(answer).get("evaluation-error")).isEqualTo("FAIL");
        assertThat(answer.getDouble("values.evaluation_error_under_db"))
                .isCloseTo(20 * Math.log10((80 * Math.pow(10, -14 / 20.0) - 6.25) / (80 * Math.pow(10, -14 / 20.0))),
                        org.assertj.core.data.Offset.offset(1e-9));
    }

    @Test
    void aSheetWithoutAcquisitionIsIncomplete() {
        ObjectNode sheet = (ObjectNode) JSON.readTree(PASSING);
        sheet.remove("acquisition");
        JsonPath answer = post(PATH, sheet.toString()).statusCode(200).extract().jsonPath();
        assertThat(answer.getString("verdict")).isEqualTo("INCOMPLETE");
        assertThat(verdicts(answer).get("scan-speed")).isEqualTo("NOT_EVALUATED");
    }

    @Test
    void valuesEqualTheSingleEndpoints() {
        JsonPath sheet = post(PATH, PASSING).statusCode(200).extract().jsonPath();
        JsonPath quantization = post("/api/quantization-assessments", """
                {"bit_depth": 12, "reference_height_percent_fsh": 80, "evaluation_level_db": -14,
                 "amplitude_tolerance_db": 2}""").statusCode(200).extract().jsonPath();
        assertThat(sheet.getDouble("values.evaluation_error_under_db"))
                .isEqualTo(quantization.getDouble("evaluation_error_under_db"));
        assertThat(sheet.getDouble("values.minimum_height_percent_fsh"))
                .isEqualTo(quantization.getDouble("minimum_height_percent_fsh"));
        JsonPath acquisition = post("/api/acquisition-budgets", """
                {"sampling_frequency_mhz": 100, "decimation_factor": 2, "bit_depth": 12, "gate_length_us": 30,
                 "focal_laws": 61, "scan_increment_mm": 1, "scan_length_mm": 500, "pulse_repetition_frequency_hz": 5000,
                 "planned_scan_speed_mm_per_s": 20, "max_sound_path_mm": 100, "material": "carbon-steel",
                 "wave_mode": "SHEAR"}""").statusCode(200).extract().jsonPath();
        assertThat(sheet.getDouble("values.max_scan_speed_mm_per_s"))
                .isEqualTo(acquisition.getDouble("max_scan_speed_mm_per_s"));
        assertThat(sheet.getDouble("values.max_prf_without_wraparound_hz"))
                .isEqualTo(acquisition.getDouble("max_prf_without_wraparound_hz"));
        assertThat(sheet.getDouble("values.megabytes_per_metre")).isEqualTo(acquisition.getDouble("megabytes_per_metre"));
        JsonPath thickness = post("/api/thickness-resolutions", """
                {"sampling_frequency_mhz": 100, "decimation_factor": 2, "material": "carbon-steel", "wave_mode": "SHEAR",
                 "nominal_thickness_mm": 25, "required_resolution_mm": 0.1}""").statusCode(200).extract().jsonPath();
        assertThat(sheet.getDouble("values.thickness_resolution_mm"))
                .isEqualTo(thickness.getDouble("thickness_resolution_mm"));
    }

    @Test
    void inputsReproduceTheVerdictAndValues() {
        JsonPath first = post(PATH, PASSING).statusCode(200).extract().jsonPath();
        String inputs = JSON.writeValueAsString(first.getMap("inputs"));
        JsonPath again = post(PATH, inputs).statusCode(200).extract().jsonPath();
        assertThat(again.getMap("values")).isEqualTo(first.getMap("values"));
        assertThat(again.getList("findings")).isEqualTo(first.getList("findings"));
    }

    @Test
    void inchesGiveTheSameValuesAsMillimetres() {
        ObjectNode sheet = (ObjectNode) JSON.readTree(PASSING);
        ObjectNode material = (ObjectNode) sheet.get("material");
        material.remove("thickness_mm");
        material.put("thickness_in", 25 / 25.4);
        JsonPath inches = post(PATH, sheet.toString()).statusCode(200).extract().jsonPath();
        JsonPath mm = post(PATH, PASSING).statusCode(200).extract().jsonPath();
        assertThat(inches.getDouble("values.thickness_mm")).isCloseTo(25.0, org.assertj.core.data.Offset.offset(1e-12));
        assertThat(inches.getDouble("values.samples_across_thickness"))
                .isCloseTo(mm.getDouble("values.samples_across_thickness"), org.assertj.core.data.Offset.offset(1e-9));
    }

    @Test
    void anExampleProfileChecksItsOwnRules() {
        ObjectNode sheet = (ObjectNode) JSON.readTree(PASSING);
        sheet.put("profile_id", "example-paut");
        post(PATH, sheet.toString()).statusCode(200)
                .body("profiles.id", contains("example-paut"))
                .body("profiles[0].verification_status", equalTo("UNVERIFIED"));
    }

    @Nested
    class Rejected {
        @Test
        void unknownProfile() {
            ObjectNode sheet = (ObjectNode) JSON.readTree(PASSING);
            sheet.put("profile_id", "no-such-profile");
            assertInvalid(PATH, sheet.toString(), "/profile_id");
        }

        @Test
        void missingTechnique() {
            ObjectNode sheet = (ObjectNode) JSON.readTree(PASSING);
            sheet.remove("technique");
            assertInvalid(PATH, sheet.toString(), "/technique");
        }

        @Test
        void fieldErrorsPointIntoTheirSection() {
            assertInvalid(PATH, variant("probe", "frequency_mhz", 0.0), "/probe/frequency_mhz");
            assertInvalid(PATH, variant("digitization", "bit_depth", 40), "/digitization/bit_depth");
        }

        @Test
        void unknownMaterialPointsIntoTheMaterialSection() {
            ObjectNode sheet = (ObjectNode) JSON.readTree(PASSING);
            ((ObjectNode) sheet.get("material")).put("material", "unobtainium");
            assertInvalid(PATH, sheet.toString(), "/material/material");
        }

    }
}
