package utdigit.web.stamp;

import java.nio.charset.StandardCharsets;
import java.security.InvalidKeyException;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.Base64;
import java.util.HexFormat;
import javax.crypto.Mac;
import javax.crypto.spec.SecretKeySpec;

/**
 * Hashing and the optional HMAC-SHA256 signing key of stamps. The key is never logged or
 * returned; {@link #toString()} hides it.
 */
public final class StampKey {
    private final byte[] key;
    private final String keyId;
    /** HMAC-SHA256 with the key set, copied for each answer; only read after construction. */
    private final Mac macPrototype;

    private StampKey(byte[] key, String keyId) {
        this.key = key;
        this.keyId = keyId;
        this.macPrototype = key == null ? null : newMac();
    }

    /** A key from its text (UTF-8 bytes) and id; an empty or null text means "no key". */
    public static StampKey of(String keyText, String keyId) {
        if (keyText == null || keyText.isEmpty()) {
            return new StampKey(null, null);
        }
        String id = keyId == null || keyId.isBlank() ? "default" : keyId;
        return new StampKey(keyText.getBytes(StandardCharsets.UTF_8), id);
    }

    public boolean configured() {
        return key != null;
    }

    public String keyId() {
        return keyId;
    }

    /** Lower-case hex SHA-256 of {@code bytes}. */
    public static String sha256Hex(byte[] bytes) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required of every Java platform", e);
        }
    }

    /** Unpadded base64url HMAC-SHA256 of {@code bytes}; only when {@link #configured()}. */
    public String sign(byte[] bytes) {
        return encode(mac().doFinal(bytes));
    }

    /**
     * A fresh HMAC-SHA256 with this key, to be fed incrementally; only when {@link #configured()}.
     * A copy of one made once: no provider look-up and key set-up per answer.
     */
    Mac mac() {
        try {
            return (Mac) macPrototype.clone();
        } catch (CloneNotSupportedException e) {
            return newMac();
        }
    }

    private Mac newMac() {
        try {
            Mac mac = Mac.getInstance("HmacSHA256");
            mac.init(new SecretKeySpec(key, "HmacSHA256"));
            return mac;
        } catch (NoSuchAlgorithmException | InvalidKeyException e) {
            throw new IllegalStateException("HmacSHA256 is required of every Java platform", e);
        }
    }

    /** A signature's text: unpadded base64url. */
    static String encode(byte[] signature) {
        return Base64.getUrlEncoder().withoutPadding().encodeToString(signature);
    }

    /** Whether {@code signature} is this key's signature of {@code bytes} (constant-time compare). */
    public boolean verify(byte[] bytes, String signature) {
        byte[] expected = sign(bytes).getBytes(StandardCharsets.US_ASCII);
        byte[] given = signature.getBytes(StandardCharsets.US_ASCII);
        return MessageDigest.isEqual(expected, given);
    }

    @Override
    public String toString() {
        return configured() ? "StampKey[" + keyId + "]" : "StampKey[none]";
    }
}
