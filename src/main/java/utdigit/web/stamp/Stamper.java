package utdigit.web.stamp;

import org.springframework.beans.factory.annotation.Value;
import org.springframework.stereotype.Component;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.node.ObjectNode;

/**
 * Adds the tamper-evident stamp to an answer: sha256 over the RFC 8785 canonical JSON of the whole
 * answer with {@code stamp} reduced to {calculation, service_version}, and, with an operator key,
 * an HMAC-SHA256 signature over the same bytes with the key's id.
 */
@Component
public class Stamper {
    static final String STAMP = "stamp";

    private final String serviceVersion;
    private final StampKey key;

    Stamper(@Value("${utdigit.service-version}") String serviceVersion,
            @Value("${utdigit.stamp.key:}") String keyText,
            @Value("${utdigit.stamp.key-id:}") String keyId) {
        this.serviceVersion = serviceVersion;
        this.key = StampKey.of(keyText, keyId);
    }

    public String serviceVersion() {
        return serviceVersion;
    }

    StampKey key() {
        return key;
    }

    /** Stamps {@code answer} in place (the stamp is its last member) and returns it. */
    public ObjectNode stamp(String calculation, ObjectNode answer) {
        answer.remove(STAMP);
        ObjectNode stamp = answer.putObject(STAMP);
        stamp.put("calculation", calculation);
        stamp.put("service_version", serviceVersion);
        byte[] canonical = CanonicalJson.bytes(answer);
        stamp.put("sha256", StampKey.sha256Hex(canonical));
        if (key.configured()) {
            stamp.put("signature", key.sign(canonical));
            stamp.put("key_id", key.keyId());
        }
        return answer;
    }

    /**
     * The canonical bytes a stamp covers for a document as received: a copy with its stamp reduced
     * to {calculation, service_version}.
     */
    static byte[] coveredBytes(JsonNode document) {
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
