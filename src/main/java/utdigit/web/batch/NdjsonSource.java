package utdigit.web.batch;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.List;
import tools.jackson.core.JacksonException;
import tools.jackson.databind.json.JsonMapper;
import utdigit.web.common.FieldError;
import utdigit.web.common.ProblemType;

/**
 * Rows of an application/x-ndjson body: one JSON object per line (LF or CRLF); blank lines are not
 * rows. A line that is not JSON is an INVALID row; the next line is read as usual.
 */
final class NdjsonSource implements RowSource {
    private final BufferedReader reader;
    private final JsonMapper mapper;
    private long row;

    NdjsonSource(JsonMapper mapper, BufferedReader reader) {
        this.mapper = mapper;
        this.reader = reader;
    }

    @Override
    public Row next() {
        try {
            String line;
            do {
                line = reader.readLine();
                if (line == null) {
                    return null;
                }
            } while (line.isBlank());
            row++;
            try {
                return Row.of(row, mapper.readTree(line));
            } catch (JacksonException e) {
                String detail = e.getOriginalMessage() != null && e.getOriginalMessage().startsWith("Duplicate")
                        ? "a key appears more than once in the same object" : "the line is not well-formed JSON";
                return Row.unreadable(row, ProblemType.MALFORMED_BODY, detail, List.of(new FieldError("", detail)));
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
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
