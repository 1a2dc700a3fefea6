package utdigit.web.coverage;

import io.swagger.v3.oas.annotations.media.Schema;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import utdigit.core.materials.WaveMode;
import utdigit.web.units.Mirrors;
import utdigit.web.units.VelocityFields;

/** POST /api/scan-coverages. */
@Schema(name = "ScanCoverageRequest", description = "The beam width at the reflector's depth, and the steps of the "
        + "scan. Give the beam width once: beam_width_6db (measured, or computed elsewhere, at the reflector's sound "
        + "path), or a round probe's frequency_mhz, element_diameter and velocity with sound_path. Each length once: "
        + "_mm or _in. The velocity once: velocity_m_per_s, velocity_in_per_us or material (+ wave_mode, + "
        + "temperature_c for water). angular_step_deg needs sound_path.")
public record ScanCoverageRequest(
        @Schema(description = "Pulse-echo -6 dB beam width at the reflector's sound path, mm (> 0, <= 100000)",
                example = "8")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax(Mirrors.MAX_MM)
        Double beamWidth6dbMm,

        @Schema(description = "Pulse-echo -6 dB beam width, in (> 0, at most 100 m)", example = "0.315")
        @DecimalMin(value = "0", inclusive = false)
        Double beamWidth6dbIn,

        @Schema(description = "Round probe: nominal frequency, MHz (> 0, <= 1000)", example = "5")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax("1000")
        Double frequencyMhz,

        @VelocityFields.MPerS Double velocityMPerS,
        @VelocityFields.InPerUs Double velocityInPerUs,
        @VelocityFields.MaterialId String material,
        @VelocityFields.Mode WaveMode waveMode,
        @VelocityFields.TemperatureC Double temperatureC,

        @Schema(description = "Round probe: element diameter, mm (> 0, <= 100000)", example = "10")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax(Mirrors.MAX_MM)
        Double elementDiameterMm,

        @Schema(description = "Round probe: element diameter, in (> 0, at most 100 m)", example = "0.375")
        @DecimalMin(value = "0", inclusive = false)
        Double elementDiameterIn,

        @Schema(description = "Sound path from the probe to the reflector, mm (> 0, <= 100000): the round probe's "
                + "beam width is taken there, and an angular step moves the beam sound_path x step there",
                example = "60")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax(Mirrors.MAX_MM)
        Double soundPathMm,

        @Schema(description = "Sound path to the reflector, in (> 0, at most 100 m)", example = "2.36")
        @DecimalMin(value = "0", inclusive = false)
        Double soundPathIn,

        @Schema(description = "Distance between neighbouring positions along the scan (encoder increment), mm "
                + "(> 0, <= 100000)", example = "1")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax(Mirrors.MAX_MM)
        Double scanIncrementMm,

        @Schema(description = "Scan increment, in (> 0, at most 100 m)", example = "0.04")
        @DecimalMin(value = "0", inclusive = false)
        Double scanIncrementIn,

        @Schema(description = "Distance between neighbouring scan lines (index offset), mm (> 0, <= 100000)",
                example = "4")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax(Mirrors.MAX_MM)
        Double indexStepMm,

        @Schema(description = "Index step, in (> 0, at most 100 m)", example = "0.16")
        @DecimalMin(value = "0", inclusive = false)
        Double indexStepIn,

        @Schema(description = "Angle between neighbouring beams of a sector scan, deg (above 0, below 90); needs "
                + "sound_path", example = "1")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax(value = "90", inclusive = false)
        Double angularStepDeg,

        @Schema(description = "Largest acceptable amplitude loss between positions, dB (above 0, at most 40); gives "
                + "the largest steps and whether each step is within it", example = "1")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax("40")
        Double amplitudeToleranceDb) implements VelocityFields {
}
