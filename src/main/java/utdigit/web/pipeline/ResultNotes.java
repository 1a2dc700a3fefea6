package utdigit.web.pipeline;

import io.swagger.v3.oas.annotations.media.Schema;
import java.util.List;
import utdigit.core.common.Reference;
import utdigit.core.common.Warning;
import utdigit.web.units.Mirrors;

/** The warnings and references of an answer, as the API shows them. */
public final class ResultNotes {
    private ResultNotes() {}

    /** A warning of an answer. */
    @Schema(name = "Warning", description = "Something the caller should know; the result is still valid")
    public record WarningView(
            @Schema(description = "Stable UPPER_SNAKE_CASE code", example = "NEAR_FIELD") String code,
            @Schema(description = "Explanation in the caller's terms; every length it quotes in mm is followed by "
                    + "its inch value, \"12.5 mm (0.4921 in)\"") String message) {}

    /** A reference of an answer. */
    @Schema(name = "Reference", description = "Where a formula or value of the answer comes from: its topic and "
            + "the id of its entry in the reference catalogue (GET /api/references/{id})")
    public record ReferenceView(
            @Schema(description = "What the reference is for", example = "near field length") String topic,
            @Schema(description = "Id of the source in the reference catalogue", example = "piston-near-field")
            String id) {}

    public static List<WarningView> warnings(List<Warning> warnings) {
        return warnings.stream().map(w -> new WarningView(w.code(), Mirrors.withInches(w.message()))).toList();
    }

    public static List<ReferenceView> references(List<Reference> references) {
        return references.stream().map(r -> new ReferenceView(r.topic(), r.id())).toList();
    }
}
