package utdigit.web.sheets;

import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItem;

import org.junit.jupiter.api.Test;
import utdigit.web.support.ApiTest;

/** The set-up section of a technique sheet reaches the metrics and the common-practice TOFD gate rules. */
class SheetSetupApiTest extends ApiTest {
    private static final String PATH = "/api/technique-sheet-validations";

    @Test
    void aTofdSheetWhoseGateOpensAfterTheLateralWaveFails() {
        // 2S = 60 mm, T = 40 mm, 6000 m/s: lateral wave 10 us, back wall 100/6 us (Charlesworth & Temple 2.3.4);
        // a gate opening at 10.5 us misses the lateral wave by 0.5 us.
        post(PATH, """
                {"sheet_id": "T-GATE", "technique": "TOFD",
                 "probe": {"frequency_mhz": 10, "bandwidth_percent": 70},
                 "material": {"velocity_m_per_s": 6000, "thickness_mm": 40},
                 "digitization": {"sampling_frequency_mhz": 100, "bit_depth": 8},
                 "tofd": {"probe_centre_separation_mm": 60, "depth_of_interest_mm": 20},
                 "setup": {"gate_start_us": 10.5, "gate_end_us": 17.5}}""")
                .statusCode(200)
                .body("values.backwall_time_us", closeTo(100.0 / 6, 1e-12))
                .body("values.gate_start_margin_us", closeTo(-0.5, 1e-12))
                .body("findings.find { it.rule_id == 'tofd-gate-opens-before-lateral-wave' }.verdict", equalTo("FAIL"))
                .body("findings.find { it.rule_id == 'tofd-gate-closes-after-back-wall' }.verdict", equalTo("PASS"))
                .body("verdict", equalTo("FAIL"));
    }

    @Test
    void setupLengthsInInchesAndTheirProblems() {
        // 0.6 mm pitch given as inches (25.4 mm/in exactly); 5 MHz in a 2330 m/s wedge: lambda 0.466 mm,
        // largest pitch 0.466 / (1 + sin 10 deg) (array theory).
        post(PATH, """
                {"sheet_id": "P-1", "technique": "PHASED_ARRAY", "probe": {"frequency_mhz": 5},
                 "material": {"material": "carbon-steel", "wave_mode": "SHEAR"},
                 "setup": {"element_pitch_in": 0.023622047244094488, "max_steering_angle_deg": 10,
                           "steering_velocity_m_per_s": 2330}}""")
                .statusCode(200)
                .body("values.element_pitch_mm", closeTo(0.6, 1e-12))
                .body("values.max_grating_lobe_free_pitch_mm",
                        closeTo(0.466 / (1 + Math.sin(Math.toRadians(10))), 1e-12))
                .body("inputs.setup.element_pitch_mm", closeTo(0.6, 1e-12));
        assertInvalid(PATH, """
                {"technique": "TOFD", "setup": {"gate_start_us": 10}}""", "/setup/gate_end_us");
        assertInvalid(PATH, """
                {"technique": "PHASED_ARRAY", "setup": {"element_pitch_mm": 0.6, "element_pitch_in": 0.02}}""",
                "/setup/element_pitch_mm");
        post(PATH, """
                {"technique": "PHASED_ARRAY", "setup": {"dac_span_db": 70}}""").statusCode(400)
                .body("errors.pointer", hasItem("/setup/dac_span_db"));
    }
    @Test
    void anAngleBeamSheetGetsItsIncidencePlaneFigures() {
        // 45 deg shear in steel (3255 m/s) from a 2730 m/s wedge: alpha = asin(sin 45 x 2730/3255) by Snell;
        // the part sees D cos(beta)/cos(alpha) in the incidence plane (the element's edge rays refracted, see
        // AngleBeamTest), and its near field is D_eff^2 / (4 lambda), lambda = 3.255/5 mm.
        double alpha = Math.toDegrees(Math.asin(Math.sin(Math.toRadians(45.0)) * 2730.0 / 3255.0));
        double aperture = 10.0 * Math.cos(Math.toRadians(45.0)) / Math.cos(Math.toRadians(alpha));
        double lambda = 3.255 / 5.0;
        post(PATH, String.format(java.util.Locale.ROOT, """
                {"sheet_id": "AB-45", "technique": "PULSE_ECHO",
                 "probe": {"frequency_mhz": 5, "element_diameter_in": %s},
                 "material": {"velocity_m_per_s": 3255, "thickness_mm": 25},
                 "setup": {"incident_angle_deg": %s, "wedge_velocity_m_per_s": 2730}}""",
                10.0 / 25.4, alpha))
                .statusCode(200)
                .body("values.incidence_plane_aperture_mm", closeTo(aperture, 1e-9))
                .body("values.incidence_plane_near_field_length_mm", closeTo(aperture * aperture / (4 * lambda), 1e-9))
                .body("values.near_field_length_mm", closeTo(100.0 / (4 * lambda), 1e-9))
                .body("values.incident_angle_deg", closeTo(alpha, 1e-12))
                .body("inputs.setup.wedge_velocity_m_per_s", closeTo(2730.0, 0.0))
                // the incidence-plane derivation is cited, under the sheet calculation that used it
                .body("references.find { it.id == 'incidence-plane-aperture' }.topic", containsString("pulse"));
        assertInvalid(PATH, """
                {"technique": "PULSE_ECHO", "setup": {"incident_angle_deg": 90}}""", "/setup/incident_angle_deg");
        assertInvalid(PATH, """
                {"technique": "PULSE_ECHO", "setup": {"wedge_velocity_m_per_s": 50}}""", "/setup/wedge_velocity_m_per_s");
    }
}
