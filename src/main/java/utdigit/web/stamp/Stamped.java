package utdigit.web.stamp;

import tools.jackson.databind.annotation.JsonSerialize;

/**
 * A typed answer with its stamp, as the service sends it: the answer's members, then {@code stamp}
 * ({@link StampedSerializer}). The stamp's sha256 (and signature) covers the RFC 8785 canonical
 * form of exactly this document with the stamp reduced to {calculation, service_version}.
 *
 * @param answer the calculation's answer record
 * @param calculation the calculation's path name
 * @param serviceVersion the version of the service that computed it
 * @param sha256 lower-case hex SHA-256 of the canonical bytes
 * @param signature unpadded base64url HMAC-SHA256 of the same bytes, or null without a key
 * @param keyId the signing key's id, or null without a key
 * @param notRepresentable null, or the message of a RESULT_NOT_REPRESENTABLE warning written after
 *     the answer's own warnings (the figures it names are written as null)
 * @param <A> the answer record
 */
@JsonSerialize(using = StampedSerializer.class)
public record Stamped<A>(A answer, String calculation, String serviceVersion, String sha256, String signature,
                         String keyId, String notRepresentable) {

    /** The code of the warning added for figures with no finite value. */
    public static final String NOT_REPRESENTABLE = "RESULT_NOT_REPRESENTABLE";
}
