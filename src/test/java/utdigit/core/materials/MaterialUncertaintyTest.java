package utdigit.core.materials;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import utdigit.core.common.CalculationException;
import utdigit.core.common.Sources;

class MaterialUncertaintyTest {

    private static Material builtIn(String id) {
        return MaterialCatalog.find(id).orElseThrow();
    }

    @Test
    void aHalfWidthIsReadAsRectangular() {
        // JCGM 100:2008 4.3.7: a half-width a of a rectangular distribution has u = a/sqrt(3).
        // ISO 22232-2 (scope, read): steel 5920 +/- 50 m/s, 3255 +/- 30 m/s.
        Material steel = builtIn("carbon-steel");
        assertThat(steel.standardUncertaintyMPerS(WaveMode.LONGITUDINAL)).isCloseTo(50.0 / Math.sqrt(3.0), within(1e-12));
        assertThat(steel.standardUncertaintyMPerS(WaveMode.SHEAR)).isCloseTo(30.0 / Math.sqrt(3.0), within(1e-12));
        VelocitySource v = VelocitySource.ofMaterial(steel, WaveMode.SHEAR, null);
        assertThat(v.statedUncertaintyMPerS()).isEqualTo(30.0);
        assertThat(v.uncertaintyKind()).isEqualTo(UncertaintyKind.HALF_WIDTH);
        assertThat(v.source()).isEqualTo("iso-22232-2-steel-reference-values");
    }

    @Test
    void aStandardUncertaintyIsUsedAsItIsAndNoneStatedGivesNone() {
        Material measured = new Material("block-7", "Block 7", 5900.0, 3240.0, 12.0, 9.0, UncertaintyKind.STANDARD,
                "measured", null, Material.Origin.OPERATOR, false, false);
        assertThat(measured.standardUncertaintyMPerS(WaveMode.LONGITUDINAL)).isEqualTo(12.0);
        assertThat(builtIn("aluminium").standardUncertaintyMPerS(WaveMode.LONGITUDINAL)).isNull();
    }

    @Test
    void theRangeMidpointsOfTheTablesAreKeptExactly() {
        // Acoustical Properties of Common Materials (read second-hand): CRES 300 series 5613-5740 / 3048-3124 m/s.
        Material austenitic = builtIn("austenitic-stainless-steel");
        assertThat(austenitic.longitudinalMPerS()).isEqualTo((5613.0 + 5740.0) / 2.0);
        assertThat(austenitic.longitudinalUncertaintyMPerS()).isEqualTo((5740.0 - 5613.0) / 2.0);
        assertThat(austenitic.shearMPerS()).isEqualTo((3048.0 + 3124.0) / 2.0);
        assertThat(austenitic.shearUncertaintyMPerS()).isEqualTo((3124.0 - 3048.0) / 2.0);
        // The same table: cast irons 3505-5588 / 2210-3200 m/s.
        Material castIron = builtIn("cast-iron");
        assertThat(castIron.longitudinalMPerS()).isEqualTo((3505.0 + 5588.0) / 2.0);
        assertThat(castIron.longitudinalUncertaintyMPerS()).isEqualTo((5588.0 - 3505.0) / 2.0);
    }

    @Test
    void shearInACoarseGrainedMaterialCarriesACautionAndLongitudinalDoesNot() {
        Material austenitic = builtIn("austenitic-stainless-steel");
        assertThat(VelocitySource.ofMaterial(austenitic, WaveMode.SHEAR, null).caution()).contains("coarse-grained");
        assertThat(VelocitySource.ofMaterial(austenitic, WaveMode.LONGITUDINAL, null).caution()).isNull();
        assertThat(VelocitySource.ofMaterial(builtIn("carbon-steel"), WaveMode.SHEAR, null).caution()).isNull();
    }

    @Test
    void noTabulatedShearIsNotApplicableAndLiquidsCarryNoShear() {
        assertThatThrownBy(() -> VelocitySource.ofMaterial(builtIn("polystyrene"), WaveMode.SHEAR, null))
                .isInstanceOf(CalculationException.class).hasMessageContaining("no shear velocity");
        assertThatThrownBy(() -> VelocitySource.ofMaterial(builtIn("glycerine"), WaveMode.SHEAR, null))
                .isInstanceOf(CalculationException.class).hasMessageContaining("no shear wave");
        assertThatThrownBy(() -> VelocitySource.ofMaterial(builtIn("glycerine"), WaveMode.LONGITUDINAL, 30.0))
                .isInstanceOf(CalculationException.class).hasMessageContaining("only to water");
    }

    @Test
    void everyBuiltInSourceIsACatalogueEntry() {
        for (Material m : MaterialCatalog.all()) {
            if (m.origin() == Material.Origin.BUILT_IN) {
                assertThat(Sources.find(m.source())).as(m.id()).isPresent();
            }
        }
    }
}
