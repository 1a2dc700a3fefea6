package utdigit.web.limits;

import jakarta.servlet.ReadListener;
import jakarta.servlet.ServletInputStream;
import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletRequestWrapper;
import java.io.BufferedReader;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.UnsupportedEncodingException;
import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;

/** A request whose body has already been read in full into memory (at most the body cap). */
// Spring's ContentCachingRequestWrapper keeps what is read, it cannot hand back a body read beforehand.
final class BufferedBodyRequest extends HttpServletRequestWrapper {
    private final byte[] body;
    private boolean streamUsed;

    BufferedBodyRequest(HttpServletRequest request, byte[] body) {
        super(request);
        this.body = body;
    }

    @Override
    public int getContentLength() {
        return body.length;
    }

    @Override
    public long getContentLengthLong() {
        return body.length;
    }

    @Override
    public ServletInputStream getInputStream() {
        if (streamUsed) {
            throw new IllegalStateException("getReader() has already been called for this request");
        }
        return new Stream(new ByteArrayInputStream(body));
    }

    @Override
    public BufferedReader getReader() throws UnsupportedEncodingException {
        streamUsed = true;
        String encoding = getCharacterEncoding();
        Charset charset;
        try {
            charset = encoding == null ? StandardCharsets.UTF_8 : Charset.forName(encoding);
        } catch (IllegalArgumentException e) {
            throw new UnsupportedEncodingException(encoding);
        }
        return new BufferedReader(new InputStreamReader(new ByteArrayInputStream(body), charset));
    }

    private static final class Stream extends ServletInputStream {
        private final ByteArrayInputStream in;

        Stream(ByteArrayInputStream in) {
            this.in = in;
        }

        @Override
        public int read() {
            return in.read();
        }

        @Override
        public int read(byte[] b, int off, int len) {
            return in.read(b, off, len);
        }

        @Override
        public int available() {
            return in.available();
        }

        @Override
        public boolean isFinished() {
            return in.available() == 0;
        }

        @Override
        public boolean isReady() {
            return true;
        }

        @Override
        public void setReadListener(ReadListener listener) {
            try {
                listener.onDataAvailable();
                listener.onAllDataRead();
            } catch (IOException e) {
                listener.onError(e);
            }
        }
    }
}
