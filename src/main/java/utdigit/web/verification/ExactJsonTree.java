package utdigit.web.verification;

import java.math.BigDecimal;
import tools.jackson.core.JsonParser;
import tools.jackson.core.JsonToken;
import tools.jackson.databind.DeserializationContext;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.deser.std.StdDeserializer;
import tools.jackson.databind.node.ArrayNode;
import tools.jackson.databind.node.JsonNodeFactory;
import tools.jackson.databind.node.ObjectNode;
import utdigit.web.stamp.IJson;
import utdigit.web.problem.InputProblem;
import utdigit.web.json.JsonPointers;
import utdigit.web.stamp.CanonicalJson;

/**
 * A document to verify, read as it was written: every number keeps its exact decimal value
 * (a float is a BigDecimal, a long integer a BigInteger), so that 1e400, 1e-400 or a 1000-digit
 * integer is seen as what it is and not as a rounded double. {@link #check} then refuses, at its
 * pointer, what I-JSON (RFC 7493) excludes and what RFC 8785 cannot canonicalize: a number that is
 * not exactly an IEEE 754 double (beyond its range or its precision), and a string or member name
 * with a lone surrogate. What passes has one canonical form, which no other document shares.
 */
final class ExactJsonTree extends StdDeserializer<JsonNode> {
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;

    ExactJsonTree() {
        super(JsonNode.class);
    }

    @Override
    public JsonNode deserialize(JsonParser p, DeserializationContext ctxt) {
        return read(p, ctxt);
    }

    private static JsonNode read(JsonParser p, DeserializationContext ctxt) {
        JsonToken t = p.currentToken();
        switch (t) {
            case START_OBJECT -> {
                ObjectNode object = NODES.objectNode();
                for (String name = p.nextName(); name != null; name = p.nextName()) {
                    p.nextToken();
                    object.set(name, read(p, ctxt));
                }
                return object;
            }
            case START_ARRAY -> {
                ArrayNode array = NODES.arrayNode();
                while (p.nextToken() != JsonToken.END_ARRAY) {
                    array.add(read(p, ctxt));
                }
                return array;
            }
            case VALUE_STRING -> {
                return NODES.stringNode(p.getString());
            }
            case VALUE_NUMBER_INT -> {
                return switch (p.getNumberType()) {
                    case INT -> NODES.numberNode(p.getIntValue());
                    case LONG -> NODES.numberNode(p.getLongValue());
                    default -> NODES.numberNode(p.getBigIntegerValue());
                };
            }
            case VALUE_NUMBER_FLOAT -> {
                return NODES.numberNode(p.getDecimalValue());
            }
            case VALUE_TRUE -> {
                return NODES.booleanNode(true);
            }
            case VALUE_FALSE -> {
                return NODES.booleanNode(false);
            }
            case VALUE_NULL -> {
                return NODES.nullNode();
            }
            default -> {
                return (JsonNode) ctxt.handleUnexpectedToken(JsonNode.class, p);
            }
        }
    }

    /**
     * Refuses, as a 400 at its pointer under {@code pointer}, the first value of {@code node} that
     * has no exact I-JSON form: a number that is not exactly a finite double, a string or a member
     * name with a lone surrogate.
     */
    static void check(JsonNode node, String pointer) {
        if (node.isObject()) {
            for (var member : node.properties()) {
                String child = JsonPointers.child(pointer, member.getKey());
                if (!IJson.wellFormed(member.getKey())) {
                    throw InputProblem.invalid(child, "the member name holds a lone UTF-16 surrogate: not "
                            + "well-formed Unicode, refused as I-JSON (RFC 7493) requires; no answer of this service "
                            + "holds one");
                }
                check(member.getValue(), child);
            }
        } else if (node.isArray()) {
            for (int i = 0; i < node.size(); i++) {
                check(node.get(i), pointer + "/" + i);
            }
        } else if (node.isString()) {
            if (!IJson.wellFormed(node.stringValue())) {
                throw InputProblem.invalid(pointer, "holds a lone UTF-16 surrogate: not well-formed Unicode, "
                        + "refused as I-JSON (RFC 7493) requires; no answer of this service holds one");
            }
        } else if (node.isNumber() && !exactDouble(node)) {
            throw InputProblem.invalid(pointer, "is not exactly an IEEE 754 double (beyond its range or its "
                    + "precision): RFC 8785 canonical JSON and I-JSON (RFC 7493) admit no such number, and no answer "
                    + "of this service holds one");
        }
    }

    /** Whether the number's exact value is that of a finite double (its shortest form, or its binary value). */
    static boolean exactDouble(JsonNode number) {
        BigDecimal exact = number.decimalValue();
        double d = exact.doubleValue(); // correctly rounded; +-infinity beyond the range (the node's own throws)
        if (!Double.isFinite(d)) {
            return false;
        }
        return exact.compareTo(new BigDecimal(CanonicalJson.number(d))) == 0 || exact.compareTo(new BigDecimal(d)) == 0;
    }
}
