package org.shearstack.spec;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

class FamilySectionTest {

    private static final String SPEC = """
            name: small
            rotor:
              diameter: auto
            family:
              combine: zip
              vary:
                rotor.diameter: 60 mm, 80 mm
                filament: [pla, petg]
            """;

    @Test
    void aSpecWithAFamilySectionStillReadsAsOneDesign() {
        SpecResult r = SpecReader.read("f.yaml", SPEC);
        assertTrue(r.ok(), () -> r.problems().toString());
        assertTrue(r.spec().orElseThrow().entries().keySet().stream().noneMatch(k -> k.startsWith("family")));
    }

    @Test
    void valuesKeepTheirOwnLineAndColumn() {
        FamilySection s = FamilySection.read("f.yaml", SPEC).orThrow();
        assertTrue(s.zip());
        assertEquals(2, s.vary().size());
        FamilySection.Vary d = s.vary().get(0);
        assertEquals("rotor.diameter", d.key());
        assertEquals(7, d.line());
        assertEquals(5, d.column());
        assertEquals(List.of(new SpecOverride.Assignment("rotor.diameter", "60 mm", "f.yaml", 7, 21),
                new SpecOverride.Assignment("rotor.diameter", "80 mm", "f.yaml", 7, 28)), d.values());
        FamilySection.Vary f = s.vary().get(1);
        assertEquals(List.of(new SpecOverride.Assignment("filament", "pla", "f.yaml", 8, 16),
                new SpecOverride.Assignment("filament", "petg", "f.yaml", 8, 21)), f.values());
    }

    @Test
    void noFamilySectionIsAnEmptyOne() {
        FamilySection s = FamilySection.read("f.yaml", "name: a\n").orThrow();
        assertTrue(s.vary().isEmpty());
        assertFalse(s.zip());
    }

    @Test
    void unknownVariedKeyAndBadCombineAreLocated() {
        FamilySection.Result r = FamilySection.read("f.yaml", """
                name: a
                family:
                  combine: cross
                  vary:
                    rotor.diamter: 60 mm
                """);
        assertEquals(List.of(
                "f.yaml:3:12: family.combine: expected product or zip, found \"cross\"",
                "f.yaml:5:5: rotor.diamter: expected a spec key such as rotor.diameter, found unknown key "
                        + "rotor.diamter; did you mean rotor.diameter?"),
                r.problems().stream().map(Problem::format).toList());
    }

    @Test
    void overrideParsesWithTheKeysOwnParserAndRechecksPins() {
        Spec base = SpecReader.read("b.yaml", "name: b\nrotor:\n  exhaust-diameter: 30 mm\n").orThrow();
        SpecResult ok = SpecOverride.apply(base, "b 60", List.of(
                new SpecOverride.Assignment("rotor.diameter", "6 cm", "--vary", 1, 16)));
        assertTrue(ok.ok());
        // 6 cm = 60 mm (SI prefix centi = 1e-2, ISO 80000-1)
        assertEquals(60.0, ok.spec().orElseThrow().quantity("rotor.diameter").orElseThrow().value(), 1e-12);
        SpecResult clash = SpecOverride.apply(base, "b 25", List.of(
                new SpecOverride.Assignment("rotor.diameter", "25 mm", "--vary", 1, 16)));
        assertEquals("b.yaml:3:21: rotor.exhaust-diameter: expected less than the disc diameter (rotor.diameter: "
                + "25 mm), found \"30 mm\"; the two pinned values contradict each other",
                clash.problems().get(0).format());
        SpecOverride.Parsed wrong = SpecOverride.parse(base,
                new SpecOverride.Assignment("rotor.diameter", "6 bar", "--vary", 1, 16));
        assertEquals("--vary:1:16: rotor.diameter: expected a length with a unit, e.g. \"0.75 mm\", found a "
                + "pressure \"6 bar\"", wrong.problems().get(0).format());
    }

    @Test
    void theNameCannotBeVaried() {
        assertTrue(SpecOverride.checkKey("name", "x", 1, 1).isPresent());
        assertFalse(SpecOverride.variableKeys().contains("name"));
        assertTrue(SpecOverride.variableKeys().contains("printer"));
    }
}
