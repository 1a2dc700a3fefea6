package utdigit.web.metrics;

import io.micrometer.core.instrument.Counter;
import io.micrometer.core.instrument.MeterRegistry;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import org.springframework.stereotype.Component;

/**
 * The service's own counters, the one request metric (the actuator's {@code http.server.requests}
 * observation is excluded, application.yml): API requests by endpoint and answer status, and batch rows by calculation and row status. They live
 * in the actuator's registry, so any registry on the classpath exports them (Prometheus:
 * {@code utdigit_requests_total}, {@code utdigit_batch_rows_total}).
 *
 * <p>Tag values come from a closed set (the service's own endpoint patterns and calculation names,
 * the row statuses OK, INVALID, LIMIT_REACHED), never from what a caller sends, so the number of
 * series stays bounded.
 */
@Component
public class ServiceMetrics {
    /** API requests answered: tags endpoint (path pattern below /api/), method, status (HTTP code). */
    public static final String REQUESTS = "utdigit.requests";
    /** Batch rows answered: tags calculation (path name), status (OK, INVALID or LIMIT_REACHED). */
    public static final String BATCH_ROWS = "utdigit.batch.rows";

    private final MeterRegistry registry;
    private final Map<String, Counter> counters = new ConcurrentHashMap<>();

    ServiceMetrics(MeterRegistry registry) {
        this.registry = registry;
    }

    /** Counts one answered API request. */
    public void request(String endpoint, String method, int status) {
        String key = REQUESTS + ' ' + endpoint + ' ' + method + ' ' + status;
        counters.computeIfAbsent(key, k -> Counter.builder(REQUESTS)
                .description("API requests answered, by endpoint, method and HTTP status")
                .tag("endpoint", endpoint).tag("method", method).tag("status", Integer.toString(status))
                .register(registry)).increment();
    }

    /** Counts one batch row written to the answer stream. */
    public void batchRow(String calculation, String status) {
        String key = BATCH_ROWS + ' ' + calculation + ' ' + status;
        counters.computeIfAbsent(key, k -> Counter.builder(BATCH_ROWS)
                .description("Batch rows answered, by calculation and row status")
                .tag("calculation", calculation).tag("status", status)
                .register(registry)).increment();
    }
}
