package utdigit.web.pulse;

import io.swagger.v3.oas.annotations.media.Schema;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.NotNull;
import utdigit.core.materials.WaveMode;
import utdigit.core.pulse.CentreFrequencyConvention;
import utdigit.web.json.InputMessages;
import utdigit.web.units.Lengths;
import utdigit.web.units.VelocityFields;

/** POST /api/pulse-parameters. */
@Schema(name = "PulseParametersRequest", description = "A probe and the part's velocity. Give the velocity once: "
        + "velocity_m_per_s, velocity_in_per_us or material (+ wave_mode, + temperature_c for water). "
        + "Each length once: _mm or _in; the wedge velocity once: _m_per_s or _in_per_us.")
public record PulseParametersRequest(
        @NotNull(message = InputMessages.REQUIRED) @DecimalMin(value = "0", inclusive = false) @DecimalMax("1000")
        Double frequencyMhz,

        @VelocityFields.MPerS Double velocityMPerS,
        @VelocityFields.InPerUs Double velocityInPerUs,
        @VelocityFields.MaterialId String material,
        @VelocityFields.Mode WaveMode waveMode,
        @VelocityFields.TemperatureC Double temperatureC,

        @DecimalMin(value = "0", inclusive = false) @DecimalMax(value = "200", inclusive = false)
        Double bandwidthPercent,

        CentreFrequencyConvention centreFrequencyConvention,

        @Lengths.Mm
        Double elementDiameterMm,

        @Lengths.In
        Double elementDiameterIn,

        @Lengths.Mm
        Double distanceMm,

        @Lengths.In
        Double distanceIn,

        @Lengths.Mm
        Double wedgePathMm,

        @Lengths.In
        Double wedgePathIn,

        @DecimalMin("100") @DecimalMax("20000")
        Double wedgeVelocityMPerS,

        @DecimalMin("0") @DecimalMax(value = "90", inclusive = false)
        Double incidentAngleDeg,

        @DecimalMin(value = "0", inclusive = false)
        Double wedgeVelocityInPerUs) implements VelocityFields {
}
