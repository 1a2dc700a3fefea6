package utdigit.web.arrays;

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
@Tag(name = "Arrays", description = "A linear array's active aperture: near field, beam spread and grating lobes")
class ArrayApertureController {
    private final CalculationRunner runner;
    private final ArrayApertureCalculation calculation;

    ArrayApertureController(CalculationRunner runner, ArrayApertureCalculation calculation) {
        this.runner = runner;
        this.calculation = calculation;
    }

    @PostMapping(path = "/api/" + ArrayApertureCalculation.NAME,
            consumes = MediaType.APPLICATION_JSON_VALUE, produces = MediaType.APPLICATION_JSON_VALUE)
    @Operation(summary = "Assess a linear array's aperture and pitch",
            description = "The active aperture L of a linear array (active_elements x element_pitch, or as given) is a "
                    + "rectangular aperture: in the steering plane its near field is L^2 / (4 lambda) and its far-field "
                    + "directivity sin(x) / x with x = pi L sin(theta) / lambda; the pulse-echo -6 dB, -20 dB and "
                    + "first-null half-angles are solved from it numerically (unsteered; a steered beam is wider). "
                    + "element_length gives the same figures in the passive plane. Grating lobes stand at sin(theta_g) "
                    + "= sin(theta_s) -/+ m lambda / p; none enters the medium while p < lambda / (1 + sin(theta_max)) "
                    + "for the largest steering angle used. lambda is the wavelength of the medium where the beam is "
                    + "steered (the part, or the wedge for an array on a wedge). Caution: the governing code edition "
                    + "and procedure decide; results support a qualified examiner.")
    @ApiResponse(responseCode = "200", description = "The aperture")
    Stamped<ArrayApertureResponse> assess(@RequestBody ArrayApertureRequest request) {
        return runner.run(calculation, request);
    }
}
