package utdigit.web.stamp;

import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import tools.jackson.core.JsonGenerator;
import tools.jackson.databind.SerializationContext;
import tools.jackson.databind.ValueSerializer;
import tools.jackson.databind.ser.BeanPropertyWriter;
import tools.jackson.databind.ser.PropertyWriter;
import tools.jackson.databind.ser.std.StdSerializer;

/**
 * Writes a {@link Stamped} answer without a tree: the answer record's members through its own bean
 * serializer, a RESULT_NOT_REPRESENTABLE warning after the answer's warnings when there is one, then
 * {@code stamp}. Two forms: the wire form (declaration order, the whole stamp last, numbers that have
 * no finite value as null and -0.0 as 0.0) and, with the {@link #CANONICAL} attribute on a mapper that
 * sorts properties, the members the stamp covers in sorted order with the reduced stamp in its place
 * ({@link CanonicalWriter}).
 */
final class StampedSerializer extends StdSerializer<Stamped<?>> {
    /** Writer attribute: write the canonical form (sorted members, reduced stamp). */
    static final Object CANONICAL = StampedSerializer.class.getName() + ".canonical";
    private static final String WARNINGS = "warnings";

    /** The members of each answer serializer (one per answer type and mapper), in the order it writes them. */
    private static final Map<ValueSerializer<?>, Layout> LAYOUTS = new ConcurrentHashMap<>();

    StampedSerializer() {
        super(Stamped.class);
    }

    private static PropertyWriter[] members(ValueSerializer<?> serializer) {
        List<PropertyWriter> members = new ArrayList<>(24);
        for (Iterator<PropertyWriter> it = serializer.properties(); it.hasNext(); ) {
            members.add(it.next());
        }
        if (members.isEmpty()) {
            throw new IllegalStateException("an answer must be a record with members: " + serializer.handledType());
        }
        return members.toArray(PropertyWriter[]::new);
    }

    @Override
    public void serialize(Stamped<?> value, JsonGenerator gen, SerializationContext ctxt) {
        boolean canonical = ctxt.getAttribute(CANONICAL) != null;
        Object answer = value.answer();
        Layout layout = LAYOUTS.computeIfAbsent(ctxt.findValueSerializer(answer.getClass()), Layout::of);
        boolean warn = value.notRepresentable() != null;
        // members the answer record does not have: the stamp, and the warnings when one must be added;
        // in the canonical form each goes before the first member whose name sorts after it (else last)
        int stampAt = canonical ? layout.stampSorted : layout.members.length;
        int warningsAt = !warn || layout.warnings >= 0 ? -1
                : canonical ? layout.warningsSorted : layout.members.length;
        JsonGenerator out = canonical ? gen : new FiniteNumbers(gen);
        gen.writeStartObject(value);
        try {
            for (int i = 0; i <= layout.members.length; i++) {
                // "stamp" sorts before "warnings": at one place, the stamp first in the canonical form
                if (canonical && i == stampAt) {
                    writeStamp(value, out, true);
                }
                if (i == warningsAt) {
                    writeWarnings(null, value, out, ctxt);
                }
                if (!canonical && i == stampAt) {
                    writeStamp(value, out, false);
                }
                if (i == layout.members.length) {
                    break;
                }
                PropertyWriter m = layout.members[i];
                if (warn && i == layout.warnings) {
                    writeWarnings(((BeanPropertyWriter) m).get(answer), value, out, ctxt);
                } else {
                    m.serializeAsProperty(answer, out, ctxt);
                }
            }
        } catch (RuntimeException e) {
            throw e;
        } catch (Exception e) {
            throw new IllegalStateException("could not write the answer of " + value.calculation(), e);
        }
        gen.writeEndObject();
    }

    /**
     * The members of an answer serializer in the order it writes them, their names, where warnings
     * is, and (members sorted by name) where the stamp and an added warnings member go: worked out
     * once per answer type, not per answer.
     */
    private record Layout(PropertyWriter[] members, String[] names, int warnings, int stampSorted, int warningsSorted) {
        Layout(PropertyWriter[] members, String[] names, int warnings) {
            this(members, names, warnings, sortedBefore(names, Stamper.STAMP), sortedBefore(names, WARNINGS));
        }

        static Layout of(ValueSerializer<?> serializer) {
            PropertyWriter[] members = StampedSerializer.members(serializer);
            String[] names = new String[members.length];
            int warnings = -1;
            for (int i = 0; i < members.length; i++) {
                names[i] = members[i].getName();
                if (WARNINGS.equals(names[i])) {
                    warnings = i;
                }
            }
            return new Layout(members, names, warnings);
        }

        /** The index of the first member whose name sorts after {@code name} (members sorted by name). */
        static int sortedBefore(String[] names, String name) {
            for (int i = 0; i < names.length; i++) {
                if (name.compareTo(names[i]) < 0) {
                    return i;
                }
            }
            return names.length;
        }
    }

    private static void writeStamp(Stamped<?> value, JsonGenerator gen, boolean canonical) {
        gen.writeName(Stamper.STAMP);
        gen.writeStartObject();
        gen.writeStringProperty("calculation", value.calculation());
        gen.writeStringProperty("service_version", value.serviceVersion());
        if (!canonical) {
            gen.writeStringProperty("sha256", value.sha256());
            if (value.signature() != null) {
                gen.writeStringProperty("signature", value.signature());
                gen.writeStringProperty("key_id", value.keyId());
            }
        }
        gen.writeEndObject();
    }

    /** The answer's warnings, then the RESULT_NOT_REPRESENTABLE warning. */
    private static void writeWarnings(Object warnings, Stamped<?> value, JsonGenerator gen, SerializationContext ctxt) {
        gen.writeName(WARNINGS);
        gen.writeStartArray();
        if (warnings instanceof Iterable<?> list) {
            for (Object w : list) {
                ctxt.writeValue(gen, w);
            }
        }
        gen.writeStartObject();
        gen.writeStringProperty("code", Stamped.NOT_REPRESENTABLE);
        gen.writeStringProperty("message", value.notRepresentable());
        gen.writeEndObject();
        gen.writeEndArray();
    }
}
