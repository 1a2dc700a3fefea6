package utdigit.core.materials;

import utdigit.core.common.CalculationException;

/**
 * The velocity a calculation used and where it came from.
 *
 * @param velocityMPerS the velocity in m/s
 * @param kind MATERIAL (built-in or operator material) or CALLER (given in the request)
 * @param material the material id, or null for CALLER
 * @param waveMode the wave mode, or null for CALLER
 * @param temperatureC the water temperature used, or null when not water
 * @param source the catalogue id of a built-in material's source, the operator's source text of an
 *     operator material, or "caller"
 * @param statedUncertaintyMPerS the material's stated +/- value for the mode, or null
 * @param uncertaintyKind how that value reads, or null when none is stated
 * @param standardUncertaintyMPerS the standard uncertainty it gives, or null
 * @param caution a caution that goes with this velocity (shear in coarse-grained welds), or null
 */
public record VelocitySource(
        double velocityMPerS,
        Kind kind,
        String material,
        WaveMode waveMode,
        Double temperatureC,
        String source,
        Double statedUncertaintyMPerS,
        UncertaintyKind uncertaintyKind,
        Double standardUncertaintyMPerS,
        String caution) {

    /** Where a velocity came from. */
    public enum Kind {
        MATERIAL,
        CALLER
    }

    /** A velocity the caller gave. */
    public static VelocitySource caller(double velocityMPerS) {
        return new VelocitySource(velocityMPerS, Kind.CALLER, null, null, null, "caller", null, null, null, null);
    }

    /**
     * The velocity of a material in a wave mode; water at {@code temperatureC} (20 C when null) by
     * the Marczak polynomial.
     *
     * @throws CalculationException IMPOSSIBLE_COMBINATION for a shear wave in a liquid; NOT_APPLICABLE
     *     for a temperature given for another material than water, or a shear wave of a material with
     *     no tabulated shear velocity
     */
    public static VelocitySource ofMaterial(Material material, WaveMode mode, Double temperatureC) {
        if (material.liquid() && mode == WaveMode.SHEAR) {
            throw CalculationException.impossible(
                    "a liquid (" + material.id() + ") carries no shear wave: use wave_mode LONGITUDINAL",
                    "wave_mode", "material");
        }
        if (material.temperatureDependent()) {
            double t = temperatureC == null ? WaterVelocity.DEFAULT_TEMPERATURE_C : temperatureC;
            return new VelocitySource(WaterVelocity.marczakMPerS(t), Kind.MATERIAL, material.id(),
                    mode, t, material.source(), null, null, null, null);
        }
        if (temperatureC != null) {
            throw CalculationException.notApplicable("temperature_c",
                    "temperature_c applies only to water; other materials' table values are not temperature-corrected");
        }
        Double velocity = material.velocityMPerS(mode);
        if (velocity == null) {
            throw CalculationException.notApplicable("wave_mode", "no shear velocity is tabulated for "
                    + material.id() + ": give the measured velocity as velocity_m_per_s");
        }
        Double stated = material.statedUncertaintyMPerS(mode);
        return new VelocitySource(velocity, Kind.MATERIAL, material.id(), mode, null, material.source(),
                stated, stated == null ? null : material.uncertaintyKind(), material.standardUncertaintyMPerS(mode),
                mode == WaveMode.SHEAR && material.coarseGrained() ? Material.SHEAR_CAUTION : null);
    }
}
