package utdigit.web.json;

import tools.jackson.core.JsonParser;
import tools.jackson.core.JsonToken;
import tools.jackson.databind.BeanDescription;
import tools.jackson.databind.DeserializationConfig;
import tools.jackson.databind.DeserializationContext;
import tools.jackson.databind.JavaType;
import tools.jackson.databind.ValueDeserializer;
import tools.jackson.databind.deser.ValueDeserializerModifier;
import tools.jackson.databind.deser.std.DelegatingDeserializer;
import tools.jackson.databind.deser.std.StdScalarDeserializer;
import tools.jackson.databind.module.SimpleModule;
import utdigit.web.stamp.IJson;

/**
 * Deserializers that read numbers and strings exactly as written: a number must be a JSON number
 * (not a quoted string), finite (1e400 overflows and is rejected, and so is 1e-400, which is
 * not 0 but would read as 0), and an integer field accepts an
 * integral value such as 2.0 but not 2.5. A string field accepts only a JSON string, and only
 * well-formed Unicode (no lone surrogate, RFC 7493). An enum
 * value is its exact name: the library's own reader would trim white space around it.
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
        module.setDeserializerModifier(new ValueDeserializerModifier() {
            @Override
            public ValueDeserializer<?> modifyEnumDeserializer(DeserializationConfig config, JavaType type,
                                                               BeanDescription.Supplier beanDescRef,
                                                               ValueDeserializer<?> deserializer) {
                return new ExactEnum(deserializer, type.getRawClass());
            }
        });
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
                if (!Double.isFinite(v) || underflows(p, v)) {
                    return (Double) ctxt.handleWeirdNumberValue(Double.class, v, InputMessages.FINITE_NUMBER);
                }
                return v;
            }
            return (Double) ctxt.handleUnexpectedToken(Double.class, p);
        }
    }

    /**
     * Whether a number read as 0 is not 0 as written (1e-400): beyond a double's range, which
     * I-JSON (RFC 7493 2.2) excludes; refused like 1e400, not read as 0.
     */
    static boolean underflows(JsonParser p, double v) {
        return v == 0.0 && p.currentToken() == JsonToken.VALUE_NUMBER_FLOAT && p.getDecimalValue().signum() != 0;
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
                if (!Double.isFinite(v) || underflows(p, v) || v != StrictMath.rint(v)
                        || v < Integer.MIN_VALUE || v > Integer.MAX_VALUE) {
                    return (Integer) ctxt.handleWeirdNumberValue(Integer.class, v, InputMessages.WHOLE_NUMBER);
                }
                return (int) v;
            }
            return (Integer) ctxt.handleUnexpectedToken(Integer.class, p);
        }
    }

    /** An enum read by the library's reader, but only from a string without white space around it. */
    static final class ExactEnum extends DelegatingDeserializer {
        private final Class<?> enumType;

        ExactEnum(ValueDeserializer<?> delegate, Class<?> enumType) {
            super(delegate);
            this.enumType = enumType;
        }

        @Override
        protected ValueDeserializer<?> newDelegatingInstance(ValueDeserializer<?> delegate) {
            return new ExactEnum(delegate, enumType);
        }

        @Override
        public Object deserialize(JsonParser p, DeserializationContext ctxt) {
            if (p.currentToken() == JsonToken.VALUE_STRING) {
                String text = p.getString();
                if (!text.equals(text.strip()) || !text.equals(text.trim())) {
                    return ctxt.handleWeirdStringValue(enumType, text, "white space around an enum value");
                }
            }
            return super.deserialize(p, ctxt);
        }
    }

    static final class TextOnly extends StdScalarDeserializer<String> {
        TextOnly() {
            super(String.class);
        }

        @Override
        public String deserialize(JsonParser p, DeserializationContext ctxt) {
            if (p.currentToken() == JsonToken.VALUE_STRING) {
                String text = p.getString();
                if (!IJson.wellFormed(text)) {
                    return (String) ctxt.handleWeirdStringValue(String.class, text, InputMessages.LONE_SURROGATE);
                }
                return text;
            }
            return (String) ctxt.handleUnexpectedToken(String.class, p);
        }
    }
}
