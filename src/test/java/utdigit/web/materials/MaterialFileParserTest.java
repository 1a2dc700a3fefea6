package utdigit.web.materials;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import utdigit.core.materials.Material;
import utdigit.core.materials.UncertaintyKind;
import utdigit.core.materials.WaveMode;

class MaterialFileParserTest {

    private static List<Material> parse(String yaml) {
        return MaterialFileParser.parse("shop.yaml", yaml.getBytes(StandardCharsets.UTF_8));
    }

    private static void fails(String yaml, int line, int column, String words) {
        assertThatThrownBy(() -> parse(yaml)).isInstanceOfSatisfying(MaterialFileException.class, e -> {
            assertThat(e.source()).isEqualTo("shop.yaml");
            assertThat(e.line()).as("line").isEqualTo(line);
            assertThat(e.column()).as("column").isEqualTo(column);
            assertThat(e.getMessage()).contains(words);
        });
    }

    @Test
    void aValidFileGivesItsMaterials() {
        List<Material> ms = parse("""
                materials:
                  - id: a516-block-12
                    name: A516 grade 70 plate, calibration block 12 (measured)
                    longitudinal_m_per_s: 5912
                    shear_m_per_s: 3236
                    longitudinal_uncertainty_m_per_s: 6
                    shear_uncertainty_m_per_s: 5
                    uncertainty_kind: STANDARD
                    source: measured by the comparative method of ASTM E494, shop report QA-114
                  - id: shop-gel
                    name: Shop couplant gel
                    longitudinal_m_per_s: 1600
                    liquid: true
                    source: maker's data sheet
                """);
        assertThat(ms).extracting(Material::id).containsExactly("a516-block-12", "shop-gel");
        Material block = ms.get(0);
        assertThat(block.origin()).isEqualTo(Material.Origin.OPERATOR);
        assertThat(block.uncertaintyKind()).isEqualTo(UncertaintyKind.STANDARD);
        assertThat(block.standardUncertaintyMPerS(WaveMode.SHEAR)).isEqualTo(5.0);
        assertThat(ms.get(1).liquid()).isTrue();
        assertThat(ms.get(1).shearMPerS()).isNull();
    }

    @Test
    void problemsNameTheLineAndColumn() {
        fails("""
                materials:
                  - id: a516-block-12
                    name: Block
                    longitudinal_m_per_s: 59120
                    source: measured
                """, 4, 27, "from 100 to 20000");
        fails("""
                materials:
                  - id: a516-block-12
                    name: Block
                    longitudinal_m_per_s: 5912
                    velocity: 5912
                    source: measured
                """, 5, 5, "unknown field 'velocity'");
        fails("""
                materials:
                  - id: A516
                    name: Block
                    longitudinal_m_per_s: 5912
                    source: measured
                """, 2, 9, "kebab-case");
        fails("""
                materials:
                  - id: block
                    name: Block
                    longitudinal_m_per_s: 5912
                    longitudinal_uncertainty_m_per_s: 6
                    source: measured
                """, 5, 39, "uncertainty_kind");
        fails("""
                materials:
                  - name: Block
                    longitudinal_m_per_s: 5912
                    source: measured
                """, 2, 5, "no 'id'");
        fails("""
                materials:
                  - id: gel
                    name: Gel
                    longitudinal_m_per_s: 1600
                    shear_m_per_s: 800
                    liquid: true
                    source: data sheet
                """, 5, 20, "no shear wave");
    }

    @Test
    void aBuiltInIdOrAnIdUsedTwiceStopsTheLoad(@TempDir Path dir) throws Exception {
        Files.writeString(dir.resolve("a.yaml"), """
                materials:
                  - {id: carbon-steel, name: Mine, longitudinal_m_per_s: 5900, source: measured}
                """);
        assertThatThrownBy(() -> MaterialDirectory.load(dir)).isInstanceOf(MaterialFileException.class)
                // the id value "carbon-steel" stands at line 2, column 10 of "  - {id: carbon-steel, ..."
                .hasMessageContaining("a.yaml:2:10").hasMessageContaining("built-in");
        Files.writeString(dir.resolve("a.yaml"), """
                materials:
                  - {id: block, name: Mine, longitudinal_m_per_s: 5900, source: measured}
                """);
        Files.writeString(dir.resolve("b.yaml"), """
                materials:
                  - {id: block, name: Again, longitudinal_m_per_s: 5910, source: measured}
                """);
        assertThatThrownBy(() -> MaterialDirectory.load(dir)).isInstanceOf(MaterialFileException.class)
                .hasMessageContaining("b.yaml:2:10").hasMessageContaining("already defined");
        assertThatThrownBy(() -> MaterialDirectory.load(dir.resolve("absent")))
                .isInstanceOf(MaterialFileException.class).hasMessageContaining("UTDIGIT_MATERIALS_DIRECTORY");
    }
}
