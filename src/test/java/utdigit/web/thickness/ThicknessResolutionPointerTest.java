package utdigit.web.thickness;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

/** The core names mm/in quantities by their base name; the pointer is the form the caller sent. */
class ThicknessResolutionPointerTest {
    private final ThicknessResolutionCalculation calculation = new ThicknessResolutionCalculation();

    private static ThicknessResolutionRequest request(Double velocityMPerS, Double velocityInPerUs, String material,
            Double thicknessMm, Double thicknessIn, Double requiredMm, Double requiredIn) {
        return new ThicknessResolutionRequest(100.0, null, velocityMPerS, velocityInPerUs, material, null, null, null,
                null, thicknessMm, thicknessIn, null, null, requiredMm, requiredIn, null, null, null, null);
    }

    @Test
    void lengthsPointAtTheInchFormWhenItWasSent() {
        ThicknessResolutionRequest q = request(5920.0, null, null, null, 0.5, null, 0.002);
        assertThat(calculation.pointer("nominal_thickness", q)).isEqualTo("/nominal_thickness_in");
        assertThat(calculation.pointer("required_resolution", q)).isEqualTo("/required_resolution_in");
    }

    @Test
    void lengthsPointAtTheMillimetreFormOtherwise() {
        ThicknessResolutionRequest q = request(5920.0, null, null, 12.5, null, 0.05, null);
        assertThat(calculation.pointer("nominal_thickness", q)).isEqualTo("/nominal_thickness_mm");
        assertThat(calculation.pointer("required_resolution", q)).isEqualTo("/required_resolution_mm");
    }

    @Test
    void velocityPointsAtTheFormSent() {
        assertThat(calculation.pointer("velocity", request(5920.0, null, null, 10.0, null, null, null)))
                .isEqualTo("/velocity_m_per_s");
        assertThat(calculation.pointer("velocity", request(null, 0.233, null, 10.0, null, null, null)))
                .isEqualTo("/velocity_in_per_us");
        assertThat(calculation.pointer("velocity", request(null, null, "aluminium", 10.0, null, null, null)))
                .isEqualTo("/material");
    }

    @Test
    void otherFieldsKeepTheirName() {
        ThicknessResolutionRequest q = request(5920.0, null, null, 10.0, null, null, null);
        assertThat(calculation.pointer("echo_spacing", q)).isEqualTo("/echo_spacing");
        assertThat(calculation.pointer("velocity_uncertainty_percent", q)).isEqualTo("/velocity_uncertainty_percent");
    }
}
