package utdigit.core.materials;

import java.util.Objects;

/**
 * A material with its nominal sound velocities: built in, or the operator's own.
 *
 * @param id kebab-case identifier used in requests ({@code "carbon-steel"})
 * @param name human-readable name
 * @param longitudinalMPerS longitudinal velocity in m/s
 * @param shearMPerS shear velocity in m/s, or null where none is tabulated (always for liquids)
 * @param longitudinalUncertaintyMPerS +/- value of the longitudinal velocity, or null if none stated
 * @param shearUncertaintyMPerS +/- value of the shear velocity, or null if none stated
 * @param uncertaintyKind how the +/- values are to be read
 * @param source for a built-in material the id of its source in the reference catalogue
 *     ({@link utdigit.core.common.Sources}); for an operator material the operator's own text
 * @param note what else the source or the trade says about the values (may be null)
 * @param origin built in or the operator's
 * @param liquid whether the material is a liquid (no shear wave)
 * @param coarseGrained whether its welds are coarse-grained or anisotropic (austenitic, duplex,
 *     nickel alloys): shear waves there skew and scatter, a caution goes with a shear velocity
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
        String note,
        Origin origin,
        boolean liquid,
        boolean coarseGrained) {

    /** Where a material comes from. */
    public enum Origin {
        BUILT_IN,
        OPERATOR
    }

    /** The id of the one material whose velocity follows the temperature (Marczak polynomial). */
    public static final String WATER_ID = "water";

    /** The caution that goes with a shear velocity of a coarse-grained material. */
    public static final String SHEAR_CAUTION = "shear waves in coarse-grained and anisotropic welds (austenitic, "
            + "duplex, nickel alloys) skew, scatter and change velocity with direction: the tabulated velocity and "
            + "the beam figures do not hold there; prefer longitudinal waves and qualify the technique on a "
            + "representative weld";

    public Material {
        Objects.requireNonNull(id);
        Objects.requireNonNull(name);
        Objects.requireNonNull(uncertaintyKind);
        Objects.requireNonNull(source);
        Objects.requireNonNull(origin);
    }

    /** The velocity of a wave mode, or null when the mode does not propagate or is not tabulated. */
    public Double velocityMPerS(WaveMode mode) {
        return mode == WaveMode.LONGITUDINAL ? Double.valueOf(longitudinalMPerS) : shearMPerS;
    }

    /** The stated +/- value of a wave mode's velocity, or null when none is stated. */
    public Double statedUncertaintyMPerS(WaveMode mode) {
        return uncertaintyKind == UncertaintyKind.NOT_STATED ? null
                : mode == WaveMode.LONGITUDINAL ? longitudinalUncertaintyMPerS : shearUncertaintyMPerS;
    }

    /**
     * The standard uncertainty of a wave mode's velocity: a stated standard uncertainty as it is, a
     * half-width a of a range as a rectangular distribution, a/sqrt(3) (JCGM 100:2008 4.3.7); null
     * when none is stated.
     */
    public Double standardUncertaintyMPerS(WaveMode mode) {
        Double stated = statedUncertaintyMPerS(mode);
        if (stated == null) {
            return null;
        }
        return uncertaintyKind == UncertaintyKind.HALF_WIDTH ? stated / StrictMath.sqrt(3.0) : stated;
    }

    /** Whether the velocity follows the temperature (water, by the Marczak polynomial). */
    public boolean temperatureDependent() {
        return origin == Origin.BUILT_IN && WATER_ID.equals(id);
    }
}
