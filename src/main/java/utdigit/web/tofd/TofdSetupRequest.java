package utdigit.web.tofd;

import io.swagger.v3.oas.annotations.media.Schema;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import utdigit.core.materials.WaveMode;
import utdigit.core.timing.TimeReference;
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

        @Schema(description = "Probe centre separation, the full distance 2S between the probe indices, mm (> 0, "
                + "<= 100000); required as _mm or _in", example = "70")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax(Mirrors.MAX_MM)
        Double probeCentreSeparationMm,

        @Schema(description = "Probe centre separation 2S, in (> 0, at most 100 m)", example = "2.75")
        @DecimalMin(value = "0", inclusive = false)
        Double probeCentreSeparationIn,

        @Schema(description = "Wall thickness, mm (> 0, <= 100000); required as _mm or _in", example = "30")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax(Mirrors.MAX_MM)
        Double thicknessMm,

        @Schema(description = "Wall thickness, in (> 0, at most 100 m)", example = "1.18")
        @DecimalMin(value = "0", inclusive = false)
        Double thicknessIn,

        @Schema(description = "Gate opening time in the part, us (0 to 100000); with gate_end_us", example = "10")
        @DecimalMin("0") @DecimalMax("100000")
        Double gateStartUs,

        @Schema(description = "Gate closing time in the part, us (0 to 100000); with gate_start_us", example = "16")
        @DecimalMin("0") @DecimalMax("100000")
        Double gateEndUs,

        @Schema(description = "Signal duration as measured on the A-scan, us (> 0, <= 100000): the margin the gate "
                + "needs each side; without it the gate is checked with no margin", example = "0.4")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000")
        Double pulseDurationUs,

        @Schema(description = "Tip depth below the scanning surface where the depth uncertainty is wanted, mm (> 0, "
                + "<= 100000; not below thickness); or measured_time_us, not both", example = "15")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax(Mirrors.MAX_MM)
        Double depthMm,

        @Schema(description = "Tip depth, in (> 0, at most 100 m)", example = "0.59")
        @DecimalMin(value = "0", inclusive = false)
        Double depthIn,

        @Schema(description = "Measured tip arrival time in the part, us (> 0, <= 100000; between the lateral wave "
                + "and the back wall): gives depth_from_time_mm and the depth uncertainty there",
                example = "13.9")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000")
        Double measuredTimeUs,

        @Schema(description = "Converter (raw) sampling frequency, MHz (> 0, <= 100000): gives the timing standard "
                + "uncertainty and the depth uncertainty from it", example = "100")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000")
        Double samplingFrequencyMhz,

        @Schema(description = "With sampling_frequency_mhz: stored rate is sampling_frequency_mhz / decimation_factor "
                + "(integer 1 to 65536); default 1", example = "1")
        @Min(1) @Max(65536)
        Integer decimationFactor,

        @Schema(description = "With sampling_frequency_mhz: TRIGGER (one quantized instant, dt/sqrt(12)) or "
                + "LATERAL_WAVE (times read from the lateral wave, a difference of two instants, dt/sqrt(6)); default "
                + "TRIGGER")
        TimeReference timeReference,

        @Schema(description = "Standard uncertainty of the probe centre separation 2S, mm (0 to 100000)",
                example = "0.5")
        @DecimalMin("0") @DecimalMax(Mirrors.MAX_MM)
        Double probeCentreSeparationUncertaintyMm,

        @Schema(description = "Standard uncertainty of the probe centre separation 2S, in (0 to 100 m)",
                example = "0.02")
        @DecimalMin("0")
        Double probeCentreSeparationUncertaintyIn,

        @Schema(description = "Coverage factor k of the expanded depth uncertainty (1 to 5); default 2", example = "2")
        @DecimalMin("1") @DecimalMax("5")
        Double coverageFactor) implements VelocityFields {
}
