package utdigit.web.problem;

import java.net.URI;
import java.util.List;
import org.springframework.http.ProblemDetail;

/** Builds RFC 9457 problem bodies: for HTTP answers (via the advice) and for batch rows. */
public final class Problems {
    private Problems() {}

    public static ProblemDetail body(ProblemType type, String detail, List<FieldError> errors, String instance) {
        ProblemDetail body = ProblemDetail.forStatus(type.status());
        body.setType(type.type());
        body.setTitle(type.title());
        body.setDetail(detail);
        if (instance != null) {
            body.setInstance(URI.create(instance));
        }
        if (!errors.isEmpty()) {
            body.setProperty("errors", List.copyOf(errors));
        }
        return body;
    }
}
