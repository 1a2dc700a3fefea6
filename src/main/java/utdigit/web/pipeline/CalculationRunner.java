package utdigit.web.pipeline;

import jakarta.validation.ConstraintViolation;
import jakarta.validation.Validator;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ScheduledFuture;
import java.util.concurrent.ScheduledThreadPoolExecutor;
import java.util.concurrent.TimeUnit;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.springframework.beans.factory.DisposableBean;
import org.springframework.beans.factory.annotation.Value;
import org.springframework.stereotype.Component;
import tools.jackson.core.JacksonException;
import tools.jackson.core.JsonParser;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.ObjectReader;
import tools.jackson.databind.json.JsonMapper;
import utdigit.core.common.CalculationException;
import utdigit.core.common.SearchBudget;
import utdigit.web.stamp.Stamped;
import utdigit.web.stamp.Stamper;
import utdigit.web.units.Mirrors;
import utdigit.web.problem.FieldError;
import utdigit.web.json.InputMessages;
import utdigit.web.problem.InputProblem;
import utdigit.web.problem.JacksonProblems;
import utdigit.web.problem.NotFoundProblem;
import utdigit.web.problem.ProblemAdvice;
import utdigit.web.problem.ProblemType;
import utdigit.web.json.PropertyPointers;

/**
 * The one path from a request to a stamped answer, shared by the single endpoints, the batch
 * endpoints, technique sheets and stamp verification: Bean Validation (pointers to the caller's
 * fields), the calculation, a check that every number in the answer is finite, and the stamp. The
 * answer stays typed from the calculation to the wire ({@link Stamped}).
 *
 * <p>Every calculation runs under a deadline ({@code utdigit.calculation.deadline}): when it passes,
 * the thread is interrupted, the core's searches see it ({@link SearchBudget}) and stop, and the
 * answer is a 503. The searches' own work bounds keep every in-range request far below it; the
 * deadline is the backstop for an overloaded machine.
 */
@Component
public class CalculationRunner implements DisposableBean {
    private static final org.slf4j.Logger log = org.slf4j.LoggerFactory.getLogger(CalculationRunner.class);
    private final Map<String, Calculation<?, ?>> byName = new LinkedHashMap<>();
    /** The strict reader of each request type (batch rows). */
    private final Map<Class<?>, ObjectReader> readers = new java.util.concurrent.ConcurrentHashMap<>();
    private final Validator validator;
    private final JsonMapper mapper;
    private final Stamper stamper;
    private final long deadlineMillis;
    /** One daemon thread that interrupts calculations past their deadline. */
    private final ScheduledThreadPoolExecutor alarms;

    CalculationRunner(List<Calculation<?, ?>> calculations, Validator validator, JsonMapper mapper, Stamper stamper,
                      @Value("${utdigit.calculation.deadline:3s}") java.time.Duration deadline) {
        for (Calculation<?, ?> c : calculations) {
            if (byName.put(c.name(), c) != null) {
                throw new IllegalStateException("two calculations named " + c.name());
            }
        }
        this.validator = validator;
        this.mapper = mapper;
        this.stamper = stamper;
        this.deadlineMillis = deadline.toMillis();
        this.alarms = new ScheduledThreadPoolExecutor(1, r -> {
            Thread t = new Thread(r, "calculation-deadline");
            t.setDaemon(true);
            return t;
        });
        this.alarms.setRemoveOnCancelPolicy(true);
    }

    @Override
    public void destroy() {
        alarms.shutdownNow();
    }

    /** The names of every calculation, e.g. for the batch endpoints. */
    public Set<String> names() {
        return byName.keySet();
    }

    /** The calculation of a path name (batch endpoints, stamp verification); a 404 problem if none. */
    public Calculation<?, ?> calculation(String name) {
        Calculation<?, ?> c = byName.get(name);
        if (c == null) {
            throw new NotFoundProblem("no calculation named '" + name + "'");
        }
        return c;
    }

    /** Answers a request already read (by the HTTP layer or a batch row): validated, computed, stamped. */
    public <Q, A> Stamped<A> run(Calculation<Q, A> c, Q request) {
        if (request == null) {
            throw new InputProblem(ProblemType.MALFORMED_BODY, "the request body is empty", List.of(new FieldError("", "a JSON object is required")));
        }
        return answer(c, request);
    }

    /** Answers a request given as a JSON tree (batch rows of a JSON array, stamp verification), strictly read. */
    public Stamped<?> runTree(String name, JsonNode body) {
        return readAndAnswer(calculation(name), body);
    }

    private <Q, A> Stamped<A> readAndAnswer(Calculation<Q, A> c, JsonNode body) {
        return answer(c, read(c, body));
    }

    /** Reads a JSON tree into the calculation's request record with the strict mapper. */
    public <Q> Q read(Calculation<Q, ?> c, JsonNode body) {
        if (body == null || !body.isObject()) {
            throw InputProblem.invalid("", InputMessages.OBJECT);
        }
        try {
            return mapper.treeToValue(body, c.requestType());
        } catch (JacksonException e) {
            throw JacksonProblems.toInputProblem(e);
        }
    }

    /**
     * Reads a request from a token stream (a CSV batch row's cells as JSON tokens) into the
     * calculation's request record with the strict mapper, exactly as from JSON text.
     */
    public <Q> Q read(Calculation<Q, ?> c, JsonParser tokens) {
        try (tokens) {
            return readers.computeIfAbsent(c.requestType(), mapper::readerFor).readValue(tokens);
        } catch (JacksonException e) {
            throw JacksonProblems.toInputProblem(e);
        }
    }

    private <Q, A> Stamped<A> answer(Calculation<Q, A> c, Q request) {
        validate(request);
        A answer;
        Alarm alarm = new Alarm(Thread.currentThread());
        ScheduledFuture<?> scheduled = alarms.schedule(alarm, deadlineMillis, TimeUnit.MILLISECONDS);
        try {
            answer = c.answer(request);
        } catch (SearchBudget.Cancelled e) {
            throw new InputProblem(ProblemType.SERVICE_BUSY, "the calculation was stopped: it ran past the service's "
                    + "deadline of " + deadlineMillis + " ms, or its caller went away; try again later", List.of());
        } catch (SearchBudget.Exhausted | TooManyEvaluationsException e) {
            // Every search of the core answers null with a warning at its bound; a bound reached outside
            // one of them is still a typed refusal, never a 500.
            log.warn("calculation {} reached a search bound: {}", c.name(), e.toString());
            throw new InputProblem(ProblemType.IMPOSSIBLE_COMBINATION, "a numerical search of this calculation "
                    + "reached its work bound for these inputs; check the units and magnitudes of the inputs",
                    List.of(new FieldError("", "the search reached its work bound")));
        } catch (CalculationException e) {
            // The core quotes lengths in mm; the problem gives the inch value beside each, as warnings do.
            String message = Mirrors.withInches(e.getMessage());
            List<FieldError> errors = new ArrayList<>();
            for (String field : e.fields()) {
                errors.add(new FieldError(c.pointer(field, request), message));
            }
            throw new InputProblem(ProblemAdvice.typeOf(e), message, errors);
        } catch (ArithmeticException | IllegalArgumentException e) {
            // Inputs valid one by one can still lie where a formula has no finite answer (a diameter or a
            // tolerance of the smallest positive double): a typed refusal, never a 500. Logged to be fixed.
            log.warn("calculation {} refused numerically extreme inputs: {}", c.name(), e.toString());
            throw new InputProblem(ProblemType.IMPOSSIBLE_COMBINATION, "the inputs lie outside the range where "
                    + "this calculation has a finite answer (values at the limits of floating point); check the "
                    + "units and magnitudes of the inputs", List.of(new FieldError("", "numerically extreme inputs")));
        } finally {
            scheduled.cancel(false);
            alarm.disarm();
        }
        // numbers with no finite value are seen as the stamp's canonical bytes are written; only then
        // is the answer walked for their pointers
        return stamper.stamp(c.name(), answer, a -> "no finite value exists for "
                + String.join(", ", NonFiniteFields.of(a)) + " with these inputs; returned as null");
    }

    /**
     * Interrupts one calculation's thread at its deadline, unless the calculation ended first; once
     * disarmed it never interrupts, and an interrupt it did send is cleared so that the thread
     * (a server or batch worker) is handed back clean.
     */
    private static final class Alarm implements Runnable {
        private final Thread thread;
        private boolean done;
        private boolean fired;

        Alarm(Thread thread) {
            this.thread = thread;
        }

        @Override
        public synchronized void run() {
            if (!done) {
                fired = true;
                thread.interrupt();
            }
        }

        synchronized void disarm() {
            done = true;
            if (fired) {
                Thread.interrupted(); // called on the calculation's own thread
            }
        }
    }

    /** Bean Validation of a request record; every violation becomes a field error. */
    public void validate(Object request) {
        Set<ConstraintViolation<Object>> violations = validator.validate(request);
        if (!violations.isEmpty()) {
            List<FieldError> errors = new ArrayList<>();
            for (ConstraintViolation<Object> v : violations) {
                errors.add(new FieldError(PropertyPointers.of(v), v.getMessage()));
            }
            errors.sort(Comparator.comparing(FieldError::pointer).thenComparing(FieldError::detail));
            throw InputProblem.invalid(errors);
        }
    }
}
