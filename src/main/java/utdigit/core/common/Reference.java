package utdigit.core.common;

import java.util.Objects;

/**
 * Where a formula or a value of an answer comes from.
 *
 * @param topic what the reference is for (e.g. "near field length")
 * @param source the published text, standard clause or library, or "common practice, no published
 *     source", or a model of ours marked "(derived)"
 */
public record Reference(String topic, String source) {
    public Reference {
        Objects.requireNonNull(topic, "topic");
        Objects.requireNonNull(source, "source");
    }

    public static Reference of(String topic, String source) {
        return new Reference(topic, source);
    }
}
