package utdigit.web.timing;

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
@Tag(name = "Time of flight", description = "What one sample of the time base is worth in sound path, depth and "
        + "surface distance; TOFD geometry, depth step and dead zones")
class TimeOfFlightResolutionController {
    private final CalculationRunner runner;
    private final TimeOfFlightResolutionCalculation calculation;

    TimeOfFlightResolutionController(CalculationRunner runner, TimeOfFlightResolutionCalculation calculation) {
        this.runner = runner;
        this.calculation = calculation;
    }

    @PostMapping(path = "/api/" + TimeOfFlightResolutionCalculation.NAME,
            consumes = MediaType.APPLICATION_JSON_VALUE, produces = MediaType.APPLICATION_JSON_VALUE)
    @Operation(summary = "Resolve the time of flight of one sample",
            description = "The sampling interval of the stored samples and its timing error and standard uncertainty; "
                    + "the sound path of one sample for PULSE_ECHO (v dt/2), THROUGH_TRANSMISSION (v dt) or TOFD "
                    + "(v dt over both legs); with a refracted angle its depth and surface-distance components; for "
                    + "TOFD the lateral wave and tip arrival times, the depth step of one sample at a depth, and with "
                    + "a pulse duration the pulse-limited depth resolution and the near-surface and back-wall dead "
                    + "zones. TOFD times are in the part (wedge delays excluded) for a tip midway between the probes: "
                    + "a tip off the centre line reads deeper than it is. Sub-sample interpolation does better than "
                    + "these quantization figures. Caution: the governing code edition and procedure decide the "
                    + "tolerance; results support a qualified examiner.")
    @ApiResponse(responseCode = "200", description = "The resolution")
    Stamped<TimeOfFlightResolutionResponse> resolve(@RequestBody TimeOfFlightResolutionRequest request) {
        return runner.run(calculation, request);
    }
}
