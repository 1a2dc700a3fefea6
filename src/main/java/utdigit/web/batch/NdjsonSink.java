package utdigit.web.batch;

import java.io.IOException;
import java.io.OutputStream;
import tools.jackson.databind.json.JsonMapper;

/** One JSON object per line (application/x-ndjson). */
final class NdjsonSink implements RowSink {
    private final JsonMapper mapper;
    private final OutputStream out;

    NdjsonSink(JsonMapper mapper, OutputStream out) {
        this.mapper = mapper;
        this.out = out;
    }

    @Override
    public void write(BatchRow row) throws IOException {
        out.write(mapper.writeValueAsBytes(row));
        out.write('\n');
    }

    @Override
    public void finish() throws IOException {
        out.flush();
    }
}
