package utdigit.web.json;

/** The fixed wording of input problems, in the caller's terms. */
public final class InputMessages {
    private InputMessages() {}

    /** A required property is missing (or null): the message of every request's {@code @NotNull}. */
    public static final String REQUIRED = "is required";

    public static final String FINITE_NUMBER = "must be a finite JSON number within the range of a double (not quoted, not NaN or Infinity, "
            + "not beyond about 1.8e308, not a non-zero value so small that it would read as 0)";
    public static final String WHOLE_NUMBER = "must be a whole number (an integral value such as 2 or 2.0)";
    public static final String TEXT = "must be a JSON string";
    public static final String LONE_SURROGATE = "holds a lone UTF-16 surrogate (an unpaired \\uD800-\\uDFFF escape): "
            + "not well-formed Unicode, refused as I-JSON (RFC 7493) requires";
    public static final String OBJECT = "must be a JSON object";
    public static final String ARRAY = "must be a JSON array";
    public static final String UNKNOWN_PROPERTY = "is not a property of this request";
    public static final String DUPLICATE_KEY = "appears more than once in the same object";
    public static final String MALFORMED = "the body is not well-formed JSON";
}
