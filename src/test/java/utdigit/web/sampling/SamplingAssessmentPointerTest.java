package utdigit.web.sampling;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

/** The core names the TFM lengths in mm (tfm_grid_spacing_mm); the pointer is the form the caller sent. */
class SamplingAssessmentPointerTest {
    private final SamplingAssessmentCalculation calculation = new SamplingAssessmentCalculation();

    private static SamplingAssessmentRequest request(Double velocityMPerS, Double velocityInPerUs, String material,
            Double gridMm, Double gridIn, Double lateralMm, Double lateralIn, Double apertureMm, Double apertureIn,
            Double depthMm, Double depthIn) {
        return new SamplingAssessmentRequest(100.0, 5.0, null, null, null, null, null, null, null, gridMm, gridIn,
                velocityMPerS, velocityInPerUs, material, null, null, null, lateralMm, lateralIn, apertureMm,
                apertureIn, depthMm, depthIn);
    }

    @Test
    void lengthsPointAtTheInchFormWhenItWasSent() {
        SamplingAssessmentRequest q = request(5920.0, null, null, null, 0.004, null, 0.008, null, 1.5, null, 1.2);
        assertThat(calculation.pointer("tfm_grid_spacing_mm", q)).isEqualTo("/tfm_grid_spacing_in");
        assertThat(calculation.pointer("tfm_lateral_grid_spacing_mm", q)).isEqualTo("/tfm_lateral_grid_spacing_in");
        assertThat(calculation.pointer("tfm_aperture_mm", q)).isEqualTo("/tfm_aperture_in");
        assertThat(calculation.pointer("tfm_depth_mm", q)).isEqualTo("/tfm_depth_in");
        assertThat(calculation.pointer("tfm_depth", q)).isEqualTo("/tfm_depth_in");
    }

    @Test
    void lengthsPointAtTheMillimetreFormOtherwise() {
        SamplingAssessmentRequest q = request(5920.0, null, null, 0.1, null, 0.2, null, 38.4, null, 30.0, null);
        assertThat(calculation.pointer("tfm_grid_spacing_mm", q)).isEqualTo("/tfm_grid_spacing_mm");
        assertThat(calculation.pointer("tfm_lateral_grid_spacing_mm", q)).isEqualTo("/tfm_lateral_grid_spacing_mm");
        assertThat(calculation.pointer("tfm_aperture_mm", q)).isEqualTo("/tfm_aperture_mm");
        assertThat(calculation.pointer("tfm_depth_mm", q)).isEqualTo("/tfm_depth_mm");
    }

    @Test
    void velocityPointsAtTheFormSent() {
        assertThat(calculation.pointer("velocity_m_per_s",
                request(5920.0, null, null, 0.1, null, null, null, null, null, null, null)))
                .isEqualTo("/velocity_m_per_s");
        assertThat(calculation.pointer("velocity_m_per_s",
                request(null, 0.233, null, 0.1, null, null, null, null, null, null, null)))
                .isEqualTo("/velocity_in_per_us");
        assertThat(calculation.pointer("velocity",
                request(null, null, "carbon-steel", 0.1, null, null, null, null, null, null, null)))
                .isEqualTo("/material");
    }

    @Test
    void otherFieldsKeepTheirName() {
        SamplingAssessmentRequest q = request(null, null, null, null, null, null, null, null, null, null, null);
        assertThat(calculation.pointer("bandwidth_percent", q)).isEqualTo("/bandwidth_percent");
        assertThat(calculation.pointer("peak_reading", q)).isEqualTo("/peak_reading");
        assertThat(calculation.pointer("tfm_image", q)).isEqualTo("/tfm_image");
    }
}
