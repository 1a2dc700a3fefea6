package utdigit.web.problem;

import java.util.List;
import tools.jackson.core.JacksonException;
import tools.jackson.core.JsonParser;
import tools.jackson.core.exc.StreamConstraintsException;
import tools.jackson.core.exc.StreamReadException;
import tools.jackson.databind.exc.InvalidFormatException;
import tools.jackson.databind.exc.MismatchedInputException;
import tools.jackson.databind.exc.UnrecognizedPropertyException;
import utdigit.web.stamp.IJson;
import utdigit.web.json.InputMessages;
import utdigit.web.json.JsonPointers;

/**
 * Translates the JSON library's read failures into the caller's terms: a pointer to the field and
 * a fixed detail, never the library's own message.
 */
public final class JacksonProblems {
    private JacksonProblems() {}

    public static InputProblem toInputProblem(JacksonException e) {
        String pointer = pointer(e);
        if (e instanceof UnrecognizedPropertyException u) {
            List<String> known = u.getKnownPropertyIds() == null ? List.of()
                    : u.getKnownPropertyIds().stream().map(String::valueOf).sorted().toList();
            String detail = InputMessages.UNKNOWN_PROPERTY
                    + (known.isEmpty() ? "" : "; known properties here: " + String.join(", ", known));
            return InputProblem.invalid(pointer, detail);
        }
        if (e instanceof InvalidFormatException f && f.getValue() instanceof String text && !IJson.wellFormed(text)) {
            return InputProblem.invalid(pointer, InputMessages.LONE_SURROGATE);
        }
        if (e instanceof InvalidFormatException f && f.getTargetType() != null && f.getTargetType().isEnum()) {
            return InputProblem.invalid(pointer, enumDetail(f.getTargetType()));
        }
        if (e.getOriginalMessage() != null && e.getOriginalMessage().startsWith("Trailing token")) {
            return new InputProblem(ProblemType.MALFORMED_BODY, "the body has content after its JSON object",
                    List.of(new FieldError("", "only one JSON object is allowed")));
        }
        if (e instanceof MismatchedInputException m) {
            return InputProblem.invalid(pointer, typeDetail(m.getTargetType()));
        }
        if (e instanceof StreamConstraintsException) {
            return new InputProblem(ProblemType.INVALID_INPUT, "the body exceeds a read limit of the service "
                    + "(nesting depth, number, string or name length)",
                    List.of(new FieldError(pointer(e), "exceeds a read limit")));
        }
        if (e instanceof StreamReadException s && s.getOriginalMessage() != null
                && s.getOriginalMessage().contains("surrogate")) {
            // The parser refuses a lone surrogate in a member name before it knows the name: the
            // pointer is the object that holds it.
            return InputProblem.invalid(objectPointer(e), "a member name " + InputMessages.LONE_SURROGATE);
        }
        if (e instanceof StreamReadException s && s.getOriginalMessage() != null
                && s.getOriginalMessage().startsWith("Duplicate Object property")) {
            return InputProblem.invalid(streamPointer(e), InputMessages.DUPLICATE_KEY);
        }
        if (e instanceof StreamReadException) {
            var loc = e.getLocation();
            String where = loc == null ? "" : " (line " + loc.getLineNr() + ", column " + loc.getColumnNr() + ")";
            return new InputProblem(ProblemType.MALFORMED_BODY, InputMessages.MALFORMED + where,
                    List.of(new FieldError(streamPointer(e), InputMessages.MALFORMED + where)));
        }
        return InputProblem.invalid(pointer, "cannot be read as the expected type");
    }

    static String pointer(JacksonException e) {
        StringBuilder p = new StringBuilder();
        for (JacksonException.Reference r : e.getPath()) {
            if (r.getPropertyName() != null) {
                p.append('/').append(JsonPointers.escape(r.getPropertyName()));
            } else if (r.getIndex() >= 0) {
                p.append('/').append(r.getIndex());
            }
        }
        if (p.length() == 0 && e.getPath().isEmpty()) {
            return streamPointer(e);
        }
        return p.toString();
    }

    /** The pointer of the object being read when {@code e} happened (without its current member). */
    private static String objectPointer(JacksonException e) {
        if (e.processor() instanceof JsonParser parser && parser.streamReadContext() != null) {
            try {
                var context = parser.streamReadContext();
                var pointer = context.pathAsPointer();
                return context.inObject() && context.currentName() != null ? pointer.head().toString() : pointer.toString();
            } catch (RuntimeException ignored) {
                return "";
            }
        }
        return "";
    }

    private static String streamPointer(JacksonException e) {
        if (e.processor() instanceof JsonParser parser && parser.streamReadContext() != null) {
            try {
                return parser.streamReadContext().pathAsPointer().toString();
            } catch (RuntimeException ignored) {
                return "";
            }
        }
        return "";
    }

    static String typeDetail(Class<?> target) {
        if (target == null) {
            return "has the wrong JSON type";
        }
        if (target == Double.class || target == double.class) {
            return InputMessages.FINITE_NUMBER;
        }
        if (target == Integer.class || target == int.class || target == Long.class || target == long.class) {
            return InputMessages.WHOLE_NUMBER;
        }
        if (target == String.class) {
            return InputMessages.TEXT;
        }
        if (target.isEnum()) {
            return enumDetail(target);
        }
        if (List.class.isAssignableFrom(target) || target.isArray()) {
            return InputMessages.ARRAY;
        }
        return InputMessages.OBJECT;
    }

    private static String enumDetail(Class<?> target) {
        StringBuilder values = new StringBuilder();
        for (Object constant : target.getEnumConstants()) {
            if (values.length() > 0) {
                values.append(", ");
            }
            values.append(((Enum<?>) constant).name());
        }
        return "must be one of " + values;
    }
}
