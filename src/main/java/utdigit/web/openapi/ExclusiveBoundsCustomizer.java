package utdigit.web.openapi;

import io.swagger.v3.oas.models.OpenAPI;
import io.swagger.v3.oas.models.media.Schema;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import java.lang.reflect.RecordComponent;
import java.math.BigDecimal;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.springdoc.core.customizers.OpenApiCustomizer;
import org.springframework.stereotype.Component;
import utdigit.web.pipeline.Calculation;
import utdigit.web.json.PropertyPointers;

/**
 * Writes exclusive Bean Validation bounds ({@code @DecimalMin(value = "0", inclusive = false)}) of
 * every request record as OpenAPI 3.1 {@code exclusiveMinimum} / {@code exclusiveMaximum} numbers,
 * so the document states the same range the service enforces ("> 0", not ">= 0"); and marks the
 * results that can be null as such.
 */
@Component
class ExclusiveBoundsCustomizer implements OpenApiCustomizer {
    private final List<Calculation<?, ?>> calculations;

    ExclusiveBoundsCustomizer(List<Calculation<?, ?>> calculations) {
        this.calculations = calculations;
    }

    @Override
    public void customise(OpenAPI openApi) {
        if (openApi.getComponents() == null || openApi.getComponents().getSchemas() == null) {
            return;
        }
        Map<String, Schema> schemas = openApi.getComponents().getSchemas();
        Set<Class<?>> seen = new HashSet<>();
        for (Calculation<?, ?> c : calculations) {
            apply(c.requestType(), schemas, seen);
        }
        // the request records (also echoed as an answer's inputs) are never marked nullable
        Set<Class<?>> seenAnswers = new HashSet<>(seen);
        for (Calculation<?, ?> c : calculations) {
            for (var m : c.getClass().getMethods()) {
                if (m.getName().equals("answer") && m.getParameterCount() == 1 && m.getReturnType().isRecord()) {
                    nullableResults(m.getReturnType(), schemas, seenAnswers);
                }
            }
        }
    }

    /**
     * A result can be written as null: an {@code Optional} when the value cannot exist, and any
     * number of an answer that has no finite value with these inputs (the runner replaces it by
     * null with a RESULT_NOT_REPRESENTABLE warning). Their schema type is [number, null] (the
     * annotation's {@code types} is not carried over by the generator).
     */
    @SuppressWarnings({"rawtypes", "unchecked"})
    private static void nullableResults(Class<?> type, Map<String, Schema> schemas, Set<Class<?>> seen) {
        if (!type.isRecord() || !seen.add(type)) {
            return;
        }
        io.swagger.v3.oas.annotations.media.Schema doc = type.getAnnotation(io.swagger.v3.oas.annotations.media.Schema.class);
        Schema schema = schemas.get(doc != null && !doc.name().isEmpty() ? doc.name() : type.getSimpleName());
        for (RecordComponent rc : type.getRecordComponents()) {
            if (rc.getType().isRecord()) {
                nullableResults(rc.getType(), schemas, seen);
            }
            if (rc.getGenericType() instanceof java.lang.reflect.ParameterizedType list) { // List<FindingView>
                for (java.lang.reflect.Type argument : list.getActualTypeArguments()) {
                    if (argument instanceof Class<?> element && element.isRecord()) {
                        nullableResults(element, schemas, seen);
                    }
                }
            }
            if (schema != null && schema.getProperties() != null && rc.getType() == Map.class
                    && schema.getProperties().get(PropertyPointers.jsonName(rc.getName(), rc)) instanceof Schema map
                    && map.getAdditionalProperties() instanceof Schema values) { // Map<String, Double>: values may be null
                ContractSchemas.nullable(values);
            }
            boolean nullable = rc.getType() == java.util.Optional.class || rc.getType() == Double.class
                    || rc.getType() == double.class;
            if (schema == null || schema.getProperties() == null || !nullable) {
                continue;
            }
            Schema property = (Schema) schema.getProperties().get(PropertyPointers.jsonName(rc.getName(), rc));
            if (property != null) {
                java.util.Set<String> types = new java.util.LinkedHashSet<>();
                if (property.getTypes() != null) {
                    types.addAll(property.getTypes());
                } else if (property.getType() != null) {
                    types.add(property.getType());
                } else {
                    types.add("number");
                }
                types.add("null");
                property.setTypes(types);
            }
        }
    }

    @SuppressWarnings({"rawtypes", "unchecked"})
    private static void apply(Class<?> type, Map<String, Schema> schemas, Set<Class<?>> seen) {
        if (!type.isRecord() || !seen.add(type)) {
            return;
        }
        io.swagger.v3.oas.annotations.media.Schema doc = type.getAnnotation(io.swagger.v3.oas.annotations.media.Schema.class);
        String name = doc != null && !doc.name().isEmpty() ? doc.name() : type.getSimpleName();
        Schema schema = schemas.get(name);
        for (RecordComponent rc : type.getRecordComponents()) {
            if (rc.getType().isRecord()) {
                apply(rc.getType(), schemas, seen);
                continue;
            }
            if (schema == null || schema.getProperties() == null) {
                continue;
            }
            Schema property = (Schema) schema.getProperties().get(PropertyPointers.jsonName(rc.getName(), rc));
            if (property == null) {
                continue;
            }
            DecimalMin min = rc.getAccessor().getAnnotation(DecimalMin.class);
            if (min == null) {
                min = field(type, rc, DecimalMin.class);
            }
            if (min == null) {
                min = composed(rc, DecimalMin.class);
            }
            DecimalMax max = rc.getAccessor().getAnnotation(DecimalMax.class);
            if (max == null) {
                max = field(type, rc, DecimalMax.class);
            }
            if (max == null) {
                max = composed(rc, DecimalMax.class);
            }
            if (min != null && !min.inclusive()) {
                property.setMinimum(null);
                property.setExclusiveMinimumValue(new BigDecimal(min.value()));
            }
            if (max != null && !max.inclusive()) {
                property.setMaximum(null);
                property.setExclusiveMaximumValue(new BigDecimal(max.value()));
            }
        }
    }

    /** A bound of a composed constraint on the component (the velocity fields' annotations of VelocityFields). */
    private static <A extends java.lang.annotation.Annotation> A composed(RecordComponent rc, Class<A> a) {
        for (var c : rc.getAccessor().getAnnotations()) {
            A bound = c.annotationType().getAnnotation(a);
            if (bound != null) {
                return bound;
            }
        }
        return null;
    }

    private static <A extends java.lang.annotation.Annotation> A field(Class<?> type, RecordComponent rc, Class<A> a) {
        try {
            return type.getDeclaredField(rc.getName()).getAnnotation(a);
        } catch (NoSuchFieldException e) {
            return null;
        }
    }
}
