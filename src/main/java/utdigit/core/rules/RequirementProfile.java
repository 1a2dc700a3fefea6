package utdigit.core.rules;

import java.util.List;
import java.util.Objects;

/**
 * A named set of rules a technique sheet is checked against, with the documents it transcribes and
 * whether it was verified.
 *
 * @param sha256 lower-case hex SHA-256 of the profile's canonical content (set by the loader)
 */
public record RequirementProfile(String id, String title, String version, List<Document> documents,
                                 VerificationStatus verificationStatus, List<String> cautions,
                                 List<Rule> rules, String sha256) {
    public RequirementProfile {
        Objects.requireNonNull(id);
        Objects.requireNonNull(title);
        Objects.requireNonNull(version);
        Objects.requireNonNull(verificationStatus);
        documents = List.copyOf(documents);
        cautions = List.copyOf(cautions);
        rules = List.copyOf(rules);
    }
}
