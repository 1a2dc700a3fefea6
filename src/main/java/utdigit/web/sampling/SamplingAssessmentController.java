package utdigit.web.sampling;

import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.responses.ApiResponse;
import io.swagger.v3.oas.annotations.tags.Tag;
import org.springframework.http.MediaType;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RestController;
import utdigit.web.pipeline.CalculationRunner;
import utdigit.web.stamp.Stamped;

@RestController
@Tag(name = "Sampling", description = "Sampling adequacy: samples per period, Nyquist, sampled-peak losses, timing, "
        + "required rates, TFM grid")
class SamplingAssessmentController {
    private final CalculationRunner runner;
    private final SamplingAssessmentCalculation calculation;

    SamplingAssessmentController(CalculationRunner runner, SamplingAssessmentCalculation calculation) {
        this.runner = runner;
        this.calculation = calculation;
    }

    @PostMapping(path = "/api/" + SamplingAssessmentCalculation.NAME,
            consumes = MediaType.APPLICATION_JSON_VALUE, produces = MediaType.APPLICATION_JSON_VALUE)
    @Operation(summary = "Assess whether a sampling frequency is adequate for a probe",
            description = "Effective rate fs/m, sampling interval, samples per period, Nyquist frequency, the classic "
                    + "sine bound -20 log10(cos(pi/n)) and timing quantization (dt/2, dt/sqrt(12)). With "
                    + "bandwidth_percent: samples per period at the upper -6 dB edge, the Gaussian pulse model's "
                    + "worst-case sampled-peak loss, and its spectral level and energy above Nyquist, which are model "
                    + "values, optimistic for real probes (ringing, noise): the instrument's anti-alias filter "
                    + "decides what aliases. With amplitude_tolerance_db: the samples per period and raw rates that "
                    + "keep the loss within it; the pulse rate is the rate above which every rate passes (the loss is "
                    + "not monotonic for narrow bands), searched for signal RF down to a 1 % bandwidth floor (a narrower "
                    + "band with amplitude_tolerance_db and signal RF is a 400). Decimation: timing and samples per period follow fs/m; amplitude follows fs/m for DROP "
                    + "and the raw fs for PEAK_PRESERVING; every required rate is the raw sampling_frequency_mhz to "
                    + "set for the same decimation. With tfm_grid_spacing and a velocity (or the lateral step with "
                    + "aperture and depth): the TFM grid losses, a derived model; the code's own amplitude-fidelity "
                    + "check on a reference reflector governs. Aliasing of the band, a spectral level above -40 dB "
                    + "at Nyquist and 2 or fewer samples per period are warnings. Caution: the governing code edition "
                    + "and procedure decide the rate and tolerance; results support a qualified examiner.")
    @ApiResponse(responseCode = "200", description = "The assessment")
    Stamped<SamplingAssessmentResponse> assess(@RequestBody SamplingAssessmentRequest request) {
        return runner.run(calculation, request);
    }
}
