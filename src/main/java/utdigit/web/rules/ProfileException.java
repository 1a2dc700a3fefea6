package utdigit.web.rules;

import utdigit.web.json.FileLocatedException;

/**
 * A requirement profile that cannot be loaded (a bad profile stops the service instead of
 * validating sheets wrongly); the source is an absolute path, or
 * {@code classpath:profiles/<name>.yaml} for a built-in one.
 */
public final class ProfileException extends FileLocatedException {
    public ProfileException(String source, int line, int column, String problem) {
        super("requirement profile " + source + (line > 0 ? ", line " + line + ", column " + column : "") + ": "
                + problem, source, line, column, problem);
    }
}
