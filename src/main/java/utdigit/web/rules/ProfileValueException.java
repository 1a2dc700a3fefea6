package utdigit.web.rules;

import tools.jackson.core.JsonParser;
import tools.jackson.core.TokenStreamLocation;
import tools.jackson.databind.exc.MismatchedInputException;

/**
 * A value of a profile file that is well-formed YAML but not allowed by the profile format, at the
 * position of its token. A Jackson exception, so that binding adds the path (rules[2].metric) on
 * its way out; its message is written for the profile's author.
 */
final class ProfileValueException extends MismatchedInputException {
    private final String hint;

    ProfileValueException(JsonParser p, String problem, TokenStreamLocation at) {
        this(p, problem, "", at);
    }

    /** With a hint (such as the names that would be allowed) that the message gives after the path. */
    ProfileValueException(JsonParser p, String problem, String hint, TokenStreamLocation at) {
        super(p, problem, at);
        this.hint = hint;
    }

    /** "; did you mean ...", or empty. */
    String hint() {
        return hint;
    }
}
