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
    private static final Map<ValueSerializer<?>, PropertyWriter[]> MEMBERS = new ConcurrentHashMap<>();

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
        PropertyWriter[] members = MEMBERS.computeIfAbsent(ctxt.findValueSerializer(answer.getClass()),
                StampedSerializer::members);
        boolean hasWarnings = false;
        for (PropertyWriter m : members) {
            hasWarnings |= WARNINGS.equals(m.getName());
        }
        // members the answer record does not have: the stamp, and the warnings when one must be added
        List<String> extra = new ArrayList<>(2);
        if (!hasWarnings && value.notRepresentable() != null) {
            extra.add(WARNINGS);
        }
        extra.add(Stamper.STAMP);
        if (canonical) {
            extra.sort(null); // merged into the sorted members
        }
        JsonGenerator out = canonical ? gen : new FiniteNumbers(gen);
        gen.writeStartObject(value);
        try {
            for (PropertyWriter m : members) {
                if (canonical) {
                    while (!extra.isEmpty() && extra.get(0).compareTo(m.getName()) < 0) {
                        writeExtra(extra.remove(0), value, out, ctxt, true);
                    }
                }
                if (WARNINGS.equals(m.getName()) && value.notRepresentable() != null) {
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
        for (String name : extra) {
            writeExtra(name, value, out, ctxt, canonical);
        }
        gen.writeEndObject();
    }

    private static void writeExtra(String name, Stamped<?> value, JsonGenerator gen, SerializationContext ctxt,
                                   boolean canonical) {
        if (WARNINGS.equals(name)) {
            writeWarnings(null, value, gen, ctxt);
            return;
        }
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
