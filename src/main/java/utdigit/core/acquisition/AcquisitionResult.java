package utdigit.core.acquisition;

import java.util.List;
import java.util.Objects;
import utdigit.core.common.Reference;
import utdigit.core.common.Warning;

/**
 * An acquisition budget: data volume, scan speed and the wrap-around PRF limit. Counts are
 * {@code long} (a 65 536-element FMC records 4.3e9 A-scans per position); rates and sizes are
 * {@code double}. MB is 10^6 bytes. Results whose optional inputs were not given are {@code null}.
 *
 * @param samplesPerAScan samples in one A-scan, ceil(gate x fs_eff)
 * @param bytesPerSample bytes stored per sample, ceil(bits/8)
 * @param bytesPerAScan samples x bytes per sample
 * @param firingsPerPosition firings per scan position (averaging excluded)
 * @param aScansPerPosition A-scans recorded per scan position
 * @param bytesPerPosition bytes per A-scan x A-scans per position (headers excluded)
 * @param megabytesPerMetre MB per metre of scan
 * @param fileSizeMegabytes MB over scan_length_mm; null without it
 * @param maxScanSpeedMmPerS the PRF-limited scan speed, mm/s
 * @param dataRateMegabytesPerS MB/s at {@code dataRateScanSpeedMmPerS}
 * @param maxPrfWithoutWraparoundHz 1/(q t_rt), Hz; null without a round trip
 * @param maxScanLengthPerFileMm the scan length that fills file_size_limit_megabytes, mm; null without
 *     it
 * @param effectiveSamplingFrequencyMhz fs/m used for the samples, MHz
 * @param gateLengthUsedUs the gate as a time, us (2L/v when given in mm)
 * @param pulseRepetitionPeriodUs 1/PRF, us
 * @param dataRateScanSpeedMmPerS the speed the data rate is given at: the planned speed when given,
 *     else the maximum, mm/s
 * @param maxRoundTripUsedUs the round trip used, us (2L/v when given as a path); null without one
 * @param options the options used, defaults applied
 * @param warnings conditions the caller should know about
 * @param references the source of every formula used
 */
public record AcquisitionResult(
        long samplesPerAScan,
        int bytesPerSample,
        long bytesPerAScan,
        long firingsPerPosition,
        long aScansPerPosition,
        long bytesPerPosition,
        double megabytesPerMetre,
        Double fileSizeMegabytes,
        double maxScanSpeedMmPerS,
        double dataRateMegabytesPerS,
        Double maxPrfWithoutWraparoundHz,
        Double maxScanLengthPerFileMm,
        double effectiveSamplingFrequencyMhz,
        double gateLengthUsedUs,
        double pulseRepetitionPeriodUs,
        double dataRateScanSpeedMmPerS,
        Double maxRoundTripUsedUs,
        AcquisitionOptions options,
        List<Warning> warnings,
        List<Reference> references) {

    public AcquisitionResult {
        Objects.requireNonNull(options, "options");
        warnings = List.copyOf(warnings);
        references = List.copyOf(references);
    }

    /** True when a warning with {@code code} is present. */
    public boolean hasWarning(String code) {
        return warnings.stream().anyMatch(w -> w.code().equals(code));
    }
}
