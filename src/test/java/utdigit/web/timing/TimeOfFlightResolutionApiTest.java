package utdigit.web.timing;

import static org.assertj.core.api.Assertions.assertThat;
import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItem;
import static org.hamcrest.Matchers.hasItems;
import static org.hamcrest.Matchers.hasKey;
import static org.hamcrest.Matchers.not;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ObjectNode;
import utdigit.web.support.ApiTest;

class TimeOfFlightResolutionApiTest extends ApiTest {
    private static final String PATH = "/api/time-of-flight-resolutions";
    private static final JsonMapper JSON = JsonMapper.builder().build();
    /** Inches are converted with 25.4 mm/in exactly; a few ulps of rounding remain. */
    private static final double MIRROR_TOLERANCE = 1e-12;
    /** The hand-worked TOFD values are checked against their closed forms evaluated here. */
    private static final double TOFD_TOLERANCE_MM = 1e-9;

    /**
     * The TOFD case worked by hand (our own numbers), Charlesworth &amp; Temple geometry (Engineering
     * Applications of Ultrasonic Time-of-Flight Diffraction, 2nd ed., 2.3.4, read second-hand):
     * probes symmetric about the tip, PCS = 2S = 60 mm, so S = 30 mm; tip depth d = 40 mm; v = 6000
     * m/s = 6 mm/us; fs = 100 MHz, so dt = 0.01 us; pulse duration tp = 0.1 us; thickness T = 50 mm.
     * <pre>
     *   one leg R = sqrt(S^2 + d^2) = sqrt(900 + 1600) = 50 mm
     *   tip signal t = 2 R / v = 100 / 6 = 16.667 us;  lateral wave t_L = 2S / v = 60 / 6 = 10 us
     *   one sample adds v dt / 2 = 0.03 mm to one leg: d' = sqrt(50.03^2 - 30^2) = sqrt(1603.0009)
     *     = 40.037494, so the depth step is 0.037494 mm (the linearised v dt R / (2d) = 0.0375 mm
     *     is a little high: d(t) is concave)
     *   tp adds v tp / 2 = 0.3 mm to one leg:
     *     near-surface dead zone sqrt(30.3^2 - 30^2) = sqrt(18.09) = 4.2532 mm
     *     pulse-limited resolution sqrt(50.3^2 - 30^2) - 40 = sqrt(1630.09) - 40 = 0.37437 mm
     *     back wall: R_T = sqrt(30^2 + 50^2) = 58.3095; 50 - sqrt(58.0095^2 - 30^2) = 50 - 49.64982
     *       = 0.35018 mm (dead-zone formulas from memory, same geometry)
     *   sound path per sample over both legs v dt = 0.06 mm
     * </pre>
     */
    private static final String HAND_WORKED_TOFD = """
            {"sampling_frequency_mhz": 100, "velocity_m_per_s": 6000, "technique": "TOFD",
             "probe_centre_separation_mm": 60, "depth_mm": 40, "thickness_mm": 50, "pulse_duration_us": 0.1}""";

    @Test
    @DisplayName("pulse-echo straight beam: one sample is v dt/2 of sound path (definition)")
    void pulseEchoStraightBeamOneSampleIsHalfTheRoundTripPath() {
        // dt = 1 / 100 MHz = 10 ns; one way of the round trip: 5920 m/s x 10 ns / 2 = 0.0296 mm.
        post(PATH, "{\"sampling_frequency_mhz\": 100, \"velocity_m_per_s\": 5920}")
                .statusCode(200)
                .body("time_resolution_ns", closeTo(10.0, 1e-12))
                // one quantized instant: worst case dt/2, standard uncertainty dt/sqrt(12) (rectangular,
                // JCGM 100:2008 4.3.7)
                .body("timing_error_ns", closeTo(5.0, 1e-12))
                .body("timing_standard_uncertainty_ns", closeTo(10.0 / Math.sqrt(12), 1e-12))
                .body("sound_path_resolution_mm", closeTo(5920e3 * 10e-9 / 2, 1e-15))
                .body("$", not(hasKey("depth_resolution_mm")))
                .body("$", not(hasKey("surface_distance_resolution_mm")))
                .body("$", not(hasKey("lateral_wave_time_us")))
                .body("$", not(hasKey("time_of_flight_us")))
                .body("$", not(hasKey("dead_zone_depth_mm")))
                .body("$", not(hasKey("pulse_duration_used_us")))
                .body("inputs.technique", equalTo("PULSE_ECHO"))
                .body("inputs.decimation_factor", equalTo(1))
                .body("inputs.velocity_m_per_s", closeTo(5920.0, 0.0))
                .body("inputs", not(hasKey("time_reference")))
                .body("velocity_source.kind", equalTo("CALLER"))
                .body("stamp.calculation", equalTo("time-of-flight-resolutions"))
                .body("stamp.sha256", org.hamcrest.Matchers.matchesPattern("[0-9a-f]{64}"));
    }

    @Test
    @DisplayName("decimation by m stretches the stored sample to m / fs (definition)")
    void decimationStretchesTheSampleInterval() {
        // 200 MHz / 4 = 50 MHz stored: dt = 20 ns; 5920 m/s x 20 ns / 2 = 0.0592 mm.
        post(PATH, "{\"sampling_frequency_mhz\": 200, \"decimation_factor\": 4, \"velocity_m_per_s\": 5920}")
                .statusCode(200)
                .body("time_resolution_ns", closeTo(20.0, 1e-12))
                .body("sound_path_resolution_mm", closeTo(5920e3 * 20e-9 / 2, 1e-15))
                .body("inputs.decimation_factor", equalTo(4));
    }

    @Test
    @DisplayName("angle beam, carbon-steel SHEAR: depth x cos(theta), surface distance x sin(theta)")
    void angleBeamInCarbonSteelShearSplitsThePathByTheAngle() {
        // Shear velocity of carbon-steel: 3255 m/s, the ISO 22232-2 steel reference value of the
        // material table. dt = 10 ns; path v dt/2 = 0.016275 mm; at 60 deg: cos 60 = 1/2,
        // sin 60 = sqrt(3)/2 (geometry of the refracted ray).
        double pathMm = 3255e3 * 10e-9 / 2;
        post(PATH, """
                {"sampling_frequency_mhz": 100, "material": "carbon-steel", "wave_mode": "SHEAR",
                 "refracted_angle_deg": 60}""")
                .statusCode(200)
                .body("sound_path_resolution_mm", closeTo(pathMm, pathMm * 1e-12))
                .body("depth_resolution_mm", closeTo(pathMm / 2, pathMm * 1e-12))
                .body("surface_distance_resolution_mm", closeTo(pathMm * Math.sqrt(3) / 2, pathMm * 1e-12))
                .body("velocity_source.kind", equalTo("MATERIAL"))
                .body("velocity_source.material", equalTo("carbon-steel"))
                .body("velocity_source.wave_mode", equalTo("SHEAR"))
                .body("velocity_source.velocity_m_per_s", closeTo(3255.0, 0.0))
                .body("inputs.velocity_m_per_s", closeTo(3255.0, 0.0))
                .body("inputs", not(hasKey("material")))
                .body("inputs", not(hasKey("wave_mode")))
                .body("inputs.refracted_angle_deg", closeTo(60.0, 0.0));
    }

    @Test
    void materialAndItsVelocityAsANumberGiveTheSameAnswer() throws IOException {
        JsonNode byMaterial = answer("""
                {"sampling_frequency_mhz": 100, "material": "carbon-steel", "wave_mode": "SHEAR",
                 "refracted_angle_deg": 45}""");
        JsonNode byNumber = answer("""
                {"sampling_frequency_mhz": 100, "velocity_m_per_s": 3255, "refracted_angle_deg": 45}""");
        assertThat(withoutStampAndSource(byNumber)).isEqualTo(withoutStampAndSource(byMaterial));
    }

    @Test
    @DisplayName("straight beam at 0 deg: the depth is the whole path, no surface distance")
    void zeroDegreeAngleIsAllDepth() {
        post(PATH, "{\"sampling_frequency_mhz\": 100, \"velocity_m_per_s\": 5920, \"refracted_angle_deg\": 0}")
                .statusCode(200)
                .body("depth_resolution_mm", closeTo(5920e3 * 10e-9 / 2, 1e-15))
                .body("surface_distance_resolution_mm", closeTo(0.0, 0.0));
    }

    @Test
    @DisplayName("through-transmission: one sample is v dt of sound path (definition)")
    void throughTransmissionOneSampleIsTheWholePath() {
        // 25 MHz: dt = 40 ns; one-way path 2730 m/s x 40 ns = 0.1092 mm.
        post(PATH, """
                {"sampling_frequency_mhz": 25, "velocity_m_per_s": 2730, "technique": "THROUGH_TRANSMISSION"}""")
                .statusCode(200)
                .body("time_resolution_ns", closeTo(40.0, 1e-12))
                .body("timing_error_ns", closeTo(20.0, 1e-12))
                .body("sound_path_resolution_mm", closeTo(2730e3 * 40e-9, 1e-15))
                .body("inputs.technique", equalTo("THROUGH_TRANSMISSION"))
                .body("inputs", not(hasKey("time_reference")));
    }

    @Test
    @DisplayName("TOFD worked by hand: arrivals, depth step, pulse-limited resolution, dead zones")
    void tofdCaseWorkedByHand() {
        double r = Math.sqrt(30 * 30 + 40 * 40); // 50 mm
        double rT = Math.sqrt(30 * 30 + 50 * 50);
        post(PATH, HAND_WORKED_TOFD)
                .statusCode(200)
                .body("lateral_wave_time_us", closeTo(2 * 30 / 6.0, 1e-12))
                .body("time_of_flight_us", closeTo(2 * r / 6.0, 1e-12))
                .body("time_of_flight_us", closeTo(16.667, 0.001))
                .body("sound_path_resolution_mm", closeTo(6.0 * 0.01, 1e-15))
                .body("depth_resolution_mm", closeTo(Math.sqrt(50.03 * 50.03 - 30 * 30) - 40, TOFD_TOLERANCE_MM))
                .body("depth_resolution_mm", closeTo(0.037494, 1e-6))
                .body("pulse_duration_used_us", closeTo(0.1, 0.0))
                .body("dead_zone_depth_mm", closeTo(Math.sqrt(30.3 * 30.3 - 30 * 30), TOFD_TOLERANCE_MM))
                .body("dead_zone_depth_mm", closeTo(4.2532, 1e-4))
                .body("pulse_limited_depth_resolution_mm",
                        closeTo(Math.sqrt(50.3 * 50.3 - 30 * 30) - 40, TOFD_TOLERANCE_MM))
                .body("pulse_limited_depth_resolution_mm", closeTo(0.37437, 1e-5))
                .body("backwall_dead_zone_mm",
                        closeTo(50 - Math.sqrt((rT - 0.3) * (rT - 0.3) - 30 * 30), TOFD_TOLERANCE_MM))
                .body("backwall_dead_zone_mm", closeTo(0.35018, 1e-5))
                // from the trigger (default): one quantized instant
                .body("timing_error_ns", closeTo(5.0, 1e-12))
                .body("timing_standard_uncertainty_ns", closeTo(10.0 / Math.sqrt(12), 1e-12))
                .body("$", not(hasKey("surface_distance_resolution_mm")))
                .body("warnings.code", not(hasItem("DEPTH_IN_DEAD_ZONE")))
                .body("warnings.code", not(hasItem("DEPTH_IN_BACKWALL_DEAD_ZONE")))
                .body("inputs.technique", equalTo("TOFD"))
                .body("inputs.time_reference", equalTo("TRIGGER"))
                .body("inputs.decimation_factor", equalTo(1))
                // the issue asks the references to state the PCS sensitivity and the off-centre-line reading
                .body("references.topic", hasItem(containsString("dd/dS = -S/d")))
                .body("references.topic", hasItem("flaw off the centre line"));
    }

    @Test
    @DisplayName("TOFD depth step is below the linearised slope v dt sqrt(S^2 + d^2)/(2d) (d(t) is concave)")
    void tofdDepthStepIsBelowTheLinearisedSlope() {
        double linearisedMm = 0.01 * 6.0 * 50 / (2 * 40); // 0.0375 mm
        post(PATH, HAND_WORKED_TOFD)
                .statusCode(200)
                .body("depth_resolution_mm", org.hamcrest.Matchers.lessThan(linearisedMm))
                .body("depth_resolution_mm", org.hamcrest.Matchers.greaterThan(linearisedMm * 0.999));
    }

    @Test
    @DisplayName("TOFD timed from the lateral wave: a difference of two instants, dt and dt/sqrt(6)")
    void tofdFromTheLateralWaveIsADifferenceOfTwoInstants() {
        // Two independent rectangular errors of width dt: triangular of half-width dt, standard
        // uncertainty dt/sqrt(6) (JCGM 100:2008 4.3.9); worst case dt.
        post(PATH, """
                {"sampling_frequency_mhz": 100, "velocity_m_per_s": 6000, "technique": "TOFD",
                 "probe_centre_separation_mm": 60, "time_reference": "LATERAL_WAVE"}""")
                .statusCode(200)
                .body("timing_error_ns", closeTo(10.0, 1e-12))
                .body("timing_standard_uncertainty_ns", closeTo(10.0 / Math.sqrt(6), 1e-12))
                .body("lateral_wave_time_us", closeTo(10.0, 1e-12))
                .body("$", not(hasKey("time_of_flight_us")))
                .body("$", not(hasKey("dead_zone_depth_mm")))
                .body("inputs.time_reference", equalTo("LATERAL_WAVE"));
    }

    @Test
    @DisplayName("TOFD pulse duration from frequency and bandwidth: the Gaussian model's -20 dB envelope duration")
    void tofdPulseDurationFromTheProbeModel() {
        // scipy.signal.gausspulse parameterisation (bwr = -6 dB): envelope exp(-a t^2) with
        // a = (pi f B)^2 / (4 ln 10^(6/20)); it falls to -20 dB (0.1) at t = sqrt(ln 10 / a), so the
        // -20 dB duration is 2 sqrt(ln 10 / a): 0.53526 us for 5 MHz and 60 %.
        double a = Math.pow(Math.PI * 5 * 0.6, 2) / (4 * Math.log(Math.pow(10, 6.0 / 20)));
        double tpUs = 2 * Math.sqrt(Math.log(10) / a);
        double legGrowthMm = 6.0 * tpUs / 2;
        post(PATH, """
                {"sampling_frequency_mhz": 100, "velocity_m_per_s": 6000, "technique": "TOFD",
                 "probe_centre_separation_mm": 60, "frequency_mhz": 5, "bandwidth_percent": 60}""")
                .statusCode(200)
                .body("pulse_duration_used_us", closeTo(tpUs, 1e-9))
                .body("pulse_duration_used_us", closeTo(0.53526, 1e-5))
                .body("dead_zone_depth_mm", closeTo(Math.sqrt(Math.pow(30 + legGrowthMm, 2) - 30 * 30), 1e-8))
                .body("inputs.frequency_mhz", closeTo(5.0, 0.0))
                .body("inputs.bandwidth_percent", closeTo(60.0, 0.0));
    }

    @Test
    @DisplayName("a depth inside the near-surface dead zone is answered with a warning")
    void depthInsideTheDeadZoneWarns() {
        // dead zone 4.2532 mm (hand-worked case above); a tip at 2 mm is hidden by the lateral wave.
        post(PATH, """
                {"sampling_frequency_mhz": 100, "velocity_m_per_s": 6000, "technique": "TOFD",
                 "probe_centre_separation_mm": 60, "depth_mm": 2, "pulse_duration_us": 0.1}""")
                .statusCode(200)
                .body("warnings.code", hasItem("DEPTH_IN_DEAD_ZONE"));
    }

    @Test
    @DisplayName("inch and in/us mirrors give the same answer as mm and m/s (25.4 mm/in exactly)")
    void inchMirrorsGiveTheSameAnswer() throws IOException {
        JsonNode metric = answer(HAND_WORKED_TOFD);
        JsonNode inch = answer("{\"sampling_frequency_mhz\": 100, \"velocity_in_per_us\": " + (6000 / 25400.0)
                + ", \"technique\": \"TOFD\", \"probe_centre_separation_in\": " + (60 / 25.4)
                + ", \"depth_in\": " + (40 / 25.4) + ", \"thickness_in\": " + (50 / 25.4)
                + ", \"pulse_duration_us\": 0.1}");
        for (String field : List.of("time_resolution_ns", "timing_error_ns", "timing_standard_uncertainty_ns",
                "sound_path_resolution_mm", "depth_resolution_mm", "lateral_wave_time_us", "time_of_flight_us",
                "pulse_limited_depth_resolution_mm", "dead_zone_depth_mm", "backwall_dead_zone_mm",
                "pulse_duration_used_us")) {
            double expected = metric.get(field).doubleValue();
            assertThat(inch.get(field).doubleValue()).as(field)
                    .isCloseTo(expected, org.assertj.core.data.Offset.offset(Math.abs(expected) * MIRROR_TOLERANCE));
        }
        JsonNode inputs = inch.get("inputs");
        assertThat(inputs.get("probe_centre_separation_mm").doubleValue()).isCloseTo(60.0,
                org.assertj.core.data.Offset.offset(60 * MIRROR_TOLERANCE));
        assertThat(inputs.get("depth_mm").doubleValue()).isCloseTo(40.0,
                org.assertj.core.data.Offset.offset(40 * MIRROR_TOLERANCE));
        assertThat(inputs.get("velocity_m_per_s").doubleValue()).isCloseTo(6000.0,
                org.assertj.core.data.Offset.offset(6000 * MIRROR_TOLERANCE));
        assertThat(inputs.has("probe_centre_separation_in")).isFalse();
        assertThat(inputs.has("depth_in")).isFalse();
        assertThat(inputs.has("thickness_in")).isFalse();
        assertThat(inputs.has("velocity_in_per_us")).isFalse();
    }

    @Test
    void inputsAreAValidRequestThatReproducesTheAnswer() throws IOException {
        JsonNode first = answer("""
                {"sampling_frequency_mhz": 80, "decimation_factor": 2, "material": "carbon-steel",
                 "technique": "TOFD", "probe_centre_separation_in": 2.25, "depth_in": 0.5, "thickness_in": 1,
                 "frequency_mhz": 7.5, "bandwidth_percent": 65}""");
        JsonNode second = answer(first.get("inputs").toString());
        assertThat(withoutStampAndSource(second)).isEqualTo(withoutStampAndSource(first));
    }

    @Test
    void theApiExampleIsAnswered() throws IOException {
        String example = Files.readString(Path.of("api-examples", "time-of-flight-resolutions.json"));
        post(PATH, example).statusCode(200).body("inputs.technique", equalTo("TOFD"))
                .body("$", hasKey("backwall_dead_zone_mm"));
    }

    @Nested
    class Rejected {
        @Test
        void angleOfNinetyDegrees() {
            assertInvalid(PATH, """
                    {"sampling_frequency_mhz": 100, "velocity_m_per_s": 3255, "refracted_angle_deg": 90}""",
                    "/refracted_angle_deg").body("type", equalTo("/problems/invalid-input"));
        }

        @Test
        void negativeAngle() {
            assertInvalid(PATH, """
                    {"sampling_frequency_mhz": 100, "velocity_m_per_s": 3255, "refracted_angle_deg": -1}""",
                    "/refracted_angle_deg");
        }

        @Test
        void tofdWithoutProbeCentreSeparation() {
            assertInvalid(PATH, """
                    {"sampling_frequency_mhz": 100, "velocity_m_per_s": 5920, "technique": "TOFD", "depth_mm": 10}""",
                    "/probe_centre_separation_mm")
                    .body("errors.detail", hasItem(containsString("required for technique TOFD")));
        }

        @Test
        void probeCentreSeparationInBothUnits() {
            assertInvalid(PATH, """
                    {"sampling_frequency_mhz": 100, "velocity_m_per_s": 5920, "technique": "TOFD",
                     "probe_centre_separation_mm": 60, "probe_centre_separation_in": 2.4}""",
                    "/probe_centre_separation_mm")
                    .body("errors.pointer", hasItem("/probe_centre_separation_in"));
        }

        @ParameterizedTest(name = "{0}")
        @CsvSource(delimiter = '|', textBlock = """
                depth_mm 0        | "depth_mm": 0      | /depth_mm
                depth_mm negative | "depth_mm": -3     | /depth_mm
                depth_in 0        | "depth_in": 0      | /depth_in
                depth_in negative | "depth_in": -0.125 | /depth_in
                """)
        void depthNotAboveZero(String what, String depth, String pointer) {
            assertInvalid(PATH, "{\"sampling_frequency_mhz\": 100, \"velocity_m_per_s\": 5920, \"technique\": "
                    + "\"TOFD\", \"probe_centre_separation_mm\": 60, " + depth + "}", pointer);
        }

        @Test
        void depthBelowTheBackWallIsImpossible() {
            post(PATH, """
                    {"sampling_frequency_mhz": 100, "velocity_m_per_s": 5920, "technique": "TOFD",
                     "probe_centre_separation_mm": 60, "depth_mm": 30, "thickness_mm": 25}""")
                    .statusCode(422)
                    .contentType("application/problem+json")
                    .body("type", equalTo("/problems/impossible-combination"))
                    .body("errors.pointer", hasItems("/depth_mm", "/thickness_mm"));
        }

        @Test
        void depthBelowTheBackWallInInchesPointsAtTheInchFields() {
            post(PATH, """
                    {"sampling_frequency_mhz": 100, "velocity_m_per_s": 5920, "technique": "TOFD",
                     "probe_centre_separation_mm": 60, "depth_in": 1.25, "thickness_in": 1}""")
                    .statusCode(422)
                    .body("errors.pointer", hasItems("/depth_in", "/thickness_in"))
                    .body("errors.pointer", not(hasItem("/depth_mm")));
        }

        @ParameterizedTest(name = "{0}")
        @CsvSource(delimiter = '|', textBlock = """
                separation in mm, default PULSE_ECHO        | "probe_centre_separation_mm": 60                    | /probe_centre_separation_mm
                separation in inches, PULSE_ECHO            | "technique": "PULSE_ECHO", "probe_centre_separation_in": 2.4 | /probe_centre_separation_in
                depth with PULSE_ECHO                       | "depth_mm": 10                                      | /depth_mm
                depth in inches with PULSE_ECHO             | "depth_in": 0.4                                     | /depth_in
                thickness in inches, THROUGH_TRANSMISSION   | "technique": "THROUGH_TRANSMISSION", "thickness_in": 1 | /thickness_in
                pulse duration with PULSE_ECHO              | "pulse_duration_us": 0.2                            | /pulse_duration_us
                frequency with PULSE_ECHO                   | "frequency_mhz": 5, "bandwidth_percent": 60         | /frequency_mhz
                lateral-wave reference with PULSE_ECHO      | "time_reference": "LATERAL_WAVE"                    | /time_reference
                refracted angle with TOFD                   | "technique": "TOFD", "probe_centre_separation_mm": 60, "refracted_angle_deg": 60 | /refracted_angle_deg
                refracted angle with THROUGH_TRANSMISSION   | "technique": "THROUGH_TRANSMISSION", "refracted_angle_deg": 45 | /refracted_angle_deg
                pulse duration twice with TOFD              | "technique": "TOFD", "probe_centre_separation_mm": 60, "pulse_duration_us": 0.2, "frequency_mhz": 5, "bandwidth_percent": 60 | /pulse_duration_us
                frequency without bandwidth with TOFD       | "technique": "TOFD", "probe_centre_separation_mm": 60, "frequency_mhz": 5 | /bandwidth_percent
                bandwidth without frequency with TOFD       | "technique": "TOFD", "probe_centre_separation_mm": 60, "bandwidth_percent": 60 | /frequency_mhz
                """)
        void inputThatDoesNotApplyToTheTechnique(String what, String fields, String pointer) {
            assertInvalid(PATH, "{\"sampling_frequency_mhz\": 100, \"velocity_m_per_s\": 5920, " + fields + "}",
                    pointer).body("type", equalTo("/problems/inapplicable-input"));
        }

        @ParameterizedTest(name = "{0}")
        @CsvSource(delimiter = '|', textBlock = """
                sampling frequency missing      | "velocity_m_per_s": 5920                                        | /sampling_frequency_mhz
                sampling frequency zero         | "sampling_frequency_mhz": 0, "velocity_m_per_s": 5920           | /sampling_frequency_mhz
                sampling frequency too high     | "sampling_frequency_mhz": 100001, "velocity_m_per_s": 5920      | /sampling_frequency_mhz
                decimation zero                 | "sampling_frequency_mhz": 100, "decimation_factor": 0, "velocity_m_per_s": 5920 | /decimation_factor
                decimation above the bound      | "sampling_frequency_mhz": 100, "decimation_factor": 65537, "velocity_m_per_s": 5920 | /decimation_factor
                decimation fraction             | "sampling_frequency_mhz": 100, "decimation_factor": 1.5, "velocity_m_per_s": 5920 | /decimation_factor
                velocity missing                | "sampling_frequency_mhz": 100                                   | /velocity_m_per_s
                velocity too low                | "sampling_frequency_mhz": 100, "velocity_m_per_s": 99           | /velocity_m_per_s
                velocity in/us above the range  | "sampling_frequency_mhz": 100, "velocity_in_per_us": 1          | /velocity_in_per_us
                two velocity sources            | "sampling_frequency_mhz": 100, "velocity_m_per_s": 5920, "material": "carbon-steel" | /material
                unknown material                | "sampling_frequency_mhz": 100, "material": "unobtainium"        | /material
                wave mode without material      | "sampling_frequency_mhz": 100, "velocity_m_per_s": 5920, "wave_mode": "SHEAR" | /wave_mode
                unknown technique               | "sampling_frequency_mhz": 100, "velocity_m_per_s": 5920, "technique": "PITCH_CATCH" | /technique
                pulse duration zero             | "sampling_frequency_mhz": 100, "velocity_m_per_s": 5920, "technique": "TOFD", "probe_centre_separation_mm": 60, "pulse_duration_us": 0 | /pulse_duration_us
                separation above 100 m in inches | "sampling_frequency_mhz": 100, "velocity_m_per_s": 5920, "technique": "TOFD", "probe_centre_separation_in": 4000 | /probe_centre_separation_in
                bandwidth of 200 percent        | "sampling_frequency_mhz": 100, "velocity_m_per_s": 5920, "technique": "TOFD", "probe_centre_separation_mm": 60, "frequency_mhz": 5, "bandwidth_percent": 200 | /bandwidth_percent
                """)
        void invalidField(String what, String fields, String pointer) {
            assertInvalid(PATH, "{" + fields + "}", pointer);
        }

        @Test
        @DisplayName("the velocity fields' shared annotations (VelocityFields) give each its Bean Validation range")
        void velocityFieldRanges() {
            // The contract's ranges: velocity 100 to 20000 m/s, in/us above 0, water 0 to 95 C; the details are
            // Bean Validation's own messages, which the service's range checks after conversion do not write.
            assertInvalid(PATH, "{\"sampling_frequency_mhz\": 100, \"velocity_m_per_s\": 20001}", "/velocity_m_per_s")
                    .body("errors.detail", hasItem("must be less than or equal to 20000"));
            assertInvalid(PATH, "{\"sampling_frequency_mhz\": 100, \"velocity_in_per_us\": 0}", "/velocity_in_per_us")
                    .body("errors.detail", hasItem("must be greater than 0"));
            assertInvalid(PATH, "{\"sampling_frequency_mhz\": 100, \"material\": \"water\", \"temperature_c\": 96}",
                    "/temperature_c").body("errors.detail", hasItem("must be less than or equal to 95"));
        }

        @Test
        void shearWaveInWaterIsImpossible() {
            post(PATH, """
                    {"sampling_frequency_mhz": 100, "material": "water", "wave_mode": "SHEAR"}""")
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
