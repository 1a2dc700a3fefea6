package utdigit.web.stamp;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import tools.jackson.core.io.NumberOutput;
import tools.jackson.databind.JsonNode;

/**
 * The JSON Canonicalization Scheme of RFC 8785 (JCS) over a Jackson tree: object members sorted
 * by their names' UTF-16 code units, no white space, strings escaped as RFC 8785 3.2.2.2 says, and
 * numbers written as ECMAScript's Number.prototype.toString does (RFC 8785 3.2.2.3): the shortest
 * decimal that reads back as the same IEEE 754 double, in plain notation for 1e-7 <= |x| < 1e21
 * and exponent notation otherwise, -0 written as 0. A string with a lone surrogate, or a number
 * that is not finite, has no canonical form: refused (IllegalArgumentException).
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
        if (!IJson.wellFormed(s)) {
            // RFC 8785 3.2.2.2 and RFC 7493 2.1: a lone surrogate has no UTF-8 form; writing one as '?'
            // would give two documents one stamp.
            throw new IllegalArgumentException("RFC 8785 has no representation for a lone surrogate");
        }
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
     * requires): the fewest significant digits k of any decimal s x 10^(n - k) that reads back as
     * {@code value}; among several such s, the one closest to the exact value; of two equally close,
     * the even one.
     *
     * <p>Two paths give that answer: {@link #referenceDigits} applies the definition with
     * BigDecimal (a few microseconds per number), and {@link #shortestDigits} takes the digits of
     * Jackson's port of the Schubfach algorithm (the algorithm of Java 19's Double.toString), which
     * differs from ECMA-262 in one case only, corrected there. A test checks that both paths agree
     * on a million seeded doubles.
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
        if (!appendShortDecimal(value, out) && !appendPlainSchubfach(value, out)) {
            format(value < 0, shortestDigits(Math.abs(value)), out);
        }
    }

    /**
     * A double from 1e-3 to below 1e7, not an integer, that Schubfach writes with more than two
     * significant digits: its text is already ECMA-262's (the same digits, see {@link #shortestDigits},
     * which corrects two-digit answers only; the same plain notation). Returns false (nothing
     * appended) otherwise.
     */
    static boolean appendPlainSchubfach(double value, StringBuilder out) {
        double abs = Math.abs(value);
        if (abs < 1e-3 || abs >= 1e7) {
            return false;
        }
        String text = NumberOutput.toString(abs, true);
        if (text.endsWith(".0")) {
            return false; // an integer: the other paths
        }
        int significant = 0;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c == 'E') {
                return false;
            }
            if (c >= '1' && c <= '9' || c == '0' && significant > 0) {
                significant++;
            }
        }
        if (significant <= 2) {
            return false;
        }
        if (value < 0) {
            out.append('-');
        }
        out.append(text);
        return true;
    }

    /** Powers of ten, as exact doubles and as longs, up to 10^18. */
    private static final double[] POW10 = {1e0, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12,
        1e13, 1e14, 1e15, 1e16, 1e17, 1e18};
    private static final long[] LONG_POW10 = {1L, 10L, 100L, 1_000L, 10_000L, 100_000L, 1_000_000L, 10_000_000L,
        100_000_000L, 1_000_000_000L, 10_000_000_000L, 100_000_000_000L, 1_000_000_000_000L, 10_000_000_000_000L,
        100_000_000_000_000L, 1_000_000_000_000_000L, 10_000_000_000_000_000L, 100_000_000_000_000_000L,
        1_000_000_000_000_000_000L};
    /** The short-decimal path takes decimals of fewer than 15 significant digits only. */
    private static final double SHORT = 1e15;

    /**
     * The common case without Schubfach: a value that is an integer below 2^53, or a decimal m / 10^q
     * with m below 10^15 and 1e-6 <= |value| (ECMA-262's plain notation), found for the smallest q.
     * Why that is ECMA-262's answer: m / 10^q == value is a division of two exact doubles, correctly
     * rounded, so it holds exactly when the decimal reads back as value; the decimals that read back
     * lie within one ulp of value (less than 2.3e-16 |value|), while two decimals with q digits
     * after the point and m below 10^15 are more than 1e-15 |value| apart, so at most one reads back
     * for each q and the rounded m finds it; the smallest q that has one gives the fewest
     * significant digits (no power of ten 10^j with j >= 0 lies inside another double's interval, one
     * with j < 0 is found at q = -j). A test compares it with the BigDecimal definition on millions of
     * doubles. Returns false (nothing appended) where it does not apply.
     */
    static boolean appendShortDecimal(double value, StringBuilder out) {
        double abs = Math.abs(value);
        if (abs >= 0x1p53 || abs < 1e-6) {
            return false;
        }
        for (int q = 0; q < POW10.length; q++) {
            double scaled = abs * POW10[q];
            if (scaled >= SHORT) {
                return q == 0 && appendInteger(value, abs, out);
            }
            long m = Math.round(scaled);
            // m / 10^q reads back only if abs * 10^q is within 2^-52 of it, relatively (half an ulp of abs,
            // and the rounding of the product): anything farther is no candidate, and needs no division
            if (Math.abs(scaled - m) > scaled * 0x1p-51) {
                continue;
            }
            if (m != 0 && m / POW10[q] == abs) {
                if (q > 0 && m % 10 == 0) {
                    return false; // not the smallest q: the proof above says this cannot happen; the slow path decides
                }
                if (value < 0) {
                    out.append('-');
                }
                if (q == 0) {
                    out.append(m);
                    return true;
                }
                long whole = m / LONG_POW10[q];
                long fraction = m % LONG_POW10[q];
                out.append(whole).append('.');
                for (long p = LONG_POW10[q - 1]; p > fraction; p /= 10) {
                    out.append('0');
                }
                out.append(fraction);
                return true;
            }
        }
        return false;
    }

    /** An integer from 10^15 to 2^53: its digits (no other decimal of as few digits reads back). */
    private static boolean appendInteger(double value, double abs, StringBuilder out) {
        long m = (long) abs;
        if (m != abs) {
            return false;
        }
        if (value < 0) {
            out.append('-');
        }
        out.append(m);
        return true;
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

    /**
     * The definition, for a positive finite double: for k = 1, 2, ... the two k-digit decimals
     * around the exact value (the exact value rounded down and up to k significant digits); the
     * first k where one of them reads back (correctly rounded parsing, BigDecimal.doubleValue) gives
     * the answer, the closer of the two if both do, the even one if they are equally close. No other
     * k-digit decimal need be tried: the decimals that read back form an interval around the exact
     * value, so if any k-digit one does, the nearer one on its side does too.
     */
    static Digits referenceDigits(double value) {
        BigDecimal exact = new BigDecimal(value);
        for (int k = 1; k <= 17; k++) {
            BigDecimal down = exact.round(new MathContext(k, RoundingMode.FLOOR));
            BigDecimal up = exact.round(new MathContext(k, RoundingMode.CEILING));
            boolean downReads = down.signum() > 0 && down.doubleValue() == value;
            boolean upReads = up.doubleValue() == value;
            BigDecimal chosen;
            if (downReads && upReads && down.compareTo(up) != 0) {
                int closer = exact.subtract(down).compareTo(up.subtract(exact));
                if (closer != 0) {
                    chosen = closer < 0 ? down : up;
                } else {
                    chosen = down.unscaledValue().testBit(0) ? up : down;
                }
            } else if (downReads) {
                chosen = down;
            } else if (upReads) {
                chosen = up;
            } else {
                continue;
            }
            BigDecimal stripped = chosen.stripTrailingZeros();
            String digits = stripped.unscaledValue().toString();
            return new Digits(digits, digits.length() - stripped.scale());
        }
        throw new IllegalStateException("no 17-digit form for " + value);
    }

    /**
     * The definition's digits the fast way, for a positive finite double. Schubfach (Jackson's
     * {@link NumberOutput#toString(double, boolean)}) returns the decimal closest to the exact value
     * among the shortest that read back, even on a tie, as ECMA-262 asks, except where one digit
     * would do: it then chooses among the one- and two-digit decimals that read back, and can return
     * two digits (Double.MIN_VALUE: 4.9E-324, where ECMA-262 writes 5e-324). A two-digit answer is
     * therefore checked against the one-digit decimals around it.
     */
    static Digits shortestDigits(double value) {
        String text = NumberOutput.toString(value, true); // "ddd.ddd" or "d.dddE[-]x"
        int end = text.indexOf('E');
        int exponent = end < 0 ? 0 : Integer.parseInt(text, end + 1, text.length(), 10);
        end = end < 0 ? text.length() : end;
        int dot = text.indexOf('.');
        int first = 0; // the first significant digit
        while (first < end && (text.charAt(first) == '0' || text.charAt(first) == '.')) {
            first++;
        }
        int last = end - 1; // the last significant digit
        while (last > first && (text.charAt(last) == '0' || text.charAt(last) == '.')) {
            last--;
        }
        StringBuilder digits = new StringBuilder(17);
        for (int i = first; i <= last; i++) {
            char c = text.charAt(i);
            if (c != '.') {
                digits.append(c);
            }
        }
        int point = dot < 0 ? end : dot;
        int n = (first < point ? point - first : -(first - point - 1)) + exponent; // digits before the point
        if (digits.length() == 2) {
            int lead = digits.charAt(0) - '0';
            boolean downReads = readsBack(lead, n - 1, value);
            boolean upReads = lead < 9 ? readsBack(lead + 1, n - 1, value) : readsBack(1, n, value);
            if (downReads && upReads) {
                return referenceDigits(value); // both one-digit neighbours read back: subnormals only
            }
            if (downReads) {
                return new Digits(Integer.toString(lead), n);
            }
            if (upReads) {
                return lead < 9 ? new Digits(Integer.toString(lead + 1), n) : new Digits("1", n + 1);
            }
        }
        return new Digits(digits.toString(), n);
    }

    /** Whether the one-digit decimal d x 10^q reads back as {@code value} (correctly rounded parsing). */
    private static boolean readsBack(int d, int q, double value) {
        return Double.parseDouble(d + "E" + q) == value;
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
