package utdigit.web.units;

import io.swagger.v3.oas.annotations.media.Schema;
import utdigit.core.common.MessageNumbers;
import utdigit.core.materials.UncertaintyKind;
import utdigit.core.materials.VelocitySource;
import utdigit.core.materials.WaveMode;

/** Where the velocity of a calculation came from. */
@Schema(name = "VelocitySource", description = "The velocity the calculation used and its origin")
public record VelocitySourceView(
        @Schema(description = "MATERIAL (built-in or operator material) or CALLER (given in the request)")
        VelocitySource.Kind kind,
        @Schema(description = "Velocity used, m/s", example = "5920")
        double velocityMPerS,
        @Schema(description = "Material id when kind is MATERIAL", example = "carbon-steel")
        String material,
        @Schema(description = "Wave mode when kind is MATERIAL")
        WaveMode waveMode,
        @Schema(description = "Water temperature used, C", example = "20")
        Double temperatureC,
        @Schema(description = "A built-in material's source id in the reference catalogue (GET /api/references/{id}), "
                + "an operator material's own source text, or 'caller'", example = "iso-22232-2-steel-reference-values")
        String source,
        @Schema(description = "The material's stated +/- value of this velocity, m/s", example = "50")
        Double uncertaintyMPerS,
        @Schema(description = "How that value reads: HALF_WIDTH or STANDARD")
        UncertaintyKind uncertaintyKind,
        @Schema(description = "The standard uncertainty it gives, m/s: a half-width a as a/sqrt(3) (rectangular, "
                + "JCGM 100:2008 4.3.7), a standard uncertainty as it is", example = "28.87")
        Double standardUncertaintyMPerS,
        @Schema(description = "Present when this answer used the material's own uncertainty because the request "
                + "gave none: says so and how")
        String uncertaintyNote,
        @Schema(description = "A caution that goes with this velocity (shear waves in coarse-grained welds)")
        String caution) {

    public static VelocitySourceView of(VelocitySource v) {
        return v == null ? null : new VelocitySourceView(v.kind(), v.velocityMPerS(), v.material(),
                v.waveMode(), v.temperatureC(), v.source(), v.statedUncertaintyMPerS(), v.uncertaintyKind(),
                v.standardUncertaintyMPerS(), null, v.caution());
    }

    /**
     * The velocity's source, noting that the answer used the material's own standard uncertainty
     * because the request gave none.
     */
    public static VelocitySourceView usingMaterialUncertainty(VelocitySource v) {
        VelocitySourceView plain = of(v);
        if (plain == null || v.standardUncertaintyMPerS() == null) {
            return plain;
        }
        String how = v.uncertaintyKind() == UncertaintyKind.HALF_WIDTH
                ? "the material's half-width +/- " + MessageNumbers.exact(v.statedUncertaintyMPerS())
                        + " m/s as rectangular: u = " + MessageNumbers.exact(v.statedUncertaintyMPerS()) + "/sqrt(3) = "
                        + MessageNumbers.plain(v.standardUncertaintyMPerS(), 4) + " m/s (JCGM 100:2008 4.3.7)"
                : "the material's standard uncertainty " + MessageNumbers.exact(v.standardUncertaintyMPerS()) + " m/s";
        return new VelocitySourceView(plain.kind(), plain.velocityMPerS(), plain.material(), plain.waveMode(),
                plain.temperatureC(), plain.source(), plain.uncertaintyMPerS(), plain.uncertaintyKind(),
                plain.standardUncertaintyMPerS(), how + ", used as velocity_uncertainty_m_per_s: none was given",
                plain.caution());
    }}
