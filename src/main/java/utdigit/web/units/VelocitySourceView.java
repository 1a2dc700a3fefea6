package utdigit.web.units;

import io.swagger.v3.oas.annotations.media.Schema;
import utdigit.core.common.MessageNumbers;
import utdigit.core.materials.UncertaintyKind;
import utdigit.core.materials.VelocitySource;
import utdigit.core.materials.WaveMode;

/** Where the velocity of a calculation came from. */
@Schema(name = "VelocitySource", description = "The velocity the calculation used and its origin")
public record VelocitySourceView(
        VelocitySource.Kind kind,
        double velocityMPerS,
        String material,
        WaveMode waveMode,
        Double temperatureC,
        String source,
        Double uncertaintyMPerS,
        UncertaintyKind uncertaintyKind,
        Double standardUncertaintyMPerS,
        String uncertaintyNote,
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
                        + MessageNumbers.rounded(v.standardUncertaintyMPerS()) + " m/s (JCGM 100:2008 4.3.7)"
                : "the material's standard uncertainty " + MessageNumbers.exact(v.standardUncertaintyMPerS()) + " m/s";
        return new VelocitySourceView(plain.kind(), plain.velocityMPerS(), plain.material(), plain.waveMode(),
                plain.temperatureC(), plain.source(), plain.uncertaintyMPerS(), plain.uncertaintyKind(),
                plain.standardUncertaintyMPerS(), how + ", used as velocity_uncertainty_m_per_s: none was given",
                plain.caution());
    }}
