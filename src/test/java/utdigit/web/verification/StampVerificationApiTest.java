package utdigit.web.verification;

import static io.restassured.RestAssured.given;
import static org.assertj.core.api.Assertions.assertThat;

import io.restassured.http.ContentType;
import java.nio.charset.StandardCharsets;
import java.util.Base64;
import javax.crypto.Mac;
import javax.crypto.spec.SecretKeySpec;
import org.junit.jupiter.api.Test;
import org.springframework.test.context.TestPropertySource;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ObjectNode;
import utdigit.web.support.ApiTest;
import utdigit.web.stamp.CanonicalJson;

/** Stamps prove that a value is the service's, unaltered (README "Stamps"). */
@TestPropertySource(properties = {"utdigit.stamp.key=test-key-alpha", "utdigit.stamp.key-id=qa-test"})
class StampVerificationApiTest extends ApiTest {
    private static final JsonMapper JSON = JsonMapper.builder().build();
    private static final String REQUEST = "{\"bit_depth\": 10, \"signal_height_percent_fsh\": 30, "
            + "\"reference_height_percent_fsh\": 80, \"evaluation_level_db\": -12}";

    private ObjectNode answer() {
        String body = post("/api/quantization-assessments", REQUEST).statusCode(200).extract().asString();
        return (ObjectNode) JSON.readTree(body);
    }

    private JsonNode verify(JsonNode document) {
        ObjectNode request = JSON.createObjectNode();
        request.set("document", document);
        String body = given().contentType(ContentType.JSON).body(request.toString())
                .post("/api/stamp-verifications").then().statusCode(200).extract().asString();
        return JSON.readTree(body);
    }

    @Test
    void anUntouchedAnswerIsIntactSignedAndReproducible() {
        ObjectNode doc = answer();
        assertThat(doc.get("stamp").get("key_id").asString()).isEqualTo("qa-test");
        JsonNode v = verify(doc);
        assertThat(v.get("content_intact").asBoolean()).isTrue();
        assertThat(v.get("signature_valid").asBoolean()).isTrue();
        assertThat(v.get("reproducible").asBoolean()).isTrue();
        assertThat(v.get("differences")).isEmpty();
    }

    @Test
    void theHashIsSha256OfTheRfc8785CanonicalAnswerWithTheStampReduced() throws Exception {
        ObjectNode doc = answer();
        String stamped = doc.get("stamp").get("sha256").asString();
        ObjectNode copy = doc.deepCopy();
        ObjectNode reduced = JSON.createObjectNode();
        reduced.set("calculation", doc.get("stamp").get("calculation"));
        reduced.set("service_version", doc.get("stamp").get("service_version"));
        copy.set("stamp", reduced);
        byte[] canonical = CanonicalJson.bytes(copy);
        String expected = java.util.HexFormat.of().formatHex(
                java.security.MessageDigest.getInstance("SHA-256").digest(canonical));
        assertThat(stamped).isEqualTo(expected);
        // HMAC-SHA256 (RFC 2104) over the same bytes, unpadded base64url, computed here with the JDK.
        Mac mac = Mac.getInstance("HmacSHA256");
        mac.init(new SecretKeySpec("test-key-alpha".getBytes(StandardCharsets.UTF_8), "HmacSHA256"));
        assertThat(doc.get("stamp").get("signature").asString())
                .isEqualTo(Base64.getUrlEncoder().withoutPadding().encodeToString(mac.doFinal(canonical)));
    }

    @Test
    void aChangedResultIsDetected() {
        ObjectNode doc = answer();
        doc.put("lsb_percent_fsh", doc.get("lsb_percent_fsh").asDouble() * 0.5);
        JsonNode v = verify(doc);
        assertThat(v.get("content_intact").asBoolean()).isFalse();
        assertThat(v.get("signature_valid").asBoolean()).isFalse();
        assertThat(v.get("reproducible").asBoolean()).isFalse();
        assertThat(v.get("differences").get(0).get("pointer").asString()).isEqualTo("/lsb_percent_fsh");
    }

    @Test
    void aChangedInputIsDetected() {
        ObjectNode doc = answer();
        ((ObjectNode) doc.get("inputs")).put("bit_depth", 12);
        JsonNode v = verify(doc);
        assertThat(v.get("content_intact").asBoolean()).isFalse();
        assertThat(v.get("reproducible").asBoolean()).isFalse();
    }

    @Test
    void aChangedWarningIsDetected() {
        ObjectNode doc = answer();
        ((tools.jackson.databind.node.ArrayNode) doc.withArray("warnings")).addObject()
                .put("code", "FORGED").put("message", "not from the service");
        assertThat(verify(doc).get("content_intact").asBoolean()).isFalse();
    }

    @Test
    void aSignatureMadeWithAnotherKeyIsInvalid() throws Exception {
        ObjectNode doc = answer();
        ObjectNode copy = doc.deepCopy();
        ObjectNode reduced = JSON.createObjectNode();
        reduced.set("calculation", doc.get("stamp").get("calculation"));
        reduced.set("service_version", doc.get("stamp").get("service_version"));
        copy.set("stamp", reduced);
        Mac mac = Mac.getInstance("HmacSHA256");
        mac.init(new SecretKeySpec("another-key".getBytes(StandardCharsets.UTF_8), "HmacSHA256"));
        String forged = Base64.getUrlEncoder().withoutPadding().encodeToString(mac.doFinal(CanonicalJson.bytes(copy)));
        ((ObjectNode) doc.get("stamp")).put("signature", forged);
        JsonNode v = verify(doc);
        assertThat(v.get("content_intact").asBoolean()).isTrue();
        assertThat(v.get("signature_valid").asBoolean()).isFalse();
    }

    @Test
    void aDocumentWithoutStampIsA400() {
        ObjectNode doc = answer();
        doc.remove("stamp");
        ObjectNode request = JSON.createObjectNode();
        request.set("document", doc);
        given().contentType(ContentType.JSON).body(request.toString()).post("/api/stamp-verifications")
                .then().statusCode(400).body("errors[0].pointer", org.hamcrest.Matchers.equalTo("/document/stamp"));
    }

    /** The answer's text with {@code from} (which must occur once) replaced by {@code to}, wrapped as a request. */
    private String requestWith(String from, String to) {
        String doc = answer().toString();
        assertThat(doc).contains(from);
        return "{\"document\": " + doc.replaceFirst(java.util.regex.Pattern.quote(from),
                java.util.regex.Matcher.quoteReplacement(to)) + "}";
    }

    @org.junit.jupiter.params.ParameterizedTest
    @org.junit.jupiter.params.provider.ValueSource(strings = {"1e400", "-1e400", "1e-400", "123456789012345678901234567890",
        "0.1000000000000000000000000001", "9007199254740993"})
    void aNumberThatIsNotExactlyADoubleIsA400AtItsPointerAnywhere(String number) {
        // RFC 7493 2.2 (I-JSON numbers are IEEE 754 doubles); RFC 8785 3.2.2.3 canonicalizes doubles only.
        // 9007199254740993 = 2^53 + 1, the first integer a double cannot hold.
        given().contentType(ContentType.JSON).body(requestWith("\"bit_depth\":10", "\"bit_depth\":" + number))
                .post("/api/stamp-verifications").then().statusCode(400)
                .body("errors[0].pointer", org.hamcrest.Matchers.equalTo("/document/inputs/bit_depth"));
        given().contentType(ContentType.JSON).body(requestWith("\"warnings\":[", "\"extra\":[" + number + "],\"warnings\":["))
                .post("/api/stamp-verifications").then().statusCode(400)
                .body("errors[0].pointer", org.hamcrest.Matchers.equalTo("/document/extra/0"));
    }

    @Test
    void aThousandDigitIntegerIsA400AndOneMoreDigitExceedsTheReadLimit() {
        String digits = "9".repeat(1000);
        given().contentType(ContentType.JSON).body(requestWith("\"warnings\":[", "\"big\":" + digits + ",\"warnings\":["))
                .post("/api/stamp-verifications").then().statusCode(400)
                .body("errors[0].pointer", org.hamcrest.Matchers.equalTo("/document/big"));
        given().contentType(ContentType.JSON).body(requestWith("\"warnings\":[", "\"big\":" + digits + "9,\"warnings\":["))
                .post("/api/stamp-verifications").then().statusCode(400);
    }

    @Test
    void exactDoublesInOtherSpellingsCompareExactly() {
        // 10 and 10.0 and 1e1 are the same I-JSON number: the document stays intact.
        String request = requestWith("\"bit_depth\":10", "\"bit_depth\":1.0e1");
        JsonNode v = JSON.readTree(given().contentType(ContentType.JSON).body(request).post("/api/stamp-verifications")
                .then().statusCode(200).extract().asString());
        assertThat(v.get("content_intact").asBoolean()).isTrue();
        assertThat(v.get("reproducible").asBoolean()).isTrue();
    }

    @Test
    void aLoneSurrogateInADocumentIsA400AtItsPointer() {
        // RFC 7493 2.1: strings are well-formed Unicode. Before, "\ud800" was canonicalized as "?".
        given().contentType(ContentType.JSON).body(requestWith("\"warnings\":[", "\"note\":\"a\\ud800\",\"warnings\":["))
                .post("/api/stamp-verifications").then().statusCode(400)
                .body("errors[0].pointer", org.hamcrest.Matchers.equalTo("/document/note"));
        given().contentType(ContentType.JSON).body(requestWith("\"warnings\":[", "\"\\udc00\":1,\"warnings\":["))
                .post("/api/stamp-verifications").then().statusCode(400)
                .body("errors[0].pointer", org.hamcrest.Matchers.equalTo("/document"))
                .body("errors[0].detail", org.hamcrest.Matchers.containsString("lone UTF-16 surrogate"));
    }

    @Test
    void theSameRequestGivesTheSameStamp() {
        assertThat(answer().get("stamp").get("sha256")).isEqualTo(answer().get("stamp").get("sha256"));
    }
}
