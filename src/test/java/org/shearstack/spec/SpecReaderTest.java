package org.shearstack.spec;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

class SpecReaderTest {

    private static List<String> problems(String yaml) {
        SpecResult r = SpecReader.read("t.yaml", yaml);
        assertTrue(!r.ok(), "expected problems");
        return r.problems().stream().map(Problem::format).toList();
    }

    private static Spec ok(String yaml) {
        SpecResult r = SpecReader.read("t.yaml", yaml);
        assertTrue(r.ok(), () -> String.join("\n", r.problems().stream().map(Problem::format).toList()));
        return r.spec().orElseThrow();
    }

    @Test
    void unknownKeySuggestsTheNearest() {
        assertEquals(List.of("t.yaml:3:3: rotor.diamter: expected a known key, found unknown key rotor.diamter; "
                + "did you mean rotor.diameter?"), problems("name: a\nrotor:\n  diamter: 60 mm\n"));
    }

    @Test
    void missingUnit() {
        assertEquals(List.of("t.yaml:3:8: rotor.gap: expected a length with a unit, e.g. \"0.75 mm\", "
                + "found no unit in \"0.75\""), problems("name: a\nrotor:\n  gap: 0.75\n"));
    }

    @Test
    void unknownUnit() {
        assertEquals(List.of("t.yaml:3:13: supply.pressure: expected a pressure with a unit, e.g. \"6 bar(g)\" "
                + "(units: Pa, Pa(g), Pa(a), kPa, kPa(g), kPa(a), MPa, MPa(g), MPa(a), bar, bar(g), bar(a), psi, psi(g), "
                + "psi(a), psig, psia), found unknown unit \"barr\""), problems("name: a\nsupply:\n  pressure: 6 barr\n"));
    }

    @Test
    void wrongDimension() {
        assertEquals(List.of("t.yaml:3:13: supply.pressure: expected a pressure with a unit, e.g. \"6 bar(g)\", "
                + "found a length \"6 mm\""), problems("name: a\nsupply:\n  pressure: 6 mm\n"));
    }

    @Test
    void negativeZeroAndOutOfRange() {
        assertEquals(List.of("t.yaml:3:19: rotor.disc-thickness: expected a length above 0 and at most 5 mm, "
                + "found \"-0.75 mm\""), problems("name: a\nrotor:\n  disc-thickness: -0.75 mm\n"));
        assertEquals(List.of("t.yaml:3:13: supply.pressure: expected a pressure above 0 and at most 16 bar(g), "
                + "found \"0 bar(g)\""), problems("name: a\nsupply:\n  pressure: 0 bar(g)\n"));
        assertEquals(List.of("t.yaml:3:10: rotor.discs: expected a whole number from 2 to 60, found \"200\""),
                problems("name: a\nrotor:\n  discs: 200\n"));
    }

    @Test
    void contradictoryPins() {
        assertEquals(List.of("t.yaml:4:21: rotor.exhaust-diameter: expected less than the disc diameter "
                        + "(rotor.diameter: 60 mm), found \"60 mm\"; the two pinned values contradict each other"),
                problems("name: a\nrotor:\n  diameter: 60 mm\n  exhaust-diameter: 60 mm\n"));
        assertEquals(List.of("t.yaml:3:13: rotor.diameter: expected less than the housing chamber diameter "
                        + "(housing.chamber-diameter: 59 mm), found \"60 mm\"; the two pinned values contradict each other"),
                problems("name: a\nrotor:\n  diameter: 60 mm\nhousing:\n  chamber-diameter: 59 mm\n"));
    }

    @Test
    void everyProblemIsCollectedNotJustTheFirst() {
        List<String> p = problems("name: a\nsupply:\n  pressure: 6 mm\nrotor:\n  gap: 1\n  diamter: 3 mm\nbogus: 1\n");
        assertEquals(4, p.size(), String.join("\n", p));
        assertTrue(p.get(0).startsWith("t.yaml:6:3: rotor.diamter"), p.get(0));
        assertTrue(p.get(1).startsWith("t.yaml:7:1: bogus: expected a known key"), p.get(1));
    }

    @Test
    void yamlSyntaxErrorIsLocated() {
        List<String> p = problems("name: a\nrotor:\n  gap: [1 mm\n");
        assertEquals(1, p.size());
        assertTrue(p.get(0).startsWith("t.yaml:4:1: expected valid YAML, found "), p.get(0));
    }

    @Test
    void duplicatesAndSectionsThatAreNotMappings() {
        assertEquals(List.of("t.yaml:3:1: name: expected each key once, found a second name"),
                problems("name: a\nrotor: {}\nname: b\n"));
        assertEquals(List.of("t.yaml:2:8: rotor: expected a section of keys (rotor: then indented keys), found \"60 mm\""),
                problems("name: a\nrotor: 60 mm\n"));
        assertEquals(List.of("t.yaml:1:1: name: expected a design name, e.g. \"name: classroom-demo\", found no name"),
                problems("rotor:\n  gap: 1 mm\n"));
    }

    @Test
    void compoundValuesSplitIntoSubKeys() {
        Spec s = ok("""
                name: a
                supply:
                  free-air-flow: 90 L/min at 6 bar(g)
                rotor:
                  shaft: metal 8 mm
                seal: o-ring 1.5 mm
                inlet-port: push-in 6 mm
                generator:
                  open-circuit-voltage: 9 V at 6000 rpm
                """);
        assertEquals(1.5e-3, s.quantity("supply.free-air-flow").orElseThrow().value(), 1e-15);
        assertEquals(701_325, s.quantity("supply.free-air-flow.pressure").orElseThrow().value(), 1e-6);
        assertEquals("metal", s.text("rotor.shaft").orElseThrow());
        assertEquals(8, s.quantity("rotor.shaft.diameter").orElseThrow().value());
        assertEquals("o-ring", s.text("seal").orElseThrow());
        assertEquals(1.5, s.quantity("seal.size").orElseThrow().value());
        assertEquals("push-in", s.text("inlet-port").orElseThrow());
        assertEquals(6, s.quantity("inlet-port.size").orElseThrow().value());
        assertEquals(9, s.quantity("generator.open-circuit-voltage").orElseThrow().value());
        assertEquals(200 * Math.PI, s.quantity("generator.open-circuit-voltage.speed").orElseThrow().value(), 1e-9);
    }

    @Test
    void gaugeUsesTheSpecsAmbient() {
        Spec s = ok("name: a\nsupply:\n  ambient: 0.95 bar(a)\n  pressure: 6 bar\n");
        assertEquals(695_000, s.quantity("supply.pressure").orElseThrow().value(), 1e-6);
    }

    @Test
    void autoIsRecordedAndNotAValue() {
        Spec s = ok("name: a\nrotor:\n  diameter: auto\n");
        assertTrue(s.entry("rotor.diameter").orElseThrow() instanceof SpecEntry.Auto);
        assertTrue(s.quantity("rotor.diameter").isEmpty());
    }

    @Test
    void badCompoundsSayWhatTheyExpect() {
        assertEquals(List.of("t.yaml:2:16: rotor.shaft: expected metal <length> | printed (e.g. \"metal 8 mm\"), "
                + "found \"steel 8 mm\""), problems("name: a\nrotor: {shaft: steel 8 mm}\n").stream().toList());
        assertEquals(List.of("t.yaml:3:18: supply.free-air-flow: expected a volume flow at a pressure, e.g. "
                + "\"90 L/min at 6 bar(g)\", found \"90 L/min\""), problems("name: a\nsupply:\n  free-air-flow: 90 L/min\n"));
    }

    @Test
    void suggestUsesEditDistance() {
        assertEquals(1, Suggest.distance("diamter", "diameter"));
        assertEquals(3, Suggest.distance("kitten", "sitting")); // Levenshtein's classic example
    }
}
