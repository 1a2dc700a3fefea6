package utdigit.web.materials;

import jakarta.annotation.PreDestroy;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.springframework.beans.factory.annotation.Value;
import org.springframework.stereotype.Component;
import utdigit.core.materials.Material;
import utdigit.core.materials.MaterialCatalog;

/**
 * The operator's materials, loaded and validated once at start-up from every {@code *.yaml} file
 * directly in the directory of property {@code utdigit.materials.directory} (environment variable
 * {@code UTDIGIT_MATERIALS_DIRECTORY}; empty: none), format {@link MaterialFileParser}. Any problem
 * stops start-up with a {@link MaterialFileException} naming the file, line and column: a
 * configured directory that does not exist, a file that is not valid, an id used twice or a
 * built-in material's id. The materials then serve every calculation beside the built-in ones.
 */
@Component
public class MaterialDirectory {
    private static final Logger log = LoggerFactory.getLogger(MaterialDirectory.class);

    private final List<Material> replaced;

    public MaterialDirectory(@Value("${utdigit.materials.directory:}") String directory) {
        List<Material> materials = directory == null || directory.isBlank()
                ? List.of() : load(Path.of(directory.strip()));
        this.replaced = MaterialCatalog.installOperatorMaterials(materials);
        if (!materials.isEmpty()) {
            log.info("Loaded {} operator materials: {}", materials.size(),
                    String.join(", ", materials.stream().map(Material::id).toList()));
        }
    }

    /** Puts back the materials this directory replaced (a closed application context leaves no trace). */
    @PreDestroy
    void restore() {
        MaterialCatalog.installOperatorMaterials(replaced);
    }

    static List<Material> load(Path directory) {
        Path dir = directory.toAbsolutePath().normalize();
        if (!Files.isDirectory(dir)) {
            throw new MaterialFileException(dir.toString(), 0, 0, "the materials directory (utdigit.materials.directory,"
                    + " UTDIGIT_MATERIALS_DIRECTORY) does not exist or is not a directory; leave it empty for built-in "
                    + "materials only");
        }
        List<Path> files;
        try (Stream<Path> list = Files.list(dir)) {
            files = list.filter(f -> f.getFileName().toString().endsWith(".yaml") && Files.isRegularFile(f))
                    .sorted(Comparator.comparing(f -> f.getFileName().toString())).toList();
        } catch (IOException e) {
            throw new MaterialFileException(dir.toString(), 0, 0, "cannot list the materials directory: " + e.getMessage());
        }
        List<Material> all = new ArrayList<>();
        Map<String, String> seen = new HashMap<>();
        for (Path f : files) {
            List<MaterialFileParser.Located> parsed;
            try {
                parsed = MaterialFileParser.parseLocated(f.toString(), Files.readAllBytes(f));
            } catch (IOException e) {
                throw new MaterialFileException(f.toString(), 0, 0, "cannot read: " + e.getMessage());
            }
            for (MaterialFileParser.Located located : parsed) {
                Material m = located.material();
                if (MaterialCatalog.isBuiltIn(m.id())) {
                    throw new MaterialFileException(f.toString(), located.idLine(), located.idColumn(), "material id '"
                            + m.id() + "' is a built-in material's: give the operator material its own id");
                }
                String first = seen.putIfAbsent(m.id(), f.toString());
                if (first != null) {
                    throw new MaterialFileException(f.toString(), located.idLine(), located.idColumn(), "material id '"
                            + m.id() + "' is already defined in " + first);
                }
                all.add(m);
            }
        }
        if (files.isEmpty()) {
            log.warn("The materials directory {} holds no *.yaml file", dir);
        }
        return all;
    }
}
