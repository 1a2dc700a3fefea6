package utdigit.web.timing;

import io.swagger.v3.oas.annotations.media.Schema;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotNull;
import utdigit.core.materials.WaveMode;
import utdigit.core.timing.Technique;
import utdigit.core.timing.TimeReference;
import utdigit.web.json.InputMessages;
import utdigit.web.units.Lengths;
import utdigit.web.units.VelocityFields;

/** POST /api/time-of-flight-resolutions. */
@Schema(name = "TimeOfFlightResolutionRequest", description = "The digitizer's rate and the part's velocity, with "
        + "the technique and its geometry. Give the velocity once: velocity_m_per_s, velocity_in_per_us or material "
        + "(+ wave_mode: an angle beam in steel is usually SHEAR; + temperature_c for water). Each length once: "
        + "_mm or _in. TOFD needs probe_centre_separation; depth, thickness, pulse_duration_us (or frequency_mhz "
        + "with bandwidth_percent) and time_reference LATERAL_WAVE apply only to TOFD, refracted_angle_deg only to "
        + "PULSE_ECHO.")
public record TimeOfFlightResolutionRequest(
        @NotNull(message = InputMessages.REQUIRED) @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000")
        Double samplingFrequencyMhz,

        @Min(1) @Max(65536)
        Integer decimationFactor,

        @VelocityFields.MPerS Double velocityMPerS,
        @VelocityFields.InPerUs Double velocityInPerUs,
        @VelocityFields.MaterialId String material,
        @VelocityFields.Mode WaveMode waveMode,
        @VelocityFields.TemperatureC Double temperatureC,

        Technique technique,

        @DecimalMin("0") @DecimalMax(value = "90", inclusive = false)
        Double refractedAngleDeg,

        @Lengths.Mm
        Double probeCentreSeparationMm,

        @Lengths.In
        Double probeCentreSeparationIn,

        @Lengths.Mm
        Double depthMm,

        @Lengths.In
        Double depthIn,

        @Lengths.Mm
        Double thicknessMm,

        @Lengths.In
        Double thicknessIn,

        @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000")
        Double pulseDurationUs,

        @DecimalMin(value = "0", inclusive = false) @DecimalMax("1000")
        Double frequencyMhz,

        @DecimalMin(value = "0", inclusive = false) @DecimalMax(value = "200", inclusive = false)
        Double bandwidthPercent,

        TimeReference timeReference) implements VelocityFields {
}
