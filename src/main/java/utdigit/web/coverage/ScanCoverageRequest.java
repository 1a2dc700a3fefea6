package utdigit.web.coverage;

import io.swagger.v3.oas.annotations.media.Schema;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import utdigit.core.materials.WaveMode;
import utdigit.web.units.Lengths;
import utdigit.web.units.VelocityFields;

/** POST /api/scan-coverages. */
@Schema(name = "ScanCoverageRequest", description = "The beam width at the reflector's depth, and the steps of the "
        + "scan. Give the beam width once: beam_width_6db (measured, or computed elsewhere, at the reflector's sound "
        + "path), or a round probe's frequency_mhz, element_diameter and velocity with sound_path. Each length once: "
        + "_mm or _in. The velocity once: velocity_m_per_s, velocity_in_per_us or material (+ wave_mode, + "
        + "temperature_c for water). angular_step_deg needs sound_path.")
public record ScanCoverageRequest(
        @Lengths.Mm
        Double beamWidth6dbMm,

        @Lengths.In
        Double beamWidth6dbIn,

        @DecimalMin(value = "0", inclusive = false) @DecimalMax("1000")
        Double frequencyMhz,

        @VelocityFields.MPerS Double velocityMPerS,
        @VelocityFields.InPerUs Double velocityInPerUs,
        @VelocityFields.MaterialId String material,
        @VelocityFields.Mode WaveMode waveMode,
        @VelocityFields.TemperatureC Double temperatureC,

        @Lengths.Mm
        Double elementDiameterMm,

        @Lengths.In
        Double elementDiameterIn,

        @Lengths.Mm
        Double soundPathMm,

        @Lengths.In
        Double soundPathIn,

        @Lengths.Mm
        Double scanIncrementMm,

        @Lengths.In
        Double scanIncrementIn,

        @Lengths.Mm
        Double indexStepMm,

        @Lengths.In
        Double indexStepIn,

        @DecimalMin(value = "0", inclusive = false) @DecimalMax(value = "90", inclusive = false)
        Double angularStepDeg,

        @DecimalMin(value = "0", inclusive = false) @DecimalMax("40")
        Double amplitudeToleranceDb) implements VelocityFields {
}
