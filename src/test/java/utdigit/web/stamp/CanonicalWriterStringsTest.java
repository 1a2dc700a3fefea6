package utdigit.web.stamp;

import static org.assertj.core.api.Assertions.assertThatCode;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * RFC 8785 3.2.2.2 writes strings as UTF-8, which has no form for a lone surrogate (RFC 3629 3):
 * the typed canonical pass refuses one wherever it stands, and passes every well-formed string.
 */
class CanonicalWriterStringsTest {
    @ParameterizedTest
    @ValueSource(strings = {"", "plain ASCII", "\u00e9\u00fc \u20ac \ud7ff \ue000 \uffff", "\ud83d\ude00",
        "a\ud800\udc00b", "\udbff\udfff", "\ud83d\ude00\ud83d\ude00"})
    void wellFormedStringsPass(String s) {
        assertThatCode(() -> CanonicalWriter.checkWellFormed(s)).doesNotThrowAnyException();
    }

    @ParameterizedTest
    @ValueSource(strings = {"\ud800", "\udc00", "a\ud83d", "\ude00a", "\ud83d\ud83d", "\udfff\ud800", "ok \udbff"})
    void loneSurrogatesAreRefused(String s) {
        assertThatThrownBy(() -> CanonicalWriter.checkWellFormed(s)).isInstanceOf(IllegalArgumentException.class);
    }
}
