package utdigit.web.problem;

import java.net.URI;
import org.springframework.http.HttpStatus;

/**
 * Every kind of problem the service answers, each with one stable type URI (relative, under
 * /problems/), one fixed title and one status (RFC 9457). Documented in README and OpenAPI.
 */
public enum ProblemType {
    INVALID_INPUT("invalid-input", "Invalid input", HttpStatus.BAD_REQUEST),
    MALFORMED_BODY("malformed-body", "Malformed request body", HttpStatus.BAD_REQUEST),
    INAPPLICABLE_INPUT("inapplicable-input", "Input does not apply", HttpStatus.BAD_REQUEST),
    IMPOSSIBLE_COMBINATION("impossible-combination", "Inputs impossible together", HttpStatus.UNPROCESSABLE_CONTENT),
    NOT_FOUND("not-found", "Not found", HttpStatus.NOT_FOUND),
    METHOD_NOT_ALLOWED("method-not-allowed", "Method not allowed", HttpStatus.METHOD_NOT_ALLOWED),
    NOT_ACCEPTABLE("not-acceptable", "Not acceptable", HttpStatus.NOT_ACCEPTABLE),
    PAYLOAD_TOO_LARGE("payload-too-large", "Request body too large", HttpStatus.CONTENT_TOO_LARGE),
    REQUEST_TIMEOUT("request-timeout", "Request body too slow", HttpStatus.REQUEST_TIMEOUT),
    UNSUPPORTED_MEDIA_TYPE("unsupported-media-type", "Unsupported media type", HttpStatus.UNSUPPORTED_MEDIA_TYPE),
    SERVICE_BUSY("service-busy", "Service busy", HttpStatus.SERVICE_UNAVAILABLE),
    UNAUTHORIZED("unauthorized", "Authentication required", HttpStatus.UNAUTHORIZED),
    INTERNAL_ERROR("internal-error", "Internal error", HttpStatus.INTERNAL_SERVER_ERROR);

    private final String slug;
    private final String title;
    private final HttpStatus status;

    ProblemType(String slug, String title, HttpStatus status) {
        this.slug = slug;
        this.title = title;
        this.status = status;
    }

    public URI type() {
        return URI.create("/problems/" + slug);
    }

    public String title() {
        return title;
    }

    public HttpStatus status() {
        return status;
    }

    /** The first type of this status; a status of none of them: invalid input (4xx) or internal error. */
    public static ProblemType ofStatus(int status) {
        for (ProblemType type : values()) {
            if (type.status.value() == status) {
                return type;
            }
        }
        return status < 500 ? INVALID_INPUT : INTERNAL_ERROR;
    }
}
