package utdigit.web.arrays;

import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItem;
import static org.hamcrest.Matchers.hasKey;
import static org.hamcrest.Matchers.not;

import org.junit.jupiter.api.Test;
import utdigit.web.support.ApiTest;

class ArrayApertureApiTest extends ApiTest {
    private static final String PATH = "/api/array-apertures";

    @Test
    void aSixteenElementApertureSteeredToFortyFiveDegrees() {
        // 5 MHz in carbon steel 5920 m/s: lambda = 1.184 mm; 16 x 0.6 mm = 9.6 mm; near field 9.6^2 / (4 x 1.184);
        // first null asin(lambda / L) (sinc zero at pi); largest grating-lobe-free pitch lambda / (1 + sin 45)
        // (array theory of uniform linear arrays).
        post(PATH, """
                {"frequency_mhz": 5, "material": "carbon-steel", "element_pitch_mm": 0.6, "active_elements": 16,
                 "max_steering_angle_deg": 45}""")
                .statusCode(200)
                .body("wavelength_mm", closeTo(1.184, 1e-12))
                .body("active_aperture_mm", closeTo(9.6, 1e-12))
                .body("near_field_length_mm", closeTo(9.6 * 9.6 / (4 * 1.184), 1e-9))
                .body("beam_spread_null_deg", closeTo(Math.toDegrees(Math.asin(1.184 / 9.6)), 1e-9))
                .body("max_grating_lobe_free_pitch_mm", closeTo(1.184 / (1 + Math.sin(Math.toRadians(45))), 1e-12))
                .body("grating_lobe_free", equalTo(true))
                .body("pitch_to_wavelength_ratio", closeTo(0.6 / 1.184, 1e-12))
                .body("$", not(hasKey("passive_near_field_length_mm")))
                .body("inputs.max_steering_angle_deg", closeTo(45.0, 0.0))
                .body("warnings.code", hasItem("STEERED_BEAM_WIDER"))
                .body("stamp.calculation", equalTo("array-apertures"));
    }

    @Test
    void aCoarsePitchSendsAGratingLobe() {
        // 1 mm pitch at 5 MHz in steel: lambda / p = 1.184; steered to 30 deg a lobe at asin(0.5 - 1.184) = -43.2 deg.
        post(PATH, """
                {"frequency_mhz": 5, "velocity_m_per_s": 5920, "element_pitch_in": 0.03937007874015748,
                 "max_steering_angle_deg": 30}""")
                .statusCode(200)
                .body("grating_lobe_free", equalTo(false))
                .body("inputs.element_pitch_mm", closeTo(1.0, 1e-12))
                .body("warnings.code", hasItem("GRATING_LOBE"));
    }

    @Test
    void badInputsPointAtTheirFields() {
        assertInvalid(PATH, "{\"frequency_mhz\": 5, \"velocity_m_per_s\": 5920}", "/element_pitch_mm");
        assertInvalid(PATH, """
                {"frequency_mhz": 5, "velocity_m_per_s": 5920, "element_pitch_mm": 0.6, "active_elements": 16,
                 "active_aperture_mm": 9.6}""", "/active_aperture_mm");
        assertInvalid(PATH, "{\"frequency_mhz\": 5, \"velocity_m_per_s\": 5920, \"element_pitch_mm\": 0.6, "
                + "\"max_steering_angle_deg\": 90}", "/max_steering_angle_deg");
        post(PATH, "{\"frequency_mhz\": 5, \"velocity_m_per_s\": 5920, \"element_pitch_mm\": 0.6, "
                + "\"active_aperture_mm\": 0.5}").statusCode(422)
                .body("errors.pointer", hasItem("/active_aperture_mm"));
    }
}
