package org.shearstack.family;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.lang.management.ManagementFactory;
import java.nio.file.Path;
import java.util.Locale;
import java.util.StringJoiner;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shearstack.cli.Main;

/**
 * Benchmark, not a test of speed: the wall and process CPU time of a 20-variant family with meshes and a
 * 2 000-variant check-only sweep of the demo, through the command line. Excluded from the default build (tag
 * "bench"); run with {@code mvn -B test -Dtest=FamilyBench -Dsurefire.excludedGroups= -Dgroups=bench}. Sizes can
 * be lowered with -Dfamily.bench.meshes=N and -Dfamily.bench.sweep=N (the sweep is rounded to whole diameters
 * times 2 filaments times 10 pressures).
 */
@Tag("bench")
class FamilyBench {

    @TempDir
    Path tmp;

    @Test
    void twentyWithMeshesAndTwoThousandCheckOnly() throws Exception {
        int meshes = Integer.getInteger("family.bench.meshes", 20);
        int sweep = Integer.getInteger("family.bench.sweep", 2000);
        // warm-up: one small check-only family so that class loading and the JIT do not count
        run("warm-up", "--check-only", "--vary", "rotor.diameter=70mm,90mm", "-o", tmp.resolve("w").toString());

        StringJoiner d = new StringJoiner(",");
        for (int i = 0; i < meshes; i++) {
            d.add((60 + 5 * i) + "mm");
        }
        run(meshes + " variants with meshes", "--vary", "rotor.diameter=" + d, "-o", tmp.resolve("m").toString());

        int diameters = Math.max(1, sweep / 20);
        StringJoiner sd = new StringJoiner(",");
        for (int i = 0; i < diameters; i++) {
            sd.add((50 + i) + "mm");
        }
        StringJoiner p = new StringJoiner(",");
        for (int i = 0; i < 10; i++) {
            p.add(String.format(Locale.ROOT, "%.1fbar", 2 + 0.4 * i));
        }
        run(diameters * 20 + " variants check-only", "--check-only", "--vary", "rotor.diameter=" + sd,
                "--vary", "filament=pla,petg", "--vary", "supply.pressure=" + p, "-o", tmp.resolve("s").toString());
    }

    private static void run(String label, String... options) throws Exception {
        String[] args = new String[options.length + 2];
        args[0] = "family";
        args[1] = "examples/classroom-demo.yaml";
        System.arraycopy(options, 0, args, 2, options.length);
        com.sun.management.OperatingSystemMXBean os =
                (com.sun.management.OperatingSystemMXBean) ManagementFactory.getOperatingSystemMXBean();
        double load = os.getSystemLoadAverage();
        long cpu = os.getProcessCpuTime();
        long start = System.nanoTime();
        StringWriter out = new StringWriter();
        int code = Main.run(args, new PrintWriter(out), new PrintWriter(new StringWriter()));
        double wall = (System.nanoTime() - start) / 1e9;
        double cpuS = (os.getProcessCpuTime() - cpu) / 1e9;
        String summary = out.toString().lines().findFirst().orElse("");
        System.out.printf(Locale.ROOT, "BENCH family %s: %.1f s wall, %.1f s process CPU, %d cores, load average"
                + " %.1f before, exit %d; %s%n", label, wall, cpuS, Runtime.getRuntime().availableProcessors(), load,
                code, summary);
        if (code == 1 || code == 2) {
            throw new AssertionError("family failed: " + out);
        }
    }
}
