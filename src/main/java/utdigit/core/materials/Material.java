package utdigit.core.materials;

import java.util.Objects;

/**
 * A built-in material with its nominal sound velocities.
 *
 * @param id kebab-case identifier used in requests ({@code "carbon-steel"})
 * @param name human-readable name
 * @param longitudinalMPerS longitudinal velocity in m/s
 * @param shearMPerS shear velocity in m/s, or null for liquids (no shear wave)
 * @param longitudinalUncertaintyMPerS +/- value of the longitudinal velocity, or null if none stated
 * @param shearUncertaintyMPerS +/- value of the shear velocity, or null if none stated
 * @param uncertaintyKind how the +/- values are to be read
 * @param source where the values come from
 * @param liquid whether the material is a liquid (velocity depends on temperature)
 */
public record Material(
        String id,
        String name,
        double longitudinalMPerS,
        Double shearMPerS,
        Double longitudinalUncertaintyMPerS,
        Double shearUncertaintyMPerS,
        UncertaintyKind uncertaintyKind,
        String source,
        boolean liquid) {

    public Material {
        Objects.requireNonNull(id);
        Objects.requireNonNull(name);
        Objects.requireNonNull(uncertaintyKind);
        Objects.requireNonNull(source);
    }

    /** The velocity of a wave mode, or null when the mode does not propagate (shear in a liquid). */
    public Double velocityMPerS(WaveMode mode) {
        return mode == WaveMode.LONGITUDINAL ? longitudinalMPerS : shearMPerS;
    }
}
