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
import utdigit.web.stamp.Stamped;

@RestController
@Tag(name = "Waveforms", description = "Measured waveforms: a recorded pulse's spectrum and envelope, and the sampling "
        + "adequacy of the real pulse beside the Gaussian model, as JSON or as a report figure (SVG)")
class WaveformAnalysisController {
    static final String SVG = "image/svg+xml";
    static final String CSV = "text/csv";
    /** A CSV example for the document: a 5 MHz, 60 percent pulse recorded at 100 MHz (synthesised, Gaussian model). */
    static final String CSV_EXAMPLE = "time_ns,amplitude\n0,0.00584\n10,0.00716\n20,0.00780\n30,0.00721\n40,0.00479\n50,-0.00000\n60,-0.00752\n70,-0.01773\n80,-0.03008\n90,-0.04330\n100,-0.05540\n110,-0.06369\n120,-0.06507\n130,-0.05642\n140,-0.03517\n150,0.00000\n160,0.04851\n170,0.10731\n180,0.17070\n190,0.23041\n200,0.27640\n210,0.29799\n220,0.28550\n230,0.23213\n240,0.13570\n250,-0.00000\n260,-0.16457\n270,-0.34141\n280,-0.50923\n290,-0.64457\n300,-0.72508\n310,-0.73303\n320,-0.65857\n330,-0.50212\n340,-0.27525\n350,0.00000\n360,0.29352\n370,0.57102\n380,0.79868\n390,0.94800\n400,1.00000\n410,0.94800\n420,0.79868\n430,0.57102\n440,0.29352\n450,0.00000\n460,-0.27525\n470,-0.50212\n480,-0.65857\n490,-0.73303\n500,-0.72508\n510,-0.64457\n520,-0.50923\n530,-0.34141\n540,-0.16457\n550,-0.00000\n560,0.13570\n570,0.23213\n580,0.28550\n590,0.29799\n600,0.27640\n610,0.23041\n620,0.17070\n630,0.10731\n640,0.04851\n650,0.00000\n660,-0.03517\n670,-0.05642\n680,-0.06507\n690,-0.06369\n700,-0.05540\n710,-0.04330\n720,-0.03008\n730,-0.01773\n740,-0.00752\n750,-0.00000\n760,0.00479\n770,0.00721\n780,0.00780\n790,0.00716\n";
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
    Stamped<WaveformAnalysisResponse> analyse(@RequestBody WaveformAnalysisRequest request) {
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
    Stamped<WaveformAnalysisResponse> analyseCsv(@io.swagger.v3.oas.annotations.parameters.RequestBody(description = "The record as CSV: 'amplitude', or "
            + "'time_<unit>,amplitude'", content = @Content(mediaType = CSV, schema = @Schema(type = "string"),
            examples = @io.swagger.v3.oas.annotations.media.ExampleObject(name = "pulse", value = CSV_EXAMPLE)))
            @RequestBody String body, @Parameter(description = "The other inputs, named as in the JSON "
            + "request (record_sampling_frequency_mhz with one amplitude column, sampling_frequency_mhz, "
            + "decimation_factor, decimation_mode, peak_reading, amplitude_tolerance_db, centre_frequency_convention)")
            @RequestParam(required = false) Map<String, String> parameters) {
        return reports.json(reports.fromCsv(body, parameters));
    }

    @PostMapping(path = "/api/" + WaveformAnalysisCalculation.NAME, consumes = CSV, produces = SVG)
    @Operation(summary = "The report figure of a recorded pulse given as CSV", description = DESCRIPTION)
    @ApiResponse(responseCode = "200", description = "The figure, SVG",
            content = @Content(mediaType = SVG, schema = @Schema(type = "string")))
    String figureCsv(@io.swagger.v3.oas.annotations.parameters.RequestBody(description = "The record as CSV: 'amplitude', or "
            + "'time_<unit>,amplitude'", content = @Content(mediaType = CSV, schema = @Schema(type = "string"),
            examples = @io.swagger.v3.oas.annotations.media.ExampleObject(name = "pulse", value = CSV_EXAMPLE)))
            @RequestBody String body, @Parameter(description = "The other inputs, as for the CSV analysis")
            @RequestParam(required = false) Map<String, String> parameters) {
        return reports.svg(reports.fromCsv(body, parameters));
    }
}
