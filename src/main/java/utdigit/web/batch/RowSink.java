package utdigit.web.batch;

import java.io.Closeable;
import java.io.IOException;

/** Writes answered rows in the format the caller accepts. */
interface RowSink extends Closeable {

    /** Writes one output row: {row, id?, status, result | problem}. */
    void write(BatchRow outputRow) throws IOException;

    /** Hands the rows written so far to the output stream (the caller then flushes that to the client). */
    default void flush() throws IOException {}

    /** Ends the output (closing bracket of a JSON array) and flushes. */
    void finish() throws IOException;

    @Override
    default void close() {}
}
