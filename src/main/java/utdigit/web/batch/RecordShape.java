package utdigit.web.batch;

import com.fasterxml.jackson.annotation.JsonProperty;
import java.lang.reflect.RecordComponent;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import utdigit.core.sheets.SheetMetrics;
import utdigit.web.json.ContractNaming;

/**
 * The flat, dotted view of a request or answer record that CSV needs: each leaf property by its
 * dotted JSON name ({@code probe.frequency_mhz}) with its kind. Derived once per record type by
 * reflection, with the same naming rule as the JSON mapper.
 */
final class RecordShape {
    /** How a CSV cell of a leaf is turned into JSON. */
    enum Kind { NUMBER, INTEGER, TEXT, TEXT_LIST }

    private final Map<String, Kind> leaves;

    private RecordShape(Map<String, Kind> leaves) {
        this.leaves = leaves;
    }

    /** The input leaves of a request record: numbers, integers and texts (enums, ids). */
    static RecordShape ofRequest(Class<?> type) {
        Map<String, Kind> leaves = new LinkedHashMap<>();
        collectRequest(type, "", leaves);
        return new RecordShape(leaves);
    }

    private static void collectRequest(Class<?> type, String prefix, Map<String, Kind> out) {
        for (RecordComponent c : type.getRecordComponents()) {
            String name = prefix + jsonName(c);
            Class<?> t = c.getType();
            if (t == Double.class || t == double.class) {
                out.put(name, Kind.NUMBER);
            } else if (t == Integer.class || t == int.class || t == Long.class || t == long.class) {
                out.put(name, Kind.INTEGER);
            } else if (t == String.class || t.isEnum()) {
                out.put(name, Kind.TEXT);
            } else if (t.isRecord()) {
                collectRequest(t, name + ".", out);
            } else if (List.class.isAssignableFrom(t)) {
                out.put(name, Kind.TEXT_LIST); // a list of texts (profile ids): one cell, items separated by ';'
            }
        }
    }

    /**
     * The output columns of an answer record: its leaves in declaration order; {@code inputs},
     * {@code references} and the velocity's source text are left out, lists of warnings and
     * findings become one column each, and the sheet's {@code values} map one column per metric.
     */
    static List<String> answerColumns(Class<?> type) {
        List<String> out = new ArrayList<>();
        collectAnswer(type, "", out);
        out.add("stamp.sha256");
        return out;
    }

    private static void collectAnswer(Class<?> type, String prefix, List<String> out) {
        for (RecordComponent c : type.getRecordComponents()) {
            String name = prefix + jsonName(c);
            Class<?> t = c.getType();
            if (name.equals("inputs") || name.equals("references") || name.equals("velocity_source.source")) {
                continue;
            }
            if (t.isRecord()) {
                collectAnswer(t, name + ".", out);
            } else if (List.class.isAssignableFrom(t)) {
                out.add(name);
            } else if (Map.class.isAssignableFrom(t)) {
                for (String metric : SheetMetrics.ALL) {
                    out.add(name + "." + metric);
                }
            } else if (t == Optional.class || isLeaf(t)) {
                out.add(name);
            }
        }
    }

    private static boolean isLeaf(Class<?> t) {
        return t.isPrimitive() || Number.class.isAssignableFrom(t) || t == String.class || t.isEnum()
                || t == Boolean.class;
    }

    static String jsonName(RecordComponent c) {
        JsonProperty p = c.getAnnotation(JsonProperty.class);
        return p != null && !p.value().isEmpty() ? p.value() : ContractNaming.snake(c.getName());
    }

    Kind kind(String dottedName) {
        return leaves.get(dottedName);
    }

    boolean has(String dottedName) {
        return leaves.containsKey(dottedName);
    }

    java.util.Set<String> names() {
        return leaves.keySet();
    }
}
