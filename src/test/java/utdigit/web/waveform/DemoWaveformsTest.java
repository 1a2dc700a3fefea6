package utdigit.web.waveform;

import static io.restassured.RestAssured.given;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.hamcrest.Matchers.containsString;

import io.restassured.path.json.JsonPath;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;
import utdigit.web.support.ApiTest;

/**
 * The demo shop's synthesised probe waveforms (demo-data/waveforms) answer as JSON and as a figure,
 * and their CSV form (time_ns,amplitude) gives the JSON form's figures: the rate read from the time
 * column equals the request's record_sampling_frequency_mhz to the rounding of the 0.1 ns times.
 */
class DemoWaveformsTest extends ApiTest {
    private static final Path DIR = Path.of("demo-data", "waveforms");
    private static final String PATH = "/api/waveform-analyses";

    @TestFactory
    Stream<DynamicTest> everyDemoWaveformAnswersJsonSvgAndCsv() throws IOException {
        List<Path> requests;
        try (Stream<Path> files = Files.list(DIR)) {
            requests = files.filter(f -> f.toString().endsWith(".json")).sorted().toList();
        }
        assertThat(requests).hasSizeGreaterThanOrEqualTo(4);
        return requests.stream().map(file -> DynamicTest.dynamicTest(file.getFileName().toString(), () -> {
            String body = Files.readString(file);
            JsonPath json = post(PATH, body).statusCode(200).extract().jsonPath();
            given().contentType("application/json").accept("image/svg+xml").body(body).post(PATH).then()
                    .statusCode(200).body(containsString("Measured spectrum"));
            String csv = Files.readString(Path.of(file.toString().replace(".json", ".csv")));
            JsonPath fromCsv = given().contentType("text/csv").accept("application/json").body(csv)
                    .queryParam("sampling_frequency_mhz", json.getDouble("inputs.sampling_frequency_mhz"))
                    .queryParam("decimation_factor", json.getInt("inputs.decimation_factor"))
                    .queryParam("amplitude_tolerance_db", json.getDouble("inputs.amplitude_tolerance_db"))
                    .post(PATH).then().statusCode(200).extract().jsonPath();
            for (String field : List.of("centre_frequency_mhz", "bandwidth_percent", "pulse_amplitude_loss_db",
                    "model_pulse_amplitude_loss_db", "required_sampling_frequency_pulse_mhz")) {
                assertThat(fromCsv.getDouble(field)).as(field)
                        .isCloseTo(json.getDouble(field), within(1e-6 * StrictMath.abs(json.getDouble(field))));
            }
        }));
    }
}
