package org.shearstack.rules;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/** Mutated specs give a design or located problems, never a stack trace. */
class SpecFuzzTest {

    private static String demo() throws IOException {
        return Files.readString(Path.of("examples/classroom-demo.yaml"));
    }

    @Test
    void threeHundredMutationsNeverCrash() throws IOException {
        SpecFuzz.Counts c = SpecFuzz.run(demo(), 300, 20_240_601L);
        // both outcomes occur, so the test exercises both paths
        assertTrue(c.designs() > 0 && c.rejected() > 0, c.toString());
    }

    @Test
    @Tag("bench")
    void tenThousandMutationsNeverCrash() throws IOException {
        long start = System.nanoTime();
        SpecFuzz.Counts c = SpecFuzz.run(demo(), 10_000, 7L);
        System.out.printf(java.util.Locale.ROOT, "fuzz: 10000 cases, %d designs, %d rejected, %.1f ms/case%n",
                c.designs(), c.rejected(), (System.nanoTime() - start) / 1e6 / 10_000);
        assertTrue(c.designs() + c.rejected() == 10_000);
    }
}
