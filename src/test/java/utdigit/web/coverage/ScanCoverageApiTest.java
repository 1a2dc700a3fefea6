package utdigit.web.coverage;

import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItem;
import static org.hamcrest.Matchers.hasKey;
import static org.hamcrest.Matchers.not;
import static org.hamcrest.Matchers.nullValue;

import org.junit.jupiter.api.Test;
import utdigit.web.support.ApiTest;

class ScanCoverageApiTest extends ApiTest {
    private static final String PATH = "/api/scan-coverages";

    @Test
    void lossesAndLargestStepsForAGivenBeamWidth() {
        // Gaussian main lobe with the -6 dB width w = 8 mm (derived model): 6 (dx / w)^2 dB midway between
        // positions; 1 mm -> 6/64 dB, 4 mm -> 1.5 dB; 1 deg at 60 mm moves the beam 60 pi / 180 mm.
        // The largest step for 1 dB: 8 sqrt(1/6) mm (the model's inverse).
        post(PATH, """
                {"beam_width_6db_mm": 8, "scan_increment_mm": 1, "index_step_mm": 4, "angular_step_deg": 1,
                 "sound_path_mm": 60, "amplitude_tolerance_db": 1}""")
                .statusCode(200)
                .body("beam_width_6db_mm", closeTo(8.0, 0.0))
                .body("scan_increment_loss_db", closeTo(6.0 / 64, 1e-12))
                .body("index_step_loss_db", closeTo(1.5, 1e-12))
                .body("angular_step_loss_db", closeTo(6 * Math.pow(60 * Math.PI / 180 / 8, 2), 1e-12))
                .body("max_step_mm", closeTo(8 * Math.sqrt(1.0 / 6), 1e-12))
                .body("max_angular_step_deg", closeTo(Math.toDegrees(8 * Math.sqrt(1.0 / 6) / 60), 1e-12))
                .body("scan_increment_within_tolerance", equalTo(true))
                .body("index_step_within_tolerance", equalTo(false))
                .body("warnings.code", hasItem("STEP_OVER_TOLERANCE"))
                .body("$", not(hasKey("velocity_source")))
                .body("stamp.calculation", equalTo("scan-coverages"));
    }

    @Test
    void inchesGiveTheSameAnswerAsMillimetres() {
        // 25.4 mm per inch exactly: 0.5 in = 12.7 mm of beam, 0.1 in = 2.54 mm increment.
        post(PATH, "{\"beam_width_6db_in\": 0.5, \"scan_increment_in\": 0.1}")
                .statusCode(200)
                .body("scan_increment_loss_db", closeTo(6 * Math.pow(2.54 / 12.7, 2), 1e-12))
                .body("inputs.beam_width_6db_mm", closeTo(12.7, 1e-12))
                .body("inputs.scan_increment_mm", closeTo(2.54, 1e-12));
    }

    @Test
    void aRoundProbeInsideItsNearFieldHasNoBeamWidth() {
        // 5 MHz, 10 mm, carbon steel 5920 m/s: near field 100 / (4 x 1.184) = 21.1 mm; 15 mm is inside it.
        post(PATH, """
                {"frequency_mhz": 5, "material": "carbon-steel", "element_diameter_mm": 10, "sound_path_mm": 15,
                 "scan_increment_mm": 1}""")
                .statusCode(200)
                .body("beam_width_6db_mm", nullValue())
                .body("scan_increment_loss_db", nullValue())
                .body("warnings.code", hasItem("BEAM_WIDTH_UNKNOWN"))
                .body("velocity_source.material", equalTo("carbon-steel"));
    }

    @Test
    void badInputsPointAtTheirFields() {
        assertInvalid(PATH, "{\"beam_width_6db_mm\": 8, \"beam_width_6db_in\": 0.3}", "/beam_width_6db_mm");
        assertInvalid(PATH, "{\"beam_width_6db_mm\": 8, \"frequency_mhz\": 5}", "/beam_width_6db_mm");
        assertInvalid(PATH, "{\"scan_increment_mm\": 1}", "/beam_width_6db_mm");
        assertInvalid(PATH, "{\"beam_width_6db_mm\": 8, \"angular_step_deg\": 1}", "/angular_step_deg");
        assertInvalid(PATH, "{\"beam_width_6db_mm\": 8, \"amplitude_tolerance_db\": 0}", "/amplitude_tolerance_db");
        assertInvalid(PATH, "{\"frequency_mhz\": 5, \"velocity_m_per_s\": 5920, \"sound_path_mm\": 50}",
                "/element_diameter_mm");
    }
}
