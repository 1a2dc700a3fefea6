package utdigit.web.openapi;

import io.swagger.v3.oas.models.OpenAPI;
import io.swagger.v3.oas.models.Operation;
import io.swagger.v3.oas.models.PathItem;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.springdoc.core.customizers.GlobalOpenApiCustomizer;
import org.springframework.stereotype.Component;

/**
 * Names every operation of the OpenAPI document after its method and path, e.g. {@code
 * postPulseParameters}, {@code getMaterialsById}, {@code postPulseParametersBatch}, instead of the
 * controller method's name. Those repeat across features (two {@code assess}, two {@code resolve},
 * two {@code list}), and the suffixes that make them unique ({@code assess_1}) move whenever a
 * feature is added, renaming methods of every generated client. A name from the path is unique (one
 * operation per method and path) and changes only with the path.
 */
@Component
class StableOperationIds implements GlobalOpenApiCustomizer {

    @Override
    public void customise(OpenAPI openApi) {
        if (openApi.getPaths() == null) {
            return;
        }
        for (Map.Entry<String, PathItem> path : openApi.getPaths().entrySet()) {
            for (Map.Entry<PathItem.HttpMethod, Operation> op : path.getValue().readOperationsMap().entrySet()) {
                op.getValue().setOperationId(operationId(op.getKey().name(), path.getKey()));
            }
        }
    }

    /** {@code POST /api/{calculation}/batch} -> {@code postBatchByCalculation}. */
    static String operationId(String method, String path) {
        StringBuilder id = new StringBuilder(method.toLowerCase(Locale.ROOT));
        List<String> parameters = new ArrayList<>();
        for (String segment : path.split("/")) {
            if (segment.isEmpty() || segment.equals("api")) {
                continue;
            }
            if (segment.startsWith("{")) {
                parameters.add(segment.substring(1, segment.contains(":") ? segment.indexOf(':') : segment.length() - 1));
            } else {
                id.append(camel(segment));
            }
        }
        for (int i = 0; i < parameters.size(); i++) {
            id.append(i == 0 ? "By" : "And").append(camel(parameters.get(i)));
        }
        return id.toString();
    }

    private static String camel(String words) {
        StringBuilder out = new StringBuilder();
        for (String w : words.split("[-_]")) {
            if (!w.isEmpty()) {
                out.append(Character.toUpperCase(w.charAt(0))).append(w.substring(1));
            }
        }
        return out.toString();
    }
}
