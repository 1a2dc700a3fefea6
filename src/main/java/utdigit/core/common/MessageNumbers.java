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
}
