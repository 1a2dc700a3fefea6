package utdigit.web.json;

import com.fasterxml.jackson.annotation.JsonProperty;
import jakarta.validation.ConstraintViolation;
import jakarta.validation.Path;
import java.lang.reflect.ParameterizedType;
import java.lang.reflect.RecordComponent;
import java.lang.reflect.Type;
import java.util.List;

/**
 * Turns a Bean Validation property path of a request record ("probe.frequencyMhz") into the JSON
 * Pointer of the field the caller sent ("/probe/frequency_mhz"), using each record component's
 * {@code @JsonProperty} name or the snake_case name the mapper derives.
 */
public final class PropertyPointers {
    private PropertyPointers() {}


    public static String of(ConstraintViolation<?> violation) {
        Class<?> type = violation.getRootBeanClass();
        StringBuilder pointer = new StringBuilder();
        for (Path.Node node : violation.getPropertyPath()) {
            if (node.getIndex() != null && pointer.length() > 0) {
                pointer.append('/').append(node.getIndex());
            }
            String name = node.getName();
            if (name == null) {
                continue;
            }
            RecordComponent component = component(type, name);
            String json = component == null ? jsonName(name, null) : jsonName(name, component);
            pointer.append('/').append(JsonPointers.escape(json));
            type = component == null ? Object.class : elementType(component);
        }
        return pointer.toString();
    }

    public static String jsonName(String javaName, RecordComponent component) {
        if (component != null) {
            JsonProperty explicit = component.getAnnotation(JsonProperty.class);
            if (explicit == null && component.getAccessor() != null) {
                explicit = component.getAccessor().getAnnotation(JsonProperty.class);
            }
            if (explicit != null && !explicit.value().isEmpty()) {
                return explicit.value();
            }
        }
        return ContractNaming.snake(javaName);
    }

    private static RecordComponent component(Class<?> type, String name) {
        if (type == null || !type.isRecord()) {
            return null;
        }
        for (RecordComponent c : type.getRecordComponents()) {
            if (c.getName().equals(name)) {
                return c;
            }
        }
        return null;
    }

    private static Class<?> elementType(RecordComponent c) {
        if (List.class.isAssignableFrom(c.getType())) {
            Type g = c.getGenericType();
            if (g instanceof ParameterizedType p && p.getActualTypeArguments()[0] instanceof Class<?> e) {
                return e;
            }
        }
        return c.getType();
    }
}
