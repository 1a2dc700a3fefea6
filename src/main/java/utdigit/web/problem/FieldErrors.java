package utdigit.web.problem;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Supplier;
import utdigit.core.common.CalculationException;
import utdigit.web.json.JsonPointers;

/** Collects the field errors of one request so that the caller sees all of them at once. */
public final class FieldErrors {
    private final String prefix;
    private final List<FieldError> errors;
    /** The first failure that waits for the field errors (one element, shared with the sections). */
    private final CalculationException[] later;

    private FieldErrors(String prefix, List<FieldError> errors, CalculationException[] later) {
        this.prefix = prefix;
        this.errors = errors;
        this.later = later;
    }

    /** Errors of a top-level request. */
    public static FieldErrors create() {
        return new FieldErrors("", new ArrayList<>(), new CalculationException[1]);
    }

    /** A view that adds errors of a nested section, pointers prefixed with "/" + section. */
    public FieldErrors section(String section) {
        return new FieldErrors(JsonPointers.child(prefix, section), errors, later);
    }

    /**
     * The value of an input resolution that may fail as a whole (a 422: water with SHEAR), or null
     * when it fails: the failure is thrown by {@link #throwIfAny()} after the 400s of the other fields.
     */
    public <T> T orLater(Supplier<T> resolution) {
        try {
            return resolution.get();
        } catch (CalculationException e) {
            if (later[0] == null) {
                later[0] = e;
            }
            return null;
        }
    }

    /** The pointer of {@code property} in this section. */
    public String pointer(String property) {
        return JsonPointers.child(prefix, property);
    }

    public FieldErrors add(String property, String detail) {
        errors.add(new FieldError(pointer(property), detail));
        return this;
    }

    /** Both forms of one input were given ({@code what}: its name in the message): an error at each. */
    public FieldErrors notBoth(String what, String first, String second) {
        String detail = "give " + what + " once: " + first + " or " + second + ", not both";
        return add(first, detail).add(second, detail);
    }

    public boolean isEmpty() {
        return errors.isEmpty();
    }

    public List<FieldError> list() {
        return List.copyOf(errors);
    }

    /**
     * Throws an {@link InputProblem} when any error was collected, else the failure kept by
     * {@link #orLater} when there is one.
     */
    public void throwIfAny() {
        if (!errors.isEmpty()) {
            throw InputProblem.invalid(errors);
        }
        if (later[0] != null) {
            throw later[0];
        }
    }
}
