package utdigit.web.common;

import io.swagger.v3.oas.annotations.media.Schema;
import utdigit.core.materials.VelocitySource;
import utdigit.core.materials.WaveMode;

/** Where the velocity of a calculation came from. */
@Schema(name = "VelocitySource", description = "The velocity the calculation used and its origin")
public record VelocitySourceView(
        @Schema(description = "MATERIAL (built-in table) or CALLER (given in the request)")
        VelocitySource.Kind kind,
        @Schema(description = "Velocity used, m/s", format = "double", example = "5920")
        double velocityMPerS,
        @Schema(description = "Material id when kind is MATERIAL", example = "carbon-steel")
        String material,
        @Schema(description = "Wave mode when kind is MATERIAL")
        WaveMode waveMode,
        @Schema(description = "Water temperature used, C", format = "double", example = "20")
        Double temperatureC,
        @Schema(description = "Source of the value")
        String source) {

    public static VelocitySourceView of(VelocitySource v) {
        return v == null ? null : new VelocitySourceView(v.kind(), v.velocityMPerS(), v.material(),
                v.waveMode(), v.temperatureC(), v.source());
    }
}
