package utdigit.web.references;

import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.Parameter;
import io.swagger.v3.oas.annotations.tags.Tag;
import org.springframework.http.MediaType;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RestController;
import utdigit.core.common.Sources;
import utdigit.web.problem.NotFoundProblem;

@RestController
@RequestMapping(path = "/api/references", produces = MediaType.APPLICATION_JSON_VALUE)
@Tag(name = "References", description = "The catalogue of sources that answers cite by id")
class ReferenceController {

    @GetMapping
    @Operation(summary = "List the reference catalogue",
            description = "Every source any answer cites in references[].id: document, edition, clause or page, "
                    + "kind and how the citation was checked. Derivations and practices point to a section of the "
                    + "service's methods document.")
    SourceList list() {
        return new SourceList(Sources.all().stream().map(SourceView::of).toList());
    }

    @GetMapping("/{id}")
    @Operation(summary = "Show one source", description = "Unknown id: 404 problem.")
    SourceView one(@Parameter(description = "Source id, as cited in references[].id",
            example = "jcgm-100-2008-4.3.7") @PathVariable String id) {
        return SourceView.of(Sources.find(id).orElseThrow(() -> new NotFoundProblem(
                "no source '" + id + "' in the reference catalogue; GET /api/references lists them")));
    }
}
