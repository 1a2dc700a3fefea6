package utdigit.web.batch;

import io.swagger.v3.oas.annotations.Operation;
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
import utdigit.web.problem.InputProblem;
import utdigit.web.problem.PayloadTooLargeProblem;

@RestController
@EnableConfigurationProperties(BatchLimits.class)
class BatchController {
    static final String NDJSON = "application/x-ndjson";
    private static final List<MediaType> ACCEPTED_BODIES = List.of(MediaType.APPLICATION_JSON,
            MediaType.parseMediaType(NDJSON), MediaType.parseMediaType("text/csv"));

    private final BatchProcessor processor;

    BatchController(BatchProcessor processor) {
        this.processor = processor;
    }

    /**
     * One handler for every calculation's batch: an unknown name is a 404 problem. The document
     * shows one operation per calculation instead ({@link BatchOperations}), each with its typed rows.
     */
    @PostMapping(path = "/api/{calculation}/batch")
    @Operation(hidden = true)
    void batch(@PathVariable String calculation, HttpServletRequest request, HttpServletResponse response)
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
}
