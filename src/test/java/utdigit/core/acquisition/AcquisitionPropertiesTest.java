package utdigit.core.acquisition;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.doubles;
import static org.quicktheories.generators.SourceDSL.integers;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * Properties of the acquisition budget over seeded random inputs (QuickTheories, fixed seed). Each
 * checks the calculator against a relation reached by another route; the relations themselves are
 * common practice, no published source.
 */
class AcquisitionPropertiesTest {

    static final long SEED = 20_240_601L;
    static final int EXAMPLES = 400;
    /** Relative error allowed between two routes to the same double. */
    static final double ALLOWED_RELATIVE_ERROR = 1e-12;

    @Test
    @DisplayName("the data rate at v_max equals the instrument's firing budget: PRF/averaging x A-scans per firing x bytes")
    void dataRateAtMaximumFollowsFiringBudget() {
        // Time route: the instrument fires PRF times a second; averaging M spends M firings on one stored
        // firing, and each stored firing yields A-scans/firings A-scans of bytes_per_a_scan bytes.
        qt().withFixedSeed(SEED).withExamples(EXAMPLES)
                .forAll(integers().between(1, 4096), integers().between(1, 16),
                        doubles().between(1.0, 20_000.0), doubles().between(0.1, 10.0))
                .checkAssert((n, averaging, prfHz, incrementMm) -> {
                    CaptureMode capture = n % 2 == 0 ? CaptureMode.FMC : CaptureMode.HMC;
                    AcquisitionResult r = AcquisitionCalculator.compute(
                            AcquisitionInput.builder(100.0, 12, incrementMm, prfHz).gateLengthUs(20.0)
                                    .fmcElementCount(n).capture(capture).averaging(averaging).build());
                    double aScansPerFiring = (double) capture.aScans(n) / n;
                    double expected = prfHz / averaging * aScansPerFiring * r.bytesPerAScan() / 1e6;
                    assertThat(r.dataRateMegabytesPerS())
                            .isCloseTo(expected, within(expected * ALLOWED_RELATIVE_ERROR));
                    // Scan time per position = firings x averaging / PRF, whatever the A-scan count.
                    double secondsPerPosition = incrementMm / r.maxScanSpeedMmPerS();
                    double expectedSeconds = (double) n * averaging / prfHz;
                    assertThat(secondsPerPosition)
                            .isCloseTo(expectedSeconds, within(expectedSeconds * ALLOWED_RELATIVE_ERROR));
                });
    }

    @Test
    @DisplayName("samples per A-scan are the ceiling of gate x fs/m: the gate fits, one sample fewer does not")
    void samplesAreTheCeilingOfGateTimesRate() {
        qt().withFixedSeed(SEED).withExamples(EXAMPLES)
                .forAll(doubles().between(0.01, 90.0), doubles().between(1.0, 1000.0), integers().between(1, 16))
                .checkAssert((gateUs, fsMhz, m) -> {
                    AcquisitionResult r = AcquisitionCalculator.compute(
                            AcquisitionInput.builder(fsMhz, 8, 1.0, 10_000.0).gateLengthUs(gateUs)
                                    .decimationFactor(m).build());
                    double samplesInGate = gateUs * fsMhz / m;
                    assertThat((double) r.samplesPerAScan())
                            .isGreaterThanOrEqualTo(samplesInGate * (1.0 - AcquisitionCalculator.RELATIVE_TOLERANCE));
                    assertThat((double) r.samplesPerAScan() - 1.0).isLessThan(samplesInGate);
                });
    }

    @Test
    @DisplayName("a scan of max_scan_length_per_file_mm fills the file size limit exactly, without a warning")
    void maximumLengthFillsTheLimit() {
        qt().withFixedSeed(SEED).withExamples(EXAMPLES)
                .forAll(integers().between(1, 256), doubles().between(0.1, 5.0), doubles().between(1.0, 1e6))
                .checkAssert((laws, incrementMm, limitMb) -> {
                    AcquisitionInput.Builder b = AcquisitionInput.builder(100.0, 16, incrementMm, 5_000.0)
                            .gateLengthUs(40.0).focalLaws(laws).fileSizeLimitMegabytes(limitMb);
                    double maxLengthMm = AcquisitionCalculator.compute(b.build()).maxScanLengthPerFileMm();
                    AcquisitionResult full = AcquisitionCalculator.compute(b.scanLengthMm(maxLengthMm).build());
                    assertThat(full.fileSizeMegabytes()).isCloseTo(limitMb, within(limitMb * 1e-12));
                    assertThat(full.hasWarning(AcquisitionCalculator.FILE_SIZE_ABOVE_LIMIT)).isFalse();
                    // Bytes route: positions in the file x bytes per position = limit x 10^6.
                    double bytes = maxLengthMm / incrementMm * full.bytesPerPosition();
                    assertThat(bytes).isCloseTo(limitMb * 1e6, within(limitMb * 1e6 * 1e-12));
                });
    }

    @Test
    @DisplayName("the wrap-around limit lets exactly q round trips fit in one pulse repetition period")
    void wraparoundLimitFitsDecayedRoundTrips() {
        qt().withFixedSeed(SEED).withExamples(EXAMPLES)
                .forAll(doubles().between(1.0, 1000.0), doubles().between(1.0, 100.0))
                .checkAssert((roundTripUs, q) -> {
                    AcquisitionResult r = AcquisitionCalculator.compute(
                            AcquisitionInput.builder(100.0, 8, 1.0, 100.0).gateLengthUs(20.0)
                                    .maxRoundTripUs(roundTripUs).wraparoundDecayFactor(q).build());
                    double periodAtLimitUs = 1e6 / r.maxPrfWithoutWraparoundHz();
                    assertThat(periodAtLimitUs).isCloseTo(q * roundTripUs, within(q * roundTripUs * 1e-12));
                });
    }
}
