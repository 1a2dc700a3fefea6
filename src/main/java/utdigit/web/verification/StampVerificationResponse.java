package utdigit.web.verification;

import com.fasterxml.jackson.annotation.JsonInclude;
import io.swagger.v3.oas.annotations.media.Schema;
import java.util.List;
import tools.jackson.databind.JsonNode;

/** The answer of POST /api/stamp-verifications. */
@Schema(name = "StampVerification", description = "Whether a stamped answer is intact, signed by this service's key, "
        + "and reproduced by recomputing it now from its own inputs.")
record StampVerificationResponse(
        @Schema(description = "The stamped calculation", example = "sampling-assessments") String calculation,
        @Schema(description = "The service version that stamped the document") String stampedServiceVersion,
        @Schema(description = "The version of this service") String serviceVersion,
        @Schema(description = "The sha256 matches the document's canonical content: nothing was altered")
        boolean contentIntact,
        @Schema(description = "The signature is this service's key's HMAC of the content; null when the document is "
                + "unsigned or this service has no key", types = {"boolean", "null"})
        @JsonInclude(JsonInclude.Include.ALWAYS) Boolean signatureValid,
        @Schema(description = "Recomputing from the document's inputs now gives the same results")
        boolean reproducible,
        @Schema(description = "Every value that differs between the document and the recomputation")
        List<Difference> differences,
        @Schema(description = "Notes on the verification (for example a different service version)")
        List<String> notes) {

    /** One value that differs. */
    @Schema(name = "StampDifference")
    record Difference(
            @Schema(description = "JSON Pointer into the document") String pointer,
            @Schema(description = "The value in the document (absent: missing there)") @JsonInclude(JsonInclude.Include.ALWAYS)
            JsonNode stamped,
            @Schema(description = "The value recomputed now (absent: missing there)") @JsonInclude(JsonInclude.Include.ALWAYS)
            JsonNode recomputed) {}
}
