package utdigit.web.sheets;

import static io.restassured.RestAssured.given;
import static org.assertj.core.api.Assertions.assertThat;

import io.restassured.response.Response;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;
import utdigit.web.support.ApiTest;

/**
 * The example sheet answer stays small enough to keep in every row of a batch and every QA record:
 * under half the bytes it took before findings named their rule by id and references their topic by
 * calculation. A size, not a speed: the body as the service writes it (compact JSON, no compression).
 */
class SheetAnswerSizeTest extends ApiTest {
    /** Bytes of the example answer (api-examples/technique-sheet-validations.json) before the change. */
    static final int BYTES_BEFORE = 16_139;

    @Test
    void theExampleSheetAnswerIsUnderHalfItsFormerSize() throws IOException {
        String request = Files.readString(Path.of("api-examples", "technique-sheet-validations.json"));
        Response response = given().contentType("application/json").accept("application/json")
                .header("Accept-Encoding", "identity").body(request).post("/api/technique-sheet-validations");
        assertThat(response.statusCode()).isEqualTo(200);
        byte[] body = response.asByteArray();
        assertThat(body.length).as("bytes of the example sheet answer").isLessThan(BYTES_BEFORE / 2);

        // What an auditor needs to follow the verdict is still there: per finding its profile, rule, metric,
        // the compared value and limit and the outcome; per reference its catalogue id and a topic.
        JsonNode answer = JsonMapper.builder().build().readTree(body);
        assertThat(answer.path("findings").size()).isPositive();
        for (JsonNode f : answer.path("findings")) {
            for (String field : new String[] {"profile_id", "rule_id", "metric", "actual", "limit", "comparison",
                    "verdict"}) {
                assertThat(f.has(field)).as(f + " has " + field).isTrue();
            }
        }
        assertThat(answer.path("references").size()).isPositive();
        for (JsonNode r : answer.path("references")) {
            assertThat(r.path("id").asString()).isNotBlank();
            assertThat(r.path("topic").asString()).isNotBlank();
        }
    }
}
