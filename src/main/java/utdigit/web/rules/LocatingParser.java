package utdigit.web.rules;

import java.util.ArrayDeque;
import java.util.Deque;
import java.util.HashMap;
import java.util.Map;
import tools.jackson.core.JsonParser;
import tools.jackson.core.JsonToken;
import tools.jackson.core.SerializableString;
import tools.jackson.core.TokenStreamLocation;
import tools.jackson.core.sym.PropertyNameMatcher;
import tools.jackson.core.util.JsonParserDelegate;

/**
 * A parser that knows where each field name of the mapping being read (and of the one closed
 * last) stands, and rejects a field given twice in one mapping at that field's own position.
 * Jackson reports an unknown field of a record after the record's mapping has ended (often lines
 * later) and a duplicate at the end of its name; a profile's author needs the line and column of
 * the name itself.
 *
 * <p>Every way of advancing is routed through {@link #nextToken()}, so no token escapes the
 * bookkeeping.
 */
final class LocatingParser extends JsonParserDelegate {
    private final Deque<Map<String, TokenStreamLocation>> mappings = new ArrayDeque<>();
    private Map<String, TokenStreamLocation> lastClosed = Map.of();

    LocatingParser(JsonParser yaml) {
        super(yaml);
    }

    /**
     * Where field {@code name} stands in the mapping being read or, failing that, in the mapping
     * closed last: Jackson reports an unknown field of a record when the record's mapping has
     * ended, before it reads on. Null when neither holds the name.
     */
    TokenStreamLocation nameAt(String name) {
        TokenStreamLocation open = mappings.isEmpty() ? null : mappings.peek().get(name);
        return open != null ? open : lastClosed.get(name);
    }

    @Override
    public JsonToken nextToken() {
        JsonToken t = delegate.nextToken();
        if (t == JsonToken.START_OBJECT) {
            mappings.push(new HashMap<>());
        } else if (t == JsonToken.END_OBJECT) {
            lastClosed = mappings.pop();
        } else if (t == JsonToken.PROPERTY_NAME) {
            TokenStreamLocation at = delegate.currentTokenLocation();
            String name = delegate.currentName();
            TokenStreamLocation first = mappings.isEmpty() ? null : mappings.peek().putIfAbsent(name, at);
            if (first != null) {
                throw new ProfileValueException(this, "field '" + name + "' is given twice in this mapping "
                        + "(first at line " + first.getLineNr() + ", column " + first.getColumnNr() + ")", at);
            }
        }
        return t;
    }

    @Override
    public JsonToken nextValue() {
        JsonToken t = nextToken();
        return t == JsonToken.PROPERTY_NAME ? nextToken() : t;
    }

    @Override
    public String nextName() {
        return nextToken() == JsonToken.PROPERTY_NAME ? delegate.currentName() : null;
    }

    @Override
    public boolean nextName(SerializableString name) {
        return nextToken() == JsonToken.PROPERTY_NAME && name.getValue().equals(delegate.currentName());
    }

    @Override
    public int nextNameMatch(PropertyNameMatcher matcher) {
        JsonToken t = nextToken();
        if (t == JsonToken.PROPERTY_NAME) {
            return matcher.matchName(delegate.currentName());
        }
        return t == JsonToken.END_OBJECT ? PropertyNameMatcher.MATCH_END_OBJECT : PropertyNameMatcher.MATCH_ODD_TOKEN;
    }

    @Override
    public JsonParser skipChildren() {
        JsonToken t = delegate.currentToken();
        if (t != JsonToken.START_OBJECT && t != JsonToken.START_ARRAY) {
            return this;
        }
        int depth = 1;
        while (depth > 0) {
            JsonToken next = nextToken();
            if (next == null) {
                return this;
            }
            if (next.isStructStart()) {
                depth++;
            } else if (next.isStructEnd()) {
                depth--;
            }
        }
        return this;
    }
}
