package utdigit.web.limits;

import jakarta.servlet.FilterChain;
import jakarta.servlet.ServletException;
import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;
import java.io.IOException;
import java.util.concurrent.Semaphore;
import org.springframework.http.HttpHeaders;
import org.springframework.web.filter.OncePerRequestFilter;
import utdigit.web.problem.ProblemType;

/**
 * At most {@code utdigit.http.max-concurrent-batches} batch requests at a time. A batch body is
 * streamed and read on the request's worker thread for as long as it lasts, so a batch client that
 * trickles its body holds that thread. Capping the batches in progress caps the threads they can
 * hold, whatever their clients do, and leaves the rest for single requests. One more batch is a 503
 * problem with Retry-After; its body is not read.
 */
// Tomcat has no per-path limit and Spring's ConcurrencyThrottleInterceptor waits instead of refusing.
final class BatchConcurrencyFilter extends OncePerRequestFilter {
    static final int RETRY_AFTER_SECONDS = 5;
    private final Semaphore slots;
    private final int max;
    private final ProblemResponses problems;

    BatchConcurrencyFilter(int max, ProblemResponses problems) {
        this.max = max;
        this.slots = new Semaphore(max);
        this.problems = problems;
    }

    @Override
    protected boolean shouldNotFilter(HttpServletRequest request) {
        return !RequestBodyFilter.isBatch(request);
    }

    @Override
    protected void doFilterInternal(HttpServletRequest request, HttpServletResponse response, FilterChain chain)
            throws ServletException, IOException {
        if (!slots.tryAcquire()) {
            response.setHeader(HttpHeaders.RETRY_AFTER, Integer.toString(RETRY_AFTER_SECONDS));
            problems.writeAndClose(request, response, ProblemType.SERVICE_BUSY, max + " batches are in progress, "
                    + "the most this service runs at once; retry after " + RETRY_AFTER_SECONDS + " s");
            return;
        }
        try {
            chain.doFilter(request, response);
        } finally {
            slots.release();
        }
    }
}
