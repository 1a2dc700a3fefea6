package utdigit.web.waveform;

import java.util.Map;
import org.springframework.stereotype.Component;
import tools.jackson.databind.node.ObjectNode;
import utdigit.web.common.CalculationRunner;

/**
 * The waveform answers of every body and Accept type, all through the one runner: the JSON answer,
 * the CSV body read into the JSON request, and the SVG figure, whose caption is read from the JSON
 * answer of the same request and whose series from the same core result.
 */
@Component
class WaveformReports {
    private final CalculationRunner runner;
    private final WaveformAnalysisCalculation calculation;

    WaveformReports(CalculationRunner runner, WaveformAnalysisCalculation calculation) {
        this.runner = runner;
        this.calculation = calculation;
    }

    ObjectNode json(WaveformAnalysisRequest request) {
        return runner.run(WaveformAnalysisCalculation.NAME, request);
    }

    WaveformAnalysisRequest fromCsv(String body, Map<String, String> parameters) {
        return runner.read(calculation, WaveformCsv.request(body, parameters));
    }

    String svg(WaveformAnalysisRequest request) {
        ObjectNode answer = json(request); // validation, problems and the numbers, as for JSON
        return WaveformFigure.render(calculation.result(request), answer);
    }
}
