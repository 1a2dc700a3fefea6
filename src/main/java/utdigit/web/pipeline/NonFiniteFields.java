package utdigit.web.pipeline;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Function;
import utdigit.web.json.JsonPointers;
import utdigit.web.json.RecordMembers;

/**
 * The backstop for numbers with no finite value in an answer: the JSON Pointers of every NaN or
 * infinite double, found by walking the answer record's members ({@link RecordMembers}), in the
 * order the answer writes them; called only when the stamp's canonical pass met such a number. The core answers null with a warning where a
 * value cannot exist; a formula that still yields a non-finite value is written as null with a
 * RESULT_NOT_REPRESENTABLE warning naming it, never as a non-JSON number.
 */
public final class NonFiniteFields {
    private NonFiniteFields() {}

    /** The pointers of the non-finite numbers of {@code answer}; empty when every number is finite. */
    public static List<String> of(Object answer) {
        List<String> found = new ArrayList<>(0);
        walk(answer, "", found);
        return found;
    }

    private static void walk(Object value, String pointer, List<String> found) {
        if (value == null) {
            return;
        }
        if (value instanceof Double d) {
            if (!Double.isFinite(d)) {
                found.add(pointer);
            }
        } else if (value instanceof Float f) {
            if (!Float.isFinite(f)) {
                found.add(pointer);
            }
        } else if (value instanceof Optional<?> o) {
            walk(o.orElse(null), pointer, found);
        } else if (value instanceof List<?> list) {
            for (int i = 0; i < list.size(); i++) {
                walk(list.get(i), pointer + "/" + i, found);
            }
        } else if (value instanceof Map<?, ?> map) {
            for (Map.Entry<?, ?> e : map.entrySet()) {
                walk(e.getValue(), JsonPointers.child(pointer, String.valueOf(e.getKey())), found);
            }
        } else if (value.getClass().isRecord()) {
            for (Map.Entry<String, Function<Object, Object>> m : RecordMembers.of(value.getClass()).entrySet()) {
                walk(m.getValue().apply(value), JsonPointers.child(pointer, m.getKey()), found);
            }
        }
    }
}
