package utdigit.web.openapi;

import io.swagger.v3.oas.models.OpenAPI;
import io.swagger.v3.oas.models.Operation;
import io.swagger.v3.oas.models.PathItem;
import io.swagger.v3.oas.models.media.ArraySchema;
import io.swagger.v3.oas.models.media.Content;
import io.swagger.v3.oas.models.media.IntegerSchema;
import io.swagger.v3.oas.models.media.MediaType;
import io.swagger.v3.oas.models.media.ObjectSchema;
import io.swagger.v3.oas.models.media.Schema;
import io.swagger.v3.oas.models.media.StringSchema;
import io.swagger.v3.oas.models.responses.ApiResponse;
import java.util.LinkedHashMap;
import java.util.Map;
import org.springdoc.core.customizers.OpenApiCustomizer;
import org.springframework.stereotype.Component;
import utdigit.web.problem.ProblemType;

/**
 * Completes the OpenAPI document with what annotations cannot say once for all operations: the
 * Problem schema (RFC 9457, with errors[{pointer, detail}]) and the problem answers of every
 * operation, and the Stamp schema on every calculation answer (its schema has "references").
 */
@Component
public class OpenApiProblems implements OpenApiCustomizer {
    static final String PROBLEM_JSON = "application/problem+json";

    @Override
    public void customise(OpenAPI openApi) {
        var components = openApi.getComponents();
        components.addSchemas("Problem", problemSchema());
        components.addSchemas("Stamp", stampSchema());
        if (components.getSchemas() != null) {
            for (Map.Entry<String, Schema> e : components.getSchemas().entrySet()) {
                Schema<?> s = e.getValue();
                if (s.getProperties() != null && s.getProperties().containsKey("references")
                        && s.getProperties().containsKey("warnings") && !s.getProperties().containsKey("stamp")) {
                    s.addProperty("stamp", new Schema<>().$ref("#/components/schemas/Stamp"));
                }
            }
        }
        if (openApi.getPaths() == null) {
            return;
        }
        for (Map.Entry<String, PathItem> path : openApi.getPaths().entrySet()) {
            for (Map.Entry<PathItem.HttpMethod, Operation> op : path.getValue().readOperationsMap().entrySet()) {
                Map<String, String> problems = new LinkedHashMap<>();
                if (op.getKey() == PathItem.HttpMethod.POST) {
                    problems.put("400", "Invalid, inapplicable or malformed input: errors[] points at each field "
                            + "(types /problems/invalid-input, /problems/inapplicable-input, /problems/malformed-body)");
                    problems.put("413", "Request body larger than the service accepts (/problems/payload-too-large)");
                    problems.put("415", "Content-Type not accepted (/problems/unsupported-media-type)");
                    problems.put("422", "Inputs valid one by one but impossible together; detail says why "
                            + "(/problems/impossible-combination)");
                } else if (path.getKey().contains("{")) {
                    problems.put("400", "Invalid query parameter (/problems/invalid-input)");
                    problems.put("404", "Unknown id (/problems/not-found)");
                }
                problems.put("405", "Method not allowed on this path (/problems/method-not-allowed)");
                problems.put("406", "Accept header asks for a format not produced (/problems/not-acceptable)");
                problems.put("500", "Unexpected failure, logged; no detail is disclosed (/problems/internal-error)");
                for (Map.Entry<String, String> p : problems.entrySet()) {
                    if (op.getValue().getResponses().get(p.getKey()) == null) {
                        op.getValue().getResponses().addApiResponse(p.getKey(), new ApiResponse()
                                .description(p.getValue())
                                .content(problemContent(p.getKey())));
                    }
                }
            }
        }
    }

    /**
     * The content of a problem answer with this status: the Problem schema, and an example that says
     * this status, its type and its title (the first problem type of that status).
     */
    public static Content problemContent(String status) {
        MediaType media = new MediaType().schema(new Schema<>().$ref("#/components/schemas/Problem"));
        for (ProblemType type : ProblemType.values()) {
            if (String.valueOf(type.status().value()).equals(status)) {
                Map<String, Object> example = new LinkedHashMap<>();
                example.put("type", type.type().toString());
                example.put("title", type.title());
                example.put("status", type.status().value());
                media.example(example);
                break;
            }
        }
        return new Content().addMediaType(PROBLEM_JSON, media);
    }

    private static Schema<?> problemSchema() {
        ObjectSchema error = new ObjectSchema();
        error.addProperty("pointer", new StringSchema().description(
                "JSON Pointer (RFC 6901) to the field, \"\" for the whole body; for CSV batch rows the column"));
        error.addProperty("detail", new StringSchema().description("What is wrong with that field"));
        ObjectSchema problem = new ObjectSchema();
        problem.description("RFC 9457 problem details. type is stable per problem kind and title fixed per type.");
        problem.addProperty("type", new StringSchema().description("Relative URI of the problem kind, e.g. "
                + "/problems/invalid-input").example("/problems/invalid-input"));
        problem.addProperty("title", new StringSchema().description("Fixed title of the type").example("Invalid input"));
        problem.addProperty("status", new IntegerSchema().format("int32").description("HTTP status").example(400));
        problem.addProperty("detail", new StringSchema().description("What was wrong, in the caller's terms"));
        problem.addProperty("instance", new StringSchema().description("The request path"));
        problem.addProperty("errors", new ArraySchema().items(error).description("Validation errors, one per field"));
        return problem;
    }

    private static Schema<?> stampSchema() {
        ObjectSchema stamp = new ObjectSchema();
        stamp.description("Tamper-evident stamp. sha256 is over the RFC 8785 canonical JSON of the whole answer "
                + "with stamp reduced to {calculation, service_version}; signature is HMAC-SHA256 over the same "
                + "bytes with the operator's key (absent when none is configured). Check with POST "
                + "/api/stamp-verifications.");
        stamp.addProperty("calculation", new StringSchema().description("Endpoint path name").example("pulse-parameters"));
        stamp.addProperty("service_version", new StringSchema().description("Version of the service").example("0.1.0"));
        stamp.addProperty("sha256", new StringSchema().description("Lower-case hex SHA-256").pattern("^[0-9a-f]{64}$"));
        stamp.addProperty("signature", new StringSchema().description("Unpadded base64url HMAC-SHA256"));
        stamp.addProperty("key_id", new StringSchema().description("Name of the signing key"));
        return stamp;
    }
}
