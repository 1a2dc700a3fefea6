package utdigit.web.batch;

import java.io.InputStream;
import tools.jackson.core.JacksonException;
import tools.jackson.core.JsonParser;
import tools.jackson.core.JsonToken;
import tools.jackson.databind.DeserializationFeature;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.ObjectReader;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.JsonNodeFactory;

/**
 * Rows of an application/json body: one JSON array of request objects, read element by element.
 * A syntax error inside the array cannot be resynchronised: the rows before it are answered and
 * the batch ends with a row that says where the body broke.
 */
final class JsonArraySource implements RowSource {
    private static final JsonNode EMPTY_ARRAY = JsonNodeFactory.instance.arrayNode();

    private final JsonParser parser;
    private final ObjectReader elements;
    private long row;
    private String fatal;
    private boolean done;

    JsonArraySource(JsonMapper mapper, InputStream in) {
        // The strict mapper fails on trailing tokens, and after one element of the array the rest of
        // the array is exactly that: elements are read without that check (the array is checked here).
        this.elements = mapper.readerFor(JsonNode.class).without(DeserializationFeature.FAIL_ON_TRAILING_TOKENS);
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
            JsonNode node = elements.readValue(parser);
            return Row.of(row, node);
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

    @Override
    public String fatal() {
        return fatal;
    }

    @Override
    public void close() {
        parser.close();
    }
}
