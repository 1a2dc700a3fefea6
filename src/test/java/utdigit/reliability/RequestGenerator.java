package utdigit.reliability;

import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotNull;
import java.lang.reflect.Field;
import java.lang.reflect.RecordComponent;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import utdigit.core.materials.MaterialCatalog;

/**
 * Random request records inside the contract's single-field ranges, read from the records' own
 * Bean Validation annotations: required fields always given, optional ones now and then, boundary
 * values one time in ten, at most one form of each mirrored quantity (x_mm or x_in; one velocity
 * source). Seeded, so every run draws the same requests.
 */
final class RequestGenerator {
    private final SplittableRandom random;

    RequestGenerator(long seed) {
        this.random = new SplittableRandom(seed);
    }

    <Q> Q next(Class<Q> type) {
        return type.cast(record(type));
    }

    /**
     * A variation of a request the endpoint accepts: each given field is kept or redrawn inside its
     * range; fields not given stay absent, so the request keeps its shape (technique, mirrors).
     */
    <Q> Q vary(Q base) {
        @SuppressWarnings("unchecked")
        Class<Q> type = (Class<Q>) base.getClass();
        RecordComponent[] components = type.getRecordComponents();
        Object[] values = new Object[components.length];
        Class<?>[] types = new Class<?>[components.length];
        try {
            for (int i = 0; i < components.length; i++) {
                RecordComponent c = components[i];
                types[i] = c.getType();
                var accessor = c.getAccessor();
                accessor.setAccessible(true);
                Object v = accessor.invoke(base);
                boolean redraw = v != null && !(v instanceof String) && random.nextBoolean();
                values[i] = redraw ? (c.getType().isRecord() ? vary(v) : value(c, field(type, c.getName()))) : v;
            }
            var constructor = type.getDeclaredConstructor(types);
            constructor.setAccessible(true);
            return constructor.newInstance(values);
        } catch (ReflectiveOperationException e) {
            throw new IllegalStateException("cannot vary " + type.getSimpleName(), e);
        }
    }

    private Object record(Class<?> type) {
        RecordComponent[] components = type.getRecordComponents();
        Map<String, String> chosenOfGroup = new HashMap<>();
        for (RecordComponent c : components) {
            String group = group(c.getName(), components);
            if (group != null && !chosenOfGroup.containsKey(group)) {
                List<String> members = new ArrayList<>();
                for (RecordComponent m : components) {
                    if (group.equals(group(m.getName(), components))) {
                        members.add(m.getName());
                    }
                }
                int pick = random.nextInt(members.size() + 1);
                chosenOfGroup.put(group, pick == members.size() ? "" : members.get(pick));
            }
        }
        Object[] values = new Object[components.length];
        Class<?>[] types = new Class<?>[components.length];
        for (int i = 0; i < components.length; i++) {
            RecordComponent c = components[i];
            types[i] = c.getType();
            Field f = field(type, c.getName());
            String group = group(c.getName(), components);
            boolean required = f.isAnnotationPresent(NotNull.class);
            boolean give = group != null ? c.getName().equals(chosenOfGroup.get(group)) : required || random.nextInt(10) < 6;
            values[i] = give || c.getType().isPrimitive() ? value(c, f) : null;
        }
        try {
            var constructor = type.getDeclaredConstructor(types);
            constructor.setAccessible(true);
            return constructor.newInstance(values);
        } catch (ReflectiveOperationException e) {
            throw new IllegalStateException("cannot build " + type.getSimpleName(), e);
        }
    }

    /** Mirrored quantities: "depthMm"/"depthIn" share the group "depth"; the velocity sources share one. */
    private static String group(String name, RecordComponent[] all) {
        if (name.equals("velocityMPerS") || name.equals("velocityInPerUs") || name.equals("material")) {
            return "velocity";
        }
        for (String[] pair : new String[][] {{"Mm", "In"}, {"In", "Mm"}}) {
            if (name.endsWith(pair[0])) {
                String twin = name.substring(0, name.length() - 2) + pair[1];
                for (RecordComponent c : all) {
                    if (c.getName().equals(twin)) {
                        return name.substring(0, name.length() - 2);
                    }
                }
            }
        }
        return null;
    }

    private Object value(RecordComponent c, Field f) {
        Class<?> t = c.getType();
        if (t == Double.class || t == double.class) {
            return decimal(f);
        }
        if (t == Integer.class || t == int.class) {
            return (int) whole(f, 1, 64);
        }
        if (t == Long.class || t == long.class) {
            return whole(f, 1, 64);
        }
        if (t.isEnum()) {
            Object[] constants = t.getEnumConstants();
            return constants[random.nextInt(constants.length)];
        }
        if (t == String.class) {
            if (c.getName().equals("material")) {
                List<String> ids = MaterialCatalog.ids();
                return ids.get(random.nextInt(ids.size()));
            }
            return null;
        }
        if (t.isRecord()) {
            return record(t);
        }
        if (t == Boolean.class || t == boolean.class) {
            return random.nextBoolean();
        }
        return null;
    }

    /** A bound on the field, or on a composed constraint of it (the velocity fields' annotations). */
    private static <A extends java.lang.annotation.Annotation> A bound(Field f, Class<A> type) {
        A direct = f.getAnnotation(type);
        if (direct != null) {
            return direct;
        }
        for (java.lang.annotation.Annotation a : f.getAnnotations()) {
            A composed = a.annotationType().getAnnotation(type);
            if (composed != null) {
                return composed;
            }
        }
        return null;
    }

    private double decimal(Field f) {
        DecimalMin min = bound(f, DecimalMin.class);
        DecimalMax max = bound(f, DecimalMax.class);
        double lo = min == null ? 1e-3 : Double.parseDouble(min.value());
        double hi = max == null ? 1e4 : Double.parseDouble(max.value());
        boolean loIn = min == null || min.inclusive();
        boolean hiIn = max == null || max.inclusive();
        int edge = random.nextInt(20);
        if (edge == 0) {
            return loIn ? lo : Math.nextUp(lo);
        }
        if (edge == 1) {
            return hiIn ? hi : Math.nextDown(hi);
        }
        double v;
        if (lo > 0 && hi / lo > 1e3) {
            // spread over the decades of a wide positive range
            v = StrictMath.exp(StrictMath.log(lo) + random.nextDouble() * (StrictMath.log(hi) - StrictMath.log(lo)));
        } else {
            v = lo + random.nextDouble() * (hi - lo);
        }
        if (!loIn && v <= lo) {
            v = Math.nextUp(lo);
        }
        if (!hiIn && v >= hi) {
            v = Math.nextDown(hi);
        }
        return Math.max(lo, Math.min(hi, v));
    }

    private long whole(Field f, long defaultMin, long defaultMax) {
        Min min = f.getAnnotation(Min.class);
        Max max = f.getAnnotation(Max.class);
        long lo = min == null ? defaultMin : min.value();
        long hi = max == null ? defaultMax : max.value();
        int edge = random.nextInt(10);
        if (edge == 0) {
            return lo;
        }
        if (edge == 1) {
            return hi;
        }
        if (hi - lo > 1000 && random.nextBoolean()) {
            return lo + random.nextLong(Math.min(hi - lo, 64) + 1);
        }
        return lo + random.nextLong(hi - lo + 1);
    }

    private static Field field(Class<?> type, String name) {
        try {
            return type.getDeclaredField(name);
        } catch (NoSuchFieldException e) {
            throw new IllegalStateException(e);
        }
    }
}
