package org.shearstack.family;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.shearstack.io.family.VariedKey;
import org.shearstack.io.family.VariedValue;
import org.shearstack.spec.BadInputException;
import org.shearstack.spec.Problem;
import org.shearstack.spec.Spec;
import org.shearstack.spec.SpecReader;

class FamilyPlanTest {

    static final Path DEMO = Path.of("examples", "classroom-demo.yaml");

    private static Spec demo() {
        return SpecReader.read(DEMO).orThrow();
    }

    private static FamilyPlan plan(boolean zip, String... vary) {
        return FamilyPlan.of(demo(), VaryOption.parse(List.of(vary)), zip);
    }

    private static List<String> problems(boolean zip, String... vary) {
        BadInputException e = assertThrows(BadInputException.class, () -> plan(zip, vary));
        return e.problems().stream().map(Problem::format).toList();
    }

    @Test
    void productVariesTheFirstKeySlowestWithReadableNames() {
        FamilyPlan p = plan(false, "rotor.diameter=60mm, 80 mm", "filament=pla,petg,abs");
        assertEquals(6, p.size());
        List<String> names = java.util.stream.IntStream.range(0, 6).mapToObj(i -> p.variant(i).name()).toList();
        assertEquals(List.of("rotor.diameter=60mm,filament=pla", "rotor.diameter=60mm,filament=petg",
                "rotor.diameter=60mm,filament=abs", "rotor.diameter=80mm,filament=pla",
                "rotor.diameter=80mm,filament=petg", "rotor.diameter=80mm,filament=abs"), names);
        assertEquals(List.of(new VariedKey("rotor.diameter", "mm"), new VariedKey("filament", "")), p.keys());
        assertEquals(List.of(new VariedValue("80mm", 80.0), new VariedValue("petg", Double.NaN)),
                p.variant(4).values());
    }

    @Test
    void variantSpecsCarryTheirValues() {
        FamilyPlan p = plan(false, "rotor.diameter=6cm,100mm", "printer=generic-0.4");
        Spec s = p.spec(p.variant(1)).orThrow();
        assertEquals(100.0, s.quantity("rotor.diameter").orElseThrow().value(), 0);
        assertEquals("generic-0.4", s.text("printer").orElseThrow());
        assertEquals("classroom-demo rotor.diameter=100mm,printer=generic-0.4", s.name());
        // 6 cm is 60 mm (ISO 80000-1 prefix centi)
        assertEquals(60.0, p.variant(0).values().get(0).number(), 1e-12);
    }

    @Test
    void gaugePressuresStandOnTheAxisInBarGauge() {
        FamilyPlan p = plan(false, "supply.pressure=3bar,5 bar(g),87psi");
        assertEquals(new VariedKey("supply.pressure", "bar(g)"), p.keys().get(0));
        assertEquals(3.0, p.variant(0).values().get(0).number(), 1e-12);
        assertEquals(5.0, p.variant(1).values().get(0).number(), 1e-12);
        // 1 psi = 6894.757 Pa (NIST SP 811, 2008, appendix B.8): 87 psi = 5.998 bar
        assertEquals(87 * 6894.757 / 1e5, p.variant(2).values().get(0).number(), 1e-5);
        assertEquals("supply.pressure=5bar(g)", p.variant(1).name());
    }

    @Test
    void zipPairsTheListsInOrder() {
        FamilyPlan p = plan(true, "rotor.diameter=60mm,80mm,100mm", "rotor.discs=5,7,9");
        assertEquals(3, p.size());
        assertEquals("rotor.diameter=80mm,rotor.discs=7", p.variant(1).name());
    }

    @Test
    void unknownKeySuggestsTheNearest() {
        assertEquals(List.of("--vary rotor.diamter=60mm:1:1: rotor.diamter: expected a spec key such as "
                + "rotor.diameter, found unknown key rotor.diamter; did you mean rotor.diameter?"),
                problems(false, "rotor.diamter=60mm"));
    }

    @Test
    void wrongUnitPointsAtTheValue() {
        assertEquals(List.of("--vary rotor.diameter=60mm,6bar:1:21: rotor.diameter: expected a length with a unit, "
                + "e.g. \"0.75 mm\", found a pressure \"6bar\""), problems(false, "rotor.diameter=60mm,6bar"));
    }

    @Test
    void unequalListsCannotBeZipped() {
        assertEquals(List.of("--vary rotor.discs=5,7:1:1: rotor.discs: expected 3 values (as many as rotor.diameter) "
                + "to zip the lists, found 2 values; zipped lists pair their values in order; leave out --zip for "
                + "every combination"), problems(true, "rotor.diameter=60mm,80mm,100mm", "rotor.discs=5,7"));
    }

    @Test
    void shapeProblems() {
        assertEquals(List.of("--vary rotor.diameter:1:1: rotor.diameter: expected KEY=V1,V2,... e.g. "
                + "rotor.diameter=60mm,80mm, found \"rotor.diameter\""), problems(false, "rotor.diameter"));
        assertEquals(List.of("--vary rotor.diameter=:1:16: rotor.diameter: expected at least one value after "
                + "rotor.diameter=, found nothing"), problems(false, "rotor.diameter="));
        assertEquals(List.of("--vary rotor.diameter=60mm,,80mm:1:21: rotor.diameter: expected a value, found nothing"),
                problems(false, "rotor.diameter=60mm,,80mm"));
        assertEquals(List.of("--vary rotor.discs=5,5:1:15: rotor.discs: expected each value once, found \"5\" again"),
                problems(false, "rotor.discs=5,5"));
        assertTrue(problems(false, "name=a,b").get(0).contains("expected a spec key other than name"));
    }

    @Test
    void everyProblemIsReportedAtOnce() {
        assertEquals(2, problems(false, "rotor.diameter=6bar", "filament=pla", "rotor.gapp=1mm").size());
    }
}
