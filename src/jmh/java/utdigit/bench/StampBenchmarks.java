package utdigit.bench;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;
import utdigit.web.stamp.CanonicalJson;

/**
 * The stamp path of every answer: RFC 8785 canonical bytes of a typical answer tree (the pulse
 * parameters example answer of api-examples/, 19 result numbers, inputs, velocity source, six
 * references) and their SHA-256; and the canonical number form alone, on doubles like those of
 * an answer (a random mantissa, exponents of typical results).
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.SampleTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
public class StampBenchmarks {
    /** The answer read, relative to the project directory (where Maven starts JMH). */
    static final String ANSWER = System.getProperty("utdigit.bench.answer", "api-examples/pulse-parameters.answer.json");

    private static final int NUMBERS = 1024;

    private JsonNode answer;
    private MessageDigest sha256;
    private final double[] numbers = new double[NUMBERS];
    private int next;

    @Setup
    public void setUp() throws IOException, NoSuchAlgorithmException {
        answer = JsonMapper.builder().build().readTree(Files.readString(Path.of(ANSWER)));
        sha256 = MessageDigest.getInstance("SHA-256");
        SplittableRandom random = new SplittableRandom(8785);
        for (int i = 0; i < NUMBERS; i++) {
            // a double in [1e-4, 1e5): the span of typical result magnitudes
            numbers[i] = StrictMath.pow(10.0, -4.0 + 9.0 * random.nextDouble());
        }
    }

    @Benchmark
    public byte[] canonicalBytes() {
        return CanonicalJson.bytes(answer);
    }

    @Benchmark
    public byte[] canonicalBytesAndSha256() {
        return sha256.digest(CanonicalJson.bytes(answer));
    }

    @Benchmark
    public String canonicalNumber() {
        next = (next + 1) & (NUMBERS - 1);
        return CanonicalJson.number(numbers[next]);
    }
}
