package utdigit.web.batch;

import io.swagger.v3.oas.models.OpenAPI;
import io.swagger.v3.oas.models.Operation;
import io.swagger.v3.oas.models.PathItem;
import io.swagger.v3.oas.models.media.Content;
import io.swagger.v3.oas.models.media.MediaType;
import io.swagger.v3.oas.models.media.Schema;
import io.swagger.v3.oas.models.parameters.RequestBody;
import io.swagger.v3.oas.models.responses.ApiResponse;
import io.swagger.v3.oas.models.responses.ApiResponses;
import io.swagger.v3.oas.models.tags.Tag;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import org.springdoc.core.customizers.OpenApiCustomizer;
import org.springframework.core.Ordered;
import org.springframework.core.annotation.Order;
import org.springframework.stereotype.Component;
import utdigit.web.pipeline.CalculationRunner;

/**
 * Documents each calculation's batch as its own operation, {@code POST /api/<name>/batch}, so a
 * generated client has a typed method for it: the body is an array (JSON), lines (NDJSON) or rows
 * (CSV) of the single endpoint's request schema, and each answer row's {@code result} is the single
 * endpoint's answer schema. Built from the registered calculations and the single endpoints' own
 * schemas in the document, so a calculation added later gets its batch operation without more code.
 * Runs first, so the problems, the operation ids and the examples are added to these operations too.
 */
@Component
@Order(Ordered.HIGHEST_PRECEDENCE)
class BatchOperations implements OpenApiCustomizer {
    static final String TAG = "Batches";
    private static final String CSV = "text/csv";
    private static final String JSON = "application/json";

    static final String DESCRIPTION = """
            The body is a JSON array of request objects (application/json), one request object per line \
            (application/x-ndjson), or CSV (text/csv: a header row of field names, dotted for nested sections \
            such as probe.frequency_mhz; UTF-8 with or without BOM; CRLF or LF; quoted fields; an empty \
            cell is an absent field). The answer is streamed in the Accept format (application/x-ndjson by \
            default, text/csv, or a JSON array): one row out per row in, in order, \
            {row (1-based), id (sheet_id when present), status OK or INVALID, result (the single \
            endpoint's answer) or problem}. A bad row is INVALID with its problem and never stops the batch. \
            A body malformed as a whole (not the format, unknown CSV columns, JSON that is not an array) is a \
            400 before any row. A Content-Length over utdigit.batch.max-body-bytes is a 413; a limit reached \
            mid-way ends the stream with one row of status LIMIT_REACHED whose first_unprocessed_row says \
            where to resume. In a JSON array a syntax error cannot be resynchronised: the stream ends with an \
            INVALID row saying where the body broke (NDJSON and CSV rows are independent).""";

    private final CalculationRunner runner;

    BatchOperations(CalculationRunner runner) {
        this.runner = runner;
    }

    @Override
    public void customise(OpenAPI openApi) {
        if (openApi.getPaths() == null || openApi.getComponents() == null) {
            return;
        }
        boolean any = false;
        for (String name : runner.names()) {
            PathItem single = openApi.getPaths().get("/api/" + name);
            if (single == null || single.getPost() == null) {
                continue;
            }
            Schema<?> request = json(single.getPost().getRequestBody() == null ? null
                    : single.getPost().getRequestBody().getContent());
            ApiResponse ok = single.getPost().getResponses() == null ? null : single.getPost().getResponses().get("200");
            Schema<?> answer = json(ok == null ? null : ok.getContent());
            if (request == null || request.get$ref() == null || answer == null || answer.get$ref() == null) {
                continue;
            }
            String answerName = answer.get$ref().substring(answer.get$ref().lastIndexOf('/') + 1);
            String rowName = answerName + "BatchRow";
            openApi.getComponents().addSchemas(rowName, row(answerName, answer));
            Schema<?> rowRef = new Schema<>().$ref("#/components/schemas/" + rowName);
            Operation operation = new Operation()
                    .tags(List.of(TAG))
                    .summary("Recalculate many " + name + " requests")
                    .description(DESCRIPTION)
                    .requestBody(new RequestBody().required(true)
                            .description("The rows: each is a request of POST /api/" + name)
                            .content(requestContent(name, request)))
                    .responses(new ApiResponses().addApiResponse("200", new ApiResponse()
                            .description("The answer rows, streamed in order, one per row in")
                            .content(new Content()
                                    .addMediaType(BatchController.NDJSON, new MediaType().schema(rowRef))
                                    .addMediaType(CSV, new MediaType().schema(string(
                                            "A header row, then one row per row in: row, id, status, the answer's "
                                                    + "fields (dotted for nested sections), the problem's fields")))
                                    .addMediaType(JSON, new MediaType().schema(array(rowRef))))));
            openApi.getPaths().addPathItem("/api/" + name + "/batch", new PathItem().post(operation));
            any = true;
        }
        if (any && (openApi.getTags() == null || openApi.getTags().stream().noneMatch(t -> TAG.equals(t.getName())))) {
            openApi.addTagsItem(new Tag().name(TAG)
                    .description("Bulk recalculation: one answer row per input row, streamed in order"));
        }
    }

    /** One answer row of this calculation's batch. */
    private static Schema<?> row(String answerName, Schema<?> answer) {
        Schema<Object> row = typed(new Schema<>(), "object");
        row.description("One answer row of a batch of " + answerName + " calculations");
        row.addProperty("row", typed(new Schema<>(), "integer").format("int64")
                .description("1-based number of the input row"));
        row.addProperty("id", string("sheet_id of the input row, when present"));
        Schema<Object> status = string("OK: result holds the answer; INVALID: problem says why; LIMIT_REACHED: "
                + "the batch stopped here (first_unprocessed_row)");
        status.setEnum(List.of("OK", "INVALID", "LIMIT_REACHED"));
        row.addProperty("status", status);
        row.addProperty("result", copy(answer).description("The single endpoint's answer for the row (status OK)"));
        row.addProperty("problem", new Schema<>().$ref("#/components/schemas/Problem")
                .description("The row's problem (status INVALID or LIMIT_REACHED)"));
        row.addProperty("first_unprocessed_row", typed(new Schema<>(), "integer").format("int64")
                .description("LIMIT_REACHED only: the first row not processed; resume from it"));
        row.setRequired(List.of("row", "status"));
        return row;
    }

    private static Schema<?> json(Content content) {
        if (content == null || content.get(JSON) == null) {
            return null;
        }
        return content.get(JSON).getSchema();
    }

    private static Schema<Object> copy(Schema<?> ref) {
        return new Schema<>().$ref(ref.get$ref());
    }

    private static Schema<Object> array(Schema<?> items) {
        Schema<Object> array = typed(new Schema<>(), "array");
        array.setItems(items);
        return array;
    }

    private static Schema<Object> string(String description) {
        return typed(new Schema<>(), "string").description(description);
    }

    /** The type for both writers: 3.0's {@code type} and 3.1's {@code types}. */
    private static Schema<Object> typed(Schema<Object> schema, String type) {
        schema.setType(type);
        Set<String> types = new LinkedHashSet<>();
        types.add(type);
        schema.setTypes(types);
        return schema;
    }

    /**
     * A batch's bodies: a JSON array, NDJSON, and CSV except for a calculation whose request holds a
     * list of numbers (a waveform's samples), which no CSV row can carry.
     */
    private static Content requestContent(String name, Schema<?> request) {
        Content content = new Content()
                .addMediaType(JSON, new MediaType().schema(array(copy(request))))
                .addMediaType(BatchController.NDJSON, new MediaType().schema(copy(request)
                        .description("One line per row, each a request object")));
        if (!name.equals("waveform-analyses")) {
            content.addMediaType(CSV, new MediaType().schema(string(
                    "A header row of field names (dotted for nested sections), then one row per request")));
        }
        return content;
    }
}
