package utdigit.web.materials;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Pattern;
import tools.jackson.core.JacksonException;
import tools.jackson.core.JsonParser;
import tools.jackson.core.JsonToken;
import tools.jackson.core.TokenStreamLocation;
import tools.jackson.dataformat.yaml.YAMLMapper;
import utdigit.core.materials.Material;
import utdigit.core.materials.UncertaintyKind;

/**
 * Reads one operator materials file into materials, or fails with a {@link MaterialFileException}
 * naming the file, the line and column of the offending token and what is wrong. Format (YAML):
 *
 * <pre>
 * materials:                              # at least one
 *   - id: kebab-case                      # required, not a built-in id
 *     name: text                          # required
 *     longitudinal_m_per_s: number        # required, 100 to 20000
 *     shear_m_per_s: number               # optional (none for liquids), 100 to 20000
 *     longitudinal_uncertainty_m_per_s: number   # optional, 0 to 20 % of the velocity
 *     shear_uncertainty_m_per_s: number          # optional, 0 to 20 % of the velocity
 *     uncertainty_kind: STANDARD | HALF_WIDTH    # required with an uncertainty
 *     source: text                        # required: where the values come from
 *     note: text                          # optional
 *     liquid: true | false                # optional, default false
 *     coarse_grained: true | false        # optional, default false: shear waves get a caution
 * </pre>
 */
final class MaterialFileParser {
    private static final Pattern KEBAB_CASE = Pattern.compile("[a-z0-9]+(-[a-z0-9]+)*");
    private static final YAMLMapper YAML = YAMLMapper.builder().build();
    private static final double MIN_VELOCITY = 100.0;
    private static final double MAX_VELOCITY = 20_000.0;
    private static final List<String> FIELDS = List.of("id", "name", "longitudinal_m_per_s", "shear_m_per_s",
            "longitudinal_uncertainty_m_per_s", "shear_uncertainty_m_per_s", "uncertainty_kind", "source", "note",
            "liquid", "coarse_grained");

    private final String source;
    private final JsonParser p;

    private MaterialFileParser(String source, JsonParser p) {
        this.source = source;
        this.p = p;
    }

    /** A value read from the file and where it stood. */
    private record Value(Object value, TokenStreamLocation at) {}

    /** A material read from the file and where its id stands (for an id used again elsewhere). */
    record Located(Material material, int idLine, int idColumn) {}

    static List<Material> parse(String source, byte[] yaml) {
        return parseLocated(source, yaml).stream().map(Located::material).toList();
    }

    static List<Located> parseLocated(String source, byte[] yaml) {
        try (JsonParser p = YAML.createParser(yaml)) {
            return new MaterialFileParser(source, p).file();
        } catch (JacksonException e) {
            TokenStreamLocation at = e.getLocation();
            throw new MaterialFileException(source, at == null ? 0 : at.getLineNr(), at == null ? 0 : at.getColumnNr(),
                    "not valid YAML: " + e.getOriginalMessage());
        }
    }

    private List<Located> file() {
        JsonToken t = p.nextToken();
        if (t != JsonToken.START_OBJECT) {
            throw fail(t == null ? null : p.currentTokenLocation(), "a materials file is a YAML mapping with the field "
                    + "'materials' (a list of materials)");
        }
        List<Located> materials = null;
        while ((t = p.nextToken()) == JsonToken.PROPERTY_NAME) {
            TokenStreamLocation at = p.currentTokenLocation();
            if (!p.currentName().equals("materials")) {
                throw fail(at, "unknown field '" + p.currentName() + "': the file holds one field, 'materials'");
            }
            if (materials != null) {
                throw fail(at, "field 'materials' is given twice");
            }
            if (p.nextToken() != JsonToken.START_ARRAY) {
                throw fail(p.currentTokenLocation(), "'materials' is a list of materials");
            }
            materials = new ArrayList<>();
            while ((t = p.nextToken()) != JsonToken.END_ARRAY) {
                if (t != JsonToken.START_OBJECT) {
                    throw fail(p.currentTokenLocation(), "each material is a mapping (field: value lines)");
                }
                materials.add(material(p.currentTokenLocation()));
            }
        }
        if (materials == null || materials.isEmpty()) {
            throw fail(p.currentTokenLocation(), "the file lists no material under 'materials'");
        }
        if (p.nextToken() != null) {
            throw fail(p.currentTokenLocation(), "a second YAML document starts here: one document per file");
        }
        return materials;
    }

    private Located material(TokenStreamLocation start) {
        Map<String, Value> f = new HashMap<>();
        JsonToken t;
        while ((t = p.nextToken()) == JsonToken.PROPERTY_NAME) {
            String name = p.currentName();
            TokenStreamLocation at = p.currentTokenLocation();
            if (!FIELDS.contains(name)) {
                throw fail(at, "unknown field '" + name + "'; a material has " + String.join(", ", FIELDS));
            }
            if (f.containsKey(name)) {
                throw fail(at, "field '" + name + "' is given twice in this material");
            }
            JsonToken v = p.nextToken();
            TokenStreamLocation valueAt = p.currentTokenLocation();
            Object value = switch (v) {
                case VALUE_STRING -> p.getString();
                case VALUE_NUMBER_INT, VALUE_NUMBER_FLOAT -> p.getDoubleValue();
                case VALUE_TRUE -> Boolean.TRUE;
                case VALUE_FALSE -> Boolean.FALSE;
                case VALUE_NULL -> null;
                default -> throw fail(valueAt, "field '" + name + "' takes a single value, not a list or mapping");
            };
            if (value != null) {
                f.put(name, new Value(value, valueAt));
            }
        }
        String id = text(f, "id", start, true);
        if (!KEBAB_CASE.matcher(id).matches()) {
            throw fail(f.get("id").at(), "id '" + id + "' is not kebab-case (lower-case words joined by '-')");
        }
        String name = text(f, "name", start, true);
        String source = text(f, "source", start, true);
        String note = text(f, "note", start, false);
        boolean liquid = flag(f, "liquid");
        boolean coarseGrained = flag(f, "coarse_grained");
        double longitudinal = velocity(f, "longitudinal_m_per_s", start, true);
        Double shear = f.containsKey("shear_m_per_s") ? velocity(f, "shear_m_per_s", start, false) : null;
        if (liquid && shear != null) {
            throw fail(f.get("shear_m_per_s").at(), "a liquid carries no shear wave: leave shear_m_per_s out");
        }
        Double uL = uncertainty(f, "longitudinal_uncertainty_m_per_s", longitudinal);
        Double uS = uncertainty(f, "shear_uncertainty_m_per_s", shear);
        if (uS != null && shear == null) {
            throw fail(f.get("shear_uncertainty_m_per_s").at(), "shear_uncertainty_m_per_s needs shear_m_per_s");
        }
        UncertaintyKind kind = UncertaintyKind.NOT_STATED;
        Value k = f.get("uncertainty_kind");
        if (k != null) {
            if (!(k.value() instanceof String s) || !(s.equals("STANDARD") || s.equals("HALF_WIDTH"))) {
                throw fail(k.at(), "uncertainty_kind is STANDARD (a standard uncertainty) or HALF_WIDTH (the +/- "
                        + "half-width of a range)");
            }
            kind = UncertaintyKind.valueOf((String) k.value());
            if (uL == null && uS == null) {
                throw fail(k.at(), "uncertainty_kind needs longitudinal_uncertainty_m_per_s or "
                        + "shear_uncertainty_m_per_s");
            }
        } else if (uL != null || uS != null) {
            throw fail(f.get(uL != null ? "longitudinal_uncertainty_m_per_s" : "shear_uncertainty_m_per_s").at(),
                    "say how the uncertainty reads: uncertainty_kind STANDARD or HALF_WIDTH");
        }
        TokenStreamLocation idAt = f.get("id").at();
        return new Located(new Material(id, name, longitudinal, shear, uL, uS, kind, source, note,
                Material.Origin.OPERATOR, liquid, coarseGrained), idAt.getLineNr(), idAt.getColumnNr());
    }

    private String text(Map<String, Value> f, String name, TokenStreamLocation start, boolean required) {
        Value v = f.get(name);
        if (v == null) {
            if (required) {
                throw fail(start, "this material has no '" + name + "'");
            }
            return null;
        }
        if (!(v.value() instanceof String s) || s.isBlank()) {
            throw fail(v.at(), name + " is a non-empty text");
        }
        return s.strip();
    }

    private boolean flag(Map<String, Value> f, String name) {
        Value v = f.get(name);
        if (v == null) {
            return false;
        }
        if (!(v.value() instanceof Boolean b)) {
            throw fail(v.at(), name + " is true or false");
        }
        return b;
    }

    private double velocity(Map<String, Value> f, String name, TokenStreamLocation start, boolean required) {
        Value v = f.get(name);
        if (v == null) {
            throw fail(start, "this material has no '" + name + "'");
        }
        if (!(v.value() instanceof Double d) || !(d >= MIN_VELOCITY && d <= MAX_VELOCITY)) {
            throw fail(v.at(), name + " is a number of m/s from 100 to 20000");
        }
        return d;
    }

    private Double uncertainty(Map<String, Value> f, String name, Double velocity) {
        Value v = f.get(name);
        if (v == null) {
            return null;
        }
        if (!(v.value() instanceof Double d) || !(d >= 0.0)) {
            throw fail(v.at(), name + " is a number of m/s, 0 or more");
        }
        if (velocity != null && d > 0.2 * velocity) {
            throw fail(v.at(), String.format(Locale.ROOT, "%s is at most 20 %% of the velocity (%s m/s)", name,
                    0.2 * velocity));
        }
        return d;
    }

    private MaterialFileException fail(TokenStreamLocation at, String problem) {
        return new MaterialFileException(source, at == null ? 0 : at.getLineNr(), at == null ? 0 : at.getColumnNr(),
                problem);
    }
}
