package utdigit.web.problem;

import java.util.List;

/** A request that cannot be computed because of its fields; answered as a 400 problem. */
public final class InputProblem extends RuntimeException {
    private final ProblemType type;
    private final transient List<FieldError> errors;

    public InputProblem(ProblemType type, String detail, List<FieldError> errors) {
        super(detail, null, false, false);
        this.type = type;
        this.errors = List.copyOf(errors);
    }

    public static InputProblem invalid(List<FieldError> errors) {
        return new InputProblem(ProblemType.INVALID_INPUT, summary(errors), errors);
    }

    public static InputProblem invalid(String pointer, String detail) {
        return invalid(List.of(new FieldError(pointer, detail)));
    }

    static String summary(List<FieldError> errors) {
        if (errors.size() == 1) {
            FieldError e = errors.get(0);
            return (e.pointer().isEmpty() ? "the body" : e.pointer()) + ": " + e.detail();
        }
        return errors.size() + " fields are invalid; see errors";
    }

    public ProblemType type() {
        return type;
    }

    public List<FieldError> errors() {
        return errors;
    }
}
