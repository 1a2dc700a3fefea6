package utdigit.web.waveform;

import java.util.Map;
import org.springframework.stereotype.Component;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;
import utdigit.web.pipeline.CalculationRunner;
import utdigit.web.stamp.Stamped;

/**
 * The waveform answers of every body and Accept type, all through the one runner: the JSON answer,
 * the CSV body read into the JSON request, and the SVG figure, whose caption is read from the JSON
 * answer of the same request and whose series from the same core result.
 */
@Component
class WaveformReports {
    private final CalculationRunner runner;
    private final WaveformAnalysisCalculation calculation;
    private final JsonMapper mapper;

    WaveformReports(CalculationRunner runner, WaveformAnalysisCalculation calculation, JsonMapper mapper) {
        this.runner = runner;
        this.calculation = calculation;
        this.mapper = mapper;
    }

    Stamped<WaveformAnalysisResponse> json(WaveformAnalysisRequest request) {
        return runner.run(calculation, request);
    }

    WaveformAnalysisRequest fromCsv(String body, Map<String, String> parameters) {
        return runner.read(calculation, WaveformCsv.request(body, parameters));
    }

    String svg(WaveformAnalysisRequest request) {
        // validation, problems and the numbers, as for JSON; the caption reads the answer as it is written
        JsonNode answer = mapper.valueToTree(json(request));
        return WaveformFigure.render(calculation.result(request), answer);
    }
}
