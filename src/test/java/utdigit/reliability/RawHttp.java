package utdigit.reliability;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.net.InetAddress;
import java.net.Socket;
import java.net.SocketTimeoutException;
import java.nio.charset.StandardCharsets;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;

/**
 * HTTP/1.1 over a plain socket to 127.0.0.1, for what ordinary clients will not do: send a body
 * slowly, stop half-way, lie in Content-Length, send bytes that are not UTF-8.
 */
final class RawHttp implements AutoCloseable {
    static final InetAddress LOOPBACK = InetAddress.getLoopbackAddress();

    final Socket socket;
    private final OutputStream out;
    private final InputStream in;

    RawHttp(int port, int readTimeoutMillis) throws IOException {
        socket = new Socket(LOOPBACK, port);
        socket.setSoTimeout(readTimeoutMillis);
        socket.setTcpNoDelay(true);
        out = socket.getOutputStream();
        in = socket.getInputStream();
    }

    /** Sends the request line and headers (Host added). */
    RawHttp head(String method, String path, Map<String, String> headers) throws IOException {
        StringBuilder b = new StringBuilder(method).append(' ').append(path).append(" HTTP/1.1\r\n")
                .append("Host: 127.0.0.1\r\n");
        headers.forEach((k, v) -> b.append(k).append(": ").append(v).append("\r\n"));
        b.append("\r\n");
        out.write(b.toString().getBytes(StandardCharsets.ISO_8859_1));
        out.flush();
        return this;
    }

    RawHttp send(byte[] bytes) throws IOException {
        out.write(bytes);
        out.flush();
        return this;
    }

    /** Reads one answer: status, headers and a body framed by Content-Length or chunked. */
    Answer read() throws IOException {
        String statusLine = line();
        if (statusLine == null) {
            throw new IOException("connection closed before an answer");
        }
        int status = Integer.parseInt(statusLine.split(" ")[1]);
        Map<String, String> headers = new LinkedHashMap<>();
        for (String l = line(); l != null && !l.isEmpty(); l = line()) {
            int colon = l.indexOf(':');
            headers.put(l.substring(0, colon).trim().toLowerCase(Locale.ROOT), l.substring(colon + 1).trim());
        }
        ByteArrayOutputStream body = new ByteArrayOutputStream();
        if (headers.containsKey("content-length")) {
            body.write(in.readNBytes(Integer.parseInt(headers.get("content-length"))));
        } else if ("chunked".equalsIgnoreCase(headers.get("transfer-encoding"))) {
            for (int size = Integer.parseInt(line().trim(), 16); size > 0; size = Integer.parseInt(line().trim(), 16)) {
                body.write(in.readNBytes(size));
                line();
            }
            line();
        }
        return new Answer(status, headers, body.toString(StandardCharsets.UTF_8));
    }

    /** True when the server has closed the connection (end of stream or reset) within the timeout. */
    boolean closedByServer() {
        try {
            return in.read() < 0;
        } catch (SocketTimeoutException e) {
            return false;
        } catch (IOException e) {
            return true;
        }
    }

    private String line() throws IOException {
        ByteArrayOutputStream b = new ByteArrayOutputStream();
        int c;
        while ((c = in.read()) >= 0) {
            if (c == '\n') {
                break;
            }
            if (c != '\r') {
                b.write(c);
            }
        }
        if (c < 0 && b.size() == 0) {
            return null;
        }
        return b.toString(StandardCharsets.ISO_8859_1);
    }

    @Override
    public void close() {
        try {
            socket.close();
        } catch (IOException ignored) {
            // closing a socket the server may already have closed
        }
    }

    record Answer(int status, Map<String, String> headers, String body) {}
}
