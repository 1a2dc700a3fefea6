package utdigit.core.rules;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;

class RuleEvaluatorTest {

    private static Rule rule(String id, String metric, Comparison c, Limit limit, Set<String> techniques,
                             List<Condition> when) {
        return new Rule(id, id, metric, c, limit, techniques, when, "test rule");
    }

    private static RequirementProfile profile(Rule... rules) {
        return new RequirementProfile("p", "P", "1", List.of(), VerificationStatus.UNVERIFIED, List.of(),
                List.of(rules), "0".repeat(64));
    }

    @Nested
    class Verdicts {
        @Test
        void failBeatsIncompleteBeatsPass() {
            Rule passes = rule("a", "x", Comparison.AT_LEAST, Limit.of(1), Set.of(), List.of());
            Rule fails = rule("b", "x", Comparison.AT_MOST, Limit.of(1), Set.of(), List.of());
            Rule missing = rule("c", "y", Comparison.AT_LEAST, Limit.of(1), Set.of(), List.of());
            Map<String, Double> values = Map.of("x", 2.0);
            assertThat(RuleEvaluator.verdict(RuleEvaluator.evaluate(profile(passes), "TOFD", values)))
                    .isEqualTo(Verdict.PASS);
            assertThat(RuleEvaluator.verdict(RuleEvaluator.evaluate(profile(passes, missing), "TOFD", values)))
                    .isEqualTo(Verdict.INCOMPLETE);
            assertThat(RuleEvaluator.verdict(RuleEvaluator.evaluate(profile(missing, fails, passes), "TOFD", values)))
                    .isEqualTo(Verdict.FAIL);
        }

        @Test
        void noApplicableRuleIsNotCoveredNeverAPass() {
            // A TOFD-only profile says nothing about a pulse-echo sheet: nothing was checked.
            Rule tofdOnly = rule("a", "x", Comparison.AT_LEAST, Limit.of(1), Set.of("TOFD"), List.of());
            List<Finding> findings = RuleEvaluator.evaluate(profile(tofdOnly), "PULSE_ECHO", Map.of("x", 2.0));
            assertThat(findings).isEmpty();
            assertThat(RuleEvaluator.verdict(findings)).isEqualTo(Verdict.NOT_COVERED);
        }

        @Test
        void aRuleWhoseConditionExcludesTheSheetDoesNotCoverIt() {
            // A thickness band that the sheet lies outside of applies no rule: NOT_COVERED, not PASS.
            Rule thin = rule("a", "x", Comparison.AT_LEAST, Limit.of(1), Set.of(),
                    List.of(new Condition("t", Comparison.AT_MOST, 75)));
            assertThat(RuleEvaluator.verdict(RuleEvaluator.evaluate(profile(thin), "TOFD", Map.of("x", 2.0, "t", 80.0))))
                    .isEqualTo(Verdict.NOT_COVERED);
            assertThat(RuleEvaluator.verdict(RuleEvaluator.evaluate(profile(thin), "TOFD", Map.of("x", 2.0, "t", 70.0))))
                    .isEqualTo(Verdict.PASS);
        }

        @Test
        void theWorstVerdictOrdersFailIncompleteNotCoveredPass() {
            assertThat(Verdict.worst(Verdict.PASS, Verdict.NOT_COVERED)).isEqualTo(Verdict.NOT_COVERED);
            assertThat(Verdict.worst(Verdict.INCOMPLETE, Verdict.NOT_COVERED)).isEqualTo(Verdict.INCOMPLETE);
            assertThat(Verdict.worst(Verdict.INCOMPLETE, Verdict.FAIL)).isEqualTo(Verdict.FAIL);
            assertThat(Verdict.worst(Verdict.PASS, Verdict.PASS)).isEqualTo(Verdict.PASS);
        }

        @Test
        void findingsNameTheirProfile() {
            Rule passes = rule("a", "x", Comparison.AT_LEAST, Limit.of(1), Set.of(), List.of());
            assertThat(RuleEvaluator.evaluate(profile(passes), "TOFD", Map.of("x", 2.0)))
                    .extracting(Finding::profileId).containsExactly("p");
        }
    }

    @Nested
    class Limits {
        @Test
        void aMetricLimitIsResolvedFromTheSameSheet() {
            Rule speed = rule("s", "planned", Comparison.AT_MOST, Limit.ofMetric("max"), Set.of(), List.of());
            Finding f = RuleEvaluator.evaluate(profile(speed), "TFM", Map.of("planned", 50.0, "max", 40.0)).get(0);
            assertThat(f.verdict()).isEqualTo(Verdict.FAIL);
            assertThat(f.limit()).isEqualTo(40.0);
            assertThat(f.limitMetric()).isEqualTo("max");
        }

        @Test
        void aMissingLimitMetricLeavesTheRuleNotEvaluated() {
            Rule speed = rule("s", "planned", Comparison.AT_MOST, Limit.ofMetric("max"), Set.of(), List.of());
            Finding f = RuleEvaluator.evaluate(profile(speed), "TFM", Map.of("planned", 50.0)).get(0);
            assertThat(f.verdict()).isEqualTo(Verdict.NOT_EVALUATED);
            assertThat(f.missing()).containsExactly("max");
        }

        @Test
        void aValueComputedToEqualTheLimitPasses() {
            // 25 MHz / 5 MHz is 5 samples per period; a rounding in the last bit must not fail it.
            Rule five = rule("n", "n", Comparison.AT_LEAST, Limit.of(5), Set.of(), List.of());
            double justBelow = Math.nextDown(5.0);
            assertThat(RuleEvaluator.evaluate(profile(five), "TOFD", Map.of("n", justBelow)).get(0).verdict())
                    .isEqualTo(Verdict.PASS);
            assertThat(RuleEvaluator.evaluate(profile(five), "TOFD", Map.of("n", 4.99)).get(0).verdict())
                    .isEqualTo(Verdict.FAIL);
        }
    }

    @Nested
    class Conditions {
        // A thickness band rule as a code states it: increment <= 1 mm up to 75 mm, <= 2 mm above.
        private final Rule thin = rule("thin", "inc", Comparison.AT_MOST, Limit.of(1), Set.of(),
                List.of(new Condition("t", Comparison.AT_MOST, 75)));
        private final Rule thick = rule("thick", "inc", Comparison.AT_MOST, Limit.of(2), Set.of(),
                List.of(new Condition("t", Comparison.ABOVE, 75)));

        @Test
        void onlyTheBandThatHoldsApplies() {
            List<Finding> at50 = RuleEvaluator.evaluate(profile(thin, thick), "PHASED_ARRAY", Map.of("t", 50.0, "inc", 1.5));
            assertThat(at50).extracting(Finding::ruleId).containsExactly("thin");
            assertThat(at50.get(0).verdict()).isEqualTo(Verdict.FAIL);
            List<Finding> at100 = RuleEvaluator.evaluate(profile(thin, thick), "PHASED_ARRAY", Map.of("t", 100.0, "inc", 1.5));
            assertThat(at100).extracting(Finding::ruleId).containsExactly("thick");
            assertThat(at100.get(0).verdict()).isEqualTo(Verdict.PASS);
            List<Finding> at75 = RuleEvaluator.evaluate(profile(thin, thick), "PHASED_ARRAY", Map.of("t", 75.0, "inc", 1.0));
            assertThat(at75).extracting(Finding::ruleId).containsExactly("thin");
        }

        @Test
        void anUnknownConditionMetricLeavesTheRuleNotEvaluated() {
            List<Finding> f = RuleEvaluator.evaluate(profile(thin), "PHASED_ARRAY", Map.of("inc", 0.5));
            assertThat(f).hasSize(1);
            assertThat(f.get(0).verdict()).isEqualTo(Verdict.NOT_EVALUATED);
            assertThat(f.get(0).missing()).containsExactly("t");
        }
    }
}
