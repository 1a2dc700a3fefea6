package utdigit.web.rules;

import java.util.ArrayList;
import java.util.Collection;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Pattern;
import tools.jackson.core.JacksonException;
import tools.jackson.core.JsonToken;
import tools.jackson.core.StreamReadFeature;
import tools.jackson.core.TokenStreamLocation;
import tools.jackson.core.exc.StreamReadException;
import tools.jackson.databind.DeserializationFeature;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.PropertyNamingStrategies;
import tools.jackson.databind.exc.MismatchedInputException;
import tools.jackson.databind.exc.UnrecognizedPropertyException;
import tools.jackson.dataformat.yaml.YAMLMapper;
import utdigit.core.rules.Comparison;
import utdigit.core.rules.Condition;
import utdigit.core.rules.Document;
import utdigit.core.rules.Limit;
import utdigit.core.rules.RequirementProfile;
import utdigit.core.rules.Rule;
import utdigit.core.rules.VerificationStatus;
import utdigit.web.rules.ProfileYaml.LimitValue;
import utdigit.web.rules.ProfileYaml.Located;
import utdigit.web.rules.ProfileYaml.NumberValue;
import utdigit.web.rules.ProfileYaml.RawCondition;
import utdigit.web.rules.ProfileYaml.RawDocument;
import utdigit.web.rules.ProfileYaml.RawProfile;
import utdigit.web.rules.ProfileYaml.RawRule;
import utdigit.web.rules.ProfileYaml.Technique;
import utdigit.web.rules.ProfileYaml.Text;
import utdigit.web.stamp.CanonicalJson;
import utdigit.web.stamp.StampKey;

/**
 * Reads one profile file (format: {@link ProfileYaml}) into a {@link RequirementProfile}, or fails
 * with a {@link ProfileException} naming the file, the line and column of the offending token and
 * what is wrong. The profile's sha256 is the lower-case hex SHA-256 of the RFC 8785 canonical JSON
 * of the file's content read as a tree: comments, key order, quoting and layout do not change it;
 * any value does.
 */
final class ProfileParser {
    private static final Pattern KEBAB_CASE = Pattern.compile("[a-z0-9]+(-[a-z0-9]+)*");

    private static final YAMLMapper YAML = YAMLMapper.builder()
            .propertyNamingStrategy(PropertyNamingStrategies.SNAKE_CASE)
            .enable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES)
            // checked here, with the position of the second document
            .disable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS)
            // checked by LocatingParser, with the position of the repeated name
            .disable(StreamReadFeature.STRICT_DUPLICATE_DETECTION)
            .build();

    /** A parsed profile and where its id stands (for a duplicate id across files). */
    record Parsed(RequirementProfile profile, String source, TokenStreamLocation idAt) {}

    private final String source;

    private ProfileParser(String source) {
        this.source = source;
    }

    /**
     * Parses one profile file.
     *
     * @param source the file as messages name it (absolute path, or classpath:profiles/x.yaml)
     * @param yaml the file's bytes (UTF-8)
     */
    static Parsed parse(String source, byte[] yaml) {
        ProfileParser parser = new ProfileParser(source);
        RawProfile raw;
        TokenStreamLocation start;
        LocatingParser p = null;
        try {
            p = new LocatingParser(YAML.createParser(yaml));
            JsonToken first = p.nextToken();
            if (first == null) {
                throw parser.failure(null, "the file is empty: a profile is a YAML mapping");
            }
            start = p.currentTokenLocation();
            if (first != JsonToken.START_OBJECT) {
                throw parser.failure(start, "a profile is a YAML mapping (field: value lines), found " + word(first));
            }
            raw = YAML.readValue(p, RawProfile.class);
            if (p.nextToken() != null) {
                throw parser.failure(p.currentTokenLocation(),
                        "a second YAML document starts here: a profile file holds exactly one profile");
            }
        } catch (JacksonException e) {
            throw parser.translate(e, p);
        } finally {
            if (p != null) {
                p.close();
            }
        }
        RequirementProfile unhashed = parser.profile(raw, start);
        JsonNode tree = YAML.readTree(yaml);
        String sha256 = StampKey.sha256Hex(CanonicalJson.bytes(tree));
        RequirementProfile profile = new RequirementProfile(unhashed.id(), unhashed.title(), unhashed.version(),
                unhashed.documents(), unhashed.verificationStatus(), unhashed.cautions(), unhashed.rules(), sha256);
        return new Parsed(profile, source, raw.id().at());
    }

    private RequirementProfile profile(RawProfile raw, TokenStreamLocation start) {
        Text id = required(raw.id(), "id", "the profile", start);
        kebab(id, "profile id");
        if (id.value().equals(utdigit.core.rules.Finding.FEASIBILITY)) {
            throw failure(id.at(), "profile id '" + id.value() + "' is reserved for the service's own feasibility "
                    + "checks; choose another id");
        }
        String title = required(raw.title(), "title", "the profile", start).value();
        String version = required(raw.version(), "version", "the profile", start).value();
        Text status = required(raw.verificationStatus(), "verification_status", "the profile", start);
        VerificationStatus verificationStatus;
        try {
            verificationStatus = VerificationStatus.valueOf(status.value());
        } catch (IllegalArgumentException e) {
            throw failure(status.at(), "verification_status is VERIFIED or UNVERIFIED, not '" + status.value() + "'");
        }
        List<Document> documents = new ArrayList<>();
        for (Located<RawDocument> d : orEmpty(raw.documents())) {
            RawDocument doc = d.value();
            documents.add(new Document(
                    required(doc.name(), "name", "the document", d.at()).value(),
                    required(doc.edition(), "edition", "the document", d.at()).value(),
                    required(doc.clause(), "clause", "the document", d.at()).value()));
        }
        List<String> cautions = orEmpty(raw.cautions()).stream().map(Text::value).toList();
        if (raw.rules() == null) {
            throw failure(start, "the profile has no field 'rules'");
        }
        if (raw.rules().isEmpty()) {
            throw failure(start, "the profile has no rules: a profile needs at least one rule");
        }
        List<Rule> rules = new ArrayList<>();
        Map<String, TokenStreamLocation> ruleIds = new HashMap<>();
        for (Located<RawRule> r : raw.rules()) {
            Rule rule = rule(r.value(), r.at());
            TokenStreamLocation first = ruleIds.putIfAbsent(rule.id(), r.value().id().at());
            if (first != null) {
                throw failure(r.value().id().at(), "duplicate rule id '" + rule.id() + "' (first at line "
                        + first.getLineNr() + ", column " + first.getColumnNr() + ")");
            }
            rules.add(rule);
        }
        return new RequirementProfile(id.value(), title, version, documents, verificationStatus, cautions, rules, null);
    }

    private Rule rule(RawRule raw, TokenStreamLocation start) {
        Text id = required(raw.id(), "id", "the rule", start);
        kebab(id, "rule id");
        String what = "rule '" + id.value() + "'";
        String title = required(raw.title(), "title", what, start).value();
        String metric = required(raw.metric(), "metric", what, start).name();
        String source = required(raw.source(), "source", what, start).value();

        List<Comparison> comparisons = new ArrayList<>();
        List<LimitValue> limits = new ArrayList<>();
        addIfGiven(comparisons, limits, Comparison.AT_LEAST, raw.atLeast());
        addIfGiven(comparisons, limits, Comparison.AT_MOST, raw.atMost());
        addIfGiven(comparisons, limits, Comparison.EQUALS, raw.equalTo());
        if (limits.isEmpty()) {
            throw failure(start, what + " has no limit: give one of at_least, at_most or equals");
        }
        if (limits.size() > 1) {
            int second = laterOf(limits);
            throw failure(limits.get(second).at(), what + " has " + limits.size() + " limits ("
                    + String.join(", ", comparisons.stream().map(Comparison::word).toList())
                    + "): give exactly one");
        }
        LimitValue l = limits.get(0);
        Limit limit = l.number() != null ? Limit.of(l.number()) : Limit.ofMetric(l.metric());

        Set<String> techniques = new LinkedHashSet<>();
        if (raw.techniques() != null) {
            if (raw.techniques().isEmpty()) {
                throw failure(start, what + " has an empty techniques list: omit techniques for a rule of every "
                        + "technique");
            }
            for (Technique t : raw.techniques()) {
                if (!techniques.add(t.name())) {
                    throw failure(t.at(), what + " names technique " + t.name() + " twice");
                }
            }
        }
        List<Condition> when = new ArrayList<>();
        for (Located<RawCondition> c : orEmpty(raw.when())) {
            when.add(condition(c.value(), c.at(), what));
        }
        return new Rule(id.value(), title, metric, comparisons.get(0), limit, techniques, when, source);
    }

    private Condition condition(RawCondition raw, TokenStreamLocation start, String rule) {
        String metric = required(raw.metric(), "metric", "a condition of " + rule, start).name();
        List<Comparison> comparisons = new ArrayList<>();
        List<NumberValue> values = new ArrayList<>();
        Comparison[] order = {Comparison.AT_LEAST, Comparison.AT_MOST, Comparison.ABOVE, Comparison.BELOW,
                Comparison.EQUALS};
        NumberValue[] given = {raw.atLeast(), raw.atMost(), raw.above(), raw.below(), raw.equalTo()};
        for (int i = 0; i < order.length; i++) {
            if (given[i] != null) {
                comparisons.add(order[i]);
                values.add(given[i]);
            }
        }
        String what = "the condition on " + metric + " of " + rule;
        if (values.isEmpty()) {
            throw failure(start, what + " has no comparison: give one of at_least, at_most, above, below or equals");
        }
        if (values.size() > 1) {
            int later = 0;
            for (int i = 1; i < values.size(); i++) {
                if (after(values.get(i).at(), values.get(later).at())) {
                    later = i;
                }
            }
            throw failure(values.get(later).at(), what + " has " + values.size() + " comparisons ("
                    + String.join(", ", comparisons.stream().map(Comparison::word).toList())
                    + "): give exactly one; write two conditions for a band");
        }
        return new Condition(metric, comparisons.get(0), values.get(0).value());
    }

    private static void addIfGiven(List<Comparison> comparisons, List<LimitValue> limits, Comparison c, LimitValue v) {
        if (v != null) {
            comparisons.add(c);
            limits.add(v);
        }
    }

    /** Index of the limit that comes last in the file: the one that makes the rule wrong. */
    private static int laterOf(List<LimitValue> limits) {
        int later = 0;
        for (int i = 1; i < limits.size(); i++) {
            if (after(limits.get(i).at(), limits.get(later).at())) {
                later = i;
            }
        }
        return later;
    }

    private static boolean after(TokenStreamLocation a, TokenStreamLocation b) {
        return a.getLineNr() > b.getLineNr() || (a.getLineNr() == b.getLineNr() && a.getColumnNr() > b.getColumnNr());
    }

    private <T> T required(T value, String field, String owner, TokenStreamLocation ownerAt) {
        if (value == null) {
            throw failure(ownerAt, owner + " has no field '" + field + "'");
        }
        return value;
    }

    private void kebab(Text id, String what) {
        if (!KEBAB_CASE.matcher(id.value()).matches()) {
            throw failure(id.at(), what + " '" + id.value() + "' is not kebab-case (lower-case letters and digits "
                    + "joined by single hyphens, e.g. my-company-paut)");
        }
    }

    private static <T> List<T> orEmpty(List<T> list) {
        return list == null ? List.of() : list;
    }

    ProfileException failure(TokenStreamLocation at, String problem) {
        if (at == null || at == TokenStreamLocation.NA) {
            return new ProfileException(source, 0, 0, problem);
        }
        return new ProfileException(source, at.getLineNr(), at.getColumnNr(), problem);
    }

    /** A Jackson failure in the author's terms, at the offending token. */
    private ProfileException translate(JacksonException e, LocatingParser p) {
        String path = path(e);
        String where = path.isEmpty() ? "" : " (at " + path + ")";
        if (e instanceof ProfileValueException v) {
            return failure(e.getLocation(), e.getOriginalMessage() + where + v.hint());
        }
        if (e instanceof UnrecognizedPropertyException u) {
            Set<String> allowed = new TreeSet<>();
            Collection<Object> known = u.getKnownPropertyIds();
            if (known != null) {
                known.forEach(k -> allowed.add(String.valueOf(k)));
            }
            TokenStreamLocation named = p == null ? null : p.nameAt(u.getPropertyName());
            TokenStreamLocation at = named != null ? named : u.getLocation();
            return failure(at, "unknown field '" + u.getPropertyName() + "'" + where
                    + (allowed.isEmpty() ? "" : "; allowed here: " + String.join(", ", allowed)));
        }
        if (e instanceof StreamReadException) {
            return failure(e.getLocation(), "malformed YAML: " + condensed(e.getOriginalMessage()));
        }
        if (e instanceof MismatchedInputException m && m.getTargetType() != null) {
            return failure(e.getLocation(), "expected " + kind(m.getTargetType()) + ", found "
                    + word(m.getCurrentToken()) + where);
        }
        return failure(e.getLocation(), e.getOriginalMessage() + where);
    }

    /** rules[2].when[0].metric, from Jackson's reference chain. */
    private static String path(JacksonException e) {
        StringBuilder out = new StringBuilder();
        for (JacksonException.Reference r : e.getPath()) {
            if (r.getIndex() >= 0) {
                out.append('[').append(r.getIndex()).append(']');
            } else if (r.getPropertyName() != null) {
                if (!out.isEmpty()) {
                    out.append('.');
                }
                out.append(r.getPropertyName());
            }
        }
        return out.toString();
    }

    /** The YAML library's message without its echo of the source lines and carets. */
    private static String condensed(String message) {
        if (message == null) {
            return "unreadable";
        }
        List<String> parts = new ArrayList<>();
        for (String line : message.split("\\R")) {
            if (!line.isBlank() && !Character.isWhitespace(line.charAt(0))) {
                parts.add(line.strip());
            }
        }
        return parts.isEmpty() ? message.strip() : String.join(": ", parts);
    }

    private static String kind(Class<?> type) {
        if (Collection.class.isAssignableFrom(type)) {
            return "a list";
        }
        if (type.isRecord() || Map.class.isAssignableFrom(type)) {
            return "a mapping (field: value lines)";
        }
        if (type == String.class) {
            return "a text";
        }
        return "a " + type.getSimpleName();
    }

    private static String word(JsonToken t) {
        if (t == null) {
            return "nothing";
        }
        return switch (t) {
            case START_ARRAY -> "a list";
            case START_OBJECT -> "a mapping";
            case VALUE_STRING -> "a text";
            case VALUE_NUMBER_INT, VALUE_NUMBER_FLOAT -> "a number";
            case VALUE_TRUE, VALUE_FALSE -> "a boolean";
            case VALUE_NULL -> "nothing";
            default -> "a " + t.name().toLowerCase(java.util.Locale.ROOT).replace('_', ' ');
        };
    }
}
