package utdigit.core.common;

import java.math.BigDecimal;
import java.math.MathContext;

/** Numbers written into warning and failure messages. */
public final class MessageNumbers {
    private MessageNumbers() {}

    /** The significant digits of a computed number in a message. */
    private static final MathContext DIGITS = new MathContext(4);

    /**
     * A computed number as every message writes it: rounded to 4 significant digits, without
     * trailing zeros or an exponent ("0.000125", "5920", "1.184"); a value that is not finite is
     * written in words. The answer's own field holds the full value; a value the caller gave, or a
     * limit computed from one, is written {@link #exact}.
     */
    public static String rounded(double x) {
        return plain(x, DIGITS);
    }

    private static String plain(double x, MathContext digits) {
        if (!Double.isFinite(x)) {
            return x > 0 ? "infinity" : x < 0 ? "-infinity" : "not a number";
        }
        return new BigDecimal(x).round(digits).stripTrailingZeros().toPlainString();
    }

    /**
     * {@code x} in full (the shortest decimal that reads back as the same double), without trailing
     * zeros or an exponent ("5920", "0.5"): a value the caller gave, or a limit computed from one.
     */
    public static String exact(double x) {
        if (!Double.isFinite(x)) {
            return plain(x, MathContext.UNLIMITED);
        }
        return BigDecimal.valueOf(x).stripTrailingZeros().toPlainString();
    }
}
