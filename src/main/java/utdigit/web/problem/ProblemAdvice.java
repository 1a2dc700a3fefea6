package utdigit.web.problem;

import jakarta.servlet.http.HttpServletRequest;
import java.util.ArrayList;
import java.util.List;
import org.apache.catalina.connector.ClientAbortException;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.springframework.beans.TypeMismatchException;
import org.springframework.http.HttpHeaders;
import org.springframework.http.HttpStatusCode;
import org.springframework.http.MediaType;
import org.springframework.http.ProblemDetail;
import org.springframework.http.ResponseEntity;
import org.springframework.http.converter.HttpMessageNotReadableException;
import org.springframework.web.HttpMediaTypeNotAcceptableException;
import org.springframework.web.HttpMediaTypeNotSupportedException;
import org.springframework.web.HttpRequestMethodNotSupportedException;
import org.springframework.web.bind.MissingServletRequestParameterException;
import org.springframework.web.bind.annotation.ExceptionHandler;
import org.springframework.web.bind.annotation.RestControllerAdvice;
import org.springframework.web.context.request.ServletWebRequest;
import org.springframework.web.context.request.WebRequest;
import org.springframework.web.context.request.async.AsyncRequestNotUsableException;
import org.springframework.web.method.annotation.MethodArgumentTypeMismatchException;
import org.springframework.web.multipart.MaxUploadSizeExceededException;
import org.springframework.web.servlet.NoHandlerFoundException;
import org.springframework.web.servlet.mvc.method.annotation.ResponseEntityExceptionHandler;
import org.springframework.web.servlet.resource.NoResourceFoundException;
import tools.jackson.core.JacksonException;
import utdigit.core.common.CalculationException;
import utdigit.web.json.JsonPointers;

/**
 * The one place where failures become RFC 9457 problem answers (application/problem+json): a
 * stable type per kind, a fixed title, the status, a detail in the caller's terms, the instance,
 * and for input problems {@code errors[{pointer, detail}]}. Spring MVC's own failures are picked
 * and given their status by {@link ResponseEntityExceptionHandler}; here they get the service's
 * type and words. No stack trace, class name or framework message ever reaches the caller.
 */
@RestControllerAdvice
public class ProblemAdvice extends ResponseEntityExceptionHandler {
    private static final Logger log = LoggerFactory.getLogger(ProblemAdvice.class);

    @ExceptionHandler(InputProblem.class)
    ResponseEntity<ProblemDetail> input(InputProblem e, HttpServletRequest request) {
        return problem(e.type(), e.getMessage(), e.errors(), request);
    }

    @ExceptionHandler(CalculationException.class)
    ResponseEntity<ProblemDetail> calculation(CalculationException e, HttpServletRequest request) {
        return problem(typeOf(e), e.getMessage(), errorsOf(e), request);
    }

    @ExceptionHandler(NotFoundProblem.class)
    ResponseEntity<ProblemDetail> notFound(NotFoundProblem e, HttpServletRequest request) {
        return problem(ProblemType.NOT_FOUND, e.getMessage(), List.of(), request);
    }

    @ExceptionHandler(PayloadTooLargeProblem.class)
    ResponseEntity<ProblemDetail> tooLarge(PayloadTooLargeProblem e, HttpServletRequest request) {
        return problem(ProblemType.PAYLOAD_TOO_LARGE, e.getMessage(), List.of(), request);
    }

    @ExceptionHandler(Exception.class)
    ResponseEntity<ProblemDetail> unexpected(Exception e, HttpServletRequest request) {
        if (clientWentAway(e)) {
            // The caller closed the connection while its answer was being written (a batch stream cut
            // off): nobody is left to answer and the service did not fail. Logged, not as an error.
            log.info("client closed the connection during {} {}: {}", request.getMethod(), request.getRequestURI(),
                    rootMessage(e));
            return null;
        }
        log.error("unexpected failure on {} {}", request.getMethod(), request.getRequestURI(), e);
        return problem(ProblemType.INTERNAL_ERROR, "the service could not answer this request; "
                + "the failure is logged", List.of(), request);
    }

    /** Spring MVC's failures, with the status {@link ResponseEntityExceptionHandler} chose for each. */
    @Override
    protected ResponseEntity<Object> handleExceptionInternal(Exception e, Object body, HttpHeaders headers,
                                                             HttpStatusCode status, WebRequest webRequest) {
        if (!(webRequest instanceof ServletWebRequest servlet) || (servlet.getResponse() != null
                && servlet.getResponse().isCommitted())) {
            return null;
        }
        HttpServletRequest request = servlet.getRequest();
        ResponseEntity<ProblemDetail> answer = translate(e, status, request);
        return answer == null ? null : ResponseEntity.status(answer.getStatusCode()).headers(answer.getHeaders())
                .body(answer.getBody());
    }

    private ResponseEntity<ProblemDetail> translate(Exception e, HttpStatusCode status, HttpServletRequest request) {
        if (e instanceof NoResourceFoundException || e instanceof NoHandlerFoundException) {
            return problem(ProblemType.NOT_FOUND, "no resource at " + request.getRequestURI(), List.of(), request);
        }
        if (e instanceof HttpMessageNotReadableException n) {
            return unreadable(n, request);
        }
        if (e instanceof HttpMediaTypeNotSupportedException m) {
            return problem(ProblemType.UNSUPPORTED_MEDIA_TYPE, "Content-Type "
                    + (m.getContentType() == null ? "(none)" : m.getContentType()) + " is not accepted here"
                    + supported(m.getSupportedMediaTypes(), "; use ", " or "), List.of(), request);
        }
        if (e instanceof HttpMediaTypeNotAcceptableException m) {
            return problem(ProblemType.NOT_ACCEPTABLE, "the Accept header asks for a format this resource does "
                    + "not produce" + supported(m.getSupportedMediaTypes(), "; it produces ", ", "), List.of(), request);
        }
        if (e instanceof HttpRequestMethodNotSupportedException m) {
            return methodNotAllowed(m, request);
        }
        if (e instanceof MaxUploadSizeExceededException) {
            return problem(ProblemType.PAYLOAD_TOO_LARGE, "the request body is larger than the service accepts",
                    List.of(), request);
        }
        if (e instanceof TypeMismatchException m) {
            return parameter(m instanceof MethodArgumentTypeMismatchException a ? a.getName() : m.getPropertyName(),
                    request);
        }
        if (e instanceof MissingServletRequestParameterException m) {
            return parameter(m.getParameterName(), request);
        }
        return status.value() == 500 ? unexpected(e, request) : problem(ProblemType.ofStatus(status.value()),
                "the request cannot be answered as sent", List.of(), request);
    }

    private static ResponseEntity<ProblemDetail> unreadable(HttpMessageNotReadableException e,
                                                            HttpServletRequest request) {
        Throwable cause = e.getCause();
        while (cause != null && !(cause instanceof JacksonException)) {
            cause = cause.getCause();
        }
        if (cause instanceof JacksonException jackson) {
            InputProblem p = JacksonProblems.toInputProblem(jackson);
            return problem(p.type(), p.getMessage(), p.errors(), request);
        }
        return problem(ProblemType.MALFORMED_BODY, "the request body is missing or is not a JSON object",
                List.of(new FieldError("", "a JSON object is required")), request);
    }

    private static ResponseEntity<ProblemDetail> methodNotAllowed(HttpRequestMethodNotSupportedException e,
                                                                  HttpServletRequest request) {
        String allowed = e.getSupportedHttpMethods() == null ? "" : String.join(", ",
                e.getSupportedHttpMethods().stream().map(Object::toString).toList());
        ResponseEntity<ProblemDetail> answer = problem(ProblemType.METHOD_NOT_ALLOWED, request.getMethod()
                + " is not allowed on " + request.getRequestURI()
                + (allowed.isEmpty() ? "" : "; allowed: " + allowed), List.of(), request);
        return allowed.isEmpty() ? answer : ResponseEntity.status(answer.getStatusCode()).headers(answer.getHeaders())
                .header(HttpHeaders.ALLOW, allowed).body(answer.getBody());
    }

    private static ResponseEntity<ProblemDetail> parameter(String name, HttpServletRequest request) {
        return problem(ProblemType.INVALID_INPUT, "parameter " + name + " is missing or invalid",
                List.of(new FieldError(name, "is missing or invalid")), request);
    }

    /** The media types named in one order (Spring's list follows a hash order that changes between starts). */
    private static String supported(List<MediaType> types, String prefix, String separator) {
        return types.isEmpty() ? "" : prefix + String.join(separator,
                types.stream().map(MediaType::toString).sorted().toList());
    }

    /** Whether {@code e} is the connection to the client failing under a write (reset, broken pipe, aborted). */
    static boolean clientWentAway(Throwable e) {
        for (Throwable t = e; t != null; t = t.getCause()) {
            if (t instanceof ClientAbortException || t instanceof AsyncRequestNotUsableException) {
                return true;
            }
            String message = t.getMessage();
            if (t instanceof java.io.IOException && message != null
                    && (message.contains("Broken pipe") || message.contains("Connection reset"))) {
                return true;
            }
        }
        return false;
    }

    private static String rootMessage(Throwable e) {
        Throwable t = e;
        while (t.getCause() != null) {
            t = t.getCause();
        }
        return t.getClass().getSimpleName() + ": " + t.getMessage();
    }

    /** The problem type of a core failure. */
    public static ProblemType typeOf(CalculationException e) {
        return switch (e.error()) {
            case IMPOSSIBLE_COMBINATION -> ProblemType.IMPOSSIBLE_COMBINATION;
            case NOT_APPLICABLE -> ProblemType.INAPPLICABLE_INPUT;
            case INVALID_INPUT -> ProblemType.INVALID_INPUT;
        };
    }

    /** One field error per input the core names, all with the core's message. */
    private static List<FieldError> errorsOf(CalculationException e) {
        List<FieldError> errors = new ArrayList<>();
        for (String field : e.fields()) {
            errors.add(new FieldError(JsonPointers.property(field), e.getMessage()));
        }
        return errors;
    }

    private static ResponseEntity<ProblemDetail> problem(ProblemType type, String detail, List<FieldError> errors,
                                                         HttpServletRequest request) {
        ProblemDetail body = Problems.body(type, detail, errors, request.getRequestURI());
        return ResponseEntity.status(type.status()).contentType(MediaType.APPLICATION_PROBLEM_JSON).body(body);
    }
}
