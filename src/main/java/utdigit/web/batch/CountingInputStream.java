package utdigit.web.batch;

import java.io.FilterInputStream;
import java.io.IOException;
import java.io.InputStream;

/** Counts the bytes read and stops at a limit, so a chunked body cannot grow without bound. */
final class CountingInputStream extends FilterInputStream {
    /** Thrown when the body passes the limit. */
    static final class LimitExceeded extends IOException {
        LimitExceeded() {
            super("body limit", null);
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

    private void count(long n) throws LimitExceeded {
        count += n;
        if (count > limit) {
            throw new LimitExceeded();
        }
    }
}
