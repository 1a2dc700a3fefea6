package utdigit.web.pipeline;

import io.swagger.v3.oas.annotations.media.Schema;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import utdigit.core.rules.Comparison;

/**
 * One figure of an answer compared with a tolerance or requirement the caller gave, in the same
 * shape on every endpoint ({@code tolerance_checks}): the figure's value, the comparison, the limit
 * and the field it comes from, and whether the figure is within it. The comparison allows the same
 * relative slack of 1e-9 as the sheets' rules, so that a value computed to equal its limit is within.
 */
@Schema(name = "ToleranceCheck", description = "A figure of the answer compared with a tolerance or requirement of "
        + "the request: within is true when value comparison limit holds (relative slack 1e-9)")
public record ToleranceCheck(
        @Schema(description = "The answer's field compared (or the request's, for a planned value)",
                example = "pulse_amplitude_loss_db") String figure,
        @Schema(description = "Its value, in the unit its name gives", example = "1.9525")
        double value,
        @Schema(description = "AT_MOST or AT_LEAST") Comparison comparison,
        @Schema(description = "The limit, in the same unit (a tolerance on a signed error below the reading is "
                + "its negative)", example = "1") double limit,
        @Schema(description = "The field the limit comes from: a tolerance or requirement of the request, or a "
                + "figure of the answer", example = "amplitude_tolerance_db") String limitField,
        @Schema(description = "Whether the figure is within the limit") boolean within) {

    /** The checks of one answer, in the order added; figures without a value are left out. */
    public static final class Builder {
        private final List<ToleranceCheck> checks = new ArrayList<>();

        /** {@code figure <= limit}. {@code value} a Double, an Optional of one, or null (left out). */
        public Builder atMost(String figure, Object value, String limitField, Double limit) {
            return add(figure, value, Comparison.AT_MOST, limitField, limit);
        }

        /** {@code figure >= limit}. */
        public Builder atLeast(String figure, Object value, String limitField, Double limit) {
            return add(figure, value, Comparison.AT_LEAST, limitField, limit);
        }

        private Builder add(String figure, Object value, Comparison comparison, String limitField, Double limit) {
            Double v = value instanceof Optional<?> o ? (Double) o.orElse(null) : (Double) value;
            if (v != null && limit != null && Double.isFinite(v)) {
                checks.add(new ToleranceCheck(figure, v, comparison, limit, limitField, comparison.holds(v, limit)));
            }
            return this;
        }

        /** The checks, or null (the field omitted) when no tolerance was given. */
        public List<ToleranceCheck> build() {
            return checks.isEmpty() ? null : List.copyOf(checks);
        }
    }

    public static Builder builder() {
        return new Builder();
    }
}
