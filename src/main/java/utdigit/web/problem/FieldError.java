package utdigit.web.problem;

import utdigit.web.json.JsonPointers;

/**
 * One thing wrong with one field of a request.
 *
 * @param pointer RFC 6901 JSON Pointer to the field ("/frequency_mhz"), or "" for the whole body
 * @param detail what is wrong, in the caller's terms
 */
public record FieldError(String pointer, String detail) {

    /** The pointer of a top-level property. */
    public static FieldError at(String property, String detail) {
        return new FieldError(JsonPointers.property(property), detail);
    }
}
