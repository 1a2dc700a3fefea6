package utdigit.web.materials;

import com.fasterxml.jackson.annotation.JsonInclude;
import io.swagger.v3.oas.annotations.media.Schema;
import utdigit.core.materials.Material;
import utdigit.core.materials.UncertaintyKind;

/** A material as the API shows it. */
@Schema(name = "Material", description = "A material with its nominal sound velocities and their source. Table "
        + "velocities are planning defaults: measure the part's velocity for sizing (ASTM E494).")
record MaterialView(
        @Schema(description = "Kebab-case id to use as `material` in calculations", example = "carbon-steel")
        String id,
        @Schema(description = "Human-readable name", example = "Carbon steel (ISO 22232-2 steel reference values)")
        String name,
        @Schema(description = "BUILT_IN, or OPERATOR (from the operator's materials directory)")
        Material.Origin origin,
        @Schema(description = "Longitudinal velocity, m/s", example = "5920")
        double longitudinalMPerS,
        @Schema(description = "Shear velocity, m/s; null for liquids and where no shear velocity is tabulated",
                example = "3255", types = {"number", "null"})
        @JsonInclude(JsonInclude.Include.ALWAYS)
        Double shearMPerS,
        @Schema(description = "+/- value of the longitudinal velocity, m/s, when the source states one", example = "50")
        Double longitudinalUncertaintyMPerS,
        @Schema(description = "+/- value of the shear velocity, m/s, when the source states one", example = "30")
        Double shearUncertaintyMPerS,
        @Schema(description = "How the +/- values are to be read: HALF_WIDTH of a stated range (a thickness "
                + "calculation uses a/sqrt(3)), STANDARD uncertainty (used as it is), or NOT_STATED")
        UncertaintyKind uncertaintyKind,
        @Schema(description = "Water only: the temperature the velocity is given at, C", example = "20")
        Double temperatureC,
        @Schema(description = "Built-in: the id of the source in the reference catalogue (GET /api/references/{id}); "
                + "operator: the operator's own source text", example = "iso-22232-2-steel-reference-values")
        String source,
        @Schema(description = "What else the source or the trade says about the values")
        String note,
        @Schema(description = "A caution for shear waves in this material's welds (coarse-grained, anisotropic)")
        String shearCaution) {

    static MaterialView of(Material m, Double temperatureC, double longitudinalMPerS) {
        return new MaterialView(m.id(), m.name(), m.origin(), longitudinalMPerS, m.shearMPerS(),
                m.longitudinalUncertaintyMPerS(), m.shearUncertaintyMPerS(), m.uncertaintyKind(),
                temperatureC, m.source(), m.note(), m.coarseGrained() ? Material.SHEAR_CAUTION : null);
    }
}
