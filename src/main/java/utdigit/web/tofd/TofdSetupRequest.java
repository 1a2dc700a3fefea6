package utdigit.web.tofd;

import io.swagger.v3.oas.annotations.media.Schema;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import utdigit.core.materials.WaveMode;
import utdigit.core.timing.TimeReference;
import utdigit.web.units.Lengths;
import utdigit.web.units.Mirrors;
import utdigit.web.units.VelocityFields;

/** POST /api/tofd-setups. */
@Schema(name = "TofdSetupRequest", description = "A TOFD set-up: the part's velocity (of the wave mode used: "
        + "longitudinal for TOFD), the probe centre separation 2S and the wall thickness (required), with the "
        + "gate, the pulse duration as its margin, a depth or a measured tip time, the sampling and the "
        + "separation's uncertainty. Times are in the part (wedge delays excluded), for a tip midway between the "
        + "probes. Give the velocity once: velocity_m_per_s, velocity_in_per_us or material (+ wave_mode, + "
        + "temperature_c for water). Each length once: _mm or _in.")
public record TofdSetupRequest(
        @VelocityFields.MPerS Double velocityMPerS,
        @VelocityFields.InPerUs Double velocityInPerUs,
        @VelocityFields.MaterialId String material,
        @VelocityFields.Mode WaveMode waveMode,
        @VelocityFields.TemperatureC Double temperatureC,

        @Lengths.Mm
        Double probeCentreSeparationMm,

        @Lengths.In
        Double probeCentreSeparationIn,

        @Lengths.Mm
        Double thicknessMm,

        @Lengths.In
        Double thicknessIn,

        @DecimalMin("0") @DecimalMax("100000")
        Double gateStartUs,

        @DecimalMin("0") @DecimalMax("100000")
        Double gateEndUs,

        @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000")
        Double pulseDurationUs,

        @Lengths.Mm
        Double depthMm,

        @Lengths.In
        Double depthIn,

        @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000")
        Double measuredTimeUs,

        @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000")
        Double samplingFrequencyMhz,

        @Min(1) @Max(65536)
        Integer decimationFactor,

        TimeReference timeReference,

        @DecimalMin("0") @DecimalMax(Mirrors.MAX_MM)
        Double probeCentreSeparationUncertaintyMm,

        @DecimalMin("0")
        Double probeCentreSeparationUncertaintyIn,

        @DecimalMin("1") @DecimalMax("5")
        Double coverageFactor) implements VelocityFields {
}
