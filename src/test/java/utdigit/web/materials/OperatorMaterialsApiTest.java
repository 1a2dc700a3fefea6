package utdigit.web.materials;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItem;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.springframework.test.annotation.DirtiesContext;
import org.springframework.test.context.DynamicPropertyRegistry;
import org.springframework.test.context.DynamicPropertySource;
import utdigit.web.support.ApiTest;

/** An operator material from UTDIGIT_MATERIALS_DIRECTORY, end to end through a technique sheet. */
@DirtiesContext
class OperatorMaterialsApiTest extends ApiTest {

    private static final Path DIRECTORY;

    static {
        try {
            DIRECTORY = Files.createTempDirectory("utdigit-materials");
            Files.writeString(DIRECTORY.resolve("shop.yaml"), """
                    materials:
                      - id: a516-block-12
                        name: A516 grade 70 plate, calibration block 12 (measured)
                        longitudinal_m_per_s: 5912
                        shear_m_per_s: 3236
                        longitudinal_uncertainty_m_per_s: 6
                        shear_uncertainty_m_per_s: 5
                        uncertainty_kind: STANDARD
                        source: measured by the comparative method of ASTM E494, shop report QA-114
                    """);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    @DynamicPropertySource
    static void materialsDirectory(DynamicPropertyRegistry registry) {
        registry.add("utdigit.materials.directory", DIRECTORY::toString);
    }

    @Test
    void theOperatorMaterialIsListedBesideTheBuiltInOnes() {
        given().get("/api/materials").then().statusCode(200)
                .body("materials.id", hasItem("a516-block-12"))
                .body("materials.id", hasItem("carbon-steel"));
        given().get("/api/materials/a516-block-12").then().statusCode(200)
                .body("origin", equalTo("OPERATOR"))
                .body("uncertainty_kind", equalTo("STANDARD"))
                .body("source", equalTo("measured by the comparative method of ASTM E494, shop report QA-114"));
    }

    @Test
    void aSheetOnTheOperatorMaterialUsesItsVelocityAndStandardUncertainty() {
        String sheet = """
                {"sheet_id": "S-2", "revision": "A", "technique": "PHASED_ARRAY", "profile_id": "common-practice",
                 "probe": {"frequency_mhz": 5, "bandwidth_percent": 60, "element_count": 32},
                 "material": {"material": "a516-block-12", "wave_mode": "SHEAR", "thickness_mm": 20},
                 "digitization": {"sampling_frequency_mhz": 100, "bit_depth": 12}}""";
        // Derivation (GUM 5.1.2): first echo, u_d^2 = (d u_v / v)^2 + (v/2 x dt/sqrt(12))^2 with the operator's
        // shear velocity 3236 m/s and its standard uncertainty 5 m/s used as it is (STANDARD, not a half-width).
        double velocityTermMm = 20.0 * 5.0 / 3236.0;
        double samplingTermMm = 3.236 / 2.0 * (0.01 / Math.sqrt(12.0));
        post("/api/technique-sheet-validations", sheet).statusCode(200)
                .body("velocity_source.material", equalTo("a516-block-12"))
                .body("velocity_source.velocity_m_per_s", closeTo(3236.0, 0.0))
                .body("values.thickness_resolution_mm", closeTo(3.236 * 0.01 / 2.0, 1e-15))
                .body("values.standard_uncertainty_mm", closeTo(Math.hypot(velocityTermMm, samplingTermMm), 1e-12))
                .body("inputs.material.velocity_uncertainty_m_per_s", closeTo(5.0, 0.0));
    }
}
