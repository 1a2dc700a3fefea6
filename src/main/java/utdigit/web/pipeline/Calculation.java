package utdigit.web.pipeline;

import utdigit.web.problem.InputProblem;
import utdigit.web.json.JsonPointers;

/**
 * One calculation of the API: how a validated request of type {@code Q} becomes an answer. The
 * same object serves the single endpoint, its batch form, sheets and stamp verification, so each
 * calculation has exactly one path from request to answer.
 *
 * @param <Q> the request record (Bean Validation annotated)
 * @param <A> the answer record (the stamp is added by {@link CalculationRunner})
 */
public interface Calculation<Q, A> {

    /** The endpoint's path name, e.g. {@code sampling-assessments}; also the stamp's calculation. */
    String name();

    Class<Q> requestType();

    /** The answer record's type: its members name the columns of a CSV batch answer. */
    Class<A> answerType();

    /**
     * The answer record for a request that passed Bean Validation: the flat result fields plus
     * inputs, velocity_source (where a velocity is used), warnings and references.
     *
     * @throws InputProblem for fields wrong together (400)
     * @throws utdigit.core.common.CalculationException from the core (400 or 422)
     */
    A answer(Q request);

    /**
     * The JSON Pointer of an input the core names in a failure. The core names a quantity that
     * comes in two units by its base name ("depth"); a calculation with such inputs overrides this to
     * point at the form the caller sent ("/depth_in").
     */
    default String pointer(String coreField, Q request) {
        return JsonPointers.property(coreField);
    }
}
