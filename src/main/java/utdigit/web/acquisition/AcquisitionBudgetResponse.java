package utdigit.web.acquisition;

import io.swagger.v3.oas.annotations.media.Schema;
import java.util.List;
import java.util.Optional;
import utdigit.web.pipeline.ResultNotes.ReferenceView;
import utdigit.web.pipeline.ToleranceCheck;
import utdigit.web.pipeline.ResultNotes.WarningView;
import utdigit.web.units.VelocitySourceView;

/** The answer of POST /api/acquisition-budgets. */
@Schema(name = "AcquisitionBudget", description = "Data volume, scan speed and wrap-around PRF limit of an encoded "
        + "acquisition. MB is 10^6 bytes (not the binary MiB of 2^20 bytes); sizes exclude file headers, encoder "
        + "data and compression. Data volume counts A-scans; scan speed counts firings. Fields whose optional "
        + "inputs were not given are omitted.")
record AcquisitionBudgetResponse(
        @Schema(description = "Samples in one A-scan, ceil(gate x fs/m) (an exact product is not rounded up)",
                example = "2000")
        long samplesPerAScan,
        @Schema(description = "Bytes stored per sample, ceil(bit_depth/8); instruments that pack samples store "
                + "less", example = "1")
        int bytesPerSample,
        @Schema(description = "Bytes per A-scan, samples x bytes per sample", example = "2000")
        long bytesPerAScan,
        @Schema(description = "Firings per scan position, averaging excluded: focal laws, or n for FMC and HMC",
                example = "64")
        long firingsPerPosition,
        @Schema(description = "A-scans recorded per scan position: focal laws, n^2 for FMC, n(n+1)/2 for HMC",
                example = "4096")
        long aScansPerPosition,
        @Schema(description = "Bytes per scan position, bytes per A-scan x A-scans per position", example = "8192000")
        long bytesPerPosition,
        @Schema(description = "Data per metre of scan, MB (10^6 bytes) per metre", example = "8192")
        double megabytesPerMetre,
        @Schema(description = "Data over scan_length, MB (10^6 bytes); only with scan_length_mm/_in", example = "16384")
        Double fileSizeMegabytes,
        @Schema(description = "Highest scan speed the PRF allows, PRF x increment / (firings x averaging), mm/s",
                example = "156.25")
        double maxScanSpeedMmPerS,
        @Schema(description = "Data rate at the planned speed when given, else at the maximum, MB/s (10^6 bytes "
                + "per second)", example = "1280")
        double dataRateMegabytesPerS,
        @Schema(description = "Highest PRF that keeps the echoes of one firing out of the next, 1/(q t_rt), Hz; "
                + "only with max_round_trip_us or max_sound_path_mm/_in", example = "14800")
        Double maxPrfWithoutWraparoundHz,
        @Schema(description = "Scan length that fills file_size_limit_megabytes, mm; only with that limit",
                example = "244.140625")
        Double maxScanLengthPerFileMm,
        @Schema(description = "Stored sampling frequency fs/m, MHz", example = "100")
        double effectiveSamplingFrequencyMhz,
        @Schema(description = "The gate as a time, us (2 L / v when given as a sound path)", example = "20")
        double gateLengthUsedUs,
        @Schema(description = "Pulse repetition period 1/PRF, us", example = "100")
        double pulseRepetitionPeriodUs,
        @Schema(description = "The scan speed data_rate_megabytes_per_s is given at, mm/s", example = "156.25")
        double dataRateScanSpeedMmPerS,
        @Schema(description = "The round trip used for the wrap-around limit, us (2 L / v when given as a sound "
                + "path); only with a round trip", example = "33.78")
        Double maxRoundTripUsedUs,
        @Schema(description = "Each figure compared with a tolerance or requirement of the request: "
                + "planned_scan_speed_mm_per_s at most max_scan_speed_mm_per_s, pulse_repetition_frequency_hz at "
                + "most max_prf_without_wraparound_hz, file_size_megabytes at most file_size_limit_megabytes; each "
                + "only when its inputs were given")
        List<ToleranceCheck> toleranceChecks,

        @Schema(description = "The normalised request (lengths in mm, velocity in m/s), with every default that "
                + "has an effect; itself a valid request that reproduces this answer")
        AcquisitionBudgetRequest inputs,
        @Schema(description = "The velocity used; only when a gate or sound path was given as a length")
        VelocitySourceView velocitySource,
        List<WarningView> warnings,
        List<ReferenceView> references,
        @Schema(description = "Inch mirrors of the length results: each x_mm result as x_in = x_mm / 25.4 (the "
                + "inch is 25.4 mm exactly), a speed x_mm_per_s as x_in_per_s; each present when its mm field is, "
                + "null when it is null; omitted when the answer has no length result")
        InInches inInches) {

    /** Inch mirrors of the length results, each the mm result / 25.4. */
    @Schema(name = "AcquisitionBudgetInInches", description = "Inch mirrors of the length "
            + "results (the inch is 25.4 mm exactly)")
    record InInches(
            @Schema(description = "max_scan_length_per_file_mm / 25.4, in", format = "double")
            Double maxScanLengthPerFileIn,
            @Schema(description = "max_scan_speed_mm_per_s / 25.4, in/s", format = "double")
            Double maxScanSpeedInPerS,
            @Schema(description = "data_rate_scan_speed_mm_per_s / 25.4, in/s", format = "double")
            Double dataRateScanSpeedInPerS) {

        /** The mirrors, or null (omitted) when the answer has no length result. */
        static InInches of(Double maxScanLengthPerFileIn, Double maxScanSpeedInPerS, Double dataRateScanSpeedInPerS) {
            return maxScanLengthPerFileIn == null && maxScanSpeedInPerS == null &&
                    dataRateScanSpeedInPerS == null ? null
                    : new InInches(maxScanLengthPerFileIn, maxScanSpeedInPerS, dataRateScanSpeedInPerS);
        }
    }
}
