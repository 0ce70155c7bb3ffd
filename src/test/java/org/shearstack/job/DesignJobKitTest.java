package org.shearstack.job;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shearstack.io.report.PinnedDemo;
import org.shearstack.io.report.ReportHtml;
import org.shearstack.profile.Profiles;
import org.shearstack.spec.SpecReader;

/** The whole pipeline with the kit: parts, meshes, plates and BOM written beside the report, all in one folder. */
class DesignJobKitTest {

    @TempDir
    Path tmp;

    static DesignResult first;

    @org.junit.jupiter.api.BeforeAll
    static void build() {
        first = full();
    }

    private static DesignResult full() {
        return DesignJob.run(SpecReader.read(PinnedDemo.SPEC).orThrow(), Profiles.load(Optional.empty()),
                new JobOptions(true, false, 11));
    }

    @Test
    void theKitAndTheReportLandInOneFolderAndAgree() throws IOException {
        DesignResult r = first;
        assertTrue(r.kit().isPresent());
        Path out = tmp.resolve("pinned");
        DesignOutput.Written w = DesignOutput.write(r, out);
        for (Path f : w.files()) {
            assertTrue(Files.size(out.resolve(f)) > 0, f.toString());
        }
        for (String f : List.of("assembly.3mf", "bom.csv", "report.html", "report.json", "summary.md",
                "parts/rotor-disc.stl", "plates/plate-1.3mf")) {
            assertTrue(Files.exists(out.resolve(f)), f);
        }
        JsonNode json = new ObjectMapper().readTree(out.resolve("report.json").toFile());
        var printed = r.kit().get().printedParts();
        assertEquals(printed.size(), json.get("parts").size(), "one report entry per printed part");
        for (int i = 0; i < printed.size(); i++) {
            JsonNode p = json.get("parts").get(i);
            assertEquals(printed.get(i).name(), p.get("name").asText());
            assertEquals(printed.get(i).count(), p.get("count").asInt());
            // volume of the layered solid, the kernel's exact invariant
            assertEquals(printed.get(i).solid().volumeMm3(), p.get("volumeMm3").asDouble(), 1e-9);
            assertTrue(Files.exists(out.resolve("parts/" + p.get("name").asText() + ".stl")));
        }
        assertEquals(r.kit().get().plates().size(), json.get("plates").size());
        assertFalse(json.get("bom").isEmpty());
        String html = Files.readString(out.resolve("report.html"));
        assertEquals(printed.size(), html.split("class=\"drawing\"", -1).length - 1, "a drawing per printed part");
        assertFalse(json.get("preview").get("rendered").asBoolean(), "not asked for in this run");
        assertTrue(html.contains("No assembly picture was rendered: not asked for"), "says why there is no picture");
    }

    @Test
    void rerunningGivesTheSameBytes() throws IOException {
        DesignResult a = first;
        DesignResult b = full();
        assertEquals(ReportHtml.page(a.report()), ReportHtml.page(b.report()));
        Path outA = tmp.resolve("a");
        Path outB = tmp.resolve("b");
        DesignOutput.write(a, outA);
        DesignOutput.write(b, outB);
        for (Path f : DesignOutput.write(a, outA).files()) {
            assertArrayEquals(Files.readAllBytes(outA.resolve(f)), Files.readAllBytes(outB.resolve(f)), f.toString());
        }
    }
}
