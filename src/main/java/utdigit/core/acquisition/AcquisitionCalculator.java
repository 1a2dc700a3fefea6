package utdigit.core.acquisition;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import utdigit.core.common.CalculationException;
import utdigit.core.common.Checks;
import utdigit.core.common.Reference;
import utdigit.core.common.Sources;
import utdigit.core.common.Units;
import utdigit.core.common.Warning;
import utdigit.core.sampling.DecimationMode;
import utdigit.core.sampling.SampleClock;

/**
 * The acquisition budget of an encoded scan: how many bytes the chosen digitization and capture
 * store per position, per metre and per file, how fast the scan may move before the PRF runs out of
 * firings, and the highest PRF that keeps wrap-around ("ghost") echoes out of the next firing.
 *
 * <p>Data volume counts A-scans; scan speed counts firings. Counts are exact {@code long}
 * arithmetic ({@link Math#multiplyExact}); rates and sizes are {@code double}. The relations are
 * common practice, no published source; MB is 10^6 bytes.
 */
public final class AcquisitionCalculator {
    private AcquisitionCalculator() {}

    /** Relative tolerance of the sample-count ceiling and of every limit comparison. */
    static final double RELATIVE_TOLERANCE = 1e-9;

    /** Bytes in one megabyte: 10^6 (SI prefix mega). */
    static final double BYTES_PER_MEGABYTE = 1e6;

    /** Planned scan speed above the PRF-limited maximum. */
    public static final String PLANNED_SPEED_ABOVE_MAXIMUM = "PLANNED_SPEED_ABOVE_MAXIMUM";
    /** PRF above the wrap-around limit 1/(q t_rt). */
    public static final String PRF_ABOVE_WRAPAROUND_LIMIT = "PRF_ABOVE_WRAPAROUND_LIMIT";
    /** Decay factor 1: the bare physical limit, without margin for reverberation. */
    public static final String WRAPAROUND_DECAY_FACTOR_BARE_LIMIT = "WRAPAROUND_DECAY_FACTOR_BARE_LIMIT";
    /** File size over file_size_limit_megabytes. */
    public static final String FILE_SIZE_ABOVE_LIMIT = "FILE_SIZE_ABOVE_LIMIT";
    /** A bit depth that is not a whole number of bytes: the storage assumption is stated. */
    public static final String SAMPLE_STORAGE_ASSUMED = "SAMPLE_STORAGE_ASSUMED";

    /**
     * Computes the acquisition budget.
     *
     * @throws CalculationException NOT_APPLICABLE (400) for an input that does not apply (capture
     *     without fmc_element_count, focal_laws with fmc_element_count, a velocity no length needs,
     *     a decay factor without a round trip, two forms of the gate or of the round trip);
     *     INVALID_INPUT (400) for a missing or out-of-domain input; IMPOSSIBLE_COMBINATION (422) for a
     *     gate longer than the pulse repetition period, or a position too large to count in 64 bits
     */
    public static AcquisitionResult compute(AcquisitionInput in) {
        Objects.requireNonNull(in, "in");
        List<Warning> warnings = new ArrayList<>();
        List<Reference> references = new ArrayList<>();

        // 1. Single inputs, defaults and inputs that do not apply (all 400), before any 422.
        int decimationFactor = in.decimationFactor() == null ? 1 : in.decimationFactor();
        // The decimation mode does not change the stored rate fs/m (SampleClock): DROP is a placeholder.
        SampleClock clock = SampleClock.of(in.samplingFrequencyMhz(), decimationFactor, DecimationMode.DROP);
        int bitDepth = in.bitDepth();
        if (bitDepth < 1 || bitDepth > 32) {
            throw CalculationException.invalid("bit_depth", bitDepth, "must be an integer from 1 to 32");
        }
        double scanIncrementMm = Checks.positive("scan_increment_mm", in.scanIncrementMm());
        double prfHz = Checks.positive("pulse_repetition_frequency_hz", in.pulseRepetitionFrequencyHz());
        Double velocityMPerS = checkVelocity(in);
        Gate gate = gate(in, velocityMPerS, references);
        Counts counts = counts(in, references);
        int averaging = in.averaging() == null ? 1 : Checks.atLeastOne("averaging", in.averaging());
        Double roundTripUs = roundTripUs(in, velocityMPerS);
        Double decayFactorUsed = decayFactor(in, roundTripUs);
        Double scanLengthMm = in.scanLengthMm() == null
                ? null : Checks.positive("scan_length_mm", in.scanLengthMm());
        Double fileSizeLimitMegabytes = in.fileSizeLimitMegabytes() == null
                ? null : Checks.positive("file_size_limit_megabytes", in.fileSizeLimitMegabytes());
        Double plannedSpeedMmPerS = in.plannedScanSpeedMmPerS() == null
                ? null : Checks.positive("planned_scan_speed_mm_per_s", in.plannedScanSpeedMmPerS());

        // 2. Inputs impossible together (422).
        double periodUs = checkGateWithinPeriod(gate.field(), gate.us(), prfHz);
        double effectiveMhz = clock.effectiveSamplingFrequencyMhz();
        long samples = samplesPerAScan(gate.us(), effectiveMhz, gate.field(), counts.field());
        int bytesPerSample = bytesPerSample(bitDepth);
        long bytesPerAScan;
        long bytesPerPosition;
        try {
            bytesPerAScan = Math.multiplyExact(samples, (long) bytesPerSample);
            bytesPerPosition = Math.multiplyExact(bytesPerAScan, counts.aScans());
        } catch (ArithmeticException overflow) {
            throw tooLarge(gate.field(), counts.field());
        }

        // 3. Data volume; 4. scan speed; 5. wrap-around limit.
        Volume volume = dataVolume(bitDepth, bytesPerSample, bytesPerPosition, scanIncrementMm, scanLengthMm,
                fileSizeLimitMegabytes, warnings, references);
        Speed speed = scanSpeed(prfHz, scanIncrementMm, counts.firings(), averaging, plannedSpeedMmPerS,
                bytesPerPosition, warnings, references);
        Double maxPrfHz = roundTripUs == null
                ? null : wraparoundLimit(prfHz, roundTripUs, decayFactorUsed, warnings, references);

        AcquisitionOptions options = new AcquisitionOptions(
                decimationFactor, counts.focalLawsUsed(), counts.captureUsed(), averaging, decayFactorUsed);
        return new AcquisitionResult(samples, bytesPerSample, bytesPerAScan, counts.firings(), counts.aScans(),
                bytesPerPosition, volume.megabytesPerMetre(), volume.fileSizeMegabytes(), speed.maxMmPerS(),
                speed.dataRateMegabytesPerS(), maxPrfHz, volume.maxScanLengthPerFileMm(), effectiveMhz, gate.us(),
                periodUs, speed.dataRateMmPerS(), roundTripUs, options, warnings, references);
    }

    /** The gate as given (its contract name) and its length in time. */
    private record Gate(String field, double us) {}

    private static Gate gate(AcquisitionInput in, Double velocityMPerS, List<Reference> references) {
        if (in.gateLengthUs() != null && in.gateLengthMm() != null) {
            throw CalculationException.notApplicable("gate_length_mm",
                    "give the gate as gate_length_us or as gate_length_mm, not both");
        } else if (in.gateLengthUs() != null) {
            return new Gate("gate_length_us", Checks.positive("gate_length_us", in.gateLengthUs()));
        } else if (in.gateLengthMm() != null) {
            double gateUs = pulseEchoTimeUs(Checks.positive("gate_length_mm", in.gateLengthMm()), velocityMPerS);
            references.add(Reference.of("gate length from a sound path", Sources.DEFINITIONS));
            return new Gate("gate_length_mm", gateUs);
        } else {
            throw CalculationException.invalid("gate_length_us", Double.NaN,
                    "is required (or gate_length_mm with a velocity)");
        }
    }

    /**
     * Firings and A-scans per position, the field that decides them, and the options used (focal
     * laws for phased array, the capture with fmc_element_count; the other null).
     */
    private record Counts(String field, long firings, long aScans, Integer focalLawsUsed, CaptureMode captureUsed) {}

    private static Counts counts(AcquisitionInput in, List<Reference> references) {
        if (in.fmcElementCount() != null) {
            if (in.focalLaws() != null) {
                throw CalculationException.notApplicable("focal_laws",
                        "focal_laws applies to phased-array acquisition; with fmc_element_count the capture "
                                + "(FMC or HMC) decides firings and A-scans");
            }
            String countField = "fmc_element_count";
            int n = Checks.atLeastOne(countField, in.fmcElementCount());
            CaptureMode captureUsed = in.capture() == null ? CaptureMode.FMC : in.capture();
            references.add(Reference.of("firings and A-scans per position, " + captureUsed, Sources.ACQUISITION_COUNTING));
            return new Counts(countField, captureUsed.firings(n), captureUsed.aScans(n), null, captureUsed);
        }
        if (in.capture() != null) {
            throw CalculationException.notApplicable("capture",
                    "capture applies only with fmc_element_count (matrix capture)");
        }
        String countField = "focal_laws";
        int focalLawsUsed = in.focalLaws() == null ? 1 : Checks.atLeastOne(countField, in.focalLaws());
        references.add(Reference.of("firings and A-scans per position, phased array", Sources.ACQUISITION_COUNTING));
        return new Counts(countField, focalLawsUsed, focalLawsUsed, focalLawsUsed, null);
    }

    /** The wrap-around decay factor (default 1) with a round trip; refused without one. */
    private static Double decayFactor(AcquisitionInput in, Double roundTripUs) {
        if (roundTripUs == null) {
            if (in.wraparoundDecayFactor() != null) {
                throw CalculationException.notApplicable("wraparound_decay_factor",
                        "wraparound_decay_factor applies only with max_round_trip_us or max_sound_path_mm");
            }
            return null;
        }
        double q = in.wraparoundDecayFactor() == null ? 1.0 : in.wraparoundDecayFactor();
        if (!(q >= 1.0) || Double.isInfinite(q)) {
            throw CalculationException.invalid("wraparound_decay_factor", q, "must be finite and >= 1");
        }
        return q;
    }

    /** Megabytes per metre of scan, and with their inputs the file size and the longest scan per file. */
    private record Volume(double megabytesPerMetre, Double fileSizeMegabytes, Double maxScanLengthPerFileMm) {}

    private static Volume dataVolume(int bitDepth, int bytesPerSample, long bytesPerPosition, double scanIncrementMm,
            Double scanLengthMm, Double fileSizeLimitMegabytes, List<Warning> warnings, List<Reference> references) {
        references.add(Reference.of("samples per A-scan", Sources.ACQUISITION_COUNTING));
        references.add(Reference.of("bytes per sample", Sources.ACQUISITION_COUNTING));
        if (bitDepth % 8 != 0) {
            warnings.add(AcquisitionMessages.sampleStorageAssumed(bitDepth, bytesPerSample));
        }
        // bytes x 1000 / increment / 10^6 = bytes / (increment x 1000), in decimal (no float noise)
        double megabytesPerMetre = ratio(BigDecimal.valueOf(bytesPerPosition),
                decimal(scanIncrementMm).multiply(BigDecimal.valueOf(1000)));
        references.add(Reference.of("data volume", Sources.ACQUISITION_COUNTING));
        references.add(Reference.of("megabyte", Sources.DEFINITIONS));

        Double fileSizeMegabytes = scanLengthMm == null ? null : ratio(
                BigDecimal.valueOf(bytesPerPosition).multiply(decimal(scanLengthMm)),
                decimal(scanIncrementMm).multiply(BigDecimal.valueOf(1_000_000)));
        Double maxScanLengthPerFileMm = null;
        if (fileSizeLimitMegabytes != null) {
            maxScanLengthPerFileMm = fileSizeLimitMegabytes / megabytesPerMetre * 1000.0;
            if (fileSizeMegabytes != null && exceeds(fileSizeMegabytes, fileSizeLimitMegabytes)) {
                warnings.add(AcquisitionMessages.fileSizeAboveLimit(scanLengthMm, fileSizeMegabytes,
                        fileSizeLimitMegabytes, maxScanLengthPerFileMm));
            }
        }
        return new Volume(megabytesPerMetre, fileSizeMegabytes, maxScanLengthPerFileMm);
    }

    /** The PRF-limited scan speed, the speed the data rate is quoted at, and that data rate. */
    private record Speed(double maxMmPerS, double dataRateMmPerS, double dataRateMegabytesPerS) {}

    /** Scan speed: the PRF is spent on firings, each averaged firing counted. */
    private static Speed scanSpeed(double prfHz, double scanIncrementMm, long firings, int averaging,
            Double plannedSpeedMmPerS, long bytesPerPosition, List<Warning> warnings, List<Reference> references) {
        double maxScanSpeedMmPerS = maxScanSpeedMmPerS(prfHz, scanIncrementMm, firings, averaging);
        references.add(Reference.of("maximum scan speed", Sources.SCAN_SPEED));
        double dataRateSpeedMmPerS = plannedSpeedMmPerS == null ? maxScanSpeedMmPerS : plannedSpeedMmPerS;
        if (plannedSpeedMmPerS != null && exceeds(plannedSpeedMmPerS, maxScanSpeedMmPerS)) {
            warnings.add(AcquisitionMessages.plannedSpeedAboveMaximum(plannedSpeedMmPerS, maxScanSpeedMmPerS, prfHz,
                    firings, averaging, scanIncrementMm));
        }
        double dataRateMegabytesPerS = ratio(BigDecimal.valueOf(bytesPerPosition).multiply(decimal(dataRateSpeedMmPerS)),
                decimal(scanIncrementMm).multiply(BigDecimal.valueOf(1_000_000)));
        references.add(Reference.of("data rate", Sources.ACQUISITION_COUNTING));
        return new Speed(maxScanSpeedMmPerS, dataRateSpeedMmPerS, dataRateMegabytesPerS);
    }

    /** The wrap-around PRF limit, with its warnings. */
    private static double wraparoundLimit(double prfHz, double roundTripUs, double q, List<Warning> warnings,
            List<Reference> references) {
        double maxPrfHz = maxPrfWithoutWraparoundHz(roundTripUs, q);
        references.add(Reference.of("wrap-around PRF limit", Sources.WRAPAROUND));
        if (q == 1.0) {
            warnings.add(AcquisitionMessages.decayFactorBareLimit());
        }
        if (exceeds(prfHz, maxPrfHz)) {
            warnings.add(AcquisitionMessages.prfAboveWraparoundLimit(prfHz, maxPrfHz, roundTripUs, q));
        }
        return maxPrfHz;
    }

    /**
     * The gate must end before the next firing: t_gate <= 1/PRF (within the relative tolerance).
     *
     * @param gateField the contract name of the gate as given (gate_length_us or gate_length_mm)
     * @return the pulse repetition period 10^6/PRF, us
     * @throws CalculationException IMPOSSIBLE_COMBINATION when the gate is longer than the period
     */
    public static double checkGateWithinPeriod(String gateField, double gateUs, double prfHz) {
        double periodUs = 1e6 / prfHz;
        if (exceeds(gateUs, periodUs)) {
            throw AcquisitionMessages.gateLongerThanPeriod(gateField, gateUs, periodUs, prfHz);
        }
        return periodUs;
    }

    /**
     * Highest scan speed at which every increment still gets all its firings: v_max = PRF x increment
     * / (firings x averaging); the PRF counts firings, not A-scans. Common practice, no published source.
     */
    public static double maxScanSpeedMmPerS(double prfHz, double scanIncrementMm, long firings, int averaging) {
        return ratio(decimal(prfHz).multiply(decimal(scanIncrementMm)),
                BigDecimal.valueOf(firings).multiply(BigDecimal.valueOf(averaging)));
    }

    /**
     * Samples in one A-scan: the gate times the stored rate, rounded up to a whole sample.
     *
     * <p>n = ceil(t_gate fs_eff), t_gate in us, fs_eff = fs/m in MHz, n >= 1. A product within a
     * relative 1e-9 of an integer k is taken as k, so that an exact product is not rounded up by
     * binary floating point: 1.1 us x 100 MHz evaluates to 110.00000000000001 and gives 110, not 111
     * (0.7 us x 100 MHz happens to evaluate to exactly 70). Common practice, no published source.
     *
     * @throws CalculationException IMPOSSIBLE_COMBINATION when n does not fit in a {@code long}
     */
    static long samplesPerAScan(double gateUs, double effectiveSamplingFrequencyMhz) {
        return samplesPerAScan(gateUs, effectiveSamplingFrequencyMhz, "gate_length_us", "focal_laws");
    }

    private static long samplesPerAScan(
            double gateUs, double effectiveSamplingFrequencyMhz, String gateField, String countField) {
        double exact = gateUs * effectiveSamplingFrequencyMhz;
        if (!(exact < 0x1p62)) {
            throw tooLarge(gateField, countField);
        }
        return ceilWithTolerance(exact);
    }

    /**
     * Ceiling with a relative tolerance: k when |x - k| <= 1e-9 x for the nearest integer k, else
     * ceil(x). For x > 0 the result is >= 1. (derived)
     */
    static long ceilWithTolerance(double x) {
        double nearest = Math.rint(x);
        if (nearest >= 1.0 && Math.abs(x - nearest) <= RELATIVE_TOLERANCE * x) {
            return (long) nearest;
        }
        return (long) Math.ceil(x);
    }

    /**
     * Bytes stored per sample: a sample is kept in whole bytes, ceil(bits/8), 1 to 4 for 1 to 32
     * bits. Instruments that pack samples (e.g. two 12-bit samples in 3 bytes) store less. Common
     * practice, no published source.
     */
    static int bytesPerSample(int bitDepth) {
        return (bitDepth + 7) / 8;
    }

    /**
     * Pulse-echo time of a sound path in the part: the wave travels the path there and back.
     * t = 2 L / v, L in mm, v in m/s (1 m/s = 1e-3 mm/us), t in us. (definition)
     */
    public static double pulseEchoTimeUs(double soundPathMm, double velocityMPerS) {
        return 2.0 * soundPathMm / Units.mPerSToMmPerUs(velocityMPerS);
    }

    /**
     * Highest PRF that keeps the echoes of one firing out of the next: the next firing waits for the
     * longest round trip times a decay factor for reverberation. PRF_max = 1/(q t_rt) = 10^6/(q t_rt)
     * Hz with t_rt in us and q >= 1 (q = 1 is the bare physical limit). Common practice, no published
     * source.
     */
    public static double maxPrfWithoutWraparoundHz(double roundTripUs, double decayFactor) {
        return ratio(BigDecimal.valueOf(1_000_000), decimal(decayFactor).multiply(decimal(roundTripUs)));
    }

    /**
     * A double as the decimal it prints as (the shortest that reads back as the same double): the
     * caller's 0.3 mm is 0.3, not 0.299999999999999988898. Ratios of such decimals that are exact
     * (8192 MB, 13562.5 Hz) then come out exact, without binary float noise. (derived)
     */
    private static BigDecimal decimal(double x) {
        return new BigDecimal(Double.toString(x));
    }

    /** numerator / denominator to 34 significant digits, rounded once to the nearest double. */
    private static double ratio(BigDecimal numerator, BigDecimal denominator) {
        return numerator.divide(denominator, MathContext.DECIMAL128).doubleValue();
    }

    /** {@code value} above {@code limit} by more than the relative tolerance (rounding is not a breach). */
    private static boolean exceeds(double value, double limit) {
        return value > limit * (1.0 + RELATIVE_TOLERANCE);
    }

    private static Double checkVelocity(AcquisitionInput in) {
        boolean needed = in.gateLengthMm() != null || in.maxSoundPathMm() != null;
        if (in.velocityMPerS() == null) {
            if (needed) {
                throw CalculationException.invalid("velocity_m_per_s", Double.NaN,
                        "is required with gate_length_mm or max_sound_path_mm");
            }
            return null;
        }
        if (!needed) {
            throw CalculationException.notApplicable("velocity_m_per_s",
                    "a velocity applies only with gate_length_mm or max_sound_path_mm");
        }
        return Checks.positive("velocity_m_per_s", in.velocityMPerS());
    }

    private static Double roundTripUs(AcquisitionInput in, Double velocityMPerS) {
        if (in.maxRoundTripUs() != null && in.maxSoundPathMm() != null) {
            throw CalculationException.notApplicable("max_sound_path_mm",
                    "give the round trip as max_round_trip_us or as max_sound_path_mm, not both");
        }
        if (in.maxRoundTripUs() != null) {
            return Checks.positive("max_round_trip_us", in.maxRoundTripUs());
        }
        if (in.maxSoundPathMm() != null) {
            return pulseEchoTimeUs(Checks.positive("max_sound_path_mm", in.maxSoundPathMm()), velocityMPerS);
        }
        return null;
    }

    private static CalculationException tooLarge(String gateField, String countField) {
        return AcquisitionMessages.tooLarge(gateField, countField);
    }
}
