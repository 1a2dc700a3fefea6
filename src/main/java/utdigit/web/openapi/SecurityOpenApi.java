package utdigit.web.openapi;

import io.swagger.v3.oas.models.OpenAPI;
import io.swagger.v3.oas.models.Operation;
import io.swagger.v3.oas.models.PathItem;
import io.swagger.v3.oas.models.responses.ApiResponse;
import io.swagger.v3.oas.models.security.SecurityRequirement;
import io.swagger.v3.oas.models.security.SecurityScheme;
import java.util.Map;
import org.springdoc.core.customizers.OpenApiCustomizer;
import org.springframework.beans.factory.ObjectProvider;
import org.springframework.security.oauth2.jwt.JwtDecoder;
import org.springframework.stereotype.Component;

/**
 * States in the OpenAPI document what the protections answer: 408 for a body that does not arrive
 * in time and, when authentication is on, the bearer scheme and the 401 of every /api operation.
 */
@Component
class SecurityOpenApi implements OpenApiCustomizer {
    private final boolean authenticated;

    SecurityOpenApi(ObjectProvider<JwtDecoder> decoders) {
        this.authenticated = decoders.getIfAvailable() != null;
    }

    @Override
    public void customise(OpenAPI openApi) {
        if (openApi.getPaths() == null) {
            return;
        }
        if (authenticated) {
            openApi.getComponents().addSecuritySchemes("bearer", new SecurityScheme()
                    .type(SecurityScheme.Type.HTTP).scheme("bearer").bearerFormat("JWT"));
        }
        for (Map.Entry<String, PathItem> path : openApi.getPaths().entrySet()) {
            for (Map.Entry<PathItem.HttpMethod, Operation> op : path.getValue().readOperationsMap().entrySet()) {
                boolean batch = path.getKey().endsWith("/batch");
                if (op.getKey() == PathItem.HttpMethod.POST && !batch) {
                    add(op.getValue(), "408", "The request body did not arrive within the read deadline "
                            + "(utdigit.http.body-read-timeout) (/problems/request-timeout)");
                }
                if (authenticated && path.getKey().startsWith("/api/")) {
                    op.getValue().addSecurityItem(new SecurityRequirement().addList("bearer"));
                    add(op.getValue(), "401", "Missing or rejected bearer token (/problems/unauthorized)");
                }
            }
        }
    }

    private static void add(Operation operation, String status, String description) {
        if (operation.getResponses().get(status) == null) {
            operation.getResponses().addApiResponse(status, new ApiResponse().description(description)
                    .content(utdigit.web.openapi.OpenApiProblems.problemContent(status)));
        }
    }
}
