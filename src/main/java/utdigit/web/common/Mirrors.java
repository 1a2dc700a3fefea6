package utdigit.web.common;

import java.util.ArrayList;
import java.util.List;
import utdigit.core.common.CalculationException;
import utdigit.core.common.MessageNumbers;
import utdigit.core.common.Units;
import utdigit.core.materials.Material;
import utdigit.core.materials.MaterialCatalog;
import utdigit.core.materials.VelocitySource;
import utdigit.core.materials.WaveMode;

/**
 * Resolution of the inputs that may be given in more than one form: a length as {@code x_mm} or
 * {@code x_in}, a velocity as {@code velocity_m_per_s}, {@code velocity_in_per_us} or
 * {@code material}. Exactly one form; two, or none where one is required, is a 400 naming the
 * fields. Values in inches are converted with 25.4 mm/in exactly and range-checked after conversion.
 */
public final class Mirrors {
    private Mirrors() {}

    /**
     * Longest length accepted, mm (100 m), as the requests' {@code @DecimalMax} of every length in mm
     * (and speed in mm/s) writes it; the inch forms are checked against it after conversion.
     */
    public static final String MAX_MM = "100000";
    /** The same, as a number. */
    public static final double MAX_LENGTH_MM = Double.parseDouble(MAX_MM);
    /** The longest length in inches, as messages write it. */
    private static final String MAX_LENGTH_IN = MessageNumbers.exact(MAX_LENGTH_MM / Units.MM_PER_IN);

    /**
     * The length in mm of the input {@code base} given as {@code base_mm} or {@code base_in}, or null
     * when neither is given and it is optional.
     */
    public static Double lengthMm(FieldErrors errors, String base, Double mm, Double in, boolean required) {
        String mmName = base + "_mm";
        String inName = base + "_in";
        if (mm != null && in != null) {
            errors.notBoth(base, mmName, inName);
            return null;
        }
        if (mm == null && in == null) {
            if (required) {
                errors.add(mmName, base + " is required: give " + mmName + " or " + inName);
            }
            return null;
        }
        if (mm != null) {
            return mm;
        }
        double converted = Units.inToMm(in);
        if (!(converted > 0 && converted <= MAX_LENGTH_MM)) {
            errors.add(inName, "must be above 0 and at most " + MAX_LENGTH_IN + " in (100 m)");
            return null;
        }
        return converted;
    }

    /**
     * The speed in mm/s of the input {@code base} given as {@code base_mm_per_s} or {@code base_in_per_s}
     * (1 in/s = 25.4 mm/s exactly), or null when neither is given.
     */
    public static Double speedMmPerS(FieldErrors errors, String base, Double mmPerS, Double inPerS) {
        String mmName = base + "_mm_per_s";
        String inName = base + "_in_per_s";
        if (mmPerS != null && inPerS != null) {
            errors.notBoth(base, mmName, inName);
            return null;
        }
        if (inPerS == null) {
            return mmPerS;
        }
        double converted = Units.inToMm(inPerS);
        if (!(converted > 0 && converted <= MAX_LENGTH_MM)) {
            errors.add(inName, "must be above 0 and at most " + MAX_LENGTH_IN + " in/s");
            return null;
        }
        return converted;
    }

    /**
     * The velocity of {@code f}: the caller's (m/s or in/us) or a built-in material's; null when
     * none is given and it is optional.
     *
     * @throws CalculationException IMPOSSIBLE for a shear wave in water (422)
     */
    public static VelocitySource velocity(FieldErrors errors, VelocityFields f, boolean required) {
        List<String> given = new ArrayList<>();
        if (f.velocityMPerS() != null) {
            given.add("velocity_m_per_s");
        }
        if (f.velocityInPerUs() != null) {
            given.add("velocity_in_per_us");
        }
        if (f.material() != null) {
            given.add("material");
        }
        if (f.material() == null) {
            if (f.waveMode() != null) {
                errors.add("wave_mode", "applies only with material; a velocity given as a number is already the wave mode's");
            }
            if (f.temperatureC() != null) {
                errors.add("temperature_c", "applies only with material water");
            }
        }
        if (given.size() > 1) {
            String detail = "give one velocity source, not " + String.join(" and ", given)
                    + " (velocity_m_per_s, velocity_in_per_us or material)";
            for (String name : given) {
                errors.add(name, detail);
            }
            return null;
        }
        if (given.isEmpty()) {
            if (required) {
                errors.add("velocity_m_per_s",
                        "a velocity is required: give velocity_m_per_s, velocity_in_per_us or material");
            }
            return null;
        }
        if (f.velocityMPerS() != null) {
            return VelocitySource.caller(f.velocityMPerS());
        }
        if (f.velocityInPerUs() != null) {
            double mPerS = Units.inPerUsToMPerS(f.velocityInPerUs());
            if (!(mPerS >= VelocityFields.MIN_M_PER_S && mPerS <= VelocityFields.MAX_M_PER_S)) {
                errors.add("velocity_in_per_us", "must correspond to " + VelocityFields.MIN_M_PER_S + " to "
                        + VelocityFields.MAX_M_PER_S + " m/s ("
                        + MessageNumbers.exact(Units.mPerSToInPerUs(VelocityFields.MIN_M_PER_S)) + " to "
                        + MessageNumbers.exact(Units.mPerSToInPerUs(VelocityFields.MAX_M_PER_S)) + " in/us)");
                return null;
            }
            return VelocitySource.caller(mPerS);
        }
        Material material = MaterialCatalog.find(f.material()).orElse(null);
        if (material == null) {
            errors.add("material", "unknown material '" + f.material() + "'; materials: "
                    + String.join(", ", MaterialCatalog.ids()));
            return null;
        }
        if (!material.temperatureDependent() && f.temperatureC() != null) {
            errors.add("temperature_c", "applies only with material water; other materials' table values are not "
                    + "temperature-corrected");
            return null;
        }
        WaveMode mode = f.waveMode() == null ? WaveMode.LONGITUDINAL : f.waveMode();
        return VelocitySource.ofMaterial(material, mode, f.temperatureC());
    }

    /** The pointer of a length the caller sent: "/base_in" when the inch form was sent, else "/base_mm". */
    public static String lengthPointer(String base, Double inchValue) {
        return JsonPointers.property(base + (inchValue != null ? "_in" : "_mm"));
    }

    /** The pointer of the velocity form the caller sent: velocity_in_per_us, material, else velocity_m_per_s. */
    public static String velocityPointer(VelocityFields f) {
        if (f.velocityInPerUs() != null) {
            return JsonPointers.property("velocity_in_per_us");
        }
        if (f.material() != null) {
            return JsonPointers.property("material");
        }
        return JsonPointers.property("velocity_m_per_s");
    }
}
