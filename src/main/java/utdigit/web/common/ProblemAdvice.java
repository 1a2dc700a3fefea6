package utdigit.web.common;

import jakarta.servlet.http.HttpServletRequest;
import java.util.ArrayList;
import java.util.List;
import org.apache.catalina.connector.ClientAbortException;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.springframework.http.HttpHeaders;
import org.springframework.http.MediaType;
import org.springframework.http.ProblemDetail;
import org.springframework.http.ResponseEntity;
import org.springframework.http.converter.HttpMessageNotReadableException;
import org.springframework.web.HttpMediaTypeNotAcceptableException;
import org.springframework.web.HttpMediaTypeNotSupportedException;
import org.springframework.web.HttpRequestMethodNotSupportedException;
import org.springframework.web.bind.MissingServletRequestParameterException;
import org.springframework.web.bind.annotation.ExceptionHandler;
import org.springframework.web.context.request.async.AsyncRequestNotUsableException;
import org.springframework.web.bind.annotation.RestControllerAdvice;
import org.springframework.web.method.annotation.MethodArgumentTypeMismatchException;
import org.springframework.web.multipart.MaxUploadSizeExceededException;
import org.springframework.web.servlet.NoHandlerFoundException;
import org.springframework.web.servlet.resource.NoResourceFoundException;
import tools.jackson.core.JacksonException;
import utdigit.core.common.CalculationException;

/**
 * The one place where failures become RFC 9457 problem answers (application/problem+json): a
 * stable type per kind, a fixed title, the status, a detail in the caller's terms, the instance,
 * and for input problems {@code errors[{pointer, detail}]}. No stack trace, class name or framework
 * message ever reaches the caller.
 */
@RestControllerAdvice
class ProblemAdvice {


    private static final Logger log = LoggerFactory.getLogger(ProblemAdvice.class);

    @ExceptionHandler(InputProblem.class)
    ResponseEntity<ProblemDetail> input(InputProblem e, HttpServletRequest request) {
        return problem(e.type(), e.getMessage(), e.errors(), request);
    }

    @ExceptionHandler(CalculationException.class)
    ResponseEntity<ProblemDetail> calculation(CalculationException e, HttpServletRequest request) {
        return fromCalculation(e, "", request);
    }

    @ExceptionHandler(NotFoundProblem.class)
    ResponseEntity<ProblemDetail> notFound(NotFoundProblem e, HttpServletRequest request) {
        return problem(ProblemType.NOT_FOUND, e.getMessage(), List.of(), request);
    }

    @ExceptionHandler({NoResourceFoundException.class, NoHandlerFoundException.class})
    ResponseEntity<ProblemDetail> noRoute(Exception e, HttpServletRequest request) {
        return problem(ProblemType.NOT_FOUND, "no resource at " + request.getRequestURI(), List.of(), request);
    }

    @ExceptionHandler(HttpMessageNotReadableException.class)
    ResponseEntity<ProblemDetail> unreadable(HttpMessageNotReadableException e, HttpServletRequest request) {
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

    @ExceptionHandler(HttpMediaTypeNotSupportedException.class)
    ResponseEntity<ProblemDetail> mediaType(HttpMediaTypeNotSupportedException e, HttpServletRequest request) {
        List<String> supported = e.getSupportedMediaTypes().stream().map(MediaType::toString).toList();
        String detail = "Content-Type " + (e.getContentType() == null ? "(none)" : e.getContentType())
                + " is not accepted here" + (supported.isEmpty() ? "" : "; use " + String.join(" or ", supported));
        return problem(ProblemType.UNSUPPORTED_MEDIA_TYPE, detail, List.of(), request);
    }

    @ExceptionHandler(HttpMediaTypeNotAcceptableException.class)
    ResponseEntity<ProblemDetail> notAcceptable(HttpMediaTypeNotAcceptableException e, HttpServletRequest request) {
        List<String> supported = e.getSupportedMediaTypes().stream().map(MediaType::toString).toList();
        return problem(ProblemType.NOT_ACCEPTABLE, "the Accept header asks for a format this resource "
                + "does not produce" + (supported.isEmpty() ? "" : "; it produces " + String.join(", ", supported)),
                List.of(), request);
    }

    @ExceptionHandler(HttpRequestMethodNotSupportedException.class)
    ResponseEntity<ProblemDetail> method(HttpRequestMethodNotSupportedException e, HttpServletRequest request) {
        String allowed = e.getSupportedHttpMethods() == null ? "" : String.join(", ",
                e.getSupportedHttpMethods().stream().map(Object::toString).toList());
        ResponseEntity<ProblemDetail> answer = problem(ProblemType.METHOD_NOT_ALLOWED, request.getMethod()
                + " is not allowed on " + request.getRequestURI()
                + (allowed.isEmpty() ? "" : "; allowed: " + allowed), List.of(), request);
        if (allowed.isEmpty()) {
            return answer;
        }
        return ResponseEntity.status(answer.getStatusCode()).headers(answer.getHeaders())
                .header(HttpHeaders.ALLOW, allowed).body(answer.getBody());
    }

    @ExceptionHandler(PayloadTooLargeProblem.class)
    ResponseEntity<ProblemDetail> tooLarge(PayloadTooLargeProblem e, HttpServletRequest request) {
        return problem(ProblemType.PAYLOAD_TOO_LARGE, e.getMessage(), List.of(), request);
    }

    @ExceptionHandler(MaxUploadSizeExceededException.class)
    ResponseEntity<ProblemDetail> uploadTooLarge(MaxUploadSizeExceededException e, HttpServletRequest request) {
        return problem(ProblemType.PAYLOAD_TOO_LARGE, "the request body is larger than the service accepts",
                List.of(), request);
    }

    @ExceptionHandler({MethodArgumentTypeMismatchException.class, MissingServletRequestParameterException.class})
    ResponseEntity<ProblemDetail> parameter(Exception e, HttpServletRequest request) {
        String name = e instanceof MethodArgumentTypeMismatchException m ? m.getName()
                : ((MissingServletRequestParameterException) e).getParameterName();
        return problem(ProblemType.INVALID_INPUT, "parameter " + name + " is missing or invalid",
                List.of(new FieldError(name, "is missing or invalid")), request);
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

    /** A core failure as a problem; {@code pointerPrefix} locates the fields (e.g. "/probe"). */
    ResponseEntity<ProblemDetail> fromCalculation(CalculationException e, String pointerPrefix, HttpServletRequest request) {
        return problem(typeOf(e), e.getMessage(), errorsOf(e, pointerPrefix), request);
    }

    /** The problem type of a core failure. */
    static ProblemType typeOf(CalculationException e) {
        return switch (e.error()) {
            case IMPOSSIBLE_COMBINATION -> ProblemType.IMPOSSIBLE_COMBINATION;
            case NOT_APPLICABLE -> ProblemType.INAPPLICABLE_INPUT;
            case INVALID_INPUT -> ProblemType.INVALID_INPUT;
        };
    }

    /** One field error per input the core names, all with the core's message. */
    public static List<FieldError> errorsOf(CalculationException e, String pointerPrefix) {
        List<FieldError> errors = new ArrayList<>();
        for (String field : e.fields()) {
            errors.add(new FieldError(pointerPrefix + JsonPointers.property(field), e.getMessage()));
        }
        return errors;
    }

    static ResponseEntity<ProblemDetail> problem(ProblemType type, String detail, List<FieldError> errors,
                                                 HttpServletRequest request) {
        ProblemDetail body = body(type, detail, errors, request.getRequestURI());
        return ResponseEntity.status(type.status()).contentType(MediaType.APPLICATION_PROBLEM_JSON).body(body);
    }

    /** The problem body; also used for batch rows. */
    public static ProblemDetail body(ProblemType type, String detail, List<FieldError> errors, String instance) {
        return Problems.body(type, detail, errors, instance);
    }
}
