package utdigit.core.common;

import java.util.Objects;

/**
 * A condition the caller should know about that does not make the result invalid, for example a
 * value that does not exist for the given inputs (returned as null) or a model that is optimistic.
 *
 * @param code stable UPPER_SNAKE_CASE identifier a client can switch on
 * @param message human-readable explanation in the caller's terms
 */
public record Warning(String code, String message) {
    public Warning {
        Objects.requireNonNull(code, "code");
        Objects.requireNonNull(message, "message");
    }

    public static Warning of(String code, String message) {
        return new Warning(code, message);
    }
}
