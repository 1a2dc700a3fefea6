package utdigit.web.batch;

import java.io.InputStream;
import java.util.List;
import tools.jackson.core.JacksonException;
import tools.jackson.core.JsonParser;
import tools.jackson.core.JsonToken;
import tools.jackson.core.SerializableString;
import tools.jackson.core.sym.PropertyNameMatcher;
import tools.jackson.core.util.JsonParserDelegate;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.JsonNodeFactory;
import tools.jackson.databind.util.TokenBuffer;
import utdigit.web.problem.FieldError;
import utdigit.web.problem.ProblemType;

/**
 * Rows of an application/json body: one JSON array of request objects, read element by element.
 * A syntax error inside the array cannot be resynchronised: the rows before it are answered and
 * the batch ends with a row that says where the body broke. An element larger than
 * {@link #MAX_ELEMENT_BYTES} (the limit of an NDJSON line) is not built: it is skipped token by
 * token and answered INVALID, so one huge element cannot fill the heap.
 */
final class JsonArraySource implements RowSource {
    private static final JsonNode EMPTY_ARRAY = JsonNodeFactory.instance.arrayNode();
    static final long MAX_ELEMENT_BYTES = NdjsonSource.MAX_LINE_CHARS;
    /** Tokens read between two checks of an element's size (each token is at most one 10,000-character string). */
    private static final int CHECK_EVERY_TOKENS = 64;

    private final JsonParser parser;
    private long row;
    private String fatal;
    private boolean done;

    JsonArraySource(JsonMapper mapper, InputStream in) {
        try {
            this.parser = mapper.createParser(in);
            JsonToken first = parser.nextToken();
            if (first != JsonToken.START_ARRAY) {
                throw new BatchBodyException("an application/json batch body must be one JSON array of request "
                        + "objects", "");
            }
        } catch (JacksonException e) {
            CountingInputStream.rethrowIfLimit(e);
            throw new BatchBodyException("the body is not well-formed JSON", "");
        }
    }

    @Override
    public Row next() {
        if (done) {
            return null;
        }
        long next = row + 1;
        try {
            JsonToken t = parser.nextToken();
            if (t == JsonToken.END_ARRAY) {
                done = true;
                if (parser.nextToken() != null) {
                    fatal = "content after the closing bracket of the array";
                }
                return null;
            }
            if (t == null) {
                done = true;
                fatal = "the array is not closed: the body ended after row " + row;
                return null;
            }
            row = next;
            if (t == JsonToken.START_ARRAY) {
                // not a request (the runner answers "must be a JSON object"); skipped token by token,
                // never built: an array of a million rows nested in one element would not fit the heap
                parser.skipChildren();
                return Row.of(row, EMPTY_ARRAY);
            }
            SizeCapped capped = new SizeCapped(parser, parser.currentTokenLocation().getByteOffset());
            try {
                // the element's tokens, read into the request record on a worker (no tree unless it fails)
                TokenBuffer element = TokenBuffer.forBuffering(capped, capped.objectReadContext());
                element.copyCurrentStructure(capped);
                return Row.ofElement(row, element);
            } catch (ElementTooLarge e) {
                while (parser.streamReadContext().getNestingDepth() > 1) { // back to the array's level
                    if (parser.nextToken() == null) {
                        done = true;
                        fatal = "the array is not closed: the body ended inside row " + row;
                        return null;
                    }
                }
                String detail = "the element is larger than " + MAX_ELEMENT_BYTES + " bytes; one request object per "
                        + "element";
                return Row.unreadable(row, ProblemType.MALFORMED_BODY, detail, List.of(new FieldError("", detail)));
            }
        } catch (JacksonException e) {
            CountingInputStream.rethrowIfLimit(e);
            done = true;
            row = next;
            var loc = e.getLocation();
            fatal = "the body is not well-formed JSON at row " + row
                    + (loc == null ? "" : " (line " + loc.getLineNr() + ", column " + loc.getColumnNr() + ")")
                    + "; rows from here on were not read";
            return null;
        }
    }

    /** Thrown while an element is read, once it has grown past {@link #MAX_ELEMENT_BYTES}. */
    private static final class ElementTooLarge extends RuntimeException {
        ElementTooLarge() {
            super(null, null, false, false);
        }
    }

    /** The parser, counting the tokens of one element and checking its size as it is read. */
    private static final class SizeCapped extends JsonParserDelegate {
        private final long start;
        private int tokens;

        SizeCapped(JsonParser parser, long start) {
            super(parser);
            this.start = start;
        }

        private void counted() {
            if (++tokens % CHECK_EVERY_TOKENS == 0 && start >= 0
                    && delegate.currentLocation().getByteOffset() - start > MAX_ELEMENT_BYTES) {
                throw new ElementTooLarge();
            }
        }

        @Override
        public JsonToken nextToken() {
            JsonToken t = super.nextToken();
            counted();
            return t;
        }

        @Override
        public JsonToken nextValue() {
            JsonToken t = super.nextValue();
            counted();
            return t;
        }

        @Override
        public String nextName() {
            String name = super.nextName();
            counted();
            return name;
        }

        @Override
        public boolean nextName(SerializableString name) {
            boolean matched = super.nextName(name);
            counted();
            return matched;
        }

        @Override
        public int nextNameMatch(PropertyNameMatcher matcher) {
            int match = super.nextNameMatch(matcher);
            counted();
            return match;
        }
    }

    @Override
    public String fatal() {
        return fatal;
    }

    @Override
    public void close() {
        parser.close();
    }
}
