package utdigit.integration;

import java.util.Iterator;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;
import tools.jackson.databind.JsonNode;

/**
 * The first place where two JSON documents differ, as an RFC 6901 JSON Pointer. Objects are
 * compared member by member whatever their order, arrays element by element, numbers by value
 * ({@code 2}, {@code 2.0} and {@code 2E0} are equal), everything else exactly.
 */
final class JsonDifference {
    private JsonDifference() {}

    /** One difference: where, and what each side holds there ({@code null}: absent). */
    record Difference(String pointer, JsonNode expected, JsonNode actual) {
        String describe() {
            return "at " + (pointer.isEmpty() ? "the root" : pointer) + ": expected " + show(expected)
                    + ", found " + show(actual);
        }

        private static String show(JsonNode n) {
            if (n == null) {
                return "(absent)";
            }
            String s = n.toString();
            return s.length() > 200 ? s.substring(0, 200) + "..." : s;
        }
    }

    static Optional<Difference> first(JsonNode expected, JsonNode actual) {
        return first("", expected, actual);
    }

    private static Optional<Difference> first(String pointer, JsonNode expected, JsonNode actual) {
        if (expected == null || actual == null) {
            return expected == actual ? Optional.empty() : Optional.of(new Difference(pointer, expected, actual));
        }
        if (expected.isNumber() && actual.isNumber()) {
            return expected.decimalValue().compareTo(actual.decimalValue()) == 0 ? Optional.empty()
                    : Optional.of(new Difference(pointer, expected, actual));
        }
        if (expected.isObject() && actual.isObject()) {
            Set<String> names = new TreeSet<>();
            expected.propertyNames().forEach(names::add);
            actual.propertyNames().forEach(names::add);
            // Members in the expected document's order first, so the pointer reads like the file.
            for (Map.Entry<String, JsonNode> e : expected.properties()) {
                Optional<Difference> d = first(child(pointer, e.getKey()), e.getValue(), actual.get(e.getKey()));
                if (d.isPresent()) {
                    return d;
                }
            }
            for (String name : names) {
                if (!expected.has(name)) {
                    return Optional.of(new Difference(child(pointer, name), null, actual.get(name)));
                }
            }
            return Optional.empty();
        }
        if (expected.isArray() && actual.isArray()) {
            Iterator<JsonNode> a = actual.iterator();
            int i = 0;
            for (JsonNode e : expected) {
                Optional<Difference> d = first(pointer + "/" + i, e, a.hasNext() ? a.next() : null);
                if (d.isPresent()) {
                    return d;
                }
                i++;
            }
            return a.hasNext() ? Optional.of(new Difference(pointer + "/" + i, null, a.next())) : Optional.empty();
        }
        return expected.equals(actual) ? Optional.empty() : Optional.of(new Difference(pointer, expected, actual));
    }

    private static String child(String pointer, String name) {
        return pointer + "/" + name.replace("~", "~0").replace("/", "~1");
    }
}
