package org.shearstack.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.shearstack.design.ResolvedDesign;
import org.shearstack.profile.Profiles;
import org.shearstack.spec.BadInputException;
import org.shearstack.spec.Problem;
import org.shearstack.spec.SpecReader;

class DesignResolverTest {

    private static final Profiles PROFILES = Profiles.shipped();

    /** The resolver with the printer rules only: these specs have no supply, which the SIZE- rules need. */
    private static ResolvedDesign resolve(String yaml) {
        return DesignResolver.resolve(SpecReader.read("t.yaml", yaml).orThrow(), PROFILES,
                Engine.of(PrinterRules.rules()));
    }

    @Test
    void unknownProfileNamesListTheKnownOnes() {
        BadInputException e = assertThrows(BadInputException.class,
                () -> resolve("name: a\nprinter: generic-04\nfilament: wood\n"));
        assertEquals(List.of(
                "t.yaml:2:10: printer: expected a known printer (fine-0.25, generic-0.4, generic-0.6) or a profile file, "
                        + "found \"generic-04\"; did you mean generic-0.4?",
                "t.yaml:3:11: filament: expected a known filament (abs, asa, nylon, petg, pla) or a profile file, "
                        + "found \"wood\""),
                e.problems().stream().map(Problem::format).toList());
    }

    @Test
    void unknownHardwareIsLocatedWithTheKnownNames() {
        BadInputException e = assertThrows(BadInputException.class,
                () -> resolve("name: a\nbearings: 6088\nfasteners:\n  size: M7\nseal: o-ring 1.6 mm\n"));
        List<String> p = e.problems().stream().map(Problem::format).toList();
        assertEquals(3, p.size(), String.join("\n", p));
        assertTrue(p.get(0).startsWith("t.yaml:2:11: bearings: expected auto or a known bearing (623, 624,"), p.get(0));
        assertTrue(p.get(0).endsWith("found \"6088\"; did you mean 6008?") || p.get(0).contains("did you mean"), p.get(0));
        assertEquals("t.yaml:4:9: fasteners.size: expected a known screw size (M2, M2.5, M3, M4, M5), found \"M7\"",
                p.get(1));
        assertEquals("t.yaml:5:7: seal.size: expected an O-ring cross-section with a gland in the table "
                + "(1, 1.5, 1.78, 2, 2.5, 2.62, 3, 3.53, 5.33 mm), found 1.6 mm", p.get(2));
    }

    @Test
    void profileValuesAreSeededAndDefaultsStated() {
        ResolvedDesign d = resolve("name: a\nprinter: fine-0.25\n");
        assertEquals(0.125, d.get(ProfileKeys.LAYER_HEIGHT));
        assertEquals("printer fine-0.25", d.derivation(ProfileKeys.LAYER_HEIGHT).ruleId());
        assertEquals(101_325, d.get(SpecKeys.SUPPLY_AMBIENT));
        assertEquals(Derivation.Origin.DEFAULT, d.derivation(SpecKeys.SUPPLY_AMBIENT).origin());
        assertEquals("petg", d.text(ProfileKeys.FILAMENT_NAME));
    }

    @Test
    void printerAdjustOverridesTheProfileCompensationAndSaysSo() {
        ResolvedDesign plain = resolve("name: a\n");
        assertEquals(0.2, plain.get(PrinterRules.HOLE_COMPENSATION));
        ResolvedDesign adjusted = resolve("name: a\nprinter-adjust:\n  hole-compensation: 0.15 mm\n");
        assertEquals(0.15, adjusted.get(PrinterRules.HOLE_COMPENSATION));
        Derivation d = adjusted.derivation(PrinterRules.HOLE_COMPENSATION);
        assertEquals("PRN-HOLE-COMPENSATION", d.ruleId());
        assertTrue(d.formula().startsWith("measured on the user's printer"), d.formula());
    }

    @Test
    void minimumWallIsWholeLineWidths() {
        ResolvedDesign d = resolve("name: a\nprinter: generic-0.6\n");
        // profile min wall 1.36 mm on 0.68 mm lines: exactly 2 line widths
        assertEquals(1.36, d.get(PrinterRules.MIN_WALL), 1e-12);
        assertEquals(1.2, d.get(PrinterRules.MIN_FLOOR), 1e-12); // 0.8 mm → 3 layers of 0.3, at least 4 layers
    }

    @Test
    void specKeysMatchTheSchema() {
        var schema = org.shearstack.spec.SpecSchema.allKeys();
        assertEquals(schema.size(), SpecKeys.all().size());
        for (Key k : SpecKeys.all()) {
            assertEquals(schema.get(k.name()), k.dimension(), k.name());
        }
    }

    @Test
    void ruleCatalogOrders() {
        assertTrue(RuleCatalog.engine(PROFILES).order().size() >= 4);
    }
}
