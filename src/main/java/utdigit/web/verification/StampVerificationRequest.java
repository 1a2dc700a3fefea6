package utdigit.web.verification;

import io.swagger.v3.oas.annotations.media.Schema;
import jakarta.validation.constraints.NotNull;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.annotation.JsonDeserialize;

/** POST /api/stamp-verifications. */
@Schema(name = "StampVerificationRequest")
record StampVerificationRequest(
        @JsonDeserialize(using = ExactJsonTree.class)
        @NotNull(message = "is required") JsonNode document) {}
