package utdigit.integration;

import static io.restassured.RestAssured.given;
import static org.assertj.core.api.Assertions.assertThat;
import static org.awaitility.Awaitility.await;

import io.micrometer.core.instrument.Counter;
import io.micrometer.core.instrument.MeterRegistry;
import java.nio.charset.StandardCharsets;
import java.time.Duration;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import utdigit.web.metrics.ServiceMetrics;
import utdigit.web.support.ApiTest;

/** The request and batch-row counters of {@link ServiceMetrics}. */
class ServiceMetricsTest extends ApiTest {
    private static final String PULSE = "{\"frequency_mhz\": 5, \"material\": \"carbon-steel\"}";
    /** The request counter is incremented once the answer is written, just after the caller may read it. */
    private static final Duration SETTLE = Duration.ofSeconds(10);

    @Autowired
    MeterRegistry registry;

    @Test
    void countsApiRequestsByEndpointMethodAndStatus() {
        double ok = requests("pulse-parameters", "POST", 200);
        double invalid = requests("pulse-parameters", "POST", 400);
        double material = requests("materials/{id}", "GET", 200);
        double unknownMaterial = requests("materials/{id}", "GET", 404);

        post("/api/pulse-parameters", PULSE).statusCode(200);
        post("/api/pulse-parameters", PULSE).statusCode(200);
        post("/api/pulse-parameters", "{\"frequency_mhz\": -5, \"material\": \"carbon-steel\"}").statusCode(400);
        given().get("/api/materials/water").then().statusCode(200);
        given().get("/api/materials/unobtainium").then().statusCode(404);

        await().atMost(SETTLE).untilAsserted(() -> {
            assertThat(requests("pulse-parameters", "POST", 200)).isEqualTo(ok + 2);
            assertThat(requests("pulse-parameters", "POST", 400)).isEqualTo(invalid + 1);
            assertThat(requests("materials/{id}", "GET", 200)).isEqualTo(material + 1);
            assertThat(requests("materials/{id}", "GET", 404)).isEqualTo(unknownMaterial + 1);
        });
    }

    @Test
    void pathsOutsideTheServiceTemplatesAreOneSeries() {
        double before = requests("unmatched", "GET", 404);
        given().get("/api/no-such-thing-" + System.nanoTime()).then().statusCode(404);
        given().get("/api/another-unknown-path").then().statusCode(404);
        await().atMost(SETTLE).untilAsserted(() ->
                assertThat(requests("unmatched", "GET", 404)).isEqualTo(before + 2));
    }

    @Test
    void countsBatchRowsByCalculationAndRowStatus() {
        double ok = rows("pulse-parameters", "OK");
        double invalid = rows("pulse-parameters", "INVALID");
        String body = PULSE + "\n" + PULSE + "\n" + "{\"frequency_mhz\": 0}\n" + "not json\n" + PULSE + "\n";

        given().contentType("application/x-ndjson").accept("application/x-ndjson")
                .body(body.getBytes(StandardCharsets.UTF_8))
                .post("/api/pulse-parameters/batch").then().statusCode(200);

        // 3 good rows; a value out of range and a line that is not JSON are INVALID.
        assertThat(rows("pulse-parameters", "OK")).isEqualTo(ok + 3);
        assertThat(rows("pulse-parameters", "INVALID")).isEqualTo(invalid + 2);
        await().atMost(SETTLE).untilAsserted(() ->
                assertThat(requests("pulse-parameters/batch", "POST", 200)).isPositive());
    }

    @Test
    void prometheusScrapesBothCounters() {
        post("/api/pulse-parameters", PULSE).statusCode(200);
        given().contentType("application/x-ndjson").accept("application/x-ndjson")
                .body((PULSE + "\n").getBytes(StandardCharsets.UTF_8))
                .post("/api/pulse-parameters/batch").then().statusCode(200);
        await().atMost(SETTLE).untilAsserted(() -> {
            String scrape = given().get("/actuator/prometheus").then().statusCode(200).extract().asString();
            assertThat(scrape).contains("utdigit_requests_total{endpoint=\"pulse-parameters\",method=\"POST\",status=\"200\"}")
                    .contains("utdigit_batch_rows_total{calculation=\"pulse-parameters\",status=\"OK\"}");
        });
    }

    private double requests(String endpoint, String method, int status) {
        Counter c = registry.find(ServiceMetrics.REQUESTS).tag("endpoint", endpoint).tag("method", method)
                .tag("status", Integer.toString(status)).counter();
        return c == null ? 0 : c.count();
    }

    private double rows(String calculation, String status) {
        Counter c = registry.find(ServiceMetrics.BATCH_ROWS).tag("calculation", calculation).tag("status", status)
                .counter();
        return c == null ? 0 : c.count();
    }
}
