package utdigit.web.sampling;

import io.swagger.v3.oas.annotations.media.Schema;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotNull;
import utdigit.core.materials.WaveMode;
import utdigit.core.pulse.CentreFrequencyConvention;
import utdigit.core.sampling.DecimationMode;
import utdigit.core.sampling.PeakReading;
import utdigit.core.sampling.SampledSignal;
import utdigit.core.sampling.TfmImage;
import utdigit.web.json.InputMessages;
import utdigit.web.units.Mirrors;
import utdigit.web.units.VelocityFields;

/** POST /api/sampling-assessments. */
@Schema(name = "SamplingAssessmentRequest", description = "A digitizer's sampling frequency and a probe's nominal "
        + "frequency, with optional decimation, bandwidth, amplitude tolerance and TFM grid. Each length once: _mm or "
        + "_in. A velocity (once: velocity_m_per_s, velocity_in_per_us or material + wave_mode, + temperature_c for "
        + "water) only with the TFM grid figures.")
public record SamplingAssessmentRequest(
        @Schema(description = "The converter's (raw) sampling frequency fs, MHz (> 0, <= 100000)", example = "100")
        @NotNull(message = InputMessages.REQUIRED) @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000")
        Double samplingFrequencyMhz,

        @Schema(description = "Nominal probe frequency, MHz (> 0, <= 1000)", example = "5")
        @NotNull(message = InputMessages.REQUIRED) @DecimalMin(value = "0", inclusive = false) @DecimalMax("1000")
        Double frequencyMhz,

        @Schema(description = "Decimation (compression) factor m: one stored sample per m converted (integer 1 to "
                + "65536); default 1", example = "4")
        @Min(1) @Max(65536)
        Integer decimationFactor,

        @Schema(description = "How the m samples become one: DROP keeps every m-th sample (amplitude figures at "
                + "fs/m), PEAK_PRESERVING keeps the largest |sample| of each group (amplitude figures at the raw fs); "
                + "timing and samples per period follow fs/m in both; processing of PEAK_PRESERVING data (TFM, SAFT, "
                + "filtering, FFT) sees fs/m and aliases above fs/(2m), warned as COMPRESSED_DATA_ALIASING; default DROP")
        DecimationMode decimationMode,

        @Schema(description = "-6 dB fractional bandwidth of the probe, % (0 to 200 exclusive); gives the pulse "
                + "figures. With amplitude_tolerance_db and signal RF it must be at least 1 (the floor of the pulse "
                + "rate search)", example = "60")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax(value = "200", inclusive = false)
        Double bandwidthPercent,

        @Schema(description = "How frequency_mhz relates to the -6 dB edges: ARITHMETIC (fl + fu)/2 or GEOMETRIC "
                + "sqrt(fl fu); default ARITHMETIC. Only with bandwidth_percent")
        CentreFrequencyConvention centreFrequencyConvention,

        @Schema(description = "What the converter digitizes: RF (the waveform) or ENVELOPE (detected before "
                + "sampling); default RF")
        SampledSignal signal,

        @Schema(description = "How an RF peak is read: ABSOLUTE (largest |sample|, rectified display) or "
                + "POSITIVE_PEAK (largest positive sample); default ABSOLUTE. Only with signal RF")
        PeakReading peakReading,

        @Schema(description = "Amplitude tolerance of the evaluation, dB (> 0, <= 40); gives the required rates "
                + "(and with tfm_grid_spacing the largest grid step)", example = "1")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax("40")
        Double amplitudeToleranceDb,

        @Schema(description = "TFM grid step in depth dz, mm (> 0, <= 100000); needs a velocity", example = "0.1")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax(Mirrors.MAX_MM)
        Double tfmGridSpacingMm,

        @Schema(description = "TFM grid step in depth dz, in (> 0, at most the equivalent of 100 m)", example = "0.004")
        @DecimalMin(value = "0", inclusive = false)
        Double tfmGridSpacingIn,

        @VelocityFields.MPerS Double velocityMPerS,
        @VelocityFields.InPerUs Double velocityInPerUs,
        @VelocityFields.MaterialId String material,
        @VelocityFields.Mode WaveMode waveMode,
        @VelocityFields.TemperatureC Double temperatureC,

        @Schema(description = "What the TFM image holds: RF (signed; carrier and envelope terms) or ENVELOPE "
                + "(magnitude; envelope term only, needs bandwidth_percent); default RF. Only with tfm_grid_spacing")
        TfmImage tfmImage,

        @Schema(description = "TFM grid step across (lateral) dx, mm (> 0, <= 100000); with tfm_aperture and "
                + "tfm_depth, and a velocity", example = "0.2")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax(Mirrors.MAX_MM)
        Double tfmLateralGridSpacingMm,

        @Schema(description = "TFM grid step across (lateral) dx, in", example = "0.008")
        @DecimalMin(value = "0", inclusive = false)
        Double tfmLateralGridSpacingIn,

        @Schema(description = "Active aperture A of the array for the lateral figure, mm (> 0, <= 100000)",
                example = "38.4")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax(Mirrors.MAX_MM)
        Double tfmApertureMm,

        @Schema(description = "Active aperture A of the array for the lateral figure, in", example = "1.5")
        @DecimalMin(value = "0", inclusive = false)
        Double tfmApertureIn,

        @Schema(description = "Depth z at which the lateral figure is assessed, mm (> 0, <= 100000)", example = "30")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax(Mirrors.MAX_MM)
        Double tfmDepthMm,

        @Schema(description = "Depth z at which the lateral figure is assessed, in", example = "1.2")
        @DecimalMin(value = "0", inclusive = false)
        Double tfmDepthIn) implements VelocityFields {
}
