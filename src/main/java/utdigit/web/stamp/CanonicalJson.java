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
        StringBuilder out = new StringBuilder(256);
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
            out.append(number(node.doubleValue()));
        } else {
            throw new IllegalArgumentException("not a JSON value: " + node.getNodeType());
        }
    }

    /** RFC 8785 3.2.2.2: escape '"', '\\' and control characters; everything else literal. */
    static void string(String s, StringBuilder out) {
        out.append('"');
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '"' -> out.append("\\\"");
                case '\\' -> out.append("\\\\");
                case '\b' -> out.append("\\b");
                case '\f' -> out.append("\\f");
                case '\n' -> out.append("\\n");
                case '\r' -> out.append("\\r");
                case '\t' -> out.append("\\t");
                default -> {
                    if (c < 0x20) {
                        out.append(String.format("\\u%04x", (int) c));
                    } else {
                        out.append(c);
                    }
                }
            }
        }
        out.append('"');
    }

    /**
     * ECMAScript Number::toString of a finite double (ECMA-262 7.1.12.1, as RFC 8785 3.2.2.3
     * requires). The digits are the shortest that round-trip, chosen closest to the exact value.
     */
    public static String number(double value) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("RFC 8785 has no representation for " + value);
        }
        if (value == 0.0) {
            return "0";
        }
        StringBuilder out = new StringBuilder(24);
        if (value < 0) {
            out.append('-');
            value = -value;
        }
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
        // digits s (k of them) and exponent n such that value = s x 10^(n - k)
        BigDecimal stripped = shortest.stripTrailingZeros();
        String digits = stripped.unscaledValue().toString();
        int k = digits.length();
        int n = k - stripped.scale();
        if (k <= n && n <= 21) {
            out.append(digits);
            out.append("0".repeat(n - k));
        } else if (0 < n && n <= 21) {
            out.append(digits, 0, n).append('.').append(digits, n, k);
        } else if (-6 < n && n <= 0) {
            out.append("0.").append("0".repeat(-n)).append(digits);
        } else {
            int e = n - 1;
            out.append(digits.charAt(0));
            if (k > 1) {
                out.append('.').append(digits, 1, k);
            }
            out.append('e').append(e < 0 ? '-' : '+').append(Math.abs(e));
        }
        return out.toString();
    }
}
