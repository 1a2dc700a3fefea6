package utdigit.web.coverage;

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
@Tag(name = "Scan coverage", description = "The amplitude lost between scan positions, index lines and sector-scan "
        + "beams, and the largest step for a tolerance")
class ScanCoverageController {
    private final CalculationRunner runner;
    private final ScanCoverageCalculation calculation;

    ScanCoverageController(CalculationRunner runner, ScanCoverageCalculation calculation) {
        this.runner = runner;
        this.calculation = calculation;
    }

    @PostMapping(path = "/api/" + ScanCoverageCalculation.NAME,
            consumes = MediaType.APPLICATION_JSON_VALUE, produces = MediaType.APPLICATION_JSON_VALUE)
    @Operation(summary = "Assess the coverage of a scan",
            description = "A reflector midway between two scan positions is seen off the beam axis by half the step: "
                    + "with the pulse-echo -6 dB beam width w at its sound path (Gaussian main lobe, a model of ours) "
                    + "it reads 6 (step / w)^2 dB low, for the scan increment and the index step; a sector scan's "
                    + "angular step moves the beam sound_path x step. With a tolerance X, the largest step w sqrt(X / 6) "
                    + "and whether each step is within it. The beam width is given, or computed for a round probe "
                    + "in its far field (inside the near field it is not known: null with a warning). Codes set their "
                    + "own increments by thickness band: the requirement profiles hold those. Caution: the governing "
                    + "code edition and procedure decide; results support a qualified examiner.")
    @ApiResponse(responseCode = "200", description = "The coverage")
    Stamped<ScanCoverageResponse> assess(@RequestBody ScanCoverageRequest request) {
        return runner.run(calculation, request);
    }
}
