package utdigit.core.reference;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Stream;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;
import utdigit.core.materials.WaterVelocity;
import utdigit.core.pulse.PistonDirectivity;
import utdigit.core.quantization.DigitizedSignal;
import utdigit.core.quantization.QuantizationCalculator;
import utdigit.core.quantization.QuantizationInput;
import utdigit.core.sampling.DecimationMode;
import utdigit.core.sampling.SampleClock;
import utdigit.core.sampling.SampledSignal;
import utdigit.core.sampling.SamplingCalculator;
import utdigit.core.sampling.SamplingInput;

/**
 * The calculation core against published worked examples and tables
 * ({@code src/test/resources/reference/published-worked-examples.csv}, whose header names each
 * source with its title, edition and page or clause, and says which were read first-hand and which
 * are from memory or read second-hand). Unlike a test that re-types the formula the code uses, these
 * values come from outside the project: a wrong formula, constant or coefficient fails them.
 */
class PublishedWorkedExamplesTest {

    private static final String RESOURCE = "/reference/published-worked-examples.csv";

    /** One row of the file. */
    private record Example(String source, String quantity, Double p1, Double p2, double expected, double tolerance,
                           int line) {
        @Override
        public String toString() {
            return source + " " + quantity + (p1 == null ? "" : " " + p1) + " = " + expected + " (line " + line + ")";
        }
    }

    private static List<Example> examples() throws IOException {
        List<Example> rows = new ArrayList<>();
        try (BufferedReader reader = new BufferedReader(new InputStreamReader(
                Objects.requireNonNull(PublishedWorkedExamplesTest.class.getResourceAsStream(RESOURCE), RESOURCE),
                StandardCharsets.UTF_8))) {
            String line;
            int number = 0;
            boolean header = true;
            while ((line = reader.readLine()) != null) {
                number++;
                if (line.isBlank() || line.startsWith("#")) {
                    continue;
                }
                if (header) {
                    assertThat(line).isEqualTo("source,quantity,p1,p2,expected,tolerance");
                    header = false;
                    continue;
                }
                String[] f = line.split(",", -1);
                assertThat(f).as("line %d", number).hasSize(6);
                rows.add(new Example(f[0], f[1], optional(f[2]), optional(f[3]), Double.parseDouble(f[4]),
                        Double.parseDouble(f[5]), number));
            }
        }
        return rows;
    }

    private static Double optional(String field) {
        return field.isBlank() ? null : Double.valueOf(field);
    }

    @Test
    @DisplayName("the suite holds at least 40 values from at least 6 independent published sources, each named in the header")
    void suiteIsLargeEnough() throws IOException {
        List<Example> rows = examples();
        Set<String> sources = new TreeSet<>();
        rows.forEach(r -> sources.add(r.source()));
        assertThat(rows).hasSizeGreaterThanOrEqualTo(40);
        assertThat(sources).hasSizeGreaterThanOrEqualTo(6);
        String text;
        try (var in = PublishedWorkedExamplesTest.class.getResourceAsStream(RESOURCE)) {
            text = new String(Objects.requireNonNull(in).readAllBytes(), StandardCharsets.UTF_8);
        }
        for (String source : sources) {
            assertThat(text).as("header names %s", source).containsPattern("(?m)^# " + source + " ");
        }
    }

    @TestFactory
    @DisplayName("each published value is met by the core within the tolerance its row states")
    Stream<DynamicTest> eachPublishedValue() throws IOException {
        return examples().stream().map(e -> DynamicTest.dynamicTest(e.toString(),
                () -> assertThat(computed(e)).isCloseTo(e.expected(), within(e.tolerance()))));
    }

    private static double computed(Example e) {
        return switch (e.quantity()) {
            case "WATER_VELOCITY_M_PER_S" -> WaterVelocity.marczakMPerS(e.p1());
            case "IDEAL_SQNR_DB" -> QuantizationCalculator.compute(QuantizationInput.of(e.p1().intValue()))
                    .idealSqnrDb().orElseThrow();
            case "DYNAMIC_RANGE_DB" -> QuantizationCalculator.compute(QuantizationInput.builder(e.p1().intValue())
                    .digitizedSignal(DigitizedSignal.RECTIFIED).build()).dynamicRangeDb();
            case "SINGLE_INSTANT_UNCERTAINTY_NS" ->
                    SampleClock.of(1000.0 / e.p1(), 1, DecimationMode.DROP).singleInstantStandardUncertaintyNs();
            case "DIFFERENCE_UNCERTAINTY_NS" -> SampleClock.of(1000.0 / e.p1(), 1, DecimationMode.DROP).differenceStandardUncertaintyNs();
            case "TWO_WAY_CONSTANT" -> PistonDirectivity.twoWayConstant(e.p1());
            case "FIRST_NULL_CONSTANT" -> PistonDirectivity.firstNullConstant();
            case "FIRST_ZERO_OF_J1" -> PistonDirectivity.firstNullConstant() * Math.PI;
            case "ERF" -> 1.0 - envelopeEnergyAboveNyquist(e.p1());
            default -> throw new IllegalArgumentException("unknown quantity " + e.quantity() + " at line " + e.line());
        };
    }

    /**
     * The ENVELOPE energy above Nyquist of a 5 MHz, 60 % pulse sampled at fs = 2 z sigma_f sqrt(2),
     * sigma_f = sqrt(a)/(2 pi) with a = (pi fc bw)^2 / (4 ln 10^(6/20)) (scipy.signal.gausspulse
     * parameterisation, written out here): erfc(z) by the envelope's Gaussian spectrum.
     */
    private static double envelopeEnergyAboveNyquist(double z) {
        double a = Math.pow(Math.PI * 5.0 * 0.6, 2) / (4.0 * Math.log(Math.pow(10.0, 6.0 / 20.0)));
        double sigmaMhz = Math.sqrt(a) / (2.0 * Math.PI);
        double fsMhz = 2.0 * z * sigmaMhz * Math.sqrt(2.0);
        return SamplingCalculator.compute(SamplingInput.builder(fsMhz, 5.0).bandwidthPercent(60.0)
                .signal(SampledSignal.ENVELOPE).build()).energyAboveNyquistFraction();
    }
}
