package utdigit.reliability;

import static io.restassured.RestAssured.given;
import static org.assertj.core.api.Assertions.assertThat;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.startsWith;

import io.restassured.http.ContentType;
import io.restassured.response.Response;
import java.util.Map;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.context.ApplicationContext;
import org.springframework.security.web.SecurityFilterChain;
import utdigit.web.support.ApiTest;

/**
 * Security headers on every kind of answer (OWASP REST Security Cheat Sheet, "Security headers":
 * nosniff, no-store, frame-ancestors 'none' and X-Frame-Options DENY), and the actuator exposing
 * only health, info and prometheus.
 */
class SecurityHeadersTest extends ApiTest {
    private static final String QUANTIZATION = "/api/quantization-assessments";

    static void assertSecurityHeaders(Response r) {
        assertThat(r.header("X-Content-Type-Options")).isEqualTo("nosniff");
        assertThat(r.header("Cache-Control")).isEqualTo("no-store");
        assertThat(r.header("X-Frame-Options")).isEqualTo("DENY");
        assertThat(r.header("Content-Security-Policy")).contains("frame-ancestors 'none'");
    }

    @Autowired
    ApplicationContext context;

    /** Without a JWT issuer or key Spring Security is not installed: the headers come without its filter chain. */
    @Test
    void openServiceHasNoSecurityFilterChain() {
        assertThat(context.getBeanNamesForType(SecurityFilterChain.class)).isEmpty();
        assertThat(context.containsBean("springSecurityFilterChain")).isFalse();
    }

    @Test
    void calculationAnswerHasTheHeaders() {
        Response r = given().contentType(ContentType.JSON).body("{\"bit_depth\": 8}").post(QUANTIZATION);
        assertThat(r.statusCode()).isEqualTo(200);
        assertSecurityHeaders(r);
        assertThat(r.header("Content-Security-Policy")).isEqualTo("default-src 'none'; frame-ancestors 'none'");
    }

    @ParameterizedTest(name = "{0} {1} -> {2}")
    @CsvSource(delimiter = '|', textBlock = """
            POST   | /api/quantization-assessments | 400 | {"bit_depth": "eight"}
            POST   | /api/quantization-assessments | 400 | {"bit_depth": 8, "reference_height_percent_fsh": 80}
            POST   | /api/pulse-parameters         | 422 | {"frequency_mhz": 5, "material": "water", "wave_mode": "SHEAR"}
            POST   | /api/no-such-calculation      | 404 | {}
            GET    | /no/such/page                 | 404 |
            DELETE | /api/quantization-assessments | 405 |
            GET    | /api/materials/unobtainium    | 404 |
            """)
    void problemAnswersHaveTheHeaders(String method, String path, int status, String body) {
        var spec = given().contentType(ContentType.JSON);
        if (body != null) {
            spec = spec.body(body);
        }
        Response r = spec.request(method, path);
        assertThat(r.statusCode()).isEqualTo(status);
        assertThat(r.contentType()).startsWith("application/problem+json");
        assertSecurityHeaders(r);
    }

    @Test
    void unsupportedMediaTypeAndTooLargeHaveTheHeaders() {
        Response r415 = given().contentType("text/plain").body("bit_depth=8").post(QUANTIZATION);
        assertThat(r415.statusCode()).isEqualTo(415);
        assertSecurityHeaders(r415);
        Response r413 = given().contentType(ContentType.JSON).body(" ".repeat(1_100_000) + "{}").post(QUANTIZATION);
        assertThat(r413.statusCode()).isEqualTo(413);
        assertSecurityHeaders(r413);
    }

    @Test
    void batchAnswerHasTheHeaders() {
        Response r = given().contentType("application/x-ndjson").body("{\"bit_depth\": 8}\n".getBytes(java.nio.charset.StandardCharsets.UTF_8))
                .post(QUANTIZATION + "/batch");
        assertThat(r.statusCode()).isEqualTo(200);
        assertSecurityHeaders(r);
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(textBlock = """
            /actuator/health
            /actuator/health/liveness
            /actuator/health/readiness
            /actuator/info
            /actuator/prometheus
            /v3/api-docs
            """)
    void operationsAnswersHaveTheHeaders(String path) {
        Response r = given().get(path);
        assertThat(r.statusCode()).isEqualTo(200);
        assertSecurityHeaders(r);
    }

    @Test
    void swaggerUiPageLoadsItsOwnAssetsButCannotBeFramed() {
        Response page = given().redirects().follow(true).get("/swagger-ui.html");
        assertThat(page.statusCode()).isEqualTo(200);
        assertSecurityHeaders(page);
        assertThat(page.header("Content-Security-Policy")).contains("default-src 'self'");
        Response asset = given().get("/swagger-ui/swagger-ui-bundle.js");
        assertThat(asset.statusCode()).isEqualTo(200);
        assertSecurityHeaders(asset);
    }

    @Nested
    class ActuatorExposure {
        @ParameterizedTest(name = "{0} is not exposed")
        @CsvSource(textBlock = """
                /actuator/env
                /actuator/beans
                /actuator/configprops
                /actuator/mappings
                /actuator/metrics
                /actuator/loggers
                /actuator/threaddump
                /actuator/heapdump
                /actuator/shutdown
                /actuator/conditions
                /actuator/scheduledtasks
                /actuator/sbom
                """)
        void otherEndpointIsANotFoundProblem(String path) {
            given().get(path).then().statusCode(404).contentType("application/problem+json");
            given().contentType(ContentType.JSON).body("{}").post(path).then()
                    .statusCode(org.hamcrest.Matchers.oneOf(404, 405));
        }

        @Test
        void actuatorIndexListsOnlyHealthInfoAndPrometheus() {
            Map<String, Object> links = given().get("/actuator").then().statusCode(200)
                    .extract().jsonPath().getMap("_links");
            assertThat(links.keySet()).allMatch(k -> k.equals("self") || k.startsWith("health")
                    || k.equals("info") || k.equals("prometheus"));
            assertThat(links).containsKeys("health", "info", "prometheus");
        }

        @Test
        void healthHasLivenessAndReadinessAndNoDetails() {
            given().get("/actuator/health").then().statusCode(200)
                    .body("status", equalTo("UP"))
                    .body("groups", org.hamcrest.Matchers.hasItems("liveness", "readiness"))
                    .body("components", org.hamcrest.Matchers.nullValue());
        }

        @Test
        void prometheusScrapesTheRequestAndJvmMetrics() {
            given().contentType(ContentType.JSON).body("{\"bit_depth\": 8}").post(QUANTIZATION);
            given().get("/actuator/prometheus").then().statusCode(200)
                    .contentType(startsWith("text/plain"))
                    .body(containsString("utdigit_requests_total"))
                    .body(containsString("jvm_memory_used_bytes"));
        }
    }
}
