package utdigit.web.stamp;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;
import utdigit.web.pipeline.CalculationRunner;

/**
 * The stamp's canonical bytes written from the typed answer (no tree) equal RFC 8785 over the
 * answer as a JSON tree ({@link CanonicalJson}, the form stamp verification uses on received
 * documents), on every committed example answer (api-examples/): the request is answered again,
 * its typed canonical bytes compared with the canonical form of the committed answer, and its
 * sha256 with the committed stamp.
 */
@SpringBootTest
class TypedCanonicalFormTest {
    @Autowired
    CalculationRunner runner;
    @Autowired
    JsonMapper mapper;
    @Autowired
    Stamper stamper;

    @Test
    void typedCanonicalBytesEqualTheTreeFormOfEveryCommittedExampleAnswer() throws Exception {
        List<String> names;
        try (Stream<Path> files = Files.list(Path.of("api-examples"))) {
            names = files.map(p -> p.getFileName().toString()).filter(n -> n.endsWith(".answer.json"))
                    .map(n -> n.substring(0, n.length() - ".answer.json".length()))
                    .filter(n -> runner.names().contains(n)).sorted().toList();
        }
        assertThat(names).hasSizeGreaterThanOrEqualTo(runner.names().size() - 1); // all, or all but waveforms
        for (String name : names) {
            JsonNode request = mapper.readTree(Files.readString(Path.of("api-examples", name + ".json")));
            JsonNode committed = mapper.readTree(Files.readString(Path.of("api-examples", name + ".answer.json")));
            Stamped<?> answer = runner.runTree(name, request);
            byte[] typed = Stamper.coveredBytes(mapper, answer);
            byte[] tree = Stamper.coveredBytes(committed);
            assertThat(new String(typed, StandardCharsets.UTF_8)).as(name).isEqualTo(new String(tree, StandardCharsets.UTF_8));
            assertThat(answer.sha256()).as(name).isEqualTo(committed.path("stamp").path("sha256").asString());
            assertThat(answer.sha256()).as(name).isEqualTo(StampKey.sha256Hex(tree));
        }
    }

    /** A record with what RFC 8785 treats specially: escapes, non-ASCII, number forms, member order. */
    record Edges(String text, double huge, double tiny, double smallest, double negativeZero, double integral,
                 java.util.Optional<Double> none, java.util.Map<String, Number> values, List<Object> mixed,
                 long big, String zLast, String aFirst) {}

    @Test
    void typedCanonicalBytesEqualTheTreeFormOnStringsNumbersAndOrderingEdges() {
        java.util.Map<String, Number> values = new java.util.LinkedHashMap<>();
        values.put("b", 1);
        values.put("a", 2.5);
        values.put("\u00e9", 1e21); // RFC 8785 3.2.3: members sorted by UTF-16 code units
        values.put("\u20ac", 1e-7);
        values.put("Z", 9.999999999999999e22);
        values.put("\ud83d\ude00", 4.35);
        Edges edges = new Edges("quote \" backslash \\ slash / tab \t nl \n cr \r bs \b ff \f nul \u0000 "
                + "us \u001f del \u007f e-acute \u00e9 line sep \u2028 emoji \ud83d\ude00",
                1e21, 1e-7, Double.MIN_VALUE, -0.0, 25.0, java.util.Optional.empty(), values,
                List.of(1, 2.0, "x", -1.5e-300), (1L << 53) + 2, "z", "a");
        Stamped<Edges> stamped = new Stamped<>(edges, "edges", "0.0.0", "0".repeat(64), null, null,
                "no finite value exists for /x with these inputs; returned as null");
        byte[] typed = Stamper.coveredBytes(mapper, stamped);
        byte[] tree = Stamper.coveredBytes(mapper.valueToTree(stamped));
        assertThat(new String(typed, StandardCharsets.UTF_8)).isEqualTo(new String(tree, StandardCharsets.UTF_8));
        // RFC 8785 3.2.2.2 and 3.2.2.3 forms, written out (RFC 8785 appendix B examples: 1e+21, 1e-7, 5e-324)
        assertThat(new String(typed, StandardCharsets.UTF_8)).contains("\"huge\":1e+21", "\"tiny\":1e-7",
                "\"smallest\":5e-324", "\"negative_zero\":0,", "\"integral\":25,", "\\u0000", "\\u001f",
                "\\b", "\\f", "slash /", "\"none\":null");
    }

    record Note(String code, String message) {}

    record WithNonFinite(double a, java.util.Optional<Double> b, List<Double> c, double negativeZero, List<Note> warnings) {}

    record NoWarnings(double a, String z) {}

    /**
     * A number with no finite value is written as null with a RESULT_NOT_REPRESENTABLE warning after
     * the answer's own (a warnings member is added when the answer has none), -0.0 as 0.0, and the
     * stamp covers exactly that document: its sha256 equals the tree form's over the written answer.
     */
    @Test
    void numbersWithNoFiniteValueAreNullWithAWarningAndStampedAsWritten() {
        WithNonFinite answer = new WithNonFinite(Double.NaN, java.util.Optional.of(Double.POSITIVE_INFINITY),
                List.of(1.0, Double.NEGATIVE_INFINITY), -0.0, List.of(new Note("OWN", "the answer's own warning")));
        Stamped<WithNonFinite> stamped = stamper.stamp("non-finite", answer, a -> "three figures");
        assertThat(stamped.notRepresentable()).isEqualTo("three figures");
        JsonNode written = mapper.readTree(mapper.writeValueAsString(stamped));
        assertThat(written.get("a").isNull()).isTrue();
        assertThat(written.get("b").isNull()).isTrue();
        assertThat(written.get("c").get(1).isNull()).isTrue();
        assertThat(Double.doubleToRawLongBits(written.get("negative_zero").doubleValue())).isZero();
        assertThat(written.get("warnings").get(0).get("code").asString()).isEqualTo("OWN");
        assertThat(written.get("warnings").get(1).get("code").asString()).isEqualTo(Stamped.NOT_REPRESENTABLE);
        assertThat(written.get("warnings").get(1).get("message").asString()).isEqualTo("three figures");
        assertThat(List.copyOf(written.propertyNames())).endsWith("warnings", "stamp");
        assertThat(stamped.sha256()).isEqualTo(StampKey.sha256Hex(Stamper.coveredBytes(written)));

        Stamped<NoWarnings> added = stamper.stamp("non-finite", new NoWarnings(Double.NaN, "z"), a -> "one figure");
        JsonNode withWarnings = mapper.readTree(mapper.writeValueAsString(added));
        assertThat(List.copyOf(withWarnings.propertyNames())).containsExactly("a", "z", "warnings", "stamp");
        assertThat(added.sha256()).isEqualTo(StampKey.sha256Hex(Stamper.coveredBytes(withWarnings)));

        Stamped<NoWarnings> finite = stamper.stamp("finite", new NoWarnings(1.0, "z"), a -> "never asked");
        assertThat(finite.notRepresentable()).isNull();
    }
}
