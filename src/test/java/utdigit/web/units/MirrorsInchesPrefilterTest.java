package utdigit.web.units;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.stream.Stream;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * {@link Mirrors#withInches} runs each of its patterns only where the text holds what any match of
 * that pattern must contain; the text out must be the same as with every pattern applied to the
 * whole text ({@link #everyPattern}, the previous implementation). Checked on
 * every message of the committed example answers and on seeded random messages built from the
 * pieces the patterns look at (numbers, units, field names, the punctuation around them).
 */
class MirrorsInchesPrefilterTest {
    private static final String[] PIECES = {
        "12.5", "0.0296", "-3", "7", "25.4", "1e3", "2.", ".5", "100000", "0", " ", " ", " ", "mm", " mm", " mm/s",
        " mm/us", " mm^2", "mm/s", "_mm ", "_mm_per_s ", "distance", "planned_scan_speed", "thickness", "x", "_",
        "(", ")", ",", ".", ":", "+", "-", "/", "^", "e", "E", "in", " (0.4921 in)", "depth_mm", "mmm", "\u0663",
        "standard_uncertainty_mm", " and ", "at most "};

    @Test
    @DisplayName("same text as every pattern over the whole message, on 300,000 seeded random messages")
    void sameAsEveryPatternOnRandomMessages() {
        SplittableRandom random = new SplittableRandom(20261205L);
        List<String> mismatches = new ArrayList<>();
        int withMatch = 0;
        for (int i = 0; i < 300_000; i++) {
            StringBuilder message = new StringBuilder();
            int pieces = random.nextInt(1, 14);
            for (int p = 0; p < pieces; p++) {
                message.append(PIECES[random.nextInt(PIECES.length)]);
            }
            String text = message.toString();
            String expected = everyPattern(text);
            if (!expected.equals(text)) {
                withMatch++;
            }
            if (!expected.equals(Mirrors.withInches(text)) && mismatches.size() < 20) {
                mismatches.add(text);
            }
        }
        assertThat(mismatches).isEmpty();
        assertThat(withMatch).as("messages where a pattern matched").isGreaterThan(5_000);
    }

    @Test
    @DisplayName("same text as every pattern over the whole message, on every message of the example answers")
    void sameAsEveryPatternOnExampleMessages() throws IOException {
        JsonMapper mapper = JsonMapper.builder().build();
        List<String> messages = new ArrayList<>();
        try (Stream<Path> files = Files.list(Path.of("api-examples"))) {
            for (Path f : files.filter(p -> p.toString().endsWith(".json")).sorted().toList()) {
                collect(mapper.readTree(f.toFile()), messages);
            }
        }
        assertThat(messages).hasSizeGreaterThan(20);
        for (String m : messages) {
            assertThat(Mirrors.withInches(m)).as(m).isEqualTo(everyPattern(m));
            // without the inch values already added: the message as the core writes it
            String core = m.replaceAll(" \\([-0-9.e]+ in(/s)?\\)", "");
            assertThat(Mirrors.withInches(core)).as(core).isEqualTo(everyPattern(core));
        }
    }

    /** Every rewrite of {@link Mirrors#withInches} applied to the whole text, without its pre-checks. */
    private static String everyPattern(String message) {
        if (message == null || !message.contains("mm")) {
            return message;
        }
        String out = message;
        for (Mirrors.Rewrite r : Mirrors.REWRITES) {
            out = r.apply(out);
        }
        return out;
    }

    private static void collect(JsonNode node, List<String> out) {
        if (node.isString()) {
            out.add(node.stringValue());
        }
        for (JsonNode child : node) {
            collect(child, out);
        }
    }
}
