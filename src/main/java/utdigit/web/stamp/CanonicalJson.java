package utdigit.web.stamp;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import tools.jackson.databind.JsonNode;

/**
 * The JSON Canonicalization Scheme of RFC 8785 (JCS) over a Jackson tree: object members sorted
 * by their names' UTF-16 code units, no white space, strings escaped as RFC 8785 3.2.2.2 says, and
 * numbers written as ECMAScript's Number.prototype.toString does (RFC 8785 3.2.2.3): the shortest
 * decimal that reads back as the same IEEE 754 double, in plain notation for 1e-7 <= |x| < 1e21
 * and exponent notation otherwise, -0 written as 0.
 */
public final class CanonicalJson {
    private CanonicalJson() {}

    /** The canonical UTF-8 bytes of {@code node}. */
    public static byte[] bytes(JsonNode node) {
        return text(node).getBytes(StandardCharsets.UTF_8);
    }

    /** The canonical text of {@code node}. */
    public static String text(JsonNode node) {
        StringBuilder out = new StringBuilder(4096); // an answer is a few kB: no regrowth
        write(node, out);
        return out.toString();
    }

    private static void write(JsonNode node, StringBuilder out) {
        if (node == null || node.isNull() || node.isMissingNode()) {
            out.append("null");
        } else if (node.isObject()) {
            List<Map.Entry<String, JsonNode>> members = new ArrayList<>(node.properties());
            members.sort(Map.Entry.comparingByKey());
            out.append('{');
            boolean first = true;
            for (Map.Entry<String, JsonNode> m : members) {
                if (!first) {
                    out.append(',');
                }
                first = false;
                string(m.getKey(), out);
                out.append(':');
                write(m.getValue(), out);
            }
            out.append('}');
        } else if (node.isArray()) {
            out.append('[');
            for (int i = 0; i < node.size(); i++) {
                if (i > 0) {
                    out.append(',');
                }
                write(node.get(i), out);
            }
            out.append(']');
        } else if (node.isString()) {
            string(node.stringValue(), out);
        } else if (node.isBoolean()) {
            out.append(node.booleanValue() ? "true" : "false");
        } else if (node.isNumber()) {
            appendNumber(node.doubleValue(), out);
        } else {
            throw new IllegalArgumentException("not a JSON value: " + node.getNodeType());
        }
    }

    /**
     * RFC 8785 3.2.2.2: escape '"', '\\' and control characters; everything else literal. Runs
     * without escapes are appended whole.
     */
    static void string(String s, StringBuilder out) {
        out.append('"');
        int run = 0;
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c != '"' && c != '\\' && c >= 0x20) {
                continue;
            }
            out.append(s, run, i);
            run = i + 1;
            switch (c) {
                case '"' -> out.append("\\\"");
                case '\\' -> out.append("\\\\");
                case '\b' -> out.append("\\b");
                case '\f' -> out.append("\\f");
                case '\n' -> out.append("\\n");
                case '\r' -> out.append("\\r");
                case '\t' -> out.append("\\t");
                default -> out.append(String.format("\\u%04x", (int) c));
            }
        }
        out.append(s, run, s.length());
        out.append('"');
    }

    /**
     * ECMAScript Number::toString of a finite double (ECMA-262 7.1.12.1, as RFC 8785 3.2.2.3
     * requires). The digits are the shortest that round-trip, chosen closest to the exact value:
     * for precision 1, 2, ... 17 the exact value rounded half-even to that many digits, the first
     * that reads back as {@code value}.
     *
     * <p>Two paths give that answer: {@link #referenceDigits} rounds the exact binary value with
     * BigDecimal at every precision (the definition; a few microseconds per number), and
     * {@link #fastDigits} derives the same digits from {@link Double#toString(double)} with only
     * long arithmetic and proves each step, handing every case it cannot prove to the reference.
     * A test checks that both agree on a million seeded doubles.
     */
    public static String number(double value) {
        StringBuilder out = new StringBuilder(24);
        appendNumber(value, out);
        return out.toString();
    }

    /** {@link #number} appended to {@code out}. */
    static void appendNumber(double value, StringBuilder out) {
        checkFinite(value);
        if (value == 0.0) {
            out.append('0');
            return;
        }
        Digits d = fastDigits(Math.abs(value));
        if (d == null) {
            d = referenceDigits(Math.abs(value));
        }
        format(value < 0, d, out);
    }

    /** The reference path alone: {@link #number} computed with BigDecimal only. */
    static String referenceNumber(double value) {
        checkFinite(value);
        if (value == 0.0) {
            return "0";
        }
        StringBuilder out = new StringBuilder(24);
        format(value < 0, referenceDigits(Math.abs(value)), out);
        return out.toString();
    }

    private static void checkFinite(double value) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("RFC 8785 has no representation for " + value);
        }
    }

    /**
     * The shortest round-trip digits s (no trailing zeros, k of them) and the exponent n with
     * value = s x 10^(n - k), ECMA-262's names.
     */
    record Digits(String digits, int n) {}

    /** The definition: the exact value rounded half-even at precision 1..17, the first that round-trips. */
    static Digits referenceDigits(double value) {
        BigDecimal exact = new BigDecimal(value);
        BigDecimal shortest = null;
        for (int precision = 1; precision <= 17; precision++) {
            BigDecimal candidate = exact.round(new MathContext(precision, RoundingMode.HALF_EVEN));
            if (candidate.doubleValue() == value) {
                shortest = candidate;
                break;
            }
        }
        if (shortest == null) {
            throw new IllegalStateException("no 17-digit form for " + value);
        }
        BigDecimal stripped = shortest.stripTrailingZeros();
        String digits = stripped.unscaledValue().toString();
        return new Digits(digits, digits.length() - stripped.scale());
    }

    private static final long[] POW10 = new long[19];
    private static final long[] POW5 = new long[28];

    static {
        POW10[0] = 1;
        for (int i = 1; i < POW10.length; i++) {
            POW10[i] = POW10[i - 1] * 10;
        }
        POW5[0] = 1;
        for (int i = 1; i < POW5.length; i++) {
            POW5[i] = POW5[i - 1] * 5;
        }
    }

    /** A comparison that the fast path's 128-bit arithmetic cannot make. */
    private static final int UNKNOWN = 2;

    /**
     * The reference's digits computed another way, or null where this way cannot answer (then the
     * caller uses the reference). The same definition, with exact integer comparisons in place of
     * BigDecimal rounding:
     *
     * <ol>
     *   <li>S = s x 10^(n - L), the digits of {@link Double#toString(double)}: they read back as
     *       {@code value} (checked here), but on Java 17 are not always the shortest nor the
     *       closest, so they only seed the search.
     *   <li>For p = 1 .. L: the p-digit decimal R nearest the exact value, half-even (the
     *       reference's candidate): S rounded to p digits, moved by one grid step while the exact
     *       value lies beyond the midpoint to the neighbour (the exact value is within half a gap
     *       between doubles of S). The first R that reads back as {@code value} is the answer.
     *   <li>A precision p is skipped without work when S is more than 2u from every p-digit
     *       decimal, u being the larger gap between {@code value} and a neighbouring double in units
     *       of S's last digit: then every p-digit decimal is more than 1.5u from the exact value and
     *       none reads back (a decimal reads back only within u/2). The factor of two covers the
     *       rounding of the double arithmetic of u.
     * </ol>
     *
     * <p>"Reads back" is decided exactly as correctly rounded parsing (Double.parseDouble,
     * BigDecimal.doubleValue) decides it: strictly inside the interval between the midpoints to the
     * neighbouring doubles, or on a midpoint when {@code value}'s significand is even (ties to
     * even). Every comparison of a decimal d x 10^q with a binary m x 2^e is exact in 128-bit
     * integers for |q| <= 27; values that need more (below about 1e-10 or above 1e27 with many
     * digits), subnormals and 18-digit forms of Double.toString are left to the reference.
     */
    static Digits fastDigits(double value) {
        if (!(value >= Double.MIN_NORMAL && value <= Double.MAX_VALUE)) {
            return null;
        }
        long bits = Double.doubleToRawLongBits(value);
        int biased = (int) (bits >>> 52);
        long m = (bits & 0x000F_FFFF_FFFF_FFFFL) | 0x0010_0000_0000_0000L; // value = m x 2^e exactly
        int e = biased - 1075;
        boolean narrowBelow = m == 0x0010_0000_0000_0000L && biased > 1; // the gap below is half the gap above

        String text = Double.toString(value); // "ddd.ddd" or "d.dddE[-]x"
        int end = text.indexOf('E');
        int exponent = end < 0 ? 0 : Integer.parseInt(text, end + 1, text.length(), 10);
        end = end < 0 ? text.length() : end;
        int dot = text.indexOf('.');
        if (dot < 0 || dot > end) {
            return null;
        }
        int first = 0; // the first significant digit
        while (first < end && (text.charAt(first) == '0' || text.charAt(first) == '.')) {
            first++;
        }
        int last = end - 1; // the last significant digit
        while (last > first && (text.charAt(last) == '0' || text.charAt(last) == '.')) {
            last--;
        }
        long s = 0;
        int length = 0;
        for (int i = first; i <= last; i++) {
            char c = text.charAt(i);
            if (c != '.') {
                if (length == 17) {
                    return null;
                }
                s = s * 10 + (c - '0');
                length++;
            }
        }
        int n = (first < dot ? dot - first : -(first - dot - 1)) + exponent; // digits before the point
        if (s <= 0 || readsBack(s, n - length, m, e, narrowBelow) != 1) {
            return null;
        }
        double u = s * Math.ulp(value) / value;

        for (int p = 1; p <= length; p++) {
            int k = length - p;
            long cell = POW10[k];
            long tail = s % cell;
            if (Math.min(tail, cell - tail) > 2.0 * u) {
                continue;
            }
            int q = n - p; // R = g x 10^q
            long g = s / cell + (2 * tail >= cell ? 1 : 0);
            // move g to the p-digit decimal nearest the exact value; midpoints are (2g +/- 1) x 5 x 10^(q - 1)
            while (true) {
                int above = compare((2 * g + 1) * 5, q - 1, m, e);
                if (above == UNKNOWN) {
                    return null;
                }
                if (above < 0 || (above == 0 && g % 2 == 1)) {
                    g++;
                    continue;
                }
                int below = g == 0 ? -1 : compare((2 * g - 1) * 5, q - 1, m, e);
                if (below == UNKNOWN) {
                    return null;
                }
                if (below > 0 || (below == 0 && g % 2 == 1)) {
                    g--;
                    continue;
                }
                break;
            }
            if (g < POW10[p - 1] || g > POW10[p]) {
                return null; // the exact value and S on two sides of a power of ten: left to the reference
            }
            int back = readsBack(g, q, m, e, narrowBelow);
            if (back == UNKNOWN) {
                return null;
            }
            if (back == 1) {
                return g == POW10[p] ? new Digits("1", n + 1) : new Digits(stripZeros(g), n);
            }
        }
        return null; // no precision up to L reads back: the reference goes on to L + 1 and beyond
    }

    /**
     * 1 when d x 10^q reads back as the double m x 2^e (strictly between the midpoints to its
     * neighbours, or on one with m even), 0 when it does not, {@link #UNKNOWN} when not decidable here.
     */
    private static int readsBack(long d, int q, long m, int e, boolean narrowBelow) {
        int upper = compare(d, q, 2 * m + 1, e - 1);
        int lower = narrowBelow ? compare(d, q, 4 * m - 1, e - 2) : compare(d, q, 2 * m - 1, e - 1);
        if (upper == UNKNOWN || lower == UNKNOWN) {
            return UNKNOWN;
        }
        boolean even = (m & 1) == 0;
        boolean inside = (lower > 0 || (lower == 0 && even)) && (upper < 0 || (upper == 0 && even));
        return inside ? 1 : 0;
    }

    /**
     * The sign of d x 10^q - b x 2^e, exact, for 0 <= d < 2^63, 0 < b < 2^62 and |q| <= 27
     * ({@link #UNKNOWN} otherwise): 5^q and the products fit in 128 bits.
     */
    static int compare(long d, int q, long b, int e) {
        if (q > 27 || q < -27 || d < 0 || b <= 0) {
            return UNKNOWN;
        }
        if (q >= 0) { // d 5^q 2^q against b 2^e
            long five = POW5[q];
            return compareShifted(Math.multiplyHigh(d, five), d * five, q, 0L, b, e);
        }
        // divide both by 10^q: d 2^q against b 5^-q 2^e
        long five = POW5[-q];
        return compareShifted(0L, d, q, Math.multiplyHigh(b, five), b * five, e);
    }

    /** The sign of X 2^x - Y 2^y for unsigned 128-bit X = (xHi, xLo) and Y = (yHi, yLo). */
    private static int compareShifted(long xHi, long xLo, int x, long yHi, long yLo, int y) {
        if (x >= y) {
            return compareShiftedLeft(xHi, xLo, x - y, yHi, yLo);
        }
        return -compareShiftedLeft(yHi, yLo, y - x, xHi, xLo);
    }

    /** The sign of X 2^c - Y, c >= 0. */
    private static int compareShiftedLeft(long xHi, long xLo, int c, long yHi, long yLo) {
        int xBits = bitLength(xHi, xLo);
        int yBits = bitLength(yHi, yLo);
        if (xBits == 0) {
            return yBits == 0 ? 0 : -1;
        }
        long xb = (long) xBits + c;
        if (xb != yBits) {
            return xb > yBits ? 1 : -1;
        }
        // same bit length, at most 128: the shift fits
        long hi;
        long lo;
        if (c == 0) {
            hi = xHi;
            lo = xLo;
        } else if (c >= 64) {
            hi = xLo << (c - 64);
            lo = 0L;
        } else {
            hi = (xHi << c) | (xLo >>> (64 - c));
            lo = xLo << c;
        }
        int byHigh = Long.compareUnsigned(hi, yHi);
        return byHigh != 0 ? Integer.signum(byHigh) : Integer.signum(Long.compareUnsigned(lo, yLo));
    }

    private static int bitLength(long hi, long lo) {
        return hi != 0 ? 128 - Long.numberOfLeadingZeros(hi) : 64 - Long.numberOfLeadingZeros(lo);
    }

    private static String stripZeros(long digits) {
        while (digits % 10 == 0) {
            digits /= 10;
        }
        return Long.toString(digits);
    }

    private static void format(boolean negative, Digits d, StringBuilder out) {
        if (negative) {
            out.append('-');
        }
        String digits = d.digits();
        int k = digits.length();
        int n = d.n();
        if (k <= n && n <= 21) {
            out.append(digits);
            for (int i = k; i < n; i++) {
                out.append('0');
            }
        } else if (0 < n && n <= 21) {
            out.append(digits, 0, n).append('.').append(digits, n, k);
        } else if (-6 < n && n <= 0) {
            out.append("0.");
            for (int i = n; i < 0; i++) {
                out.append('0');
            }
            out.append(digits);
        } else {
            int e = n - 1;
            out.append(digits.charAt(0));
            if (k > 1) {
                out.append('.').append(digits, 1, k);
            }
            out.append('e').append(e < 0 ? '-' : '+').append(Math.abs(e));
        }
    }
}
