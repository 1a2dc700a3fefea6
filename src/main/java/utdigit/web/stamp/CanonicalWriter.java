package utdigit.web.stamp;

import java.io.OutputStream;
import java.math.BigDecimal;
import java.math.BigInteger;
import tools.jackson.core.JsonGenerator;
import tools.jackson.core.SerializableString;
import tools.jackson.core.json.JsonWriteFeature;
import tools.jackson.core.util.JsonGeneratorDelegate;
import tools.jackson.databind.MapperFeature;
import tools.jackson.databind.ObjectWriter;
import tools.jackson.databind.SerializationFeature;
import tools.jackson.databind.json.JsonMapper;

/**
 * Writes the RFC 8785 canonical form of a {@link Stamped} answer straight from the typed answer
 * into a stream (the digest), with no tree: the service's own mapper (same names, same omissions)
 * with members and map entries sorted by name (UTF-16 code units, as String order is), escapes as
 * RFC 8785 3.2.2.2 writes them (short forms for \b \t \n \f \r, lower-case &#92;u00xx for the other
 * control characters, nothing else escaped), and numbers in ECMAScript's form
 * ({@link CanonicalJson#number}). The bytes equal {@link CanonicalJson} over the same answer as a
 * tree (a test checks it on every committed example answer).
 */
final class CanonicalWriter {
    /** Integers up to 2^53 read back exactly as doubles; above, the double's text is the canonical one. */
    private static final long EXACT = 1L << 53;

    private final ObjectWriter writer;

    CanonicalWriter(JsonMapper mapper) {
        this.writer = mapper.rebuild()
                .enable(MapperFeature.SORT_PROPERTIES_ALPHABETICALLY)
                .disable(MapperFeature.SORT_CREATOR_PROPERTIES_FIRST) // a record's members are its creator's: sort them too
                .enable(SerializationFeature.ORDER_MAP_ENTRIES_BY_KEYS)
                .disable(SerializationFeature.INDENT_OUTPUT)
                .disable(JsonWriteFeature.WRITE_HEX_UPPER_CASE, JsonWriteFeature.ESCAPE_FORWARD_SLASHES,
                        JsonWriteFeature.ESCAPE_NON_ASCII, JsonWriteFeature.WRITE_NUMBERS_AS_STRINGS)
                .build()
                .writer()
                .withAttribute(StampedSerializer.CANONICAL, Boolean.TRUE);
    }

    /** Writes the canonical bytes the stamp of {@code answer} covers into {@code out}. */
    void write(Stamped<?> answer, Stamper.NonFiniteSeen seen, OutputStream out) {
        try (JsonGenerator gen = new Canonical(writer.createGenerator(out), seen)) {
            writer.writeValue(gen, answer);
        }
    }

    /** Numbers and strings as RFC 8785 writes them. */
    private static final class Canonical extends JsonGeneratorDelegate {
        private final Stamper.NonFiniteSeen seen;
        /** The text of the number being written (one answer, one thread): no String per number. */
        private final StringBuilder number = new StringBuilder(32);
        private final char[] chars = new char[32];

        Canonical(JsonGenerator delegate, Stamper.NonFiniteSeen seen) {
            super(delegate, false);
            this.seen = seen;
        }

        @Override
        public JsonGenerator writeNumber(double v) {
            if (!Double.isFinite(v)) {
                seen.any = true;
                delegate.writeNull(); // named by the answer's RESULT_NOT_REPRESENTABLE warning
            } else {
                number.setLength(0);
                CanonicalJson.appendNumber(v, number);
                number.getChars(0, number.length(), chars, 0); // at most 25 characters ("-0.00000" and 17 digits)
                delegate.writeRawValue(chars, 0, number.length());
            }
            return this;
        }

        @Override
        public JsonGenerator writeNumber(float v) {
            return writeNumber((double) v);
        }

        @Override
        public JsonGenerator writeNumber(long v) {
            if (v > EXACT || v < -EXACT) {
                return writeNumber((double) v);
            }
            delegate.writeNumber(v);
            return this;
        }

        @Override
        public JsonGenerator writeNumber(BigInteger v) {
            return v == null ? writeNull() : writeNumber(v.doubleValue());
        }

        @Override
        public JsonGenerator writeNumber(BigDecimal v) {
            return v == null ? writeNull() : writeNumber(v.doubleValue());
        }

        @Override
        public JsonGenerator writeNumber(String encoded) {
            return writeNumber(Double.parseDouble(encoded));
        }

        @Override
        public JsonGenerator writeString(String text) {
            if (text != null) {
                checkWellFormed(text);
            }
            delegate.writeString(text);
            return this;
        }

        @Override
        public JsonGenerator writeString(char[] text, int offset, int len) {
            checkWellFormed(new String(text, offset, len));
            delegate.writeString(text, offset, len);
            return this;
        }

        @Override
        public JsonGenerator writeString(SerializableString text) {
            checkWellFormed(text.getValue());
            delegate.writeString(text);
            return this;
        }
    }

    /** RFC 8785 3.2.2.2: a lone surrogate has no UTF-8 form, so no canonical form. */
    static void checkWellFormed(String s) {
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if ((c & 0xF800) != 0xD800) {
                continue; // not a surrogate (U+D800 to U+DFFF): one test for almost every character
            }
            if (Character.isHighSurrogate(c) && i + 1 < s.length() && Character.isLowSurrogate(s.charAt(i + 1))) {
                i++;
            } else if (Character.isSurrogate(c)) {
                throw new IllegalArgumentException("RFC 8785 has no representation for a lone surrogate");
            }
        }
    }
}
