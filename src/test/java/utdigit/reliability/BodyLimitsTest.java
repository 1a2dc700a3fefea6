package utdigit.reliability;

import static io.restassured.RestAssured.given;
import static org.assertj.core.api.Assertions.assertThat;

import io.restassured.http.ContentType;
import io.restassured.response.Response;
import java.nio.charset.StandardCharsets;
import java.util.Map;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;
import utdigit.web.support.ApiTest;

/**
 * The body cap of single endpoints (utdigit.json.max-body-bytes, 1 MiB by default): by
 * Content-Length before any byte is read, by counting for chunked bodies, never on batch bodies;
 * and bodies that arrive in pieces are answered exactly as bodies that arrive at once.
 */
class BodyLimitsTest extends ApiTest {
    static final int CAP = 1_048_576;
    static final String PATH = "/api/quantization-assessments";
    static final String BODY = "{\"bit_depth\": 8}";
    private static final JsonMapper JSON = JsonMapper.builder().build();

    @Test
    void bodyOfExactlyTheCapIsAnswered() {
        String padded = BODY + " ".repeat(CAP - BODY.length());
        assertThat(padded.getBytes(StandardCharsets.UTF_8)).hasSize(CAP);
        given().contentType(ContentType.JSON).body(padded).post(PATH).then().statusCode(200);
    }

    @Test
    void bodyOneByteOverTheCapIsA413Problem() {
        String padded = BODY + " ".repeat(CAP - BODY.length() + 1);
        given().contentType(ContentType.JSON).body(padded).post(PATH).then().statusCode(413)
                .contentType("application/problem+json")
                .body("type", org.hamcrest.Matchers.equalTo("/problems/payload-too-large"))
                .body("detail", org.hamcrest.Matchers.containsString("1048576"));
    }

    @Nested
    class OverRawSockets {
        @Test
        void contentLengthOverTheCapIsAnsweredBeforeTheBodyIsSentAndTheConnectionClosed() throws Exception {
            try (RawHttp c = new RawHttp(port, 5000)) {
                c.head("POST", PATH, Map.of("Content-Type", "application/json", "Content-Length", "2000000"));
                RawHttp.Answer a = c.read();
                assertThat(a.status()).isEqualTo(413);
                assertThat(a.headers().get("content-type")).startsWith("application/problem+json");
                assertThat(a.headers().get("connection")).isEqualTo("close");
                assertThat(c.closedByServer()).as("closed without waiting for the 2 MB").isTrue();
            }
        }

        @Test
        void chunkedBodyGrowingPastTheCapIsA413Problem() throws Exception {
            try (RawHttp c = new RawHttp(port, 10_000)) {
                c.head("POST", PATH, Map.of("Content-Type", "application/json", "Transfer-Encoding", "chunked"));
                int chunk = 65_536;
                byte[] spaces = " ".repeat(chunk).getBytes(StandardCharsets.US_ASCII);
                int sent = 0;
                while (sent <= CAP) {
                    int n = Math.min(chunk, CAP + 1 - sent);
                    c.send((Integer.toHexString(n) + "\r\n").getBytes(StandardCharsets.US_ASCII));
                    c.send(java.util.Arrays.copyOf(spaces, n));
                    sent += n;
                    if (sent <= CAP) {
                        c.send("\r\n".getBytes(StandardCharsets.US_ASCII));
                    }
                }
                RawHttp.Answer a = c.read();
                assertThat(a.status()).isEqualTo(413);
                assertThat(a.body()).contains("/problems/payload-too-large");
                assertThat(c.closedByServer()).isTrue();
            }
        }

        @Test
        void bodyArrivingInPiecesIsAnsweredLikeTheSameBodyAtOnce() throws Exception {
            String body = "{\"bit_depth\": 12, \"signal_height_percent_fsh\": 20, \"amplitude_tolerance_db\": 0.5}";
            String atOnce = given().contentType(ContentType.JSON).body(body).post(PATH).then().statusCode(200)
                    .extract().path("stamp.sha256");
            byte[] bytes = body.getBytes(StandardCharsets.UTF_8);
            try (RawHttp c = new RawHttp(port, 5000)) {
                c.head("POST", PATH, Map.of("Content-Type", "application/json",
                        "Content-Length", Integer.toString(bytes.length)));
                int piece = bytes.length / 4 + 1;
                for (int i = 0; i < bytes.length; i += piece) {
                    Thread.sleep(200);
                    c.send(java.util.Arrays.copyOfRange(bytes, i, Math.min(bytes.length, i + piece)));
                }
                RawHttp.Answer a = c.read();
                assertThat(a.status()).isEqualTo(200);
                JsonNode answer = JSON.readTree(a.body());
                assertThat(answer.path("stamp").path("sha256").asString()).isEqualTo(atOnce);
            }
        }

        @Test
        void chunkedBodyInPiecesIsAnswered() throws Exception {
            try (RawHttp c = new RawHttp(port, 5000)) {
                c.head("POST", PATH, Map.of("Content-Type", "application/json", "Transfer-Encoding", "chunked"));
                for (String part : new String[] {"{\"bit_depth\"", ": 10}"}) {
                    Thread.sleep(150);
                    c.send((Integer.toHexString(part.length()) + "\r\n" + part + "\r\n").getBytes(StandardCharsets.US_ASCII));
                }
                c.send("0\r\n\r\n".getBytes(StandardCharsets.US_ASCII));
                RawHttp.Answer a = c.read();
                assertThat(a.status()).isEqualTo(200);
                assertThat(JSON.readTree(a.body()).path("levels").asLong()).isEqualTo(1024);
            }
        }
    }

    @Test
    void batchBodiesAreNotUnderTheSingleEndpointCap() {
        // 2 MiB of blank lines (not rows in NDJSON) and one row: over the single cap, under the batch one.
        String body = "\n".repeat(2 * CAP) + BODY + "\n";
        Response r = given().contentType("application/x-ndjson").accept("application/x-ndjson").body(body.getBytes(StandardCharsets.UTF_8))
                .post(PATH + "/batch");
        assertThat(r.statusCode()).isEqualTo(200);
        assertThat(r.asString().trim().lines()).hasSize(1).allMatch(l -> l.contains("\"status\":\"OK\""));
    }
}
