package utdigit.web.thickness;

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
@Tag(name = "Thickness", description = "Thickness resolution of one sample and the uncertainty of a wall thickness")
class ThicknessResolutionController {
    private final CalculationRunner runner;
    private final ThicknessResolutionCalculation calculation;

    ThicknessResolutionController(CalculationRunner runner, ThicknessResolutionCalculation calculation) {
        this.runner = runner;
        this.calculation = calculation;
    }

    @PostMapping(path = "/api/" + ThicknessResolutionCalculation.NAME,
            consumes = MediaType.APPLICATION_JSON_VALUE, produces = MediaType.APPLICATION_JSON_VALUE)
    @Operation(summary = "Resolve a wall thickness and its uncertainty",
            description = "The thickness of one sample (v dt / 2m for echoes m round trips apart), the round trip "
                    + "and the samples across it, the sampling's timing uncertainty and worst case, the combined "
                    + "standard uncertainty of the thickness from the velocity's and the sampling's standard "
                    + "uncertainties (JCGM 100:2008 eq. 10) and its expansion by the coverage factor; with a "
                    + "required resolution the sampling frequency it needs. The coverage probability of k = 2 is "
                    + "not 95 % where the rectangular sampling term dominates. Sub-sample interpolation does "
                    + "better than these quantization figures. Caution: the governing code edition and procedure "
                    + "decide the tolerance; results support a qualified examiner.")
    @ApiResponse(responseCode = "200", description = "The resolution and uncertainty")
    Stamped<ThicknessResolutionResponse> resolve(@RequestBody ThicknessResolutionRequest request) {
        return runner.run(calculation, request);
    }
}
