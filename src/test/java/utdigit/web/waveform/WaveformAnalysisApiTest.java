package utdigit.web.waveform;

import static io.restassured.RestAssured.given;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItem;

import io.restassured.path.json.JsonPath;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;
import utdigit.core.pulse.GaussianPulse;
import utdigit.web.support.ApiTest;

/**
 * POST /api/waveform-analyses over HTTP: JSON and CSV bodies, JSON and SVG answers, bounded input,
 * batch rows. The physics is checked in utdigit.core.waveform; here the contract, and that the
 * figure's caption and labels carry the JSON answer's numbers.
 */
class WaveformAnalysisApiTest extends ApiTest {
    private static final String PATH = "/api/waveform-analyses";
    private static final double RECORD_MHZ = 100.0;

    /** A Gaussian pulse (scipy.signal.gausspulse parameterisation) of 5 MHz, 60 %, 400 samples at 100 MHz. */
    private static double[] gaussianRecord() {
        GaussianPulse g = GaussianPulse.of(5.0, 0.6);
        double[] x = new double[400];
        for (int i = 0; i < x.length; i++) {
            x[i] = 0.8 * g.amplitude((i - 200.25) / RECORD_MHZ);
        }
        return x;
    }

    private static String samples(double[] x) {
        StringBuilder b = new StringBuilder("[");
        for (int i = 0; i < x.length; i++) {
            b.append(i == 0 ? "" : ",").append(x[i]);
        }
        return b.append(']').toString();
    }

    private static String body(double[] x, String more) {
        return "{\"samples\":" + samples(x) + ",\"record_sampling_frequency_mhz\":" + RECORD_MHZ + more + "}";
    }

    @Test
    void aGaussianRecordAnswersItsBandAndTheModelBesideIt() {
        JsonPath a = post(PATH, body(gaussianRecord(), ",\"sampling_frequency_mhz\":25,\"amplitude_tolerance_db\":1"))
                .statusCode(200).extract().jsonPath();
        // Closed form of the model (scipy.signal.gausspulse parameterisation): -6 dB edges fc(1 -/+ bw/2).
        assertThat(a.getDouble("lower_frequency_mhz")).isCloseTo(3.5, within(0.01));
        assertThat(a.getDouble("upper_frequency_mhz")).isCloseTo(6.5, within(0.01));
        assertThat(a.getDouble("bandwidth_percent")).isCloseTo(60.0, within(0.2));
        // n = fs/fc = 25/5 (definition); the loss beside the model's (same calculator as sampling-assessments).
        assertThat(a.getDouble("samples_per_period")).isCloseTo(5.0, within(0.01));
        assertThat(a.getDouble("pulse_amplitude_loss_db")).isCloseTo(a.getDouble("model_pulse_amplitude_loss_db"),
                within(0.005));
        assertThat(a.getString("inputs.decimation_mode")).isEqualTo("DROP");
        assertThat(a.getString("inputs.peak_reading")).isEqualTo("ABSOLUTE");
        assertThat(a.getString("inputs.centre_frequency_convention")).isEqualTo("ARITHMETIC");
        assertThat(a.getString("stamp.calculation")).isEqualTo("waveform-analyses");
        assertThat(a.getList("samples")).isNull();
    }

    @Test
    void withoutATargetTheTargetFiguresAreOmitted() {
        JsonPath a = post(PATH, body(gaussianRecord(), "")).statusCode(200).extract().jsonPath();
        assertThat(a.getMap("$")).doesNotContainKeys("samples_per_period", "pulse_amplitude_loss_db",
                "model_pulse_amplitude_loss_db", "required_sampling_frequency_pulse_mhz");
        assertThat(a.getMap("inputs")).doesNotContainKeys("decimation_factor", "peak_reading");
    }

    @Test
    void theSvgFigureCarriesTheAnswersNumbers() throws Exception {
        String request = body(gaussianRecord(), ",\"sampling_frequency_mhz\":25,\"amplitude_tolerance_db\":1");
        String json = post(PATH, request).statusCode(200).extract().asString();
        String svg = given().contentType("application/json").accept("image/svg+xml").body(request).post(PATH)
                .then().statusCode(200).contentType(containsString("image/svg+xml")).extract().asString();
        java.nio.file.Files.writeString(java.nio.file.Path.of("target", "waveform-figure-test.svg"), svg);
        assertThat(svg).contains("<svg").contains("Time, µs").contains("Frequency, MHz").contains("Level, dB re peak")
                .contains("Recorded pulse and envelope").contains("Measured spectrum");
        JsonNode a = JsonMapper.builder().build().readTree(json);
        String text = svgText(svg);
        // Each caption figure, parsed back, agrees with the JSON answer to its 4 significant digits.
        checkNumber(text, "worst-case loss ([-0-9.e+]+) dB", a.get("pulse_amplitude_loss_db").doubleValue());
        checkNumber(text, "Gaussian model ([-0-9.e+]+) dB\\)", a.get("model_pulse_amplitude_loss_db").doubleValue());
        checkNumber(text, "-6 dB band ([-0-9.e+]+) to", a.get("lower_frequency_mhz").doubleValue());
        checkNumber(text, "centre ([-0-9.e+]+) MHz", a.get("centre_frequency_mhz").doubleValue());
        checkNumber(text, "bandwidth ([-0-9.e+]+) %", a.get("bandwidth_percent").doubleValue());
        checkNumber(text, "-6 dB duration ([-0-9.e+]+) us", a.get("pulse_duration_6db_us").doubleValue());
        checkNumber(text, "Rate for 1.000 dB: ([-0-9.e+]+) MHz", a.get("required_sampling_frequency_pulse_mhz").doubleValue());
        checkNumber(text, "([-0-9.e+]+) samples per period", a.get("samples_per_period").doubleValue());
        checkNumber(text, "target Nyquist ([-0-9.e+]+) MHz", a.get("nyquist_frequency_mhz").doubleValue());
        checkNumber(text, "fu -6 dB ([-0-9.e+]+)", a.get("upper_frequency_mhz").doubleValue());
    }

    /** The text content of every {@code <text>} element, joined by new lines (XML entities decoded). */
    private static String svgText(String svg) {
        Matcher m = Pattern.compile("<text[^>]*>([^<]*)</text>").matcher(svg);
        List<String> texts = new ArrayList<>();
        while (m.find()) {
            texts.add(m.group(1).replace("&lt;", "<").replace("&gt;", ">").replace("&amp;", "&"));
        }
        return String.join("\n", texts);
    }

    private static void checkNumber(String text, String regex, double expected) {
        Matcher m = Pattern.compile(regex).matcher(text);
        assertThat(m.find()).as("'" + regex + "' in the figure's text:\n" + text).isTrue();
        double shown = Double.parseDouble(m.group(1));
        assertThat(shown).as(regex).isCloseTo(expected, within(StrictMath.abs(expected) * 5e-4 + 1e-300));
    }

    @Test
    void aCsvOfOneColumnTakesTheRateAsAQueryParameterAndAnswersAsJson() {
        double[] x = gaussianRecord();
        StringBuilder csv = new StringBuilder("amplitude\r\n");
        for (double v : x) {
            csv.append(v).append("\r\n");
        }
        JsonPath fromCsv = given().contentType("text/csv").accept("application/json").body(csv.toString())
                .queryParam("record_sampling_frequency_mhz", RECORD_MHZ).queryParam("sampling_frequency_mhz", 25)
                .post(PATH).then().statusCode(200).extract().jsonPath();
        JsonPath fromJson = post(PATH, body(x, ",\"sampling_frequency_mhz\":25")).statusCode(200).extract().jsonPath();
        assertThat(fromCsv.getDouble("pulse_amplitude_loss_db")).isEqualTo(fromJson.getDouble("pulse_amplitude_loss_db"));
        assertThat(fromCsv.getString("stamp.sha256")).isEqualTo(fromJson.getString("stamp.sha256"));
    }

    @Test
    void aCsvWithATimeColumnTakesTheRateFromTheTimes() {
        double[] x = gaussianRecord();
        StringBuilder csv = new StringBuilder("time_ns,amplitude\n");
        for (int i = 0; i < x.length; i++) {
            csv.append(String.format(Locale.ROOT, "%.1f,%s%n", i * 10.0, x[i]));
        }
        JsonPath a = given().contentType("text/csv").accept("application/json").body(csv.toString())
                .post(PATH).then().statusCode(200).extract().jsonPath();
        // 10 ns steps: 100 MHz (definition).
        assertThat(a.getDouble("inputs.record_sampling_frequency_mhz")).isCloseTo(100.0, within(1e-9));
        given().contentType("text/csv").accept("application/json").body(csv.toString())
                .queryParam("record_sampling_frequency_mhz", 100).post(PATH).then().statusCode(400)
                .body("errors.pointer", hasItem("/record_sampling_frequency_mhz"));
        String uneven = csv.toString().replace("\n30.0,", "\n31.0,");
        given().contentType("text/csv").accept("application/json").body(uneven).post(PATH).then().statusCode(400)
                .body("errors.pointer", hasItem("/samples/3"));
        given().contentType("text/csv").accept("application/json").body(csv.toString().replace("\n50.0,", "\n50.0,x"))
                .post(PATH).then().statusCode(400).body("errors.pointer", hasItem("/samples/5"));
    }

    @Test
    void boundedInputIsRefusedAtItsField() {
        assertInvalid(PATH, body(new double[15], ""), "/samples");
        assertInvalid(PATH, body(new double[8193], ""), "/samples");
        assertInvalid(PATH, body(new double[64], ""), "/samples");          // all zero
        double[] constant = new double[64];
        java.util.Arrays.fill(constant, 3.0);
        assertInvalid(PATH, body(constant, ""), "/samples");                // a DC offset alone
        assertInvalid(PATH, body(gaussianRecord(), "").replace("100.0}", "0}"), "/record_sampling_frequency_mhz");
        assertInvalid(PATH, body(gaussianRecord(), ",\"sampling_frequency_mhz\":100001"), "/sampling_frequency_mhz");
        assertInvalid(PATH, body(gaussianRecord(), ",\"peak_reading\":\"ABSOLUTE\""), "/peak_reading");
        assertInvalid(PATH, body(gaussianRecord(), ",\"amplitude_tolerance_db\":1"), "/amplitude_tolerance_db");
        String withNull = body(gaussianRecord(), "").replaceFirst("\\[[^,]*,", "[0.0,null,");
        assertInvalid(PATH, withNull, "/samples/1");
        String withNan = body(gaussianRecord(), "").replaceFirst("\\[[^,]*,", "[0.0,\"NaN\",");
        post(PATH, withNan).statusCode(400);
    }

    @Test
    void anUndersampledRecordIsRefused() {
        // A 5 MHz, 60 % pulse recorded at 12 MHz: its band reaches past 0.8 of 6 MHz.
        GaussianPulse g = GaussianPulse.of(5.0, 0.6);
        double[] x = new double[128];
        for (int i = 0; i < x.length; i++) {
            x[i] = g.amplitude((i - 64) / 12.0);
        }
        post(PATH, "{\"samples\":" + samples(x) + ",\"record_sampling_frequency_mhz\":12}").statusCode(422)
                .body("detail", containsString("Nyquist"));
    }

    @Test
    void aFigureRequestWithBadInputAnswersAProblem() {
        given().contentType("application/json").accept("image/svg+xml").body(body(new double[15], "")).post(PATH)
                .then().statusCode(400).contentType("application/problem+json")
                .body("errors.pointer", hasItem("/samples"));
    }

    @Test
    void anUnservedFormatNamesTheServedOnesInOneOrder() {
        // The two formats the operation produces, always in the same (alphabetical) order: Spring's list
        // of producible types follows a hash order that changed between starts of the same build.
        given().contentType("application/json").accept("text/plain").body(body(gaussianRecord(), "")).post(PATH)
                .then().statusCode(406).contentType("application/problem+json")
                .body("detail", containsString("it produces application/json, image/svg+xml"));
    }

    @Test
    void batchesTakeWaveformRows() {
        String row = body(gaussianRecord(), ",\"sampling_frequency_mhz\":25");
        String ndjson = row + "\n" + body(new double[3], "") + "\n";
        String answer = given().contentType("application/x-ndjson").accept("application/x-ndjson").body(ndjson.getBytes(java.nio.charset.StandardCharsets.UTF_8))
                .post(PATH + "/batch").then().statusCode(200).extract().asString();
        String[] lines = answer.strip().split("\n");
        assertThat(lines).hasSize(2);
        JsonPath first = JsonPath.from(lines[0])
                .using(new io.restassured.path.json.config.JsonPathConfig(
                        io.restassured.path.json.config.JsonPathConfig.NumberReturnType.DOUBLE));
        assertThat(first.getString("status")).isEqualTo("OK");
        assertThat(first.getString("result.stamp.calculation")).isEqualTo("waveform-analyses");
        double single = post(PATH, row).statusCode(200).extract().jsonPath().getDouble("pulse_amplitude_loss_db");
        assertThat(first.getDouble("result.pulse_amplitude_loss_db")).isEqualTo(single);
        assertThat(JsonPath.from(lines[1]).getString("status")).isEqualTo("INVALID");
    }

    @Test
    void stampVerificationReproducesAWaveformAnswer() {
        String answer = post(PATH, body(gaussianRecord(), ",\"sampling_frequency_mhz\":25")).statusCode(200)
                .extract().asString();
        post("/api/stamp-verifications", "{\"document\":" + answer + "}").statusCode(200)
                .body("content_intact", equalTo(true)).body("reproducible", equalTo(true));
    }

    @Test
    void geometricConventionGivesTheGeometricCentre() {
        JsonPath a = post(PATH, body(gaussianRecord(), ",\"centre_frequency_convention\":\"GEOMETRIC\""))
                .statusCode(200).extract().jsonPath();
        double fl = a.getDouble("lower_frequency_mhz");
        double fu = a.getDouble("upper_frequency_mhz");
        // GEOMETRIC fc = sqrt(fl fu) (EN 12668-2 / ISO 22232-2, from memory); BW = (fu - fl)/fc.
        assertThat(a.getDouble("centre_frequency_mhz")).isCloseTo(StrictMath.sqrt(fl * fu), within(1e-12));
        assertThat(a.getDouble("bandwidth_percent")).isCloseTo((fu - fl) / StrictMath.sqrt(fl * fu) * 100, within(1e-9));
        post(PATH, body(gaussianRecord(), "")).body("cycles_6db", closeTo(1.466, 0.01));
    }
}
