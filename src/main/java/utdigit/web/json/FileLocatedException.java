package utdigit.web.json;

/**
 * A file read at start-up (a requirement profile, an operator materials file) that cannot be used:
 * which file, where in it (1-based line and column of the offending token; 0 when the problem has
 * no position, such as a missing directory) and what is wrong. Thrown at start-up, it stops the
 * service rather than let it answer from a file it misread.
 */
public abstract class FileLocatedException extends RuntimeException {
    private final String source;
    private final int line;
    private final int column;
    private final String problem;

    /** {@code message} is the whole text as the log shows it, built from the other parts. */
    protected FileLocatedException(String message, String source, int line, int column, String problem) {
        super(message, null, false, false);
        this.source = source;
        this.line = line;
        this.column = column;
        this.problem = problem;
    }

    /** The file or directory as messages name it (an absolute path or a classpath location). */
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
}
