package utdigit.web.dac;

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
@Tag(name = "DAC and TCG", description = "What a DAC curve's span costs in amplitude resolution, with and without "
        + "time-corrected gain")
class DacQuantizationController {
    private final CalculationRunner runner;
    private final DacQuantizationCalculation calculation;

    DacQuantizationController(CalculationRunner runner, DacQuantizationCalculation calculation) {
        this.runner = runner;
        this.calculation = calculation;
    }

    @PostMapping(path = "/api/" + DacQuantizationCalculation.NAME,
            consumes = MediaType.APPLICATION_JSON_VALUE, produces = MediaType.APPLICATION_JSON_VALUE)
    @Operation(summary = "Assess a DAC curve against the amplitude quantization",
            description = "A DAC curve spanning S dB with its highest reference point at h_ref puts its lowest point at "
                    + "h_ref 10^(-S/20) when evaluated without correction: its quantization error is that of the lower "
                    + "height. With TCG before the converter (analog) every point is digitized at h_ref and the span "
                    + "costs no resolution. With TCG applied to digitized data (a gain per depth after the converter) "
                    + "the lowest point is displayed at h_ref but its displayed LSB grows by S dB: it reads no better "
                    + "than without correction. With a tolerance: the lowest height read within it, the largest span "
                    + "without correction, and whether each set-up meets it. The quantization figures are those of "
                    + "POST /api/quantization-assessments. Caution: the governing code edition and procedure decide; "
                    + "results support a qualified examiner.")
    @ApiResponse(responseCode = "200", description = "The assessment")
    Stamped<DacQuantizationResponse> assess(@RequestBody DacQuantizationRequest request) {
        return runner.run(calculation, request);
    }
}
