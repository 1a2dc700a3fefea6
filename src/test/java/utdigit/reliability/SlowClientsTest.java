package utdigit.reliability;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.OutputStream;
import java.net.Socket;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Executors;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import utdigit.web.support.ApiTest;

/**
 * Slow clients do not starve normal ones. 300 clients each open a POST with Content-Length 1000
 * and send one byte every 500 ms (reconnecting at once whenever the service closes them) for 15 s,
 * while one normal client sends a calculation every 20 ms on a new connection. At least 99 % of the
 * normal requests must succeed, with p99 latency under 500 ms. Bounded: 127.0.0.1 only, 15 s, at
 * most 300 slow connections open at a time. Tagged "slow" (about 40 s with start-up): run with
 * {@code mvn -B test -Dtest=SlowClientsTest -Dtest.excludedGroups=none}.
 */
@Tag("slow")
class SlowClientsTest extends ApiTest {
    static final int SLOW_CLIENTS = 300;
    static final long DURATION_MILLIS = 15_000;
    static final long TRICKLE_MILLIS = 500;
    static final String NORMAL_PATH = "/api/quantization-assessments";
    static final String NORMAL_BODY = "{\"bit_depth\": 12, \"signal_height_percent_fsh\": 40}";

    @Test
    void slowSingleBodiesDoNotStarveNormalRequests() throws Exception {
        assertNormalRequestsSurvive("/api/quantization-assessments", "application/json", 0);
    }

    /**
     * Batch bodies are streamed on a worker thread; at most utdigit.http.max-concurrent-batches of
     * them run at once and the others are refused (503, Retry-After 5 s). These slow clients come
     * back after the Retry-After; clients that reconnect as fast as they are closed are a request
     * flood, for a rate limit in front of the service.
     */
    @Test
    void slowBatchBodiesDoNotStarveNormalRequests() throws Exception {
        assertNormalRequestsSurvive("/api/quantization-assessments/batch", "application/x-ndjson", 5000);
    }

    private void assertNormalRequestsSurvive(String slowPath, String slowType, long reconnectAfterMillis)
            throws Exception {
        byte[] head = ("POST " + slowPath + " HTTP/1.1\r\nHost: 127.0.0.1\r\nContent-Type: " + slowType
                + "\r\nContent-Length: 1000\r\n\r\n").getBytes(StandardCharsets.US_ASCII);
        Socket[] slow = new Socket[SLOW_CLIENTS];
        long[] closedAt = new long[SLOW_CLIENTS];
        AtomicInteger reconnects = new AtomicInteger();
        for (int i = 0; i < SLOW_CLIENTS; i++) {
            slow[i] = open(head);
        }
        ScheduledExecutorService trickle = Executors.newSingleThreadScheduledExecutor();
        long end = System.currentTimeMillis() + DURATION_MILLIS;
        trickle.scheduleAtFixedRate(() -> {
            long now = System.currentTimeMillis();
            for (int i = 0; i < SLOW_CLIENTS; i++) {
                try {
                    if (slow[i] == null) {
                        if (now - closedAt[i] < reconnectAfterMillis) {
                            continue;
                        }
                        slow[i] = open(head);
                        reconnects.incrementAndGet();
                    }
                    OutputStream out = slow[i].getOutputStream();
                    out.write(' ');
                    out.flush();
                } catch (IOException closedByService) {
                    close(slow[i]);
                    slow[i] = null;
                    closedAt[i] = now;
                }
            }
        }, TRICKLE_MILLIS, TRICKLE_MILLIS, TimeUnit.MILLISECONDS);

        List<Long> latencies = new ArrayList<>();
        int succeeded = 0;
        int sent = 0;
        try {
            while (System.currentTimeMillis() < end) {
                long start = System.nanoTime();
                sent++;
                try (RawHttp c = new RawHttp(port, 5000)) {
                    c.head("POST", NORMAL_PATH, Map.of("Content-Type", "application/json", "Connection", "close",
                            "Content-Length", Integer.toString(NORMAL_BODY.length())));
                    c.send(NORMAL_BODY.getBytes(StandardCharsets.US_ASCII));
                    if (c.read().status() == 200) {
                        succeeded++;
                    }
                } catch (IOException timeoutOrRefused) {
                    // counted as a failure
                }
                latencies.add((System.nanoTime() - start) / 1_000_000);
                Thread.sleep(20);
            }
        } finally {
            trickle.shutdownNow();
            trickle.awaitTermination(5, TimeUnit.SECONDS);
            for (Socket s : slow) {
                close(s);
            }
        }
        Collections.sort(latencies);
        long p50 = latencies.get(latencies.size() / 2);
        long p99 = latencies.get((int) Math.ceil(latencies.size() * 0.99) - 1);
        double percent = 100.0 * succeeded / sent;
        System.out.printf("Slow clients on %s: %d slow clients (1 byte / %d ms, Content-Length 1000) for %d s; "
                        + "normal requests: %d sent, %d succeeded (%.2f %%), p50 %d ms, p99 %d ms, max %d ms; "
                        + "slow connections closed by the service and reopened: %d%n",
                slowPath, SLOW_CLIENTS, TRICKLE_MILLIS, DURATION_MILLIS / 1000, sent, succeeded, percent, p50, p99,
                latencies.get(latencies.size() - 1), reconnects.get());
        assertThat(percent).isGreaterThanOrEqualTo(99.0);
        assertThat(p99).isLessThan(500);
    }

    private Socket open(byte[] head) throws IOException {
        Socket s = new Socket(RawHttp.LOOPBACK, port);
        s.setTcpNoDelay(true);
        s.getOutputStream().write(head);
        s.getOutputStream().flush();
        return s;
    }

    private static void close(Socket s) {
        try {
            if (s != null) {
                s.close();
            }
        } catch (IOException ignored) {
            // already closed by the service
        }
    }
}
