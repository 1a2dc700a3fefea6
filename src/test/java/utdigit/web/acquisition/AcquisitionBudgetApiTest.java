package utdigit.web.acquisition;

import static io.restassured.RestAssured.given;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.empty;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItem;
import static org.hamcrest.Matchers.hasItems;
import static org.hamcrest.Matchers.hasKey;
import static org.hamcrest.Matchers.matchesPattern;
import static org.hamcrest.Matchers.not;

import io.restassured.path.json.JsonPath;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;
import utdigit.web.support.ApiTest;

/**
 * POST /api/acquisition-budgets. The relations (samples = ceil(gate x fs/m), whole bytes per
 * sample, firings and A-scans per focal law / FMC / HMC, v_max = PRF x increment / (firings x
 * averaging), MB per metre, data rate, PRF_max = 1/(q t_rt)) are common practice, no published
 * source; the expected values are worked by hand in the comments beside them. MB = 10^6 bytes.
 * Velocities: carbon-steel 5920 / 3255 m/s are the ISO 22232-2 steel reference values of the
 * built-in catalogue.
 */
class AcquisitionBudgetApiTest extends ApiTest {
    private static final String PATH = "/api/acquisition-budgets";

    /** Relative error allowed between a hand-worked value and a double of the answer. */
    private static final double ALLOWED_RELATIVE_ERROR = 1e-12;

    /** The result fields compared between two answers that must agree. */
    private static final List<String> RESULT_FIELDS = List.of("samples_per_a_scan", "bytes_per_sample",
            "bytes_per_a_scan", "firings_per_position", "a_scans_per_position", "bytes_per_position",
            "megabytes_per_metre", "file_size_megabytes", "max_scan_speed_mm_per_s", "data_rate_megabytes_per_s",
            "max_prf_without_wraparound_hz", "max_scan_length_per_file_mm", "effective_sampling_frequency_mhz",
            "gate_length_used_us", "pulse_repetition_period_us", "data_rate_scan_speed_mm_per_s",
            "max_round_trip_used_us");

    private static org.hamcrest.Matcher<Double> near(double expected) {
        return closeTo(expected, Math.abs(expected) * ALLOWED_RELATIVE_ERROR);
    }

    /** A phased-array sectorial weld scan: the base of the phased-array cases. */
    private static final String PHASED_ARRAY = """
            {"sampling_frequency_mhz": 100, "decimation_factor": 2, "bit_depth": 8, "gate_length_us": 40,
             "focal_laws": 120, "scan_increment_mm": 1, "scan_length_mm": 2000,
             "pulse_repetition_frequency_hz": 12000, "planned_scan_speed_mm_per_s": 50,
             "max_sound_path_mm": 100, "velocity_m_per_s": 5920, "wraparound_decay_factor": 2,
             "file_size_limit_megabytes": 1000}""";

    /** 64-element matrix capture, 16 bit: the base of the FMC and HMC cases. */
    private static final String FMC_64 = """
            {"sampling_frequency_mhz": 100, "bit_depth": 16, "gate_length_us": 20, "fmc_element_count": 64,
             "scan_increment_mm": 1, "scan_length_mm": 500, "pulse_repetition_frequency_hz": 20000""";

    @Test
    @DisplayName("phased array, 120 laws: hand-worked budget (common practice, no published source)")
    void phasedArrayAnswersTheHandWorkedBudget() {
        // Worked by hand:
        //   fs/m                  = 100 MHz / 2                          = 50 MHz
        //   samples per A-scan    = 40 us x 50 MHz                       = 2000
        //   bytes per sample      = ceil(8/8)                            = 1
        //   bytes per A-scan      = 2000 x 1                             = 2000
        //   firings = A-scans     = 120 focal laws                       = 120
        //   bytes per position    = 2000 x 120                           = 240 000
        //   MB per metre          = 240 000 x (1000 mm / 1 mm) / 10^6    = 240
        //   file size             = 240 MB/m x 2 m                       = 480 MB
        //   v_max                 = 12 000 /s x 1 mm / 120               = 100 mm/s
        //   data rate at 50 mm/s  = 240 000 B x 50 /s / 10^6             = 12 MB/s
        //   round trip            = 2 x 100 mm / 5.92 mm/us              = 33.78 us
        //   PRF_max               = 1 / (2 x 200/5.92 us) = 5.92e6 / 400 = 14 800 Hz
        //   length per 1000 MB    = 1000 / 240 x 1000 mm                 = 4166.67 mm
        post(PATH, PHASED_ARRAY)
                .statusCode(200)
                .body("samples_per_a_scan", equalTo(2000))
                .body("bytes_per_sample", equalTo(1))
                .body("bytes_per_a_scan", equalTo(2000))
                .body("firings_per_position", equalTo(120))
                .body("a_scans_per_position", equalTo(120))
                .body("bytes_per_position", equalTo(240_000))
                .body("megabytes_per_metre", near(240))
                .body("file_size_megabytes", near(480))
                .body("max_scan_speed_mm_per_s", near(100))
                .body("data_rate_megabytes_per_s", near(12))
                .body("data_rate_scan_speed_mm_per_s", near(50))
                .body("max_prf_without_wraparound_hz", near(14_800))
                .body("max_round_trip_used_us", near(200 / 5.92))
                .body("max_scan_length_per_file_mm", near(1000.0 / 240 * 1000))
                .body("effective_sampling_frequency_mhz", near(50))
                .body("gate_length_used_us", near(40))
                .body("pulse_repetition_period_us", near(1e6 / 12_000))
                .body("velocity_source.kind", equalTo("CALLER"))
                .body("velocity_source.velocity_m_per_s", near(5920))
                .body("warnings", empty())
                .body("references.id", hasItem("acquisition-counting"))
                .body("references.find { it.topic == 'megabyte' }.id", equalTo("definitions"))
                .body("inputs.decimation_factor", equalTo(2))
                .body("inputs.focal_laws", equalTo(120))
                .body("inputs.averaging", equalTo(1))
                .body("inputs.wraparound_decay_factor", near(2))
                .body("inputs", not(hasKey("capture")))
                .body("stamp.calculation", equalTo("acquisition-budgets"))
                .body("stamp.sha256", matchesPattern("[0-9a-f]{64}"));
    }

    @Test
    @DisplayName("64-element FMC: n firings set the speed, n^2 A-scans the data (common practice, no published source)")
    void fmc64CountsFiringsForSpeedAndAScansForData() {
        // Worked by hand:
        //   samples per A-scan    = 20 us x 100 MHz                      = 2000
        //   bytes per sample      = ceil(16/8)                           = 2
        //   bytes per A-scan      = 2000 x 2                             = 4000
        //   firings per position  = n                                    = 64
        //   A-scans per position  = n^2 = 64 x 64                        = 4096
        //   bytes per position    = 4000 x 4096                          = 16 384 000
        //   MB per metre          = 16 384 000 x 1000 / 10^6             = 16 384
        //   file size             = 16 384 MB/m x 0.5 m                  = 8192 MB
        //   v_max                 = 20 000 /s x 1 mm / 64                = 312.5 mm/s
        //                           (dividing by the 4096 A-scans would give 4.88 mm/s: wrong)
        //   data rate at v_max    = 16 384 000 B x 312.5 /s / 10^6       = 5120 MB/s
        post(PATH, FMC_64 + "}")
                .statusCode(200)
                .body("samples_per_a_scan", equalTo(2000))
                .body("bytes_per_sample", equalTo(2))
                .body("bytes_per_a_scan", equalTo(4000))
                .body("firings_per_position", equalTo(64))
                .body("a_scans_per_position", equalTo(4096))
                .body("bytes_per_position", equalTo(16_384_000))
                .body("megabytes_per_metre", near(16_384))
                .body("file_size_megabytes", near(8192))
                .body("max_scan_speed_mm_per_s", near(312.5))
                .body("data_rate_megabytes_per_s", near(5120))
                .body("data_rate_scan_speed_mm_per_s", near(312.5))
                .body("inputs.capture", equalTo("FMC"))
                .body("inputs.decimation_factor", equalTo(1))
                .body("inputs.averaging", equalTo(1))
                .body("inputs", not(hasKey("focal_laws")))
                .body("references.topic", hasItem("firings and A-scans per position, FMC"));
    }

    @Test
    @DisplayName("64-element HMC: n firings, n(n+1)/2 A-scans (common practice, no published source)")
    void hmc64HalvesTheMatrixButNotTheFirings() {
        // A-scans = 64 x 65 / 2 = 2080; bytes per position = 4000 x 2080 = 8 320 000; MB/m = 8320;
        // firings stay 64, so v_max = 20 000 x 1 / 64 = 312.5 mm/s as for FMC.
        post(PATH, FMC_64 + ", \"capture\": \"HMC\"}")
                .statusCode(200)
                .body("firings_per_position", equalTo(64))
                .body("a_scans_per_position", equalTo(2080))
                .body("bytes_per_position", equalTo(8_320_000))
                .body("megabytes_per_metre", near(8320))
                .body("file_size_megabytes", near(4160))
                .body("max_scan_speed_mm_per_s", near(312.5))
                .body("inputs.capture", equalTo("HMC"));
    }

    @Test
    @DisplayName("averaging divides the scan speed, not the data (common practice, no published source)")
    void averagingCostsSpeedNotData() {
        // v_max = 20 000 x 1 / (64 x 4) = 78.125 mm/s; MB/m unchanged at 16 384;
        // data rate at v_max = 16 384 000 x 78.125 / 10^6 = 1280 MB/s.
        post(PATH, FMC_64 + ", \"averaging\": 4}")
                .statusCode(200)
                .body("max_scan_speed_mm_per_s", near(78.125))
                .body("megabytes_per_metre", near(16_384))
                .body("data_rate_megabytes_per_s", near(1280))
                .body("inputs.averaging", equalTo(4));
    }

    @Test
    @DisplayName("decimation by 3: 30 us x 100/3 MHz is 1000 samples, not 1001 (common practice, no published source)")
    void decimationByThreeCountsTheExactProductWithoutRoundingUp() {
        // 30 us x 33.333... MHz = 1000 exactly; in binary floating point 999.9999999999999, which the
        // 1e-9 ceiling tolerance takes as 1000.
        post(PATH, """
                {"sampling_frequency_mhz": 100, "decimation_factor": 3, "bit_depth": 8, "gate_length_us": 30,
                 "scan_increment_mm": 1, "pulse_repetition_frequency_hz": 1000}""")
                .statusCode(200)
                .body("effective_sampling_frequency_mhz", near(100.0 / 3))
                .body("samples_per_a_scan", equalTo(1000));
    }

    @Test
    @DisplayName("gate as a sound path in carbon-steel: t = 2 L / v with 5920 m/s (ISO 22232-2 steel reference)")
    void gateByMillimetresInCarbonSteelUsesTheMaterialVelocity() {
        // t = 2 x 50 mm / 5.92 mm/us = 16.8919 us; samples = ceil(16.8919 x 100) = ceil(1689.19) = 1690.
        post(PATH, """
                {"sampling_frequency_mhz": 100, "bit_depth": 8, "gate_length_mm": 50, "material": "carbon-steel",
                 "scan_increment_mm": 1, "pulse_repetition_frequency_hz": 1000}""")
                .statusCode(200)
                .body("gate_length_used_us", near(100 / 5.92))
                .body("samples_per_a_scan", equalTo(1690))
                .body("velocity_source.kind", equalTo("MATERIAL"))
                .body("velocity_source.material", equalTo("carbon-steel"))
                .body("velocity_source.wave_mode", equalTo("LONGITUDINAL"))
                .body("velocity_source.velocity_m_per_s", near(5920))
                .body("velocity_source.source", equalTo("iso-22232-2-steel-reference-values"))
                .body("inputs.gate_length_mm", near(50))
                .body("inputs.velocity_m_per_s", near(5920))
                .body("inputs", not(hasKey("material")))
                .body("inputs", not(hasKey("wave_mode")));
    }

    @Test
    @DisplayName("gate as a shear-wave sound path in carbon-steel uses 3255 m/s (ISO 22232-2 steel reference)")
    void gateByMillimetresInShearUsesTheShearVelocity() {
        // t = 2 x 50 / 3.255 = 30.7220 us; samples = ceil(3072.20) = 3073.
        post(PATH, """
                {"sampling_frequency_mhz": 100, "bit_depth": 8, "gate_length_mm": 50, "material": "carbon-steel",
                 "wave_mode": "SHEAR", "scan_increment_mm": 1, "pulse_repetition_frequency_hz": 1000}""")
                .statusCode(200)
                .body("gate_length_used_us", near(100 / 3.255))
                .body("samples_per_a_scan", equalTo(3073))
                .body("inputs.velocity_m_per_s", near(3255));
    }

    @Test
    void lengthsInInchesGiveTheSameBudgetAsMillimetres() {
        // 1 in = 25.4 mm exactly: 1 in gate, 0.04 in increment, 40 in scan, 4 in sound path.
        String millimetres = """
                {"sampling_frequency_mhz": 100, "bit_depth": 12, "gate_length_mm": 25.4, "velocity_m_per_s": 5920,
                 "focal_laws": 64, "scan_increment_mm": 1.016, "scan_length_mm": 1016,
                 "pulse_repetition_frequency_hz": 8000, "max_sound_path_mm": 101.6,
                 "file_size_limit_megabytes": 50}""";
        String inches = """
                {"sampling_frequency_mhz": 100, "bit_depth": 12, "gate_length_in": 1, "velocity_m_per_s": 5920,
                 "focal_laws": 64, "scan_increment_in": 0.04, "scan_length_in": 40,
                 "pulse_repetition_frequency_hz": 8000, "max_sound_path_in": 4,
                 "file_size_limit_megabytes": 50}""";
        JsonPath mm = post(PATH, millimetres).statusCode(200).extract().jsonPath();
        JsonPath in = post(PATH, inches).statusCode(200)
                .body("inputs.scan_increment_mm", near(1.016))
                .body("inputs.scan_length_mm", near(1016))
                .body("inputs.gate_length_mm", near(25.4))
                .body("inputs.max_sound_path_mm", near(101.6))
                .body("inputs", not(hasKey("scan_increment_in")))
                .body("inputs", not(hasKey("gate_length_in")))
                .extract().jsonPath();
        assertSameResults(in, mm);
        // Hand check of one value: 2 x 25.4 / 5.92 = 8.581 us; x 100 MHz = 858.1, so 859 samples.
        assertThat(in.getLong("samples_per_a_scan")).isEqualTo(859);
    }

    @Test
    void velocityInInchesPerMicrosecondGivesTheSameBudgetAsMetresPerSecond() {
        // 1 in/us = 25 400 m/s exactly; 5920 m/s = 0.23307... in/us.
        String base = """
                {"sampling_frequency_mhz": 100, "bit_depth": 8, "gate_length_mm": 50,
                 "scan_increment_mm": 1, "pulse_repetition_frequency_hz": 1000, "max_sound_path_mm": 80, """;
        JsonPath metric = post(PATH, base + "\"velocity_m_per_s\": 5920}").statusCode(200).extract().jsonPath();
        JsonPath imperial = post(PATH, base + "\"velocity_in_per_us\": " + (5920.0 / 25_400) + "}")
                .statusCode(200).extract().jsonPath();
        assertSameResults(imperial, metric);
    }

    @Test
    void inputsAreAValidRequestThatReproducesTheAnswer() throws Exception {
        String answer = post(PATH, """
                {"sampling_frequency_mhz": 80, "bit_depth": 10, "gate_length_in": 2, "material": "carbon-steel",
                 "wave_mode": "SHEAR", "fmc_element_count": 32, "scan_increment_in": 0.04,
                 "scan_length_in": 100, "pulse_repetition_frequency_hz": 5000, "max_sound_path_in": 3,
                 "file_size_limit_megabytes": 1000}""")
                .statusCode(200).extract().asString();
        JsonNode inputs = JsonMapper.builder().build().readTree(answer).get("inputs");
        String again = post(PATH, inputs.toString()).statusCode(200)
                .body("inputs.capture", equalTo("FMC"))
                .body("inputs.wraparound_decay_factor", near(1))
                .extract().asString();
        assertSameResults(JsonPath.from(again), JsonPath.from(answer));
        assertThat(JsonPath.from(again).getMap("inputs")).isEqualTo(JsonPath.from(answer).getMap("inputs"));
    }

    @Test
    void optionalResultsAreOmittedWhenTheirInputsAreAbsent() {
        post(PATH, """
                {"sampling_frequency_mhz": 100, "bit_depth": 8, "gate_length_us": 20, "scan_increment_mm": 1,
                 "pulse_repetition_frequency_hz": 10000}""")
                .statusCode(200)
                .body("$", not(hasKey("file_size_megabytes")))
                .body("$", not(hasKey("max_prf_without_wraparound_hz")))
                .body("$", not(hasKey("max_round_trip_used_us")))
                .body("$", not(hasKey("max_scan_length_per_file_mm")))
                .body("$", not(hasKey("velocity_source")))
                .body("inputs", not(hasKey("wraparound_decay_factor")))
                .body("inputs", not(hasKey("capture")))
                .body("inputs.focal_laws", equalTo(1))
                // one focal law: v_max = 10 000 x 1 / 1 = 10 000 mm/s; data rate = 2000 B x 10 000 /s = 20 MB/s
                .body("max_scan_speed_mm_per_s", near(10_000))
                .body("data_rate_megabytes_per_s", near(20));
    }

    @Test
    void explicitNullIsTheSameAsAbsent() {
        post(PATH, """
                {"sampling_frequency_mhz": 100, "bit_depth": 8, "gate_length_us": 20, "gate_length_mm": null,
                 "scan_increment_mm": 1, "pulse_repetition_frequency_hz": 10000, "capture": null}""")
                .statusCode(200)
                .body("samples_per_a_scan", equalTo(2000));
    }

    @Test
    @DisplayName("65536-element FMC counts 2^32 A-scans exactly (int64)")
    void largestMatrixCountsBeyondThirtyTwoBits() {
        // 1 us x 100 MHz = 100 samples of 1 byte; A-scans = 65 536^2 = 4 294 967 296;
        // bytes per position = 429 496 729 600.
        post(PATH, """
                {"sampling_frequency_mhz": 100, "bit_depth": 8, "gate_length_us": 1, "fmc_element_count": 65536,
                 "scan_increment_mm": 1, "pulse_repetition_frequency_hz": 1000000}""")
                .statusCode(200)
                .body("a_scans_per_position", equalTo(4_294_967_296L))
                .body("bytes_per_position", equalTo(429_496_729_600L))
                .body("firings_per_position", equalTo(65_536));
    }

    @Test
    void gateEqualToThePulseRepetitionPeriodIsAccepted() {
        // 1 / 50 000 Hz = 20 us: a 20 us gate just fits.
        post(PATH, """
                {"sampling_frequency_mhz": 100, "bit_depth": 8, "gate_length_us": 20, "scan_increment_mm": 1,
                 "pulse_repetition_frequency_hz": 50000}""")
                .statusCode(200)
                .body("pulse_repetition_period_us", near(20));
    }

    @Test
    @DisplayName("api-examples/acquisition-budgets.json answers its hand-worked budget")
    void apiExampleAnswersItsHandWorkedBudget() throws Exception {
        // Our invented scenario: a sectorial shear-wave weld scan, two groups of 61 laws, 12 bit.
        //   gate time             = 2 x 75 mm / 3.255 mm/us              = 46.083 us
        //   samples               = ceil(46.083 us x 100/2 MHz) = ceil(2304.15) = 2305
        //   bytes per A-scan      = 2305 x ceil(12/8) = 2305 x 2         = 4610
        //   bytes per position    = 4610 x 122                           = 562 420
        //   MB per metre          = 562 420 x 1000 / 10^6                = 562.42
        //   file size             = 562.42 x 2.9 m                       = 1631.018 MB (limit 2000)
        //   v_max                 = 6000 /s x 1 mm / 122                 = 49.18 mm/s (planned 40)
        //   data rate at 40 mm/s  = 562 420 x 40 / 10^6                  = 22.4968 MB/s
        //   PRF_max               = 10^6 / (1.5 x 240 / 3.255 us)        = 9041.7 Hz (PRF 6000)
        String example = Files.readString(Path.of("api-examples", "acquisition-budgets.json"));
        post(PATH, example)
                .statusCode(200)
                .body("samples_per_a_scan", equalTo(2305))
                .body("bytes_per_position", equalTo(562_420))
                .body("megabytes_per_metre", near(562.42))
                .body("file_size_megabytes", near(562.42 * 2.9))
                .body("max_scan_speed_mm_per_s", near(6000.0 / 122))
                .body("data_rate_megabytes_per_s", near(22.4968))
                .body("max_prf_without_wraparound_hz", near(1e6 / (1.5 * 240 / 3.255)))
                .body("warnings.code", equalTo(List.of("SAMPLE_STORAGE_ASSUMED")));
    }

    @Test
    void openApiDocumentsTheEndpointAndTheMegabyte() {
        given().get("/v3/api-docs").then().statusCode(200)
                .body("paths.'/api/acquisition-budgets'.post.description", containsString("MB is 10^6 bytes"))
                .body("components.schemas.AcquisitionBudget.description", containsString("MB is 10^6 bytes"))
                .body("components.schemas.AcquisitionBudget.properties", hasKey("megabytes_per_metre"))
                .body("components.schemas.AcquisitionBudget.properties", hasKey("samples_per_a_scan"))
                .body("components.schemas.AcquisitionBudgetRequest.properties", hasKey("gate_length_in"))
                .body("components.schemas.AcquisitionBudgetRequest.properties.file_size_limit_megabytes.description",
                        containsString("10^6 bytes"));
    }

    @Nested
    class Warnings {
        @Test
        void plannedSpeedAboveTheMaximumIsAWarningAndTheRateFollowsThePlan() {
            // v_max = 100 mm/s (phased-array case); planned 150 mm/s: rate = 240 000 B x 150 /s = 36 MB/s.
            post(PATH, PHASED_ARRAY.replace("\"planned_scan_speed_mm_per_s\": 50", "\"planned_scan_speed_mm_per_s\": 150"))
                    .statusCode(200)
                    .body("warnings.code", hasItem("PLANNED_SPEED_ABOVE_MAXIMUM"))
                    .body("warnings.message", hasItem(containsString("planned_scan_speed_mm_per_s")))
                    .body("data_rate_scan_speed_mm_per_s", near(150))
                    .body("data_rate_megabytes_per_s", near(36));
        }

        @Test
        void prfAboveTheWraparoundLimitIsAWarningAndTheBareLimitSaysSo() {
            // round trip 100 us, q = 1 (default): PRF_max = 10^6 / 100 = 10 000 Hz < 12 000 Hz.
            post(PATH, """
                    {"sampling_frequency_mhz": 100, "bit_depth": 8, "gate_length_us": 40, "focal_laws": 16,
                     "scan_increment_mm": 1, "pulse_repetition_frequency_hz": 12000, "max_round_trip_us": 100}""")
                    .statusCode(200)
                    .body("max_prf_without_wraparound_hz", near(10_000))
                    .body("max_round_trip_used_us", near(100))
                    .body("warnings.code", hasItems("PRF_ABOVE_WRAPAROUND_LIMIT", "WRAPAROUND_DECAY_FACTOR_BARE_LIMIT"))
                    .body("inputs.wraparound_decay_factor", near(1));
        }

        @Test
        void decayFactorOneGivenIsStillTheBareLimit() {
            post(PATH, PHASED_ARRAY.replace("\"wraparound_decay_factor\": 2", "\"wraparound_decay_factor\": 1"))
                    .statusCode(200)
                    // PRF_max = 5.92e6 / 200 = 29 600 Hz: 12 000 Hz is inside it.
                    .body("max_prf_without_wraparound_hz", near(29_600))
                    .body("warnings.code", hasItem("WRAPAROUND_DECAY_FACTOR_BARE_LIMIT"))
                    .body("warnings.code", not(hasItem("PRF_ABOVE_WRAPAROUND_LIMIT")));
        }

        @Test
        void fileAboveTheLimitIsAWarningWithTheLengthPerFile() {
            // 8192 MB over 500 mm against a 4000 MB limit; length per file = 4000 / 16 384 x 1000 = 244.140625 mm.
            post(PATH, FMC_64 + ", \"file_size_limit_megabytes\": 4000}")
                    .statusCode(200)
                    .body("warnings.code", hasItem("FILE_SIZE_ABOVE_LIMIT"))
                    .body("max_scan_length_per_file_mm", near(244.140625));
        }

        @Test
        void bitDepthThatIsNotWholeBytesStatesTheStorage() {
            // 12 bits stored in ceil(12/8) = 2 bytes.
            post(PATH, """
                    {"sampling_frequency_mhz": 100, "bit_depth": 12, "gate_length_us": 20, "scan_increment_mm": 1,
                     "pulse_repetition_frequency_hz": 10000}""")
                    .statusCode(200)
                    .body("bytes_per_sample", equalTo(2))
                    .body("warnings.code", hasItem("SAMPLE_STORAGE_ASSUMED"));
        }
    }

    @Nested
    class Rejected {
        private static final String VALID_TAIL = """
                "sampling_frequency_mhz": 100, "bit_depth": 8, "scan_increment_mm": 1,
                "pulse_repetition_frequency_hz": 10000""";

        @Test
        void bitDepthZeroOrAbove32() {
            assertInvalid(PATH, """
                    {"sampling_frequency_mhz": 100, "bit_depth": 0, "gate_length_us": 20, "scan_increment_mm": 1,
                     "pulse_repetition_frequency_hz": 10000}""", "/bit_depth");
            assertInvalid(PATH, """
                    {"sampling_frequency_mhz": 100, "bit_depth": 33, "gate_length_us": 20, "scan_increment_mm": 1,
                     "pulse_repetition_frequency_hz": 10000}""", "/bit_depth");
        }

        @Test
        void captureWithoutElementCountDoesNotApply() {
            assertInvalid(PATH, "{" + VALID_TAIL + ", \"gate_length_us\": 20, \"capture\": \"HMC\"}", "/capture")
                    .body("type", equalTo("/problems/inapplicable-input"));
        }

        @Test
        void focalLawsWithElementCountDoNotApply() {
            assertInvalid(PATH, "{" + VALID_TAIL + ", \"gate_length_us\": 20, \"fmc_element_count\": 16, "
                    + "\"focal_laws\": 8}", "/focal_laws")
                    .body("type", equalTo("/problems/inapplicable-input"));
        }

        @Test
        void gateInMicrosecondsAndMillimetresNamesBoth() {
            assertInvalid(PATH, "{" + VALID_TAIL + ", \"gate_length_us\": 20, \"gate_length_mm\": 50, "
                    + "\"velocity_m_per_s\": 5920}", "/gate_length_us")
                    .body("errors.pointer", hasItem("/gate_length_mm"));
            assertInvalid(PATH, "{" + VALID_TAIL + ", \"gate_length_us\": 20, \"gate_length_in\": 2, "
                    + "\"velocity_m_per_s\": 5920}", "/gate_length_in")
                    .body("errors.pointer", hasItem("/gate_length_us"));
        }

        @Test
        void gateInMillimetresAndInchesNamesBoth() {
            assertInvalid(PATH, "{" + VALID_TAIL + ", \"gate_length_mm\": 50, \"gate_length_in\": 2, "
                    + "\"velocity_m_per_s\": 5920}", "/gate_length_mm")
                    .body("errors.pointer", hasItem("/gate_length_in"));
        }

        @Test
        void missingGate() {
            assertInvalid(PATH, "{" + VALID_TAIL + "}", "/gate_length_us");
        }

        @Test
        void gateInMillimetresWithoutVelocity() {
            assertInvalid(PATH, "{" + VALID_TAIL + ", \"gate_length_mm\": 50}", "/velocity_m_per_s");
        }

        @Test
        void velocityWithoutALengthThatNeedsItDoesNotApply() {
            assertInvalid(PATH, "{" + VALID_TAIL + ", \"gate_length_us\": 20, \"material\": \"carbon-steel\"}",
                    "/material")
                    .body("type", equalTo("/problems/inapplicable-input"));
            assertInvalid(PATH, "{" + VALID_TAIL + ", \"gate_length_us\": 20, \"max_round_trip_us\": 50, "
                    + "\"velocity_m_per_s\": 5920}", "/velocity_m_per_s");
        }

        @Test
        void twoVelocitySources() {
            assertInvalid(PATH, "{" + VALID_TAIL + ", \"gate_length_mm\": 50, \"velocity_m_per_s\": 5920, "
                    + "\"material\": \"carbon-steel\"}", "/material")
                    .body("errors.pointer", hasItem("/velocity_m_per_s"));
        }

        @Test
        void unknownMaterial() {
            assertInvalid(PATH, "{" + VALID_TAIL + ", \"gate_length_mm\": 50, \"material\": \"unobtainium\"}",
                    "/material");
        }

        @Test
        void shearWaveInWaterIsImpossible() {
            post(PATH, "{" + VALID_TAIL + ", \"gate_length_mm\": 50, \"material\": \"water\", "
                    + "\"wave_mode\": \"SHEAR\"}")
                    .statusCode(422)
                    .body("type", equalTo("/problems/impossible-combination"))
                    .body("errors.pointer", hasItem("/wave_mode"));
        }

        @Test
        void missingIncrement() {
            assertInvalid(PATH, """
                    {"sampling_frequency_mhz": 100, "bit_depth": 8, "gate_length_us": 20,
                     "pulse_repetition_frequency_hz": 10000}""", "/scan_increment_mm");
        }

        @Test
        void incrementInMillimetresAndInches() {
            assertInvalid(PATH, "{" + VALID_TAIL + ", \"gate_length_us\": 20, \"scan_increment_in\": 0.04}",
                    "/scan_increment_mm")
                    .body("errors.pointer", hasItem("/scan_increment_in"));
        }

        @Test
        void incrementInInchesAbove100Metres() {
            // 4000 in = 101.6 m
            assertInvalid(PATH, """
                    {"sampling_frequency_mhz": 100, "bit_depth": 8, "gate_length_us": 20, "scan_increment_in": 4000,
                     "pulse_repetition_frequency_hz": 10000}""", "/scan_increment_in");
        }

        @Test
        void prfZeroOrAboveOneMegahertz() {
            assertInvalid(PATH, """
                    {"sampling_frequency_mhz": 100, "bit_depth": 8, "gate_length_us": 20, "scan_increment_mm": 1,
                     "pulse_repetition_frequency_hz": 0}""", "/pulse_repetition_frequency_hz");
            assertInvalid(PATH, """
                    {"sampling_frequency_mhz": 100, "bit_depth": 8, "gate_length_us": 20, "scan_increment_mm": 1,
                     "pulse_repetition_frequency_hz": 1000001}""", "/pulse_repetition_frequency_hz");
        }

        @Test
        void missingRequiredScalars() {
            assertInvalid(PATH, "{\"gate_length_us\": 20, \"scan_increment_mm\": 1}", "/sampling_frequency_mhz")
                    .body("errors.pointer", hasItems("/bit_depth", "/pulse_repetition_frequency_hz"));
        }

        @Test
        void decimationFractionalZeroOrAboveItsBound() {
            assertInvalid(PATH, "{" + VALID_TAIL + ", \"gate_length_us\": 20, \"decimation_factor\": 1.5}",
                    "/decimation_factor");
            assertInvalid(PATH, "{" + VALID_TAIL + ", \"gate_length_us\": 20, \"decimation_factor\": 0}",
                    "/decimation_factor");
            assertInvalid(PATH, "{" + VALID_TAIL + ", \"gate_length_us\": 20, \"decimation_factor\": 65537}",
                    "/decimation_factor");
        }

        @Test
        void elementCountAbove65536() {
            assertInvalid(PATH, "{" + VALID_TAIL + ", \"gate_length_us\": 20, \"fmc_element_count\": 65537}",
                    "/fmc_element_count");
        }

        @Test
        void unknownCapture() {
            assertInvalid(PATH, "{" + VALID_TAIL + ", \"gate_length_us\": 20, \"fmc_element_count\": 16, "
                    + "\"capture\": \"FULL\"}", "/capture");
        }

        @Test
        void decayFactorOutsideOneTo100() {
            assertInvalid(PATH, "{" + VALID_TAIL + ", \"gate_length_us\": 20, \"max_round_trip_us\": 50, "
                    + "\"wraparound_decay_factor\": 0.5}", "/wraparound_decay_factor");
            assertInvalid(PATH, "{" + VALID_TAIL + ", \"gate_length_us\": 20, \"max_round_trip_us\": 50, "
                    + "\"wraparound_decay_factor\": 101}", "/wraparound_decay_factor");
        }

        @Test
        void decayFactorWithoutARoundTripDoesNotApply() {
            assertInvalid(PATH, "{" + VALID_TAIL + ", \"gate_length_us\": 20, \"wraparound_decay_factor\": 2}",
                    "/wraparound_decay_factor")
                    .body("type", equalTo("/problems/inapplicable-input"));
        }

        @Test
        void roundTripAsTimeAndAsSoundPathNamesBoth() {
            assertInvalid(PATH, "{" + VALID_TAIL + ", \"gate_length_us\": 20, \"max_round_trip_us\": 50, "
                    + "\"max_sound_path_mm\": 100, \"velocity_m_per_s\": 5920}", "/max_round_trip_us")
                    .body("errors.pointer", hasItem("/max_sound_path_mm"));
        }

        @Test
        void quotedNumber() {
            assertInvalid(PATH, "{" + VALID_TAIL + ", \"gate_length_us\": \"20\"}", "/gate_length_us");
        }

        @Test
        void unknownProperty() {
            post(PATH, "{" + VALID_TAIL + ", \"gate_length_us\": 20, \"gate_us\": 20}").statusCode(400);
        }

        @Test
        void gateLongerThanThePulseRepetitionPeriodIsImpossible() {
            // 1 / 50 000 Hz = 20 us < 25 us gate.
            post(PATH, """
                    {"sampling_frequency_mhz": 100, "bit_depth": 8, "gate_length_us": 25, "scan_increment_mm": 1,
                     "pulse_repetition_frequency_hz": 50000}""")
                    .statusCode(422)
                    .contentType("application/problem+json")
                    .body("type", equalTo("/problems/impossible-combination"))
                    .body("detail", containsString("pulse repetition period"))
                    .body("errors.pointer", hasItems("/gate_length_us", "/pulse_repetition_frequency_hz"));
        }

        @Test
        void gateInInchesLongerThanThePeriodPointsAtTheInchInput() {
            // 2 in = 50.8 mm; t = 2 x 50.8 / 5.92 = 17.16 us > 1 / 60 000 Hz = 16.67 us.
            post(PATH, """
                    {"sampling_frequency_mhz": 100, "bit_depth": 8, "gate_length_in": 2, "velocity_m_per_s": 5920,
                     "scan_increment_mm": 1, "pulse_repetition_frequency_hz": 60000}""")
                    .statusCode(422)
                    .body("detail", containsString("gate_length_in"))
                    .body("detail", not(containsString("gate_length_mm")))
                    .body("errors.pointer", hasItems("/gate_length_in", "/pulse_repetition_frequency_hz"));
        }

        @Test
        void positionBeyondSixtyFourBitsIsImpossible() {
            // 100 000 us x 100 000 MHz = 10^10 samples x 4 bytes x 65 536^2 A-scans = 1.7e20 > 2^63 - 1.
            post(PATH, """
                    {"sampling_frequency_mhz": 100000, "bit_depth": 32, "gate_length_us": 100000,
                     "fmc_element_count": 65536, "scan_increment_mm": 1, "pulse_repetition_frequency_hz": 10}""")
                    .statusCode(422)
                    .body("errors.pointer", hasItems("/gate_length_us", "/sampling_frequency_mhz", "/fmc_element_count"));
        }
    }

    /** Every result field of {@code actual} agrees with {@code expected} (absent in both, or equal within tolerance). */
    private static void assertSameResults(JsonPath actual, JsonPath expected) {
        for (String field : RESULT_FIELDS) {
            Object e = expected.get(field);
            Object a = actual.get(field);
            if (e == null) {
                assertThat(a).as(field).isNull();
            } else {
                assertThat(a).as(field).isNotNull();
                double ev = ((Number) e).doubleValue();
                assertThat(((Number) a).doubleValue()).as(field)
                        .isCloseTo(ev, within(Math.abs(ev) * ALLOWED_RELATIVE_ERROR));
            }
        }
        assertThat(actual.getList("warnings.code")).isEqualTo(expected.getList("warnings.code"));
    }
}
