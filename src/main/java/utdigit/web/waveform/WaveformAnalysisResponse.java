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
        @Schema(description = "Samples in the record", example = "512")
        int sampleCount,

        @Schema(description = "Bin spacing of the zero-padded spectrum, MHz", example = "0.0244")
        double frequencyResolutionMhz,

        @Schema(description = "Window applied before the spectrum: NONE (the echo lies wholly inside the record) or "
                + "TUKEY_20 (the echo is cut by the record's ends; a warning says so)")
        SpectrumWindow spectrumWindow,

        @Schema(description = "Frequency of the spectrum's largest bin, MHz", example = "5.005")
        double peakFrequencyMhz,

        @Schema(description = "Lower -6 dB edge fl, MHz", example = "3.5")
        double lowerFrequencyMhz,

        @Schema(description = "Upper -6 dB edge fu, MHz", example = "6.5")
        double upperFrequencyMhz,

        @Schema(description = "Lower -20 dB edge, MHz; null when the spectrum does not fall that far above 0 Hz",
                example = "2.26", types = {"number", "null"})
        Optional<Double> lowerFrequency20dbMhz,

        @Schema(description = "Upper -20 dB edge, MHz; null when the spectrum does not fall that far below the "
                + "record's Nyquist frequency", example = "7.74", types = {"number", "null"})
        Optional<Double> upperFrequency20dbMhz,

        @Schema(description = "Centre frequency fc by centre_frequency_convention, MHz", example = "5")
        double centreFrequencyMhz,

        @Schema(description = "-6 dB fractional bandwidth (fu - fl)/fc, %", example = "60")
        double bandwidthPercent,

        @Schema(description = "-6 dB duration of the envelope, us; null when the envelope does not fall that far "
                + "inside the record", example = "0.293", types = {"number", "null"})
        Optional<Double> pulseDuration6dbUs,

        @Schema(description = "-20 dB duration of the envelope, us; null when the envelope does not fall that far "
                + "inside the record", example = "0.536", types = {"number", "null"})
        Optional<Double> pulseDuration20dbUs,

        @Schema(description = "Cycles in the -6 dB duration, duration x fc", example = "1.47",
                types = {"number", "null"})
        Optional<Double> cycles6db,

        @Schema(description = "Fraction (0 to 1) of the record's spectral energy above 0.8 of its own Nyquist "
                + "frequency: above 1e-4 a warning, above 1e-2 the record is refused (422)",
                example = "1e-12")
        double energyNearRecordNyquistFraction,

        @Schema(description = "The Gaussian model's -6 dB duration for the measured centre and bandwidth, us; null "
                + "when no model exists (bandwidth 200 % or more)", example = "0.293",
                types = {"number", "null"})
        Optional<Double> modelPulseDuration6dbUs,

        @Schema(description = "The Gaussian model's -6 dB cycles", example = "1.47", types = {"number", "null"})
        Optional<Double> modelCycles6db,

        @Schema(description = "Stored target rate fs/m, MHz; only with sampling_frequency_mhz", example = "25")
        Double effectiveSamplingFrequencyMhz,

        @Schema(description = "Samples per period of the measured centre frequency at fs/m; only with "
                + "sampling_frequency_mhz", example = "5")
        Double samplesPerPeriod,

        @Schema(description = "Half the rate that decides amplitude (fs/m for DROP, fs for PEAK_PRESERVING), MHz; "
                + "only with sampling_frequency_mhz", example = "12.5")
        Double nyquistFrequencyMhz,

        @Schema(description = "Worst case over the sampling phase of the recorded pulse's read peak at the target, "
                + "dB, by band-limited reconstruction of the record; null at 2 or fewer samples per period of the "
                + "centre; only with sampling_frequency_mhz", example = "1.953",
                types = {"number", "null"})
        Optional<Double> pulseAmplitudeLossDb,

        @Schema(description = "The sampling phase of that worst case, ns after the record's first sample (modulo "
                + "the sampling interval)", example = "23", types = {"number", "null"})
        Optional<Double> worstPhaseNs,

        @Schema(description = "Fraction (0 to 1) of the record's spectral energy above the target's Nyquist "
                + "frequency (within the record's own band); only with sampling_frequency_mhz",
                example = "5.6e-11")
        Double energyAboveNyquistFraction,

        @Schema(description = "The raw sampling frequency to set (same decimation) above which every rate keeps the "
                + "recorded pulse's loss within amplitude_tolerance_db, MHz; only with amplitude_tolerance_db",
                example = "34.37")
        Optional<Double> requiredSamplingFrequencyPulseMhz,

        @Schema(description = "The Gaussian model's pulse_amplitude_loss_db at the target (as the sampling "
                + "assessment computes it); null where it has none", example = "1.953",
                types = {"number", "null"})
        Optional<Double> modelPulseAmplitudeLossDb,

        @Schema(description = "The Gaussian model's energy_above_nyquist_fraction at the target",
                example = "4.7e-17", types = {"number", "null"})
        Optional<Double> modelEnergyAboveNyquistFraction,

        @Schema(description = "The Gaussian model's required_sampling_frequency_pulse_mhz; only with "
                + "amplitude_tolerance_db; null where the model's search does not apply",
                example = "34.36", types = {"number", "null"})
        Optional<Double> modelRequiredSamplingFrequencyPulseMhz,

        @Schema(description = "Each figure compared with a tolerance of the request, the same shape as on every "
                + "endpoint: the record's pulse_amplitude_loss_db and the model's model_pulse_amplitude_loss_db at most "
                + "amplitude_tolerance_db; only with sampling_frequency_mhz and amplitude_tolerance_db")
        List<ToleranceCheck> toleranceChecks,

        @Schema(description = "The normalised request: every default that has an effect; itself a valid request "
                + "that reproduces this answer")
        WaveformAnalysisRequest inputs,

        @Schema(description = "Conditions the caller should know about")
        List<WarningView> warnings,

        @Schema(description = "The source of every method used")
        List<ReferenceView> references) {
}
