package utdigit.web.materials;

import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.Parameter;
import io.swagger.v3.oas.annotations.tags.Tag;
import org.springframework.http.MediaType;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.bind.annotation.RestController;
import utdigit.core.materials.Material;
import utdigit.core.materials.MaterialCatalog;
import utdigit.core.materials.WaterVelocity;
import utdigit.web.problem.FieldError;
import utdigit.web.problem.InputProblem;
import utdigit.web.problem.NotFoundProblem;

@RestController
@RequestMapping(path = "/api/materials", produces = MediaType.APPLICATION_JSON_VALUE)
@Tag(name = "Materials", description = "Built-in and operator sound velocities with their sources")
class MaterialController {

    @GetMapping
    @Operation(summary = "List the materials (built-in, then the operator's)",
            description = "Nominal longitudinal and shear velocities with the source of each value. "
                    + "Velocities used for sizing are measured on the part.")
    MaterialList list() {
        return new MaterialList(MaterialCatalog.all().stream()
                .map(m -> MaterialView.of(m, m.temperatureDependent() ? WaterVelocity.DEFAULT_TEMPERATURE_C : null,
                        m.longitudinalMPerS()))
                .toList());
    }

    @GetMapping("/{id}")
    @Operation(summary = "Show one material",
            description = "For water, temperature_c (0 to 95 C) gives the velocity by the Marczak (1997) "
                    + "polynomial; 20 C when not given. Unknown id: 404 problem.")
    MaterialView one(
            @Parameter(description = "Material id, kebab-case", example = "water") @PathVariable String id,
            @Parameter(description = "Water only: temperature in C, 0 to 95", example = "20")
            @RequestParam(name = "temperature_c", required = false) Double temperatureC) {
        Material m = MaterialCatalog.find(id).orElseThrow(() -> new NotFoundProblem(
                "no material '" + id + "'; materials: " + String.join(", ", MaterialCatalog.ids())));
        if (!m.temperatureDependent()) {
            if (temperatureC != null) {
                throw InputProblem.invalid("temperature_c", "applies only to water");
            }
            return MaterialView.of(m, null, m.longitudinalMPerS());
        }
        double t = temperatureC == null ? WaterVelocity.DEFAULT_TEMPERATURE_C : temperatureC;
        if (!(t >= WaterVelocity.MIN_TEMPERATURE_C && t <= WaterVelocity.MAX_TEMPERATURE_C)) {
            throw new InputProblem(utdigit.web.problem.ProblemType.INVALID_INPUT,
                    "temperature_c must be within 0 to 95 C",
                    java.util.List.of(new FieldError("temperature_c", "must be within 0 to 95 C")));
        }
        return MaterialView.of(m, t, WaterVelocity.marczakMPerS(t));
    }
}
