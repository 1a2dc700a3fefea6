package utdigit.web.openapi;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import io.swagger.v3.core.util.Json31;
import io.swagger.v3.oas.models.OpenAPI;
import io.swagger.v3.oas.models.Operation;
import io.swagger.v3.oas.models.PathItem;
import io.swagger.v3.oas.models.media.MediaType;
import java.io.IOException;
import java.io.InputStream;
import java.util.LinkedHashMap;
import java.util.Map;
import org.springdoc.core.customizers.OpenApiCustomizer;
import org.springframework.core.Ordered;
import org.springframework.core.annotation.Order;
import org.springframework.stereotype.Component;

/**
 * Gives each POST operation the example request of {@code api-examples/<name>.json} (copied into
 * the jar by the build; the same files the example tests run), so the browsable UI's "try it"
 * sends a valid request instead of one built from every property's example (which would hold both
 * the millimetre and the inch form of a length). A batch gets the same request as its one row, in
 * each of its body formats.
 */
@Component
@Order(Ordered.HIGHEST_PRECEDENCE + 1)
class RequestExamples implements OpenApiCustomizer {
    private static final String BATCH = "/batch";

    @Override
    public void customise(OpenAPI openApi) {
        if (openApi.getPaths() == null) {
            return;
        }
        for (Map.Entry<String, PathItem> path : openApi.getPaths().entrySet()) {
            Operation post = path.getValue().getPost();
            if (post == null || post.getRequestBody() == null || post.getRequestBody().getContent() == null
                    || !path.getKey().startsWith("/api/")) {
                continue;
            }
            boolean batch = path.getKey().endsWith(BATCH);
            String name = path.getKey().substring("/api/".length(),
                    path.getKey().length() - (batch ? BATCH.length() : 0));
            JsonNode example = read(name);
            if (example == null || !example.isObject()) {
                continue;
            }
            for (Map.Entry<String, MediaType> media : post.getRequestBody().getContent().entrySet()) {
                Object value = switch (media.getKey()) {
                    case "application/json" -> batch ? rows(example) : example;
                    case "application/x-ndjson" -> example;
                    case "text/csv" -> csv(example);
                    default -> null;
                };
                if (value != null && media.getValue().getExample() == null) {
                    media.getValue().setExample(value);
                }
            }
        }
    }

    private static ArrayNode rows(JsonNode example) {
        ArrayNode rows = Json31.mapper().createArrayNode();
        rows.add(example);
        return rows;
    }

    private static JsonNode read(String name) {
        if (!name.matches("[a-z0-9-]+")) {
            return null;
        }
        try (InputStream in = RequestExamples.class.getResourceAsStream("/api-examples/" + name + ".json")) {
            return in == null ? null : Json31.mapper().readTree(in);
        } catch (IOException e) {
            throw new IllegalStateException("api-examples/" + name + ".json in the jar is not JSON", e);
        }
    }

    /** The example as CSV: a header row of dotted field names, then its one row; null if it holds an array. */
    static String csv(JsonNode example) {
        Map<String, String> cells = new LinkedHashMap<>();
        if (!flatten("", example, cells)) {
            return null;
        }
        return String.join(",", cells.keySet()) + "\n"
                + String.join(",", cells.values().stream().map(RequestExamples::cell).toList()) + "\n";
    }

    private static boolean flatten(String prefix, JsonNode node, Map<String, String> cells) {
        for (Map.Entry<String, JsonNode> e : node.properties()) {
            String name = prefix.isEmpty() ? e.getKey() : prefix + "." + e.getKey();
            JsonNode value = e.getValue();
            if (value.isObject()) {
                if (!flatten(name, value, cells)) {
                    return false;
                }
            } else if (value.isContainerNode()) {
                return false;
            } else if (!value.isNull()) {
                cells.put(name, value.asText());
            }
        }
        return true;
    }

    private static String cell(String value) {
        return value.contains(",") || value.contains("\"") || value.contains("\n")
                ? "\"" + value.replace("\"", "\"\"") + "\"" : value;
    }
}
