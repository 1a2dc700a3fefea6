package utdigit.core.materials;

/**
 * The velocity a calculation used and where it came from.
 *
 * @param velocityMPerS the velocity in m/s
 * @param kind MATERIAL (from the built-in table) or CALLER (given in the request)
 * @param material the material id, or null for CALLER
 * @param waveMode the wave mode, or null for CALLER
 * @param temperatureC the water temperature used, or null when not water
 * @param source the source of the value
 */
public record VelocitySource(
        double velocityMPerS,
        Kind kind,
        String material,
        WaveMode waveMode,
        Double temperatureC,
        String source) {

    /** Where a velocity came from. */
    public enum Kind {
        MATERIAL,
        CALLER
    }

    /** A velocity the caller gave. */
    public static VelocitySource caller(double velocityMPerS) {
        return new VelocitySource(velocityMPerS, Kind.CALLER, null, null, null, "given by the caller");
    }

    /**
     * The velocity of a built-in material in a wave mode; water at {@code temperatureC} (20 C when
     * null) by the Marczak polynomial.
     *
     * @throws utdigit.core.common.CalculationException IMPOSSIBLE_COMBINATION for a shear wave in a
     *     liquid; NOT_APPLICABLE for a temperature given for a solid
     */
    public static VelocitySource ofMaterial(Material material, WaveMode mode, Double temperatureC) {
        if (material.liquid()) {
            if (mode == WaveMode.SHEAR) {
                throw utdigit.core.common.CalculationException.impossible(
                        "a liquid (" + material.id() + ") carries no shear wave: use wave_mode LONGITUDINAL",
                        "wave_mode", "material");
            }
            double t = temperatureC == null ? WaterVelocity.DEFAULT_TEMPERATURE_C : temperatureC;
            return new VelocitySource(WaterVelocity.marczakMPerS(t), Kind.MATERIAL, material.id(),
                    mode, t, WaterVelocity.SOURCE);
        }
        if (temperatureC != null) {
            throw utdigit.core.common.CalculationException.notApplicable("temperature_c",
                    "temperature_c applies only to water; the solids' table values are not temperature-corrected");
        }
        return new VelocitySource(material.velocityMPerS(mode), Kind.MATERIAL, material.id(), mode,
                null, material.source());
    }
}
