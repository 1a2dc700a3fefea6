package utdigit.web.acquisition;

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
@Tag(name = "Acquisition", description = "Acquisition budget: data volume, scan speed and wrap-around PRF")
class AcquisitionBudgetController {
    private final CalculationRunner runner;
    private final AcquisitionBudgetCalculation calculation;

    AcquisitionBudgetController(CalculationRunner runner, AcquisitionBudgetCalculation calculation) {
        this.runner = runner;
        this.calculation = calculation;
    }

    @PostMapping(path = "/api/" + AcquisitionBudgetCalculation.NAME,
            consumes = MediaType.APPLICATION_JSON_VALUE, produces = MediaType.APPLICATION_JSON_VALUE)
    @Operation(summary = "Budget the data volume, scan speed and wrap-around PRF of an encoded scan",
            description = "Samples and bytes per A-scan, firings and A-scans per position (phased array: one of "
                    + "each per focal law; FMC with n elements: n firings, n^2 A-scans; HMC: n firings, n(n+1)/2 "
                    + "A-scans), data per position, per metre and per file, the PRF-limited scan speed "
                    + "v_max = PRF x increment / (firings x averaging), the data rate, and with a round trip the "
                    + "highest PRF without wrap-around echoes, 1/(q t_rt). Data volume counts A-scans; scan speed "
                    + "counts firings. MB is 10^6 bytes (MB/s: 10^6 bytes per second); sizes exclude headers, "
                    + "encoder data and compression. A planned speed above the maximum, a PRF above the "
                    + "wrap-around limit and a file above file_size_limit_megabytes are warnings; a gate longer "
                    + "than the pulse repetition period is a 422. The relations are common practice, no published "
                    + "source. Caution: the governing code edition and procedure decide the scan increment and "
                    + "speed; the instrument's own file format decides the bytes stored; results support a "
                    + "qualified examiner.")
    @ApiResponse(responseCode = "200", description = "The budget")
    Stamped<AcquisitionBudgetResponse> budget(@RequestBody AcquisitionBudgetRequest request) {
        return runner.run(calculation, request);
    }
}
