package utdigit.web.verification;

import io.swagger.v3.oas.annotations.media.Schema;
import jakarta.validation.constraints.NotNull;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.annotation.JsonDeserialize;

/** POST /api/stamp-verifications. */
@Schema(name = "StampVerificationRequest")
record StampVerificationRequest(
        @Schema(description = "A calculation answer returned earlier by this service, unchanged, with its stamp: "
                + "the answer's JSON exactly as received (keep the bytes, not a model re-serialized from them). "
                + "I-JSON (RFC 7493): a number that is not exactly an IEEE 754 double (1e400, 1e-400, an integer "
                + "beyond 2^53 that a double cannot hold) or a string with a lone UTF-16 surrogate, anywhere in it, "
                + "is a 400 at its pointer; numbers are compared exactly")
        @JsonDeserialize(using = ExactJsonTree.class)
        @NotNull(message = "is required") JsonNode document) {}
