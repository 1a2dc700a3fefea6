package utdigit.web.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import utdigit.core.sheets.SheetMetrics;

/**
 * The hint after "unknown metric": the nearest known name (a typing slip), else the known names
 * sharing a word with it, else the whole vocabulary.
 */
final class MetricSuggestion {
    private MetricSuggestion() {}

    /** At most this many single-character edits make a name "near" (fewer for short names). */
    private static final int MAX_EDITS = 3;

    static String of(String unknown) {
        String best = null;
        int bestDistance = Integer.MAX_VALUE;
        for (String known : SheetMetrics.ALL) {
            int d = distance(unknown, known);
            if (d < bestDistance) {
                best = known;
                bestDistance = d;
            }
        }
        if (best != null && bestDistance <= Math.max(1, Math.min(MAX_EDITS, unknown.length() / 4))) {
            return "; did you mean '" + best + "'?";
        }
        List<String> related = new ArrayList<>();
        Set<String> words = Set.of(unknown.split("_"));
        for (String known : SheetMetrics.ALL) {
            for (String word : known.split("_")) {
                if (word.length() > 2 && words.contains(word)) {
                    related.add(known);
                    break;
                }
            }
        }
        if (!related.isEmpty()) {
            return "; metrics with a word in common: " + String.join(", ", related);
        }
        return "; known metrics: " + String.join(", ", SheetMetrics.ALL);
    }

    /** Levenshtein distance (insertions, deletions, substitutions). */
    static int distance(String a, String b) {
        int[] previous = new int[b.length() + 1];
        int[] current = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) {
            previous[j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            current[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                int substitution = previous[j - 1] + (a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1);
                current[j] = Math.min(substitution, Math.min(previous[j], current[j - 1]) + 1);
            }
            int[] swap = previous;
            previous = current;
            current = swap;
        }
        return previous[b.length()];
    }
}
