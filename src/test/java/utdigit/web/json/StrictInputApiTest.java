package utdigit.web.json;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItem;
import static org.hamcrest.Matchers.not;
import static org.hamcrest.Matchers.containsString;

import io.restassured.http.ContentType;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;
import utdigit.web.support.ApiTest;

/**
 * The input rules every endpoint shares (README "Conventions"), exercised on one endpoint since
 * they live in the one mapper and the one advice.
 */
class StrictInputApiTest extends ApiTest {
    private static final String PATH = "/api/quantization-assessments";

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
            unknown property            | {"bit_depth": 8, "bits": 8}                      | /bits
            duplicate key               | {"bit_depth": 8, "bit_depth": 9}                 | /bit_depth
            quoted number               | {"bit_depth": "8"}                               | /bit_depth
            quoted NaN                  | {"bit_depth": 8, "signal_height_percent_fsh": "NaN"} | /signal_height_percent_fsh
            quoted Infinity             | {"bit_depth": 8, "signal_height_percent_fsh": "Infinity"} | /signal_height_percent_fsh
            overflow to infinity        | {"bit_depth": 8, "signal_height_percent_fsh": 1e400} | /signal_height_percent_fsh
            fraction into integer       | {"bit_depth": 8.5}                               | /bit_depth
            number for enum             | {"bit_depth": 8, "quantizer": 0}                 | /quantizer
            lower-case enum             | {"bit_depth": 8, "quantizer": "rounding"}        | /quantizer
            enum with a leading space   | {"bit_depth": 8, "quantizer": " ROUNDING"}       | /quantizer
            enum with a trailing space  | {"bit_depth": 8, "quantizer": "ROUNDING "}       | /quantizer
            enum with a trailing tab    | {"bit_depth": 8, "quantizer": "ROUNDING\\t"}     | /quantizer
            boolean for number          | {"bit_depth": true}                              | /bit_depth
            object for number           | {"bit_depth": {"value": 8}}                      | /bit_depth
            number for string enum      | {"bit_depth": 8, "digitized_signal": 1}          | /digitized_signal
            required null               | {"bit_depth": null}                              | /bit_depth
            """)
    void badFieldIsA400PointingAtIt(String what, String body, String pointer) {
        post(PATH, body).statusCode(400)
                .contentType("application/problem+json")
                .body("status", equalTo(400))
                .body("errors.pointer", hasItem(pointer))
                .body("detail", not(containsString("tools.jackson")))
                .body("detail", not(containsString("Exception")));
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
            trailing tokens  | {"bit_depth": 8} {"bit_depth": 9}
            truncated object | {"bit_depth": 8
            bare NaN literal | {"bit_depth": 8, "signal_height_percent_fsh": NaN}
            not JSON         | bit_depth=8
            """)
    void malformedBodyIsA400(String what, String body) {
        post(PATH, body).statusCode(400).contentType("application/problem+json")
                .body("type", equalTo("/problems/malformed-body"));
    }

    @Test
    void emptyBodyIsA400() {
        given().contentType(ContentType.JSON).post(PATH).then().statusCode(400)
                .contentType("application/problem+json");
    }

    @Test
    void arrayInsteadOfObjectIsA400() {
        post(PATH, "[{\"bit_depth\": 8}]").statusCode(400).contentType("application/problem+json");
    }

    @Test
    void wrongContentTypeIsA415Problem() {
        given().contentType("text/plain").body("{\"bit_depth\": 8}").post(PATH).then().statusCode(415)
                .contentType("application/problem+json")
                .body("type", equalTo("/problems/unsupported-media-type"));
    }

    @Test
    void wrongMethodIsA405Problem() {
        given().get(PATH).then().statusCode(405).contentType("application/problem+json")
                .body("type", equalTo("/problems/method-not-allowed"));
    }

    @Test
    void unknownPathIsA404Problem() {
        given().get("/api/no-such-thing").then().statusCode(404).contentType("application/problem+json")
                .body("type", equalTo("/problems/not-found"));
    }

    @Test
    void explicitNullOfAnOptionalFieldIsAbsent() {
        post(PATH, "{\"bit_depth\": 8, \"signal_height_percent_fsh\": null}").statusCode(200)
                .body("$", not(org.hamcrest.Matchers.hasKey("amplitude_error_over_db")));
    }

    @Test
    void deepNestingIsRejectedWithoutAStackOverflow() {
        String deep = "{\"bit_depth\": " + "[".repeat(5000) + "]".repeat(5000) + "}";
        post(PATH, deep).statusCode(400).contentType("application/problem+json");
    }
}
