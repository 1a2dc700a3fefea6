package utdigit.web.json;

import utdigit.web.stamp.IJson;

/** Building RFC 6901 JSON Pointers. */
public final class JsonPointers {
    private JsonPointers() {}

    /**
     * Escapes one reference token: '~' becomes "~0", '/' becomes "~1"; a lone surrogate (refused
     * input, which no answer can hold) is shown as U+FFFD.
     */
    public static String escape(String token) {
        return IJson.printable(token).replace("~", "~0").replace("/", "~1");
    }

    /** The pointer to a top-level property. */
    public static String property(String name) {
        return "/" + escape(name);
    }

    /** {@code parent} followed by the token {@code name}. */
    public static String child(String parent, String name) {
        return parent + "/" + escape(name);
    }
}
