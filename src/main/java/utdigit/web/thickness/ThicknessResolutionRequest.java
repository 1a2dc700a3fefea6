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
import utdigit.web.units.Lengths;
import utdigit.web.units.VelocityFields;

/** POST /api/thickness-resolutions. */
@Schema(name = "ThicknessResolutionRequest", description = "The digitizer's rate, the part's velocity and its "
        + "standard uncertainty, and the nominal wall thickness. Give the velocity once: velocity_m_per_s, "
        + "velocity_in_per_us or material (+ wave_mode, + temperature_c for water); the velocity uncertainty at most "
        + "once; each length once: _mm or _in.")
public record ThicknessResolutionRequest(
        @NotNull(message = InputMessages.REQUIRED) @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000")
        Double samplingFrequencyMhz,

        @Min(1) @Max(65536)
        Integer decimationFactor,

        @VelocityFields.MPerS Double velocityMPerS,
        @VelocityFields.InPerUs Double velocityInPerUs,
        @VelocityFields.MaterialId String material,
        @VelocityFields.Mode WaveMode waveMode,
        @VelocityFields.TemperatureC Double temperatureC,

        @DecimalMin("0") @DecimalMax("4000")
        Double velocityUncertaintyMPerS,

        @DecimalMin("0") @DecimalMax("20")
        Double velocityUncertaintyPercent,

        @Lengths.Mm
        Double nominalThicknessMm,

        @Lengths.In
        Double nominalThicknessIn,

        Measurement measurement,

        @Min(1) @Max(65536)
        Integer echoSpacing,

        @Lengths.Mm
        Double requiredResolutionMm,

        @Lengths.In
        Double requiredResolutionIn,

        @DecimalMin("1") @DecimalMax("5")
        Double coverageFactor,

        @DecimalMin(value = "0", inclusive = false) @DecimalMax("1000")
        Double frequencyMhz,

        @DecimalMin(value = "0", inclusive = false) @DecimalMax(value = "200", inclusive = false)
        Double bandwidthPercent,

        @DecimalMin("0")
        Double velocityUncertaintyInPerUs) implements VelocityFields {
}
