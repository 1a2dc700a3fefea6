package utdigit.web.openapi;

import io.swagger.v3.oas.models.OpenAPI;
import io.swagger.v3.oas.models.tags.Tag;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.springdoc.core.customizers.OpenApiCustomizer;
import org.springframework.core.Ordered;
import org.springframework.core.annotation.Order;
import org.springframework.stereotype.Component;

/**
 * Lists the document's tags (the browsable UI's sections) in the order of the work: the
 * calculations from the pulse to the acquisition budget, then whole technique sheets, batches and
 * stamps, then the reference data. A tag not named here is a calculation added later: it goes after
 * the named calculations.
 */
@Component
@Order(Ordered.LOWEST_PRECEDENCE)
class OpenApiTagOrder implements OpenApiCustomizer {
    static final List<String> CALCULATIONS = List.of("Pulse and beam", "Sampling", "Quantization", "Time of flight",
            "Thickness", "Acquisition");
    static final List<String> AFTER = List.of("Technique sheets", "Batches", "Stamps", "Materials",
            "Requirement profiles", "References");

    @Override
    public void customise(OpenAPI openApi) {
        if (openApi.getTags() == null) {
            return;
        }
        List<Tag> tags = new ArrayList<>(openApi.getTags());
        tags.sort(Comparator.comparingInt(OpenApiTagOrder::rank).thenComparing(Tag::getName));
        openApi.setTags(tags);
    }

    private static int rank(Tag tag) {
        int i = CALCULATIONS.indexOf(tag.getName());
        if (i >= 0) {
            return i;
        }
        int j = AFTER.indexOf(tag.getName());
        return j >= 0 ? CALCULATIONS.size() + 1 + j : CALCULATIONS.size();
    }
}
