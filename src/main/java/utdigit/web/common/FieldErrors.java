package utdigit.web.common;

import java.util.ArrayList;
import java.util.List;

/** Collects the field errors of one request so that the caller sees all of them at once. */
public final class FieldErrors {
    private final String prefix;
    private final List<FieldError> errors;

    private FieldErrors(String prefix, List<FieldError> errors) {
        this.prefix = prefix;
        this.errors = errors;
    }

    /** Errors of a top-level request. */
    public static FieldErrors create() {
        return new FieldErrors("", new ArrayList<>());
    }

    /** A view that adds errors of a nested section, pointers prefixed with "/" + section. */
    public FieldErrors section(String section) {
        return new FieldErrors(JsonPointers.child(prefix, section), errors);
    }

    /** The pointer of {@code property} in this section. */
    public String pointer(String property) {
        return JsonPointers.child(prefix, property);
    }

    public FieldErrors add(String property, String detail) {
        errors.add(new FieldError(pointer(property), detail));
        return this;
    }

    public boolean isEmpty() {
        return errors.isEmpty();
    }

    public List<FieldError> list() {
        return List.copyOf(errors);
    }

    /** Throws an {@link InputProblem} when any error was collected. */
    public void throwIfAny() {
        if (!errors.isEmpty()) {
            throw InputProblem.invalid(errors);
        }
    }
}
