package utdigit.core.quantization;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.arbitrary;
import static org.quicktheories.generators.SourceDSL.doubles;
import static org.quicktheories.generators.SourceDSL.integers;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.quicktheories.core.Gen;

/**
 * Properties that hold for every converter, checked over seeded random inputs (QuickTheories).
 * Each follows from the definitions in src/docs/methods.md 4 (derived).
 */
class QuantizationPropertiesTest {

    static final long SEED = 0x5eed_4_2024L;
    static final int EXAMPLES = 2_000;
    static final double ALLOWED_ERROR_DB = 1e-9;
    static final double ALLOWED_RELATIVE_ERROR = 1e-12;

    /** The three options that shape the converter, drawn together. */
    record Converter(DigitizedSignal signal, Quantizer quantizer, CodeMapping mapping) {
        QuantizationInput input(int bitDepth) {
            return QuantizationInput.builder(bitDepth).digitizedSignal(signal).quantizer(quantizer)
                    .codeMapping(mapping).build();
        }

        /** MAX_CODE with one bit of RF has no positive code (tested as a failure elsewhere). */
        boolean exists(int bitDepth) {
            return !(mapping == CodeMapping.MAX_CODE && signal == DigitizedSignal.RF && bitDepth == 1);
        }
    }

    static Gen<Converter> converters() {
        return arbitrary().enumValues(DigitizedSignal.class)
                .zip(arbitrary().enumValues(Quantizer.class), (s, q) -> new Object[] {s, q})
                .zip(arbitrary().enumValues(CodeMapping.class),
                        (sq, m) -> new Converter((DigitizedSignal) sq[0], (Quantizer) sq[1], m));
    }

    @Test
    @DisplayName("soft gain adds no resolution: dynamic range drops by max(G, 0) dB and never rises, errors at the gained height are unchanged")
    void softGainAddsNoResolution() {
        qt().withFixedSeed(SEED).withExamples(EXAMPLES)
                .forAll(converters(), integers().between(1, 32), doubles().between(-40, 60), doubles().between(0.01, 100))
                .assuming((c, n, gainDb, h) -> c.exists(n))
                .checkAssert((c, n, gainDb, heightPercentFsh) -> {
                    QuantizationResult plain = QuantizationCalculator.compute(
                            c.input(n).toBuilder().signalHeightPercentFsh(heightPercentFsh).build());
                    // the displayed height may exceed 100 %FSH here (the web layer rejects that); the
                    // core accepts any height the converter could record, which is what this property needs
                    double displayed = heightPercentFsh * Math.pow(10, gainDb / 20);
                    QuantizationResult gained = QuantizationCalculator.compute(
                            c.input(n).toBuilder().digitalGainDb(gainDb).signalHeightPercentFsh(displayed).build());

                    assertThat(gained.dynamicRangeDb())
                            .isCloseTo(plain.dynamicRangeDb() - Math.max(gainDb, 0.0), within(ALLOWED_ERROR_DB));
                    assertThat(gained.dynamicRangeDb()).isLessThanOrEqualTo(plain.dynamicRangeDb() + ALLOWED_ERROR_DB);
                    assertThat(gained.lsbPercentFsh() / plain.lsbPercentFsh())
                            .isCloseTo(Math.pow(10, gainDb / 20), within(1e-9 * Math.pow(10, gainDb / 20)));
                    assertThat(gained.idealSqnrDb()).isEqualTo(plain.idealSqnrDb());
                    assertThat(gained.amplitudeErrorOverDb()).isCloseTo(plain.amplitudeErrorOverDb(), within(1e-6));
                    assertThat(gained.amplitudeErrorUnderDb().isPresent())
                            .isEqualTo(plain.amplitudeErrorUnderDb().isPresent());
                });
    }

    @Test
    @DisplayName("the inverse round-trips: at h_min the under error is -X dB and just below it exceeds X")
    void minimumHeightRoundTrips() {
        qt().withFixedSeed(SEED).withExamples(EXAMPLES)
                .forAll(converters(), integers().between(1, 32), doubles().between(0.01, 40), doubles().between(-40, 60))
                .assuming((c, n, x, g) -> c.exists(n))
                .checkAssert((c, n, toleranceDb, gainDb) -> {
                    QuantizationInput in = c.input(n).toBuilder().digitalGainDb(gainDb)
                            .amplitudeToleranceDb(toleranceDb).build();
                    double minimumHeight = QuantizationCalculator.compute(in).minimumHeightPercentFsh();
                    double highestRecordable = 100 * Math.min(1, Math.pow(10, gainDb / 20));
                    if (minimumHeight > highestRecordable) {
                        return; // not a valid signal height on this converter (warned about elsewhere)
                    }
                    QuantizationResult atMinimum = QuantizationCalculator.compute(
                            in.toBuilder().signalHeightPercentFsh(minimumHeight).build());
                    QuantizationResult justBelow = QuantizationCalculator.compute(
                            in.toBuilder().signalHeightPercentFsh(minimumHeight * (1 - 1e-6)).build());

                    assertThat(atMinimum.amplitudeErrorUnderDb().orElseThrow()).isCloseTo(-toleranceDb, within(1e-8));
                    assertThat(atMinimum.amplitudeErrorOverDb()).isLessThan(toleranceDb);
                    assertThat(atMinimum.minimumHeightDb())
                            .isCloseTo(20 * Math.log10(minimumHeight / 100), within(ALLOWED_ERROR_DB));
                    assertThat(justBelow.amplitudeErrorUnderDb().orElseThrow()).isLessThan(-toleranceDb);
                });
    }

    @Test
    @DisplayName("more bits never more error: over, under, minimum height and dynamic range improve with every bit")
    void moreBitsNeverMoreError() {
        qt().withFixedSeed(SEED).withExamples(EXAMPLES)
                .forAll(converters(), integers().between(1, 31), doubles().between(0.01, 100), doubles().between(0.01, 40))
                .assuming((c, n, h, x) -> c.exists(n))
                .checkAssert((c, n, heightPercentFsh, toleranceDb) -> {
                    QuantizationResult fewer = QuantizationCalculator.compute(c.input(n)
                            .toBuilder().signalHeightPercentFsh(heightPercentFsh).amplitudeToleranceDb(toleranceDb)
                            .build());
                    QuantizationResult more = QuantizationCalculator.compute(c.input(n + 1)
                            .toBuilder().signalHeightPercentFsh(heightPercentFsh).amplitudeToleranceDb(toleranceDb)
                            .build());

                    assertThat(more.amplitudeErrorOverDb()).isLessThanOrEqualTo(fewer.amplitudeErrorOverDb());
                    if (fewer.amplitudeErrorUnderDb().isPresent()) {
                        assertThat(more.amplitudeErrorUnderDb().orElseThrow())
                                .isGreaterThanOrEqualTo(fewer.amplitudeErrorUnderDb().get());
                    }
                    assertThat(more.minimumHeightPercentFsh()).isLessThan(fewer.minimumHeightPercentFsh());
                    assertThat(more.dynamicRangeDb()).isGreaterThan(fewer.dynamicRangeDb());
                    assertThat(more.lsbPercentFsh()).isLessThan(fewer.lsbPercentFsh());
                });
    }

    @Test
    @DisplayName("the under error is negative, the over error non-negative and smaller in size (derived from the bounds)")
    void errorsHaveTheirSignsAndTheUnderErrorDominates() {
        qt().withFixedSeed(SEED).withExamples(EXAMPLES)
                .forAll(converters(), integers().between(1, 32), doubles().between(0.001, 100))
                .assuming((c, n, h) -> c.exists(n))
                .checkAssert((c, n, heightPercentFsh) -> {
                    QuantizationResult r = QuantizationCalculator.compute(
                            c.input(n).toBuilder().signalHeightPercentFsh(heightPercentFsh).build());

                    assertThat(r.amplitudeErrorOverDb()).isGreaterThanOrEqualTo(0.0);
                    r.amplitudeErrorUnderDb().ifPresentOrElse(under -> {
                        assertThat(under).isNegative();
                        assertThat(-under).isGreaterThan(r.amplitudeErrorOverDb());
                    }, () -> assertThat(r.hasWarning(QuantizationCalculator.AMPLITUDE_ERROR_UNDER_UNDEFINED)).isTrue());
                });
    }

    @Test
    @DisplayName("RF has one bit less dynamic range than RECTIFIED at every depth (FSR 200 vs 100 %FSH)")
    void rfAndRectifiedDifferByOneBitAtEveryDepth() {
        qt().withFixedSeed(SEED).forAll(integers().between(1, 32)).checkAssert(n -> {
            double rf = QuantizationCalculator.compute(QuantizationInput.of(n)).dynamicRangeDb();
            double rectified = QuantizationCalculator.compute(QuantizationInput.builder(n)
                    .digitizedSignal(DigitizedSignal.RECTIFIED).build()).dynamicRangeDb();
            assertThat(rectified - rf).isCloseTo(20 * Math.log10(2), within(ALLOWED_ERROR_DB));
        });
    }
}
