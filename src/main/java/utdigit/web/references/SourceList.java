package utdigit.web.references;

import io.swagger.v3.oas.annotations.media.Schema;
import java.util.List;

/** The reference catalogue. */
@Schema(name = "SourceList")
record SourceList(@Schema(description = "Every source any answer cites, in a stable order") List<SourceView> references) {}
