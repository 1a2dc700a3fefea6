package utdigit.core.common;

import java.math.BigDecimal;
import java.math.MathContext;

/** Numbers written into warning and failure messages. */
public final class MessageNumbers {
    private MessageNumbers() {}

    /**
     * {@code x} rounded to the digits of {@code digits}, without trailing zeros or an exponent
     * ("0.000125", "5920"); a value that is not finite is written in words.
     */
    public static String plain(double x, MathContext digits) {
        if (!Double.isFinite(x)) {
            return x > 0 ? "infinity" : x < 0 ? "-infinity" : "not a number";
        }
        return new BigDecimal(x).round(digits).stripTrailingZeros().toPlainString();
    }

    /** {@code x} rounded to {@code significantDigits} digits, as {@link #plain(double, MathContext)}. */
    public static String plain(double x, int significantDigits) {
        return plain(x, new MathContext(significantDigits));
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
