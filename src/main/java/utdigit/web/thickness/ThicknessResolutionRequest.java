package utdigit.web.thickness;

import io.swagger.v3.oas.annotations.media.Schema;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotNull;
import utdigit.core.materials.WaveMode;
import utdigit.core.thickness.Measurement;
import utdigit.web.json.InputMessages;
import utdigit.web.units.Mirrors;
import utdigit.web.units.VelocityFields;

/** POST /api/thickness-resolutions. */
@Schema(name = "ThicknessResolutionRequest", description = "The digitizer's rate, the part's velocity and its "
        + "standard uncertainty, and the nominal wall thickness. Give the velocity once: velocity_m_per_s, "
        + "velocity_in_per_us or material (+ wave_mode, + temperature_c for water); the velocity uncertainty at most "
        + "once; each length once: _mm or _in.")
public record ThicknessResolutionRequest(
        @Schema(description = "Converter (raw) sampling frequency, MHz (> 0, <= 100000)", example = "50")
        @NotNull(message = InputMessages.REQUIRED) @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000")
        Double samplingFrequencyMhz,

        @Schema(description = "Stored rate is sampling_frequency_mhz / decimation_factor (integer 1 to 65536); "
                + "default 1", example = "1")
        @Min(1) @Max(65536)
        Integer decimationFactor,

        @VelocityFields.MPerS Double velocityMPerS,
        @VelocityFields.InPerUs Double velocityInPerUs,
        @VelocityFields.MaterialId String material,
        @VelocityFields.Mode WaveMode waveMode,
        @VelocityFields.TemperatureC Double temperatureC,

        @Schema(description = "Standard uncertainty (not a half-width) of the velocity, m/s (0 to 4000, and at most "
                + "20 % of the velocity); or give velocity_uncertainty_percent, not both. Neither: 0, with a warning "
                + "that the uncertainty then holds the sampling alone", example = "15")
        @DecimalMin("0") @DecimalMax("4000")
        Double velocityUncertaintyMPerS,

        @Schema(description = "Standard uncertainty (not a half-width) of the velocity, % of the velocity (0 to 20); "
                + "or give velocity_uncertainty_m_per_s, not both", example = "0.5")
        @DecimalMin("0") @DecimalMax("20")
        Double velocityUncertaintyPercent,

        @Schema(description = "Nominal wall thickness, mm (> 0, <= 100000); this or nominal_thickness_in is required",
                example = "12.5")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax(Mirrors.MAX_MM)
        Double nominalThicknessMm,

        @Schema(description = "Nominal wall thickness, in (> 0, at most 100 m)", example = "0.5")
        @DecimalMin(value = "0", inclusive = false)
        Double nominalThicknessIn,

        @Schema(description = "FIRST_ECHO (trigger to the first back-wall echo: one quantized instant) or "
                + "ECHO_TO_ECHO (between two back-wall echoes echo_spacing round trips apart: a difference of two "
                + "quantized instants); default FIRST_ECHO")
        Measurement measurement,

        @Schema(description = "ECHO_TO_ECHO: round trips m between the timed echoes (integer 1 to 65536; 1 for "
                + "adjacent echoes); default 1, the only value with FIRST_ECHO", example = "1")
        @Min(1) @Max(65536)
        Integer echoSpacing,

        @Schema(description = "Thickness resolution required, mm (> 0, <= 100000); gives "
                + "required_sampling_frequency_mhz and warns when the resolution is coarser",
                example = "0.05")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax(Mirrors.MAX_MM)
        Double requiredResolutionMm,

        @Schema(description = "Thickness resolution required, in (> 0, at most 100 m)", example = "0.002")
        @DecimalMin(value = "0", inclusive = false)
        Double requiredResolutionIn,

        @Schema(description = "Coverage factor k of expanded_uncertainty_mm (1 to 5); default 2. The coverage "
                + "probability is not stated: k = 2 is about 95 % only when the velocity term dominates",
                example = "2")
        @DecimalMin("1") @DecimalMax("5")
        Double coverageFactor,

        @Schema(description = "Optional, with bandwidth_percent (an input added to the endpoint's core list): "
                + "nominal probe frequency, MHz (> 0, <= 1000), used only to warn when nominal_thickness is below "
                + "the axial resolution v tau(-6 dB)/2 of the Gaussian pulse model (the wall echoes overlap)", example = "5")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax("1000")
        Double frequencyMhz,

        @Schema(description = "Optional, with frequency_mhz (an input added to the endpoint's core list): -6 dB "
                + "fractional bandwidth of the probe, % (0 to 200 exclusive), used only for the wall-echo overlap warning",
                example = "60")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax(value = "200", inclusive = false)
        Double bandwidthPercent,

        @Schema(description = "Standard uncertainty of the velocity, in/us (equivalent of 0 to 4000 m/s, at most 20 % "
                + "of the velocity); the inch form of velocity_uncertainty_m_per_s, not with it nor with "
                + "velocity_uncertainty_percent", format = "double", example = "0.00059", minimum = "0")
        @DecimalMin("0")
        Double velocityUncertaintyInPerUs) implements VelocityFields {
}
