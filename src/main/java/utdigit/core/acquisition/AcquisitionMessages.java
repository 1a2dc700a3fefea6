package utdigit.core.acquisition;

import static utdigit.core.common.MessageNumbers.rounded;
import static utdigit.core.acquisition.AcquisitionCalculator.FILE_SIZE_ABOVE_LIMIT;
import static utdigit.core.acquisition.AcquisitionCalculator.PLANNED_SPEED_ABOVE_MAXIMUM;
import static utdigit.core.acquisition.AcquisitionCalculator.PRF_ABOVE_WRAPAROUND_LIMIT;
import static utdigit.core.acquisition.AcquisitionCalculator.SAMPLE_STORAGE_ASSUMED;
import static utdigit.core.acquisition.AcquisitionCalculator.WRAPAROUND_DECAY_FACTOR_BARE_LIMIT;

import java.util.Locale;
import utdigit.core.common.CalculationException;
import utdigit.core.common.Warning;

/** Every warning and failure text of the acquisition budget, one factory per condition. */
final class AcquisitionMessages {
    private AcquisitionMessages() {}

    private static final String COMMON_PRACTICE = "common practice, no published source";

    static CalculationException gateLongerThanPeriod(String gateField, double gateUs, double periodUs, double prfHz) {
        return CalculationException.impossible(String.format(Locale.ROOT,
                "the gate (%s, %s us) is longer than the pulse repetition period 1/pulse_repetition_frequency_hz"
                        + " (%s us at %s Hz): the next firing would start before the gate ends",
                gateField, rounded(gateUs), rounded(periodUs), rounded(prfHz)), gateField, "pulse_repetition_frequency_hz");
    }

    static CalculationException tooLarge(String gateField, String countField) {
        return CalculationException.impossible(
                "one scan position would hold more than 2^63 - 1 bytes (9.2e18): no instrument records that; "
                        + "reduce " + gateField + ", sampling_frequency_mhz or " + countField,
                gateField, "sampling_frequency_mhz", countField);
    }

    static Warning sampleStorageAssumed(int bitDepth, int bytesPerSample) {
        return Warning.of(SAMPLE_STORAGE_ASSUMED, String.format(Locale.ROOT,
                "bit_depth %d is counted as %d whole byte(s) per sample; an instrument that packs samples "
                        + "(e.g. two 12-bit samples in 3 bytes) stores %s bytes per sample: check its "
                        + "file format", bitDepth, bytesPerSample, rounded(bitDepth / 8.0)));
    }

    static Warning fileSizeAboveLimit(double scanLengthMm, double fileSizeMegabytes, double fileSizeLimitMegabytes,
            double maxScanLengthPerFileMm) {
        return Warning.of(FILE_SIZE_ABOVE_LIMIT, String.format(Locale.ROOT,
                "the file of scan_length_mm %s mm holds %s MB, above file_size_limit_megabytes "
                        + "%s MB; one file holds at most %s mm of scan",
                rounded(scanLengthMm), rounded(fileSizeMegabytes), rounded(fileSizeLimitMegabytes),
                rounded(maxScanLengthPerFileMm)));
    }

    static Warning plannedSpeedAboveMaximum(double plannedSpeedMmPerS, double maxScanSpeedMmPerS, double prfHz,
            long firings, int averaging, double scanIncrementMm) {
        return Warning.of(PLANNED_SPEED_ABOVE_MAXIMUM, String.format(Locale.ROOT,
                "planned_scan_speed_mm_per_s %s mm/s is above the PRF-limited maximum %s mm/s "
                        + "(pulse_repetition_frequency_hz %s Hz, %d firing(s) per position x averaging %d, "
                        + "scan_increment_mm %s mm): positions would be missed",
                rounded(plannedSpeedMmPerS), rounded(maxScanSpeedMmPerS), rounded(prfHz), firings, averaging,
                rounded(scanIncrementMm)));
    }

    static Warning decayFactorBareLimit() {
        return Warning.of(WRAPAROUND_DECAY_FACTOR_BARE_LIMIT,
                "wraparound_decay_factor 1 gives the bare physical limit: echoes of a firing that "
                        + "reverberate longer than one round trip reach the next, and low-attenuation parts "
                        + "need a margin (wraparound_decay_factor > 1) (" + COMMON_PRACTICE + ")");
    }

    static Warning prfAboveWraparoundLimit(double prfHz, double maxPrfHz, double roundTripUs, double q) {
        return Warning.of(PRF_ABOVE_WRAPAROUND_LIMIT, String.format(Locale.ROOT,
                "pulse_repetition_frequency_hz %s Hz is above the wrap-around limit %s Hz "
                        + "(round trip %s us x wraparound_decay_factor %s): echoes of one firing may "
                        + "appear as ghost echoes after the next",
                rounded(prfHz), rounded(maxPrfHz), rounded(roundTripUs), rounded(q)));
    }
}
