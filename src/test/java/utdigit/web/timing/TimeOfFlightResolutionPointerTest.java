package utdigit.web.timing;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import utdigit.core.timing.Technique;

/** The core names mm/in quantities by their base name; the pointer is the form the caller sent. */
class TimeOfFlightResolutionPointerTest {
    private final TimeOfFlightResolutionCalculation calculation = new TimeOfFlightResolutionCalculation();

    private static TimeOfFlightResolutionRequest request(Double velocityMPerS, Double velocityInPerUs, String material,
            Double separationMm, Double separationIn, Double depthMm, Double depthIn, Double thicknessMm,
            Double thicknessIn) {
        return new TimeOfFlightResolutionRequest(100.0, null, velocityMPerS, velocityInPerUs, material, null, null,
                Technique.TOFD, null, separationMm, separationIn, depthMm, depthIn, thicknessMm, thicknessIn, null,
                null, null, null);
    }

    @Test
    void lengthsPointAtTheInchFormWhenItWasSent() {
        TimeOfFlightResolutionRequest q = request(5920.0, null, null, null, 2.4, null, 0.5, null, 1.0);
        assertThat(calculation.pointer("probe_centre_separation", q)).isEqualTo("/probe_centre_separation_in");
        assertThat(calculation.pointer("depth", q)).isEqualTo("/depth_in");
        assertThat(calculation.pointer("thickness", q)).isEqualTo("/thickness_in");
    }

    @Test
    void lengthsPointAtTheMillimetreFormOtherwise() {
        TimeOfFlightResolutionRequest q = request(5920.0, null, null, 60.0, null, 12.0, null, null, null);
        assertThat(calculation.pointer("probe_centre_separation", q)).isEqualTo("/probe_centre_separation_mm");
        assertThat(calculation.pointer("depth", q)).isEqualTo("/depth_mm");
        assertThat(calculation.pointer("thickness", q)).isEqualTo("/thickness_mm");
    }

    @Test
    void velocityPointsAtTheFormSent() {
        assertThat(calculation.pointer("velocity", request(5920.0, null, null, 60.0, null, null, null, null, null)))
                .isEqualTo("/velocity_m_per_s");
        assertThat(calculation.pointer("velocity", request(null, 0.233, null, 60.0, null, null, null, null, null)))
                .isEqualTo("/velocity_in_per_us");
        assertThat(calculation.pointer("velocity",
                request(null, null, "carbon-steel", 60.0, null, null, null, null, null))).isEqualTo("/material");
    }

    @Test
    void otherFieldsKeepTheirName() {
        TimeOfFlightResolutionRequest q = request(5920.0, null, null, 60.0, null, null, null, null, null);
        assertThat(calculation.pointer("pulse_duration_us", q)).isEqualTo("/pulse_duration_us");
        assertThat(calculation.pointer("time_reference", q)).isEqualTo("/time_reference");
    }
}
