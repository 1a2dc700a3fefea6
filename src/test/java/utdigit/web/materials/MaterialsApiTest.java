package utdigit.web.materials;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItems;
import static org.hamcrest.Matchers.nullValue;

import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import utdigit.web.support.ApiTest;

class MaterialsApiTest extends ApiTest {

    @Test
    void listHasTheContractsMaterials() {
        given().get("/api/materials").then().statusCode(200)
                .body("materials.id", hasItems("carbon-steel", "stainless-steel-347", "stainless-steel-410",
                        "aluminium", "copper", "titanium", "acrylic", "water"));
    }

    @Test
    void carbonSteelHoldsTheIso22232SteelReferenceValues() {
        // ISO 22232-2 steel reference values: 5920 +/- 50 m/s longitudinal, 3255 +/- 30 m/s shear.
        given().get("/api/materials/carbon-steel").then().statusCode(200)
                .body("longitudinal_m_per_s", closeTo(5920.0, 0.0))
                .body("shear_m_per_s", closeTo(3255.0, 0.0))
                .body("longitudinal_uncertainty_m_per_s", closeTo(50.0, 0.0))
                .body("uncertainty_kind", equalTo("HALF_WIDTH"));
    }

    @Test
    void stainless347MatchesAstmE494() {
        // ASTM E494 Table X3.1: stainless steel 347, 5790 / 3100 m/s.
        given().get("/api/materials/stainless-steel-347").then().statusCode(200)
                .body("longitudinal_m_per_s", closeTo(5790.0, 0.0))
                .body("shear_m_per_s", closeTo(3100.0, 0.0));
    }

    @Test
    void waterHasNoShearWaveAndFollowsTemperature() {
        // Marczak (1997) polynomial: 1482.38 m/s at 20 C (from memory); Del Grosso & Mader: 1482.3 m/s.
        given().get("/api/materials/water").then().statusCode(200)
                .body("shear_m_per_s", nullValue())
                .body("temperature_c", closeTo(20.0, 0.0))
                .body("longitudinal_m_per_s", closeTo(1482.38, 0.01));
        // Water is fastest near 74 C at about 1555 m/s (common practice, from memory).
        given().queryParam("temperature_c", 74).get("/api/materials/water").then().statusCode(200)
                .body("longitudinal_m_per_s", closeTo(1555.0, 1.0));
    }

    @Nested
    class Rejected {
        @Test
        void unknownIdIsA404Problem() {
            given().get("/api/materials/unobtainium").then().statusCode(404)
                    .contentType("application/problem+json")
                    .body("type", equalTo("/problems/not-found"))
                    .body("title", equalTo("Not found"));
        }

        @Test
        void waterOutsideThePolynomialsRange() {
            given().queryParam("temperature_c", 96).get("/api/materials/water").then().statusCode(400)
                    .body("errors.pointer", hasItems("temperature_c"));
        }

        @Test
        void temperatureForASolid() {
            given().queryParam("temperature_c", 40).get("/api/materials/copper").then().statusCode(400);
        }

        @Test
        void postIsA405ProblemWithAllow() {
            given().post("/api/materials").then().statusCode(405)
                    .header("Allow", equalTo("GET"))
                    .body("type", equalTo("/problems/method-not-allowed"));
        }
    }
}
