package utdigit.web.pipeline;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import io.restassured.path.json.JsonPath;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import utdigit.web.support.ApiTest;

/**
 * Every tolerance or requirement a caller gives is answered in {@code tolerance_checks}, in one shape
 * on every endpoint: {figure, value, comparison, limit, limit_field, within}.
 */
class ToleranceChecksApiTest extends ApiTest {

    private static Map<String, Object> check(JsonPath answer, String figure) {
        List<Map<String, Object>> checks = answer.getList("tolerance_checks");
        return checks.stream().filter(c -> figure.equals(c.get("figure"))).findFirst()
                .orElseThrow(() -> new AssertionError("no tolerance check of " + figure + " in " + checks));
    }

    private static void assertCheck(JsonPath answer, String figure, String resultField, String comparison,
                                    double limit, String limitField, boolean within) {
        Map<String, Object> c = check(answer, figure);
        if (resultField != null) {
            assertThat((Double) c.get("value")).isEqualTo(answer.getDouble(resultField));
        }
        assertThat(c.get("comparison")).isEqualTo(comparison);
        assertThat((Double) c.get("limit")).isCloseTo(limit, within(1e-12));
        assertThat(c.get("limit_field")).isEqualTo(limitField);
        assertThat(c.get("within")).isEqualTo(within);
    }

    @Test
    void aSamplingPulseLossAboveTheToleranceSaysSo() {
        // 5 MHz, 60 %, 25 MHz: 5 samples per period; sine bound -20 log10 cos(pi/5) = 1.8408 dB and the pulse
        // loss about 1.953 dB (sine bound + envelope loss, derivation in src/docs/methods.md 3.3), both above a 1 dB tolerance.
        JsonPath answer = post("/api/sampling-assessments", """
                {"sampling_frequency_mhz": 25, "frequency_mhz": 5, "bandwidth_percent": 60,
                 "amplitude_tolerance_db": 1}""").statusCode(200).extract().jsonPath();
        assertThat(answer.getDouble("sine_amplitude_loss_db"))
                .isCloseTo(-20 * Math.log10(Math.cos(Math.PI / 5)), within(1e-9));
        assertCheck(answer, "sine_amplitude_loss_db", "sine_amplitude_loss_db", "AT_MOST", 1, "amplitude_tolerance_db",
                false);
        assertCheck(answer, "pulse_amplitude_loss_db", "pulse_amplitude_loss_db", "AT_MOST", 1,
                "amplitude_tolerance_db", false);
        JsonPath loose = post("/api/sampling-assessments", """
                {"sampling_frequency_mhz": 25, "frequency_mhz": 5, "bandwidth_percent": 60,
                 "amplitude_tolerance_db": 2}""").statusCode(200).extract().jsonPath();
        assertCheck(loose, "pulse_amplitude_loss_db", "pulse_amplitude_loss_db", "AT_MOST", 2,
                "amplitude_tolerance_db", true);
    }

    @Test
    void aTfmGridLossAboveTheToleranceSaysSo() {
        // RF image, lambda = 5.92 mm/us / 5 MHz = 1.184 mm, dz = 0.2 mm: -20 log10 cos(2 pi 0.2/1.184) = 6.2 dB
        // (derived model, src/docs/methods.md 3.7), above a 2 dB tolerance.
        JsonPath answer = post("/api/sampling-assessments", """
                {"sampling_frequency_mhz": 100, "frequency_mhz": 5, "amplitude_tolerance_db": 2,
                 "tfm_grid_spacing_mm": 0.2, "velocity_m_per_s": 5920}""").statusCode(200).extract().jsonPath();
        assertThat(answer.getDouble("tfm_grid_amplitude_loss_db"))
                .isCloseTo(-20 * Math.log10(Math.cos(2 * Math.PI * 0.2 / 1.184)), within(1e-9));
        assertCheck(answer, "tfm_grid_amplitude_loss_db", "tfm_grid_amplitude_loss_db", "AT_MOST", 2,
                "amplitude_tolerance_db", false);
    }

    @Test
    void noToleranceNoChecks() {
        JsonPath answer = post("/api/sampling-assessments", """
                {"sampling_frequency_mhz": 25, "frequency_mhz": 5}""").statusCode(200).extract().jsonPath();
        assertThat(answer.getMap("$")).doesNotContainKey("tolerance_checks");
    }

    @Test
    void quantizationErrorsAgainstTheToleranceInBothDirections() {
        // 8-bit RF, LSB 200/256 = 0.78125 %FSH; at 10 %FSH the reading lies within +/- LSB/2:
        // over 20 log10(10.390625/10) = 0.333 dB <= 0.34, under 20 log10(9.609375/10) = -0.346 dB < -0.34.
        JsonPath answer = post("/api/quantization-assessments", """
                {"bit_depth": 8, "signal_height_percent_fsh": 10, "amplitude_tolerance_db": 0.34}""")
                .statusCode(200).extract().jsonPath();
        assertThat(answer.getDouble("amplitude_error_over_db")).isCloseTo(20 * Math.log10(10.390625 / 10), within(1e-9));
        assertCheck(answer, "amplitude_error_over_db", "amplitude_error_over_db", "AT_MOST", 0.34,
                "amplitude_tolerance_db", true);
        assertCheck(answer, "amplitude_error_under_db", "amplitude_error_under_db", "AT_LEAST", -0.34,
                "amplitude_tolerance_db", false);
    }

    @Test
    void aThicknessResolutionCoarserThanRequiredSaysSo() {
        // 5920 m/s / (2 x 100 MHz) = 0.0296 mm per sample, coarser than the 0.02 mm required.
        JsonPath answer = post("/api/thickness-resolutions", """
                {"sampling_frequency_mhz": 100, "velocity_m_per_s": 5920, "nominal_thickness_mm": 25,
                 "required_resolution_mm": 0.02}""").statusCode(200).extract().jsonPath();
        assertCheck(answer, "thickness_resolution_mm", "thickness_resolution_mm", "AT_MOST", 0.02,
                "required_resolution_mm", false);
    }

    @Test
    void aPlannedSpeedInInchesPerSecondIsCheckedLikeItsMillimetreForm() {
        // 6 in/s = 152.4 mm/s (1 in = 25.4 mm exactly) > 5000 Hz x 1 mm / 61 = 82.0 mm/s
        JsonPath answer = post("/api/acquisition-budgets", """
                {"sampling_frequency_mhz": 100, "bit_depth": 12, "gate_length_us": 10, "focal_laws": 61,
                 "scan_increment_mm": 1, "pulse_repetition_frequency_hz": 5000, "planned_scan_speed_in_per_s": 6}""")
                .statusCode(200).extract().jsonPath();
        assertThat(answer.getDouble("inputs.planned_scan_speed_mm_per_s")).isCloseTo(152.4, within(1e-12));
        Map<String, Object> c = check(answer, "planned_scan_speed_mm_per_s");
        assertThat((Double) c.get("value")).isCloseTo(152.4, within(1e-12));
        assertThat(c.get("within")).isEqualTo(false);
    }

    @Test
    void anAcquisitionPlanAgainstItsOwnLimits() {
        // 5000 Hz / 61 focal laws x 1 mm = 82.0 mm/s < 150 planned; 2 x 450 mm / 5.92 mm/us x 2 = 304 us:
        // 3289 Hz < 5000; 12 bits in 2 bytes x 1000 samples (10 us at 100 MHz) x 61 = 122 000 bytes per
        // position, 122 MB per metre x 2 m = 244 MB > 200 MB limit (common practice, no published source).
        JsonPath answer = post("/api/acquisition-budgets", """
                {"sampling_frequency_mhz": 100, "bit_depth": 12, "gate_length_us": 10, "focal_laws": 61,
                 "scan_increment_mm": 1, "pulse_repetition_frequency_hz": 5000, "planned_scan_speed_mm_per_s": 150,
                 "scan_length_mm": 2000, "file_size_limit_megabytes": 200, "max_sound_path_mm": 450,
                 "velocity_m_per_s": 5920, "wraparound_decay_factor": 2}""").statusCode(200).extract().jsonPath();
        assertCheck(answer, "planned_scan_speed_mm_per_s", null, "AT_MOST", 5000.0 / 61, "max_scan_speed_mm_per_s",
                false);
        assertCheck(answer, "pulse_repetition_frequency_hz", null, "AT_MOST", 1e6 / (2 * 2 * 450 / 5.92),
                "max_prf_without_wraparound_hz", false);
        assertCheck(answer, "file_size_megabytes", "file_size_megabytes", "AT_MOST", 200, "file_size_limit_megabytes",
                false);
        assertThat(answer.getDouble("file_size_megabytes")).isCloseTo(244, within(1e-9));
    }

    @Test
    void scanCoverageStepsAreCheckedInTheSameShape() {
        // Gaussian main lobe of -6 dB width w: a reflector midway between positions dx apart reads
        // 6 (dx/w)^2 dB low (src/docs/methods.md 14, derived): w = 4 mm, dx = 1 mm -> 0.375 dB, within 1 dB;
        // an index step of 4 mm -> 6 dB, outside it.
        JsonPath answer = post("/api/scan-coverages", """
                {"beam_width_6db_mm": 4, "scan_increment_mm": 1, "index_step_mm": 4,
                 "amplitude_tolerance_db": 1}""").statusCode(200).extract().jsonPath();
        assertThat(answer.getDouble("scan_increment_loss_db")).isCloseTo(6.0 * Math.pow(1.0 / 4.0, 2), within(1e-12));
        assertCheck(answer, "scan_increment_loss_db", "scan_increment_loss_db", "AT_MOST", 1,
                "amplitude_tolerance_db", true);
        assertCheck(answer, "index_step_loss_db", "index_step_loss_db", "AT_MOST", 1, "amplitude_tolerance_db", false);
    }

    @Test
    void dacPointsAreCheckedAgainstTheNegativeTolerance() {
        // 8-bit RF, MAX_CODE: LSB = 100/127 %FSH; a 24 dB DAC from 80 %FSH puts its lowest point at
        // 80 x 10^(-24/20) = 5.05 %FSH, read up to LSB/2 low when rounding: 20 log10(1 - 0.3937/5.05) = -0.70 dB,
        // within 1 dB; TCG before the converter keeps the reference height's error.
        JsonPath answer = post("/api/dac-quantizations", """
                {"bit_depth": 8, "dac_span_db": 24, "reference_height_percent_fsh": 80,
                 "amplitude_tolerance_db": 1}""").statusCode(200).extract().jsonPath();
        assertCheck(answer, "uncorrected_error_under_db", "uncorrected_error_under_db", "AT_LEAST", -1,
                "amplitude_tolerance_db", answer.getDouble("uncorrected_error_under_db") >= -1);
        assertCheck(answer, "analog_tcg_error_under_db", "analog_tcg_error_under_db", "AT_LEAST", -1,
                "amplitude_tolerance_db", true);
        assertThat(answer.getBoolean("uncorrected_within_tolerance"))
                .isEqualTo(answer.getDouble("uncorrected_error_under_db") >= -1);
    }
}
