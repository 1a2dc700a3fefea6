package utdigit.web.stamp;

import io.swagger.v3.oas.annotations.media.Schema;
import jakarta.validation.constraints.NotNull;
import tools.jackson.databind.JsonNode;

/** POST /api/stamp-verifications. */
@Schema(name = "StampVerificationRequest")
record StampVerificationRequest(
        @Schema(description = "A calculation answer returned earlier by this service, unchanged, with its stamp: "
                + "the answer's JSON exactly as received (keep the bytes, not a model re-serialized from them)")
        @NotNull(message = "is required") JsonNode document) {}
