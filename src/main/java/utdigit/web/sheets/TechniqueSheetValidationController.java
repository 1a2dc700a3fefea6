package utdigit.web.sheets;

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
@Tag(name = "Technique sheets", description = "Validation of whole technique sheets against requirement profiles")
class TechniqueSheetValidationController {
    private final CalculationRunner runner;
    private final TechniqueSheetValidationCalculation calculation;

    TechniqueSheetValidationController(CalculationRunner runner, TechniqueSheetValidationCalculation calculation) {
        this.runner = runner;
        this.calculation = calculation;
    }

    @PostMapping(path = "/api/" + TechniqueSheetValidationCalculation.NAME,
            consumes = MediaType.APPLICATION_JSON_VALUE, produces = MediaType.APPLICATION_JSON_VALUE)
    @Operation(summary = "Validate a technique sheet against a requirement profile",
            description = "Computes every metric the sheet's fields allow with the same calculators as the single "
                    + "endpoints, checks each applicable rule of the profile (default common-practice) and answers "
                    + "the verdict with its findings, the values and a stamp. A sheet that breaks rules is a 200 with "
                    + "findings; only malformed input is a 4xx. Caution: built-in example profiles are UNVERIFIED "
                    + "transcriptions; the governing code edition, local codes and licensed practice decide, and the "
                    + "results support a qualified examiner, never replace procedure qualification.")
    @ApiResponse(responseCode = "200", description = "The verdict and findings")
    Stamped<TechniqueSheetValidationResponse> validate(@RequestBody TechniqueSheetRequest request) {
        return runner.run(calculation, request);
    }
}
