package utdigit.web.pulse;

import io.swagger.v3.oas.annotations.media.Schema;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.NotNull;
import utdigit.core.materials.WaveMode;
import utdigit.core.pulse.CentreFrequencyConvention;
import utdigit.web.json.InputMessages;
import utdigit.web.units.Mirrors;
import utdigit.web.units.VelocityFields;

/** POST /api/pulse-parameters. */
@Schema(name = "PulseParametersRequest", description = "A probe and the part's velocity. Give the velocity once: "
        + "velocity_m_per_s, velocity_in_per_us or material (+ wave_mode, + temperature_c for water). "
        + "Each length once: _mm or _in; the wedge velocity once: _m_per_s or _in_per_us.")
public record PulseParametersRequest(
        @Schema(description = "Nominal probe frequency, MHz (> 0, <= 1000)", example = "5")
        @NotNull(message = InputMessages.REQUIRED) @DecimalMin(value = "0", inclusive = false) @DecimalMax("1000")
        Double frequencyMhz,

        @VelocityFields.MPerS Double velocityMPerS,
        @VelocityFields.InPerUs Double velocityInPerUs,
        @VelocityFields.MaterialId String material,
        @VelocityFields.Mode WaveMode waveMode,
        @VelocityFields.TemperatureC Double temperatureC,

        @Schema(description = "-6 dB fractional bandwidth of the probe, % (0 to 200 exclusive)", example = "60")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax(value = "200", inclusive = false)
        Double bandwidthPercent,

        @Schema(description = "How frequency_mhz relates to the -6 dB edges: ARITHMETIC (fl + fu)/2 or GEOMETRIC "
                + "sqrt(fl fu); default ARITHMETIC. Only with bandwidth_percent")
        CentreFrequencyConvention centreFrequencyConvention,

        @Schema(description = "Element diameter (circular), mm (> 0, <= 100000)", example = "10")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax(Mirrors.MAX_MM)
        Double elementDiameterMm,

        @Schema(description = "Element diameter (circular), in", example = "0.375")
        @DecimalMin(value = "0", inclusive = false)
        Double elementDiameterIn,

        @Schema(description = "Distance in the part for the beam diameter, mm; needs the element diameter",
                example = "50")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax(Mirrors.MAX_MM)
        Double distanceMm,

        @Schema(description = "Distance in the part for the beam diameter, in", example = "2")
        @DecimalMin(value = "0", inclusive = false)
        Double distanceIn,

        @Schema(description = "Sound path in a wedge or delay line before the part, mm; needs "
                + "wedge_velocity_m_per_s and the element diameter", example = "12")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax(Mirrors.MAX_MM)
        Double wedgePathMm,

        @Schema(description = "Sound path in a wedge or delay line, in", example = "0.5")
        @DecimalMin(value = "0", inclusive = false)
        Double wedgePathIn,

        @Schema(description = "Longitudinal velocity of the wedge or delay line, m/s (100 to 20000); wedge grades "
                + "vary by maker and temperature: give the measured value", example = "2730")
        @DecimalMin("100") @DecimalMax("20000")
        Double wedgeVelocityMPerS,

        @Schema(description = "Incident angle in the wedge, deg (0 to below 90); needs wedge_velocity_m_per_s",
                example = "36")
        @DecimalMin("0") @DecimalMax(value = "90", inclusive = false)
        Double incidentAngleDeg,

        @Schema(description = "Longitudinal velocity of the wedge or delay line, in/us (equivalent of 100 to 20000 "
                + "m/s); the inch form of wedge_velocity_m_per_s", format = "double", example = "0.1075",
                exclusiveMinimumValue = 0)
        @DecimalMin(value = "0", inclusive = false)
        Double wedgeVelocityInPerUs) implements VelocityFields {
}
