package utdigit.web.materials;

import com.fasterxml.jackson.annotation.JsonInclude;
import io.swagger.v3.oas.annotations.media.Schema;
import utdigit.core.materials.Material;
import utdigit.core.materials.UncertaintyKind;

/** A material as the API shows it. */
@Schema(name = "Material", description = "A material with its nominal sound velocities and their source. Table "
        + "velocities are planning defaults: measure the part's velocity for sizing (ASTM E494).")
record MaterialView(
        String id,
        String name,
        Material.Origin origin,
        double longitudinalMPerS,
        @JsonInclude(JsonInclude.Include.ALWAYS)
        Double shearMPerS,
        Double longitudinalUncertaintyMPerS,
        Double shearUncertaintyMPerS,
        UncertaintyKind uncertaintyKind,
        Double temperatureC,
        String source,
        String note,
        String shearCaution) {

    static MaterialView of(Material m, Double temperatureC, double longitudinalMPerS) {
        return new MaterialView(m.id(), m.name(), m.origin(), longitudinalMPerS, m.shearMPerS(),
                m.longitudinalUncertaintyMPerS(), m.shearUncertaintyMPerS(), m.uncertaintyKind(),
                temperatureC, m.source(), m.note(), m.coarseGrained() ? Material.SHEAR_CAUTION : null);
    }
}
