package org.shearstack.profile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shearstack.spec.BadInputException;
import org.shearstack.spec.Problem;

class ProfilesTest {

    @TempDir
    Path dir;

    @Test
    void shippedPrintersAndFilamentsLoad() {
        Profiles p = Profiles.shipped();
        assertEquals(List.of("fine-0.25", "generic-0.4", "generic-0.6"), List.copyOf(p.printers().keySet()));
        assertEquals(List.of("abs", "asa", "nylon", "petg", "pla"), List.copyOf(p.filaments().keySet()));
        PrinterProfile g = p.printer("generic-0.4").orElseThrow();
        assertEquals(0.4, g.nozzleDiameterMm());
        assertEquals(0.45, g.lineWidthMm(), 1e-12); // 1.125 × nozzle (standards.md §7, common practice)
        assertEquals(8, g.volumetricFlowMm3PerS(), 1e-9);
        FilamentProfile petg = p.filament("petg").orElseThrow();
        assertEquals(1270, petg.densityKgPerM3(), 1e-9);
        assertEquals(348.15, petg.softeningK(), 1e-9);
    }

    @Test
    void everyShippedPrinterKeepsLayerAndLineWithinTheTradesRules() {
        for (PrinterProfile p : Profiles.shipped().printers().values()) {
            // layer height at most 75-80 % of the nozzle, line width 100-150 % (standards.md §7, common practice)
            assertTrue(p.layerHeightMm() <= 0.8 * p.nozzleDiameterMm(), p.name());
            assertTrue(p.lineWidthMm() >= p.nozzleDiameterMm() && p.lineWidthMm() <= 1.5 * p.nozzleDiameterMm(), p.name());
        }
    }

    @Test
    void userFolderOverridesAndExtends() throws IOException {
        Files.createDirectories(dir.resolve("printers"));
        String base = Files.readString(Path.of("profiles/printers/generic-0.4.yaml"));
        Files.writeString(dir.resolve("printers/generic-0.4.yaml"), base.replace("hole-compensation: 0.2 mm",
                "hole-compensation: 0.35 mm"));
        Files.writeString(dir.resolve("printers/mine.yaml"), base.replace("name: generic-0.4", "name: mine"));
        Profiles p = Profiles.load(Optional.of(dir));
        assertEquals(0.35, p.printer("generic-0.4").orElseThrow().holeCompensationMm(), 1e-12);
        assertTrue(p.printer("mine").isPresent());
        assertEquals(4, p.printers().size());
    }

    @Test
    void badUserProfileIsLocated() throws IOException {
        Files.createDirectories(dir.resolve("filaments"));
        String base = Files.readString(Path.of("profiles/filaments/pla.yaml"));
        Path f = dir.resolve("filaments/pla.yaml");
        Files.writeString(f, base.replace("density: 1.24 g/cm3", "density: 1.24 mm").replace("sources:", "sorces:"));
        BadInputException e = assertThrows(BadInputException.class, () -> Profiles.load(Optional.of(dir)));
        List<String> messages = e.problems().stream().map(Problem::format).toList();
        assertEquals(List.of(
                f + ":12:1: sorces: expected a known key, found unknown key sorces; did you mean sources?",
                f + ":6:10: density: expected a density with a unit, e.g. \"1.27 g/cm3\", found a length \"1.24 mm\"",
                f + ":3:1: sources: expected text, found no sources"), messages);
    }
}
