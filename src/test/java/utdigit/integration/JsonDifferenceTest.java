package utdigit.integration;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Optional;
import org.junit.jupiter.api.Test;
import tools.jackson.databind.json.JsonMapper;

/** The first difference of two JSON documents, as the contract and examples tests report it. */
class JsonDifferenceTest {
    private final JsonMapper mapper = JsonMapper.builder().build();

    private Optional<String> pointer(String expected, String actual) {
        return JsonDifference.first(mapper.readTree(expected), mapper.readTree(actual))
                .map(JsonDifference.Difference::pointer);
    }

    @Test
    void equalDocumentsWhateverTheMemberOrderAndTheNumberSpelling() {
        assertThat(pointer("{\"a\": 2, \"b\": [1.5, {\"c\": \"x\"}]}", "{\"b\": [15E-1, {\"c\": \"x\"}], \"a\": 2.0}"))
                .isEmpty();
    }

    @Test
    void aChangedValueIsPointedAt() {
        assertThat(pointer("{\"paths\": {\"/api/x\": {\"post\": {\"summary\": \"a\"}}}}",
                "{\"paths\": {\"/api/x\": {\"post\": {\"summary\": \"b\"}}}}"))
                .contains("/paths/~1api~1x/post/summary");
    }

    @Test
    void aMissingAndAnAddedMemberArePointedAt() {
        assertThat(pointer("{\"a\": 1, \"b\": 2}", "{\"a\": 1}")).contains("/b");
        assertThat(pointer("{\"a\": 1}", "{\"a\": 1, \"z\": 2}")).contains("/z");
    }

    @Test
    void arraysCompareInOrderAndByLength() {
        assertThat(pointer("[1, 2]", "[2, 1]")).contains("/0");
        assertThat(pointer("[1, 2]", "[1, 2, 3]")).contains("/2");
        assertThat(pointer("[1, 2, 3]", "[1, 2]")).contains("/2");
    }

    @Test
    void typesDiffer() {
        assertThat(pointer("{\"a\": \"1\"}", "{\"a\": 1}")).contains("/a");
        assertThat(pointer("{\"a\": null}", "{\"a\": 0}")).contains("/a");
    }

    @Test
    void theMessageShowsBothSides() {
        var d = JsonDifference.first(mapper.readTree("{\"a\": 1}"), mapper.readTree("{\"a\": 2}")).orElseThrow();
        assertThat(d.describe()).isEqualTo("at /a: expected 1, found 2");
    }
}
