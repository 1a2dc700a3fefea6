package utdigit.web.arrays;

import io.swagger.v3.oas.annotations.media.Schema;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotNull;
import utdigit.core.materials.WaveMode;
import utdigit.web.json.InputMessages;
import utdigit.web.units.Mirrors;
import utdigit.web.units.VelocityFields;

/** POST /api/array-apertures. */
@Schema(name = "ArrayApertureRequest", description = "A linear array's frequency, pitch and active aperture, and "
        + "the velocity of the medium where the beam is formed and steered: the part for a contact array; for an "
        + "array on a wedge, the wedge's velocity with the steering angles in the wedge. Give the velocity once: "
        + "velocity_m_per_s, velocity_in_per_us or material (+ wave_mode, + temperature_c for water). Each length "
        + "once: _mm or _in. The active aperture as active_elements (n x pitch) or active_aperture, not both.")
public record ArrayApertureRequest(
        @Schema(description = "Nominal probe frequency, MHz (> 0, <= 1000)", example = "5")
        @NotNull(message = InputMessages.REQUIRED) @DecimalMin(value = "0", inclusive = false) @DecimalMax("1000")
        Double frequencyMhz,

        @VelocityFields.MPerS Double velocityMPerS,
        @VelocityFields.InPerUs Double velocityInPerUs,
        @VelocityFields.MaterialId String material,
        @VelocityFields.Mode WaveMode waveMode,
        @VelocityFields.TemperatureC Double temperatureC,

        @Schema(description = "Element pitch, centre to centre, mm (> 0, <= 100000); required as _mm or _in",
                example = "0.6")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax(Mirrors.MAX_MM)
        Double elementPitchMm,

        @Schema(description = "Element pitch, in (> 0, at most 100 m)", example = "0.024")
        @DecimalMin(value = "0", inclusive = false)
        Double elementPitchIn,

        @Schema(description = "Elements fired together (integer 1 to 65536): the active aperture is active_elements x "
                + "element_pitch", example = "16")
        @Min(1) @Max(65536)
        Integer activeElements,

        @Schema(description = "Active aperture length in the steering plane, mm (> 0, <= 100000; not below one "
                + "pitch); instead of active_elements", example = "9.6")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax(Mirrors.MAX_MM)
        Double activeApertureMm,

        @Schema(description = "Active aperture length, in (> 0, at most 100 m)", example = "0.378")
        @DecimalMin(value = "0", inclusive = false)
        Double activeApertureIn,

        @Schema(description = "Element length in the passive plane (the array's width), mm (> 0, <= 100000); gives "
                + "the passive-plane near field and beam spread", example = "10")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax(Mirrors.MAX_MM)
        Double elementLengthMm,

        @Schema(description = "Element length in the passive plane, in (> 0, at most 100 m)", example = "0.394")
        @DecimalMin(value = "0", inclusive = false)
        Double elementLengthIn,

        @Schema(description = "Largest steering angle used, either side of the aperture's normal, deg (0 to below "
                + "90); default 0", example = "45")
        @DecimalMin("0") @DecimalMax(value = "90", inclusive = false)
        Double maxSteeringAngleDeg) implements VelocityFields {
}
