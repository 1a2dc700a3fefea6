package utdigit.web.common;

import tools.jackson.core.JsonParser;
import tools.jackson.core.JsonToken;
import tools.jackson.databind.DeserializationContext;
import tools.jackson.databind.deser.std.StdScalarDeserializer;
import tools.jackson.databind.module.SimpleModule;

/**
 * Deserializers that read numbers and strings exactly as written: a number must be a JSON number
 * (not a quoted string), finite (1e400 overflows and is rejected), and an integer field accepts an
 * integral value such as 2.0 but not 2.5. A string field accepts only a JSON string.
 */
final class StrictScalars {
    private StrictScalars() {}

    static SimpleModule module() {
        SimpleModule module = new SimpleModule("strict-scalars");
        module.addDeserializer(Double.class, new FiniteDouble());
        module.addDeserializer(double.class, new FiniteDouble());
        module.addDeserializer(Integer.class, new WholeInteger());
        module.addDeserializer(int.class, new WholeInteger());
        module.addDeserializer(String.class, new TextOnly());
        return module;
    }

    static final class FiniteDouble extends StdScalarDeserializer<Double> {
        FiniteDouble() {
            super(Double.class);
        }

        @Override
        public Double deserialize(JsonParser p, DeserializationContext ctxt) {
            JsonToken t = p.currentToken();
            if (t == JsonToken.VALUE_NUMBER_INT || t == JsonToken.VALUE_NUMBER_FLOAT) {
                double v = p.getDoubleValue();
                if (!Double.isFinite(v)) {
                    return (Double) ctxt.handleWeirdNumberValue(Double.class, v, InputMessages.FINITE_NUMBER);
                }
                return v;
            }
            return (Double) ctxt.handleUnexpectedToken(Double.class, p);
        }
    }

    static final class WholeInteger extends StdScalarDeserializer<Integer> {
        WholeInteger() {
            super(Integer.class);
        }

        @Override
        public Integer deserialize(JsonParser p, DeserializationContext ctxt) {
            JsonToken t = p.currentToken();
            if (t == JsonToken.VALUE_NUMBER_INT || t == JsonToken.VALUE_NUMBER_FLOAT) {
                double v = p.getDoubleValue();
                if (!Double.isFinite(v) || v != StrictMath.rint(v)
                        || v < Integer.MIN_VALUE || v > Integer.MAX_VALUE) {
                    return (Integer) ctxt.handleWeirdNumberValue(Integer.class, v, InputMessages.WHOLE_NUMBER);
                }
                return (int) v;
            }
            return (Integer) ctxt.handleUnexpectedToken(Integer.class, p);
        }
    }

    static final class TextOnly extends StdScalarDeserializer<String> {
        TextOnly() {
            super(String.class);
        }

        @Override
        public String deserialize(JsonParser p, DeserializationContext ctxt) {
            if (p.currentToken() == JsonToken.VALUE_STRING) {
                return p.getString();
            }
            return (String) ctxt.handleUnexpectedToken(String.class, p);
        }
    }
}
