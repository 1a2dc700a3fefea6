package utdigit.web.batch;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.List;
import tools.jackson.core.JacksonException;
import tools.jackson.databind.json.JsonMapper;
import utdigit.web.problem.FieldError;
import utdigit.web.problem.ProblemType;

/**
 * Rows of an application/x-ndjson body: one JSON object per line (LF or CRLF); blank lines are not
 * rows. A line that is not JSON is an INVALID row ({@link #unreadable}); the next line is read as usual. A line longer
 * than {@link #MAX_LINE_CHARS} (a JSON array sent as NDJSON is one such line) is read to its end
 * without being kept and is an INVALID row: memory stays flat whatever the body.
 */
final class NdjsonSource implements RowSource {
    /** Longest line kept, in characters: far above any request object, far below the heap. */
    static final int MAX_LINE_CHARS = 1 << 20;

    private final BufferedReader reader;
    private final JsonMapper mapper;
    private final char[] buffer = new char[1 << 13];
    private final StringBuilder line = new StringBuilder();
    private int position;
    private int limit;
    private boolean tooLong;
    private long row;

    NdjsonSource(JsonMapper mapper, BufferedReader reader) {
        this.mapper = mapper;
        this.reader = reader;
    }

    @Override
    public Row next() {
        try {
            String text;
            do {
                text = nextLine();
                if (text == null) {
                    return null;
                }
            } while (!tooLong && text.isBlank());
            row++;
            if (tooLong) {
                String detail = "the line is longer than " + MAX_LINE_CHARS + " characters; one JSON object per line";
                return Row.unreadable(row, ProblemType.MALFORMED_BODY, detail, List.of(new FieldError("", detail)));
            }
            return Row.ofLine(row, text); // read on a worker (BatchProcessor)
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * The next line without its LF or CRLF, or null at the end of the body. Past MAX_LINE_CHARS the
     * rest of the line is skipped and {@link #tooLong} set.
     */
    private String nextLine() throws IOException {
        line.setLength(0);
        tooLong = false;
        boolean any = false;
        while (true) {
            if (position == limit) {
                limit = Math.max(0, reader.read(buffer, 0, buffer.length));
                position = 0;
                if (limit == 0) {
                    return any ? endLine() : null;
                }
            }
            any = true;
            int start = position;
            while (position < limit && buffer[position] != '\n') {
                position++;
            }
            if (!tooLong) {
                if (line.length() + (position - start) > MAX_LINE_CHARS + 1) { // + 1: room for the CR of CRLF
                    tooLong = true;
                    line.setLength(0);
                } else {
                    line.append(buffer, start, position - start);
                }
            }
            if (position < limit) {
                position++;
                return endLine();
            }
        }
    }

    private String endLine() {
        int n = line.length();
        if (n > 0 && line.charAt(n - 1) == '\r') {
            line.setLength(n - 1);
        }
        if (line.length() > MAX_LINE_CHARS) {
            tooLong = true;
            line.setLength(0);
        }
        return line.toString();
    }

    /** Why a line that failed to read is not JSON, or null if it is JSON (and then an invalid request). */
    static String unreadable(JsonMapper mapper, String line) {
        try {
            mapper.readTree(line);
            return null;
        } catch (JacksonException e) {
            return e.getOriginalMessage() != null && e.getOriginalMessage().startsWith("Duplicate")
                    ? "a key appears more than once in the same object" : "the line is not well-formed JSON";
        }
    }

    @Override
    public String fatal() {
        return null;
    }

    @Override
    public void close() {
        try {
            reader.close();
        } catch (IOException ignored) {
            // the request stream is closed by the container
        }
    }
}
