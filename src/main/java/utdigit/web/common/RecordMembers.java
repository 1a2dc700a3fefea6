package utdigit.web.common;

import com.fasterxml.jackson.annotation.JsonProperty;
import java.lang.invoke.MethodHandle;
import java.lang.invoke.MethodHandles;
import java.lang.invoke.MethodType;
import java.lang.reflect.RecordComponent;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * The members of a record by their JSON names (the mapper's naming rule, or an explicit
 * {@link JsonProperty}), in declaration order, with their accessors; looked up once per record type.
 * Used where an answer is read member by member without a JSON tree: the non-finite check and the
 * cells of a CSV batch answer.
 */
public final class RecordMembers {
    private static final MethodType GETTER = MethodType.methodType(Object.class, Object.class);

    private static final ClassValue<Map<String, MethodHandle>> MEMBERS = new ClassValue<>() {
        @Override
        protected Map<String, MethodHandle> computeValue(Class<?> type) {
            Map<String, MethodHandle> out = new LinkedHashMap<>();
            for (RecordComponent c : type.getRecordComponents()) {
                JsonProperty p = c.getAnnotation(JsonProperty.class);
                String name = p != null && !p.value().isEmpty() ? p.value() : ContractNaming.snake(c.getName());
                try {
                    var accessor = c.getAccessor();
                    accessor.setAccessible(true); // answer records are package-private in their feature
                    out.put(name, MethodHandles.lookup().unreflect(accessor).asType(GETTER));
                } catch (IllegalAccessException e) {
                    throw new IllegalStateException("cannot read " + type.getName() + "." + c.getName(), e);
                }
            }
            return java.util.Collections.unmodifiableMap(out);
        }
    };

    private RecordMembers() {}

    /** The members of a record type by JSON name, in declaration order. */
    public static Map<String, MethodHandle> of(Class<?> recordType) {
        return MEMBERS.get(recordType);
    }

    /** The value of one member of a record; null if the record has no such member. */
    public static Object get(Object record, String jsonName) {
        MethodHandle accessor = MEMBERS.get(record.getClass()).get(jsonName);
        return accessor == null ? null : invoke(accessor, record);
    }

    /** Calls an accessor of {@link #of}. */
    public static Object invoke(MethodHandle accessor, Object record) {
        try {
            return accessor.invokeExact(record);
        } catch (RuntimeException | Error e) {
            throw e;
        } catch (Throwable t) {
            throw new IllegalStateException(t);
        }
    }
}
