package utdigit.web.stamp;

import java.io.OutputStream;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import javax.crypto.Mac;
import org.springframework.beans.factory.annotation.Value;
import org.springframework.stereotype.Component;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ObjectNode;

/**
 * Adds the tamper-evident stamp to an answer: sha256 over the RFC 8785 canonical JSON of the whole
 * answer with {@code stamp} reduced to {calculation, service_version}, and, with an operator key,
 * an HMAC-SHA256 signature over the same bytes with the key's id.
 */
@Component
public class Stamper {
    public static final String STAMP = "stamp";
    private static final MessageDigest SHA256 = newSha256();
    private static final HexFormat HEX = HexFormat.of();

    private final String serviceVersion;
    private final StampKey key;
    private final CanonicalWriter canonical;

    Stamper(@Value("${utdigit.service-version}") String serviceVersion,
            @Value("${utdigit.stamp.key:}") String keyText,
            @Value("${utdigit.stamp.key-id:}") String keyId,
            JsonMapper mapper) {
        this.serviceVersion = serviceVersion;
        this.key = StampKey.of(keyText, keyId);
        this.canonical = new CanonicalWriter(mapper);
    }

    public String serviceVersion() {
        return serviceVersion;
    }

    public StampKey key() {
        return key;
    }

    /**
     * Stamps a typed answer: its canonical bytes (RFC 8785, with the stamp reduced to {calculation,
     * service_version}) are written once, straight into SHA-256 and, with a key, HMAC-SHA256. Its
     * numbers are checked as they are written: when one
     * has no finite value (written as null), {@code notRepresentable} gives the message of the
     * RESULT_NOT_REPRESENTABLE warning that names them, and the answer is stamped again with it.
     * Every number is looked at once, in the pass the stamp needs anyway.
     */
    public <A> Stamped<A> stamp(String calculation, A answer, java.util.function.Function<A, String> notRepresentable) {
        NonFiniteSeen seen = new NonFiniteSeen();
        Stamped<A> stamped = stampOnce(calculation, answer, null, seen);
        return seen.any ? stampOnce(calculation, answer, notRepresentable.apply(answer)) : stamped;
    }

    /** Set when a canonical pass met a number with no finite value. */
    static final class NonFiniteSeen {
        boolean any;
    }

    private <A> Stamped<A> stampOnce(String calculation, A answer, String notRepresentable) {
        return stampOnce(calculation, answer, notRepresentable, new NonFiniteSeen());
    }

    private <A> Stamped<A> stampOnce(String calculation, A answer, String notRepresentable, NonFiniteSeen seen) {
        Stamped<A> unsigned = new Stamped<>(answer, calculation, serviceVersion, null, null, null, notRepresentable);
        MessageDigest sha256 = sha256();
        Mac mac = key.configured() ? key.mac() : null;
        canonical.write(unsigned, seen, new OutputStream() {
            @Override
            public void write(int b) {
                sha256.update((byte) b);
                if (mac != null) {
                    mac.update((byte) b);
                }
            }

            @Override
            public void write(byte[] b, int off, int len) {
                sha256.update(b, off, len);
                if (mac != null) {
                    mac.update(b, off, len);
                }
            }
        });
        String sha = HEX.formatHex(sha256.digest());
        return mac == null ? new Stamped<>(answer, calculation, serviceVersion, sha, null, null, notRepresentable)
                : new Stamped<>(answer, calculation, serviceVersion, sha, StampKey.encode(mac.doFinal()), key.keyId(),
                        notRepresentable);
    }

    /** The canonical bytes the stamp of {@code answer} covers (for tests and tools). */
    public static byte[] coveredBytes(JsonMapper mapper, Stamped<?> answer) {
        java.io.ByteArrayOutputStream out = new java.io.ByteArrayOutputStream();
        new CanonicalWriter(mapper).write(answer, new NonFiniteSeen(), out);
        return out.toByteArray();
    }

    /**
     * A fresh SHA-256: a copy of one looked up once (the provider look-up of getInstance was 1 % of
     * a light request's CPU in a JFR profile, src/docs/performance.md).
     */
    private static MessageDigest sha256() {
        try {
            return (MessageDigest) SHA256.clone();
        } catch (CloneNotSupportedException e) {
            return newSha256();
        }
    }

    private static MessageDigest newSha256() {
        try {
            return MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required of every Java platform", e);
        }
    }

    /**
     * The canonical bytes a stamp covers for a document as received: a copy with its stamp reduced
     * to {calculation, service_version}.
     */
    public static byte[] coveredBytes(JsonNode document) {
        ObjectNode copy = (ObjectNode) document.deepCopy();
        JsonNode stamp = copy.get(STAMP);
        ObjectNode reduced = copy.putObject(STAMP);
        if (stamp != null && stamp.isObject()) {
            if (stamp.has("calculation")) {
                reduced.set("calculation", stamp.get("calculation"));
            }
            if (stamp.has("service_version")) {
                reduced.set("service_version", stamp.get("service_version"));
            }
        }
        return CanonicalJson.bytes(copy);
    }
}
