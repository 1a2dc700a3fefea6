package utdigit.web.units;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Optional;
import org.junit.jupiter.api.Test;

/** An answer's inch mirrors are omitted exactly when every mirror is omitted. */
class MirrorsOrNoneTest {
    record Mirrored(Double lengthIn, Optional<Double> pathIn) {}

    @Test
    void everyMirrorOmittedOmitsTheObject() {
        assertThat(Mirrors.orNone(new Mirrored(null, null))).isNull();
    }

    @Test
    void oneMirrorPresentOrNullKeepsTheObject() {
        Mirrored length = new Mirrored(0.5, null);
        Mirrored emptyPath = new Mirrored(null, Optional.empty()); // a value that cannot exist is still written
        assertThat(Mirrors.orNone(length)).isSameAs(length);
        assertThat(Mirrors.orNone(emptyPath)).isSameAs(emptyPath);
    }
}
