package utdigit.web.openapi;

import io.swagger.v3.oas.models.OpenAPI;
import io.swagger.v3.oas.models.media.Schema;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.HashMap;
import java.util.HashSet;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.springdoc.core.customizers.OpenApiCustomizer;
import org.springframework.stereotype.Component;
import tools.jackson.databind.DeserializationFeature;
import tools.jackson.databind.JsonNode;
import tools.jackson.dataformat.yaml.YAMLMapper;
import utdigit.web.units.Mirrors;

/**
 * Gives every property of the document's component schemas that its record does not describe
 * itself its description and example from {@code contract/properties.yaml}: the schema's own
 * entry, else a rule where the contract is regular (an inch mirror, the inch form of a length
 * input), else the glossary of names that mean the same everywhere. The file's header states the
 * rules; {@link #derived} applies them.
 */
@Component
class PropertyTexts implements OpenApiCustomizer {
    static final String RESOURCE = "contract/properties.yaml";
    private static final Pattern LENGTH_IN = Pattern.compile("(.+)_in(_per_s)?");

    /** A description and an example, each possibly null. */
    record Text(String description, Object example) {}

    /** The resource: the glossary by property name, and each schema's own entries. */
    record Texts(Map<String, Text> glossary, Map<String, Map<String, Text>> schemas) {
        Text own(String schema, String property) {
            return schemas.getOrDefault(schema, Map.of()).get(property);
        }
    }

    private final Texts texts = load();

    static Texts load() {
        YAMLMapper yaml = YAMLMapper.builder().enable(DeserializationFeature.USE_BIG_DECIMAL_FOR_FLOATS).build();
        try (InputStream in = PropertyTexts.class.getClassLoader().getResourceAsStream(RESOURCE)) {
            if (in == null) {
                throw new IllegalStateException(RESOURCE + " is missing");
            }
            JsonNode root = yaml.readTree(in);
            Map<String, Map<String, Text>> schemas = new HashMap<>();
            root.path("schemas").properties().forEach(s -> schemas.put(s.getKey(), entries(s.getValue())));
            return new Texts(entries(root.path("glossary")), schemas);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** {@code name: "description"}, {@code name: {example: value}} or both keys. */
    private static Map<String, Text> entries(JsonNode node) {
        Map<String, Text> entries = new HashMap<>();
        node.properties().forEach(e -> entries.put(e.getKey(), e.getValue().isString()
                ? new Text(e.getValue().asString(), null)
                : new Text(e.getValue().path("description").asString(null), example(e.getValue().get("example")))));
        return entries;
    }

    private static Object example(JsonNode value) {
        if (value == null) {
            return null;
        }
        if (value.isIntegralNumber()) {
            return value.numberValue();
        }
        if (value.isNumber()) {
            return value.decimalValue();
        }
        return value.isBoolean() ? value.booleanValue() : value.asString();
    }

    @Override
    @SuppressWarnings("rawtypes")
    public void customise(OpenAPI openApi) {
        if (openApi.getComponents() == null || openApi.getComponents().getSchemas() == null) {
            return;
        }
        Map<String, Schema> schemas = openApi.getComponents().getSchemas();
        Set<String> mirrors = new HashSet<>();
        for (Schema<?> s : schemas.values()) {
            if (s.getProperties() != null && s.getProperties().get("in_inches") instanceof Schema<?> ref
                    && ref.get$ref() != null) {
                mirrors.add(ref.get$ref().substring(ref.get$ref().lastIndexOf('/') + 1));
            }
        }
        schemas.forEach((name, schema) -> describe(name, schema, mirrors.contains(name)));
    }

    @SuppressWarnings({"rawtypes", "unchecked"})
    private void describe(String name, Schema<?> schema, boolean mirror) {
        Map<String, Schema> properties = (Map) schema.getProperties();
        if (properties == null) {
            return;
        }
        for (Map.Entry<String, Schema> p : properties.entrySet()) {
            Schema property = p.getValue();
            if (property.getDescription() != null || property.get$ref() != null) {
                continue; // described by its record, or by the schema it refers to
            }
            property.setDescription(description(name, p.getKey(), properties, mirror));
            Text own = texts.own(name, p.getKey());
            Text glossary = texts.glossary().get(p.getKey());
            Object example = own != null && own.example() != null ? own.example()
                    : glossary != null && !mirror ? glossary.example() : null;
            if (example != null && property.getExample() == null) {
                property.setExample(example);
            }
        }
    }

    /** The text of a property: its record's, the schema's own entry, a rule's, or the glossary's. */
    @SuppressWarnings("rawtypes")
    private String description(String schema, String property, Map<String, Schema> properties, boolean mirror) {
        Schema given = properties.get(property);
        if (given != null && given.getDescription() != null) {
            return given.getDescription();
        }
        Text own = texts.own(schema, property);
        if (own != null && own.description() != null) {
            return own.description();
        }
        Matcher inch = LENGTH_IN.matcher(property);
        if (inch.matches()) {
            String mm = inch.group(1) + (inch.group(2) == null ? "_mm" : "_mm_per_s");
            String rule = mirror ? mirrorText(property) : properties.containsKey(mm)
                    ? derived(property, mm, description(schema, mm, properties, false)) : null;
            if (rule != null) {
                return rule;
            }
        }
        Text glossary = texts.glossary().get(property);
        return glossary == null ? null : glossary.description();
    }

    /** The text of an inch mirror x_in (x_in_per_s) of an answer. */
    static String mirrorText(String inchName) {
        return inchName.endsWith("_in_per_s")
                ? inchName.substring(0, inchName.length() - "_in_per_s".length()) + "_mm_per_s / 25.4, in/s; null when it is null"
                : inchName.substring(0, inchName.length() - "_in".length()) + "_mm / 25.4, in; null when it is null";
    }

    /**
     * The text of an inch form from its mm form's: the unit in inches, the longest length (100000 mm)
     * as 100 m (a speed: 3937 in/s), the two names swapped; null where the mm text names no unit.
     */
    static String derived(String inchName, String mmName, String mmText) {
        if (mmText == null) {
            return null;
        }
        boolean speed = mmName.endsWith("_per_s");
        String unitMm = speed ? ", mm/s" : ", mm";
        int at = mmText.indexOf(unitMm);
        if (at < 0 || !speed && mmText.contains(", mm/s")) {
            return null;
        }
        String text = mmText.substring(0, at) + (speed ? ", in/s" : ", in") + mmText.substring(at + unitMm.length());
        text = text.replace("<= " + Mirrors.MAX_MM, speed ? "at most 3937 in/s" : "at most 100 m")
                .replace("0 to " + Mirrors.MAX_MM, "0 to 100 m");
        Matcher names = Pattern.compile("\\b(" + Pattern.quote(mmName) + "|" + Pattern.quote(inchName) + ")\\b")
                .matcher(text);
        return names.replaceAll(m -> m.group(1).equals(mmName) ? inchName : mmName);
    }
}
