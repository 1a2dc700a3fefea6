package utdigit.web.sampling;

import static org.hamcrest.Matchers.hasItem;
import static org.hamcrest.Matchers.nullValue;

import org.junit.jupiter.api.Test;
import utdigit.web.support.ApiTest;

/**
 * Inputs at the extremes of the admitted ranges, where the numerical searches once ran without
 * end: the answer comes, with the figure that reached its work bound null and a warning saying so.
 */
class SearchBoundsApiTest extends ApiTest {
    private static final String PATH = "/api/sampling-assessments";

    @Test
    void aFlatPulseEnvelopeGivesANullPulseLossWithAWarning() {
        // 1e-300 MHz at 1 % bandwidth: the envelope constant a underflows to 0, the pulse never decays.
        post(PATH, "{\"sampling_frequency_mhz\": 4.5e-300, \"frequency_mhz\": 1e-300, \"bandwidth_percent\": 1}")
                .statusCode(200)
                .body("pulse_amplitude_loss_db", nullValue())
                .body("warnings.code", hasItem("SEARCH_BOUND_REACHED"));
    }

    @Test
    void aToleranceThatRoundsToZeroDbGivesANullPulseRateWithAWarning() {
        post(PATH, "{\"sampling_frequency_mhz\": 100, \"frequency_mhz\": 5, \"bandwidth_percent\": 60, "
                + "\"amplitude_tolerance_db\": 1e-300}")
                .statusCode(200)
                .body("required_sampling_frequency_pulse_mhz", nullValue())
                .body("warnings.code", hasItem("SEARCH_BOUND_REACHED"));
    }

    @Test
    void theExtremesOfEveryRangeAnswer() {
        // frequency 1e-300 and 1000 MHz, sampling 1e-300 and 100000 MHz, bandwidth 1e-300 and just below
        // 200 %, tolerance 1e-300 and 40 dB: a 200 or a typed 4xx, never a 5xx.
        String[] frequencies = {"1e-300", "1000"};
        String[] rates = {"1e-300", "100000"};
        String[] bandwidths = {"1e-300", "1", "199.99999999999997"};
        String[] tolerances = {"1e-300", "40"};
        for (String f : frequencies) {
            for (String fs : rates) {
                for (String bw : bandwidths) {
                    for (String x : tolerances) {
                        post(PATH, "{\"sampling_frequency_mhz\": " + fs + ", \"frequency_mhz\": " + f
                                + ", \"bandwidth_percent\": " + bw + ", \"amplitude_tolerance_db\": " + x + "}")
                                .statusCode(org.hamcrest.Matchers.lessThan(500));
                    }
                }
            }
        }
    }
}
