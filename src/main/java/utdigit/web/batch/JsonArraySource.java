package utdigit.web.batch;

import java.io.InputStream;
import tools.jackson.core.JacksonException;
import tools.jackson.core.JsonParser;
import tools.jackson.core.JsonToken;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * Rows of an application/json body: one JSON array of request objects, read element by element.
 * A syntax error inside the array cannot be resynchronised: the rows before it are answered and
 * the batch ends with a row that says where the body broke.
 */
final class JsonArraySource implements RowSource {
    private final JsonParser parser;
    private final JsonMapper mapper;
    private long row;
    private String fatal;
    private boolean done;

    JsonArraySource(JsonMapper mapper, InputStream in) {
        this.mapper = mapper;
        try {
            this.parser = mapper.createParser(in);
            JsonToken first = parser.nextToken();
            if (first != JsonToken.START_ARRAY) {
                throw new BatchBodyException("an application/json batch body must be one JSON array of request "
                        + "objects", "");
            }
        } catch (JacksonException e) {
            throw new BatchBodyException("the body is not well-formed JSON", "");
        }
    }

    @Override
    public Row next() {
        if (done) {
            return null;
        }
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
            row++;
            JsonNode node = mapper.readTree(parser);
            return Row.of(row, node);
        } catch (JacksonException e) {
            done = true;
            row++;
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
