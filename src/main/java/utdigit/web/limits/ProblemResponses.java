package utdigit.web.limits;

import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;
import java.io.IOException;
import java.util.List;
import org.springframework.http.HttpHeaders;
import org.springframework.http.MediaType;
import org.springframework.http.ProblemDetail;
import org.springframework.stereotype.Component;
import tools.jackson.databind.json.JsonMapper;
import utdigit.web.problem.Problems;
import utdigit.web.problem.ProblemType;

/**
 * Writes problem answers (RFC 9457) from servlet filters and security handlers, which run outside
 * the MVC advice: the same body shape, type, title and media type as {@code ProblemAdvice}.
 */
@Component
public class ProblemResponses {
    private final JsonMapper mapper;

    ProblemResponses(JsonMapper mapper) {
        this.mapper = mapper;
    }

    /** Writes the problem unless the answer has already started. */
    public void write(HttpServletRequest request, HttpServletResponse response, ProblemType type, String detail)
            throws IOException {
        if (response.isCommitted()) {
            return;
        }
        ProblemDetail body = Problems.body(type, detail, List.of(), instance(request));
        byte[] bytes = mapper.writeValueAsBytes(body);
        response.resetBuffer();
        response.setStatus(type.status().value());
        response.setContentType(MediaType.APPLICATION_PROBLEM_JSON_VALUE);
        response.setContentLength(bytes.length);
        response.getOutputStream().write(bytes);
        response.flushBuffer();
    }

    /**
     * Writes the problem and closes the connection after it, without reading the rest of the
     * request body: a client that is still sending cannot keep a worker thread busy draining it.
     */
    public void writeAndClose(HttpServletRequest request, HttpServletResponse response, ProblemType type, String detail)
            throws IOException {
        if (!response.isCommitted()) {
            response.setHeader(HttpHeaders.CONNECTION, "close");
        }
        try {
            write(request, response, type, detail);
        } finally {
            EarlyClose.closeAfterAnswer(request);
        }
    }

    private static String instance(HttpServletRequest request) {
        String uri = request.getRequestURI();
        try {
            java.net.URI.create(uri);
            return uri;
        } catch (IllegalArgumentException e) {
            return null;
        }
    }
}
