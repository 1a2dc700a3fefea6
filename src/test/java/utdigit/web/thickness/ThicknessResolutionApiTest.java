package utdigit.web.thickness;

import static org.assertj.core.api.Assertions.assertThat;
import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItem;
import static org.hamcrest.Matchers.hasKey;
import static org.hamcrest.Matchers.not;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.assertj.core.data.Offset;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ObjectNode;
import utdigit.web.support.ApiTest;

class ThicknessResolutionApiTest extends ApiTest {
    private static final String PATH = "/api/thickness-resolutions";
    private static final JsonMapper JSON = JsonMapper.builder().build();
    /** Inches are converted with 25.4 mm/in exactly; a few ulps of rounding remain. */
    private static final double MIRROR_TOLERANCE = 1e-12;
    /** Closed forms evaluated here against the service's, mm. */
    private static final double ALLOWED_ERROR_MM = 1e-12;

    @Test
    @DisplayName("first echo, worked by hand: resolution v dt/2 and the GUM combination (JCGM 100:2008 eq. 10)")
    void firstEchoCaseWorkedByHand() {
        // Our own case: fs = 100 MHz (dt = 10 ns = 0.01 us), v = 5920 m/s = 5.92 mm/us, d = 10 mm,
        // velocity standard uncertainty 1 % (59.2 m/s = 0.0592 mm/us).
        //   resolution v dt / 2 = 5.92 x 0.01 / 2 = 0.0296 mm (0.0296 / 25.4 in); relative 0.296 %
        //   round trip 2d / v = 20 / 5.92 = 3.3784 us; samples across it 3.3784 x 100 = 337.84
        //   timing (one quantized instant): u_t = dt / sqrt(12) = 2.8868 ns, worst case dt / 2 = 5 ns
        //   JCGM 100:2008 eq. 10 for d = v t / 2: c_v = t / 2 = 1.6892 us, c_t = v / 2 = 2.96 mm/us
        //     c_v u_v = 1.6892 x 0.0592 = 0.1 mm;  c_t u_t = 2.96 x 0.0028868 = 0.0085448 mm
        //     u_d = sqrt(0.1^2 + 0.0085448^2) = 0.100364 mm;  U = 2 u_d = 0.200729 mm
        double tUs = 2 * 10 / 5.92;
        double velocityTermMm = tUs / 2 * 0.0592;
        double samplingTermMm = 5.92 / 2 * (0.01 / Math.sqrt(12));
        double uMm = Math.sqrt(velocityTermMm * velocityTermMm + samplingTermMm * samplingTermMm);
        post(PATH, """
                {"sampling_frequency_mhz": 100, "velocity_m_per_s": 5920, "nominal_thickness_mm": 10,
                 "velocity_uncertainty_percent": 1}""")
                .statusCode(200)
                .body("thickness_resolution_mm", closeTo(5.92 * 0.01 / 2, ALLOWED_ERROR_MM))
                .body("thickness_resolution_in", closeTo(5.92 * 0.01 / 2 / 25.4, ALLOWED_ERROR_MM))
                .body("round_trip_time_us", closeTo(tUs, 1e-12))
                .body("samples_across_thickness", closeTo(tUs * 100, 1e-9))
                .body("relative_resolution_percent", closeTo(0.296, 1e-12))
                .body("timing_standard_uncertainty_ns", closeTo(10 / Math.sqrt(12), 1e-12))
                .body("timing_worst_case_error_ns", closeTo(5.0, 1e-12))
                .body("standard_uncertainty_mm", closeTo(uMm, ALLOWED_ERROR_MM))
                .body("standard_uncertainty_mm", closeTo(0.100364, 1e-6))
                .body("expanded_uncertainty_mm", closeTo(2 * uMm, ALLOWED_ERROR_MM))
                .body("$", not(hasKey("required_sampling_frequency_mhz")))
                .body("warnings.code", not(hasItem("VELOCITY_UNCERTAINTY_ZERO")))
                .body("warnings.code", not(hasItem("SAMPLING_TERM_DOMINATES")))
                .body("inputs.measurement", equalTo("FIRST_ECHO"))
                .body("inputs.echo_spacing", equalTo(1))
                .body("inputs.decimation_factor", equalTo(1))
                .body("inputs.coverage_factor", closeTo(2.0, 0.0))
                .body("inputs.velocity_uncertainty_percent", closeTo(1.0, 0.0))
                .body("inputs", not(hasKey("velocity_uncertainty_m_per_s")))
                .body("inputs.nominal_thickness_mm", closeTo(10.0, 0.0))
                .body("velocity_source.kind", equalTo("CALLER"))
                .body("stamp.calculation", equalTo("thickness-resolutions"));
    }

    @Test
    @DisplayName("echo to echo, m = 2, worked by hand in the GUM relative form (u_d/d)^2 = (u_v/v)^2 + (u_t/t)^2")
    void echoToEchoCaseWorkedByHand() {
        // Our own case: fs = 50 MHz (dt = 20 ns), v = 5920 m/s, d = 8 mm, echoes m = 2 round trips
        // apart, u_v = 10 m/s, k = 3.
        //   resolution v dt / (2m) = 5.92 x 0.02 / 4 = 0.0296 mm; one round trip 16 / 5.92 = 2.7027 us
        //   measured time t = m x 2d / v = 5.4054 us
        //   a difference of two quantized instants: u_t = dt / sqrt(6) = 8.165 ns (triangular,
        //   JCGM 100:2008 4.3.9), worst case dt = 20 ns
        //   d = v t / (2m) is a product of powers, so (JCGM 100:2008 5.1.6)
        //     (u_d / d)^2 = (10 / 5920)^2 + (0.008165 / 5.4054)^2 = (0.0016892)^2 + (0.0015105)^2
        //     u_d / d = 0.0022661, u_d = 0.018128 mm, U = 3 u_d = 0.054385 mm
        double tUs = 2 * 2 * 8 / 5.92;
        double utUs = 0.02 / Math.sqrt(6);
        double uMm = 8 * Math.sqrt(Math.pow(10 / 5920.0, 2) + Math.pow(utUs / tUs, 2));
        post(PATH, """
                {"sampling_frequency_mhz": 50, "velocity_m_per_s": 5920, "nominal_thickness_mm": 8,
                 "measurement": "ECHO_TO_ECHO", "echo_spacing": 2, "velocity_uncertainty_m_per_s": 10,
                 "coverage_factor": 3}""")
                .statusCode(200)
                .body("thickness_resolution_mm", closeTo(5.92 * 0.02 / 4, ALLOWED_ERROR_MM))
                .body("round_trip_time_us", closeTo(16 / 5.92, 1e-12))
                .body("samples_across_thickness", closeTo(16 / 5.92 * 50, 1e-9))
                .body("timing_standard_uncertainty_ns", closeTo(20 / Math.sqrt(6), 1e-12))
                .body("timing_worst_case_error_ns", closeTo(20.0, 1e-12))
                .body("standard_uncertainty_mm", closeTo(uMm, ALLOWED_ERROR_MM))
                .body("standard_uncertainty_mm", closeTo(0.018128, 1e-6))
                .body("expanded_uncertainty_mm", closeTo(3 * uMm, 3 * ALLOWED_ERROR_MM))
                .body("inputs.measurement", equalTo("ECHO_TO_ECHO"))
                .body("inputs.echo_spacing", equalTo(2))
                .body("inputs.coverage_factor", closeTo(3.0, 0.0))
                .body("inputs.velocity_uncertainty_m_per_s", closeTo(10.0, 0.0))
                .body("inputs", not(hasKey("velocity_uncertainty_percent")));
    }

    @Test
    @DisplayName("no velocity uncertainty: the sampling alone, and warnings saying so")
    void withoutVelocityUncertaintyTheSamplingAloneRemains() {
        // u_d = (v/2) dt/sqrt(12): 5.92 / 2 x 0.01 / sqrt(12) mm; the rectangular term dominates, so
        // k = 2 is not a 95 % coverage (JCGM 100:2008 4.3.7: 2u = 0.577 dt > the dt/2 bound).
        double uMm = 5.92 / 2 * 0.01 / Math.sqrt(12);
        post(PATH, "{\"sampling_frequency_mhz\": 100, \"velocity_m_per_s\": 5920, \"nominal_thickness_mm\": 10}")
                .statusCode(200)
                .body("standard_uncertainty_mm", closeTo(uMm, ALLOWED_ERROR_MM))
                .body("expanded_uncertainty_mm", closeTo(2 * uMm, ALLOWED_ERROR_MM))
                .body("warnings.code", hasItem("VELOCITY_UNCERTAINTY_ZERO"))
                .body("warnings.code", hasItem("SAMPLING_TERM_DOMINATES"))
                .body("inputs", not(hasKey("velocity_uncertainty_m_per_s")))
                .body("inputs", not(hasKey("velocity_uncertainty_percent")));
    }

    @Test
    @DisplayName("required resolution r: raw rate m_dec x v / (2 m r), and a warning when coarser (definition)")
    void requiredResolutionGivesTheSamplingFrequencyToSet() {
        // 100 MHz / 2 = 50 MHz stored: resolution 5.92 x 0.02 / 2 = 0.0592 mm, coarser than 0.05 mm.
        // Stored rate needed 5.92 / (2 x 0.05) = 59.2 MHz; raw rate with decimation 2: 118.4 MHz.
        post(PATH, """
                {"sampling_frequency_mhz": 100, "decimation_factor": 2, "velocity_m_per_s": 5920,
                 "nominal_thickness_mm": 10, "required_resolution_mm": 0.05}""")
                .statusCode(200)
                .body("thickness_resolution_mm", closeTo(0.0592, ALLOWED_ERROR_MM))
                .body("required_sampling_frequency_mhz", closeTo(2 * 5.92 / (2 * 0.05), 1e-9))
                .body("warnings.code", hasItem("RESOLUTION_COARSER_THAN_REQUIRED"))
                .body("inputs.required_resolution_mm", closeTo(0.05, 0.0))
                .body("inputs.decimation_factor", equalTo(2));
        post(PATH, """
                {"sampling_frequency_mhz": 100, "decimation_factor": 2, "velocity_m_per_s": 5920,
                 "nominal_thickness_mm": 10, "required_resolution_mm": 0.1}""")
                .statusCode(200)
                .body("warnings.code", not(hasItem("RESOLUTION_COARSER_THAN_REQUIRED")));
    }

    @Test
    @DisplayName("inch and in/us mirrors give the same answer as mm and m/s (25.4 mm/in exactly)")
    void inchMirrorsGiveTheSameAnswer() throws IOException {
        JsonNode metric = answer("""
                {"sampling_frequency_mhz": 40, "velocity_m_per_s": 5920.74, "nominal_thickness_mm": 12.7,
                 "required_resolution_mm": 0.0508, "velocity_uncertainty_percent": 0.5}""");
        JsonNode inch = answer("""
                {"sampling_frequency_mhz": 40, "velocity_in_per_us": 0.2331, "nominal_thickness_in": 0.5,
                 "required_resolution_in": 0.002, "velocity_uncertainty_percent": 0.5}""");
        for (String field : List.of("thickness_resolution_mm", "thickness_resolution_in", "round_trip_time_us",
                "samples_across_thickness", "relative_resolution_percent", "timing_standard_uncertainty_ns",
                "timing_worst_case_error_ns", "standard_uncertainty_mm", "expanded_uncertainty_mm",
                "required_sampling_frequency_mhz")) {
            double expected = metric.get(field).doubleValue();
            assertThat(inch.get(field).doubleValue()).as(field)
                    .isCloseTo(expected, Offset.offset(Math.abs(expected) * MIRROR_TOLERANCE));
        }
        JsonNode inputs = inch.get("inputs");
        assertThat(inputs.get("nominal_thickness_mm").doubleValue()).isCloseTo(12.7, Offset.offset(12.7e-12));
        assertThat(inputs.get("required_resolution_mm").doubleValue()).isCloseTo(0.0508, Offset.offset(0.0508e-12));
        assertThat(inputs.get("velocity_m_per_s").doubleValue()).isCloseTo(5920.74, Offset.offset(5920.74e-12));
        assertThat(inputs.has("nominal_thickness_in")).isFalse();
        assertThat(inputs.has("required_resolution_in")).isFalse();
        assertThat(inputs.has("velocity_in_per_us")).isFalse();
    }

    @Test
    @DisplayName("a wall thinner than the probe model's axial resolution v tau(-6 dB)/2 is answered with a warning")
    void thicknessBelowAxialResolutionWarns() {
        // Gaussian model, scipy.signal.gausspulse parameterisation: envelope exp(-a t^2) with
        // a = (pi f B)^2 / (4 L), L = ln 10^(6/20); it is down 6 dB at t = 2L / (pi f B), so the -6 dB
        // duration is 4L / (pi f B) = 0.87952 us for 2 MHz and 50 %; wall echoes 2d/v apart overlap below
        // d = 5.92 x 0.87952 / 2 = 2.6034 mm: 2.5 mm is inside it, 4 mm (inside v tau = 5.21 mm) is not.
        double axialResolutionMm = 5.92 * 4 * Math.log(Math.pow(10, 6.0 / 20)) / (Math.PI * 2 * 0.5) / 2;
        assertThat(axialResolutionMm).isBetween(2.5, 4.0);
        post(PATH, """
                {"sampling_frequency_mhz": 100, "velocity_m_per_s": 5920, "nominal_thickness_mm": 2.5,
                 "frequency_mhz": 2, "bandwidth_percent": 50}""")
                .statusCode(200)
                .body("warnings.code", hasItem("THICKNESS_BELOW_AXIAL_RESOLUTION"))
                .body("inputs.frequency_mhz", closeTo(2.0, 0.0))
                .body("inputs.bandwidth_percent", closeTo(50.0, 0.0));
        post(PATH, """
                {"sampling_frequency_mhz": 100, "velocity_m_per_s": 5920, "nominal_thickness_mm": 4,
                 "frequency_mhz": 2, "bandwidth_percent": 50}""")
                .statusCode(200)
                .body("warnings.code", not(hasItem("THICKNESS_BELOW_AXIAL_RESOLUTION")));
    }

    @Test
    void materialVelocityIsUsedAndEchoedAsANumber() {
        // carbon-steel longitudinal: 5920 m/s, the ISO 22232-2 steel reference value of the material table.
        post(PATH, "{\"sampling_frequency_mhz\": 100, \"material\": \"carbon-steel\", \"nominal_thickness_mm\": 10}")
                .statusCode(200)
                .body("thickness_resolution_mm", closeTo(5.92 * 0.01 / 2, ALLOWED_ERROR_MM))
                .body("velocity_source.kind", equalTo("MATERIAL"))
                .body("velocity_source.wave_mode", equalTo("LONGITUDINAL"))
                .body("inputs.velocity_m_per_s", closeTo(5920.0, 0.0))
                .body("inputs", not(hasKey("material")));
    }

    @Test
    void inputsAreAValidRequestThatReproducesTheAnswer() throws IOException {
        JsonNode first = answer("""
                {"sampling_frequency_mhz": 60, "decimation_factor": 3, "material": "stainless-steel-347",
                 "nominal_thickness_in": 0.375, "measurement": "ECHO_TO_ECHO", "velocity_uncertainty_percent": 0.8,
                 "required_resolution_in": 0.001, "frequency_mhz": 10, "bandwidth_percent": 70}""");
        JsonNode second = answer(first.get("inputs").toString());
        assertThat(withoutStampAndSource(second)).isEqualTo(withoutStampAndSource(first));
        JsonNode bare = answer("{\"sampling_frequency_mhz\": 100, \"velocity_m_per_s\": 5920, "
                + "\"nominal_thickness_mm\": 10}");
        assertThat(withoutStampAndSource(answer(bare.get("inputs").toString())))
                .isEqualTo(withoutStampAndSource(bare));
    }

    @Test
    void theApiExampleIsAnswered() throws IOException {
        String example = Files.readString(Path.of("api-examples", "thickness-resolutions.json"));
        post(PATH, example).statusCode(200).body("$", hasKey("required_sampling_frequency_mhz"));
    }

    @Nested
    class Rejected {
        private static final String BASE = "\"sampling_frequency_mhz\": 100, \"velocity_m_per_s\": 5920, "
                + "\"nominal_thickness_mm\": 10";

        @Test
        void echoSpacingZero() {
            assertInvalid(PATH, "{" + BASE + ", \"measurement\": \"ECHO_TO_ECHO\", \"echo_spacing\": 0}",
                    "/echo_spacing").body("type", equalTo("/problems/invalid-input"));
        }

        @Test
        void echoSpacingFraction() {
            assertInvalid(PATH, "{" + BASE + ", \"measurement\": \"ECHO_TO_ECHO\", \"echo_spacing\": 1.5}",
                    "/echo_spacing");
        }

        @Test
        void echoSpacingWithFirstEchoDoesNotApply() {
            assertInvalid(PATH, "{" + BASE + ", \"echo_spacing\": 2}", "/echo_spacing")
                    .body("type", equalTo("/problems/inapplicable-input"));
        }

        @Test
        void bothVelocityUncertaintyForms() {
            assertInvalid(PATH, "{" + BASE + ", \"velocity_uncertainty_m_per_s\": 20, "
                    + "\"velocity_uncertainty_percent\": 0.5}", "/velocity_uncertainty_m_per_s")
                    .body("errors.pointer", hasItem("/velocity_uncertainty_percent"))
                    .body("errors.detail", hasItem(containsString("not both")));
        }

        @Test
        void velocityUncertaintyAboveTwentyPercentOfTheVelocity() {
            // 20 % of carbon-steel's 5920 m/s is 1184 m/s
            assertInvalid(PATH, "{\"sampling_frequency_mhz\": 100, \"material\": \"carbon-steel\", "
                    + "\"nominal_thickness_mm\": 10, \"velocity_uncertainty_m_per_s\": 1200}",
                    "/velocity_uncertainty_m_per_s").body("errors.detail", hasItem(containsString("1184")));
        }

        @Test
        void nominalThicknessInBothUnits() {
            assertInvalid(PATH, "{\"sampling_frequency_mhz\": 100, \"velocity_m_per_s\": 5920, "
                    + "\"nominal_thickness_mm\": 10, \"nominal_thickness_in\": 0.4}", "/nominal_thickness_mm")
                    .body("errors.pointer", hasItem("/nominal_thickness_in"));
        }

        @ParameterizedTest(name = "{0}")
        @CsvSource(delimiter = '|', textBlock = """
                nominal thickness missing         | "sampling_frequency_mhz": 100, "velocity_m_per_s": 5920 | /nominal_thickness_mm
                nominal thickness zero            | "sampling_frequency_mhz": 100, "velocity_m_per_s": 5920, "nominal_thickness_mm": 0 | /nominal_thickness_mm
                nominal thickness in inches <= 0  | "sampling_frequency_mhz": 100, "velocity_m_per_s": 5920, "nominal_thickness_in": -1 | /nominal_thickness_in
                nominal thickness over 100 m      | "sampling_frequency_mhz": 100, "velocity_m_per_s": 5920, "nominal_thickness_in": 4000 | /nominal_thickness_in
                sampling frequency missing        | "velocity_m_per_s": 5920, "nominal_thickness_mm": 10 | /sampling_frequency_mhz
                sampling frequency too high       | "sampling_frequency_mhz": 100001, "velocity_m_per_s": 5920, "nominal_thickness_mm": 10 | /sampling_frequency_mhz
                velocity missing                  | "sampling_frequency_mhz": 100, "nominal_thickness_mm": 10 | /velocity_m_per_s
                decimation zero                   | "sampling_frequency_mhz": 100, "decimation_factor": 0, "velocity_m_per_s": 5920, "nominal_thickness_mm": 10 | /decimation_factor
                uncertainty percent above 20      | "sampling_frequency_mhz": 100, "velocity_m_per_s": 5920, "nominal_thickness_mm": 10, "velocity_uncertainty_percent": 20.5 | /velocity_uncertainty_percent
                uncertainty m/s negative          | "sampling_frequency_mhz": 100, "velocity_m_per_s": 5920, "nominal_thickness_mm": 10, "velocity_uncertainty_m_per_s": -1 | /velocity_uncertainty_m_per_s
                coverage factor below 1           | "sampling_frequency_mhz": 100, "velocity_m_per_s": 5920, "nominal_thickness_mm": 10, "coverage_factor": 0.9 | /coverage_factor
                coverage factor above 5           | "sampling_frequency_mhz": 100, "velocity_m_per_s": 5920, "nominal_thickness_mm": 10, "coverage_factor": 5.5 | /coverage_factor
                required resolution in inches 0   | "sampling_frequency_mhz": 100, "velocity_m_per_s": 5920, "nominal_thickness_mm": 10, "required_resolution_in": 0 | /required_resolution_in
                echo spacing above the bound      | "sampling_frequency_mhz": 100, "velocity_m_per_s": 5920, "nominal_thickness_mm": 10, "measurement": "ECHO_TO_ECHO", "echo_spacing": 65537 | /echo_spacing
                unknown measurement               | "sampling_frequency_mhz": 100, "velocity_m_per_s": 5920, "nominal_thickness_mm": 10, "measurement": "BACKWALL" | /measurement
                """)
        void invalidField(String what, String fields, String pointer) {
            assertInvalid(PATH, "{" + fields + "}", pointer);
        }

        @ParameterizedTest(name = "{0}")
        @CsvSource(delimiter = '|', textBlock = """
                frequency without bandwidth | "frequency_mhz": 5        | /bandwidth_percent
                bandwidth without frequency | "bandwidth_percent": 60   | /frequency_mhz
                """)
        void halfOfThePulseModelDoesNotApply(String what, String field, String pointer) {
            assertInvalid(PATH, "{" + BASE + ", " + field + "}", pointer)
                    .body("type", equalTo("/problems/inapplicable-input"));
        }

        @Test
        void shearWaveInWaterIsImpossible() {
            post(PATH, "{\"sampling_frequency_mhz\": 100, \"material\": \"water\", \"wave_mode\": \"SHEAR\", "
                    + "\"nominal_thickness_mm\": 10}")
                    .statusCode(422)
                    .body("type", equalTo("/problems/impossible-combination"))
                    .body("errors.pointer", hasItem("/wave_mode"));
        }
    }

    private static JsonNode answer(String body) throws IOException {
        return JSON.readTree(post(PATH, body).statusCode(200).extract().asString());
    }

    /** The answer without the stamp and the velocity's origin, which differ between equivalent requests. */
    private static JsonNode withoutStampAndSource(JsonNode answer) {
        ObjectNode copy = ((ObjectNode) answer).deepCopy();
        copy.remove("stamp");
        copy.remove("velocity_source");
        return copy;
    }
}
