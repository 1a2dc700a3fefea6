package utdigit.reliability;

import static io.restassured.RestAssured.given;
import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.web.server.LocalServerPort;

/**
 * The read deadline and the cap on batches in progress, with short settings so the test is quick:
 * a body not complete within utdigit.http.body-read-timeout is a 408 problem and the connection is
 * closed; one batch more than utdigit.http.max-concurrent-batches is a 503 problem with Retry-After.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT, properties = {
        "utdigit.http.body-read-timeout=2s",
        "utdigit.http.max-concurrent-batches=1"})
class ShortLimitsTest {
    @LocalServerPort
    int port;

    @Test
    void bodyNotCompleteByTheDeadlineIsA408AndTheConnectionIsClosed() throws Exception {
        try (RawHttp c = new RawHttp(port, 10_000)) {
            long start = System.nanoTime();
            c.head("POST", "/api/quantization-assessments",
                    Map.of("Content-Type", "application/json", "Content-Length", "1000"));
            c.send("{\"bit_depth\": 8".getBytes(StandardCharsets.US_ASCII));
            RawHttp.Answer a = c.read();
            double seconds = (System.nanoTime() - start) / 1e9;
            assertThat(a.status()).isEqualTo(408);
            assertThat(a.headers().get("content-type")).startsWith("application/problem+json");
            assertThat(a.body()).contains("/problems/request-timeout").contains("15 bytes received");
            assertThat(a.headers().get("connection")).isEqualTo("close");
            assertThat(a.headers().get("cache-control")).isEqualTo("no-store");
            assertThat(c.closedByServer()).isTrue();
            // Tomcat checks asynchronous timeouts about once a second.
            assertThat(seconds).as("answered at the deadline").isBetween(1.9, 8.0);
        }
    }

    @Test
    void batchBeyondTheCapIsA503WithRetryAfterAndTheFirstStillFinishes() throws Exception {
        try (RawHttp first = new RawHttp(port, 10_000)) {
            first.head("POST", "/api/quantization-assessments/batch",
                    Map.of("Content-Type", "application/x-ndjson", "Transfer-Encoding", "chunked"));
            String row = "{\"bit_depth\": 8}\n";
            first.send((Integer.toHexString(row.length()) + "\r\n" + row + "\r\n").getBytes(StandardCharsets.US_ASCII));
            Thread.sleep(300);
            var second = given().port(port).contentType("application/x-ndjson").body(row.getBytes(StandardCharsets.UTF_8))
                    .post("/api/quantization-assessments/batch");
            assertThat(second.statusCode()).isEqualTo(503);
            assertThat(second.contentType()).startsWith("application/problem+json");
            assertThat(second.header("Retry-After")).isEqualTo("5");
            assertThat(second.jsonPath().getString("type")).isEqualTo("/problems/service-busy");
            first.send("0\r\n\r\n".getBytes(StandardCharsets.US_ASCII));
            RawHttp.Answer a = first.read();
            assertThat(a.status()).isEqualTo(200);
            assertThat(a.body()).contains("\"status\":\"OK\"");
        }
        given().port(port).contentType("application/x-ndjson").body("{\"bit_depth\": 8}\n".getBytes(StandardCharsets.UTF_8))
                .post("/api/quantization-assessments/batch").then().statusCode(200);
    }
}
