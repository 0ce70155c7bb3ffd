package org.shearstack.physics.rotor;

import java.util.Locale;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/**
 * Benchmark, not a test of speed: times a full 60-speed map (runaway search included) of the demo design after
 * warm-up and prints the figure. Excluded from the default build (tag "bench"); run with
 * {@code mvn -B test -Dtest=MapBenchmarkTest -Dsurefire.excludedGroups= -Dgroups=bench}.
 */
@Tag("bench")
class MapBenchmarkTest {

    @Test
    void sixtySpeedMap() {
        TurbineModel model = DemoDesigns.demo();
        double sink = 0;
        for (int i = 0; i < 30; i++) {
            sink += model.curve(60).peakPower().shaftPowerW();
        }
        int runs = 50;
        java.lang.management.ThreadMXBean threads = java.lang.management.ManagementFactory.getThreadMXBean();
        long cpu = threads.getCurrentThreadCpuTime();
        long start = System.nanoTime();
        for (int i = 0; i < runs; i++) {
            sink += model.curve(60).peakPower().shaftPowerW();
        }
        double curveMs = (System.nanoTime() - start) / 1e6 / runs;
        double curveCpuMs = (threads.getCurrentThreadCpuTime() - cpu) / 1e6 / runs;
        cpu = threads.getCurrentThreadCpuTime();
        start = System.nanoTime();
        for (int i = 0; i < 10; i++) {
            sink += model.map(60).runawayUpperBoundRadPerS();
        }
        double bandMs = (System.nanoTime() - start) / 1e6 / 10;
        double bandCpuMs = (threads.getCurrentThreadCpuTime() - cpu) / 1e6 / 10;
        System.out.printf(Locale.ROOT, "BENCH 60-speed curve (with runaway search): %.2f ms wall, %.2f ms thread CPU;"
                + " map with band (3 curves): %.2f ms wall, %.2f ms thread CPU (checksum %.3f)%n", curveMs, curveCpuMs,
                bandMs, bandCpuMs, sink);
    }
}
