package utdigit.web.materials;

import utdigit.web.json.FileLocatedException;

/** An operator materials file (or its directory) that cannot be used; "path:line:column: problem". */
public final class MaterialFileException extends FileLocatedException {
    MaterialFileException(String source, int line, int column, String problem) {
        super(source + (line > 0 ? ":" + line + ":" + column : "") + ": " + problem, source, line, column, problem);
    }
}
