package utdigit.web.sheets;

import static io.restassured.RestAssured.given;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import io.restassured.path.json.JsonPath;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ObjectNode;
import utdigit.core.sheets.Feasibility;
import utdigit.web.support.ApiTest;

/**
 * Verdicts as a QA system sees them: sheets of an invented shop (Harrowgate Vessel Works), each
 * written so that one verdict or one feasibility check decides it. The limits are those of the
 * built-in profiles (common practice, no published source; the example profiles UNVERIFIED); the
 * impossible settings are impossible by definition (a gate longer than the firing period...).
 */
class SheetVerdictsApiTest extends ApiTest {
    private static final String PATH = "/api/technique-sheet-validations";
    private static final JsonMapper JSON = JsonMapper.builder().build();

    /** The phased-array weld sheet that passes every common-practice rule (hand check in TechniqueSheetValidationApiTest). */
    private static ObjectNode passing() {
        return (ObjectNode) JSON.readTree(TechniqueSheetValidationApiTest.PASSING);
    }

    private static ObjectNode section(ObjectNode sheet, String name) {
        return sheet.has(name) ? (ObjectNode) sheet.get(name) : sheet.putObject(name);
    }

    private static JsonPath validate(ObjectNode sheet) {
        return post(PATH, sheet.toString()).statusCode(200).extract().jsonPath();
    }

    private static List<Map<String, Object>> findings(JsonPath answer, String profileId) {
        List<Map<String, Object>> out = new ArrayList<>();
        for (Map<String, Object> f : answer.<Map<String, Object>>getList("findings")) {
            if (profileId.equals(f.get("profile_id"))) {
                out.add(f);
            }
        }
        return out;
    }

    private static Map<String, Object> feasibilityFailure(JsonPath answer, String checkId) {
        List<Map<String, Object>> failures = findings(answer, "service-feasibility");
        assertThat(failures).extracting(f -> f.get("rule_id")).containsExactly(checkId);
        assertThat(failures.get(0).get("verdict")).isEqualTo("FAIL");
        // No profile holds a feasibility check's text: the finding carries its title (the check's own words).
        assertThat(failures.get(0).get("title")).isEqualTo(Feasibility.CHECKS.stream()
                .filter(c -> c.id().equals(checkId)).findFirst().orElseThrow().title());
        assertThat(answer.getString("verdict")).isEqualTo("FAIL");
        return failures.get(0);
    }

    @Nested
    class OneSheetPerVerdict {
        @Test
        void passNeedsAnApplicableRuleAndAllPassed() {
            JsonPath answer = validate(passing());
            assertThat(answer.getString("verdict")).isEqualTo("PASS");
            assertThat(answer.getList("findings")).isNotEmpty();
            assertThat(answer.getList("findings.verdict", String.class)).containsOnly("PASS");
            // A profile's rule is named by id; its title and source stay in the profile, not in every answer.
            for (Map<String, Object> f : answer.<Map<String, Object>>getList("findings")) {
                assertThat(f).doesNotContainKeys("title", "source").containsKeys("profile_id", "rule_id", "metric",
                        "actual", "limit", "comparison", "verdict");
            }
        }

        @Test
        void aPhasedArraySheetUnderATofdOnlyProfileIsNotCoveredNeverPassed() {
            // example-tofd has rules for TOFD sheets only: a phased-array sheet is not checked at all.
            ObjectNode sheet = passing();
            sheet.put("profile_id", "example-tofd");
            JsonPath answer = validate(sheet);
            assertThat(answer.getString("verdict")).isEqualTo("NOT_COVERED");
            assertThat(answer.getList("findings")).isEmpty();
            assertThat(answer.getString("profiles[0].verdict")).isEqualTo("NOT_COVERED");
        }

        @Test
        void aSheetThatBreaksARuleFails() {
            ObjectNode sheet = passing();
            section(sheet, "acquisition").put("planned_scan_speed_mm_per_s", 100); // > 5000 x 1 / 61 = 81.97 mm/s
            JsonPath answer = validate(sheet);
            assertThat(answer.getString("verdict")).isEqualTo("FAIL");
            assertThat(findings(answer, "common-practice")).filteredOn(f -> "FAIL".equals(f.get("verdict")))
                    .extracting(f -> f.get("rule_id")).containsExactly("scan-speed");
        }

        @Test
        void aSheetMissingWhatARuleNeedsIsIncompleteAndSaysWhatToAdd() {
            ObjectNode sheet = passing();
            section(sheet, "acquisition").remove("max_sound_path_mm");
            section(sheet, "evaluation").remove("thickness_tolerance_mm");
            JsonPath answer = validate(sheet);
            assertThat(answer.getString("verdict")).isEqualTo("INCOMPLETE");
            Map<String, Map<String, Object>> byRule = new java.util.HashMap<>();
            findings(answer, "common-practice").forEach(f -> byRule.put((String) f.get("rule_id"), f));
            assertThat(byRule.get("prf-without-wraparound").get("verdict")).isEqualTo("NOT_EVALUATED");
            assertThat(byRule.get("prf-without-wraparound").get("missing"))
                    .isEqualTo(List.of("max_prf_without_wraparound_hz"));
            assertThat(byRule.get("prf-without-wraparound").get("missing_inputs"))
                    .isEqualTo(List.of("/acquisition/max_sound_path_mm"));
            assertThat(byRule.get("thickness-resolution").get("missing_inputs"))
                    .isEqualTo(List.of("/evaluation/thickness_tolerance_mm"));
        }

        @Test
        void theScanSpeedNeedsNoGateAndNoDigitizer() {
            // v_max = PRF x increment / firings = 5000 Hz x 1 mm / 61 (common practice): gate, sampling
            // frequency and bit depth play no part, so the scan-speed rule is evaluated without them.
            ObjectNode sheet = passing();
            section(sheet, "acquisition").remove("gate_length_us");
            sheet.remove("digitization");
            JsonPath answer = validate(sheet);
            assertThat(answer.getDouble("values.max_scan_speed_mm_per_s")).isCloseTo(5000.0 * 1 / 61, within(1e-9));
            assertThat(answer.getDouble("values.max_prf_without_wraparound_hz"))
                    .isCloseTo(1e6 / (2 * 100 / 3.255), within(1e-6)); // 1/(2 L/v), v = 3255 m/s shear steel
            Map<String, Object> scanSpeed = findings(answer, "common-practice").stream()
                    .filter(f -> f.get("rule_id").equals("scan-speed")).findFirst().orElseThrow();
            assertThat(scanSpeed.get("verdict")).isEqualTo("PASS");
            assertThat(answer.getMap("values")).doesNotContainKey("megabytes_per_metre");
        }
    }

    @Nested
    class SeveralProfiles {
        @Test
        void findingsNameTheirProfileAndTheVerdictIsTheWorst() {
            // A 1.5 mm increment passes common practice (scan speed 5000 x 1.5 / 61 = 123 mm/s >= 20) but
            // breaks example-paut's 1 mm increment for walls up to 75 mm (the sheet's 25 mm).
            ObjectNode sheet = passing();
            sheet.putArray("profile_ids").add("common-practice").add("example-paut");
            section(sheet, "acquisition").put("scan_increment_mm", 1.5);
            JsonPath answer = validate(sheet);
            assertThat(answer.getList("profiles.id", String.class)).containsExactly("common-practice", "example-paut");
            assertThat(answer.getList("profiles.verdict", String.class)).containsExactly("PASS", "FAIL");
            assertThat(answer.getString("verdict")).isEqualTo("FAIL");
            assertThat(findings(answer, "example-paut")).filteredOn(f -> "FAIL".equals(f.get("verdict")))
                    .extracting(f -> f.get("rule_id")).containsExactly("paut-increment-up-to-75-mm");
            assertThat(findings(answer, "common-practice")).extracting(f -> f.get("verdict")).containsOnly("PASS");
            assertThat(answer.getList("inputs.profile_ids", String.class))
                    .containsExactly("common-practice", "example-paut");
        }

        @Test
        void aProfileThatCoversNothingKeepsTheSheetFromPassing() {
            ObjectNode sheet = passing();
            sheet.putArray("profile_ids").add("common-practice").add("example-tofd");
            JsonPath answer = validate(sheet);
            assertThat(answer.getList("profiles.verdict", String.class)).containsExactly("PASS", "NOT_COVERED");
            assertThat(answer.getString("verdict")).isEqualTo("NOT_COVERED");
        }

        @Test
        void theOldSingleProfileIdStillWorksAndIsEchoedAsAList() {
            ObjectNode sheet = passing();
            sheet.put("profile_id", "example-paut");
            JsonPath answer = validate(sheet);
            assertThat(answer.getList("inputs.profile_ids", String.class)).containsExactly("example-paut");
            assertThat(answer.getMap("inputs")).doesNotContainKey("profile_id");
        }

        @Test
        void profilesAreNamedOnceInOneForm() {
            ObjectNode both = passing();
            both.put("profile_id", "common-practice");
            both.putArray("profile_ids").add("example-paut");
            assertInvalid(PATH, both.toString(), "/profile_ids");
            ObjectNode unknown = passing();
            unknown.putArray("profile_ids").add("common-practice").add("no-such-profile");
            assertInvalid(PATH, unknown.toString(), "/profile_ids/1");
            ObjectNode twice = passing();
            twice.putArray("profile_ids").add("common-practice").add("common-practice");
            assertInvalid(PATH, twice.toString(), "/profile_ids/1");
            ObjectNode none = passing();
            none.putArray("profile_ids");
            assertInvalid(PATH, none.toString(), "/profile_ids");
        }
    }

    /** One sheet per feasibility check: impossible settings FAIL with the reason, never a 422. */
    @Nested
    class FeasibilityChecks {
        @Test
        void aGateLongerThanTheFiringPeriod() {
            // 5000 Hz fires every 1/5000 s = 200 us; a 300 us gate would still be open at the next firing.
            ObjectNode sheet = passing();
            section(sheet, "acquisition").put("gate_length_us", 300);
            JsonPath answer = validate(sheet);
            Map<String, Object> f = feasibilityFailure(answer, "gate-within-firing-period");
            assertThat((String) f.get("reason")).contains("300 us").contains("200 us");
            assertThat(f.get("settings")).isEqualTo(List.of("/acquisition/gate_length_us",
                    "/acquisition/pulse_repetition_frequency_hz"));
            // the figures that need no gate are still there
            assertThat(answer.getDouble("values.max_scan_speed_mm_per_s")).isCloseTo(5000.0 / 61, within(1e-9));
        }

        @Test
        void aGateLongerThanTheFiringPeriodWithoutTheRestOfTheBudget() {
            // The check needs only the gate and the PRF: 2 x 400 mm / 3.255 mm/us = 245.8 us > 200 us.
            ObjectNode sheet = passing();
            sheet.remove("digitization");
            ObjectNode acquisition = section(sheet, "acquisition");
            acquisition.remove("gate_length_us");
            acquisition.put("gate_length_mm", 400);
            feasibilityFailure(validate(sheet), "gate-within-firing-period");
        }

        @Test
        void aTofdDepthBelowTheBackWall() {
            ObjectNode sheet = (ObjectNode) JSON.readTree("""
                    {"sheet_id": "HVW-TOFD-09", "technique": "TOFD", "profile_id": "example-tofd",
                     "probe": {"frequency_mhz": 10, "bandwidth_percent": 70},
                     "material": {"velocity_m_per_s": 5920, "thickness_mm": 20},
                     "digitization": {"sampling_frequency_mhz": 100},
                     "tofd": {"probe_centre_separation_mm": 60, "depth_of_interest_mm": 30}}""");
            JsonPath answer = validate(sheet);
            Map<String, Object> f = feasibilityFailure(answer, "tofd-depth-within-wall");
            assertThat((String) f.get("reason")).contains("back wall");
            // the depth quoted with its inch value: 30 mm / 25.4 = 1.181 in (25.4 mm per inch exactly, NIST SP 811)
            assertThat((String) f.get("reason")).contains("30 mm (1.181 in)");
            assertThat(f.get("settings")).isEqualTo(List.of("/tofd/depth_of_interest_mm", "/material/thickness_mm"));
            // the TOFD profile's own rule is still checked: 100 MHz / 10 MHz = 10 >= 4
            assertThat(answer.getString("profiles[0].verdict")).isEqualTo("PASS");
        }

        @Test
        @SuppressWarnings("unchecked")
    void aMaxCodeMappingOfOneBitRf() {
            // 1 bit of RF: codes -1 and 0; 2^(1-1) - 1 = 0 leaves no positive code for full screen (definition).
            ObjectNode sheet = passing();
            section(sheet, "digitization").put("bit_depth", 1).put("code_mapping", "MAX_CODE");
            Map<String, Object> f = feasibilityFailure(validate(sheet), "full-screen-code");
            assertThat((List<Object>) f.get("settings")).contains("/digitization/code_mapping", "/digitization/bit_depth");
        }

        @Test
        void anEvaluationHeightAboveFullScreen() {
            // 80 %FSH x 10^(6/20) = 159.6 %FSH: above the screen, no reading exists.
            ObjectNode sheet = passing();
            section(sheet, "evaluation").put("evaluation_level_db", 6);
            Map<String, Object> f = feasibilityFailure(validate(sheet), "evaluation-height-on-screen");
            assertThat((String) f.get("reason")).contains("159.6");
        }

        @Test
        void aShearWaveAskedOfWater() {
            // A liquid carries no shear wave (definition): no velocity exists for the sheet.
            ObjectNode sheet = passing();
            ObjectNode material = section(sheet, "material");
            material.put("material", "water");
            JsonPath answer = validate(sheet);
            Map<String, Object> f = feasibilityFailure(answer, "shear-wave-in-solid");
            assertThat(f.get("settings")).isEqualTo(List.of("/material/wave_mode", "/material/material"));
            assertThat(answer.getString("inputs.material.material")).isEqualTo("water");
            assertThat(answer.getString("inputs.material.wave_mode")).isEqualTo("SHEAR");
        }

        @Test
        void aPositionTooLargeToCount() {
            // 100 000 MHz x 100 000 us = 10^10 samples x 4 bytes x 65536^2 A-scans = 1.7e20 bytes > 2^63 - 1.
            ObjectNode sheet = passing();
            section(sheet, "digitization").put("sampling_frequency_mhz", 100000).put("bit_depth", 32)
                    .put("decimation_factor", 1);
            ObjectNode acquisition = section(sheet, "acquisition");
            acquisition.remove("focal_laws");
            acquisition.put("fmc_element_count", 65536).put("gate_length_us", 100000)
                    .put("pulse_repetition_frequency_hz", 10);
            feasibilityFailure(validate(sheet), "position-size-countable");
        }
    }

    /** Sheets written in inches: the same verdicts and values as their millimetre twins (1 in = 25.4 mm exactly). */
    @Nested
    class InchSheets {
        @Test
        void aSheetInInchesThroughoutMatchesItsMillimetreTwin() {
            ObjectNode mm = passing();
            section(mm, "tfm").put("grid_spacing_mm", 0.1).put("lateral_grid_spacing_mm", 0.2)
                    .put("aperture_mm", 38).put("depth_mm", 20);
            ObjectNode in = mm.deepCopy();
            ObjectNode material = section(in, "material");
            material.remove("thickness_mm");
            material.put("thickness_in", 25 / 25.4);
            ObjectNode acquisition = section(in, "acquisition");
            for (String[] f : new String[][] {{"scan_increment_mm", "scan_increment_in"},
                    {"scan_length_mm", "scan_length_in"}, {"max_sound_path_mm", "max_sound_path_in"},
                    {"planned_scan_speed_mm_per_s", "planned_scan_speed_in_per_s"}}) {
                double v = acquisition.get(f[0]).asDouble();
                acquisition.remove(f[0]);
                acquisition.put(f[1], v / 25.4);
            }
            ObjectNode tfm = section(in, "tfm");
            for (String base : new String[] {"grid_spacing", "lateral_grid_spacing", "aperture", "depth"}) {
                double v = tfm.get(base + "_mm").asDouble();
                tfm.remove(base + "_mm");
                tfm.put(base + "_in", v / 25.4);
            }
            ObjectNode evaluation = section(in, "evaluation");
            evaluation.remove("thickness_tolerance_mm");
            evaluation.put("thickness_tolerance_in", 0.1 / 25.4);

            JsonPath inches = validate(in);
            JsonPath millimetres = validate(mm);
            assertThat(inches.getString("verdict")).isEqualTo(millimetres.getString("verdict")).isEqualTo("PASS");
            Map<String, Object> expected = millimetres.getMap("values");
            Map<String, Object> actual = inches.getMap("values");
            assertThat(actual.keySet()).isEqualTo(expected.keySet());
            for (String metric : expected.keySet()) {
                double e = ((Number) expected.get(metric)).doubleValue();
                assertThat(((Number) actual.get(metric)).doubleValue()).as(metric)
                        .isCloseTo(e, within(1e-9 * Math.max(1, Math.abs(e))));
            }
            assertThat(actual).containsKeys("tfm_grid_amplitude_loss_db", "tfm_lateral_amplitude_loss_db");
            // the normalised sheet is in mm: itself a valid request
            assertThat(inches.getDouble("inputs.acquisition.planned_scan_speed_mm_per_s")).isCloseTo(20, within(1e-12));
            assertThat(inches.getDouble("inputs.tfm.grid_spacing_mm")).isCloseTo(0.1, within(1e-15));
        }

        @Test
        void aFeasibilityFailurePointsAtTheInchFieldsTheSheetGave() {
            ObjectNode sheet = (ObjectNode) JSON.readTree("""
                    {"sheet_id": "HVW-TOFD-10", "technique": "TOFD", "profile_id": "example-tofd",
                     "probe": {"frequency_mhz": 10, "bandwidth_percent": 70},
                     "material": {"velocity_m_per_s": 5920, "thickness_in": 0.75},
                     "digitization": {"sampling_frequency_mhz": 100},
                     "tofd": {"probe_centre_separation_in": 2.5, "depth_of_interest_in": 1.25}}""");
            Map<String, Object> f = feasibilityFailure(validate(sheet), "tofd-depth-within-wall");
            assertThat(f.get("settings")).isEqualTo(List.of("/tofd/depth_of_interest_in", "/material/thickness_in"));
        }

        @Test
        void aSpeedInBothUnitsIsRefused() {
            ObjectNode sheet = passing();
            section(sheet, "acquisition").put("planned_scan_speed_in_per_s", 1);
            assertInvalid(PATH, sheet.toString(), "/acquisition/planned_scan_speed_in_per_s");
        }
    }

    /** Numbers as a reader of the sheet expects them. */
    @Nested
    class Numbers {
        @Test
        void countsAreIntegers() {
            String body = post(PATH, TechniqueSheetValidationApiTest.PASSING).statusCode(200).extract().asString();
            JsonNode values = JSON.readTree(body).path("values");
            for (String count : List.of("bit_depth", "decimation_factor", "focal_laws", "element_count", "levels",
                    "samples_per_a_scan", "firings_per_position", "a_scans_per_position", "bytes_per_position")) {
                assertThat(values.path(count).isIntegralNumber()).as(count + " = " + values.path(count)).isTrue();
            }
            assertThat(values.path("bit_depth").asLong()).isEqualTo(12);
            assertThat(values.path("levels").asLong()).isEqualTo(4096); // 2^12 codes
            assertThat(values.path("samples_per_period").isIntegralNumber()).isFalse(); // a ratio stays a number
        }

        @Test
        void modelLevelsAndFractionsStopAtTheDocumentedFloor() {
            // 5 MHz, 60 %, 50 MHz effective: the model's level at 25 MHz is -6 ((25 - 5)/1.5)^2 = -1067 dB,
            // reported at the floor of -200 dB; its energy above 25 MHz (about 1e-115) at 1e-20.
            JsonNode values = JSON.readTree(post(PATH, TechniqueSheetValidationApiTest.PASSING).statusCode(200)
                    .extract().asString()).path("values");
            assertThat(values.path("spectral_level_at_nyquist_db").asDouble()).isEqualTo(-200.0);
            assertThat(values.path("energy_above_nyquist_fraction").asDouble()).isEqualTo(1e-20);
            JsonPath single = post("/api/sampling-assessments", """
                    {"sampling_frequency_mhz": 100, "decimation_factor": 2, "frequency_mhz": 5, "bandwidth_percent": 60}""")
                    .statusCode(200).extract().jsonPath();
            assertThat(single.getDouble("spectral_level_at_nyquist_db")).isEqualTo(-200.0);
            assertThat(single.getDouble("energy_above_nyquist_fraction")).isEqualTo(1e-20);
        }
    }

    @Nested
    class InBulk {
        @Test
        void aMixedLibraryGivesEveryRowItsVerdictAndNoUnreadableRow() {
            ObjectNode pass = passing();
            pass.put("sheet_id", "HVW-PA-01");
            ObjectNode impossible = passing();
            impossible.put("sheet_id", "HVW-PA-02");
            section(impossible, "acquisition").put("gate_length_us", 300);
            ObjectNode notCovered = passing();
            notCovered.put("sheet_id", "HVW-PA-03");
            notCovered.put("profile_id", "example-tofd");
            ObjectNode incomplete = passing();
            incomplete.put("sheet_id", "HVW-PA-04");
            section(incomplete, "evaluation").remove("thickness_tolerance_mm");
            String body = "[" + String.join(",", pass.toString(), impossible.toString(), notCovered.toString(),
                    incomplete.toString()) + "]";
            String answer = given().contentType("application/json").accept("application/x-ndjson").body(body)
                    .post(PATH + "/batch").then().statusCode(200).extract().asString();
            List<String> verdicts = new ArrayList<>();
            for (String line : answer.split("\n")) {
                if (!line.isBlank()) {
                    JsonNode row = JSON.readTree(line);
                    assertThat(row.path("status").asString()).isEqualTo("OK");
                    verdicts.add(row.path("id").asString() + " " + row.path("result").path("verdict").asString());
                }
            }
            assertThat(verdicts).containsExactly("HVW-PA-01 PASS", "HVW-PA-02 FAIL", "HVW-PA-03 NOT_COVERED",
                    "HVW-PA-04 INCOMPLETE");
        }

        @Test
        void aCsvLibraryNamesSeveralProfilesInOneCell() {
            String csv = """
                    sheet_id,technique,profile_ids,probe.frequency_mhz,digitization.sampling_frequency_mhz,material.thickness_mm,acquisition.scan_increment_mm
                    HVW-PA-11,PHASED_ARRAY,common-practice;example-paut,5,100,25,1.5
                    """;
            String answer = given().contentType("text/csv").accept("application/x-ndjson").body(csv)
                    .post(PATH + "/batch").then().statusCode(200).extract().asString();
            JsonNode result = JSON.readTree(answer.strip()).path("result");
            List<String> profiles = new ArrayList<>();
            result.path("profiles").forEach(p -> profiles.add(p.path("id").asString() + "=" + p.path("verdict").asString()));
            // common practice: 100/5 = 20 samples per period pass; example-paut: 1.5 mm > 1 mm fails
            assertThat(profiles).containsExactly("common-practice=INCOMPLETE", "example-paut=FAIL");
            assertThat(result.path("verdict").asString()).isEqualTo("FAIL");
        }
    }
}
