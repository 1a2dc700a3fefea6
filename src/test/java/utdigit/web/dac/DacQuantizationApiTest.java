package utdigit.web.dac;

import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItem;
import static org.hamcrest.Matchers.hasKey;
import static org.hamcrest.Matchers.not;

import org.junit.jupiter.api.Test;
import utdigit.web.support.ApiTest;

class DacQuantizationApiTest extends ApiTest {
    private static final String PATH = "/api/dac-quantizations";

    @Test
    void twelveBitsAndATwentyFourDbCurve() {
        // 12-bit RF: LSB = 200 / 4096 %FSH (FSR / 2^N, IEEE Std 1241); 80 %FSH - 24 dB = 80 x 10^(-1.2) %FSH;
        // rounding errs by up to LSB/2 (W. Kester, Analog Devices MT-001): 20 log10(1 - LSB / (2 h)), -0.042 dB at
        // the lowest point (over the 0.03 dB tolerance), -0.0027 dB at 80 %FSH (within it).
        double lsb = 200.0 / 4096;
        double lowest = 80 * Math.pow(10, -1.2);
        double uncorrected = 20 * Math.log10(1 - lsb / (2 * lowest));
        post(PATH, "{\"bit_depth\": 12, \"dac_span_db\": 24, \"reference_height_percent_fsh\": 80, "
                + "\"amplitude_tolerance_db\": 0.03}")
                .statusCode(200)
                .body("lsb_percent_fsh", closeTo(lsb, 1e-15))
                .body("lowest_reference_height_percent_fsh", closeTo(lowest, 1e-12))
                .body("uncorrected_error_under_db", closeTo(uncorrected, 1e-12))
                .body("analog_tcg_error_under_db", closeTo(20 * Math.log10(1 - lsb / 160), 1e-12))
                .body("digital_tcg_lsb_percent_fsh", closeTo(lsb * Math.pow(10, 1.2), 1e-12))
                .body("digital_tcg_error_under_db", closeTo(uncorrected, 1e-12))
                .body("uncorrected_within_tolerance", equalTo(false))
                .body("analog_tcg_within_tolerance", equalTo(true))
                .body("digital_tcg_within_tolerance", equalTo(false))
                .body("inputs.quantizer", equalTo("ROUNDING"))
                .body("stamp.calculation", equalTo("dac-quantizations"));
    }

    @Test
    void withoutToleranceItsFieldsAreOmitted() {
        post(PATH, "{\"bit_depth\": 8, \"dac_span_db\": 12, \"reference_height_percent_fsh\": 80}")
                .statusCode(200)
                .body("$", not(hasKey("minimum_height_percent_fsh")))
                .body("$", not(hasKey("uncorrected_within_tolerance")));
    }

    @Test
    void badInputsPointAtTheirFields() {
        assertInvalid(PATH, "{\"bit_depth\": 8, \"reference_height_percent_fsh\": 80}", "/dac_span_db");
        assertInvalid(PATH, "{\"bit_depth\": 8, \"dac_span_db\": 61, \"reference_height_percent_fsh\": 80}",
                "/dac_span_db");
        post(PATH, "{\"bit_depth\": 1, \"dac_span_db\": 6, \"reference_height_percent_fsh\": 80, "
                + "\"code_mapping\": \"MAX_CODE\"}").statusCode(422);
    }

    @Test
    void aBatchOfDacRowsAnswersEachRow() {
        io.restassured.RestAssured.given().contentType("text/csv").accept("application/x-ndjson")
                .body("bit_depth,dac_span_db,reference_height_percent_fsh\n8,12,80\n8,70,80\n")
                .when().post(PATH + "/batch").then().statusCode(200)
                .body(org.hamcrest.Matchers.containsString("\"status\":\"OK\""))
                .body(org.hamcrest.Matchers.containsString("\"status\":\"INVALID\""));
    }
}
