package utdigit.web.materials;

/**
 * An operator materials file that cannot be used: its path, the line and column of the offending
 * token (0 when the problem is the file or directory as a whole) and what is wrong. Thrown at
 * start-up, it stops the service.
 */
public final class MaterialFileException extends RuntimeException {
    private final String source;
    private final int line;
    private final int column;

    MaterialFileException(String source, int line, int column, String problem) {
        super(source + (line > 0 ? ":" + line + ":" + column : "") + ": " + problem);
        this.source = source;
        this.line = line;
        this.column = column;
    }

    /** The file or directory, as messages name it. */
    public String source() {
        return source;
    }

    /** Line of the offending token, 1-based; 0 when none applies. */
    public int line() {
        return line;
    }

    /** Column of the offending token, 1-based; 0 when none applies. */
    public int column() {
        return column;
    }
}
