package utdigit.web.pulse;

import static io.restassured.RestAssured.given;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.offset;
import static org.assertj.core.api.Assertions.withinPercentage;
import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItem;
import static org.hamcrest.Matchers.hasItems;
import static org.hamcrest.Matchers.hasKey;
import static org.hamcrest.Matchers.not;
import static org.hamcrest.Matchers.nullValue;

import io.restassured.path.json.JsonPath;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.special.BesselJ;
import org.hamcrest.Matcher;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import utdigit.web.support.ApiTest;

/**
 * POST /api/pulse-parameters over HTTP. Expected values are written as their derivations, each
 * with its source (src/docs/methods.md, sections 1 and 2).
 */
class PulseParametersApiTest extends ApiTest {
    private static final String PATH = "/api/pulse-parameters";

    /** ISO 22232-2 steel reference values, m/s (the built-in carbon-steel). */
    private static final double STEEL_LONGITUDINAL_M_PER_S = 5920.0;
    private static final double STEEL_SHEAR_M_PER_S = 3255.0;

    /** 1 in = 25.4 mm exactly (international yard and pound agreement, 1959). */
    private static final double MM_PER_IN = 25.4;

    /** Relative error allowed for the beam-spread angles: the constants are solved twice, here and in the core. */
    private static final double SOLVED_CONSTANT_RELATIVE_ERROR = 1e-9;

    // ---- outside references written out in the test ----

    /** Wavelength lambda = v / f (definition): m/s over MHz gives mm. */
    private static double wavelengthMm(double velocityMPerS, double frequencyMhz) {
        return velocityMPerS / 1000.0 / frequencyMhz;
    }

    /** An amplitude ratio of a dB level: -X dB is 10^(-X/20) (src/docs/methods.md 1). */
    private static double ratio(double levelDb) {
        return Math.pow(10.0, levelDb / 20.0);
    }

    /**
     * The envelope constant of scipy.signal.gausspulse (its source): ref = 10^(bwr/20) with
     * bwr = -6, a = -(pi fc bw)^2 / (4 ln ref); the pulse is exp(-a t^2) cos(2 pi fc t), t in us.
     */
    private static double gaussA(double carrierMhz, double fractionalBandwidth) {
        double x = Math.PI * carrierMhz * fractionalBandwidth;
        return -(x * x) / (4.0 * Math.log(ratio(-6.0)));
    }

    /**
     * Offset from the carrier, MHz, at which the Fourier transform of exp(-a t^2), which is
     * sqrt(pi/a) exp(-pi^2 f^2 / a), is L dB below its peak: pi^2 df^2 / a = -ln(10^(-L/20)).
     */
    private static double gaussEdgeOffsetMhz(double a, double levelDb) {
        return Math.sqrt(-a * Math.log(ratio(-levelDb))) / Math.PI;
    }

    /**
     * Full envelope duration, us, at L dB: twice scipy.signal.gausspulse's tpr cut-off time
     * sqrt(-ln(10^(tpr/20)) / a) with tpr = -L.
     */
    private static double gaussDurationUs(double a, double levelDb) {
        return 2.0 * Math.sqrt(-Math.log(ratio(-levelDb)) / a);
    }

    /** Bisection to the last representable bracket: the root of f in [lo, hi], f(lo), f(hi) of opposite sign. */
    private static double bisect(DoubleUnaryOperator f, double lo, double hi) {
        double flo = f.applyAsDouble(lo);
        for (int i = 0; i < 200; i++) {
            double mid = 0.5 * (lo + hi);
            if (mid == lo || mid == hi) {
                break;
            }
            double fm = f.applyAsDouble(mid);
            if ((fm > 0) == (flo > 0)) {
                lo = mid;
                flo = fm;
            } else {
                hi = mid;
            }
        }
        return 0.5 * (lo + hi);
    }

    /** The first zero of J1 (Commons Math BesselJ), bracketed in [3, 4.5]. */
    private static double firstZeroOfJ1() {
        return bisect(x -> BesselJ.value(1.0, x), 3.0, 4.5);
    }

    /** Circular-piston far-field directivity 2 J1(x)/x (Kinsler et al., from memory; J1 from Commons Math). */
    private static double directivity(double x) {
        return 2.0 * BesselJ.value(1.0, x) / x;
    }

    /** Pulse-echo constant k of sin(theta) = k lambda / D: D(pi k)^2 = 10^(-L/20) on the main lobe. */
    private static double twoWayConstant(double levelDb) {
        double level = ratio(-levelDb);
        double x = bisect(v -> {
            double d = directivity(v);
            return d * d - level;
        }, 1e-9, firstZeroOfJ1());
        return x / Math.PI;
    }

    /** Half-angle in degrees of sin(theta) = k lambda / D. */
    private static double halfAngleDeg(double k, double wavelengthMm, double diameterMm) {
        return Math.toDegrees(Math.asin(k * wavelengthMm / diameterMm));
    }

    /** Within a relative error of {@code expected}. */
    private static Matcher<Double> near(double expected, double relativeError) {
        return closeTo(expected, Math.abs(expected) * relativeError);
    }

    private static Matcher<Double> closedForm(double expected) {
        return near(expected, CLOSED_FORM_TOLERANCE);
    }

    /** The answer as a map without its stamp (the stamp's issued-at time may differ between calls). */
    private static Map<String, Object> answerWithoutStamp(String body) {
        Map<String, Object> answer = new HashMap<>(post(PATH, body).statusCode(200).extract().jsonPath().getMap("$"));
        answer.remove("stamp");
        return answer;
    }

    // ---- success ----

    @Test
    void everyFieldOfFiveMegahertzSixtyPercentTenMillimetreProbeOnCarbonSteel() {
        double f = 5.0;
        double bw = 0.60;
        double d = 10.0;
        double v = STEEL_LONGITUDINAL_M_PER_S; // ISO 22232-2 steel reference value
        double lambda = wavelengthMm(v, f); // definition lambda = v / f
        double a = gaussA(f, bw); // scipy.signal.gausspulse; ARITHMETIC: carrier = nominal frequency
        double tau6 = gaussDurationUs(a, 6.0);
        double nearField = d * d / (4.0 * lambda); // N = D^2 / (4 lambda), the trade's formula
        double theta6 = halfAngleDeg(twoWayConstant(6.0), lambda, d);
        double wedgeVelocity = 2730.0;
        double wedgePath = 12.0;
        double distance = 50.0;
        double incident = 10.0;

        post(PATH, """
                {"frequency_mhz": 5, "material": "carbon-steel", "bandwidth_percent": 60,
                 "element_diameter_mm": 10, "distance_mm": 50, "wedge_path_mm": 12,
                 "wedge_velocity_m_per_s": 2730, "incident_angle_deg": 10}""")
                .statusCode(200)
                .contentType("application/json")
                // period T = 1/f and wavelength lambda = v/f (definitions)
                .body("period_us", closedForm(1.0 / f))
                .body("wavelength_mm", closedForm(lambda))
                .body("wavelength_in", closedForm(lambda / MM_PER_IN))
                // -6 dB edges, ARITHMETIC fc = (fl + fu)/2: fl,u = fc (1 -/+ bw/2) (ASTM E1065)
                .body("lower_frequency_mhz", closedForm(f * (1 - bw / 2)))
                .body("upper_frequency_mhz", closedForm(f * (1 + bw / 2)))
                // -20 / -40 dB edges and durations of the scipy.signal.gausspulse model
                .body("lower_frequency_20db_mhz", closedForm(f - gaussEdgeOffsetMhz(a, 20.0)))
                .body("upper_frequency_20db_mhz", closedForm(f + gaussEdgeOffsetMhz(a, 20.0)))
                .body("lower_frequency_40db_mhz", closedForm(f - gaussEdgeOffsetMhz(a, 40.0)))
                .body("upper_frequency_40db_mhz", closedForm(f + gaussEdgeOffsetMhz(a, 40.0)))
                .body("pulse_duration_6db_us", closedForm(tau6))
                .body("pulse_duration_20db_us", closedForm(gaussDurationUs(a, 20.0)))
                .body("cycles_6db", closedForm(tau6 * f))
                // spatial pulse length v tau(-6 dB), axial resolution half of it (common practice, no published source)
                .body("spatial_pulse_length_mm", closedForm(v / 1000.0 * tau6))
                .body("axial_resolution_mm", closedForm(v / 1000.0 * tau6 / 2.0))
                // near field D^2/(4 lambda); exact last on-axis maximum (D^2 - lambda^2)/(4 lambda)
                // (Krautkraemer; Kinsler et al.; from memory)
                .body("near_field_length_mm", closedForm(nearField))
                .body("near_field_length_exact_mm", closedForm((d * d - lambda * lambda) / (4.0 * lambda)))
                // pulse-echo half-angles sin(theta) = k lambda / D, k solved here from Commons Math BesselJ
                .body("beam_spread_6db_deg", near(theta6, SOLVED_CONSTANT_RELATIVE_ERROR))
                .body("beam_spread_20db_deg", near(halfAngleDeg(twoWayConstant(20.0), lambda, d),
                        SOLVED_CONSTANT_RELATIVE_ERROR))
                .body("beam_spread_null_deg", near(halfAngleDeg(firstZeroOfJ1() / Math.PI, lambda, d),
                        SOLVED_CONSTANT_RELATIVE_ERROR))
                // beam diameter 2 z tan(theta -6 dB), far-field geometry (common practice)
                .body("beam_diameter_6db_mm", near(2.0 * distance * Math.tan(Math.toRadians(theta6)),
                        SOLVED_CONSTANT_RELATIVE_ERROR))
                // near field left in the part behind a wedge: N - w v_w / v (common practice, from memory)
                .body("near_field_in_part_mm", closedForm(nearField - wedgePath * wedgeVelocity / v))
                // Snell's law sin(theta_r)/v = sin(theta_i)/v_w
                .body("refracted_angle_deg", closedForm(Math.toDegrees(
                        Math.asin(Math.sin(Math.toRadians(incident)) * v / wedgeVelocity))))
                // 50 mm lies beyond the 15.6 mm of near field left in the part: no near-field warning
                .body("warnings.code", not(hasItem("DISTANCE_IN_NEAR_FIELD")))
                .body("warnings.code", not(hasItem("PAST_CRITICAL_ANGLE")))
                .body("velocity_source.kind", equalTo("MATERIAL"))
                .body("velocity_source.material", equalTo("carbon-steel"))
                .body("velocity_source.wave_mode", equalTo("LONGITUDINAL"))
                .body("velocity_source.velocity_m_per_s", equalTo(v))
                // inputs: velocity as m/s, the material gone, the default convention echoed
                .body("inputs.velocity_m_per_s", equalTo(v))
                .body("inputs", not(hasKey("material")))
                .body("inputs", not(hasKey("wave_mode")))
                .body("inputs.centre_frequency_convention", equalTo("ARITHMETIC"))
                .body("inputs.element_diameter_mm", equalTo(d))
                .body("references.topic", hasItems("period and wavelength", "near field length", "beam spread"))
                .body("stamp.calculation", equalTo("pulse-parameters"));
    }

    @Test
    void solvedBeamSpreadConstantsMatchTheTradesRoundedValues() {
        // A check of this test's own solver: src/docs/methods.md 2 quotes two-way -6 dB k = 0.5137,
        // two-way -20 dB k = 0.8694, first null k = 1.2197 (4 decimals).
        assertThat(twoWayConstant(6.0)).isCloseTo(0.5137, offset(5e-5));
        assertThat(twoWayConstant(20.0)).isCloseTo(0.8694, offset(5e-5));
        assertThat(firstZeroOfJ1() / Math.PI).isCloseTo(1.2197, offset(5e-5));
    }

    @Test
    void beamDiameterInsideTheNearFieldIsNullWithAWarning() {
        // N = 100 / (4 x 1.184) = 21.1 mm > 10 mm: the far-field formula does not hold, so no number
        post(PATH, """
                {"frequency_mhz": 5, "velocity_m_per_s": 5920, "element_diameter_mm": 10, "distance_mm": 10}""")
                .statusCode(200)
                .body("$", hasKey("beam_diameter_6db_mm"))
                .body("beam_diameter_6db_mm", nullValue())
                .body("warnings.code", hasItem("DISTANCE_IN_NEAR_FIELD"));
    }

    @Test
    void angleBeamGivesTheIncidencePlaneFromTheProjectedAperture() {
        // 45 deg shear in steel from a 2730 m/s wedge: alpha = asin(sin 45 x 2730/3255); the part sees
        // D cos(beta)/cos(alpha) in the incidence plane (Krautkraemer, from memory), D in the other plane.
        double alpha = Math.asin(Math.sin(Math.toRadians(45.0)) * 2730.0 / STEEL_SHEAR_M_PER_S);
        double aperture = 10.0 * Math.cos(Math.toRadians(45.0)) / Math.cos(alpha);
        double lambda = wavelengthMm(STEEL_SHEAR_M_PER_S, 5.0);
        post(PATH, String.format(java.util.Locale.ROOT, """
                {"frequency_mhz": 5, "velocity_m_per_s": %s, "element_diameter_mm": 10,
                 "wedge_velocity_m_per_s": 2730, "incident_angle_deg": %s, "distance_mm": 60}""",
                STEEL_SHEAR_M_PER_S, Math.toDegrees(alpha)))
                .statusCode(200)
                .body("refracted_angle_deg", closedForm(45.0))
                .body("incidence_plane_aperture_mm", closedForm(aperture))
                .body("incidence_plane_near_field_length_mm", closedForm(aperture * aperture / (4 * lambda)))
                .body("near_field_length_mm", closedForm(100.0 / (4 * lambda)))
                .body("incidence_plane_beam_spread_6db_deg", near(halfAngleDeg(twoWayConstant(6.0), lambda, aperture),
                        SOLVED_CONSTANT_RELATIVE_ERROR))
                .body("$", hasKey("incidence_plane_beam_diameter_6db_mm"))
                .body("$", not(hasKey("incidence_plane_near_field_in_part_mm")));
        post(PATH, """
                {"frequency_mhz": 5, "velocity_m_per_s": 5920, "element_diameter_mm": 10}""")
                .statusCode(200)
                .body("$", not(hasKey("incidence_plane_aperture_mm")));
    }

    @Test
    void shearWaveRefractedAngleFromAWedgeBySnell() {
        // Snell: sin(theta_r) = sin(36 deg) x 3255 / 2730 (ISO 22232-2 steel shear velocity 3255 m/s)
        double expected = Math.toDegrees(Math.asin(Math.sin(Math.toRadians(36.0)) * STEEL_SHEAR_M_PER_S / 2730.0));
        post(PATH, """
                {"frequency_mhz": 5, "material": "carbon-steel", "wave_mode": "SHEAR",
                 "wedge_velocity_m_per_s": 2730, "incident_angle_deg": 36}""")
                .statusCode(200)
                .body("refracted_angle_deg", closedForm(expected))
                .body("warnings.code", not(hasItem("PAST_CRITICAL_ANGLE")));
    }

    @Test
    void longitudinalPastTheCriticalAngleHasNoRefractedAngleAndSaysWhy() {
        // Snell: critical angle asin(2730 / 5920) = 27.5 deg < 36 deg: no refracted longitudinal wave
        assertThat(Math.toDegrees(Math.asin(2730.0 / STEEL_LONGITUDINAL_M_PER_S))).isLessThan(36.0);
        post(PATH, """
                {"frequency_mhz": 5, "material": "carbon-steel",
                 "wedge_velocity_m_per_s": 2730, "incident_angle_deg": 36}""")
                .statusCode(200)
                .body("$", hasKey("refracted_angle_deg"))
                .body("refracted_angle_deg", nullValue())
                .body("warnings.code", hasItem("PAST_CRITICAL_ANGLE"));
    }

    @Test
    void geometricConventionPutsTheNominalFrequencyAtTheGeometricMeanOfTheEdges() {
        double f = 5.0;
        double bw = 0.60;
        JsonPath answer = post(PATH, """
                {"frequency_mhz": 5, "velocity_m_per_s": 5920, "bandwidth_percent": 60,
                 "centre_frequency_convention": "GEOMETRIC"}""")
                .statusCode(200)
                .body("inputs.centre_frequency_convention", equalTo("GEOMETRIC"))
                .extract().jsonPath();
        double fl = answer.getDouble("lower_frequency_mhz");
        double fu = answer.getDouble("upper_frequency_mhz");
        // GEOMETRIC fc = sqrt(fl fu) (EN 12668-2 / ISO 22232-2, from memory); BW = (fu - fl)/fc in both
        assertThat(Math.sqrt(fl * fu)).isCloseTo(f, withinPercentage(100 * CLOSED_FORM_TOLERANCE));
        assertThat((fu - fl) / f).isCloseTo(bw, withinPercentage(100 * CLOSED_FORM_TOLERANCE));
        // the pulse model is centred on (fl + fu)/2 with bw' = (fu - fl)/((fl + fu)/2) (src/docs/methods.md 1),
        // parameterised as scipy.signal.gausspulse
        double carrier = (fl + fu) / 2.0;
        double a = gaussA(carrier, (fu - fl) / carrier);
        assertThat(answer.getDouble("upper_frequency_20db_mhz"))
                .isCloseTo(carrier + gaussEdgeOffsetMhz(a, 20.0), withinPercentage(100 * CLOSED_FORM_TOLERANCE));
        assertThat(answer.getDouble("pulse_duration_6db_us"))
                .isCloseTo(gaussDurationUs(a, 6.0), withinPercentage(100 * CLOSED_FORM_TOLERANCE));
        assertThat(answer.getDouble("cycles_6db"))
                .isCloseTo(gaussDurationUs(a, 6.0) * carrier, withinPercentage(100 * CLOSED_FORM_TOLERANCE));
        // period and wavelength stay at the nominal frequency (src/docs/methods.md 1)
        assertThat(answer.getDouble("period_us")).isCloseTo(1.0 / f, withinPercentage(100 * CLOSED_FORM_TOLERANCE));
    }

    @Test
    void elementSmallerThanTheWavelengthHasNoBeamSpreadAndNoExactNearField() {
        // lambda = 1.184 mm > D = 0.5 mm: k lambda / D > 1 for every constant, D^2 - lambda^2 < 0 (methods.md)
        post(PATH, """
                {"frequency_mhz": 5, "velocity_m_per_s": 5920, "element_diameter_mm": 0.5, "distance_mm": 20}""")
                .statusCode(200)
                .body("near_field_length_mm", closedForm(0.25 / (4.0 * wavelengthMm(5920, 5))))
                .body("near_field_length_exact_mm", nullValue())
                .body("beam_spread_6db_deg", nullValue())
                .body("beam_spread_20db_deg", nullValue())
                .body("beam_spread_null_deg", nullValue())
                .body("beam_diameter_6db_mm", nullValue())
                .body("$", hasKey("beam_diameter_6db_mm"))
                .body("warnings.code", hasItems("NO_EXACT_NEAR_FIELD", "NO_BEAM_SPREAD_6DB", "NO_BEAM_SPREAD_20DB",
                        "NO_BEAM_SPREAD_NULL", "NO_BEAM_DIAMETER_6DB"));
    }

    // ---- omitted vs null ----

    @Test
    void veryWideBandHasNoFortyDecibelLowerEdgeAndSaysWhy() {
        // bw 90 %: offset (bw fc/2) sqrt(40/6) = 2.25 x 2.58 = 5.81 MHz > 5 MHz: the -40 dB lower edge
        // would lie below 0 Hz (methods.md); the -20 dB one, 2.25 x 1.83 = 4.11 MHz, still exists.
        double a = gaussA(5.0, 0.90);
        assertThat(5.0 - gaussEdgeOffsetMhz(a, 40.0)).isNegative();
        post(PATH, "{\"frequency_mhz\": 5, \"velocity_m_per_s\": 5920, \"bandwidth_percent\": 90}")
                .statusCode(200)
                .body("$", hasKey("lower_frequency_40db_mhz"))
                .body("lower_frequency_40db_mhz", nullValue())
                .body("upper_frequency_40db_mhz", closedForm(5.0 + gaussEdgeOffsetMhz(a, 40.0)))
                .body("lower_frequency_20db_mhz", closedForm(5.0 - gaussEdgeOffsetMhz(a, 20.0)))
                .body("warnings.code", hasItem("NO_LOWER_FREQUENCY_40DB"))
                .body("warnings.code", not(hasItem("NO_LOWER_FREQUENCY_20DB")));
    }

    @Test
    void resultsOfInputsNotGivenAreAbsent() {
        var response = post(PATH, "{\"frequency_mhz\": 5, \"velocity_m_per_s\": 5920}")
                .statusCode(200)
                .body("period_us", closedForm(0.2))
                .body("velocity_source.kind", equalTo("CALLER"));
        for (String field : List.of("lower_frequency_mhz", "upper_frequency_mhz", "lower_frequency_20db_mhz",
                "upper_frequency_20db_mhz", "lower_frequency_40db_mhz", "upper_frequency_40db_mhz",
                "pulse_duration_6db_us", "pulse_duration_20db_us", "cycles_6db", "spatial_pulse_length_mm",
                "axial_resolution_mm", "near_field_length_mm", "near_field_length_exact_mm", "beam_spread_6db_deg",
                "beam_spread_20db_deg", "beam_spread_null_deg", "beam_diameter_6db_mm", "near_field_in_part_mm",
                "refracted_angle_deg")) {
            response.body("$", not(hasKey(field)));
        }
        // and no default without an effect is echoed: the convention applies only with a bandwidth
        response.body("inputs", not(hasKey("centre_frequency_convention")));
    }

    @Test
    void explicitNullOfAnOptionalInputIsAbsent() {
        post(PATH, "{\"frequency_mhz\": 5, \"velocity_m_per_s\": 5920, \"bandwidth_percent\": null,"
                + " \"element_diameter_in\": null}")
                .statusCode(200)
                .body("$", not(hasKey("lower_frequency_mhz")))
                .body("$", not(hasKey("near_field_length_mm")));
    }

    // ---- mirrors ----

    @Nested
    class Mirrors {
        @Test
        void elementDiameterInInchesGivesTheSameAnswerAsMillimetres() {
            // 0.5 in = 12.7 mm (1 in = 25.4 mm exactly)
            String rest = "\"frequency_mhz\": 5, \"velocity_m_per_s\": 5920, \"distance_mm\": 60";
            assertThat(answerWithoutStamp("{" + rest + ", \"element_diameter_in\": 0.5}"))
                    .isEqualTo(answerWithoutStamp("{" + rest + ", \"element_diameter_mm\": 12.7}"));
        }

        @Test
        void velocityInInchesPerMicrosecondGivesTheSameAnswerAsMetresPerSecond() {
            // 0.25 in/us = 0.25 x 25.4 mm/us = 6350 m/s
            String rest = "\"frequency_mhz\": 5, \"bandwidth_percent\": 60, \"element_diameter_mm\": 10";
            Map<String, Object> inches = answerWithoutStamp("{" + rest + ", \"velocity_in_per_us\": 0.25}");
            assertThat(inches).isEqualTo(answerWithoutStamp("{" + rest + ", \"velocity_m_per_s\": 6350}"));
            assertThat((Double) inches.get("wavelength_mm"))
                    .isCloseTo(wavelengthMm(6350, 5.0), withinPercentage(100 * CLOSED_FORM_TOLERANCE));
        }

        @Test
        void materialWithShearWaveUsesTheShearVelocity() {
            // ISO 22232-2 steel shear reference value 3255 m/s; lambda = v/f
            post(PATH, "{\"frequency_mhz\": 5, \"material\": \"carbon-steel\", \"wave_mode\": \"SHEAR\"}")
                    .statusCode(200)
                    .body("wavelength_mm", closedForm(wavelengthMm(STEEL_SHEAR_M_PER_S, 5.0)))
                    .body("velocity_source.kind", equalTo("MATERIAL"))
                    .body("velocity_source.material", equalTo("carbon-steel"))
                    .body("velocity_source.wave_mode", equalTo("SHEAR"))
                    .body("velocity_source.velocity_m_per_s", equalTo(STEEL_SHEAR_M_PER_S))
                    .body("inputs.velocity_m_per_s", equalTo(STEEL_SHEAR_M_PER_S))
                    .body("inputs", not(hasKey("wave_mode")));
        }

        @Test
        void waterAtATemperatureUsesMarczak() {
            // Marczak 1997 fifth-order polynomial (J. Acoust. Soc. Am. 102, 2776; coefficients from memory)
            double t = 40.0;
            double marczak = 1402.385 + 5.038813 * t - 5.799136e-2 * t * t + 3.287156e-4 * Math.pow(t, 3)
                    - 1.398845e-6 * Math.pow(t, 4) + 2.787860e-9 * Math.pow(t, 5);
            // about 1528.9 m/s at 40 C (Del Grosso and Mader 1972, from memory)
            assertThat(marczak).isCloseTo(1528.9, offset(0.1));
            post(PATH, "{\"frequency_mhz\": 2, \"material\": \"water\", \"temperature_c\": 40}")
                    .statusCode(200)
                    .body("velocity_source.velocity_m_per_s", near(marczak, 1e-12))
                    .body("velocity_source.temperature_c", equalTo(t))
                    .body("wavelength_mm", near(wavelengthMm(marczak, 2.0), 1e-12))
                    .body("inputs", not(hasKey("temperature_c")))
                    .body("inputs.velocity_m_per_s", near(marczak, 1e-12));
        }

        @Test
        void bothMillimetresAndInchesIsA400NamingBoth() {
            post(PATH, """
                    {"frequency_mhz": 5, "velocity_m_per_s": 5920, "element_diameter_mm": 10, "element_diameter_in": 0.4}""")
                    .statusCode(400).contentType("application/problem+json")
                    .body("errors.pointer", hasItems("/element_diameter_mm", "/element_diameter_in"));
        }

        @Test
        void velocityAndMaterialIsA400NamingBoth() {
            post(PATH, "{\"frequency_mhz\": 5, \"velocity_m_per_s\": 5920, \"material\": \"carbon-steel\"}")
                    .statusCode(400).contentType("application/problem+json")
                    .body("errors.pointer", hasItems("/velocity_m_per_s", "/material"));
        }

        @Test
        void noVelocityIsA400() {
            assertInvalid(PATH, "{\"frequency_mhz\": 5}", "/velocity_m_per_s");
        }

        @Test
        void unknownMaterialIsA400AtMaterial() {
            assertInvalid(PATH, "{\"frequency_mhz\": 5, \"material\": \"unobtainium\"}", "/material");
        }

        @Test
        void waterWithShearIsA422() {
            post(PATH, "{\"frequency_mhz\": 5, \"material\": \"water\", \"wave_mode\": \"SHEAR\"}")
                    .statusCode(422).contentType("application/problem+json")
                    .body("type", equalTo("/problems/impossible-combination"))
                    .body("errors.pointer", hasItem("/wave_mode"));
        }

        @Test
        void temperatureWithSteelIsA400() {
            assertInvalid(PATH, "{\"frequency_mhz\": 5, \"material\": \"carbon-steel\", \"temperature_c\": 20}",
                    "/temperature_c");
        }

        @Test
        void waveModeWithoutMaterialIsA400() {
            assertInvalid(PATH, "{\"frequency_mhz\": 5, \"velocity_m_per_s\": 3255, \"wave_mode\": \"SHEAR\"}",
                    "/wave_mode");
        }
    }

    // ---- validation ----

    @Nested
    class Rejected {
        @ParameterizedTest
        @ValueSource(strings = {"0", "1001", "-5"})
        void frequencyOutOfRange(String value) {
            assertInvalid(PATH, "{\"frequency_mhz\": " + value + ", \"velocity_m_per_s\": 5920}", "/frequency_mhz")
                    .body("type", equalTo("/problems/invalid-input"));
        }

        @Test
        void frequencyMissing() {
            assertInvalid(PATH, "{\"velocity_m_per_s\": 5920}", "/frequency_mhz");
        }

        @ParameterizedTest
        @ValueSource(strings = {"0", "200", "250"})
        void bandwidthOutOfRange(String value) {
            assertInvalid(PATH, "{\"frequency_mhz\": 5, \"velocity_m_per_s\": 5920, \"bandwidth_percent\": "
                    + value + "}", "/bandwidth_percent");
        }

        @Test
        void incidentAngleOfNinetyDegrees() {
            assertInvalid(PATH, """
                    {"frequency_mhz": 5, "velocity_m_per_s": 5920, "wedge_velocity_m_per_s": 2730,
                     "incident_angle_deg": 90}""", "/incident_angle_deg");
        }

        @Test
        void negativeDiameter() {
            assertInvalid(PATH, "{\"frequency_mhz\": 5, \"velocity_m_per_s\": 5920, \"element_diameter_mm\": -10}",
                    "/element_diameter_mm");
            assertInvalid(PATH, "{\"frequency_mhz\": 5, \"velocity_m_per_s\": 5920, \"element_diameter_in\": -0.5}",
                    "/element_diameter_in");
        }

        @Test
        void velocityOutOfRange() {
            assertInvalid(PATH, "{\"frequency_mhz\": 5, \"velocity_m_per_s\": 99}", "/velocity_m_per_s");
            // 1 in/us = 25400 m/s > 20000 m/s
            assertInvalid(PATH, "{\"frequency_mhz\": 5, \"velocity_in_per_us\": 1}", "/velocity_in_per_us");
        }

        @Test
        void unknownProperty() {
            assertInvalid(PATH, "{\"frequency_mhz\": 5, \"velocity_m_per_s\": 5920, \"diameter_mm\": 10}",
                    "/diameter_mm");
        }

        @Test
        void centreFrequencyConventionWithoutBandwidthDoesNotApply() {
            assertInvalid(PATH, """
                    {"frequency_mhz": 5, "velocity_m_per_s": 5920, "centre_frequency_convention": "GEOMETRIC"}""",
                    "/centre_frequency_convention")
                    .body("type", equalTo("/problems/inapplicable-input"));
        }

        @Test
        void distanceWithoutDiameterDoesNotApply() {
            assertInvalid(PATH, "{\"frequency_mhz\": 5, \"velocity_m_per_s\": 5920, \"distance_mm\": 50}",
                    "/distance_mm")
                    .body("type", equalTo("/problems/inapplicable-input"));
            assertInvalid(PATH, "{\"frequency_mhz\": 5, \"velocity_m_per_s\": 5920, \"distance_in\": 2}",
                    "/distance_in")
                    .body("type", equalTo("/problems/inapplicable-input"));
        }

        @Test
        void wedgeInputsWithoutTheirPartnersDoNotApply() {
            assertInvalid(PATH, """
                    {"frequency_mhz": 5, "velocity_m_per_s": 5920, "element_diameter_mm": 10, "wedge_path_mm": 12}""",
                    "/wedge_path_mm")
                    .body("type", equalTo("/problems/inapplicable-input"));
            assertInvalid(PATH, "{\"frequency_mhz\": 5, \"velocity_m_per_s\": 5920, \"incident_angle_deg\": 30}",
                    "/incident_angle_deg")
                    .body("type", equalTo("/problems/inapplicable-input"));
            assertInvalid(PATH, "{\"frequency_mhz\": 5, \"velocity_m_per_s\": 5920, \"wedge_velocity_m_per_s\": 2730}",
                    "/wedge_velocity_m_per_s")
                    .body("type", equalTo("/problems/inapplicable-input"));
        }
    }

    // ---- inputs reproduce the answer ----

    @ParameterizedTest
    @ValueSource(strings = {
        """
        {"frequency_mhz": 5, "material": "carbon-steel", "bandwidth_percent": 60, "element_diameter_mm": 10,
         "distance_mm": 50, "wedge_path_mm": 12, "wedge_velocity_m_per_s": 2730, "incident_angle_deg": 10}""",
        """
        {"frequency_mhz": 2.25, "velocity_in_per_us": 0.2, "bandwidth_percent": 45,
         "centre_frequency_convention": "GEOMETRIC", "element_diameter_in": 0.5, "distance_in": 3,
         "wedge_path_in": 0.4, "wedge_velocity_m_per_s": 2330}""",
        """
        {"frequency_mhz": 10, "material": "carbon-steel", "wave_mode": "SHEAR", "bandwidth_percent": 150,
         "element_diameter_mm": 6, "wedge_velocity_m_per_s": 2730, "incident_angle_deg": 36}""",
        """
        {"frequency_mhz": 1, "material": "water", "temperature_c": 60, "element_diameter_mm": 0.8,
         "distance_mm": 5}"""
    })
    void inputsReproduceTheAnswer(String request) {
        Map<String, Object> first = answerWithoutStamp(request);
        @SuppressWarnings("unchecked")
        Map<String, Object> inputs = (Map<String, Object>) first.get("inputs");
        Map<String, Object> second = answerWithoutStamp(toJson(inputs));
        first.remove("velocity_source");
        second.remove("velocity_source");
        assertThat(second).isEqualTo(first);
    }

    /** A flat JSON object of numbers and strings (the shape of {@code inputs}). */
    private static String toJson(Map<String, Object> flat) {
        StringBuilder out = new StringBuilder("{");
        for (Map.Entry<String, Object> e : flat.entrySet()) {
            if (out.length() > 1) {
                out.append(", ");
            }
            out.append('"').append(e.getKey()).append("\": ");
            Object v = e.getValue();
            if (v instanceof String s) {
                out.append('"').append(s).append('"');
            } else if (v instanceof Double dbl) {
                // Double.toString round-trips every double exactly
                out.append(dbl.toString());
            } else {
                throw new AssertionError("inputs holds a non-flat value at " + e.getKey() + ": " + v);
            }
        }
        return out.append('}').toString();
    }

    // ---- OpenAPI ----

    @Test
    void openApiListsTheEndpointsWithSnakeCaseProperties() {
        JsonPath doc = given().get("/v3/api-docs").then().statusCode(200).extract().jsonPath();
        assertThat(doc.getString("openapi")).startsWith("3.1");
        Map<String, Object> paths = doc.getMap("paths");
        assertThat(paths).containsKeys("/api/pulse-parameters", "/api/materials");
        Map<String, Object> request = doc.getMap("components.schemas.PulseParametersRequest.properties");
        assertThat(request).containsKeys("frequency_mhz", "velocity_m_per_s", "velocity_in_per_us", "material",
                "wave_mode", "temperature_c", "bandwidth_percent", "centre_frequency_convention",
                "element_diameter_mm", "element_diameter_in", "distance_mm", "distance_in", "wedge_path_mm",
                "wedge_path_in", "wedge_velocity_m_per_s", "incident_angle_deg");
        assertThat(request.keySet()).allMatch(k -> k.matches("[a-z][a-z0-9_]*"), "snake_case");
        Map<String, Object> answer = doc.getMap("components.schemas.PulseParameters.properties");
        assertThat(answer).containsKeys("period_us", "wavelength_mm", "lower_frequency_20db_mhz",
                "upper_frequency_40db_mhz", "pulse_duration_6db_us", "cycles_6db", "near_field_length_exact_mm",
                "beam_spread_6db_deg", "beam_diameter_6db_mm", "near_field_in_part_mm", "refracted_angle_deg",
                "inputs", "velocity_source", "warnings", "references");
        assertThat(answer.keySet()).allMatch(k -> k.matches("[a-z][a-z0-9_]*"), "snake_case");
    }
}
