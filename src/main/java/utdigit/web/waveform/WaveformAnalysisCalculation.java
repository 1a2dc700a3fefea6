package utdigit.web.waveform;

import java.util.List;
import org.springframework.stereotype.Component;
import utdigit.core.waveform.WaveformAnalyzer;
import utdigit.core.waveform.WaveformInput;
import utdigit.core.waveform.WaveformResult;
import utdigit.web.pipeline.Calculation;
import utdigit.web.problem.InputProblem;
import utdigit.web.pipeline.ResultNotes;
import utdigit.web.pipeline.ToleranceCheck;

/** Request to core input, core result to answer, for waveform analyses. */
@Component
class WaveformAnalysisCalculation implements Calculation<WaveformAnalysisRequest, WaveformAnalysisResponse> {
    static final String NAME = "waveform-analyses";

    @Override
    public String name() {
        return NAME;
    }

    @Override
    public Class<WaveformAnalysisRequest> requestType() {
        return WaveformAnalysisRequest.class;
    }

    @Override
    public Class<WaveformAnalysisResponse> answerType() {
        return WaveformAnalysisResponse.class;
    }

    /** The core result of a request that passed Bean Validation (the figure's series included). */
    WaveformResult result(WaveformAnalysisRequest q) {
        List<Double> samples = q.samples();
        double[] values = new double[samples.size()];
        for (int i = 0; i < values.length; i++) {
            Double v = samples.get(i);
            if (v == null) {
                throw InputProblem.invalid("/samples/" + i, "must be a number");
            }
            values[i] = v;
        }
        return WaveformAnalyzer.analyse(WaveformInput.builder(values, q.recordSamplingFrequencyMhz())
                .centreFrequencyConvention(q.centreFrequencyConvention())
                .samplingFrequencyMhz(q.samplingFrequencyMhz())
                .decimationFactor(q.decimationFactor())
                .decimationMode(q.decimationMode())
                .peakReading(q.peakReading())
                .amplitudeToleranceDb(q.amplitudeToleranceDb()).build());
    }

    @Override
    public WaveformAnalysisResponse answer(WaveformAnalysisRequest q) {
        WaveformResult r = result(q);
        WaveformResult.TargetFigures t = r.target();
        WaveformAnalysisRequest inputs = new WaveformAnalysisRequest(q.samples(), q.recordSamplingFrequencyMhz(),
                r.centreFrequencyConvention(), q.samplingFrequencyMhz(), t == null ? null : t.decimationFactor(),
                t == null ? null : t.decimationMode(), t == null ? null : t.peakReading(), q.amplitudeToleranceDb());
        return new WaveformAnalysisResponse(r.sampleCount(), r.frequencyResolutionMhz(), r.spectrumWindow(),
                r.peakFrequencyMhz(), r.lowerFrequencyMhz(), r.upperFrequencyMhz(), r.lowerFrequency20dbMhz(),
                r.upperFrequency20dbMhz(), r.centreFrequencyMhz(), r.bandwidthPercent(), r.pulseDuration6dbUs(),
                r.pulseDuration20dbUs(), r.cycles6db(), r.energyNearRecordNyquistFraction(),
                r.model().pulseDuration6dbUs(), r.model().cycles6db(),
                t == null ? null : t.effectiveSamplingFrequencyMhz(),
                t == null ? null : t.samplesPerPeriod(),
                t == null ? null : t.nyquistFrequencyMhz(),
                t == null ? null : t.pulseAmplitudeLossDb(),
                t == null ? null : t.worstPhaseNs(),
                t == null ? null : t.energyAboveNyquistFraction(),
                t == null ? null : t.requiredSamplingFrequencyPulseMhz(),
                t == null ? null : t.modelPulseAmplitudeLossDb(),
                t == null ? null : t.modelEnergyAboveNyquistFraction(),
                t == null ? null : t.modelRequiredSamplingFrequencyPulseMhz(),
                t == null ? null : ToleranceCheck.builder()
                        .atMost("pulse_amplitude_loss_db", t.pulseAmplitudeLossDb(), "amplitude_tolerance_db",
                                q.amplitudeToleranceDb())
                        .atMost("model_pulse_amplitude_loss_db", t.modelPulseAmplitudeLossDb(), "amplitude_tolerance_db",
                                q.amplitudeToleranceDb())
                        .build(),
                inputs, ResultNotes.warnings(r.warnings()), ResultNotes.references(r.references()));
    }
}
