package utdigit.reliability;

import static io.restassured.RestAssured.given;
import static org.assertj.core.api.Assertions.assertThat;
import static org.hamcrest.Matchers.equalTo;

import com.nimbusds.jose.JOSEException;
import com.nimbusds.jose.JWSAlgorithm;
import com.nimbusds.jose.JWSHeader;
import com.nimbusds.jose.crypto.RSASSASigner;
import com.nimbusds.jwt.JWTClaimsSet;
import com.nimbusds.jwt.SignedJWT;
import io.restassured.http.ContentType;
import io.restassured.response.Response;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.KeyPair;
import java.security.KeyPairGenerator;
import java.security.NoSuchAlgorithmException;
import java.time.Instant;
import java.util.Base64;
import java.util.Date;
import java.util.Map;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.web.server.LocalServerPort;
import org.springframework.test.context.DynamicPropertyRegistry;
import org.springframework.test.context.DynamicPropertySource;

/**
 * Optional authentication, switched on by a JWT public key (an RSA key pair generated here; the
 * private half signs tokens in the test, the public half is given to the service as a PEM file):
 * /api needs a valid bearer token (RFC 6750), operations endpoints stay open. The same context turns
 * off the OpenAPI document and UI by configuration.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT, properties = {
        "springdoc.api-docs.enabled=false",
        "springdoc.swagger-ui.enabled=false",
        "utdigit.http.body-read-timeout=2s"})
class JwtAuthenticationTest {
    private static final String PATH = "/api/quantization-assessments";
    private static final String BODY = "{\"bit_depth\": 8}";
    private static final KeyPair TRUSTED = rsa();
    private static final KeyPair STRANGER = rsa();

    @LocalServerPort
    int port;

    @DynamicPropertySource
    static void trustTheTestKey(DynamicPropertyRegistry registry) throws Exception {
        Path pem = Files.createTempFile("utdigit-jwt-", ".pem");
        pem.toFile().deleteOnExit();
        String base64 = Base64.getMimeEncoder(64, "\n".getBytes(StandardCharsets.US_ASCII))
                .encodeToString(TRUSTED.getPublic().getEncoded());
        Files.writeString(pem, "-----BEGIN PUBLIC KEY-----\n" + base64 + "\n-----END PUBLIC KEY-----\n");
        registry.add("spring.security.oauth2.resourceserver.jwt.public-key-location", () -> "file:" + pem);
    }

    private static KeyPair rsa() {
        try {
            KeyPairGenerator g = KeyPairGenerator.getInstance("RSA");
            g.initialize(2048);
            return g.generateKeyPair();
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }

    static String token(KeyPair keys, Instant expires) throws JOSEException {
        JWTClaimsSet claims = new JWTClaimsSet.Builder().subject("qa-system")
                .issueTime(Date.from(Instant.now().minusSeconds(5))).expirationTime(Date.from(expires)).build();
        SignedJWT jwt = new SignedJWT(new JWSHeader(JWSAlgorithm.RS256), claims);
        jwt.sign(new RSASSASigner(keys.getPrivate()));
        return jwt.serialize();
    }

    private Response post(String authorization) {
        var spec = given().port(port).contentType(ContentType.JSON).body(BODY);
        if (authorization != null) {
            spec = spec.header("Authorization", authorization);
        }
        return spec.post(PATH);
    }

    @Test
    void validTokenIsAnswered() throws Exception {
        Response r = post("Bearer " + token(TRUSTED, Instant.now().plusSeconds(600)));
        assertThat(r.statusCode()).isEqualTo(200);
        assertThat(r.jsonPath().getInt("levels")).isEqualTo(256);
        assertThat(r.header("Set-Cookie")).as("no session").isNull();
    }

    @Test
    void validTokenWorksForBatchesAndBodiesThatArriveInPieces() throws Exception {
        String bearer = "Bearer " + token(TRUSTED, Instant.now().plusSeconds(600));
        given().port(port).header("Authorization", bearer).contentType("application/x-ndjson").body((BODY + "\n").getBytes(StandardCharsets.UTF_8))
                .post(PATH + "/batch").then().statusCode(200);
        // A body that is not in the first packet goes through the asynchronous read and a second
        // dispatch: the authentication must hold across it.
        try (RawHttp c = new RawHttp(port, 5000)) {
            c.head("POST", PATH, Map.of("Content-Type", "application/json", "Authorization", bearer,
                    "Content-Length", Integer.toString(BODY.length())));
            c.send(BODY.substring(0, 5).getBytes(StandardCharsets.US_ASCII));
            Thread.sleep(300);
            c.send(BODY.substring(5).getBytes(StandardCharsets.US_ASCII));
            assertThat(c.read().status()).isEqualTo(200);
        }
    }

    @Nested
    class Refused {
        void assertUnauthorized(Response r) {
            assertThat(r.statusCode()).isEqualTo(401);
            assertThat(r.contentType()).startsWith("application/problem+json");
            assertThat(r.jsonPath().getString("type")).isEqualTo("/problems/unauthorized");
            assertThat(r.header("WWW-Authenticate")).startsWith("Bearer");
            assertThat(r.header("Cache-Control")).isEqualTo("no-store");
            assertThat(r.asString()).doesNotContain("Exception").doesNotContain("nimbus").doesNotContain("springframework");
        }

        @Test
        void noTokenIsA401Problem() {
            Response r = post(null);
            assertUnauthorized(r);
            assertThat(r.header("WWW-Authenticate")).isEqualTo("Bearer");
        }

        @Test
        void tokenSignedByAnotherKeyIsA401Problem() throws Exception {
            Response r = post("Bearer " + token(STRANGER, Instant.now().plusSeconds(600)));
            assertUnauthorized(r);
            assertThat(r.header("WWW-Authenticate")).contains("invalid_token");
        }

        @Test
        void expiredTokenIsA401Problem() throws Exception {
            assertUnauthorized(post("Bearer " + token(TRUSTED, Instant.now().minusSeconds(3600))));
        }

        @Test
        void unsignedTokenIsA401Problem() {
            String header = Base64.getUrlEncoder().withoutPadding().encodeToString("{\"alg\":\"none\"}".getBytes());
            String claims = Base64.getUrlEncoder().withoutPadding().encodeToString(
                    ("{\"sub\":\"x\",\"exp\":" + (Instant.now().getEpochSecond() + 600) + "}").getBytes());
            assertUnauthorized(post("Bearer " + header + "." + claims + "."));
        }

        @Test
        void garbageAndOtherSchemesAreA401Problem() {
            assertUnauthorized(post("Bearer not-a-jwt"));
            assertUnauthorized(post("Basic dXNlcjpwYXNz"));
        }

        @Test
        void getEndpointsAndBatchesNeedATokenToo() {
            assertUnauthorized(given().port(port).get("/api/materials"));
            assertUnauthorized(given().port(port).contentType("application/x-ndjson").body((BODY + "\n").getBytes(StandardCharsets.UTF_8))
                    .post(PATH + "/batch"));
        }

        @Test
        void refusedCallWithABodyStillSendingIsAnsweredAndClosedWithoutReadingIt() throws Exception {
            try (RawHttp c = new RawHttp(port, 5000)) {
                c.head("POST", PATH, Map.of("Content-Type", "application/json", "Content-Length", "100000"));
                c.send("{".getBytes(StandardCharsets.US_ASCII));
                RawHttp.Answer a = c.read();
                assertThat(a.status()).isEqualTo(401);
                assertThat(c.closedByServer()).isTrue();
            }
        }
    }

    @Nested
    class StillOpen {
        @Test
        void healthAndProbesNeedNoToken() {
            given().port(port).get("/actuator/health").then().statusCode(200).body("status", equalTo("UP"));
            given().port(port).get("/actuator/health/liveness").then().statusCode(200);
            given().port(port).get("/actuator/health/readiness").then().statusCode(200);
            given().port(port).get("/actuator/prometheus").then().statusCode(200);
        }

        @Test
        void openApiDocumentAndUiAreOffByConfiguration() {
            given().port(port).get("/v3/api-docs").then().statusCode(404);
            given().port(port).redirects().follow(false).get("/swagger-ui.html").then().statusCode(404);
            given().port(port).get("/swagger-ui/index.html").then().statusCode(404);
        }
    }
}
