package utdigit.core.common;

import java.util.List;
import java.util.Objects;

/**
 * The one unchecked exception of the core. It carries a {@link CalculationError} code and the
 * snake_case names of the inputs involved (the contract's field names), so that the web layer can
 * point at them without parsing the message.
 */
public final class CalculationException extends RuntimeException {
    private final CalculationError error;
    private final List<String> fields;

    private CalculationException(CalculationError error, List<String> fields, String message) {
        super(message, null, false, false);
        this.error = Objects.requireNonNull(error);
        this.fields = List.copyOf(fields);
    }

    /** Inputs valid one by one that cannot hold together; {@code fields} are the inputs involved. */
    public static CalculationException impossible(String message, String... fields) {
        return new CalculationException(
                CalculationError.IMPOSSIBLE_COMBINATION, List.of(fields), message);
    }

    /** An input that does not apply to the chosen technique or option. */
    public static CalculationException notApplicable(String field, String message) {
        return new CalculationException(CalculationError.NOT_APPLICABLE, List.of(field), message);
    }

    /** An input outside the domain of a formula. */
    public static CalculationException invalid(String field, double value, String requirement) {
        return new CalculationException(
                CalculationError.INVALID_INPUT,
                List.of(field),
                CalculationError.INVALID_INPUT.format(field, value + 0.0, requirement)); // -0.0 + 0.0 is 0.0: no "-0" in a text
    }

    public CalculationError error() {
        return error;
    }

    /** The snake_case input names this failure is about, first the main one; may be empty. */
    public List<String> fields() {
        return fields;
    }
}
