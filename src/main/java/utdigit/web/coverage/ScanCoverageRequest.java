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
        @DecimalMin(value = "0", inclusive = false) @DecimalMax(Mirrors.MAX_MM)
        Double beamWidth6dbMm,

        @DecimalMin(value = "0", inclusive = false)
        Double beamWidth6dbIn,

        @DecimalMin(value = "0", inclusive = false) @DecimalMax("1000")
        Double frequencyMhz,

        @VelocityFields.MPerS Double velocityMPerS,
        @VelocityFields.InPerUs Double velocityInPerUs,
        @VelocityFields.MaterialId String material,
        @VelocityFields.Mode WaveMode waveMode,
        @VelocityFields.TemperatureC Double temperatureC,

        @DecimalMin(value = "0", inclusive = false) @DecimalMax(Mirrors.MAX_MM)
        Double elementDiameterMm,

        @DecimalMin(value = "0", inclusive = false)
        Double elementDiameterIn,

        @DecimalMin(value = "0", inclusive = false) @DecimalMax(Mirrors.MAX_MM)
        Double soundPathMm,

        @DecimalMin(value = "0", inclusive = false)
        Double soundPathIn,

        @DecimalMin(value = "0", inclusive = false) @DecimalMax(Mirrors.MAX_MM)
        Double scanIncrementMm,

        @DecimalMin(value = "0", inclusive = false)
        Double scanIncrementIn,

        @DecimalMin(value = "0", inclusive = false) @DecimalMax(Mirrors.MAX_MM)
        Double indexStepMm,

        @DecimalMin(value = "0", inclusive = false)
        Double indexStepIn,

        @DecimalMin(value = "0", inclusive = false) @DecimalMax(value = "90", inclusive = false)
        Double angularStepDeg,

        @DecimalMin(value = "0", inclusive = false) @DecimalMax("40")
        Double amplitudeToleranceDb) implements VelocityFields {
}
