package utdigit.web.waveform;

import io.swagger.v3.oas.annotations.media.Schema;
import utdigit.web.pipeline.ToleranceCheck;
import java.util.List;
import java.util.Optional;
import utdigit.core.waveform.WaveformResult.SpectrumWindow;
import utdigit.web.pipeline.ResultNotes.ReferenceView;
import utdigit.web.pipeline.ResultNotes.WarningView;

/** The answer of POST /api/waveform-analyses. */
@Schema(name = "WaveformAnalysis", description = "A recorded pulse's measured spectrum and envelope, the record's own "
        + "adequacy, and with a target rate the sampling adequacy of the real pulse beside the Gaussian pulse model "
        + "of the same centre and bandwidth (model_ fields, computed as POST /api/sampling-assessments does). Losses are "
        + "positive numbers of dB. Fields whose optional inputs were not given are omitted; a value that cannot exist "
        + "is null with a warning.")
record WaveformAnalysisResponse(
        int sampleCount,

        double frequencyResolutionMhz,

        SpectrumWindow spectrumWindow,

        double peakFrequencyMhz,

        double lowerFrequencyMhz,

        double upperFrequencyMhz,

        Optional<Double> lowerFrequency20dbMhz,

        Optional<Double> upperFrequency20dbMhz,

        double centreFrequencyMhz,

        double bandwidthPercent,

        Optional<Double> pulseDuration6dbUs,

        Optional<Double> pulseDuration20dbUs,

        Optional<Double> cycles6db,

        double energyNearRecordNyquistFraction,

        Optional<Double> modelPulseDuration6dbUs,

        Optional<Double> modelCycles6db,

        Double effectiveSamplingFrequencyMhz,

        Double samplesPerPeriod,

        Double nyquistFrequencyMhz,

        Optional<Double> pulseAmplitudeLossDb,

        Optional<Double> worstPhaseNs,

        Double energyAboveNyquistFraction,

        Optional<Double> requiredSamplingFrequencyPulseMhz,

        Optional<Double> modelPulseAmplitudeLossDb,

        Optional<Double> modelEnergyAboveNyquistFraction,

        Optional<Double> modelRequiredSamplingFrequencyPulseMhz,

        List<ToleranceCheck> toleranceChecks,

        WaveformAnalysisRequest inputs,

        List<WarningView> warnings,

        List<ReferenceView> references) {
}
