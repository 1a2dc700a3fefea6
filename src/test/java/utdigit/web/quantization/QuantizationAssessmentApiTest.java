package utdigit.web.quantization;

import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItem;
import static org.hamcrest.Matchers.matchesPattern;
import static org.hamcrest.Matchers.nullValue;

import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import utdigit.web.support.ApiTest;

class QuantizationAssessmentApiTest extends ApiTest {
    private static final String PATH = "/api/quantization-assessments";

    @Test
    void eightBitRfAnswersEveryRequestedField() {
        // LSB = 200 %FSH / 2^8 (FSR_OVER_2N, IEEE Std 1241 from memory); errors +/- LSB/2 at 40 %FSH.
        double lsb = 200.0 / 256;
        post(PATH, """
                {"bit_depth": 8, "signal_height_percent_fsh": 40, "amplitude_tolerance_db": 1,
                 "reference_height_percent_fsh": 80, "evaluation_level_db": -14, "averaging": 4}""")
                .statusCode(200)
                .body("levels", equalTo(256))
                .body("lsb_percent_fsh", closeTo(lsb, 1e-12))
                .body("dynamic_range_db", closeTo(20 * Math.log10(100 / lsb), 1e-9))
                // W. Kester, Analog Devices MT-001: 6.02 N + 1.76 dB, exact form 20 log10(2^N) + 10 log10(1.5)
                .body("ideal_sqnr_db", closeTo(6.02 * 8 + 1.76, 0.01))
                .body("amplitude_error_over_db", closeTo(20 * Math.log10((40 + lsb / 2) / 40), 1e-9))
                .body("amplitude_error_under_db", closeTo(20 * Math.log10((40 - lsb / 2) / 40), 1e-9))
                .body("minimum_height_percent_fsh", closeTo((lsb / 2) / (1 - Math.pow(10, -1.0 / 20)), 1e-9))
                .body("evaluation_height_percent_fsh", closeTo(80 * Math.pow(10, -14.0 / 20), 1e-9))
                .body("averaging_snr_gain_db", closeTo(10 * Math.log10(4), 1e-9))
                .body("inputs.quantizer", equalTo("ROUNDING"))
                .body("inputs.code_mapping", equalTo("FSR_OVER_2N"))
                .body("inputs.digitized_signal", equalTo("RF"))
                .body("stamp.calculation", equalTo("quantization-assessments"))
                .body("stamp.sha256", matchesPattern("[0-9a-f]{64}"));
    }

    @Test
    void rectifiedHasNoIdealSqnrAndSaysWhy() {
        post(PATH, "{\"bit_depth\": 8, \"digitized_signal\": \"RECTIFIED\"}")
                .statusCode(200)
                .body("ideal_sqnr_db", nullValue())
                .body("warnings.code", hasItem("IDEAL_SQNR_NOT_APPLICABLE"));
    }

    @Test
    void optionalResultsAreOmittedWhenTheirInputsAreAbsent() {
        post(PATH, "{\"bit_depth\": 12}")
                .statusCode(200)
                .body("$", org.hamcrest.Matchers.not(org.hamcrest.Matchers.hasKey("amplitude_error_over_db")))
                .body("$", org.hamcrest.Matchers.not(org.hamcrest.Matchers.hasKey("minimum_height_percent_fsh")));
    }

    @Nested
    class Rejected {
        @Test
        void fractionalBitDepth() {
            assertInvalid(PATH, "{\"bit_depth\": 8.5}", "/bit_depth");
        }

        @Test
        void integralBitDepthWrittenAsDecimalIsAccepted() {
            post(PATH, "{\"bit_depth\": 8.0}").statusCode(200).body("levels", equalTo(256));
        }

        @Test
        void hugeBitDepth() {
            assertInvalid(PATH, "{\"bit_depth\": 33}", "/bit_depth");
            assertInvalid(PATH, "{\"bit_depth\": 1e12}", "/bit_depth");
        }

        @Test
        void heightZeroOrAboveFullScreen() {
            assertInvalid(PATH, "{\"bit_depth\": 8, \"signal_height_percent_fsh\": 0}", "/signal_height_percent_fsh");
            assertInvalid(PATH, "{\"bit_depth\": 8, \"signal_height_percent_fsh\": 100.5}", "/signal_height_percent_fsh");
        }

        @Test
        void missingBitDepth() {
            assertInvalid(PATH, "{}", "/bit_depth");
            assertInvalid(PATH, "{\"bit_depth\": null}", "/bit_depth");
        }

        @Test
        void quotedNumber() {
            assertInvalid(PATH, "{\"bit_depth\": \"8\"}", "/bit_depth");
        }

        @Test
        void unknownEnumValue() {
            assertInvalid(PATH, "{\"bit_depth\": 8, \"quantizer\": \"round\"}", "/quantizer");
        }

        @Test
        void referenceWithoutLevelDoesNotApply() {
            assertInvalid(PATH, "{\"bit_depth\": 8, \"reference_height_percent_fsh\": 80}",
                    "/reference_height_percent_fsh")
                    .body("type", equalTo("/problems/inapplicable-input"));
        }

        @Test
        void maxCodeWithOneBitOfRfIsImpossible() {
            post(PATH, "{\"bit_depth\": 1, \"code_mapping\": \"MAX_CODE\"}")
                    .statusCode(422)
                    .body("type", equalTo("/problems/impossible-combination"))
                    .body("errors.pointer", hasItem("/code_mapping"));
        }
    }
}
