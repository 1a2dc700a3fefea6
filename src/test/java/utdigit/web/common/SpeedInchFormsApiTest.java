package utdigit.web.common;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.hasItems;

import io.restassured.path.json.JsonPath;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import utdigit.web.support.ApiTest;

/**
 * The inch forms of the speed inputs that had only their m/s form: a wedge's velocity, a steering
 * medium's velocity and a velocity's uncertainty, in in/us. 1 in/us = 25.4 mm/us = 25 400 m/s exactly
 * (the inch is 25.4 mm exactly, NIST SP 811 B.8); an answer to the inch form equals the answer to the
 * m/s form, the normalised inputs carry the m/s value, and both forms at once are a 400 at both
 * pointers.
 */
class SpeedInchFormsApiTest extends ApiTest {
    private static final double M_PER_S_PER_IN_PER_US = 25.4 * 1000.0; // 25.4 mm/us in m/s (NIST SP 811)

    private static String inPerUs(double mPerS) {
        return String.format(Locale.ROOT, "%.17g", mPerS / M_PER_S_PER_IN_PER_US);
    }

    @Test
    void theWedgeVelocityInInchesPerMicrosecondGivesTheSameAngleBeam() {
        String body = """
                {"frequency_mhz": 5, "material": "carbon-steel", "wave_mode": "SHEAR", "element_diameter_mm": 10,
                 "incident_angle_deg": 36, %s}""";
        JsonPath metric = post("/api/pulse-parameters", String.format(body, "\"wedge_velocity_m_per_s\": 2730"))
                .statusCode(200).extract().jsonPath();
        JsonPath inch = post("/api/pulse-parameters",
                String.format(body, "\"wedge_velocity_in_per_us\": " + inPerUs(2730.0)))
                .statusCode(200)
                .body("inputs.wedge_velocity_m_per_s", closeTo(2730.0, 1e-9))
                .extract().jsonPath();
        for (String field : new String[] {"refracted_angle_deg", "incidence_plane_aperture_mm",
                "incidence_plane_near_field_length_mm", "incidence_plane_beam_spread_6db_deg"}) {
            assertThat(inch.getDouble(field)).as(field).isCloseTo(metric.getDouble(field),
                    within(1e-12 * Math.abs(metric.getDouble(field))));
        }
        assertInvalid("/api/pulse-parameters", String.format(body,
                "\"wedge_velocity_m_per_s\": 2730, \"wedge_velocity_in_per_us\": 0.1075"), "/wedge_velocity_m_per_s")
                .body("errors.pointer", hasItems("/wedge_velocity_m_per_s", "/wedge_velocity_in_per_us"));
        // 0.001 in/us = 25.4 m/s, below the 100 m/s floor of the m/s form.
        assertInvalid("/api/pulse-parameters", String.format(body, "\"wedge_velocity_in_per_us\": 0.001"),
                "/wedge_velocity_in_per_us");
    }

    @Test
    void theVelocityUncertaintyInInchesPerMicrosecondGivesTheSameThicknessUncertainty() {
        String body = """
                {"sampling_frequency_mhz": 100, "velocity_m_per_s": 5920, "nominal_thickness_mm": 25, %s}""";
        JsonPath metric = post("/api/thickness-resolutions",
                String.format(body, "\"velocity_uncertainty_m_per_s\": 50")).statusCode(200).extract().jsonPath();
        post("/api/thickness-resolutions", String.format(body, "\"velocity_uncertainty_in_per_us\": " + inPerUs(50.0)))
                .statusCode(200)
                .body("standard_uncertainty_mm", closeTo(metric.getDouble("standard_uncertainty_mm"),
                        1e-12 * metric.getDouble("standard_uncertainty_mm")))
                .body("inputs.velocity_uncertainty_m_per_s", closeTo(50.0, 1e-9));
        assertInvalid("/api/thickness-resolutions", String.format(body,
                "\"velocity_uncertainty_m_per_s\": 50, \"velocity_uncertainty_in_per_us\": 0.002"),
                "/velocity_uncertainty_m_per_s")
                .body("errors.pointer", hasItems("/velocity_uncertainty_m_per_s", "/velocity_uncertainty_in_per_us"));
        assertInvalid("/api/thickness-resolutions", String.format(body,
                "\"velocity_uncertainty_in_per_us\": 0.002, \"velocity_uncertainty_percent\": 1"),
                "/velocity_uncertainty_in_per_us")
                .body("errors.pointer", hasItems("/velocity_uncertainty_percent"));
        // 20 % of 5920 m/s is 1184 m/s = 0.04661 in/us: the message quotes the caller's unit.
        assertInvalid("/api/thickness-resolutions", String.format(body, "\"velocity_uncertainty_in_per_us\": 0.05"),
                "/velocity_uncertainty_in_per_us")
                .body("errors.find { it.pointer == '/velocity_uncertainty_in_per_us' }.detail",
                        org.hamcrest.Matchers.containsString("0.04661 in/us"));
    }

    @Test
    void aSheetTakesItsUncertaintySteeringAndWedgeVelocitiesInInchesPerMicrosecond() {
        String sheet = """
                {"technique": "PHASED_ARRAY", "probe": {"frequency_mhz": 5, "element_diameter_mm": 10},
                 "material": {"velocity_m_per_s": 3255, "thickness_mm": 25, %s},
                 "digitization": {"sampling_frequency_mhz": 100},
                 "setup": {"element_pitch_mm": 0.6, "max_steering_angle_deg": 10, "incident_angle_deg": 36, %s}}""";
        JsonPath metric = post("/api/technique-sheet-validations", String.format(sheet,
                "\"velocity_uncertainty_m_per_s\": 15",
                "\"steering_velocity_m_per_s\": 2330, \"wedge_velocity_m_per_s\": 2730"))
                .statusCode(200).extract().jsonPath();
        JsonPath inch = post("/api/technique-sheet-validations", String.format(sheet,
                "\"velocity_uncertainty_in_per_us\": " + inPerUs(15.0),
                "\"steering_velocity_in_per_us\": " + inPerUs(2330.0) + ", \"wedge_velocity_in_per_us\": "
                        + inPerUs(2730.0)))
                .statusCode(200)
                .body("inputs.material.velocity_uncertainty_m_per_s", closeTo(15.0, 1e-9))
                .body("inputs.setup.steering_velocity_m_per_s", closeTo(2330.0, 1e-9))
                .body("inputs.setup.wedge_velocity_m_per_s", closeTo(2730.0, 1e-9))
                .extract().jsonPath();
        for (String metricName : new String[] {"standard_uncertainty_mm", "max_grating_lobe_free_pitch_mm",
                "incidence_plane_near_field_length_mm", "incidence_plane_beam_spread_6db_deg"}) {
            double expected = metric.getDouble("values." + metricName);
            assertThat(inch.getDouble("values." + metricName)).as(metricName)
                    .isCloseTo(expected, within(1e-12 * Math.abs(expected)));
        }
        assertInvalid("/api/technique-sheet-validations", String.format(sheet,
                "\"velocity_uncertainty_m_per_s\": 15, \"velocity_uncertainty_in_per_us\": 0.0006",
                "\"wedge_velocity_m_per_s\": 2730, \"wedge_velocity_in_per_us\": 0.1075"),
                "/material/velocity_uncertainty_m_per_s")
                .body("errors.pointer", hasItems("/material/velocity_uncertainty_in_per_us",
                        "/setup/wedge_velocity_m_per_s", "/setup/wedge_velocity_in_per_us"));
        assertInvalid("/api/technique-sheet-validations", String.format(sheet,
                "\"velocity_uncertainty_percent\": 1", "\"steering_velocity_in_per_us\": 1"),
                "/setup/steering_velocity_in_per_us");
    }
}
