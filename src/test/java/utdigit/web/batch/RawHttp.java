package utdigit.web.batch;

import java.io.BufferedInputStream;
import java.io.ByteArrayOutputStream;
import java.io.EOFException;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.net.InetSocketAddress;
import java.net.Socket;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.atomic.AtomicReference;

/**
 * A minimal HTTP/1.1 client over a plain socket, for the batch tests: it sends exactly the headers
 * given (no Accept unless asked), a body of fixed length or chunked, and writes the body on its own
 * thread while the caller reads the answer, as a streaming script does. Neither
 * HttpURLConnection (its answer can only be read once the body is sent) nor a client that buffers
 * the answer could carry a batch whose answer is larger than the socket buffers.
 */
final class RawHttp {
    /** Writes a request body. */
    interface Body {
        void writeTo(OutputStream out) throws IOException;
    }

    /** An answer: status, headers (names lower case), and its body as a stream (chunks decoded). */
    static final class Exchange implements AutoCloseable {
        final int status;
        final Map<String, String> headers;
        final InputStream body;
        private final Socket socket;
        private final Thread writer;
        private final AtomicReference<Throwable> writeFailure;

        private Exchange(int status, Map<String, String> headers, InputStream body, Socket socket, Thread writer,
                         AtomicReference<Throwable> writeFailure) {
            this.status = status;
            this.headers = headers;
            this.body = body;
            this.socket = socket;
            this.writer = writer;
            this.writeFailure = writeFailure;
        }

        String header(String name) {
            return headers.get(name.toLowerCase(Locale.ROOT));
        }

        /** The whole body as UTF-8 text. */
        String text() {
            try {
                return new String(body.readAllBytes(), StandardCharsets.UTF_8);
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }

        /** Waits for the body writer; its failure, if any (e.g. the server stopped reading at a limit). */
        Throwable awaitWriter() throws InterruptedException {
            writer.join(120_000);
            return writeFailure.get();
        }

        @Override
        public void close() throws IOException {
            socket.close();
        }
    }

    private RawHttp() {}

    /** POSTs {@code body} with a Content-Length (or chunked) and returns the whole answer. */
    static Response post(int port, String path, List<String> headers, byte[] body, boolean chunked) {
        try (Exchange e = open(port, path, headers, out -> out.write(body), chunked ? -1 : body.length)) {
            return new Response(e.status, e.headers, e.text());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** An answer read whole. */
    record Response(int status, Map<String, String> headers, String body) {
        String header(String name) {
            return headers.get(name.toLowerCase(Locale.ROOT));
        }

        /** The non-empty lines of the body. */
        List<String> lines() {
            List<String> out = new ArrayList<>();
            for (String line : body.split("\n", -1)) {
                if (!line.isEmpty()) {
                    out.add(line);
                }
            }
            return out;
        }
    }

    /**
     * Sends the request head, starts writing the body on its own thread and returns as soon as the
     * answer's head is read. {@code contentLength} below 0 sends the body chunked.
     */
    static Exchange open(int port, String path, List<String> headers, Body body, long contentLength)
            throws IOException {
        Socket socket = new Socket();
        socket.connect(new InetSocketAddress("localhost", port), 10_000);
        socket.setSoTimeout(120_000);
        OutputStream raw = socket.getOutputStream();
        StringBuilder head = new StringBuilder("POST ").append(path).append(" HTTP/1.1\r\n")
                .append("Host: localhost:").append(port).append("\r\n")
                .append("Connection: close\r\n");
        for (String h : headers) {
            head.append(h).append("\r\n");
        }
        head.append(contentLength < 0 ? "Transfer-Encoding: chunked\r\n" : "Content-Length: " + contentLength + "\r\n");
        head.append("\r\n");
        raw.write(head.toString().getBytes(StandardCharsets.ISO_8859_1));
        raw.flush();
        AtomicReference<Throwable> failure = new AtomicReference<>();
        Thread writer = new Thread(() -> {
            try {
                OutputStream out = contentLength < 0 ? new ChunkedOutputStream(raw) : new NonClosing(raw);
                body.writeTo(out);
                out.close();
            } catch (Throwable t) {
                failure.set(t);
            }
        }, "raw-http-body");
        writer.setDaemon(true);
        writer.start();
        InputStream in = new BufferedInputStream(socket.getInputStream(), 1 << 16);
        String status = line(in);
        String[] parts = status.split(" ", 3);
        if (parts.length < 2 || !parts[0].startsWith("HTTP/1.")) {
            throw new IOException("not an HTTP answer: " + status);
        }
        Map<String, String> answerHeaders = new TreeMap<>();
        for (String h = line(in); !h.isEmpty(); h = line(in)) {
            int colon = h.indexOf(':');
            answerHeaders.put(h.substring(0, colon).trim().toLowerCase(Locale.ROOT), h.substring(colon + 1).trim());
        }
        InputStream answerBody;
        if ("chunked".equalsIgnoreCase(answerHeaders.get("transfer-encoding"))) {
            answerBody = new ChunkedInputStream(in);
        } else if (answerHeaders.containsKey("content-length")) {
            answerBody = new BoundedInputStream(in, Long.parseLong(answerHeaders.get("content-length")));
        } else {
            answerBody = in;
        }
        return new Exchange(Integer.parseInt(parts[1]), answerHeaders, answerBody, socket, writer, failure);
    }

    private static String line(InputStream in) throws IOException {
        ByteArrayOutputStream b = new ByteArrayOutputStream();
        for (int c = in.read(); c != '\n'; c = in.read()) {
            if (c < 0) {
                throw new EOFException("the answer ended inside its head");
            }
            if (c != '\r') {
                b.write(c);
            }
        }
        return b.toString(StandardCharsets.ISO_8859_1);
    }

    /** Writes chunks of at most 64 KiB; close() writes the last chunk (the socket stays open). */
    static final class ChunkedOutputStream extends OutputStream {
        private final OutputStream out;
        private final byte[] buffer = new byte[1 << 16];
        private int size;

        ChunkedOutputStream(OutputStream out) {
            this.out = out;
        }

        @Override
        public void write(int b) throws IOException {
            if (size == buffer.length) {
                writeChunk();
            }
            buffer[size++] = (byte) b;
        }

        @Override
        public void write(byte[] b, int off, int len) throws IOException {
            while (len > 0) {
                if (size == buffer.length) {
                    writeChunk();
                }
                int n = Math.min(len, buffer.length - size);
                System.arraycopy(b, off, buffer, size, n);
                size += n;
                off += n;
                len -= n;
            }
        }

        private void writeChunk() throws IOException {
            if (size > 0) {
                out.write((Integer.toHexString(size) + "\r\n").getBytes(StandardCharsets.ISO_8859_1));
                out.write(buffer, 0, size);
                out.write('\r');
                out.write('\n');
                size = 0;
            }
        }

        @Override
        public void flush() throws IOException {
            writeChunk();
            out.flush();
        }

        @Override
        public void close() throws IOException {
            writeChunk();
            out.write("0\r\n\r\n".getBytes(StandardCharsets.ISO_8859_1));
            out.flush();
        }
    }

    private static final class NonClosing extends OutputStream {
        private final OutputStream out;

        NonClosing(OutputStream out) {
            this.out = out;
        }

        @Override
        public void write(int b) throws IOException {
            out.write(b);
        }

        @Override
        public void write(byte[] b, int off, int len) throws IOException {
            out.write(b, off, len);
        }

        @Override
        public void flush() throws IOException {
            out.flush();
        }

        @Override
        public void close() throws IOException {
            out.flush();
        }
    }

    /** Decodes a chunked answer body; ends after the last chunk. */
    static final class ChunkedInputStream extends InputStream {
        private final InputStream in;
        private long remaining;
        private boolean done;

        ChunkedInputStream(InputStream in) {
            this.in = in;
        }

        private boolean nextChunk() throws IOException {
            if (done) {
                return false;
            }
            String size = line(in);
            int semicolon = size.indexOf(';');
            remaining = Long.parseLong((semicolon < 0 ? size : size.substring(0, semicolon)).trim(), 16);
            if (remaining == 0) {
                for (String trailer = line(in); !trailer.isEmpty(); trailer = line(in)) {
                    // trailers are not used by the service
                }
                done = true;
                return false;
            }
            return true;
        }

        @Override
        public int read() throws IOException {
            byte[] one = new byte[1];
            int n = read(one, 0, 1);
            return n < 0 ? -1 : one[0] & 0xFF;
        }

        @Override
        public int read(byte[] b, int off, int len) throws IOException {
            if (remaining == 0 && !nextChunk()) {
                return -1;
            }
            int n = in.read(b, off, (int) Math.min(len, remaining));
            if (n < 0) {
                throw new EOFException("the answer ended inside a chunk");
            }
            remaining -= n;
            if (remaining == 0 && (in.read() != '\r' || in.read() != '\n')) {
                throw new IOException("a chunk does not end with CRLF");
            }
            return n;
        }
    }

    private static final class BoundedInputStream extends InputStream {
        private final InputStream in;
        private long remaining;

        BoundedInputStream(InputStream in, long length) {
            this.in = in;
            this.remaining = length;
        }

        @Override
        public int read() throws IOException {
            if (remaining == 0) {
                return -1;
            }
            int c = in.read();
            if (c >= 0) {
                remaining--;
            }
            return c;
        }

        @Override
        public int read(byte[] b, int off, int len) throws IOException {
            if (remaining == 0) {
                return -1;
            }
            int n = in.read(b, off, (int) Math.min(len, remaining));
            if (n > 0) {
                remaining -= n;
            }
            return n;
        }
    }
}
