package utdigit.web.stamp;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/** RFC 8785 (JSON Canonicalization Scheme) conformance of {@link CanonicalJson}. */
class CanonicalJsonTest {
    private static final JsonMapper MAPPER = JsonMapper.builder().build();

    @ParameterizedTest(name = "{0} -> {1}")
    @CsvFileSource(resources = "/reference/rfc8785-numbers.csv", numLinesToSkip = 3)
    @DisplayName("numbers serialize as RFC 8785 Appendix B samples")
    void numberMatchesRfc8785AppendixB(String hex, String expected) {
        double value = Double.longBitsToDouble(Long.parseUnsignedLong(hex, 16));
        assertThat(CanonicalJson.number(value)).isEqualTo(expected);
    }

    @Test
    @DisplayName("RFC 8785 3.2.2 example: literals, numbers and string escaping")
    void rfc8785Section322ExampleCanonicalizes() throws Exception {
        String input = "{\n  \"numbers\": [333333333.33333329, 1E30, 4.50, 2e-3, 0.000000000000000000000000001],\n"
                + "  \"string\": \"\\u20ac$\\u000F\\u000aA'\\u0042\\u0022\\u005c\\\\\\\"\\/\",\n"
                + "  \"literals\": [null, true, false]\n}";
        JsonNode node = MAPPER.readTree(input);
        // Expected output as printed in RFC 8785 section 3.2.2 (from memory).
        String expected = "{\"literals\":[null,true,false],\"numbers\":[333333333.3333333,1e+30,4.5,0.002,1e-27],"
                + "\"string\":\"\u20ac$\\u000f\\nA'B\\\"\\\\\\\\\\\"/\"}";
        assertThat(CanonicalJson.text(node)).isEqualTo(expected);
    }

    @Test
    @DisplayName("RFC 8785 3.2.3 example: members sorted by UTF-16 code units")
    void rfc8785Section323SortsByUtf16CodeUnits() throws Exception {
        String input = "{\"\\u20ac\":\"Euro Sign\",\"\\r\":\"Carriage Return\",\"\\ufb33\":\"Hebrew Letter Dalet With Dagesh\","
                + "\"1\":\"One\",\"\\ud83d\\ude00\":\"Emoji: Grinning Face\",\"\\u0080\":\"Control\","
                + "\"\\u00f6\":\"Latin Small Letter O With Diaeresis\"}";
        String text = CanonicalJson.text(MAPPER.readTree(input));
        // Order given in RFC 8785 3.2.3: \r, 1, \u0080, \u00f6, \u20ac, U+1F600, \ufb33.
        assertThat(text).isEqualTo("{\"\\r\":\"Carriage Return\",\"1\":\"One\",\"\u0080\":\"Control\","
                + "\"\u00f6\":\"Latin Small Letter O With Diaeresis\",\"\u20ac\":\"Euro Sign\","
                + "\"\ud83d\ude00\":\"Emoji: Grinning Face\",\"\ufb33\":\"Hebrew Letter Dalet With Dagesh\"}");
    }

    @Test
    void integralDoublesAndIntegersWriteAlike() throws Exception {
        assertThat(CanonicalJson.text(MAPPER.readTree("[2.0, 2, 100, 1e2]"))).isEqualTo("[2,2,100,100]");
    }

    @Test
    void nonFiniteNumbersAreRejected() {
        assertThatThrownBy(() -> CanonicalJson.number(Double.NaN)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> CanonicalJson.number(Double.POSITIVE_INFINITY))
                .isInstanceOf(IllegalArgumentException.class);
    }

    @Test
    void shortestDigitsRoundTripForEveryProbe() {
        java.util.SplittableRandom random = new java.util.SplittableRandom(8785);
        for (int i = 0; i < 20_000; i++) {
            double x = Double.longBitsToDouble(random.nextLong());
            if (!Double.isFinite(x)) {
                continue;
            }
            String text = CanonicalJson.number(x);
            assertThat(Double.parseDouble(text)).isEqualTo(x == 0.0 ? 0.0 : x);
        }
    }

    @org.junit.jupiter.api.Test
    void aLoneSurrogateHasNoCanonicalForm() {
        // RFC 8785 3.2.2.2 writes strings as UTF-8; RFC 7493 2.1 excludes lone surrogates: refused, never "?".
        var factory = tools.jackson.databind.node.JsonNodeFactory.instance;
        for (String s : new String[] {"\ud800", "a\udc00", "\ud800\ud800", "x\udbff"}) {
            org.assertj.core.api.Assertions.assertThatThrownBy(() -> CanonicalJson.text(factory.stringNode(s)))
                    .isInstanceOf(IllegalArgumentException.class);
        }
        org.assertj.core.api.Assertions.assertThat(CanonicalJson.text(factory.stringNode("\ud83d\ude00")))
                .isEqualTo("\"\ud83d\ude00\"");
    }
}
