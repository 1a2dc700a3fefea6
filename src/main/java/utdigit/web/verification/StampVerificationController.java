package utdigit.web.verification;

import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.tags.Tag;
import org.springframework.http.MediaType;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RestController;

@RestController
@Tag(name = "Stamps", description = "Proof that a value on a sheet is the service's, unaltered")
class StampVerificationController {
    private final StampVerifier verifier;

    StampVerificationController(StampVerifier verifier) {
        this.verifier = verifier;
    }

    @PostMapping(path = "/api/stamp-verifications", consumes = MediaType.APPLICATION_JSON_VALUE,
            produces = MediaType.APPLICATION_JSON_VALUE)
    @Operation(summary = "Verify a stamped answer",
            description = "content_intact: the sha256 over the RFC 8785 canonical JSON (stamp reduced to calculation "
                    + "and service_version) matches. signature_valid: the HMAC-SHA256 signature is this service's key's "
                    + "(null when unsigned or no key is configured). reproducible: recomputing from the document's own "
                    + "inputs now gives the same values; differences lists each that does not.")
    StampVerificationResponse verify(@RequestBody StampVerificationRequest request) {
        return verifier.verify(request.document());
    }
}
