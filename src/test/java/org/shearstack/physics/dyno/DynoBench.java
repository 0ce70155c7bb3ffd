package org.shearstack.physics.dyno;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Locale;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.shearstack.io.benchlog.BenchLog;
import org.shearstack.io.benchlog.BenchLogOptions;
import org.shearstack.io.benchlog.BenchLogReader;
import org.shearstack.io.dyno.DynoReport;
import org.shearstack.io.dyno.DynoReportWriter;

/** Benchmark (excluded from the default test run): reading, analysing and rendering the example log. */
@Tag("bench")
class DynoBench {
    @Test
    void exampleLog() throws Exception {
        Path log = Path.of("examples", "bench-run-demo.csv");
        int rounds = 20;
        long read = 0;
        long analyse = 0;
        long render = 0;
        for (int k = 0; k < rounds + 5; k++) {
            long t0 = System.nanoTime();
            BenchLog b = BenchLogReader.read(log, BenchLogOptions.FROM_HEADER);
            long t1 = System.nanoTime();
            DynoResult r = DynoAnalyzer.analyze(b.log(), DynoInputs.of(1.2e-4));
            long t2 = System.nanoTime();
            DynoReportWriter.render(new DynoReport(r, "x", "", ""));
            long t3 = System.nanoTime();
            if (k >= 5) {
                read += t1 - t0;
                analyse += t2 - t1;
                render += t3 - t2;
            }
        }
        System.out.printf(Locale.ROOT, "dyno bench (1791 samples): read %.1f ms, analyse %.1f ms, render %.1f ms%n",
                read / 1e6 / rounds, analyse / 1e6 / rounds, render / 1e6 / rounds);
        assertTrue(analyse > 0);
    }
}
