package utdigit.web.json;

import com.fasterxml.jackson.annotation.JsonProperty;
import java.lang.invoke.LambdaMetafactory;
import java.lang.invoke.MethodHandle;
import java.lang.invoke.MethodHandles;
import java.lang.invoke.MethodType;
import java.lang.reflect.RecordComponent;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.function.Function;

/**
 * The members of a record by their JSON names (the mapper's naming rule, or an explicit
 * {@link JsonProperty}), in declaration order, with their accessors as functions (made once per record
 * type with LambdaMetafactory, so that reading a member costs what calling its accessor does).
 * Used where an answer is read member by member without a JSON tree: the non-finite check and the
 * cells of a CSV batch answer.
 */
public final class RecordMembers {
    private static final ClassValue<Map<String, Function<Object, Object>>> MEMBERS = new ClassValue<>() {
        @Override
        protected Map<String, Function<Object, Object>> computeValue(Class<?> type) {
            Map<String, Function<Object, Object>> out = new LinkedHashMap<>();
            for (RecordComponent c : type.getRecordComponents()) {
                JsonProperty p = c.getAnnotation(JsonProperty.class);
                String name = p != null && !p.value().isEmpty() ? p.value() : ContractNaming.snake(c.getName());
                out.put(name, accessor(type, c));
            }
            return java.util.Collections.unmodifiableMap(out);
        }
    };

    /** The accessor of a component as a function (answer records are package-private in their feature). */
    @SuppressWarnings("unchecked")
    private static Function<Object, Object> accessor(Class<?> type, RecordComponent c) {
        try {
            MethodHandles.Lookup lookup = MethodHandles.privateLookupIn(type, MethodHandles.lookup());
            MethodHandle getter = lookup.unreflect(c.getAccessor());
            Class<?> result = getter.type().returnType();
            MethodType erased = MethodType.methodType(Object.class, Object.class);
            MethodType exact = MethodType.methodType(result.isPrimitive() ? MethodType.methodType(result).wrap()
                    .returnType() : result, type);
            return (Function<Object, Object>) LambdaMetafactory.metafactory(lookup, "apply",
                    MethodType.methodType(Function.class), erased, getter, exact).getTarget().invokeExact();
        } catch (Throwable e) {
            throw new IllegalStateException("cannot read " + type.getName() + "." + c.getName(), e);
        }
    }

    private RecordMembers() {}

    /** The members of a record type by JSON name, in declaration order. */
    public static Map<String, Function<Object, Object>> of(Class<?> recordType) {
        return MEMBERS.get(recordType);
    }

    /** The value of one member of a record; null if the record has no such member. */
    public static Object get(Object record, String jsonName) {
        Function<Object, Object> accessor = MEMBERS.get(record.getClass()).get(jsonName);
        return accessor == null ? null : accessor.apply(record);
    }
}
