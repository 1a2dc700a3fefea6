package utdigit.web.rules;

import com.fasterxml.jackson.annotation.JsonProperty;
import java.util.List;
import java.util.Set;
import tools.jackson.core.JsonParser;
import tools.jackson.core.JsonToken;
import tools.jackson.core.TokenStreamLocation;
import tools.jackson.databind.DeserializationContext;
import tools.jackson.databind.ValueDeserializer;
import tools.jackson.databind.annotation.JsonDeserialize;
import utdigit.core.sheets.SheetMetrics;

/**
 * The profile file format as Jackson binds it: records whose leaves carry the position of their
 * token, so that every check after binding can still say where the offending value stands. The
 * leaves' readers check what a single token can show (a text is a YAML string, a metric is in the
 * vocabulary, a technique is one of the four, a number is finite); {@link ProfileParser} checks
 * what needs the whole mapping (required fields, exactly one limit, unique rule ids).
 *
 * <pre>
 * id: kebab-case                          # required
 * title: text                             # required
 * version: text                           # required; quote numbers ("1.10")
 * documents:                              # optional
 *   - {name: text, edition: text, clause: text}
 * verification_status: VERIFIED | UNVERIFIED   # required
 * cautions: [text, ...]                   # optional
 * rules:                                  # at least one
 *   - id: kebab-case, unique in the profile
 *     title: text
 *     metric: a metric name
 *     at_least | at_most | equals: a number, or a metric name   # exactly one
 *     techniques: [PULSE_ECHO, PHASED_ARRAY, TOFD, TFM]        # optional; default all
 *     when:                                                     # optional; all must hold
 *       - {metric: a metric name, at_least | at_most | above | below | equals: a number}
 *     source: text
 * </pre>
 */
final class ProfileYaml {
    private ProfileYaml() {}

    /** The techniques of a technique sheet, in the contract's order. */
    static final List<String> TECHNIQUES = List.of("PULSE_ECHO", "PHASED_ARRAY", "TOFD", "TFM");

    private static final Set<String> TECHNIQUE_SET = Set.copyOf(TECHNIQUES);

    /** A non-empty YAML string and where it stands. */
    @JsonDeserialize(using = TextReader.class)
    record Text(String value, TokenStreamLocation at) {}

    /** A metric of the vocabulary ({@link SheetMetrics}) and where it stands. */
    @JsonDeserialize(using = MetricReader.class)
    record MetricName(String name, TokenStreamLocation at) {}

    /** A sheet technique and where it stands. */
    @JsonDeserialize(using = TechniqueReader.class)
    record Technique(String name, TokenStreamLocation at) {}

    /** A finite number and where it stands. */
    @JsonDeserialize(using = NumberReader.class)
    record NumberValue(double value, TokenStreamLocation at) {}

    /** The limit of a rule: a finite number or a metric name (exactly one non-null), and where it stands. */
    @JsonDeserialize(using = LimitReader.class)
    record LimitValue(Double number, String metric, TokenStreamLocation at) {}

    record RawProfile(Text id, Text title, Text version,
                      @JsonDeserialize(contentUsing = DocumentReader.class) List<Located<RawDocument>> documents,
                      Text verificationStatus, List<Text> cautions,
                      @JsonDeserialize(contentUsing = RuleReader.class) List<Located<RawRule>> rules) {}

    record RawDocument(Text name, Text edition, Text clause) {}

    record RawRule(Text id, Text title, MetricName metric, LimitValue atLeast, LimitValue atMost,
                   @JsonProperty("equals") LimitValue equalTo, List<Technique> techniques,
                   @JsonDeserialize(contentUsing = ConditionReader.class) List<Located<RawCondition>> when,
                   Text source) {}

    record RawCondition(MetricName metric, NumberValue atLeast, NumberValue atMost, NumberValue above,
                        NumberValue below, @JsonProperty("equals") NumberValue equalTo) {}

    /** A mapping and the position of its start (where a missing field is reported). */
    record Located<T>(T value, TokenStreamLocation at) {}

    static ProfileValueException invalid(JsonParser p, String problem) {
        return new ProfileValueException(p, problem, p.currentTokenLocation());
    }

    private static String shown(JsonParser p) {
        JsonToken t = p.currentToken();
        if (t == JsonToken.START_ARRAY) {
            return "a list";
        }
        if (t == JsonToken.START_OBJECT) {
            return "a mapping";
        }
        if (t == JsonToken.VALUE_TRUE || t == JsonToken.VALUE_FALSE) {
            return "the boolean " + p.getText();
        }
        if (t != null && t.isNumeric()) {
            return "the number " + p.getText();
        }
        return "'" + p.getText() + "'";
    }

    private static String metricName(JsonParser p, String expected) {
        if (p.currentToken() != JsonToken.VALUE_STRING) {
            throw invalid(p, "expected " + expected + ", found " + shown(p));
        }
        String name = p.getString();
        if (!SheetMetrics.isKnown(name)) {
            if (expected.contains("number") && looksNumeric(name)) {
                throw invalid(p, "found the quoted text '" + name + "': write a number without quotes");
            }
            throw new ProfileValueException(p, "unknown metric '" + name + "'", MetricSuggestion.of(name),
                    p.currentTokenLocation());
        }
        return name;
    }

    /**
     * A reader whose YAML null ({@code key:} with nothing after it, or an empty list entry) is an
     * error at that position, and whose absent field is null (reported as missing by the parser).
     */
    abstract static class StrictReader<T> extends ValueDeserializer<T> {
        private final String expected;

        StrictReader(String expected) {
            this.expected = expected;
        }

        @Override
        public T getNullValue(DeserializationContext ctxt) {
            throw invalid(ctxt.getParser(), "expected " + expected + ", found nothing");
        }

        @Override
        public Object getAbsentValue(DeserializationContext ctxt) {
            return null;
        }
    }

    private static boolean looksNumeric(String text) {
        try {
            Double.parseDouble(text.strip());
            return true;
        } catch (NumberFormatException e) {
            return false;
        }
    }

    static final class TextReader extends StrictReader<Text> {
        TextReader() {
            super("a text");
        }

        @Override
        public Text deserialize(JsonParser p, DeserializationContext ctxt) {
            JsonToken t = p.currentToken();
            if (t != JsonToken.VALUE_STRING) {
                String hint = t != null && t.isScalarValue() ? " (quote it: \"" + p.getText() + "\")" : "";
                throw invalid(p, "expected a text, found " + shown(p) + hint);
            }
            String value = p.getString();
            if (value.isBlank()) {
                throw invalid(p, "must not be empty");
            }
            return new Text(value, p.currentTokenLocation());
        }
    }

    static final class MetricReader extends StrictReader<MetricName> {
        MetricReader() {
            super("a metric name");
        }

        @Override
        public MetricName deserialize(JsonParser p, DeserializationContext ctxt) {
            return new MetricName(metricName(p, "a metric name"), p.currentTokenLocation());
        }
    }

    static final class TechniqueReader extends StrictReader<Technique> {
        TechniqueReader() {
            super("a technique");
        }

        @Override
        public Technique deserialize(JsonParser p, DeserializationContext ctxt) {
            if (p.currentToken() != JsonToken.VALUE_STRING || !TECHNIQUE_SET.contains(p.getString())) {
                throw invalid(p, "unknown technique " + shown(p) + "; techniques are " + String.join(", ", TECHNIQUES));
            }
            return new Technique(p.getString(), p.currentTokenLocation());
        }
    }

    static final class NumberReader extends StrictReader<NumberValue> {
        NumberReader() {
            super("a number");
        }

        @Override
        public NumberValue deserialize(JsonParser p, DeserializationContext ctxt) {
            if (p.currentToken() == null || !p.currentToken().isNumeric()) {
                throw invalid(p, "expected a number, found " + shown(p));
            }
            double value = p.getDoubleValue();
            if (!Double.isFinite(value)) {
                throw invalid(p, "expected a finite number, found " + p.getText());
            }
            return new NumberValue(value, p.currentTokenLocation());
        }
    }

    static final class LimitReader extends StrictReader<LimitValue> {
        LimitReader() {
            super("a number or a metric name");
        }

        @Override
        public LimitValue deserialize(JsonParser p, DeserializationContext ctxt) {
            TokenStreamLocation at = p.currentTokenLocation();
            JsonToken t = p.currentToken();
            if (t != null && t.isNumeric()) {
                double value = p.getDoubleValue();
                if (!Double.isFinite(value)) {
                    throw invalid(p, "expected a finite number, found " + p.getText());
                }
                return new LimitValue(value, null, at);
            }
            return new LimitValue(null, metricName(p, "a number or a metric name"), at);
        }
    }

    /** Reads a mapping as {@code raw} and keeps the position where it starts. */
    abstract static class LocatedReader<T> extends StrictReader<Located<T>> {
        private final Class<T> raw;

        LocatedReader(Class<T> raw) {
            super("a mapping (field: value lines)");
            this.raw = raw;
        }

        @Override
        public Located<T> deserialize(JsonParser p, DeserializationContext ctxt) {
            TokenStreamLocation at = p.currentTokenLocation();
            if (p.currentToken() != JsonToken.START_OBJECT) {
                throw invalid(p, "expected a mapping (field: value lines), found " + shown(p));
            }
            return new Located<>(ctxt.readValue(p, raw), at);
        }
    }

    static final class DocumentReader extends LocatedReader<RawDocument> {
        DocumentReader() {
            super(RawDocument.class);
        }
    }

    static final class RuleReader extends LocatedReader<RawRule> {
        RuleReader() {
            super(RawRule.class);
        }
    }

    static final class ConditionReader extends LocatedReader<RawCondition> {
        ConditionReader() {
            super(RawCondition.class);
        }
    }
}
