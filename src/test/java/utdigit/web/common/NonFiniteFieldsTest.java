package utdigit.web.common;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import utdigit.web.pipeline.NonFiniteFields;

/**
 * The pointers of numbers with no finite value, read from a typed answer: in the order the answer
 * writes its members, with the contract's names (JSON Pointer, RFC 6901), as the tree walk they
 * replace reported them.
 */
class NonFiniteFieldsTest {
    record Check(String figure, double value) {}

    record Answer(double firstValueMhz, Optional<Double> lossDb, Double omitted, List<Check> checks,
                  Map<String, Number> values, String text) {}

    @Test
    void pointersInWritingOrderWithContractNames() {
        Map<String, Number> values = new LinkedHashMap<>();
        values.put("fine", 1);
        values.put("a/b", Double.NaN); // RFC 6901 3: '/' escaped as ~1
        Answer answer = new Answer(Double.POSITIVE_INFINITY, Optional.of(Double.NaN), null,
                List.of(new Check("x", 1.0), new Check("y", Double.NEGATIVE_INFINITY)), values, "NaN");
        assertThat(NonFiniteFields.of(answer))
                .containsExactly("/first_value_mhz", "/loss_db", "/checks/1/value", "/values/a~1b");
    }

    @Test
    void finiteAnswersHaveNone() {
        Answer answer = new Answer(-0.0, Optional.empty(), null, List.of(new Check("x", Double.MAX_VALUE)),
                Map.of("m", Double.MIN_VALUE), "Infinity");
        assertThat(NonFiniteFields.of(answer)).isEmpty();
    }
}
