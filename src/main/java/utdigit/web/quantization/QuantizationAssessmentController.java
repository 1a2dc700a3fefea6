package utdigit.web.quantization;

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
@Tag(name = "Quantization", description = "Amplitude digitization: bit depth, LSB, errors in dB")
class QuantizationAssessmentController {
    private final CalculationRunner runner;
    private final QuantizationAssessmentCalculation calculation;

    QuantizationAssessmentController(CalculationRunner runner, QuantizationAssessmentCalculation calculation) {
        this.runner = runner;
        this.calculation = calculation;
    }

    @PostMapping(path = "/api/" + QuantizationAssessmentCalculation.NAME,
            consumes = MediaType.APPLICATION_JSON_VALUE, produces = MediaType.APPLICATION_JSON_VALUE)
    @Operation(summary = "Assess the amplitude quantization of a bit depth",
            description = "Levels, LSB in %FSH, dynamic range and ideal SQNR; with a signal height its worst "
                    + "reading errors in dB; with a tolerance the lowest height read within it; with a reference "
                    + "height and an evaluation level the evaluation height and its error. Soft gain scales the "
                    + "LSB: it adds no resolution. Caution: the governing code edition and procedure decide the "
                    + "tolerance; results support a qualified examiner.")
    @ApiResponse(responseCode = "200", description = "The assessment")
    Stamped<QuantizationAssessmentResponse> assess(@RequestBody QuantizationAssessmentRequest request) {
        return runner.run(calculation, request);
    }
}
