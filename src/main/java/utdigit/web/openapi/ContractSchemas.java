package utdigit.web.openapi;

import com.fasterxml.jackson.annotation.JsonInclude;
import io.swagger.v3.oas.models.OpenAPI;
import io.swagger.v3.oas.models.media.Schema;
import java.lang.annotation.Annotation;
import java.util.Collection;
import java.util.LinkedHashSet;
import java.util.Map;
import java.util.Set;
import org.springdoc.core.customizers.OpenApiCustomizer;
import org.springframework.stereotype.Component;

/**
 * Makes every schema of the document say what its answers hold, so a strict client accepts every
 * answer: a property written even when null ({@code @JsonInclude(ALWAYS)}, e.g. a liquid's shear
 * velocity, a signature nobody can check) admits null (applied by the model resolver of
 * {@link OpenApiConfiguration}), and every schema with properties says {@code type: object}
 * (without it, any JSON value validates against it), while a JSON tree property admits any JSON
 * value ({@code {}}).
 */
@Component
class ContractSchemas implements OpenApiCustomizer {
    /** Marks a schema that admits any JSON value (a JSON tree property); removed from the document. */
    static final String ANY_JSON_VALUE = "x-any-json-value";

    /** A property written even when null ({@code @JsonInclude(ALWAYS)}). */
    static boolean writtenWhenNull(Annotation[] annotations) {
        if (annotations != null) {
            for (Annotation a : annotations) {
                if (a instanceof JsonInclude include && include.value() == JsonInclude.Include.ALWAYS) {
                    return true;
                }
            }
        }
        return false;
    }

    /** Adds null to the schema's types (OpenAPI 3.1: {@code type: [number, null]}). */
    @SuppressWarnings({"rawtypes", "unchecked"})
    static void nullable(Schema schema) {
        Set<String> types = new LinkedHashSet<>();
        if (schema.getTypes() != null) {
            types.addAll(schema.getTypes());
        } else if (schema.getType() != null) {
            types.add(schema.getType());
        }
        if (types.isEmpty()) {
            return; // no type: it admits null already
        }
        types.add("null");
        schema.setTypes(types);
    }

    @Override
    public void customise(OpenAPI openApi) {
        if (openApi.getComponents() != null && openApi.getComponents().getSchemas() != null) {
            for (Schema<?> s : openApi.getComponents().getSchemas().values()) {
                objectTypes(s);
            }
        }
        if (openApi.getPaths() != null) {
            openApi.getPaths().values().forEach(path -> path.readOperations().forEach(op -> {
                if (op.getRequestBody() != null && op.getRequestBody().getContent() != null) {
                    op.getRequestBody().getContent().values().forEach(m -> objectTypes(m.getSchema()));
                }
                if (op.getResponses() != null) {
                    op.getResponses().values().forEach(r -> {
                        if (r.getContent() != null) {
                            r.getContent().values().forEach(m -> objectTypes(m.getSchema()));
                        }
                    });
                }
            }));
        }
    }

    /** Every schema with properties, here or nested, says type object. */
    @SuppressWarnings({"rawtypes", "unchecked"})
    private static void objectTypes(Schema schema) {
        if (schema == null) {
            return;
        }
        if (schema.getExtensions() != null && schema.getExtensions().remove(ANY_JSON_VALUE) != null) {
            schema.setType(null);
            schema.setTypes(null); // any JSON value: {} in OpenAPI 3.1
            if (schema.getExtensions().isEmpty()) {
                schema.setExtensions(null);
            }
            return;
        }
        if (schema.getProperties() != null && !schema.getProperties().isEmpty()) {
            // the 3.1 writer writes types; a schema built for 3.0 has only type
            if (schema.getTypes() == null || !schema.getTypes().contains("object")) {
                Set<String> types = new LinkedHashSet<>();
                types.add("object");
                if (schema.getTypes() != null) {
                    types.addAll(schema.getTypes());
                }
                schema.setTypes(types);
                schema.setType("object");
            }
            for (Object p : ((Map) schema.getProperties()).values()) {
                objectTypes((Schema) p);
            }
        }
        objectTypes(schema.getItems());
        if (schema.getAdditionalProperties() instanceof Schema a) {
            objectTypes(a);
        }
        for (Collection<Schema> list : new Collection[] {schema.getAllOf(), schema.getAnyOf(), schema.getOneOf()}) {
            if (list != null) {
                list.forEach(ContractSchemas::objectTypes);
            }
        }
    }
}
