package utdigit.web.verification;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import org.springframework.stereotype.Component;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.JsonNodeFactory;
import utdigit.web.pipeline.CalculationRunner;
import utdigit.web.problem.InputProblem;
import utdigit.web.json.JsonPointers;
import utdigit.web.stamp.StampKey;
import utdigit.web.stamp.Stamper;

/**
 * Checks a stamped answer three ways: its hash (content intact), its signature (this service's
 * key), and its reproducibility (recomputed now from its own {@code inputs} through the same
 * calculation path, compared value by value).
 */
@Component
class StampVerifier {
    /** Members not compared when recomputing: the stamp itself, and where the velocity came from
     *  (inputs carry the velocity in m/s, so a material's velocity recomputes as the caller's). */
    private static final Set<String> NOT_COMPARED = Set.of("stamp", "velocity_source");

    private final CalculationRunner runner;
    private final Stamper stamper;
    private final JsonMapper mapper;

    StampVerifier(CalculationRunner runner, Stamper stamper, JsonMapper mapper) {
        this.runner = runner;
        this.stamper = stamper;
        this.mapper = mapper;
    }

    StampVerificationResponse verify(JsonNode document) {
        if (document == null || !document.isObject()) {
            throw InputProblem.invalid("/document", "must be a JSON object: an answer returned by this service");
        }
        ExactJsonTree.check(document, "/document");
        JsonNode stamp = document.get(Stamper.STAMP);
        if (stamp == null || !stamp.isObject()) {
            throw InputProblem.invalid("/document/stamp", "is required: the document carries no stamp");
        }
        JsonNode calc = stamp.get("calculation");
        JsonNode sha = stamp.get("sha256");
        if (calc == null || !calc.isString() || !runner.names().contains(calc.stringValue())) {
            throw InputProblem.invalid("/document/stamp/calculation", "must name a calculation of this service: "
                    + String.join(", ", runner.names()));
        }
        if (sha == null || !sha.isString()) {
            throw InputProblem.invalid("/document/stamp/sha256", "is required");
        }
        byte[] covered = Stamper.coveredBytes(document);
        boolean intact = StampKey.sha256Hex(covered).equals(sha.stringValue());
        List<String> notes = new ArrayList<>();

        Boolean signatureValid = null;
        JsonNode signature = stamp.get("signature");
        StampKey key = stamper.key();
        if (signature == null) {
            notes.add("the document is not signed");
        } else if (!key.configured()) {
            notes.add("this service has no stamp key configured: the signature cannot be checked");
        } else {
            JsonNode keyId = stamp.get("key_id");
            boolean sameKey = keyId != null && keyId.isString() && keyId.stringValue().equals(key.keyId());
            if (!sameKey) {
                notes.add("the document names another key than this service's (" + key.keyId() + ")");
            }
            signatureValid = sameKey && signature.isString() && key.verify(covered, signature.stringValue());
        }
        String stampedVersion = stamp.has("service_version") ? stamp.get("service_version").asString() : null;
        if (stampedVersion != null && !stampedVersion.equals(stamper.serviceVersion())) {
            notes.add("stamped by service version " + stampedVersion + ", recomputed by " + stamper.serviceVersion());
        }

        List<StampVerificationResponse.Difference> differences = new ArrayList<>();
        JsonNode inputs = document.get("inputs");
        if (inputs == null || !inputs.isObject()) {
            differences.add(new StampVerificationResponse.Difference("/inputs", inputs, null));
            notes.add("the document has no inputs to recompute from");
        } else {
            try {
                // compared as written: a received document is a tree by nature
                JsonNode recomputed = mapper.valueToTree(runner.runTree(calc.stringValue(), inputs));
                compare("", document, recomputed, differences, true);
            } catch (InputProblem p) {
                differences.add(new StampVerificationResponse.Difference("/inputs", inputs,
                        JsonNodeFactory.instance.stringNode(p.getMessage())));
                notes.add("the document's inputs are not a valid request now: " + p.getMessage());
            }
        }
        return new StampVerificationResponse(calc.stringValue(), stampedVersion, stamper.serviceVersion(), intact,
                signatureValid, differences.isEmpty(), differences, notes);
    }

    private static void compare(String pointer, JsonNode a, JsonNode b, List<StampVerificationResponse.Difference> out,
                                boolean top) {
        if (a != null && b != null && a.isObject() && b.isObject()) {
            Set<String> names = new TreeSet<>(a.propertyNames());
            names.addAll(b.propertyNames());
            for (String name : names) {
                if (top && NOT_COMPARED.contains(name)) {
                    continue;
                }
                compare(JsonPointers.child(pointer, name), a.get(name), b.get(name), out, false);
            }
        } else if (a != null && b != null && a.isArray() && b.isArray() && a.size() == b.size()) {
            for (int i = 0; i < a.size(); i++) {
                compare(pointer + "/" + i, a.get(i), b.get(i), out, false);
            }
        } else if (!same(a, b)) {
            out.add(new StampVerificationResponse.Difference(pointer, a, b));
        }
    }

    private static boolean same(JsonNode a, JsonNode b) {
        if (a == null || b == null) {
            return a == b;
        }
        if (a.isNumber() && b.isNumber()) {
            return a.doubleValue() == b.doubleValue();
        }
        return a.equals(b);
    }
}
