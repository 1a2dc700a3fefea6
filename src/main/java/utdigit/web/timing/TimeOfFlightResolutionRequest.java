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
import utdigit.web.units.Mirrors;
import utdigit.web.units.VelocityFields;

/** POST /api/time-of-flight-resolutions. */
@Schema(name = "TimeOfFlightResolutionRequest", description = "The digitizer's rate and the part's velocity, with "
        + "the technique and its geometry. Give the velocity once: velocity_m_per_s, velocity_in_per_us or material "
        + "(+ wave_mode: an angle beam in steel is usually SHEAR; + temperature_c for water). Each length once: "
        + "_mm or _in. TOFD needs probe_centre_separation; depth, thickness, pulse_duration_us (or frequency_mhz "
        + "with bandwidth_percent) and time_reference LATERAL_WAVE apply only to TOFD, refracted_angle_deg only to "
        + "PULSE_ECHO.")
public record TimeOfFlightResolutionRequest(
        @Schema(description = "Converter (raw) sampling frequency, MHz (> 0, <= 100000)", example = "100")
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

        @Schema(description = "PULSE_ECHO (one sample: v dt/2 of sound path), THROUGH_TRANSMISSION (v dt) or TOFD "
                + "(v dt over both legs); default PULSE_ECHO")
        Technique technique,

        @Schema(description = "PULSE_ECHO only: refracted beam angle in the part, deg (0 to below 90); gives "
                + "depth_resolution_mm and surface_distance_resolution_mm", example = "60")
        @DecimalMin("0") @DecimalMax(value = "90", inclusive = false)
        Double refractedAngleDeg,

        @Schema(description = "TOFD only, required there: probe centre separation, the full distance 2S between "
                + "the probe indices, mm (> 0, <= 100000)", example = "58")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax(Mirrors.MAX_MM)
        Double probeCentreSeparationMm,

        @Schema(description = "TOFD only: probe centre separation 2S, in (> 0, at most 100 m)", example = "2.25")
        @DecimalMin(value = "0", inclusive = false)
        Double probeCentreSeparationIn,

        @Schema(description = "TOFD only: tip depth below the scanning surface, midway between the probes, mm "
                + "(> 0, <= 100000; not below thickness)", example = "16")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax(Mirrors.MAX_MM)
        Double depthMm,

        @Schema(description = "TOFD only: tip depth, in (> 0, at most 100 m)", example = "0.625")
        @DecimalMin(value = "0", inclusive = false)
        Double depthIn,

        @Schema(description = "TOFD only: wall thickness, mm (> 0, <= 100000); with a pulse duration gives "
                + "backwall_dead_zone_mm", example = "25")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax(Mirrors.MAX_MM)
        Double thicknessMm,

        @Schema(description = "TOFD only: wall thickness, in (> 0, at most 100 m)", example = "1")
        @DecimalMin(value = "0", inclusive = false)
        Double thicknessIn,

        @Schema(description = "TOFD only: signal duration for the dead zones, as measured on the A-scan, us "
                + "(> 0, <= 100000); or give frequency_mhz with bandwidth_percent instead, not both",
                example = "0.3")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000")
        Double pulseDurationUs,

        @Schema(description = "TOFD only, with bandwidth_percent: nominal probe frequency, MHz (> 0, <= 1000); "
                + "the pulse duration is then the model's -20 dB envelope duration",
                example = "7.5")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax("1000")
        Double frequencyMhz,

        @Schema(description = "TOFD only, with frequency_mhz: -6 dB fractional bandwidth of the probe, % (0 to 200 "
                + "exclusive)", example = "65")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax(value = "200", inclusive = false)
        Double bandwidthPercent,

        @Schema(description = "Where times are measured from: TRIGGER (one quantized instant) or, TOFD only, "
                + "LATERAL_WAVE (a difference of two quantized instants); default TRIGGER")
        TimeReference timeReference) implements VelocityFields {
}
