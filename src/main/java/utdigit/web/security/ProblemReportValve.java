package utdigit.web.security;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.List;
import org.apache.catalina.connector.Request;
import org.apache.catalina.connector.Response;
import org.apache.catalina.valves.ErrorReportValve;
import org.springframework.security.web.header.HeaderWriter;
import tools.jackson.databind.json.JsonMapper;
import utdigit.web.problem.Problems;
import utdigit.web.problem.ProblemType;

/**
 * Tomcat's own error answers (a request refused before it reaches the application: an invalid
 * URI, a malformed request line, headers too large) as problems too, with the security headers,
 * in place of the container's HTML page. Answers the application wrote itself are left alone.
 */
// Boot's error handling lives inside the application context; a request refused before it (bad URI,
// malformed request line) is answered by the host's error report valve, so that valve is replaced.
final class ProblemReportValve extends ErrorReportValve {
    private final JsonMapper mapper;
    private final HeaderWriter headers;

    ProblemReportValve(JsonMapper mapper, HeaderWriter headers) {
        this.mapper = mapper;
        this.headers = headers;
        setShowReport(false);
        setShowServerInfo(false);
    }

    @Override
    protected void report(Request request, Response response, Throwable throwable) {
        int status = response.getStatus();
        if (status < 400 || response.getContentWritten() > 0 || !response.setErrorReported()) {
            return;
        }
        ProblemType type = ProblemType.ofStatus(status);
        String detail = status < 500 ? "the request is not well-formed HTTP (request line, URI or headers) and "
                + "was refused before it reached the service" : "the service could not answer this request";
        try {
            var body = Problems.body(type, detail, List.of(), null);
            body.setStatus(status);
            byte[] bytes = mapper.writeValueAsBytes(body);
            response.setContentType("application/problem+json");
            response.setCharacterEncoding(StandardCharsets.UTF_8.name());
            headers.writeHeaders(request, response);
            response.setContentLength(bytes.length);
            response.getOutputStream().write(bytes);
            response.finishResponse();
        } catch (IOException | IllegalStateException e) {
            // the client is gone or the answer has started: nothing more to say
        }
    }
}
