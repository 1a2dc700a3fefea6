package utdigit.web.stamp;

/**
 * I-JSON (RFC 7493) checks of text: a string or a member name must be well-formed Unicode, so no
 * lone UTF-16 surrogate (RFC 7493 2.1). Such a string has no UTF-8 form; a canonical form or a
 * stamp over it could not tell it from another string.
 */
public final class IJson {
    private IJson() {}

    /** The index of the first lone surrogate of {@code s}, or -1 when it is well-formed. */
    public static int loneSurrogate(String s) {
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (Character.isHighSurrogate(c)) {
                if (i + 1 < s.length() && Character.isLowSurrogate(s.charAt(i + 1))) {
                    i++;
                    continue;
                }
                return i;
            }
            if (Character.isLowSurrogate(c)) {
                return i;
            }
        }
        return -1;
    }

    /** Whether {@code s} holds no lone surrogate. */
    public static boolean wellFormed(String s) {
        return loneSurrogate(s) < 0;
    }

    /** {@code s} with each lone surrogate shown as U+FFFD, for a pointer or a message. */
    public static String printable(String s) {
        if (wellFormed(s)) {
            return s;
        }
        StringBuilder out = new StringBuilder(s.length());
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (Character.isHighSurrogate(c) && i + 1 < s.length() && Character.isLowSurrogate(s.charAt(i + 1))) {
                out.append(c).append(s.charAt(++i));
            } else {
                out.append(Character.isSurrogate(c) ? '\uFFFD' : c);
            }
        }
        return out.toString();
    }
}
