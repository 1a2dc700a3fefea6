package utdigit.core.common;

/**
 * The kinds of failure the core reports. Each constant has one message pattern
 * ({@link String#format} style) and one category that the web layer maps to one problem type.
 */
public enum CalculationError {
    /** An input is outside the domain of a formula (the web layer checks ranges first). */
    INVALID_INPUT(Category.INVALID_INPUT, "%s (%s) %s"),
    /** Inputs are valid one by one but cannot hold together physically or logically. */
    IMPOSSIBLE_COMBINATION(Category.IMPOSSIBLE, "%s"),
    /** An input that does not apply to the chosen technique or option. */
    NOT_APPLICABLE(Category.INVALID_INPUT, "%s");

    /** How a caller should read the failure. */
    public enum Category {
        /** Bad input: HTTP 400. */
        INVALID_INPUT,
        /** Inputs impossible together: HTTP 422. */
        IMPOSSIBLE
    }

    private final Category category;
    private final String pattern;

    CalculationError(Category category, String pattern) {
        this.category = category;
        this.pattern = pattern;
    }

    public Category category() {
        return category;
    }

    public String format(Object... args) {
        return String.format(java.util.Locale.ROOT, pattern, args);
    }
}
