package utdigit.core.materials;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import utdigit.core.common.Source;
import utdigit.core.common.Sources;
import utdigit.core.materials.Material.Origin;

/**
 * The materials: the built-in ones and those an operator installed at start-up. Tabulated
 * velocities are nominal defaults for planning a technique; velocities used for sizing are measured
 * on the part (ASTM E494). Each built-in material's source is an entry of the reference catalogue.
 */
public final class MaterialCatalog {
    private MaterialCatalog() {}

    private static final Map<String, Material> BUILT_IN = new LinkedHashMap<>();

    /** The operator's materials, replaced as a whole by {@link #installOperatorMaterials}. */
    private static volatile Map<String, Material> operator = Map.of();

    private static final String MEASURE = "measure the part's velocity for sizing";

    static {
        builtIn("carbon-steel", "Carbon steel (ISO 22232-2 steel reference values)", 5920.0, 3255.0, 50.0, 30.0,
                UncertaintyKind.HALF_WIDTH, Sources.ISO_22232_2_STEEL, "the basis of ISO 22232-2, not every carbon "
                        + "steel; ASTM E494 Table X3.1 gives 5900 / 3230 m/s", false, false);
        builtIn("austenitic-stainless-steel", "Austenitic stainless steel (300 series: 304, 316)", 5676.5, 3086.0,
                63.5, 38.0, UncertaintyKind.HALF_WIDTH, Sources.ACOUSTIC_PROPERTIES_TABLE,
                "mid-points and half-widths of the tabulated 300-series ranges 5613-5740 / 3048-3124 m/s; " + MEASURE,
                false, true);
        builtIn("stainless-steel-347", "Stainless steel, type 347", 5790.0, 3100.0, null, null,
                UncertaintyKind.NOT_STATED, Sources.ASTM_E494, MEASURE, false, true);
        builtIn("stainless-steel-410", "Stainless steel, type 410 (martensitic)", 5900.0, 3300.0, null, null,
                UncertaintyKind.NOT_STATED, Sources.ASTM_E494, MEASURE, false, false);
        builtIn("nickel-alloy", "Nickel alloy (Inconel 600 / 625 type)", 5700.0, 3000.0, null, null,
                UncertaintyKind.NOT_STATED, Sources.SOLIDS_PROPERTIES_TABLE, "the same longitudinal value in two "
                        + "thickness-gauge tables; alloys and product forms differ: " + MEASURE, false, true);
        builtIn("cast-iron", "Cast iron (grey and other cast irons)", 4546.5, 2705.0, 1041.5, 495.0,
                UncertaintyKind.HALF_WIDTH, Sources.ACOUSTIC_PROPERTIES_TABLE, "mid-points and half-widths of the "
                        + "tabulated range over cast irons, 3505-5588 / 2210-3200 m/s: grey irons (flake graphite) lie "
                        + "low in it; the CRC Handbook gives 4994 / 2809 m/s for one cast iron; " + MEASURE,
                false, false);
        builtIn("brass", "Brass (70 Cu, 30 Zn)", 4700.0, 2110.0, null, null, UncertaintyKind.NOT_STATED,
                Sources.CRC_SOUND_SPEED, MEASURE, false, false);
        builtIn("aluminium", "Aluminium", 6300.0, 3130.0, null, null, UncertaintyKind.NOT_STATED,
                Sources.ASTM_E494, MEASURE, false, false);
        builtIn("copper", "Copper", 4700.0, 2260.0, null, null, UncertaintyKind.NOT_STATED,
                Sources.ASTM_E494, MEASURE, false, false);
        builtIn("titanium", "Titanium", 6240.0, 3215.0, null, null, UncertaintyKind.NOT_STATED,
                Sources.ASTM_E494, "a thickness-gauge table gives 6100 m/s for Ti 150A: alloys differ; " + MEASURE,
                false, false);
        builtIn("acrylic", "Acrylic (PMMA), wedges and delay lines", 2670.0, 1120.0, null, null,
                UncertaintyKind.NOT_STATED, Sources.ASTM_E494, "a transducer maker's table gives Lucite 2680 / "
                        + "1260 m/s: shear values differ between tables; wedge grades vary by maker and temperature, "
                        + "measure them", false, false);
        builtIn("polystyrene", "Cross-linked polystyrene (delay lines and wedges)", 2340.0, null, null, null,
                UncertaintyKind.NOT_STATED, Sources.GAUGE_VELOCITY_TABLES, "longitudinal only (another table: "
                        + "2337 m/s); no shear velocity tabulated; grades vary by maker and temperature, measure them",
                false, false);
        builtIn("glycerine", "Glycerine (couplant)", 1920.0, null, null, null, UncertaintyKind.NOT_STATED,
                Sources.ULTRASONIC_PROPERTIES_TABLE, "another table gives 1900 m/s; varies with temperature and "
                        + "water content, not modelled", true, false);
        builtIn("oil-sae-30", "Oil, SAE 30 (couplant)", 1700.0, null, null, null, UncertaintyKind.NOT_STATED,
                Sources.GAUGE_VELOCITY_TABLES, "varies with temperature, not modelled", true, false);
        builtIn(Material.WATER_ID, "Water (pure), 20 C unless temperature_c is given",
                WaterVelocity.marczakMPerS(WaterVelocity.DEFAULT_TEMPERATURE_C), null, null, null,
                UncertaintyKind.NOT_STATED, Sources.MARCZAK_1997, "by temperature_c, 0 to 95 C", true, false);
    }

    private static void builtIn(String id, String name, double longitudinalMPerS, Double shearMPerS,
                                Double longitudinalUncertaintyMPerS, Double shearUncertaintyMPerS,
                                UncertaintyKind kind, Source source, String note, boolean liquid,
                                boolean coarseGrained) {
        BUILT_IN.put(id, new Material(id, name, longitudinalMPerS, shearMPerS, longitudinalUncertaintyMPerS,
                shearUncertaintyMPerS, kind, source.id(), note, Origin.BUILT_IN, liquid, coarseGrained));
    }

    /** Every material, built-in ones first, then the operator's, each in a stable order. */
    public static List<Material> all() {
        List<Material> all = new ArrayList<>(BUILT_IN.values());
        all.addAll(operator.values());
        return List.copyOf(all);
    }

    /** The material with this id, built in or the operator's. */
    public static Optional<Material> find(String id) {
        if (id == null) {
            return Optional.empty();
        }
        Material m = BUILT_IN.get(id);
        return Optional.ofNullable(m != null ? m : operator.get(id));
    }

    /** The ids of every material, in the order of {@link #all()}. */
    public static List<String> ids() {
        return all().stream().map(Material::id).toList();
    }

    /** Whether {@code id} is a built-in material's. */
    public static boolean isBuiltIn(String id) {
        return BUILT_IN.containsKey(id);
    }

    /**
     * Replaces the operator's materials (the service does this once at start-up) and returns the
     * ones it replaced, so that a caller can put them back.
     *
     * @throws IllegalArgumentException for an id used twice or a built-in material's id
     */
    public static synchronized List<Material> installOperatorMaterials(List<Material> materials) {
        Map<String, Material> next = new LinkedHashMap<>();
        for (Material m : materials) {
            if (BUILT_IN.containsKey(m.id()) || next.putIfAbsent(m.id(), m) != null) {
                throw new IllegalArgumentException("material id '" + m.id() + "' is already defined");
            }
        }
        List<Material> previous = List.copyOf(operator.values());
        operator = java.util.Collections.unmodifiableMap(next);
        return previous;
    }
}
