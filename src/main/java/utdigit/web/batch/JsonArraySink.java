package utdigit.web.batch;

import java.io.IOException;
import java.io.OutputStream;
import tools.jackson.databind.json.JsonMapper;

/** One JSON array of output rows (application/json), written row by row. */
final class JsonArraySink implements RowSink {
    private final JsonMapper mapper;
    private final OutputStream out;
    private boolean first = true;

    JsonArraySink(JsonMapper mapper, OutputStream out) throws IOException {
        this.mapper = mapper;
        this.out = out;
        out.write('[');
    }

    @Override
    public void write(BatchRow row) throws IOException {
        if (!first) {
            out.write(',');
        }
        first = false;
        out.write('\n');
        out.write(mapper.writeValueAsBytes(row));
    }

    @Override
    public void finish() throws IOException {
        out.write('\n');
        out.write(']');
        out.write('\n');
        out.flush();
    }
}
