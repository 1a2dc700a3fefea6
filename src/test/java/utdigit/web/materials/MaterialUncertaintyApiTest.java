package utdigit.web.materials;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.nullValue;

import io.restassured.http.ContentType;
import org.junit.jupiter.api.Test;
import utdigit.web.support.ApiTest;

/** Issue 20: the velocity uncertainty of a material when the request gives none. */
class MaterialUncertaintyApiTest extends ApiTest {

    private static final String STEEL_25 = """
            {"sampling_frequency_mhz": 100, "material": "carbon-steel", "nominal_thickness_mm": 25}""";

    @Test
    void twentyFiveMillimetresOfSteelCarryTheMaterialsHalfWidth() {
        // Derivation (GUM, JCGM 100:2008 4.3.7 and 5.1.2): u_v = 50/sqrt(3) m/s from ISO 22232-2's +/- 50 m/s
        // read as a half-width; first echo t = 2d/v, dd/dv = t/2 = d/v, so the velocity term is d u_v / v.
        // Sampling term: v/2 x dt/sqrt(12) with dt = 10 ns.
        double uv = 50.0 / Math.sqrt(3.0);
        double velocityTermMm = 25.0 * uv / 5920.0;                 // 0.1219 mm
        double samplingTermMm = 5.92 / 2.0 * (0.01 / Math.sqrt(12.0)); // 0.0085 mm, all there was before
        double expected = Math.sqrt(velocityTermMm * velocityTermMm + samplingTermMm * samplingTermMm);
        post("/api/thickness-resolutions", STEEL_25).statusCode(200)
                .body("standard_uncertainty_mm", closeTo(expected, expected * 1e-12))
                .body("standard_uncertainty_mm", closeTo(0.122, 0.001))
                .body("inputs.velocity_uncertainty_m_per_s", closeTo(uv, 1e-12))
                .body("velocity_source.uncertainty_m_per_s", closeTo(50.0, 0.0))
                .body("velocity_source.uncertainty_kind", equalTo("HALF_WIDTH"))
                .body("velocity_source.standard_uncertainty_m_per_s", closeTo(uv, 1e-12))
                .body("velocity_source.uncertainty_note", containsString("50/sqrt(3)"))
                .body("references.id", org.hamcrest.Matchers.hasItem("velocity-uncertainty"))
                .body("warnings.code", org.hamcrest.Matchers.not(org.hamcrest.Matchers.hasItem("VELOCITY_UNCERTAINTY_ZERO")));
    }

    @Test
    void theCallersValueWins() {
        post("/api/thickness-resolutions", """
                {"sampling_frequency_mhz": 100, "material": "carbon-steel", "nominal_thickness_mm": 25,
                 "velocity_uncertainty_m_per_s": 0}""").statusCode(200)
                .body("inputs.velocity_uncertainty_m_per_s", closeTo(0.0, 0.0))
                .body("velocity_source.uncertainty_note", nullValue())
                .body("standard_uncertainty_mm", closeTo(5.92 / 2.0 * (0.01 / Math.sqrt(12.0)), 1e-12));
    }

    @Test
    void theAnswerStaysReproducibleFromItsInputs() {
        String answer = post("/api/thickness-resolutions", STEEL_25).statusCode(200).extract().asString();
        given().contentType(ContentType.JSON).accept(ContentType.JSON)
                .body("{\"document\": " + answer + "}")
                .when().post("/api/stamp-verifications").then().statusCode(200)
                .body("content_intact", equalTo(true))
                .body("reproducible", equalTo(true));
    }

    @Test
    void aSheetUsesTheMaterialsUncertaintyToo() {
        String sheet = """
                {"sheet_id": "S-1", "revision": "A", "technique": "PULSE_ECHO", "profile_id": "common-practice",
                 "material": {"material": "carbon-steel", "thickness_mm": 25},
                 "digitization": {"sampling_frequency_mhz": 100, "bit_depth": 8}}""";
        double uv = 50.0 / Math.sqrt(3.0);
        double velocityTermMm = 25.0 * uv / 5920.0;
        double samplingTermMm = 5.92 / 2.0 * (0.01 / Math.sqrt(12.0));
        post("/api/technique-sheet-validations", sheet).statusCode(200)
                .body("values.standard_uncertainty_mm", closeTo(Math.hypot(velocityTermMm, samplingTermMm), 1e-12))
                .body("inputs.material.velocity_uncertainty_m_per_s", closeTo(uv, 1e-12))
                .body("velocity_source.uncertainty_note", containsString("velocity_uncertainty_m_per_s"));
    }

    @Test
    void shearInAusteniticSteelCarriesTheCoarseGrainCaution() {
        post("/api/pulse-parameters", """
                {"frequency_mhz": 2, "material": "austenitic-stainless-steel", "wave_mode": "SHEAR"}""")
                .statusCode(200)
                .body("velocity_source.caution", containsString("coarse-grained"));
    }

    @Test
    void aMaterialWithoutATabulatedShearVelocityIsA400AtWaveMode() {
        assertInvalid("/api/pulse-parameters", """
                {"frequency_mhz": 2, "material": "polystyrene", "wave_mode": "SHEAR"}""", "/wave_mode");
    }

}
