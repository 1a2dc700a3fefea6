package utdigit.web.rules;

/**
 * A requirement profile that cannot be loaded: which file, where in it (1-based line and column;
 * 0 when the problem has no position, such as a missing directory) and what is wrong. Thrown at
 * start-up, so that a bad profile stops the service instead of validating sheets wrongly.
 */
public final class ProfileException extends RuntimeException {
    private final String source;
    private final int line;
    private final int column;
    private final String problem;

    public ProfileException(String source, int line, int column, String problem) {
        super(describe(source, line, column, problem), null, false, false);
        this.source = source;
        this.line = line;
        this.column = column;
        this.problem = problem;
    }

    /** The file: an absolute path, or {@code classpath:profiles/<name>.yaml} for a built-in one. */
    public String source() {
        return source;
    }

    /** 1-based line of the offending token, or 0. */
    public int line() {
        return line;
    }

    /** 1-based column of the offending token, or 0. */
    public int column() {
        return column;
    }

    /** What is wrong, without the position. */
    public String problem() {
        return problem;
    }

    private static String describe(String source, int line, int column, String problem) {
        String where = line > 0 ? ", line " + line + ", column " + column : "";
        return "requirement profile " + source + where + ": " + problem;
    }
}
