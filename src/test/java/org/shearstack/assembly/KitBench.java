package org.shearstack.assembly;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.shearstack.geom.GeometryContext;
import org.shearstack.geom.LayeredSolid;
import org.shearstack.geom.Mesh;
import org.shearstack.geom.MeshCheck;
import org.shearstack.io.kit.KitWriter;
import org.shearstack.part.DesignValues;
import org.shearstack.part.Dims;
import org.shearstack.rules.geometry.TestDesigns;

/**
 * Benchmark (not a test): times the demo kit phase by phase in a cold JVM and then warm. Run with
 * {@code java -cp target/classes:target/test-classes:DEPS org.shearstack.assembly.KitBench [runs] [chord] [detail]}.
 */
public final class KitBench {

    public static void main(String[] args) throws Exception {
        int runs = args.length > 0 ? Integer.parseInt(args[0]) : 1;
        double chord = args.length > 1 ? Double.parseDouble(args[1]) : 0.05;
        boolean detail = args.length > 2 && args[2].equals("detail");
        GeometryContext ctx = GeometryContext.withChordTolerance(chord);
        long t0 = System.nanoTime();
        DesignValues v = TestDesigns.demo();
        say("resolve (GEO rules)", t0);
        for (int r = 0; r < runs; r++) {
            System.out.println("run " + (r + 1));
            long t = System.nanoTime();
            Dims d = Dims.of(v);
            List<LayeredSolid> solids = new ArrayList<>();
            for (PartDef p : detail ? Layout.parts(d) : List.<PartDef>of()) {
                long a = System.nanoTime();
                LayeredSolid s = p.recipe().build(d, ctx);
                long b = System.nanoTime();
                Mesh m = s.toMesh(ctx);
                long c = System.nanoTime();
                MeshCheck.validate(m);
                long e = System.nanoTime();
                solids.add(s);
                System.out.printf(Locale.ROOT, "  %-24s slabs %3d  build %6.1f  mesh %6.1f  check %6.1f ms  (%d tri)%n",
                        p.name(), s.slabs().size(), (b - a) / 1e6, (c - b) / 1e6, (e - c) / 1e6, m.triangleCount());
            }
            say("  parts sequential", t);
            long k = System.nanoTime();
            Kit kit = Kit.build("demo", v, ctx);
            say("  Kit.build (parallel)", k);
            kit.findings().stream().filter(f -> f.severity() != org.shearstack.check.Severity.OK)
                    .forEach(f -> System.out.println("  finding " + f.code() + " " + f.message()));
            Path out = Files.createTempDirectory("kitbench");
            long w = System.nanoTime();
            KitWriter.write(kit, out.resolve("kit"));
            say("  KitWriter.write", w);
            say("  run total", t);
        }
        say("all", t0);
    }

    private static void say(String what, long since) {
        System.out.printf(Locale.ROOT, "%-28s %8.1f ms wall, process CPU so far %8.1f ms%n", what,
                (System.nanoTime() - since) / 1e6, cpuMs());
    }

    /** CPU time of the whole process (every thread, JIT and GC included), ms: the figure that counts on a busy machine. */
    static double cpuMs() {
        var os = java.lang.management.ManagementFactory.getOperatingSystemMXBean();
        return os instanceof com.sun.management.OperatingSystemMXBean sun ? sun.getProcessCpuTime() / 1e6 : Double.NaN;
    }
}
