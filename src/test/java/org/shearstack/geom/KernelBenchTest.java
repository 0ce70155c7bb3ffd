package org.shearstack.geom;

import java.io.IOException;
import java.io.OutputStream;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.shearstack.io.mesh.StlWriter;
import org.shearstack.io.mesh.ThreeMfModel;
import org.shearstack.io.mesh.ThreeMfWriter;

/**
 * Benchmark, not a test: builds about a million triangles and reports triangles per second (build, STL, 3MF,
 * check) and bytes per triangle (mesh retained, peak heap during the build). Run with
 * {@code mvn -q test -Dtest=KernelBenchTest -Dsurefire.excludedGroups=none}. No assertions on time.
 */
@Tag("bench")
class KernelBenchTest {

    private final GeometryContext ctx = GeometryContext.standard();

    /** 200 slabs alternating between two ported discs (ports of different radii): every interface overlays. */
    LayeredSolid portedStack(int slabs) {
        Region disc = Region.disc(ctx, 0, 0, 80);
        Region small = disc.minus(Region.unionAll(ctx, ports(4.0)));
        Region large = disc.minus(Region.unionAll(ctx, ports(5.0)));
        LayeredSolid.Builder b = LayeredSolid.builder(ctx);
        for (int i = 0; i < slabs; i++) {
            b.slab(i * 0.25, (i + 1) * 0.25, i % 2 == 0 ? small : large);
        }
        return b.build();
    }

    private List<Region> ports(double d) {
        List<Region> out = new ArrayList<>();
        for (int k = 0; k < 24; k++) {
            double a = Math.toRadians(15 * k);
            out.add(Region.boreCircle(ctx, 28 * Math.cos(a), 28 * Math.sin(a), d));
        }
        return out;
    }

    @Test
    void portedStackMillionTriangles() throws IOException {
        run("ported stack, 200 alternating slabs", portedStack(200));
    }

    @Test
    void tallPlainStack() throws IOException {
        // wall-dominated: a thin ring with a lug crossing its outer edge on every other slab
        Region r = Region.annulus(ctx, 0, 0, 400, 380);
        Region lugged = r.union(Region.disc(ctx, 0, 201, 12));
        LayeredSolid.Builder b = LayeredSolid.builder(ctx);
        for (int i = 0; i < 600; i++) {
            b.slab(i * 0.25, (i + 1) * 0.25, i % 2 == 0 ? r : lugged);
        }
        run("ring stack, 600 slabs, a lug on every other slab", b.build());
    }

    private void run(String name, LayeredSolid solid) throws IOException {
        solid.toMesh(ctx); // warm-up
        System.gc();
        long before = usedHeap();
        resetPeaks();
        com.sun.management.OperatingSystemMXBean os =
                (com.sun.management.OperatingSystemMXBean) ManagementFactory.getOperatingSystemMXBean();
        long c0 = os.getProcessCpuTime();
        long t0 = System.nanoTime();
        Mesh mesh = solid.toMesh(ctx);
        long t1 = System.nanoTime();
        long c1 = os.getProcessCpuTime();
        long peak = peakHeap();
        System.gc();
        long retained = usedHeap() - before;
        int tris = mesh.triangleCount();
        long t2 = System.nanoTime();
        long c2 = os.getProcessCpuTime();
        StlWriter.write(mesh, name, OutputStream.nullOutputStream());
        long t3 = System.nanoTime();
        long c3 = os.getProcessCpuTime();
        ThreeMfModel model = ThreeMfModel.builder().build();
        ThreeMfModel.Builder mb = ThreeMfModel.builder();
        mb.item(mb.addMesh("bench", mesh, null), Transform.identity(), null);
        model = mb.build();
        ThreeMfWriter.write(model, OutputStream.nullOutputStream());
        long t4 = System.nanoTime();
        long c4 = os.getProcessCpuTime();
        MeshReport report = MeshCheck.validate(mesh);
        long t5 = System.nanoTime();
        System.out.printf(Locale.ROOT, "BENCH %s: %d triangles, %d vertices, valid %s%n", name, tris,
                mesh.vertexCount(), report.isValidSolid());
        System.out.printf(Locale.ROOT, "BENCH   build %.2f s = %.0f tri/s; STL %.3f s = %.0f tri/s; 3MF %.2f s = %.0f tri/s;"
                + " check %.2f s%n", sec(t1 - t0), tris / sec(t1 - t0), sec(t3 - t2), tris / sec(t3 - t2), sec(t4 - t3),
                tris / sec(t4 - t3), sec(t5 - t4));
        System.out.printf(Locale.ROOT, "BENCH   process CPU time (all threads incl. GC/JIT; per core, load-independent): build %.2f s = %.0f tri/s;"
                + " STL %.0f tri/s; 3MF %.0f tri/s%n", sec(c1 - c0), tris / sec(c1 - c0), tris / sec(c3 - c2),
                tris / sec(c4 - c3));
        System.out.printf(Locale.ROOT, "BENCH   mesh retained %.1f B/tri; peak heap during build %.1f B/tri%n",
                (double) retained / tris, (double) (peak - before) / tris);
    }

    private static double sec(long nanos) {
        return nanos / 1e9;
    }

    private static long usedHeap() {
        Runtime rt = Runtime.getRuntime();
        return rt.totalMemory() - rt.freeMemory();
    }

    private static void resetPeaks() {
        for (MemoryPoolMXBean p : ManagementFactory.getMemoryPoolMXBeans()) {
            if (p.getType() == MemoryType.HEAP) {
                p.resetPeakUsage();
            }
        }
    }

    private static long peakHeap() {
        long sum = 0;
        for (MemoryPoolMXBean p : ManagementFactory.getMemoryPoolMXBeans()) {
            if (p.getType() == MemoryType.HEAP) {
                sum += p.getPeakUsage().getUsed();
            }
        }
        return sum;
    }
}
