package utdigit.web.units;

import java.util.ArrayList;
import java.util.List;
import utdigit.core.common.CalculationException;
import utdigit.core.common.MessageNumbers;
import utdigit.core.common.Units;
import utdigit.core.materials.Material;
import utdigit.core.materials.MaterialCatalog;
import utdigit.core.materials.VelocitySource;
import utdigit.core.materials.WaveMode;
import utdigit.web.problem.FieldErrors;
import utdigit.web.json.JsonPointers;

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
     * A speed in m/s of the input {@code base} given as {@code base_m_per_s} or {@code base_in_per_us}
     * (1 in/us = 25 400 m/s exactly), or null when neither is given: a wedge's or a steering medium's
     * velocity, a velocity's uncertainty. The inch form is range-checked after conversion against
     * {@code [minMPerS, maxMPerS]} (the m/s form's Bean Validation range).
     */
    public static Double speedMPerS(FieldErrors errors, String base, Double mPerS, Double inPerUs,
                                    double minMPerS, double maxMPerS) {
        String mName = base + "_m_per_s";
        String inName = base + "_in_per_us";
        if (mPerS != null && inPerUs != null) {
            String detail = "give " + base + " once: " + mName + " or " + inName + ", not both";
            errors.add(mName, detail).add(inName, detail);
            return null;
        }
        if (inPerUs == null) {
            return mPerS;
        }
        double converted = Units.inPerUsToMPerS(inPerUs);
        if (!(converted >= minMPerS && converted <= maxMPerS)) {
            errors.add(inName, "must correspond to " + MessageNumbers.rounded(minMPerS) + " to "
                    + MessageNumbers.rounded(maxMPerS) + " m/s ("
                    + MessageNumbers.rounded(Units.mPerSToInPerUs(minMPerS)) + " to "
                    + MessageNumbers.rounded(Units.mPerSToInPerUs(maxMPerS)) + " in/us)");
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

    /**
     * The inch mirror of a length result in mm (mm / 25.4, the inch being 25.4 mm exactly); null
     * (omitted: its optional input was not given) stays null.
     */
    public static Double inches(Double mm) {
        return mm == null ? null : Units.mmToIn(mm);
    }

    /**
     * The inch mirror of a length result that may not exist: empty (null in JSON) stays empty, null
     * (omitted) stays null.
     */
    @SuppressWarnings("OptionalUsedAsFieldOrParameterType")
    public static java.util.Optional<Double> inches(java.util.Optional<Double> mm) {
        return mm == null ? null : mm.map(Units::mmToIn);
    }

    /**
     * An answer's inch mirrors, or null (the in_inches object omitted) when every mirror is null,
     * i.e. the answer has no length result with these inputs.
     */
    public static <R extends Record> R orNone(R mirrors) {
        try {
            for (java.lang.invoke.MethodHandle accessor : ACCESSORS.get(mirrors.getClass())) {
                if (accessor.invoke(mirrors) != null) {
                    return mirrors;
                }
            }
            return null;
        } catch (Throwable e) { // an accessor of a record's own component does not throw
            throw new IllegalStateException(e);
        }
    }

    private static final ClassValue<java.lang.invoke.MethodHandle[]> ACCESSORS = new ClassValue<>() {
        @Override
        protected java.lang.invoke.MethodHandle[] computeValue(Class<?> type) {
            java.lang.reflect.RecordComponent[] components = type.getRecordComponents();
            java.lang.invoke.MethodHandle[] accessors = new java.lang.invoke.MethodHandle[components.length];
            for (int i = 0; i < components.length; i++) {
                try {
                    java.lang.reflect.Method accessor = components[i].getAccessor();
                    accessor.setAccessible(true); // the mirror records are package-private
                    accessors[i] = java.lang.invoke.MethodHandles.lookup().unreflect(accessor);
                } catch (IllegalAccessException e) {
                    throw new IllegalStateException(e);
                }
            }
            return accessors;
        }
    };

    private static final String NUMBER = "(-?\\d+(?:\\.\\d+)?)";
    /** "12.5 mm" (not mm/us, mm^2 or a longer word). */
    private static final java.util.regex.Pattern LENGTH_WITH_UNIT =
            java.util.regex.Pattern.compile("(?<![\\w.+-])" + NUMBER + " mm(?![\\w/^])");
    /** "50 mm/s". */
    private static final java.util.regex.Pattern SPEED_WITH_UNIT =
            java.util.regex.Pattern.compile("(?<![\\w.+-])" + NUMBER + " mm/s(?![\\w/^])");
    /** "distance_mm 12.5" (a field named in mm, then its value without the unit). */
    private static final java.util.regex.Pattern NAMED_LENGTH =
            java.util.regex.Pattern.compile("\\b([a-z][a-z0-9_]*)_mm " + NUMBER + "(?![\\d.eE]| mm)");
    /** "planned_scan_speed_mm_per_s 50". */
    private static final java.util.regex.Pattern NAMED_SPEED =
            java.util.regex.Pattern.compile("\\b([a-z][a-z0-9_]*)_mm_per_s " + NUMBER + "(?![\\d.eE]| mm/s)");

    /**
     * A message with the inch value beside every length (and speed) it quotes in mm: "12.5 mm" becomes
     * "12.5 mm (0.4921 in)", "distance_mm 12.5" becomes "distance_mm 12.5 (0.4921 in)", "50 mm/s"
     * becomes "50 mm/s (1.969 in/s)"; 4 significant digits, 25.4 mm per inch exactly. Always both
     * units, whichever the caller used, so that an answer recomputed from its own (mm) inputs says
     * the same (stamp verification).
     */
    public static String withInches(String message) {
        if (message == null || !message.contains("mm")) {
            return message;
        }
        // Each pattern runs only where the text holds what any match of it must contain (the regular
        // expressions were 30 % of a sheet batch's CPU, src/docs/performance.md): the same text out.
        String out = message;
        for (Rewrite r : REWRITES) {
            if (r.mayMatch().test(out)) {
                out = r.apply(out);
            }
        }
        return out;
    }

    /**
     * One rewrite of {@link #withInches}: its pattern, the group holding the number in mm, the inch
     * unit written after it, and a test that is true of every text holding a match (cheaper than the
     * pattern; false means the pattern cannot match).
     */
    record Rewrite(java.util.regex.Pattern pattern, int numberGroup, String inchUnit,
                   java.util.function.Predicate<String> mayMatch) {
        String apply(String text) {
            return replace(pattern, text, m -> m.group() + " (" + inches(m.group(numberGroup)) + " " + inchUnit + ")");
        }
    }

    /** The rewrites, in the order they apply (a speed before a length: "mm/s" also starts with "mm"). */
    static final java.util.List<Rewrite> REWRITES = java.util.List.of(
            new Rewrite(SPEED_WITH_UNIT, 1, "in/s", t -> unitAfterDigit(t, " mm/s")),
            new Rewrite(LENGTH_WITH_UNIT, 1, "in", t -> unitAfterDigit(t, " mm")),
            new Rewrite(NAMED_SPEED, 2, "in/s", t -> numberAfterName(t, "_mm_per_s ")),
            new Rewrite(NAMED_LENGTH, 2, "in", t -> numberAfterName(t, "_mm ")));

    /** Whether {@code unit} occurs right after a digit: every match of "NUMBER unit" contains that. */
    private static boolean unitAfterDigit(String text, String unit) {
        for (int i = text.indexOf(unit, 1); i >= 0; i = text.indexOf(unit, i + 1)) {
            if (Character.isDigit(text.charAt(i - 1))) {
                return true;
            }
        }
        return false;
    }

    /** Whether {@code suffix} occurs followed by a digit or '-': every match of "name_suffix NUMBER" contains that. */
    private static boolean numberAfterName(String text, String suffix) {
        for (int i = text.indexOf(suffix); i >= 0; i = text.indexOf(suffix, i + 1)) {
            int next = i + suffix.length();
            if (next < text.length() && (Character.isDigit(text.charAt(next)) || text.charAt(next) == '-')) {
                return true;
            }
        }
        return false;
    }

    private static String inches(String mm) {
        return MessageNumbers.rounded(Units.mmToIn(Double.parseDouble(mm)));
    }

    private static String replace(java.util.regex.Pattern pattern, String text,
                                  java.util.function.Function<java.util.regex.MatchResult, String> with) {
        return pattern.matcher(text).replaceAll(m -> java.util.regex.Matcher.quoteReplacement(with.apply(m)));
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
