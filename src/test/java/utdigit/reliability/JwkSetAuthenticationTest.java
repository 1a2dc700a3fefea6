package utdigit.reliability;

import static io.restassured.RestAssured.given;
import static org.assertj.core.api.Assertions.assertThat;

import com.nimbusds.jose.JWSAlgorithm;
import com.nimbusds.jose.JWSHeader;
import com.nimbusds.jose.crypto.RSASSASigner;
import com.nimbusds.jose.jwk.JWKSet;
import com.nimbusds.jose.jwk.RSAKey;
import com.nimbusds.jwt.JWTClaimsSet;
import com.nimbusds.jwt.SignedJWT;
import com.sun.net.httpserver.HttpServer;
import io.restassured.http.ContentType;
import java.net.InetSocketAddress;
import java.nio.charset.StandardCharsets;
import java.security.KeyPair;
import java.security.KeyPairGenerator;
import java.security.interfaces.RSAPublicKey;
import java.time.Instant;
import java.util.Date;
import java.util.List;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.Test;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.web.server.LocalServerPort;
import org.springframework.test.context.DynamicPropertyRegistry;
import org.springframework.test.context.DynamicPropertySource;

/**
 * Authentication by the service's own settings: utdigit.security.jwt.jwk-set-uri (a JWK set served
 * here on 127.0.0.1 by the test, RFC 7517), issuer-uri's issuer check and audience.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
class JwkSetAuthenticationTest {
    private static final String ISSUER = "https://idp.example.test/realm";
    private static final String AUDIENCE = "ut-digitization";
    private static final KeyPair KEYS;
    private static final HttpServer JWKS;

    static {
        try {
            KeyPairGenerator g = KeyPairGenerator.getInstance("RSA");
            g.initialize(2048);
            KEYS = g.generateKeyPair();
            String jwks = new JWKSet(new RSAKey.Builder((RSAPublicKey) KEYS.getPublic()).keyID("k1").build())
                    .toString();
            JWKS = HttpServer.create(new InetSocketAddress(RawHttp.LOOPBACK, 0), 0);
            JWKS.createContext("/jwks", exchange -> {
                byte[] body = jwks.getBytes(StandardCharsets.UTF_8);
                exchange.getResponseHeaders().add("Content-Type", "application/json");
                exchange.sendResponseHeaders(200, body.length);
                exchange.getResponseBody().write(body);
                exchange.close();
            });
            JWKS.start();
        } catch (Exception e) {
            throw new ExceptionInInitializerError(e);
        }
    }

    @LocalServerPort
    int port;

    @DynamicPropertySource
    static void serviceKeys(DynamicPropertyRegistry registry) {
        registry.add("utdigit.security.jwt.jwk-set-uri",
                () -> "http://127.0.0.1:" + JWKS.getAddress().getPort() + "/jwks");
        registry.add("utdigit.security.jwt.issuer-uri", () -> ISSUER);
        registry.add("utdigit.security.jwt.audience", () -> AUDIENCE);
    }

    @AfterAll
    static void stopJwks() {
        JWKS.stop(0);
    }

    private static String token(String issuer, String audience) throws Exception {
        JWTClaimsSet claims = new JWTClaimsSet.Builder().subject("qa-system").issuer(issuer).audience(List.of(audience))
                .issueTime(Date.from(Instant.now().minusSeconds(5))).expirationTime(Date.from(Instant.now().plusSeconds(600)))
                .build();
        SignedJWT jwt = new SignedJWT(new JWSHeader.Builder(JWSAlgorithm.RS256).keyID("k1").build(), claims);
        jwt.sign(new RSASSASigner(KEYS.getPrivate()));
        return jwt.serialize();
    }

    private int post(String token) {
        var spec = given().port(port).contentType(ContentType.JSON).body("{\"bit_depth\": 8}");
        if (token != null) {
            spec = spec.header("Authorization", "Bearer " + token);
        }
        return spec.post("/api/quantization-assessments").statusCode();
    }

    @Test
    void tokenOfTheIssuerForTheAudienceIsAnswered() throws Exception {
        assertThat(post(token(ISSUER, AUDIENCE))).isEqualTo(200);
    }

    @Test
    void otherIssuerOtherAudienceOrNoTokenIsRefused() throws Exception {
        assertThat(post(token("https://elsewhere.example.test", AUDIENCE))).isEqualTo(401);
        assertThat(post(token(ISSUER, "another-service"))).isEqualTo(401);
        assertThat(post(null)).isEqualTo(401);
    }

    @Test
    void openApiDocumentDeclaresTheBearerScheme() {
        String doc = given().port(port).get("/v3/api-docs").then().statusCode(200).extract().asString();
        assertThat(doc).contains("\"bearer\"").contains("/problems/unauthorized");
    }
}
