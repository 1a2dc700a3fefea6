package utdigit.core.acquisition;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.function.UnaryOperator;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;
import org.junit.jupiter.params.provider.CsvSource;
import utdigit.core.common.CalculationError;
import utdigit.core.common.CalculationException;

/**
 * Acquisition budget. The relations checked here (samples = ceil(gate x fs), whole bytes per
 * sample, firings and A-scans per focal law / FMC / HMC, v_max = PRF x increment / (firings x
 * averaging), data per metre, data rate, PRF_max = 1/(q t_rt)) are common practice, no published
 * source. The expected values are worked by hand in the comments beside them, or follow from an
 * independent relation (a brute-force count of transmitter-receiver pairs, the instrument's firing
 * budget per second).
 */
class AcquisitionCalculatorTest {

    /** Relative error allowed between a hand-worked value and a double result. */
    static final double ALLOWED_RELATIVE_ERROR = 1e-12;

    static void assertClose(double actual, double expected) {
        assertThat(actual).isCloseTo(expected, within(Math.abs(expected) * ALLOWED_RELATIVE_ERROR));
    }

    /** 100 MHz, 8 bit, 20 us gate, 1 mm increment, PRF 10 kHz: the base of the hand-worked cases. */
    static AcquisitionInput.Builder base() {
        return AcquisitionInput.builder(100.0, 8, 1.0, 10_000.0).gateLengthUs(20.0);
    }

    static AcquisitionResult compute(UnaryOperator<AcquisitionInput.Builder> settings) {
        return AcquisitionCalculator.compute(settings.apply(base()).build());
    }

    @Nested
    @DisplayName("hand-worked cases (common practice, no published source)")
    class HandWorkedCases {

        @Test
        @DisplayName("64-element FMC at 100 MHz, 8 bit, 20 us, 1 mm, 10 kHz gives 8192 MB/m and 156.25 mm/s")
        void fmc64GivesHandWorkedBudget() {
            // Worked by hand:
            //   samples per A-scan   = 20 us x 100 MHz                 = 2000
            //   bytes per sample     = ceil(8/8)                       = 1
            //   bytes per A-scan     = 2000 x 1                        = 2000
            //   firings per position = n                               = 64
            //   A-scans per position = n^2 = 64 x 64                   = 4096
            //   bytes per position   = 2000 x 4096                     = 8 192 000
            //   MB per metre         = 8 192 000 x (1000/1 mm) / 10^6  = 8192 MB/m
            //   v_max                = 10 000 /s x 1 mm / 64 firings   = 156.25 mm/s
            //                          (dividing by the 4096 A-scans would give 2.44 mm/s: wrong)
            //   data rate at v_max   = 8 192 000 B x 156.25 /s / 10^6  = 1280 MB/s
            //     cross-check: 10 000 firings/s x 64 A-scans per firing x 2000 B = 1.28e9 B/s
            //   pulse period         = 10^6 / 10 000 Hz                = 100 us >= the 20 us gate
            AcquisitionResult r = compute(b -> b.fmcElementCount(64));

            assertThat(r.samplesPerAScan()).isEqualTo(2000L);
            assertThat(r.bytesPerSample()).isEqualTo(1);
            assertThat(r.bytesPerAScan()).isEqualTo(2000L);
            assertThat(r.firingsPerPosition()).isEqualTo(64L);
            assertThat(r.aScansPerPosition()).isEqualTo(4096L);
            assertThat(r.bytesPerPosition()).isEqualTo(8_192_000L);
            assertClose(r.megabytesPerMetre(), 8192.0);
            assertClose(r.maxScanSpeedMmPerS(), 156.25);
            assertClose(r.dataRateMegabytesPerS(), 1280.0);
            assertClose(r.dataRateMegabytesPerS(), 10_000.0 * 64 * 2000 / 1e6);
            assertClose(r.pulseRepetitionPeriodUs(), 100.0);
            assertClose(r.effectiveSamplingFrequencyMhz(), 100.0);
            assertThat(r.fileSizeMegabytes()).isNull();
            assertThat(r.maxPrfWithoutWraparoundHz()).isNull();
            assertThat(r.maxScanLengthPerFileMm()).isNull();
            assertThat(r.warnings()).isEmpty();
        }

        @Test
        @DisplayName("64-element HMC records 2080 A-scans with the FMC's 64 firings and speed")
        void hmc64GivesHandWorkedBudget() {
            // Worked by hand: n(n+1)/2 = 64 x 65 / 2 = 2080 A-scans; 2000 B x 2080 = 4 160 000 B per
            // position = 4160 MB/m; v_max = 10 000 x 1 / 64 = 156.25 mm/s (64 firings, as FMC);
            // data rate = 4 160 000 x 156.25 / 10^6 = 650 MB/s.
            AcquisitionResult r = compute(b -> b.fmcElementCount(64).capture(CaptureMode.HMC));

            assertThat(r.firingsPerPosition()).isEqualTo(64L);
            assertThat(r.aScansPerPosition()).isEqualTo(2080L);
            assertThat(r.bytesPerPosition()).isEqualTo(4_160_000L);
            assertClose(r.megabytesPerMetre(), 4160.0);
            assertClose(r.maxScanSpeedMmPerS(), 156.25);
            assertClose(r.dataRateMegabytesPerS(), 650.0);
            assertThat(r.options().capture()).isEqualTo(CaptureMode.HMC);
        }

        @Test
        @DisplayName("64 focal laws, 16 bit, 0.5 mm: one firing and one A-scan per law")
        void phasedArrayGivesHandWorkedBudget() {
            // Worked by hand: 2000 samples x 2 B = 4000 B per A-scan; 64 laws -> 64 A-scans ->
            // 256 000 B per position; 2000 positions per metre -> 512 MB/m;
            // v_max = 10 000 x 0.5 / 64 = 78.125 mm/s; data rate = 256 000 x 78.125 / 0.5 / 10^6 = 40 MB/s
            // (cross-check: 10 000 A-scans/s x 4000 B = 40 MB/s).
            AcquisitionResult r = AcquisitionCalculator.compute(AcquisitionInput.builder(100.0, 16, 0.5, 10_000.0)
                    .gateLengthUs(20.0).focalLaws(64).build());

            assertThat(r.bytesPerSample()).isEqualTo(2);
            assertThat(r.bytesPerAScan()).isEqualTo(4000L);
            assertThat(r.firingsPerPosition()).isEqualTo(64L);
            assertThat(r.aScansPerPosition()).isEqualTo(64L);
            assertThat(r.bytesPerPosition()).isEqualTo(256_000L);
            assertClose(r.megabytesPerMetre(), 512.0);
            assertClose(r.maxScanSpeedMmPerS(), 78.125);
            assertClose(r.dataRateMegabytesPerS(), 40.0);
            assertThat(r.options().focalLaws()).isEqualTo(64);
            assertThat(r.options().capture()).isNull();
        }

        @Test
        @DisplayName("defaults: one focal law, averaging 1, decimation 1, no decay factor without a round trip")
        void defaultsAreEchoed() {
            // One conventional A-scan per position: 2000 B per position, 2 MB/m, v_max = 10 000 x 1 = 10 m/s.
            AcquisitionResult r = compute(b -> b);

            assertThat(r.options()).isEqualTo(new AcquisitionOptions(1, 1, null, 1, null));
            assertThat(r.bytesPerPosition()).isEqualTo(2000L);
            assertClose(r.megabytesPerMetre(), 2.0);
            assertClose(r.maxScanSpeedMmPerS(), 10_000.0);
            assertThat(r.references()).isNotEmpty();
        }
    }

    @Nested
    @DisplayName("FMC and HMC: data volume counts A-scans, scan speed counts firings")
    class FiringsVersusAScans {

        @ParameterizedTest(name = "n = {0}: FMC {1} firings / {2} A-scans, HMC {3} / {4}")
        @CsvFileSource(resources = "/reference/acquisition-capture-counts.csv", numLinesToSkip = 7)
        @DisplayName("counts match the squares and the triangular numbers (OEIS A000217), beyond int range")
        void countsMatchReferenceTable(int n, long fmcFirings, long fmcAScans, long hmcFirings, long hmcAScans) {
            assertThat(CaptureMode.FMC.firings(n)).isEqualTo(fmcFirings);
            assertThat(CaptureMode.FMC.aScans(n)).isEqualTo(fmcAScans);
            assertThat(CaptureMode.HMC.firings(n)).isEqualTo(hmcFirings);
            assertThat(CaptureMode.HMC.aScans(n)).isEqualTo(hmcAScans);
        }

        @Test
        @DisplayName("counts match a brute-force enumeration of transmitter-receiver pairs")
        void countsMatchBruteForcePairs() {
            for (int n = 1; n <= 128; n++) {
                long allPairs = 0;
                long reciprocalPairs = 0;
                for (int tx = 0; tx < n; tx++) {
                    for (int rx = 0; rx < n; rx++) {
                        allPairs++;
                        if (rx >= tx) {
                            reciprocalPairs++;
                        }
                    }
                }
                assertThat(CaptureMode.FMC.aScans(n)).as("FMC n=%d", n).isEqualTo(allPairs);
                assertThat(CaptureMode.HMC.aScans(n)).as("HMC n=%d", n).isEqualTo(reciprocalPairs);
            }
        }

        @Test
        @DisplayName("v_max of an n-element FMC is PRF x increment / n, not / n^2")
        void fmcScanSpeedDividesByElementsNotAScans() {
            // 32 elements, PRF 10 kHz, 1 mm: 10 000 / 32 = 312.5 mm/s (/ 1024 would be 9.77 mm/s).
            AcquisitionResult fmc = compute(b -> b.fmcElementCount(32));
            AcquisitionResult hmc = compute(b -> b.fmcElementCount(32).capture(CaptureMode.HMC));
            AcquisitionResult laws = compute(b -> b.focalLaws(32));

            assertClose(fmc.maxScanSpeedMmPerS(), 312.5);
            assertClose(hmc.maxScanSpeedMmPerS(), 312.5);
            assertClose(laws.maxScanSpeedMmPerS(), 312.5);
            assertThat(fmc.aScansPerPosition()).isEqualTo(1024L);
            // ... while the data volume counts A-scans: 1024 per position against 32 focal laws.
            assertThat(fmc.bytesPerPosition()).isEqualTo(32L * laws.bytesPerPosition());
        }

        @Test
        @DisplayName("capture defaults to FMC when an element count is given")
        void captureDefaultsToFmc() {
            AcquisitionResult r = compute(b -> b.fmcElementCount(16));

            assertThat(r.options().capture()).isEqualTo(CaptureMode.FMC);
            assertThat(r.options().focalLaws()).isNull();
            assertThat(r.aScansPerPosition()).isEqualTo(256L);
        }

        @Test
        @DisplayName("65536-element FMC counts 2^32 A-scans and 2000 x 2^32 bytes per position in long")
        void largestFmcCountsBeyondIntRange() {
            // 2^32 = 4 294 967 296 A-scans (an int would overflow to 0); 2000 B x 2^32 = 8 589 934 592 000 B.
            // v_max = 10 000 x 1 / 65 536 = 0.152587890625 mm/s (exact in binary).
            AcquisitionResult r = compute(b -> b.fmcElementCount(65_536));

            assertThat(r.aScansPerPosition()).isEqualTo(1L << 32);
            assertThat(r.bytesPerPosition()).isEqualTo(2000L << 32);
            assertClose(r.maxScanSpeedMmPerS(), 0.152587890625);
            assertClose(r.megabytesPerMetre(), 2000.0 * 4_294_967_296.0 * 1000.0 / 1e6);
        }
    }

    @Nested
    @DisplayName("averaging (common practice, no published source)")
    class Averaging {

        @Test
        @DisplayName("averaging 4 divides v_max by 4 and leaves the data per position alone")
        void averagingDividesScanSpeed() {
            // 16 laws x 4 averages = 64 firings per position: v_max = 10 000 x 1 / 64 = 156.25 mm/s;
            // 16 A-scans x 2000 B = 32 000 B per position (averages are not stored);
            // data rate at v_max = 32 000 x 156.25 / 10^6 = 5 MB/s.
            AcquisitionResult r = compute(b -> b.focalLaws(16).averaging(4));

            assertThat(r.firingsPerPosition()).as("firings per position exclude averaging").isEqualTo(16L);
            assertThat(r.bytesPerPosition()).isEqualTo(32_000L);
            assertClose(r.maxScanSpeedMmPerS(), 156.25);
            assertClose(r.dataRateMegabytesPerS(), 5.0);
            assertThat(r.options().averaging()).isEqualTo(4);
        }

        @Test
        @DisplayName("65536 elements x 65536 averages do not overflow the firing count")
        void largestAveragingDoesNotOverflow() {
            // 2^16 x 2^16 = 2^32 firings per position: v_max = 10 000 / 2^32 mm/s (int arithmetic would give
            // 0 and an infinite speed).
            AcquisitionResult r = compute(b -> b.fmcElementCount(65_536).averaging(65_536));

            assertClose(r.maxScanSpeedMmPerS(), 10_000.0 / 4_294_967_296.0);
        }
    }

    @Nested
    @DisplayName("sampling: decimation, gate in mm, ceiling tolerance")
    class Sampling {

        @Test
        @DisplayName("decimation by 4 of 100 MHz stores 25 MHz: 500 samples in 20 us")
        void decimationUsesEffectiveRate() {
            // fs_eff = 100 / 4 = 25 MHz (SampleClock); 20 us x 25 MHz = 500 samples.
            AcquisitionResult decimated = compute(b -> b.decimationFactor(4));
            AcquisitionResult slowClock = AcquisitionCalculator.compute(
                    AcquisitionInput.builder(25.0, 8, 1.0, 10_000.0).gateLengthUs(20.0).build());

            assertThat(decimated.samplesPerAScan()).isEqualTo(500L);
            assertClose(decimated.effectiveSamplingFrequencyMhz(), 25.0);
            assertThat(decimated.bytesPerPosition()).isEqualTo(slowClock.bytesPerPosition());
            assertThat(decimated.options().decimationFactor()).isEqualTo(4);
        }

        @Test
        @DisplayName("decimation by 3 rounds the sample count up: 20 us x 100/3 MHz = 666.67 -> 667")
        void decimationRoundsUp() {
            assertThat(compute(b -> b.decimationFactor(3)).samplesPerAScan()).isEqualTo(667L);
        }

        @Test
        @DisplayName("a 59.2 mm gate in steel at 5920 m/s is a 20 us pulse-echo gate (2L/v)")
        void gateInMmIsPulseEchoTime() {
            // t = 2 x 59.2 mm / 5.92 mm/us = 20 us: the same 2000 samples as the 20 us gate.
            AcquisitionResult mm = AcquisitionCalculator.compute(AcquisitionInput.builder(100.0, 8, 1.0, 10_000.0)
                    .gateLengthMm(59.2).velocityMPerS(5920.0).build());
            AcquisitionResult us = compute(b -> b);

            assertClose(mm.gateLengthUsedUs(), 20.0);
            assertThat(mm.samplesPerAScan()).isEqualTo(us.samplesPerAScan()).isEqualTo(2000L);
        }

        @Test
        @DisplayName("a 50 mm gate at 5920 m/s is 16.89 us: 1690 samples at 100 MHz")
        void gateInMmRoundsUp() {
            // t = 100 / 5.92 = 16.891891... us; x 100 MHz = 1689.19 -> 1690.
            AcquisitionResult r = AcquisitionCalculator.compute(AcquisitionInput.builder(100.0, 8, 1.0, 10_000.0)
                    .gateLengthMm(50.0).velocityMPerS(5920.0).build());

            assertClose(r.gateLengthUsedUs(), 100.0 / 5.92);
            assertThat(r.samplesPerAScan()).isEqualTo(1690L);
        }

        @ParameterizedTest(name = "{0} us x {1} MHz = {2} samples")
        @CsvSource({
            // gate_us, fs_mhz, samples (worked by hand)
            "0.7,   100, 70",    // the brief's case (0.7 x 100 happens to be exactly 70.0 in binary)
            "1.1,   100, 110",   // 1.1 x 100 = 110.00000000000001 in binary: the tolerance keeps 110
            "0.07,  100, 7",     // 7.000000000000001 in binary
            "2.3,   100, 230",   // 229.99999999999997 in binary: rint gives 230 as well
            "0.701, 100, 71",    // 70.1 -> 71
            "0.001, 100, 1",     // 0.1 sample -> 1
        })
        @DisplayName("the ceiling keeps exact products and rounds true fractions up")
        void ceilingToleratesBinaryRounding(double gateUs, double fsMhz, long samples) {
            assertThat(AcquisitionCalculator.samplesPerAScan(gateUs, fsMhz)).isEqualTo(samples);
        }

        @Test
        @DisplayName("1.1 us x 100 MHz needs the tolerance: a bare ceiling would give 111")
        void toleranceIsNeeded() {
            // Guards the test above against a silent change of the example: the bare ceiling is wrong here.
            assertThat(Math.ceil(1.1 * 100.0)).isEqualTo(111.0);
            assertThat(AcquisitionCalculator.samplesPerAScan(1.1, 100.0)).isEqualTo(110L);
        }

        @Test
        @DisplayName("the tolerance is relative 1e-9: 70 + 5e-8 keeps 70, 70 + 1e-7 rounds up to 71")
        void toleranceIsRelativeOneInABillion() {
            // 5e-8 / 70 = 7.1e-10 < 1e-9; 1e-7 / 70 = 1.4e-9 > 1e-9.
            assertThat(AcquisitionCalculator.ceilWithTolerance(70.0 + 5e-8)).isEqualTo(70L);
            assertThat(AcquisitionCalculator.ceilWithTolerance(70.0 - 5e-8)).isEqualTo(70L);
            assertThat(AcquisitionCalculator.ceilWithTolerance(70.0 + 1e-7)).isEqualTo(71L);
            assertThat(AcquisitionCalculator.ceilWithTolerance(70.0 - 1e-7)).isEqualTo(70L);
        }

        @ParameterizedTest(name = "{0} bits -> {1} byte(s)")
        @CsvSource({"1, 1", "8, 1", "9, 2", "12, 2", "16, 2", "17, 3", "24, 3", "25, 4", "32, 4"})
        @DisplayName("bytes per sample are ceil(bits/8)")
        void bytesPerSampleAreWholeBytes(int bits, int bytes) {
            AcquisitionResult r = AcquisitionCalculator.compute(
                    AcquisitionInput.builder(100.0, bits, 1.0, 10_000.0).gateLengthUs(20.0).build());

            assertThat(r.bytesPerSample()).isEqualTo(bytes);
            assertThat(r.bytesPerAScan()).isEqualTo(2000L * bytes);
            assertThat(r.hasWarning(AcquisitionCalculator.SAMPLE_STORAGE_ASSUMED)).isEqualTo(bits % 8 != 0);
        }

        @Test
        @DisplayName("12 bits warn that packing instruments store 1.5 bytes per sample")
        void twelveBitsWarnAboutPacking() {
            AcquisitionResult r = AcquisitionCalculator.compute(
                    AcquisitionInput.builder(100.0, 12, 1.0, 10_000.0).gateLengthUs(20.0).build());

            assertThat(r.warnings()).filteredOn(w -> w.code().equals(AcquisitionCalculator.SAMPLE_STORAGE_ASSUMED))
                    .singleElement().satisfies(w -> assertThat(w.message()).contains("bit_depth 12", "1.5"));
        }
    }

    @Nested
    @DisplayName("scan speed, data rate and file size (common practice, no published source)")
    class ScanAndFile {

        @Test
        @DisplayName("a planned speed above v_max warns and gives the data rate at the planned speed")
        void plannedSpeedAboveMaximumWarns() {
            // 64 FMC: v_max = 156.25 mm/s; at 200 mm/s: 8 192 000 x 200 / 10^6 = 1638.4 MB/s.
            AcquisitionResult r = compute(b -> b.fmcElementCount(64).plannedScanSpeedMmPerS(200.0));

            assertThat(r.hasWarning(AcquisitionCalculator.PLANNED_SPEED_ABOVE_MAXIMUM)).isTrue();
            assertClose(r.dataRateScanSpeedMmPerS(), 200.0);
            assertClose(r.dataRateMegabytesPerS(), 1638.4);
        }

        @Test
        @DisplayName("a planned speed within v_max gives its data rate without a warning")
        void plannedSpeedWithinMaximumDoesNotWarn() {
            // 8 192 000 x 100 / 10^6 = 819.2 MB/s; 156.25 mm/s exactly is still allowed.
            AcquisitionResult slower = compute(b -> b.fmcElementCount(64).plannedScanSpeedMmPerS(100.0));
            AcquisitionResult atMax = compute(b -> b.fmcElementCount(64).plannedScanSpeedMmPerS(156.25));

            assertThat(slower.warnings()).isEmpty();
            assertClose(slower.dataRateMegabytesPerS(), 819.2);
            assertThat(atMax.warnings()).isEmpty();
        }

        @Test
        @DisplayName("scan length gives the file size: 8192 MB/m x 0.6 m = 4915.2 MB")
        void scanLengthGivesFileSize() {
            AcquisitionResult r = compute(b -> b.fmcElementCount(64).scanLengthMm(600.0));

            assertClose(r.fileSizeMegabytes(), 4915.2);
        }

        @Test
        @DisplayName("a file size limit gives the longest scan per file: 4096 MB / 8192 MB/m = 500 mm")
        void fileLimitGivesMaximumLength() {
            AcquisitionResult withoutLength = compute(b -> b.fmcElementCount(64).fileSizeLimitMegabytes(4096.0));
            AcquisitionResult over = compute(b -> b.fmcElementCount(64).fileSizeLimitMegabytes(4096.0)
                    .scanLengthMm(600.0));
            AcquisitionResult under = compute(b -> b.fmcElementCount(64).fileSizeLimitMegabytes(4096.0)
                    .scanLengthMm(400.0));

            assertClose(withoutLength.maxScanLengthPerFileMm(), 500.0);
            assertThat(withoutLength.warnings()).isEmpty();
            assertThat(over.hasWarning(AcquisitionCalculator.FILE_SIZE_ABOVE_LIMIT)).isTrue();
            assertThat(over.warnings()).filteredOn(w -> w.code().equals(AcquisitionCalculator.FILE_SIZE_ABOVE_LIMIT))
                    .singleElement().satisfies(w -> assertThat(w.message()).contains("4915 MB", "4096", "500")); // 4915.2 to 4 digits
            assertClose(under.fileSizeMegabytes(), 3276.8);
            assertThat(under.hasWarning(AcquisitionCalculator.FILE_SIZE_ABOVE_LIMIT)).isFalse();
        }
    }

    @Nested
    @DisplayName("wrap-around PRF limit (common practice, no published source)")
    class Wraparound {

        @Test
        @DisplayName("100 mm of steel at 5920 m/s allows 29.6 kHz bare, with a warning that it has no margin")
        void soundPathGivesBareLimit() {
            // t_rt = 2 x 100 / 5.92 = 33.78 us; PRF_max = 1/t_rt = v / 2L = 5920 / 0.2 m = 29 600 Hz.
            AcquisitionResult r = compute(b -> b.maxSoundPathMm(100.0).velocityMPerS(5920.0));

            assertClose(r.maxRoundTripUsedUs(), 200.0 / 5.92);
            assertClose(r.maxPrfWithoutWraparoundHz(), 29_600.0);
            assertThat(r.options().wraparoundDecayFactor()).isEqualTo(1.0);
            assertThat(r.hasWarning(AcquisitionCalculator.WRAPAROUND_DECAY_FACTOR_BARE_LIMIT)).isTrue();
            assertThat(r.hasWarning(AcquisitionCalculator.PRF_ABOVE_WRAPAROUND_LIMIT)).isFalse();
        }

        @Test
        @DisplayName("decay factor 2 halves the limit: 14.8 kHz, and PRF 20 kHz then warns")
        void decayFactorDividesLimit() {
            AcquisitionInput in = AcquisitionInput.builder(100.0, 8, 1.0, 20_000.0).gateLengthUs(20.0)
                    .maxSoundPathMm(100.0).velocityMPerS(5920.0).wraparoundDecayFactor(2.0).build();
            AcquisitionResult r = AcquisitionCalculator.compute(in);

            assertClose(r.maxPrfWithoutWraparoundHz(), 14_800.0);
            assertThat(r.hasWarning(AcquisitionCalculator.PRF_ABOVE_WRAPAROUND_LIMIT)).isTrue();
            assertThat(r.hasWarning(AcquisitionCalculator.WRAPAROUND_DECAY_FACTOR_BARE_LIMIT)).isFalse();
            assertThat(r.options().wraparoundDecayFactor()).isEqualTo(2.0);
        }

        @Test
        @DisplayName("a 50 us round trip with q = 1.5 allows 13.33 kHz")
        void roundTripGivesLimit() {
            // 10^6 / (1.5 x 50) = 13 333.33 Hz; PRF 10 kHz is below it.
            AcquisitionResult r = compute(b -> b.maxRoundTripUs(50.0).wraparoundDecayFactor(1.5));

            assertClose(r.maxPrfWithoutWraparoundHz(), 1e6 / 75.0);
            assertThat(r.hasWarning(AcquisitionCalculator.PRF_ABOVE_WRAPAROUND_LIMIT)).isFalse();
        }

        @Test
        @DisplayName("the PRF exactly at the limit does not warn; just above it does")
        void limitIsInclusive() {
            // 100 us round trip: 10 kHz limit.
            AcquisitionResult at = compute(b -> b.maxRoundTripUs(100.0));
            AcquisitionResult above = compute(b -> b.maxRoundTripUs(100.1));

            assertThat(at.hasWarning(AcquisitionCalculator.PRF_ABOVE_WRAPAROUND_LIMIT)).isFalse();
            assertThat(above.hasWarning(AcquisitionCalculator.PRF_ABOVE_WRAPAROUND_LIMIT)).isTrue();
        }

        @Test
        @DisplayName("one velocity serves a gate in mm and a sound path together")
        void oneVelocityForGateAndPath() {
            AcquisitionResult r = AcquisitionCalculator.compute(AcquisitionInput.builder(100.0, 8, 1.0, 10_000.0)
                    .gateLengthMm(59.2).maxSoundPathMm(100.0).velocityMPerS(5920.0).build());

            assertClose(r.gateLengthUsedUs(), 20.0);
            assertClose(r.maxPrfWithoutWraparoundHz(), 29_600.0);
        }
    }

    @Nested
    @DisplayName("failures")
    class Failures {

        static void assertFails(UnaryOperator<AcquisitionInput.Builder> settings, CalculationError error,
                String... fields) {
            assertThatThrownBy(() -> compute(settings))
                    .isInstanceOfSatisfying(CalculationException.class, e -> {
                        assertThat(e.error()).isEqualTo(error);
                        assertThat(e.fields()).containsExactly(fields);
                    });
        }

        @Test
        @DisplayName("a gate longer than the pulse repetition period is impossible (422) naming gate and PRF")
        void gateLongerThanPeriodIsImpossible() {
            // PRF 10 kHz: period 100 us < 120 us gate.
            assertFails(b -> b.gateLengthUs(120.0), CalculationError.IMPOSSIBLE_COMBINATION,
                    "gate_length_us", "pulse_repetition_frequency_hz");
            assertThatThrownBy(() -> compute(b -> b.gateLengthUs(120.0)))
                    .hasMessageContaining("gate_length_us").hasMessageContaining("120")
                    .hasMessageContaining("pulse_repetition_frequency_hz").hasMessageContaining("100 us");
            assertThat(CalculationError.IMPOSSIBLE_COMBINATION.category())
                    .isEqualTo(CalculationError.Category.IMPOSSIBLE);
        }

        @Test
        @DisplayName("a gate in mm longer than the period names gate_length_mm")
        void gateInMmLongerThanPeriodIsImpossible() {
            // 300 mm at 5920 m/s: 101.35 us > 100 us.
            assertFails(b -> b.gateLengthUs(null).gateLengthMm(300.0).velocityMPerS(5920.0),
                    CalculationError.IMPOSSIBLE_COMBINATION, "gate_length_mm", "pulse_repetition_frequency_hz");
        }

        @Test
        @DisplayName("a gate equal to the period is accepted")
        void gateEqualToPeriodIsAccepted() {
            assertThat(compute(b -> b.gateLengthUs(100.0)).samplesPerAScan()).isEqualTo(10_000L);
        }

        @Test
        @DisplayName("a position over 2^63 - 1 bytes is impossible (422), not a silent overflow")
        void overflowingPositionIsImpossible() {
            // 100 000 us x 100 000 MHz = 1e10 samples x 4 B x 2^32 A-scans = 1.7e20 B > 9.2e18.
            AcquisitionInput in = AcquisitionInput.builder(100_000.0, 32, 1.0, 10.0).gateLengthUs(100_000.0)
                    .fmcElementCount(65_536).build();
            assertThatThrownBy(() -> AcquisitionCalculator.compute(in))
                    .isInstanceOfSatisfying(CalculationException.class, e -> {
                        assertThat(e.error()).isEqualTo(CalculationError.IMPOSSIBLE_COMBINATION);
                        assertThat(e.fields()).contains("fmc_element_count");
                    });
        }

        @Test
        @DisplayName("capture without fmc_element_count is not applicable")
        void captureWithoutElementCountIsNotApplicable() {
            assertFails(b -> b.capture(CaptureMode.HMC), CalculationError.NOT_APPLICABLE, "capture");
            assertFails(b -> b.focalLaws(8).capture(CaptureMode.FMC), CalculationError.NOT_APPLICABLE, "capture");
        }

        @Test
        @DisplayName("focal_laws together with fmc_element_count is not applicable")
        void focalLawsWithFmcIsNotApplicable() {
            assertFails(b -> b.fmcElementCount(64).focalLaws(1), CalculationError.NOT_APPLICABLE, "focal_laws");
        }

        @Test
        @DisplayName("a decay factor without a round trip is not applicable")
        void decayFactorWithoutRoundTripIsNotApplicable() {
            assertFails(b -> b.wraparoundDecayFactor(2.0), CalculationError.NOT_APPLICABLE,
                    "wraparound_decay_factor");
        }

        @Test
        @DisplayName("a velocity without a length in mm is not applicable")
        void velocityWithoutLengthIsNotApplicable() {
            assertFails(b -> b.velocityMPerS(5920.0), CalculationError.NOT_APPLICABLE, "velocity_m_per_s");
        }

        @Test
        @DisplayName("two forms of the gate or of the round trip are rejected")
        void twoFormsAreRejected() {
            assertFails(b -> b.gateLengthMm(50.0).velocityMPerS(5920.0), CalculationError.NOT_APPLICABLE,
                    "gate_length_mm");
            assertFails(b -> b.maxRoundTripUs(50.0).maxSoundPathMm(100.0).velocityMPerS(5920.0),
                    CalculationError.NOT_APPLICABLE, "max_sound_path_mm");
        }

        @Test
        @DisplayName("missing gate, missing velocity and out-of-domain inputs are invalid")
        void missingAndOutOfDomainInputsAreInvalid() {
            assertFails(b -> b.gateLengthUs(null), CalculationError.INVALID_INPUT, "gate_length_us");
            assertFails(b -> b.gateLengthUs(null).gateLengthMm(50.0), CalculationError.INVALID_INPUT,
                    "velocity_m_per_s");
            assertFails(b -> b.maxSoundPathMm(100.0), CalculationError.INVALID_INPUT, "velocity_m_per_s");
            assertFails(b -> b.maxRoundTripUs(50.0).wraparoundDecayFactor(0.5), CalculationError.INVALID_INPUT,
                    "wraparound_decay_factor");
            assertFails(b -> b.gateLengthUs(Double.NaN), CalculationError.INVALID_INPUT, "gate_length_us");
            assertFails(b -> b.fmcElementCount(0), CalculationError.INVALID_INPUT, "fmc_element_count");
            assertFails(b -> b.averaging(0), CalculationError.INVALID_INPUT, "averaging");
            assertFails(b -> b.decimationFactor(0), CalculationError.INVALID_INPUT, "decimation_factor");
            assertFails(b -> b.scanLengthMm(-1.0), CalculationError.INVALID_INPUT, "scan_length_mm");
        }

        @ParameterizedTest(name = "bit_depth {0}")
        @CsvSource({"0", "33", "-8"})
        @DisplayName("bit depth outside 1-32 is invalid")
        void bitDepthOutsideRangeIsInvalid(int bits) {
            assertThatThrownBy(() -> AcquisitionCalculator.compute(
                            AcquisitionInput.builder(100.0, bits, 1.0, 10_000.0).gateLengthUs(20.0).build()))
                    .isInstanceOfSatisfying(CalculationException.class,
                            e -> assertThat(e.fields()).containsExactly("bit_depth"));
        }

        @Test
        @DisplayName("a not-applicable input is reported before an impossible combination")
        void notApplicableBeforeImpossible() {
            assertFails(b -> b.gateLengthUs(120.0).capture(CaptureMode.FMC), CalculationError.NOT_APPLICABLE,
                    "capture");
        }
    }

    @Nested
    @DisplayName("exact quantities come out exact")
    class ExactQuantities {
        @Test
        void aFileSizeThatIsAWholeNumberOfMegabytes() {
            // 25 MHz x 64 us = 1600 samples, 1 byte each, 16 focal laws: 25 600 bytes per position; 1500 mm at
            // 0.3 mm is 5000 positions: 128 000 000 bytes = 128 MB exactly (arithmetic). In binary floating
            // point 25 600 x (1000/0.3) / 1e6 x 1500 / 1000 gives 128.00000000000003.
            AcquisitionResult r = AcquisitionCalculator.compute(AcquisitionInput.builder(25, 8, 0.3, 1000.0)
                    .gateLengthUs(64.0).focalLaws(16).scanLengthMm(1500.0).build());
            assertThat(25600 * (1000 / 0.3) / 1e6 * 1500 / 1000).isNotEqualTo(128.0); // the noise this avoids
            assertThat(r.fileSizeMegabytes()).isEqualTo(128.0);
            assertThat(r.megabytesPerMetre()).isEqualTo(25600 / 300.0); // one correctly rounded division
        }

        @Test
        void aWrapAroundLimitThatIsAnExactDecimal() {
            // 1e6 / (1.6 x 0.8 us) = 1e6 / 1.28 = 781 250 Hz exactly (arithmetic); binary floating point gives
            // 781 249.9999999999 because 1.6 x 0.8 is not 1.28 in binary.
            assertThat(1e6 / (1.6 * 0.8)).isNotEqualTo(781250.0); // the noise this avoids
            assertThat(AcquisitionCalculator.maxPrfWithoutWraparoundHz(0.8, 1.6)).isEqualTo(781250.0);
        }

        @Test
        void aScanSpeedThatIsAnExactDecimal() {
            // 1500 Hz x 1.1 mm / 3 firings = 550 mm/s exactly (arithmetic); 1500 x 1.1 / 3 in binary is 550.0000000000001.
            assertThat(1500 * 1.1 / 3).isNotEqualTo(550.0);
            assertThat(AcquisitionCalculator.maxScanSpeedMmPerS(1500, 1.1, 3, 1)).isEqualTo(550.0);
        }
    }
}
