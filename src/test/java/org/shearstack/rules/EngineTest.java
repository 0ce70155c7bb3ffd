package org.shearstack.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.shearstack.spec.Dimension.LENGTH;
import static org.shearstack.spec.Dimension.TEXT;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.shearstack.design.ResolvedDesign;

class EngineTest {

    private static final Key A = Key.of("test.a", LENGTH);
    private static final Key B = Key.of("test.b", LENGTH);
    private static final Key C = Key.of("test.c", LENGTH);
    private static final Key D = Key.of("test.d", LENGTH);
    private static final Key OPT = Key.of("test.optional", LENGTH);
    private static final Key WORD = Key.of("test.word", TEXT);

    /** b = a + 1 */
    private static final Rule AB = FunctionRule.of("T-AB", List.of(A), List.of(B),
            (in, out) -> out.put(B, in.get(A) + 1, "a + 1", "test"));
    /** c = 2 b, and d = c + optional (when present) */
    private static final Rule BC = FunctionRule.of("T-BC", List.of(B, OPT), List.of(C, D), (in, out) -> {
        double c = 2 * in.get(B);
        out.put(C, c, "2 b", "test");
        out.put(D, c + in.find(OPT).orElse(0.0), "c + optional", "test");
    });

    private static Seed spec(Key k, double v) {
        return Seed.number(k, v, Derivation.Origin.SPEC, k.name(), "as written", "t.yaml:1:1");
    }

    @Test
    void rulesRunInDependencyOrderWhateverTheRegistrationOrder() {
        Engine e = Engine.of(List.of(BC, AB));
        assertEquals(List.of("T-AB", "T-BC"), e.order().stream().map(Rule::id).toList());
        Resolution r = e.resolve("x", "t.yaml", List.of(spec(A, 10)));
        assertTrue(r.complete());
        ResolvedDesign d = r.design();
        assertEquals(11, d.get(B));
        assertEquals(22, d.get(C));
        assertEquals(22, d.get(D));
        Derivation dc = d.derivation(C);
        assertEquals("T-BC", dc.ruleId());
        assertEquals(Derivation.Origin.RULE, dc.origin());
        // the optional input was consulted and absent: recorded as such
        assertEquals(List.of(new Derivation.Input(B, "11 mm"), new Derivation.Input(OPT, "(absent)")), dc.inputs());
    }

    @Test
    void optionalInputIsReadWhenPresentAndRecorded() {
        ResolvedDesign d = Engine.of(List.of(AB, BC)).resolve("x", "t", List.of(spec(A, 10), spec(OPT, 0.5))).design();
        assertEquals(22.5, d.get(D));
        assertEquals(List.of(new Derivation.Input(B, "11 mm"), new Derivation.Input(OPT, "0.5 mm")),
                d.derivation(D).inputs());
    }

    @Test
    void cycleIsReportedWithItsKeys() {
        Rule ca = FunctionRule.of("T-CA", List.of(C), List.of(A), (in, out) -> out.put(A, in.get(C), "c", "test"));
        RuleGraphException ex = assertThrows(RuleGraphException.class, () -> Engine.of(List.of(AB, BC, ca)));
        assertEquals(List.of("test.a", "test.b", "test.c").stream().sorted().toList(),
                ex.keys().stream().sorted().toList());
        assertTrue(ex.getMessage().startsWith("cycle between rules:"), ex.getMessage());
        assertTrue(ex.getMessage().contains("(keys test.a, test.b, test.c)"), ex.getMessage());
    }

    @Test
    void keyWrittenByTwoRulesIsReportedWithTheKeyAndBothRules() {
        Rule other = FunctionRule.of("T-OTHER", List.of(), List.of(B), (in, out) -> out.put(B, 1, "one", "test"));
        RuleGraphException ex = assertThrows(RuleGraphException.class, () -> Engine.of(List.of(AB, other)));
        assertEquals(List.of("test.b"), ex.keys());
        assertEquals("keys written by more than one rule: test.b (T-AB, T-OTHER)", ex.getMessage());
    }

    @Test
    void oneKeyNameWithTwoDimensionsIsRefused() {
        Rule wrong = FunctionRule.of("T-WRONG", List.of(Key.of("test.b", TEXT)), List.of(WORD),
                (in, out) -> out.putText(WORD, "w", "", ""));
        RuleGraphException ex = assertThrows(RuleGraphException.class, () -> Engine.of(List.of(AB, wrong)));
        assertEquals(List.of("test.b"), ex.keys());
    }

    @Test
    void pinReplacesTheRuleOutputWhichIsKept() {
        ResolvedDesign d = Engine.of(List.of(AB, BC)).resolve("x", "t", List.of(spec(A, 10), spec(B, 3))).design();
        assertEquals(3, d.get(B));
        assertEquals(6, d.get(C), "downstream rules see the pin");
        assertEquals(Derivation.Origin.PINNED, d.derivation(B).origin());
        var over = d.overridden(B).orElseThrow();
        assertEquals("T-AB", over.derivation().ruleId());
        assertEquals(11, over.number());
        assertTrue(d.explain(B).contains("pinned over rule T-AB, which gives 11 mm (a + 1)"), d.explain(B));
    }

    @Test
    void missingInputIsReportedOnceAtItsRootAndDownstreamRulesAreSkipped() {
        Resolution r = Engine.of(List.of(AB, BC)).resolve("x", "t", List.of());
        assertEquals(List.of(new MissingInput(A, "T-AB")), r.missing());
        assertFalse(r.design().has(B));
        assertFalse(r.design().has(C));
    }

    @Test
    void defaultsGiveWayToRulesButProfileValuesMayNotBeDerived() {
        Seed def = Seed.number(B, 99, Derivation.Origin.DEFAULT, "default", "", "");
        ResolvedDesign d = Engine.of(List.of(AB)).resolve("x", "t", List.of(spec(A, 1), def)).design();
        assertEquals(2, d.get(B));
        Seed prof = Seed.number(B, 99, Derivation.Origin.PROFILE, "p", "", "");
        assertThrows(RuleGraphException.class, () -> Engine.of(List.of(AB)).resolve("x", "t", List.of(prof)));
    }

    @Test
    void contractBreachesAreInternalErrorsNamingTheRule() {
        Rule undeclaredRead = FunctionRule.of("T-SNEAK", List.of(), List.of(B), (in, out) -> out.put(B, in.get(A), "", ""));
        RuleFailedException e1 = assertThrows(RuleFailedException.class,
                () -> Engine.of(List.of(undeclaredRead)).resolve("x", "t", List.of(spec(A, 1))));
        assertEquals("T-SNEAK", e1.ruleId());
        Rule lazy = FunctionRule.of("T-LAZY", List.of(), List.of(B, C), (in, out) -> out.put(B, 1, "", ""));
        assertThrows(RuleFailedException.class, () -> Engine.of(List.of(lazy)).resolve("x", "t", List.of()));
        Rule nan = FunctionRule.of("T-NAN", List.of(), List.of(B), (in, out) -> out.put(B, Double.NaN, "", ""));
        assertThrows(RuleFailedException.class, () -> Engine.of(List.of(nan)).resolve("x", "t", List.of()));
    }

    @Test
    void explainPrintsTheTreeWithSources() {
        ResolvedDesign d = Engine.of(List.of(AB, BC)).resolve("x", "t", List.of(spec(A, 10))).design();
        assertEquals("""
                test.c = 22 mm   [rule T-BC]
                    how: 2 b
                    source: test
                  | test.b = 11 mm   [rule T-AB]
                  |     how: a + 1
                  |     source: test
                  |   | test.a = 10 mm   [spec]
                  |   |     how: as written
                  |   |     source: t.yaml:1:1
                  | test.optional = (absent)
                """, d.explain(C));
    }
}
