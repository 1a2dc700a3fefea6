package utdigit.web.materials;

import io.swagger.v3.oas.annotations.media.Schema;
import java.util.List;

/** The built-in materials. */
@Schema(name = "MaterialList")
record MaterialList(@Schema(description = "Every built-in material, in a stable order") List<MaterialView> materials) {}
