package utdigit.web.verification;

import com.fasterxml.jackson.annotation.JsonInclude;
import io.swagger.v3.oas.annotations.media.Schema;
import java.util.List;
import tools.jackson.databind.JsonNode;

/** The answer of POST /api/stamp-verifications. */
@Schema(name = "StampVerification", description = "Whether a stamped answer is intact, signed by this service's key, "
        + "and reproduced by recomputing it now from its own inputs.")
record StampVerificationResponse(
        String calculation,
        String stampedServiceVersion,
        String serviceVersion,
        boolean contentIntact,
        @JsonInclude(JsonInclude.Include.ALWAYS) Boolean signatureValid,
        boolean reproducible,
        List<Difference> differences,
        List<String> notes) {

    /** One value that differs. */
    @Schema(name = "StampDifference", description = "Every value that differs between the document and the recomputation")
    record Difference(
            String pointer,
            @JsonInclude(JsonInclude.Include.ALWAYS)
            JsonNode stamped,
            @JsonInclude(JsonInclude.Include.ALWAYS)
            JsonNode recomputed) {}
}
