package utdigit.web.support;

import static io.restassured.RestAssured.given;

import io.restassured.RestAssured;
import io.restassured.config.JsonConfig;
import io.restassured.config.RestAssuredConfig;
import io.restassured.http.ContentType;
import io.restassured.path.json.config.JsonPathConfig;
import io.restassured.response.ValidatableResponse;
import org.junit.jupiter.api.BeforeEach;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.web.server.LocalServerPort;

/**
 * Base of the HTTP tests: the whole service on a random port, REST Assured with JSON numbers read
 * as doubles (its default reads floats, which would hide differences in the 8th digit).
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
public abstract class ApiTest {
    /** Relative tolerance for values compared with their closed form. */
    protected static final double CLOSED_FORM_TOLERANCE = 1e-12;

    @LocalServerPort
    protected int port;

    @BeforeEach
    void configureRestAssured() {
        RestAssured.port = port;
        RestAssured.config = RestAssuredConfig.config()
                .jsonConfig(JsonConfig.jsonConfig().numberReturnType(JsonPathConfig.NumberReturnType.DOUBLE));
    }

    /** POST a JSON body to an /api path. */
    protected static ValidatableResponse post(String path, String json) {
        return given().contentType(ContentType.JSON).accept(ContentType.JSON).body(json)
                .when().post(path).then();
    }

    /** Asserts a 400 problem+json whose errors include {@code pointer}. */
    protected static ValidatableResponse assertInvalid(String path, String json, String pointer) {
        return post(path, json).statusCode(400)
                .contentType("application/problem+json")
                .body("type", org.hamcrest.Matchers.startsWith("/problems/"))
                .body("errors.pointer", org.hamcrest.Matchers.hasItem(pointer));
    }
}
