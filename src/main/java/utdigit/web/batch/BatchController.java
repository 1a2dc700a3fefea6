package utdigit.web.batch;

import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.Parameter;
import io.swagger.v3.oas.annotations.media.Content;
import io.swagger.v3.oas.annotations.media.Schema;
import io.swagger.v3.oas.annotations.responses.ApiResponse;
import io.swagger.v3.oas.annotations.tags.Tag;
import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;
import java.io.IOException;
import java.io.OutputStream;
import java.util.List;
import org.springframework.boot.context.properties.EnableConfigurationProperties;
import org.springframework.http.HttpHeaders;
import org.springframework.http.MediaType;
import org.springframework.web.HttpMediaTypeNotAcceptableException;
import org.springframework.web.HttpMediaTypeNotSupportedException;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RestController;
import utdigit.web.common.InputProblem;
import utdigit.web.common.PayloadTooLargeProblem;

@RestController
@EnableConfigurationProperties(BatchLimits.class)
@Tag(name = "Batches", description = "Bulk recalculation: one answer row per input row, streamed in order")
class BatchController {
    static final String NDJSON = "application/x-ndjson";
    private static final List<MediaType> ACCEPTED_BODIES = List.of(MediaType.APPLICATION_JSON,
            MediaType.parseMediaType(NDJSON), MediaType.parseMediaType("text/csv"));

    private final BatchProcessor processor;

    BatchController(BatchProcessor processor) {
        this.processor = processor;
    }

    @PostMapping(path = "/api/{calculation:pulse-parameters|sampling-assessments|quantization-assessments"
            + "|time-of-flight-resolutions|thickness-resolutions|acquisition-budgets|technique-sheet-validations"
            + "|waveform-analyses|scan-coverages|array-apertures|tofd-setups|dac-quantizations}/batch")
    @Operation(summary = "Recalculate many requests of one calculation",
            description = """
                    The body is a JSON array of request objects (application/json), one object per line \
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
                    INVALID row saying where the body broke (NDJSON and CSV rows are independent).""")
    @ApiResponse(responseCode = "200", description = "The answer rows, streamed",
            content = {@Content(mediaType = NDJSON, schema = @Schema(implementation = BatchRowDoc.class)),
                    @Content(mediaType = "text/csv", schema = @Schema(type = "string")),
                    @Content(mediaType = "application/json",
                            array = @io.swagger.v3.oas.annotations.media.ArraySchema(schema = @Schema(implementation = BatchRowDoc.class)))})
    void batch(@Parameter(description = "The calculation, as in its single endpoint's path")
               @PathVariable String calculation, HttpServletRequest request, HttpServletResponse response)
            throws IOException, HttpMediaTypeNotSupportedException, HttpMediaTypeNotAcceptableException {
        BatchProcessor.Format in = bodyFormat(request.getContentType());
        BatchProcessor.Format out = answerFormat(request.getHeader(HttpHeaders.ACCEPT));
        long length = request.getContentLengthLong();
        if (length > processor.limits().maxBodyBytes()) {
            throw new PayloadTooLargeProblem("the body (" + length + " bytes) is over the batch limit of "
                    + processor.limits().maxBodyBytes() + " bytes; split the batch");
        }
        RowSource rows;
        try {
            rows = processor.open(calculation, in, request.getInputStream());
        } catch (BatchBodyException e) {
            throw InputProblem.invalid(e.pointer(), e.getMessage());
        } catch (CountingInputStream.LimitExceeded e) {
            throw new PayloadTooLargeProblem("the body is over the batch limit of "
                    + processor.limits().maxBodyBytes() + " bytes before its first row; split the batch");
        }
        response.setStatus(200);
        response.setContentType(out.mediaType + (out == BatchProcessor.Format.CSV ? ";charset=UTF-8" : ""));
        response.setHeader(HttpHeaders.CACHE_CONTROL, "no-store");
        OutputStream body = BatchProcessor.buffered(response.getOutputStream());
        RowSink sink = processor.sink(calculation, out, body);
        processor.process(calculation, rows, sink, body);
        body.flush();
    }

    private static BatchProcessor.Format bodyFormat(String contentType) throws HttpMediaTypeNotSupportedException {
        if (contentType != null) {
            MediaType type;
            try {
                type = MediaType.parseMediaType(contentType);
            } catch (RuntimeException e) {
                throw new HttpMediaTypeNotSupportedException((MediaType) null, ACCEPTED_BODIES);
            }
            for (BatchProcessor.Format f : BatchProcessor.Format.values()) {
                if (MediaType.parseMediaType(f.mediaType).equalsTypeAndSubtype(type)) {
                    return f;
                }
            }
        }
        throw new HttpMediaTypeNotSupportedException(contentType == null ? null : MediaType.parseMediaType(contentType),
                ACCEPTED_BODIES);
    }

    private static BatchProcessor.Format answerFormat(String accept) throws HttpMediaTypeNotAcceptableException {
        if (accept == null || accept.isBlank()) {
            return BatchProcessor.Format.NDJSON;
        }
        List<MediaType> wanted;
        try {
            wanted = MediaType.parseMediaTypes(accept);
        } catch (RuntimeException e) {
            throw new HttpMediaTypeNotAcceptableException(ACCEPTED_BODIES);
        }
        wanted = new java.util.ArrayList<>(wanted);
        wanted.sort(java.util.Comparator.comparingDouble(MediaType::getQualityValue).reversed());
        for (MediaType w : wanted) {
            if (w.getQualityValue() == 0) {
                continue;
            }
            if (w.isWildcardType()) {
                return BatchProcessor.Format.NDJSON;
            }
            for (BatchProcessor.Format f : new BatchProcessor.Format[] {BatchProcessor.Format.NDJSON,
                    BatchProcessor.Format.CSV, BatchProcessor.Format.JSON}) {
                if (w.includes(MediaType.parseMediaType(f.mediaType))) {
                    return f;
                }
            }
        }
        throw new HttpMediaTypeNotAcceptableException(ACCEPTED_BODIES);
    }

    /** The shape of one answer row, for the OpenAPI document. */
    @Schema(name = "BatchRow", description = "One answer row of a batch")
    record BatchRowDoc(
            @Schema(description = "1-based number of the input row", format = "int64") long row,
            @Schema(description = "sheet_id of the input row, when present") String id,
            @Schema(description = "OK, INVALID or LIMIT_REACHED") String status,
            @Schema(description = "The single endpoint's answer for the row (status OK)", type = "object") Object result,
            @Schema(description = "The row's problem (status INVALID or LIMIT_REACHED)",
                    ref = "#/components/schemas/Problem") Object problem,
            @Schema(description = "LIMIT_REACHED only: the first row not processed; resume from it", format = "int64")
            Long firstUnprocessedRow) {}
}
