package utdigit.web.stamp;

import tools.jackson.core.JsonGenerator;
import tools.jackson.core.util.JsonGeneratorDelegate;

/**
 * The wire form of an answer's numbers: a double with no finite value is written as null (the
 * answer carries a RESULT_NOT_REPRESENTABLE warning naming it), and -0.0 as 0.0, as the canonical
 * form writes it (RFC 8785 has no negative zero).
 */
final class FiniteNumbers extends JsonGeneratorDelegate {

    FiniteNumbers(JsonGenerator delegate) {
        super(delegate, false);
    }

    @Override
    public JsonGenerator writeNumber(double v) {
        if (!Double.isFinite(v)) {
            delegate.writeNull();
        } else {
            delegate.writeNumber(v == 0.0 ? 0.0 : v);
        }
        return this;
    }

    @Override
    public JsonGenerator writeNumber(float v) {
        if (!Float.isFinite(v)) {
            delegate.writeNull();
        } else {
            delegate.writeNumber(v == 0.0f ? 0.0f : v);
        }
        return this;
    }
}
