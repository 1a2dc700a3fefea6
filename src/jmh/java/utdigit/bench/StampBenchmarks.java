package utdigit.bench;

import java.io.IOException;
import java.lang.invoke.MethodHandle;
import java.lang.invoke.MethodHandles;
import java.lang.invoke.MethodType;
import java.lang.reflect.Method;
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
 * an answer (a random mantissa, exponents of typical results), by the fast path that the service
 * uses and by the BigDecimal reference path (package-private, reached by reflection) for comparison.
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
    private MethodHandle referenceNumber;

    @Setup
    public void setUp() throws IOException, NoSuchAlgorithmException, ReflectiveOperationException {
        answer = JsonMapper.builder().build().readTree(Files.readString(Path.of(ANSWER)));
        sha256 = MessageDigest.getInstance("SHA-256");
        SplittableRandom random = new SplittableRandom(8785);
        for (int i = 0; i < NUMBERS; i++) {
            // a double in [1e-4, 1e5): the span of typical result magnitudes
            numbers[i] = StrictMath.pow(10.0, -4.0 + 9.0 * random.nextDouble());
        }
        try {
            Method m = CanonicalJson.class.getDeclaredMethod("referenceNumber", double.class);
            m.setAccessible(true);
            referenceNumber = MethodHandles.lookup().unreflect(m);
        } catch (ReflectiveOperationException e) {
            referenceNumber = MethodHandles.lookup().findStatic(CanonicalJson.class, "number",
                    MethodType.methodType(String.class, double.class)); // before the fast path existed
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

    @Benchmark
    public String canonicalNumberReference() throws Throwable {
        next = (next + 1) & (NUMBERS - 1);
        return (String) referenceNumber.invokeExact(numbers[next]);
    }
}
