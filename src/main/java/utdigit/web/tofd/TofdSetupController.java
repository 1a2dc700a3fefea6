package utdigit.web.tofd;

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
@Tag(name = "TOFD set-up", description = "Lateral-wave and back-wall times, the gate, depth from a measured time "
        + "and its uncertainty")
class TofdSetupController {
    private final CalculationRunner runner;
    private final TofdSetupCalculation calculation;

    TofdSetupController(CalculationRunner runner, TofdSetupCalculation calculation) {
        this.runner = runner;
        this.calculation = calculation;
    }

    @PostMapping(path = "/api/" + TofdSetupCalculation.NAME,
            consumes = MediaType.APPLICATION_JSON_VALUE, produces = MediaType.APPLICATION_JSON_VALUE)
    @Operation(summary = "Check a TOFD set-up",
            description = "For probes symmetric about the tip (half separation S, thickness T, velocity v): the lateral "
                    + "wave 2S / v and the back wall 2 sqrt(S^2 + T^2) / v; the latest gate opening and earliest closing "
                    + "with the pulse duration as margin each side, and whether a given gate spans the wall; the depth "
                    + "sqrt((v t / 2)^2 - S^2) of a measured time; the depth uncertainty at a depth or time from the "
                    + "sampling ((v^2 t / (4 d)) u_t, u_t = dt/sqrt(12) from the trigger or dt/sqrt(6) from the lateral "
                    + "wave) and from the separation's standard uncertainty ((S / d) u_S), combined by the GUM's law of "
                    + "propagation with an expanded uncertainty k u. The velocity's own uncertainty and a tip off the "
                    + "centre line (it reads deeper) are not in it. The mode-converted back wall arrives later still. "
                    + "Times are in the part (wedge delays excluded). Caution: the governing code edition and procedure "
                    + "decide; results support a qualified examiner.")
    @ApiResponse(responseCode = "200", description = "The set-up")
    Stamped<TofdSetupResponse> check(@RequestBody TofdSetupRequest request) {
        return runner.run(calculation, request);
    }
}
