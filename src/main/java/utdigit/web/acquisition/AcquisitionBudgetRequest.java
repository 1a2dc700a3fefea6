package utdigit.web.acquisition;

import io.swagger.v3.oas.annotations.media.Schema;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotNull;
import utdigit.core.acquisition.CaptureMode;
import utdigit.core.materials.WaveMode;
import utdigit.web.json.InputMessages;
import utdigit.web.units.Lengths;
import utdigit.web.units.VelocityFields;

/**
 * POST /api/acquisition-budgets. The ranges are the contract's (README "Conventions"); the
 * upper bounds the contract leaves open are ours and documented on their properties:
 * decimation_factor at most 65536 (like the other counts), planned_scan_speed_mm_per_s at most
 * 100000 mm/s (100 m/s, far above any scanner), file_size_limit_megabytes at most 10^9 MB (10^15
 * bytes).
 */
@Schema(name = "AcquisitionBudgetRequest", description = "The digitization, the capture and the scan of an "
        + "encoded acquisition. Give the gate once: gate_length_us (a time) or gate_length_mm / gate_length_in "
        + "(a pulse-echo sound path in the part, with a velocity). Each length once: _mm or _in. A velocity "
        + "(velocity_m_per_s, velocity_in_per_us or material + wave_mode) is needed, and accepted, only with a "
        + "gate or a max_sound_path given as a length. Phased array: focal_laws; matrix capture: "
        + "fmc_element_count with capture. MB = 10^6 bytes.")
public record AcquisitionBudgetRequest(
        @NotNull(message = InputMessages.REQUIRED) @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000")
        Double samplingFrequencyMhz,

        @Min(1) @Max(65536)
        Integer decimationFactor,

        @NotNull(message = InputMessages.REQUIRED) @Min(1) @Max(32)
        Integer bitDepth,

        @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000")
        Double gateLengthUs,

        @Lengths.Mm
        Double gateLengthMm,

        @Lengths.In
        Double gateLengthIn,

        @VelocityFields.MPerS Double velocityMPerS,
        @VelocityFields.InPerUs Double velocityInPerUs,
        @VelocityFields.MaterialId String material,
        @VelocityFields.Mode WaveMode waveMode,
        @VelocityFields.TemperatureC Double temperatureC,

        @Min(1) @Max(65536)
        Integer focalLaws,

        @Min(1) @Max(65536)
        Integer fmcElementCount,

        CaptureMode capture,

        @Min(1) @Max(65536)
        Integer averaging,

        @Lengths.Mm
        Double scanIncrementMm,

        @Lengths.In
        Double scanIncrementIn,

        @Lengths.Mm
        Double scanLengthMm,

        @Lengths.In
        Double scanLengthIn,

        @NotNull(message = InputMessages.REQUIRED) @DecimalMin(value = "0", inclusive = false) @DecimalMax("1000000")
        Double pulseRepetitionFrequencyHz,

        @Lengths.Mm
        Double plannedScanSpeedMmPerS,

        @Lengths.In
        Double plannedScanSpeedInPerS,

        @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000")
        Double maxRoundTripUs,

        @Lengths.Mm
        Double maxSoundPathMm,

        @Lengths.In
        Double maxSoundPathIn,

        @DecimalMin("1") @DecimalMax("100")
        Double wraparoundDecayFactor,

        @DecimalMin(value = "0", inclusive = false) @DecimalMax("1000000000")
        Double fileSizeLimitMegabytes) implements VelocityFields {
}
