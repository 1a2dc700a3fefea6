package utdigit.web.pulse;

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
@Tag(name = "Pulse and beam", description = "Period, wavelength, pulse band and durations, near field, beam spread")
class PulseParametersController {
    private final CalculationRunner runner;
    private final PulseParametersCalculation calculation;

    PulseParametersController(CalculationRunner runner, PulseParametersCalculation calculation) {
        this.runner = runner;
        this.calculation = calculation;
    }

    @PostMapping(path = "/api/" + PulseParametersCalculation.NAME,
            consumes = MediaType.APPLICATION_JSON_VALUE, produces = MediaType.APPLICATION_JSON_VALUE)
    @Operation(summary = "Compute a probe's pulse and beam parameters",
            description = "Period and wavelength from the nominal frequency; with bandwidth_percent the band edges "
                    + "(-6, -20, -40 dB) and durations of a Gaussian pulse model (the scipy.signal.gausspulse "
                    + "parameterisation); with element_diameter the circular piston's near field and pulse-echo "
                    + "beam-spread half-angles (constants solved from J1); with distance the -6 dB beam diameter; "
                    + "through a wedge the near field left in the part and the refracted angle (Snell). Caution: "
                    + "model values support a qualified examiner; beam measurements on reference blocks and the "
                    + "governing code decide.")
    @ApiResponse(responseCode = "200", description = "The pulse and beam parameters")
    Stamped<PulseParametersResponse> compute(@RequestBody PulseParametersRequest request) {
        return runner.run(calculation, request);
    }
}
