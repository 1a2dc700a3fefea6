package utdigit.web.arrays;

import io.swagger.v3.oas.annotations.media.Schema;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotNull;
import utdigit.core.materials.WaveMode;
import utdigit.web.json.InputMessages;
import utdigit.web.units.Lengths;
import utdigit.web.units.VelocityFields;

/** POST /api/array-apertures. */
@Schema(name = "ArrayApertureRequest", description = "A linear array's frequency, pitch and active aperture, and "
        + "the velocity of the medium where the beam is formed and steered: the part for a contact array; for an "
        + "array on a wedge, the wedge's velocity with the steering angles in the wedge. Give the velocity once: "
        + "velocity_m_per_s, velocity_in_per_us or material (+ wave_mode, + temperature_c for water). Each length "
        + "once: _mm or _in. The active aperture as active_elements (n x pitch) or active_aperture, not both.")
public record ArrayApertureRequest(
        @NotNull(message = InputMessages.REQUIRED) @DecimalMin(value = "0", inclusive = false) @DecimalMax("1000")
        Double frequencyMhz,

        @VelocityFields.MPerS Double velocityMPerS,
        @VelocityFields.InPerUs Double velocityInPerUs,
        @VelocityFields.MaterialId String material,
        @VelocityFields.Mode WaveMode waveMode,
        @VelocityFields.TemperatureC Double temperatureC,

        @Lengths.Mm
        Double elementPitchMm,

        @Lengths.In
        Double elementPitchIn,

        @Min(1) @Max(65536)
        Integer activeElements,

        @Lengths.Mm
        Double activeApertureMm,

        @Lengths.In
        Double activeApertureIn,

        @Lengths.Mm
        Double elementLengthMm,

        @Lengths.In
        Double elementLengthIn,

        @DecimalMin("0") @DecimalMax(value = "90", inclusive = false)
        Double maxSteeringAngleDeg) implements VelocityFields {
}
