package utdigit.web.limits;

import jakarta.servlet.AsyncContext;
import jakarta.servlet.AsyncEvent;
import jakarta.servlet.AsyncListener;
import jakarta.servlet.DispatcherType;
import jakarta.servlet.FilterChain;
import jakarta.servlet.ReadListener;
import jakarta.servlet.ServletException;
import jakarta.servlet.ServletInputStream;
import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.time.Duration;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.regex.Pattern;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.springframework.web.filter.OncePerRequestFilter;
import utdigit.web.problem.ProblemType;

/**
 * Reads every request body except the streamed batch bodies in full before anything else sees it:
 * at most {@code utdigit.json.max-body-bytes} (a larger Content-Length is a 413 before any byte is
 * read; a chunked body that grows past it is a 413 when it does), within
 * {@code utdigit.http.body-read-timeout} (a body not complete by then is a 408).
 *
 * <p>Why: a servlet container reads a body with a blocking read that holds a worker thread until
 * the bytes arrive, so a few hundred clients that each send a byte a second would hold every thread
 * and starve everyone else. Here a body already in the connection's buffer (the usual case: a small
 * JSON object arrives with its headers) is taken at once on the request's thread; otherwise the
 * request goes asynchronous and the rest is collected by a non-blocking read listener, which runs
 * only when bytes have arrived and holds no thread in between. When the body is complete the request
 * is dispatched again with the body in memory; the deadline is the asynchronous timeout. A rejected
 * body is never drained: the connection is closed after the problem answer.
 */
// Hand-written because Tomcat caps only form and multipart bodies (maxPostSize) and Spring reads a
// @RequestBody with blocking reads; BodyLimitsTest and SlowClientsTest hold it to the cap and deadline.
public final class RequestBodyFilter extends OncePerRequestFilter {
    static final String BODY = RequestBodyFilter.class.getName() + ".BODY";
    private static final Pattern BATCH = Pattern.compile("/api/[^/]+/batch/?");
    private static final Logger log = LoggerFactory.getLogger(RequestBodyFilter.class);
    private static final int CHUNK = 8192;

    private final long maxBodyBytes;
    private final Duration readTimeout;
    private final ProblemResponses problems;

    RequestBodyFilter(long maxBodyBytes, Duration readTimeout, ProblemResponses problems) {
        this.maxBodyBytes = maxBodyBytes;
        this.readTimeout = readTimeout;
        this.problems = problems;
    }

    @Override
    protected boolean shouldNotFilterAsyncDispatch() {
        return false;
    }

    @Override
    protected boolean shouldNotFilter(HttpServletRequest request) {
        if (request.getDispatcherType() == DispatcherType.ASYNC) {
            return request.getAttribute(BODY) == null;
        }
        return !hasBody(request) || isBatch(request);
    }

    @Override
    protected void doFilterInternal(HttpServletRequest request, HttpServletResponse response, FilterChain chain)
            throws ServletException, IOException {
        if (request.getDispatcherType() == DispatcherType.ASYNC) {
            byte[] body = (byte[]) request.getAttribute(BODY);
            request.removeAttribute(BODY);
            chain.doFilter(new BufferedBodyRequest(request, body), response);
            return;
        }
        long declared = request.getContentLengthLong();
        if (declared > maxBodyBytes) {
            tooLarge(request, response, declared);
            return;
        }
        ServletInputStream in = request.getInputStream();
        ByteArrayOutputStream body = new ByteArrayOutputStream(declared > 0 ? (int) declared : CHUNK);
        byte[] chunk = new byte[CHUNK];
        // What is already buffered is read without blocking (available() > 0 means a read returns
        // without waiting for the network).
        while (!in.isFinished() && in.available() > 0) {
            int n = in.read(chunk);
            if (n < 0) {
                break;
            }
            body.write(chunk, 0, n);
            if (body.size() > maxBodyBytes) {
                tooLarge(request, response, -1);
                return;
            }
        }
        if (in.isFinished() || (declared >= 0 && body.size() == declared)) {
            chain.doFilter(new BufferedBodyRequest(request, body.toByteArray()), response);
            return;
        }
        AsyncContext async = request.startAsync();
        async.setTimeout(readTimeout.toMillis());
        Collector collector = new Collector(request, response, async, in, body);
        async.addListener(collector);
        in.setReadListener(collector);
    }

    private void tooLarge(HttpServletRequest request, HttpServletResponse response, long declared) throws IOException {
        problems.writeAndClose(request, response, ProblemType.PAYLOAD_TOO_LARGE, "the request body "
                + (declared >= 0 ? "(" + declared + " bytes) " : "") + "is larger than the " + maxBodyBytes
                + " bytes this endpoint accepts" + (request.getRequestURI().startsWith(request.getContextPath() + "/api/")
                ? "; send many requests through the batch form of the endpoint (POST .../batch)" : ""));
    }

    /** Collects the rest of a body without blocking; answers 408 at the deadline, 413 over the cap. */
    private final class Collector implements ReadListener, AsyncListener {
        private final HttpServletRequest request;
        private final HttpServletResponse response;
        private final AsyncContext async;
        private final ServletInputStream in;
        private final ByteArrayOutputStream body;
        private final byte[] chunk = new byte[CHUNK];
        private final AtomicBoolean done = new AtomicBoolean();

        Collector(HttpServletRequest request, HttpServletResponse response, AsyncContext async,
                  ServletInputStream in, ByteArrayOutputStream body) {
            this.request = request;
            this.response = response;
            this.async = async;
            this.in = in;
            this.body = body;
        }

        @Override
        public void onDataAvailable() throws IOException {
            while (!done.get() && in.isReady()) {
                int n = in.read(chunk);
                if (n < 0) {
                    return;
                }
                body.write(chunk, 0, n);
                if (body.size() > maxBodyBytes && done.compareAndSet(false, true)) {
                    tooLarge(request, response, -1);
                    async.complete();
                    return;
                }
            }
        }

        @Override
        public void onAllDataRead() {
            if (done.compareAndSet(false, true)) {
                request.setAttribute(BODY, body.toByteArray());
                async.dispatch();
            }
        }

        @Override
        public void onError(Throwable t) {
            // The client went away or the connection failed while the body was arriving.
            if (done.compareAndSet(false, true)) {
                log.debug("request body read failed", t);
                async.complete();
            }
        }

        @Override
        public void onTimeout(AsyncEvent event) throws IOException {
            if (done.compareAndSet(false, true)) {
                problems.writeAndClose(request, response, ProblemType.REQUEST_TIMEOUT, "the request body did not "
                        + "arrive within " + readTimeout.toSeconds() + " s (" + body.size() + " bytes received); "
                        + "send the whole body promptly");
                async.complete();
            }
        }

        @Override
        public void onComplete(AsyncEvent event) {
            // nothing to release: the body buffer goes with the request
        }

        @Override
        public void onError(AsyncEvent event) {
            onError(event.getThrowable());
        }

        @Override
        public void onStartAsync(AsyncEvent event) {
            // not restarted
        }
    }

    public static boolean hasBody(HttpServletRequest request) {
        return request.getContentLengthLong() > 0 || request.getHeader("Transfer-Encoding") != null;
    }

    /** The streamed batch endpoints, whose bodies are read by the batch component itself. */
    static boolean isBatch(HttpServletRequest request) {
        return BATCH.matcher(path(request)).matches();
    }

    static String path(HttpServletRequest request) {
        return request.getRequestURI().substring(request.getContextPath().length());
    }
}
