package utdigit.web.waveform;

import static io.restassured.RestAssured.given;
import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import utdigit.web.support.ApiTest;

/**
 * The README's figure, api-examples/waveform-analyses.svg, is the service's figure for
 * api-examples/waveform-analyses.json: its text (caption, titles, axis labels, markers) must be the
 * served figure's. Only that text is compared: the drawing's coordinates and the axes' tick spacing
 * follow the platform's font metrics. Rewritten with the other example answers:
 * {@code mvn -B test -Dtest='ExamplesTest,WaveformFigureExampleTest' -Dexamples.regenerate=true}.
 */
class WaveformFigureExampleTest extends ApiTest {
    private static final Path REQUEST = Path.of("api-examples", "waveform-analyses.json");
    private static final Path FIGURE = Path.of("api-examples", "waveform-analyses.svg");

    @Test
    void theCommittedFigureCarriesTheServedFiguresText() throws Exception {
        String served = given().contentType("application/json").accept("image/svg+xml")
                .body(Files.readString(REQUEST)).post("/api/waveform-analyses").then().statusCode(200)
                .extract().asString();
        if (Boolean.getBoolean("examples.regenerate")) {
            Files.writeString(FIGURE, served, StandardCharsets.UTF_8);
            return;
        }
        assertThat(texts(Files.readString(FIGURE))).as("the text of " + FIGURE + "; if the change is intended, "
                + "regenerate: mvn -B test -Dtest='ExamplesTest,WaveformFigureExampleTest' -Dexamples.regenerate=true")
                .isEqualTo(texts(served));
    }

    private static List<String> texts(String svg) {
        Matcher m = Pattern.compile("<text[^>]*>([^<]*)</text>").matcher(svg);
        List<String> texts = new ArrayList<>();
        while (m.find()) {
            if (!m.group(1).matches("-?[0-9.,]+")) {
                texts.add(m.group(1)); // tick labels follow the platform's font metrics
            }
        }
        return texts;
    }
}
