package utdigit.web.waveform;

import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.Parameter;
import io.swagger.v3.oas.annotations.media.Content;
import io.swagger.v3.oas.annotations.media.Schema;
import io.swagger.v3.oas.annotations.responses.ApiResponse;
import io.swagger.v3.oas.annotations.tags.Tag;
import java.util.Map;
import org.springframework.http.MediaType;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.bind.annotation.RestController;
import tools.jackson.databind.node.ObjectNode;

@RestController
@Tag(name = "Waveforms", description = "Measured waveforms: a recorded pulse's spectrum and envelope, and the sampling "
        + "adequacy of the real pulse beside the Gaussian model, as JSON or as a report figure (SVG)")
class WaveformAnalysisController {
    static final String SVG = "image/svg+xml";
    static final String CSV = "text/csv";
    private static final String DESCRIPTION = "A recorded pulse (a probe certificate's waveform or a reference echo: "
            + "samples and the rate they were recorded at). Answers the measured spectrum (zero-padded |FFT| of the "
            + "mean-removed record: peak, -6 and -20 dB edges by interpolation, centre by centre_frequency_convention, "
            + "fractional bandwidth), the envelope (|analytic signal|: -6 and -20 dB durations, cycles), and the "
            + "record's own adequacy (energy above 0.8 of its Nyquist frequency: a warning above 1e-4, a 422 above "
            + "1e-2). With sampling_frequency_mhz (and decimation, peak_reading, amplitude_tolerance_db as in the "
            + "sampling assessment): samples per period at the measured centre, the worst case over every sampling "
            + "phase of the real pulse's read peak by band-limited reconstruction of the record, the record's energy "
            + "above the target Nyquist, the rate for the tolerance, and beside them the model_ figures of the Gaussian "
            + "pulse model of the same centre and bandwidth (as POST /api/sampling-assessments computes them): how "
            + "optimistic the model is for this probe. Bodies: application/json, or text/csv with a header 'amplitude' "
            + "(then record_sampling_frequency_mhz as a query parameter) or 'time_<unit>,amplitude' (unit s, ms, us "
            + "or ns; equally spaced), the other inputs as query parameters. Accept: application/json (the answer) or "
            + "image/svg+xml (a report figure of the waveform, envelope, samples at the target rate at their worst "
            + "phase, and the spectrum with its band edges and the target Nyquist, captioned with the answer's "
            + "numbers). Caution: the governing code edition and procedure decide the rate and tolerance; results "
            + "support a qualified examiner.";

    private final WaveformReports reports;

    WaveformAnalysisController(WaveformReports reports) {
        this.reports = reports;
    }

    @PostMapping(path = "/api/" + WaveformAnalysisCalculation.NAME,
            consumes = MediaType.APPLICATION_JSON_VALUE, produces = MediaType.APPLICATION_JSON_VALUE)
    @Operation(summary = "Analyse a recorded pulse and judge sampling on it", description = DESCRIPTION)
    @ApiResponse(responseCode = "200", description = "The analysis",
            content = @Content(schema = @Schema(implementation = WaveformAnalysisResponse.class)))
    ObjectNode analyse(@RequestBody WaveformAnalysisRequest request) {
        return reports.json(request);
    }

    @PostMapping(path = "/api/" + WaveformAnalysisCalculation.NAME, consumes = MediaType.APPLICATION_JSON_VALUE,
            produces = SVG)
    @Operation(summary = "The report figure of a recorded pulse", description = DESCRIPTION)
    @ApiResponse(responseCode = "200", description = "The figure, SVG",
            content = @Content(mediaType = SVG, schema = @Schema(type = "string")))
    String figure(@RequestBody WaveformAnalysisRequest request) {
        return reports.svg(request);
    }

    @PostMapping(path = "/api/" + WaveformAnalysisCalculation.NAME, consumes = CSV,
            produces = MediaType.APPLICATION_JSON_VALUE)
    @Operation(summary = "Analyse a recorded pulse given as CSV", description = DESCRIPTION)
    @ApiResponse(responseCode = "200", description = "The analysis",
            content = @Content(schema = @Schema(implementation = WaveformAnalysisResponse.class)))
    ObjectNode analyseCsv(@RequestBody String body, @Parameter(description = "The other inputs, named as in the JSON "
            + "request (record_sampling_frequency_mhz with one amplitude column, sampling_frequency_mhz, "
            + "decimation_factor, decimation_mode, peak_reading, amplitude_tolerance_db, centre_frequency_convention)")
            @RequestParam Map<String, String> parameters) {
        return reports.json(reports.fromCsv(body, parameters));
    }

    @PostMapping(path = "/api/" + WaveformAnalysisCalculation.NAME, consumes = CSV, produces = SVG)
    @Operation(summary = "The report figure of a recorded pulse given as CSV", description = DESCRIPTION)
    @ApiResponse(responseCode = "200", description = "The figure, SVG",
            content = @Content(mediaType = SVG, schema = @Schema(type = "string")))
    String figureCsv(@RequestBody String body, @Parameter(description = "The other inputs, as for the CSV analysis")
            @RequestParam Map<String, String> parameters) {
        return reports.svg(reports.fromCsv(body, parameters));
    }
}
