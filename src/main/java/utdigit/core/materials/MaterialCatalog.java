package utdigit.core.materials;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The built-in materials. Tabulated velocities are nominal defaults for planning a technique;
 * velocities used for sizing are measured on the part (ASTM E494).
 */
public final class MaterialCatalog {
    private MaterialCatalog() {}

    private static final String E494 =
            "ASTM E494, Table X3.1 (nominal values; measure the part for sizing)";

    private static final Map<String, Material> BY_ID = new LinkedHashMap<>();

    static {
        add(new Material("carbon-steel", "Carbon steel (ISO 22232-2 steel reference values)",
                5920.0, 3255.0, 50.0, 30.0, UncertaintyKind.HALF_WIDTH,
                "ISO 22232-2, steel reference values 5920 +/- 50 m/s longitudinal, "
                        + "3255 +/- 30 m/s shear (the basis of that standard, not every carbon steel; "
                        + "+/- read as a half-width); ASTM E494 Table X3.1 gives 5900 / 3230 m/s",
                false));
        add(new Material("stainless-steel-347", "Stainless steel, type 347",
                5790.0, 3100.0, null, null, UncertaintyKind.NOT_STATED, E494, false));
        add(new Material("stainless-steel-410", "Stainless steel, type 410",
                5900.0, 3300.0, null, null, UncertaintyKind.NOT_STATED, E494, false));
        add(new Material("aluminium", "Aluminium",
                6300.0, 3130.0, null, null, UncertaintyKind.NOT_STATED, E494, false));
        add(new Material("copper", "Copper",
                4700.0, 2260.0, null, null, UncertaintyKind.NOT_STATED, E494, false));
        add(new Material("titanium", "Titanium",
                6240.0, 3215.0, null, null, UncertaintyKind.NOT_STATED,
                E494 + "; other tables give 6070-6100 m/s longitudinal (from memory)", false));
        add(new Material("acrylic", "Acrylic (PMMA)",
                2670.0, 1120.0, null, null, UncertaintyKind.NOT_STATED,
                E494 + "; other tables give a shear velocity near 1430 m/s (from memory): "
                        + "wedge and delay-line grades vary by maker and temperature, measure them",
                false));
        add(new Material("water", "Water (pure), 20 C unless temperature_c is given",
                WaterVelocity.marczakMPerS(WaterVelocity.DEFAULT_TEMPERATURE_C), null, null, null,
                UncertaintyKind.NOT_STATED,
                WaterVelocity.SOURCE + "; 1482.3 m/s at 20 C per Del Grosso and Mader 1972 (from memory)",
                true));
    }

    private static void add(Material m) {
        BY_ID.put(m.id(), m);
    }

    /** Every built-in material, in a stable order. */
    public static List<Material> all() {
        return List.copyOf(BY_ID.values());
    }

    /** The material with this id, if built in. */
    public static Optional<Material> find(String id) {
        return Optional.ofNullable(BY_ID.get(id));
    }

    /** The ids of every built-in material, in a stable order. */
    public static List<String> ids() {
        return List.copyOf(BY_ID.keySet());
    }
}
