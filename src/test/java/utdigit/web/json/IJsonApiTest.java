package utdigit.web.json;

import static io.restassured.RestAssured.given;
import static org.assertj.core.api.Assertions.assertThat;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.hasItem;

import io.restassured.http.ContentType;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import utdigit.web.support.ApiTest;

/**
 * I-JSON (RFC 7493 2.1): a string with a lone UTF-16 surrogate is refused at its field, on every
 * path that reads strings (single endpoints, sheets, batch rows); negative zero never shows as "-0"
 * in a text.
 */
class IJsonApiTest extends ApiTest {

    @Test
    void aLoneSurrogateInAStringFieldIsA400AtItsPointer() {
        for (String text : new String[] {"steel\\ud800", "\\udc00", "\\ud800\\ud800", "x\\udbff"}) {
            assertInvalid("/api/pulse-parameters", "{\"frequency_mhz\": 5, \"material\": \"" + text + "\"}", "/material")
                    .body("errors.detail", hasItem(containsString("lone UTF-16 surrogate")));
        }
    }

    @Test
    void aWellFormedSurrogatePairIsNotALoneSurrogate() {
        // U+1F600 as its pair: well-formed; the material is unknown, which is what the 400 says.
        post("/api/pulse-parameters", "{\"frequency_mhz\": 5, \"material\": \"\\ud83d\\ude00\"}").statusCode(400)
                .body("errors.detail", org.hamcrest.Matchers.not(hasItem(containsString("surrogate"))));
    }

    @Test
    void aLoneSurrogateInASheetIdIsA400AtSheetId() throws Exception {
        String sheet = Files.readString(Path.of("api-examples/technique-sheet-validations.json"));
        String hostile = sheet.replaceFirst("\"sheet_id\"\\s*:\\s*\"[^\"]*\"", "\"sheet_id\": \"WPS\\\\ud800\"");
        assertThat(hostile).isNotEqualTo(sheet);
        assertInvalid("/api/technique-sheet-validations", hostile, "/sheet_id");
    }

    @Test
    void aLoneSurrogateInABatchRowMakesThatRowInvalidAtItsPointer() {
        String body = "{\"frequency_mhz\": 5, \"velocity_m_per_s\": 5920}\n"
                + "{\"frequency_mhz\": 5, \"material\": \"a\\ud800\"}\n";
        String answer = given().contentType("application/x-ndjson").accept("application/x-ndjson")
                .body(body.getBytes(java.nio.charset.StandardCharsets.UTF_8))
                .post("/api/pulse-parameters/batch").then().statusCode(200).extract().asString();
        String[] rows = answer.strip().split("\n");
        assertThat(rows).hasSize(2);
        assertThat(rows[0]).contains("\"status\":\"OK\"");
        assertThat(rows[1]).contains("\"status\":\"INVALID\"").contains("/material").contains("lone UTF-16 surrogate");
    }

    @Test
    void aLoneSurrogateInAnUnknownMemberNameIsA400() {
        given().contentType(ContentType.JSON).body("{\"frequency_mhz\": 5, \"velocity_m_per_s\": 5920, \"\\ud800\": 1}")
                .post("/api/pulse-parameters").then().statusCode(400);
    }

    @Test
    void negativeZeroIsWrittenAsZeroInAMessage() {
        // Double.toString(-0.0) is "-0.0"; a message quotes the input as 0.0.
        utdigit.core.common.CalculationException e =
                utdigit.core.common.CalculationException.invalid("x_mm", -0.0, "must be > 0");
        assertThat(e.getMessage()).contains("(0.0)").doesNotContain("-0");
        assertThat(utdigit.core.common.MessageNumbers.rounded(-0.0)).isEqualTo("0");
    }
}
