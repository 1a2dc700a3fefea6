package utdigit.web.batch;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.fail;

import java.io.BufferedOutputStream;
import java.io.BufferedReader;
import java.io.File;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.OutputStream;
import java.net.HttpURLConnection;
import java.net.ServerSocket;
import java.net.URI;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;

/**
 * 1,000,000 CSV rows through POST /api/quantization-assessments/batch of the service started in its
 * own JVM with the heap capped at 256 MiB: rows in = rows out, in order, bad rows marked, and the
 * service still alive and healthy afterwards. The body is generated while it is sent and the answer
 * checked while it is read, so neither side of the test holds the batch.
 *
 * <p>Not part of the default build ({@code @Tag("soak")}, excluded by surefire); run it with
 * {@code mvn -B -Psoak verify}. The profile writes the service's runtime classpath to
 * target/soak-classpath.txt. No timed assertion: the wall time and rows/s are printed.
 */
@Tag("soak")
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class BatchSoakTest {
    private static final int ROWS = Integer.getInteger("soak.rows", 1_000_000);
    /** Every 1000th row is bad (bit_depth 0): it must come back INVALID in its place. */
    private static final int BAD_EVERY = 1000;

    private Process server;
    private int port;
    private Path log;

    @BeforeAll
    void startTheServiceWithASmallHeap() throws Exception {
        Path classes = Path.of(System.getProperty("soak.classes.dir", "target/classes"));
        Path classpathFile = Path.of(System.getProperty("soak.classpath.file", "target/soak-classpath.txt"));
        if (!Files.isRegularFile(classpathFile)) {
            fail(classpathFile + " is missing: run the soak test with mvn -B -Psoak verify");
        }
        String classpath = classes.toAbsolutePath() + File.pathSeparator + Files.readString(classpathFile).trim();
        try (ServerSocket s = new ServerSocket(0)) {
            port = s.getLocalPort();
        }
        log = Path.of("target", "soak-service.log");
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        server = new ProcessBuilder(java, "-Xmx256m", "-XX:+ExitOnOutOfMemoryError",
                "-Xlog:gc:file=target/soak-gc.log", "-cp", classpath, "utdigit.UtDigitizationApplication",
                "--server.port=" + port, "--logging.level.root=WARN")
                .redirectErrorStream(true).redirectOutput(log.toFile()).start();
        long deadline = System.nanoTime() + TimeUnit.MINUTES.toNanos(4);
        while (!ready()) {
            if (!server.isAlive()) {
                fail("the service exited with " + server.exitValue() + " before it was ready; see " + log);
            }
            if (System.nanoTime() > deadline) {
                fail("the service was not ready within 4 minutes; see " + log);
            }
            Thread.sleep(500);
        }
    }

    private boolean ready() {
        try {
            HttpURLConnection c = (HttpURLConnection) URI.create("http://localhost:" + port
                    + "/actuator/health/readiness").toURL().openConnection();
            c.setConnectTimeout(1000);
            c.setReadTimeout(5000);
            int status = c.getResponseCode();
            c.disconnect();
            return status == 200;
        } catch (IOException e) {
            return false;
        }
    }

    @AfterAll
    void stopTheService() throws InterruptedException {
        if (server != null) {
            server.destroy();
            if (!server.waitFor(30, TimeUnit.SECONDS)) {
                server.destroyForcibly();
            }
        }
    }

    private static String csvRow(int row) {
        return row % BAD_EVERY == 0 ? "0,40\n" : (1 + row % 32) + "," + (1 + row % 97) + "\n";
    }

    @Test
    void aMillionCsvRowsComeBackOneForOneInOrderUnder256MiB() throws Exception {
        RawHttp.Body body = raw -> {
            OutputStream out = new BufferedOutputStream(raw, 1 << 16);
            out.write("bit_depth,signal_height_percent_fsh\n".getBytes(StandardCharsets.US_ASCII));
            for (int row = 1; row <= ROWS; row++) {
                out.write(csvRow(row).getBytes(StandardCharsets.US_ASCII));
            }
            out.flush();
        };
        long start = System.nanoTime();
        long answered = 0;
        long invalid = 0;
        List<String> mismatches = new ArrayList<>();
        try (RawHttp.Exchange e = RawHttp.open(port, "/api/quantization-assessments/batch",
                List.of("Content-Type: text/csv", "Accept: application/x-ndjson"), body, -1)) {
            assertThat(e.status).isEqualTo(200);
            BufferedReader reader = new BufferedReader(new InputStreamReader(e.body, StandardCharsets.UTF_8), 1 << 16);
            for (String line = reader.readLine(); line != null; line = reader.readLine()) {
                answered++;
                long row = answered;
                String expectedStart;
                String expectedContent;
                if (row % BAD_EVERY == 0) {
                    expectedStart = "{\"row\":" + row + ",\"status\":\"INVALID\"";
                    expectedContent = "\"pointer\":\"/bit_depth\"";
                    invalid++;
                } else {
                    expectedStart = "{\"row\":" + row + ",\"status\":\"OK\"";
                    // levels = 2^N codes of an N-bit converter (definition): the row's own answer
                    expectedContent = "\"levels\":" + (1L << (1 + row % 32)) + ",";
                }
                if ((!line.startsWith(expectedStart) || !line.contains(expectedContent)) && mismatches.size() < 5) {
                    mismatches.add(line.length() > 300 ? line.substring(0, 300) : line);
                }
            }
            assertThat(e.awaitWriter()).as("the body was sent whole").isNull();
        }
        double seconds = (System.nanoTime() - start) / 1e9;
        System.out.printf("soak: %d rows in, %d rows out (%d INVALID) in %.1f s: %.0f rows/s%n",
                ROWS, answered, invalid, seconds, answered / seconds);
        assertThat(mismatches).as("rows out of order or with a wrong answer").isEmpty();
        assertThat(answered).as("rows out").isEqualTo(ROWS);
        assertThat(invalid).isEqualTo(ROWS / BAD_EVERY);
        assertThat(server.isAlive()).as("the service is still running (no OutOfMemoryError); see " + log).isTrue();
        assertThat(ready()).as("the service still answers").isTrue();
        assertThat(Files.readString(log)).doesNotContain("OutOfMemoryError");
        assertTheLiveHeapStayedFlat();
    }

    @Test
    void aRowOfHundredsOfMegabytesIsOneInvalidRowUnder256MiB() throws Exception {
        // 300 MiB in one row, generated while sent: a JSON array posted as NDJSON (one line) and a
        // batch nested in one element of a JSON array. Neither may be held: the heap is 256 MiB.
        byte[] mib = "{\"bit_depth\": 8},".repeat((1 << 20) / 17).getBytes(StandardCharsets.US_ASCII);
        for (String format : List.of("application/x-ndjson", "application/json")) {
            boolean ndjson = format.equals("application/x-ndjson");
            RawHttp.Body body = raw -> {
                OutputStream out = new BufferedOutputStream(raw, 1 << 16);
                out.write((ndjson ? "{\"bit_depth\": 8}\n[" : "[{\"bit_depth\": 8}, [").getBytes(StandardCharsets.US_ASCII));
                for (int i = 0; i < 300; i++) {
                    out.write(mib);
                }
                out.write((ndjson ? "{}]\n{\"bit_depth\": 10}\n" : "{}], {\"bit_depth\": 10}]")
                        .getBytes(StandardCharsets.US_ASCII));
                out.flush();
            };
            List<String> lines = new ArrayList<>();
            try (RawHttp.Exchange e = RawHttp.open(port, "/api/quantization-assessments/batch",
                    List.of("Content-Type: " + format, "Accept: application/x-ndjson"), body, -1)) {
                assertThat(e.status).as(format).isEqualTo(200);
                BufferedReader reader = new BufferedReader(new InputStreamReader(e.body, StandardCharsets.UTF_8));
                for (String line = reader.readLine(); line != null; line = reader.readLine()) {
                    lines.add(line);
                }
                assertThat(e.awaitWriter()).as(format + ": the body was sent whole").isNull();
            }
            assertThat(lines).as(format).hasSize(3);
            assertThat(lines.get(0)).startsWith("{\"row\":1,\"status\":\"OK\"");
            assertThat(lines.get(1)).startsWith("{\"row\":2,\"status\":\"INVALID\"");
            assertThat(lines.get(2)).startsWith("{\"row\":3,\"status\":\"OK\"").contains("\"levels\":1024,");
            assertThat(server.isAlive()).isTrue();
        }
        assertThat(Files.readString(log)).doesNotContain("OutOfMemoryError");
    }

    /**
     * Memory flat: the heap left after each collection (the "before->after(committed)" of the unified
     * GC log) stays under half the 256 MiB cap from start to end; a service that kept rows would grow
     * with them.
     */
    private static void assertTheLiveHeapStayedFlat() throws IOException {
        Pattern pause = Pattern.compile("Pause .*\\b(\\d+)M->(\\d+)M\\((\\d+)M\\)");
        List<Integer> after = new ArrayList<>();
        for (String line : Files.readAllLines(Path.of("target", "soak-gc.log"))) {
            Matcher m = pause.matcher(line);
            if (m.find()) {
                after.add(Integer.parseInt(m.group(2)));
            }
        }
        assertThat(after).as("collections in target/soak-gc.log").isNotEmpty();
        int quarter = Math.max(1, after.size() / 4);
        System.out.printf("soak: %d collections; live heap after GC: max %d MiB in the first quarter, "
                        + "max %d MiB in the last quarter%n", after.size(),
                after.subList(0, quarter).stream().mapToInt(Integer::intValue).max().orElse(0),
                after.subList(after.size() - quarter, after.size()).stream().mapToInt(Integer::intValue).max().orElse(0));
        assertThat(after).as("live heap after each GC, MiB").allSatisfy(mib -> assertThat(mib).isLessThan(128));
    }
}
