package utdigit.web.rules;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.catchThrowableOfType;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.HexFormat;
import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import utdigit.core.rules.Comparison;
import utdigit.core.rules.Condition;
import utdigit.core.rules.RequirementProfile;
import utdigit.core.rules.Rule;
import utdigit.core.rules.VerificationStatus;
import utdigit.core.sheets.SheetMetrics;

/**
 * Loading and validating requirement profiles without Spring. Expected positions are derived from
 * the YAML text itself: a token starts where its text starts ({@link #position}), lines and columns
 * counted from 1 as editors do.
 */
class ProfileCatalogTest {

    /** A valid operator profile; the failure cases below change one thing in it. */
    static final String GOOD = """
            # an operator's own profile
            id: acme-pulse-echo
            title: ACME pulse-echo digitization
            version: "2.1"
            documents:
              - name: ACME procedure UT-7
                edition: "2024"
                clause: "4.2"
            verification_status: VERIFIED
            cautions:
              - Company rule.
            rules:
              - id: min-samples
                title: At least 6 samples per period
                metric: samples_per_period
                at_least: 6
                techniques: [PULSE_ECHO, PHASED_ARRAY]
                source: ACME procedure UT-7, 2024, 4.2
              - id: thin-wall-increment
                title: Scan increment at most 0.5 mm below 10 mm wall
                metric: scan_increment_mm
                at_most: 0.5
                when:
                  - metric: thickness_mm
                    below: 10
                source: ACME procedure UT-7, 2024, 4.3
              - id: speed
                title: Planned speed within the maximum
                metric: planned_scan_speed_mm_per_s
                at_most: max_scan_speed_mm_per_s
                source: ACME procedure UT-7, 2024, 4.4
            """;

    @TempDir
    Path dir;

    /** 1-based line and column where the {@code occurrence}-th (from 1) {@code needle} starts in {@code text}. */
    static int[] position(String text, String needle, int occurrence) {
        int index = -1;
        for (int i = 0; i < occurrence; i++) {
            index = text.indexOf(needle, index + 1);
            if (index < 0) {
                throw new IllegalArgumentException("'" + needle + "' occurs fewer than " + occurrence + " times");
            }
        }
        int lineStart = text.lastIndexOf('\n', index - 1) + 1;
        int line = (int) text.substring(0, index).chars().filter(c -> c == '\n').count() + 1;
        return new int[] {line, index - lineStart + 1};
    }

    static int[] position(String text, String needle) {
        return position(text, needle, 1);
    }

    Path write(String name, String yaml) throws IOException {
        Path file = dir.resolve(name);
        Files.writeString(file, yaml, StandardCharsets.UTF_8);
        return file;
    }

    /** Loads {@code yaml} as the operator file bad.yaml and returns the start-up failure. */
    ProfileException failure(String yaml) throws IOException {
        write("bad.yaml", yaml);
        return catchThrowableOfType(ProfileException.class, () -> new ProfileCatalog(dir));
    }

    /** The failure names the file, and the line and column of {@code at}, in its message too. */
    static void assertAt(ProfileException e, String yaml, int[] at, String... problem) {
        assertThat(e).as("a ProfileException").isNotNull();
        assertThat(e.source()).endsWith("bad.yaml");
        assertThat(new int[] {e.line(), e.column()}).as("line and column of " + e.getMessage()).isEqualTo(at);
        assertThat(e.getMessage()).contains("bad.yaml", "line " + at[0] + ", column " + at[1]);
        assertThat(e.problem()).contains(problem);
    }

    static String replace(String text, String from, String to) {
        assertThat(text).contains(from);
        return text.replace(from, to);
    }

    @Test
    void goodOperatorProfileLoadsBesideTheBuiltInOnes() throws IOException {
        write("acme.yaml", GOOD);
        ProfileCatalog catalog = new ProfileCatalog(dir);

        assertThat(catalog.ids()).startsWith("common-practice").contains("example-paut", "acme-pulse-echo");
        assertThat(catalog.ids().get(catalog.ids().size() - 1)).as("operator profiles after built-in ones")
                .isEqualTo("acme-pulse-echo");
        RequirementProfile p = catalog.find("acme-pulse-echo").orElseThrow();
        assertThat(p.title()).isEqualTo("ACME pulse-echo digitization");
        assertThat(p.version()).isEqualTo("2.1");
        assertThat(p.verificationStatus()).isEqualTo(VerificationStatus.VERIFIED);
        assertThat(p.documents()).singleElement().satisfies(d -> {
            assertThat(d.name()).isEqualTo("ACME procedure UT-7");
            assertThat(d.edition()).isEqualTo("2024");
            assertThat(d.clause()).isEqualTo("4.2");
        });
        assertThat(p.cautions()).containsExactly("Company rule.");
        assertThat(p.rules()).extracting(Rule::id).containsExactly("min-samples", "thin-wall-increment", "speed");

        Rule min = p.rules().get(0);
        assertThat(min.metric()).isEqualTo("samples_per_period");
        assertThat(min.comparison()).isEqualTo(Comparison.AT_LEAST);
        assertThat(min.limit().value()).isEqualTo(6.0);
        assertThat(min.techniques()).containsExactlyInAnyOrder("PULSE_ECHO", "PHASED_ARRAY");
        assertThat(min.source()).isEqualTo("ACME procedure UT-7, 2024, 4.2");

        Rule thin = p.rules().get(1);
        assertThat(thin.comparison()).isEqualTo(Comparison.AT_MOST);
        assertThat(thin.limit().value()).isEqualTo(0.5);
        assertThat(thin.techniques()).as("no techniques: every technique").isEmpty();
        assertThat(thin.when()).containsExactly(new Condition("thickness_mm", Comparison.BELOW, 10));

        Rule speed = p.rules().get(2);
        assertThat(speed.limit().value()).isNull();
        assertThat(speed.limit().metric()).isEqualTo("max_scan_speed_mm_per_s");
    }

    @Test
    void noDirectoryLoadsTheBuiltInProfilesOnly() {
        assertThat(new ProfileCatalog((Path) null).ids())
                // by file name: "example-tofd-signal-processing.yaml" sorts before "example-tofd.yaml" ('-' < '.')
                .containsExactly("common-practice", "example-paut", "example-tfm", "example-tofd-signal-processing",
                        "example-tofd");
        assertThat(new ProfileCatalog("").ids()).hasSize(5);
        assertThat(new ProfileCatalog("   ").ids()).hasSize(5);
    }

    @Test
    void filesOtherThanYamlAreNotRead() throws IOException {
        write("notes.txt", "not: a profile");
        write("old.yml", "also: not read");
        assertThat(new ProfileCatalog(dir).ids()).hasSize(5);
    }

    @Test
    void findOfAnUnknownIdIsEmpty() {
        ProfileCatalog catalog = new ProfileCatalog((Path) null);
        assertThat(catalog.find("no-such-profile")).isEmpty();
        assertThat(catalog.find(null)).isEmpty();
    }

    @Nested
    class Sha256 {
        @Test
        @DisplayName("sha256 is SHA-256 (JDK MessageDigest) of the RFC 8785 canonical JSON written by hand")
        void isTheHashOfTheCanonicalJsonOfTheContent() throws Exception {
            String yaml = """
                    version: "1"
                    id: tiny
                    title: Tiny
                    verification_status: UNVERIFIED
                    rules:
                      - {id: r, title: T, metric: bit_depth, at_least: 8.0, source: S}
                    """;
            // RFC 8785 3.2.3: members sorted by name; 3.2.2.3: 8.0 is written 8; no white space.
            String canonical = "{\"id\":\"tiny\",\"rules\":[{\"at_least\":8,\"id\":\"r\",\"metric\":\"bit_depth\","
                    + "\"source\":\"S\",\"title\":\"T\"}],\"title\":\"Tiny\",\"verification_status\":\"UNVERIFIED\","
                    + "\"version\":\"1\"}";
            String expected = HexFormat.of().formatHex(
                    MessageDigest.getInstance("SHA-256").digest(canonical.getBytes(StandardCharsets.UTF_8)));
            write("tiny.yaml", yaml);
            assertThat(new ProfileCatalog(dir).find("tiny").orElseThrow().sha256()).isEqualTo(expected);
        }

        @Test
        void isStableAcrossLoadsCommentsLayoutAndKeyOrder() throws IOException {
            String reordered = GOOD.replace("# an operator's own profile\n", "# another comment\n\n")
                    .replace("title: ACME pulse-echo digitization\nversion: \"2.1\"\n",
                            "version: '2.1'\ntitle: ACME pulse-echo digitization\n")
                    .replace("techniques: [PULSE_ECHO, PHASED_ARRAY]",
                            "techniques:\n      - PULSE_ECHO\n      - PHASED_ARRAY");
            assertThat(reordered).isNotEqualTo(GOOD);
            String first = ProfileParser.parse("a.yaml", GOOD.getBytes(StandardCharsets.UTF_8)).profile().sha256();
            String again = ProfileParser.parse("a.yaml", GOOD.getBytes(StandardCharsets.UTF_8)).profile().sha256();
            String layout = ProfileParser.parse("b.yaml", reordered.getBytes(StandardCharsets.UTF_8)).profile().sha256();
            assertThat(first).matches("[0-9a-f]{64}").isEqualTo(again).isEqualTo(layout);
        }

        @Test
        void changesWhenAValueChanges() {
            String base = ProfileParser.parse("a.yaml", GOOD.getBytes(StandardCharsets.UTF_8)).profile().sha256();
            for (String[] change : new String[][] {
                    {"at_least: 6", "at_least: 6.5"},
                    {"below: 10", "at_most: 10"},
                    {"[PULSE_ECHO, PHASED_ARRAY]", "[PULSE_ECHO]"},
                    {"source: ACME procedure UT-7, 2024, 4.4", "source: ACME procedure UT-7, 2024, 4.5"},
                    {"verification_status: VERIFIED", "verification_status: UNVERIFIED"},
                    {"version: \"2.1\"", "version: \"2.2\""}}) {
                String changed = replace(GOOD, change[0], change[1]);
                assertThat(ProfileParser.parse("a.yaml", changed.getBytes(StandardCharsets.UTF_8)).profile().sha256())
                        .as(change[0] + " -> " + change[1]).isNotEqualTo(base);
            }
        }
    }

    @Nested
    class BuiltInProfiles {
        final ProfileCatalog catalog = new ProfileCatalog((Path) null);

        @Test
        void allLoadAndEveryMetricTheyNameIsInTheVocabulary() {
            assertThat(catalog.all()).hasSize(5);
            for (RequirementProfile p : catalog.all()) {
                assertThat(p.sha256()).matches("[0-9a-f]{64}");
                assertThat(p.rules()).isNotEmpty();
                for (Rule r : p.rules()) {
                    assertThat(SheetMetrics.isKnown(r.metric())).as(p.id() + "/" + r.id() + " metric").isTrue();
                    if (r.limit().metric() != null) {
                        assertThat(SheetMetrics.isKnown(r.limit().metric())).as(r.id() + " limit").isTrue();
                    }
                    r.when().forEach(c -> assertThat(SheetMetrics.isKnown(c.metric())).as(r.id() + " when").isTrue());
                    assertThat(r.source()).isNotBlank();
                }
            }
        }

        @Test
        void everyBuiltInProfileIsUnverifiedAndTellsTheReaderToVerifyOrThatCodesDecide() {
            for (RequirementProfile p : catalog.all()) {
                assertThat(p.verificationStatus()).as(p.id()).isEqualTo(VerificationStatus.UNVERIFIED);
                assertThat(String.join(" ", p.cautions())).as(p.id()).containsIgnoringCase("decide");
            }
            catalog.all().stream().filter(p -> p.id().startsWith("example-")).forEach(p ->
                    assertThat(String.join(" ", p.cautions())).as(p.id())
                            .contains("Verify", "against the edition"));
        }

        @Test
        @DisplayName("common-practice: the issue's rules, each marked as common practice")
        void commonPracticeHoldsTheRulesOfThumbAndTheConsistencyChecks() {
            RequirementProfile p = catalog.find("common-practice").orElseThrow();
            assertThat(p.documents()).isEmpty();
            assertThat(p.rules()).extracting(r -> r.metric() + " " + r.comparison() + " " + r.limit())
                    .containsExactly(
                            "samples_per_period AT_LEAST 5.0",
                            "planned_scan_speed_mm_per_s AT_MOST max_scan_speed_mm_per_s",
                            "pulse_repetition_frequency_hz AT_MOST max_prf_without_wraparound_hz",
                            "thickness_resolution_mm AT_MOST thickness_tolerance_mm",
                            "evaluation_error_magnitude_db AT_MOST amplitude_tolerance_db",
                            "combined_amplitude_error_db AT_MOST amplitude_tolerance_db",
                            "gate_start_margin_us AT_LEAST 0.0",
                            "gate_end_margin_us AT_LEAST 0.0");
            assertThat(p.rules()).allSatisfy(r -> {
                assertThat(r.source()).startsWith("common practice, no published source");
                // the TOFD gate rules are for TOFD sheets; every other rule holds for every technique
                assertThat(r.techniques()).isEqualTo(r.metric().startsWith("gate_")
                        ? java.util.Set.of(utdigit.core.sheets.SheetTechnique.TOFD.name()) : java.util.Set.of());
                assertThat(r.when()).isEmpty();
            });
        }

        @Test
        @DisplayName("example-paut: ASME V Art. 4, 2013 ed., read in code excerpts")
        void examplePautHoldsTheDigitizationAndTheThicknessBands() {
            RequirementProfile p = catalog.find("example-paut").orElseThrow();
            assertThat(p.documents()).singleElement().satisfies(d -> {
                assertThat(d.name()).contains("Section V", "Article 4");
                assertThat(d.edition()).isEqualTo("2013");
                assertThat(d.clause()).isEqualTo("clause not verified");
            });
            assertThat(String.join(" ", p.cautions())).contains("signs", "lost in the copy");
            assertThat(p.rules()).allSatisfy(r -> assertThat(r.techniques()).containsExactly("PHASED_ARRAY"));
            assertThat(p.rules()).extracting(r -> r.metric() + " " + r.comparison() + " " + r.limit() + " " + r.when())
                    .containsExactly(
                            "samples_per_period AT_LEAST 5.0 []",
                            "scan_increment_mm AT_MOST 1.0 [" + new Condition("thickness_mm", Comparison.AT_MOST, 75) + "]",
                            "scan_increment_mm AT_MOST 2.0 [" + new Condition("thickness_mm", Comparison.ABOVE, 75) + "]");
        }

        @Test
        @DisplayName("example-tofd: >= 4 x nominal frequency; >= 8 x with signal processing (read on a secondary page, UNVERIFIED)")
        void exampleTofdProfilesHoldFourAndEightSamplesPerPeriod() {
            assertThat(catalog.find("example-tofd").orElseThrow().rules()).singleElement().satisfies(r -> {
                assertThat(r.metric()).isEqualTo("samples_per_period");
                assertThat(r.comparison()).isEqualTo(Comparison.AT_LEAST);
                assertThat(r.limit().value()).isEqualTo(4.0);
                assertThat(r.techniques()).containsExactly("TOFD");
            });
            assertThat(catalog.find("example-tofd-signal-processing").orElseThrow().rules()).singleElement()
                    .satisfies(r -> {
                        assertThat(r.limit().value()).isEqualTo(8.0);
                        assertThat(r.techniques()).containsExactly("TOFD");
                    });
            assertThat(String.join(" ", catalog.find("example-tofd").orElseThrow().cautions()))
                    .contains("8 samples per period", "signal processing");
        }

        @Test
        @DisplayName("example-tfm: amplitude fidelity <= 2 dB (recalled, not read: UNVERIFIED)")
        void exampleTfmLimitsTheGridAmplitudeLossToTwoDb() {
            RequirementProfile p = catalog.find("example-tfm").orElseThrow();
            assertThat(p.rules()).singleElement().satisfies(r -> {
                assertThat(r.metric()).isEqualTo("tfm_grid_amplitude_loss_db");
                assertThat(r.comparison()).isEqualTo(Comparison.AT_MOST);
                assertThat(r.limit().value()).isEqualTo(2.0);
                assertThat(r.techniques()).containsExactly("TFM");
                assertThat(r.source()).startsWith("recalled and not read");
            });
        }
    }

    @Nested
    class StartUpFails {

        @Test
        void onMalformedYaml() throws IOException {
            String yaml = replace(GOOD, "title: ACME pulse-echo digitization", "title: ACME: pulse-echo");
            // a plain scalar may not hold ": ": the YAML parser stops at that colon
            assertAt(failure(yaml), yaml, position(yaml, ": pulse-echo"), "malformed YAML",
                    "mapping values are not allowed here");
        }

        @Test
        void onAnUnknownMetric() throws IOException {
            String yaml = replace(GOOD, "metric: samples_per_period", "metric: samples_per_periods");
            assertAt(failure(yaml), yaml, position(yaml, "samples_per_periods"),
                    "unknown metric 'samples_per_periods'", "did you mean 'samples_per_period'?", "rules[0].metric");
        }

        @Test
        void onAnUnknownMetricAsALimit() throws IOException {
            String yaml = replace(GOOD, "at_most: max_scan_speed_mm_per_s", "at_most: fastest_speed");
            assertAt(failure(yaml), yaml, position(yaml, "fastest_speed"), "unknown metric 'fastest_speed'",
                    "rules[2].at_most", "metrics with a word in common: planned_scan_speed_mm_per_s, "
                            + "max_scan_speed_mm_per_s");
        }

        @Test
        void onAnUnknownMetricLikeNoKnownOne() throws IOException {
            String yaml = replace(GOOD, "metric: scan_increment_mm", "metric: zzz");
            assertAt(failure(yaml), yaml, position(yaml, "zzz"), "unknown metric 'zzz'",
                    "known metrics: " + String.join(", ", SheetMetrics.ALL));
        }

        @Test
        void onAQuotedNumberAsALimit() throws IOException {
            String yaml = replace(GOOD, "at_least: 6", "at_least: \"6\"");
            assertAt(failure(yaml), yaml, position(yaml, "\"6\""), "quoted text '6'", "without quotes");
        }

        @Test
        void onAnUnknownMetricInACondition() throws IOException {
            String yaml = replace(GOOD, "- metric: thickness_mm", "- metric: wall_mm");
            assertAt(failure(yaml), yaml, position(yaml, "wall_mm"), "unknown metric 'wall_mm'",
                    "rules[1].when[0].metric");
        }

        @Test
        void onAnUnknownFieldAtTheTop() throws IOException {
            String yaml = replace(GOOD, "cautions:", "colour: red\ncautions:");
            assertAt(failure(yaml), yaml, position(yaml, "colour"), "unknown field 'colour'",
                    "allowed here: cautions, documents, id, rules, title, verification_status, version");
        }

        @Test
        void onAnUnknownFieldInARule() throws IOException {
            String yaml = replace(GOOD, "    at_most: 0.5\n", "    at_most: 0.5\n    severity:\n      - high\n");
            assertAt(failure(yaml), yaml, position(yaml, "severity"), "unknown field 'severity'", "rules[1]",
                    "at_least, at_most, equals");
        }

        @Test
        void onAFieldGivenTwice() throws IOException {
            String yaml = replace(GOOD, "    at_least: 6\n", "    at_least: 6\n    title: again\n");
            assertAt(failure(yaml), yaml, position(yaml, "title: again"), "field 'title' is given twice",
                    "first at line " + position(yaml, "title: At least 6")[0]);
        }

        @Test
        void onADuplicateRuleId() throws IOException {
            String yaml = replace(GOOD, "- id: speed", "- id: min-samples");
            int[] second = position(yaml, "min-samples", 2);
            assertAt(failure(yaml), yaml, second, "duplicate rule id 'min-samples'",
                    "first at line " + position(yaml, "min-samples")[0]);
        }

        @Test
        void onARuleWithoutALimit() throws IOException {
            String yaml = replace(GOOD, "    at_least: 6\n", "");
            // the rule's mapping starts at its first key
            assertAt(failure(yaml), yaml, position(yaml, "id: min-samples"), "rule 'min-samples' has no limit",
                    "at_least, at_most or equals");
        }

        @Test
        void onARuleWithTwoLimits() throws IOException {
            String yaml = replace(GOOD, "    at_least: 6\n", "    at_least: 6\n    at_most: 9\n");
            assertAt(failure(yaml), yaml, position(yaml, "9\n"), "rule 'min-samples' has 2 limits (at_least, at_most)",
                    "exactly one");
        }

        @Test
        void onAnUnknownTechnique() throws IOException {
            String yaml = replace(GOOD, "[PULSE_ECHO, PHASED_ARRAY]", "[PULSE_ECHO, EMAT]");
            assertAt(failure(yaml), yaml, position(yaml, "EMAT"), "unknown technique 'EMAT'",
                    "PULSE_ECHO, PHASED_ARRAY, TOFD, TFM", "rules[0].techniques[1]");
        }

        @Test
        void onAMissingSource() throws IOException {
            String yaml = replace(GOOD, "    source: ACME procedure UT-7, 2024, 4.4\n", "");
            assertAt(failure(yaml), yaml, position(yaml, "id: speed"), "rule 'speed' has no field 'source'");
        }

        @Test
        void onAMissingRuleTitle() throws IOException {
            String yaml = replace(GOOD, "    title: Planned speed within the maximum\n", "");
            assertAt(failure(yaml), yaml, position(yaml, "id: speed"), "rule 'speed' has no field 'title'");
        }

        @Test
        void onAMissingProfileIdTitleOrVersion() throws IOException {
            for (String line : List.of("id: acme-pulse-echo\n", "title: ACME pulse-echo digitization\n",
                    "version: \"2.1\"\n")) {
                String yaml = replace(GOOD, line, "");
                String field = line.substring(0, line.indexOf(':'));
                // the profile's mapping starts at its first key: line 2 (line 1 is a comment), column 1
                assertAt(failure(yaml), yaml, new int[] {2, 1}, "the profile has no field '" + field + "'");
            }
        }

        @Test
        void onAnEmptyValue() throws IOException {
            String yaml = replace(GOOD, "    source: ACME procedure UT-7, 2024, 4.2\n", "    source:\n");
            ProfileException e = failure(yaml);
            assertThat(e.problem()).contains("expected a text, found nothing", "rules[0].source");
            assertThat(e.line()).isBetween(position(yaml, "source:\n")[0], position(yaml, "source:\n")[0] + 1);
        }

        @Test
        void onAVersionWrittenAsANumber() throws IOException {
            // unquoted, YAML reads 2.10 as the number 2.1: the profile format asks for a text
            String yaml = replace(GOOD, "version: \"2.1\"", "version: 2.10");
            assertAt(failure(yaml), yaml, position(yaml, "2.10"), "expected a text, found the number 2.10",
                    "quote it");
        }

        @Test
        void onANonFiniteLimit() throws IOException {
            // 1e999 is a YAML float beyond the largest double: infinite when read
            String yaml = replace(GOOD, "at_least: 6", "at_least: 1e999");
            assertAt(failure(yaml), yaml, position(yaml, "1e999"), "expected a finite number");
        }

        @Test
        void onAConditionWithTwoComparisons() throws IOException {
            String yaml = replace(GOOD, "        below: 10\n", "        below: 10\n        above: 3\n");
            assertAt(failure(yaml), yaml, position(yaml, "3\n"), "condition on thickness_mm", "2 comparisons",
                    "two conditions for a band");
        }

        @Test
        void onAConditionWithAMetricAsItsValue() throws IOException {
            String yaml = replace(GOOD, "below: 10", "below: thickness_tolerance_mm");
            assertAt(failure(yaml), yaml, position(yaml, "thickness_tolerance_mm"), "expected a number");
        }

        @Test
        void onAnIdThatIsNotKebabCase() throws IOException {
            String yaml = replace(GOOD, "id: acme-pulse-echo", "id: ACME_Pulse");
            assertAt(failure(yaml), yaml, position(yaml, "ACME_Pulse"), "'ACME_Pulse' is not kebab-case");
        }

        @Test
        void onTheIdReservedForTheServicesFeasibilityChecks() throws IOException {
            // Findings of the feasibility checks carry profile_id service-feasibility: no profile may share it.
            String yaml = replace(GOOD, "id: acme-pulse-echo", "id: service-feasibility");
            assertAt(failure(yaml), yaml, position(yaml, "service-feasibility"), "is reserved");
        }

        @Test
        void onAnUnknownVerificationStatus() throws IOException {
            String yaml = replace(GOOD, "verification_status: VERIFIED", "verification_status: CHECKED");
            assertAt(failure(yaml), yaml, position(yaml, "CHECKED"), "VERIFIED or UNVERIFIED, not 'CHECKED'");
        }

        @Test
        void onAProfileWithoutRules() throws IOException {
            String yaml = GOOD.substring(0, GOOD.indexOf("rules:")) + "rules: []\n";
            assertAt(failure(yaml), yaml, position(yaml, "id: acme"), "at least one rule");
        }

        @Test
        void onAnEmptyTechniquesList() throws IOException {
            String yaml = replace(GOOD, "[PULSE_ECHO, PHASED_ARRAY]", "[]");
            assertAt(failure(yaml), yaml, position(yaml, "id: min-samples"), "empty techniques list");
        }

        @Test
        void onAListWhereAMappingBelongs() throws IOException {
            String yaml = replace(GOOD, "  - name: ACME procedure UT-7\n    edition: \"2024\"\n    clause: \"4.2\"\n",
                    "  - [ACME procedure UT-7]\n");
            assertAt(failure(yaml), yaml, position(yaml, "[ACME"), "expected a mapping", "documents[0]");
        }

        @Test
        void onAMissingDocumentClause() throws IOException {
            String yaml = replace(GOOD, "    clause: \"4.2\"\n", "");
            assertAt(failure(yaml), yaml, position(yaml, "name: ACME"), "the document has no field 'clause'");
        }

        @Test
        void onAnEmptyFile() throws IOException {
            ProfileException e = failure("# nothing here\n");
            assertThat(e.source()).endsWith("bad.yaml");
            assertThat(e.problem()).contains("empty");
        }

        @Test
        void onASecondYamlDocument() throws IOException {
            String yaml = GOOD + "---\nid: other\n";
            assertAt(failure(yaml), yaml, position(yaml, "id: other"), "a second YAML document");
        }

        @Test
        void onAnOperatorProfileWithTheIdOfABuiltInOne() throws IOException {
            String yaml = replace(GOOD, "id: acme-pulse-echo", "id: common-practice");
            assertAt(failure(yaml), yaml, position(yaml, "common-practice"),
                    "profile id 'common-practice' is already defined by classpath:profiles/common-practice.yaml",
                    "cannot replace a built-in one");
        }

        @Test
        void onTwoOperatorProfilesWithOneId() throws IOException {
            write("a-first.yaml", GOOD);
            ProfileException e = failure(GOOD);
            assertAt(e, GOOD, position(GOOD, "acme-pulse-echo"), "profile id 'acme-pulse-echo' is already defined by",
                    "a-first.yaml");
        }

        @Test
        void onAMissingDirectory() {
            Path missing = dir.resolve("no-such-directory");
            assertThatThrownBy(() -> new ProfileCatalog(missing))
                    .isInstanceOf(ProfileException.class)
                    .hasMessageContaining(missing.toString())
                    .hasMessageContaining("does not exist")
                    .hasMessageContaining("UTDIGIT_PROFILES_DIRECTORY");
            assertThatThrownBy(() -> new ProfileCatalog(missing.toString())).isInstanceOf(ProfileException.class);
        }

        @Test
        void onADirectoryThatIsAFile() throws IOException {
            Path file = write("plain.yaml", GOOD);
            assertThatThrownBy(() -> new ProfileCatalog(file)).isInstanceOf(ProfileException.class)
                    .hasMessageContaining("is not a directory");
        }
    }
}
