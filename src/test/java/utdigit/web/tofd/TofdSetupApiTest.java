package utdigit.web.tofd;

import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItem;
import static org.hamcrest.Matchers.hasKey;
import static org.hamcrest.Matchers.not;

import org.junit.jupiter.api.Test;
import utdigit.web.support.ApiTest;

class TofdSetupApiTest extends ApiTest {
    private static final String PATH = "/api/tofd-setups";

    @Test
    void aThreeFourFiveSetUpWithItsGateAndDepthUncertainty() {
        // Charlesworth & Temple 2.3.4 geometry, our own numbers: 2S = 60 mm, T = 40 mm, v = 6 mm/us:
        // lateral wave 60 / 6 = 10 us, back wall 2 x 50 / 6 us. At d = 40 (t = 100/6 us) with fs 100 MHz from the
        // trigger: u_t = 10 ns / sqrt(12); dd/dt = v^2 t / (4 d) = 36 x (100/6) / 160 = 3.75 mm/us.
        // u(2S) = 0.4 mm: u_S = 0.2, dd/dS = S / d = 0.75 -> 0.15 mm (derivation, GUM eq. 10).
        double uTiming = 3.75 * 0.01 / Math.sqrt(12);
        post(PATH, """
                {"velocity_m_per_s": 6000, "probe_centre_separation_mm": 60, "thickness_mm": 40,
                 "gate_start_us": 9, "gate_end_us": 17.5, "pulse_duration_us": 0.5, "depth_mm": 40,
                 "sampling_frequency_mhz": 100, "probe_centre_separation_uncertainty_mm": 0.4}""")
                .statusCode(200)
                .body("lateral_wave_time_us", closeTo(10.0, 1e-12))
                .body("backwall_time_us", closeTo(100.0 / 6, 1e-12))
                .body("required_gate_start_us", closeTo(9.5, 1e-12))
                .body("gate_spans_wall", equalTo(true))
                .body("time_of_flight_us", closeTo(100.0 / 6, 1e-12))
                .body("timing_depth_uncertainty_mm", closeTo(uTiming, 1e-12))
                .body("separation_depth_uncertainty_mm", closeTo(0.15, 1e-12))
                .body("combined_depth_uncertainty_mm", closeTo(Math.hypot(uTiming, 0.15), 1e-12))
                .body("expanded_depth_uncertainty_mm", closeTo(2 * Math.hypot(uTiming, 0.15), 1e-12))
                .body("inputs.time_reference", equalTo("TRIGGER"))
                .body("inputs.coverage_factor", closeTo(2.0, 0.0))
                .body("$", not(hasKey("depth_from_time_mm")))
                .body("stamp.calculation", equalTo("tofd-setups"));
    }

    @Test
    void depthFromAMeasuredTimeInInches() {
        // 2S = 60 mm = 2.3622 in, T = 40 mm; a tip at 2 sqrt(30^2 + 20^2) / 6 us lies 20 mm deep.
        post(PATH, "{\"velocity_m_per_s\": 6000, \"probe_centre_separation_in\": " + (60 / 25.4)
                + ", \"thickness_in\": " + (40 / 25.4) + ", \"measured_time_us\": " + (2 * Math.sqrt(1300) / 6) + "}")
                .statusCode(200)
                .body("depth_from_time_mm", closeTo(20.0, 1e-9))
                .body("$", not(hasKey("combined_depth_uncertainty_mm")));
    }

    @Test
    void badAndImpossibleInputs() {
        assertInvalid(PATH, "{\"velocity_m_per_s\": 6000, \"thickness_mm\": 40}", "/probe_centre_separation_mm");
        assertInvalid(PATH, "{\"velocity_m_per_s\": 6000, \"probe_centre_separation_mm\": 60, \"thickness_mm\": 40, "
                + "\"gate_start_us\": 9}", "/gate_end_us");
        assertInvalid(PATH, "{\"velocity_m_per_s\": 6000, \"probe_centre_separation_mm\": 60, \"thickness_mm\": 40, "
                + "\"time_reference\": \"LATERAL_WAVE\"}", "/time_reference");
        post(PATH, "{\"velocity_m_per_s\": 6000, \"probe_centre_separation_mm\": 60, \"thickness_mm\": 40, "
                + "\"depth_mm\": 41}").statusCode(422).body("errors.pointer", hasItem("/depth_mm"))
                // the problem quotes each length with its inch value: 41 / 25.4 = 1.614 in, 40 / 25.4 = 1.575 in
                // (25.4 mm per inch exactly, NIST SP 811)
                .body("detail", containsString("41 mm (1.614 in)")).body("detail", containsString("40 mm (1.575 in)"));
        post(PATH, "{\"velocity_m_per_s\": 6000, \"probe_centre_separation_mm\": 60, \"thickness_mm\": 40, "
                + "\"measured_time_us\": 9}").statusCode(422).body("errors.pointer", hasItem("/measured_time_us"));
    }
}
