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
import utdigit.web.units.Mirrors;
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
        @Schema(description = "The converter's raw sampling frequency fs, MHz (> 0, <= 100000)", example = "100")
        @NotNull(message = InputMessages.REQUIRED) @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000")
        Double samplingFrequencyMhz,

        @Schema(description = "Integer m by which fs is divided before storage: the stored rate is fs/m "
                + "(integer 1 to 65536); default 1", example = "1")
        @Min(1) @Max(65536)
        Integer decimationFactor,

        @Schema(description = "Converter resolution, bits (integer 1 to 32); each sample is counted in whole "
                + "bytes, ceil(bits/8)", example = "8")
        @NotNull(message = InputMessages.REQUIRED) @Min(1) @Max(32)
        Integer bitDepth,

        @Schema(description = "Recorded gate length as a time, us (> 0, <= 100000); or give gate_length_mm / "
                + "gate_length_in", example = "20")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000")
        Double gateLengthUs,

        @Schema(description = "Recorded gate as a pulse-echo sound path in the part, mm (> 0, <= 100000); the "
                + "time is 2 L / v; needs a velocity", example = "50")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax(Mirrors.MAX_MM)
        Double gateLengthMm,

        @Schema(description = "Recorded gate as a pulse-echo sound path in the part, in (> 0, at most 100 m); "
                + "needs a velocity", example = "2")
        @DecimalMin(value = "0", inclusive = false)
        Double gateLengthIn,

        @VelocityFields.MPerS Double velocityMPerS,
        @VelocityFields.InPerUs Double velocityInPerUs,
        @VelocityFields.MaterialId String material,
        @VelocityFields.Mode WaveMode waveMode,
        @VelocityFields.TemperatureC Double temperatureC,

        @Schema(description = "Phased array: focal laws per scan position summed over all groups, one firing and "
                + "one A-scan each (integer 1 to 65536); default 1. Not with fmc_element_count",
                example = "120")
        @Min(1) @Max(65536)
        Integer focalLaws,

        @Schema(description = "Matrix capture: number of elements n (integer 1 to 65536); FMC fires n times and "
                + "records n^2 A-scans, HMC n firings and n(n+1)/2 A-scans", example = "64")
        @Min(1) @Max(65536)
        Integer fmcElementCount,

        @Schema(description = "Matrix capture: FMC (all transmitter-receiver pairs) or HMC (pairs with receiver "
                + ">= transmitter, by reciprocity); default FMC. Only with fmc_element_count")
        CaptureMode capture,

        @Schema(description = "Firings averaged into one recorded A-scan (integer 1 to 65536); default 1. Costs "
                + "scan speed, not data", example = "1")
        @Min(1) @Max(65536)
        Integer averaging,

        @Schema(description = "Distance between recorded scan positions, mm (> 0, <= 100000); required: give "
                + "scan_increment_mm or scan_increment_in", example = "1")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax(Mirrors.MAX_MM)
        Double scanIncrementMm,

        @Schema(description = "Distance between recorded scan positions, in (> 0, at most 100 m)", example = "0.04")
        @DecimalMin(value = "0", inclusive = false)
        Double scanIncrementIn,

        @Schema(description = "Scan length of one file, mm (> 0, <= 100000); gives file_size_megabytes",
                example = "2000")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax(Mirrors.MAX_MM)
        Double scanLengthMm,

        @Schema(description = "Scan length of one file, in (> 0, at most 100 m)", example = "80")
        @DecimalMin(value = "0", inclusive = false)
        Double scanLengthIn,

        @Schema(description = "The instrument's firing rate, all firings counted (every focal law or element), "
                + "Hz (> 0, <= 1000000)", example = "10000")
        @NotNull(message = InputMessages.REQUIRED) @DecimalMin(value = "0", inclusive = false) @DecimalMax("1000000")
        Double pulseRepetitionFrequencyHz,

        @Schema(description = "Planned scan speed, mm/s (> 0, <= 100000); a speed above the PRF-limited "
                + "maximum is a warning. The data rate is given at this speed", example = "50")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax(Mirrors.MAX_MM)
        Double plannedScanSpeedMmPerS,

        @Schema(description = "Planned scan speed, in/s (1 in/s = 25.4 mm/s; > 0, at most 3937 in/s); or give "
                + "planned_scan_speed_mm_per_s", example = "2")
        @DecimalMin(value = "0", inclusive = false)
        Double plannedScanSpeedInPerS,

        @Schema(description = "Longest round trip of a firing, summed over all media (water, wedge, part), us "
                + "(> 0, <= 100000); gives max_prf_without_wraparound_hz. Or give max_sound_path_mm/_in",
                example = "40")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax("100000")
        Double maxRoundTripUs,

        @Schema(description = "Longest one-way sound path in the part, mm (> 0, <= 100000); round trip 2 L / v; "
                + "needs a velocity", example = "100")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax(Mirrors.MAX_MM)
        Double maxSoundPathMm,

        @Schema(description = "Longest one-way sound path in the part, in (> 0, at most 100 m); needs a velocity",
                example = "4")
        @DecimalMin(value = "0", inclusive = false)
        Double maxSoundPathIn,

        @Schema(description = "Factor q on the round trip for reverberation, PRF_max = 1/(q t_rt) (1 to 100); "
                + "default 1, the bare physical limit (a warning says so). Only with a round trip",
                example = "2")
        @DecimalMin("1") @DecimalMax("100")
        Double wraparoundDecayFactor,

        @Schema(description = "Largest file wanted, MB of 10^6 bytes (> 0, <= 10^9); gives "
                + "max_scan_length_per_file_mm, and a warning when file_size_megabytes is above it",
                example = "2000")
        @DecimalMin(value = "0", inclusive = false) @DecimalMax("1000000000")
        Double fileSizeLimitMegabytes) implements VelocityFields {
}
