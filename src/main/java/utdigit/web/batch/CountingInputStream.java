package utdigit.web.batch;

import java.io.FilterInputStream;
import java.io.IOException;
import java.io.InputStream;

/**
 * Counts the bytes read and stops at a limit, so a chunked body cannot grow without bound. Passing
 * the limit throws the unchecked {@link LimitExceeded}: a checked IOException would be wrapped by
 * the parsers (Jackson turns it into a JacksonException) and read as a malformed body.
 */
final class CountingInputStream extends FilterInputStream {
    /** Thrown when the body passes the limit. */
    static final class LimitExceeded extends RuntimeException {
        LimitExceeded() {
            super("body limit", null, false, false);
        }
    }

    /**
     * Rethrows the {@link LimitExceeded} behind {@code e}, if any: some parsers (Jackson's CSV
     * reader) wrap whatever their input throws, which would otherwise read as a malformed body.
     */
    static void rethrowIfLimit(Throwable e) {
        for (Throwable t = e; t != null; t = t.getCause()) {
            if (t instanceof LimitExceeded limit) {
                throw limit;
            }
        }
    }

    private final long limit;
    private long count;

    CountingInputStream(InputStream in, long limit) {
        super(in);
        this.limit = limit;
    }

    @Override
    public int read() throws IOException {
        int b = super.read();
        if (b >= 0) {
            count(1);
        }
        return b;
    }

    @Override
    public int read(byte[] b, int off, int len) throws IOException {
        int n = super.read(b, off, len);
        if (n > 0) {
            count(n);
        }
        return n;
    }

    private void count(long n) {
        count += n;
        if (count > limit) {
            throw new LimitExceeded();
        }
    }
}
