package utdigit.core.common;

import java.util.ArrayList;
import java.util.Collection;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * Where a formula or a value of an answer comes from: what it is for and the id of its entry in
 * the reference catalogue ({@link Sources}).
 *
 * @param topic what the reference is for (e.g. "near field length")
 * @param id the catalogue id of the source
 */
public record Reference(String topic, String id) {
    public Reference {
        Objects.requireNonNull(topic, "topic");
        Objects.requireNonNull(id, "id");
    }

    public static Reference of(String topic, Source source) {
        return new Reference(topic, source.id());
    }

    /**
     * One reference per source, in the order of first citation, its topics joined with "; ": an
     * answer that gathers several calculations (a technique sheet) cites each source once.
     */
    public static List<Reference> groupedById(Collection<Reference> references) {
        Map<String, List<String>> topics = new LinkedHashMap<>();
        for (Reference r : references) {
            List<String> t = topics.computeIfAbsent(r.id(), k -> new ArrayList<>());
            if (!t.contains(r.topic())) {
                t.add(r.topic());
            }
        }
        List<Reference> grouped = new ArrayList<>(topics.size());
        topics.forEach((id, t) -> grouped.add(new Reference(String.join("; ", t), id)));
        return grouped;
    }
}
