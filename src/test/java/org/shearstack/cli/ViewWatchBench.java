package org.shearstack.cli;

import java.nio.file.Path;
import java.util.Arrays;
import java.util.Locale;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.shearstack.profile.Profiles;
import org.shearstack.view.SceneSource;
import org.shearstack.view.SceneSources;
import org.shearstack.view.ViewScene;

/**
 * Watch mode's reload of the demo spec through the whole design job (resolve, performance, safety, kit),
 * as the view command runs it. Measured, not asserted:
 * {@code mvn -q test -Dtest=ViewWatchBench -Dsurefire.excludedGroups=none}.
 */
@Tag("bench")
class ViewWatchBench {

    @Test
    void reloadDemoSpec() throws Exception {
        SceneSource source = SceneSources.forPath(Path.of("examples", "classroom-demo.yaml"), Profiles.shipped(),
                DesignViewScenes::of);
        ViewScene first = source.load();
        for (int i = 0; i < 3; i++) {
            source.load();
        }
        long[] nanos = new long[9];
        com.sun.management.OperatingSystemMXBean os = (com.sun.management.OperatingSystemMXBean)
                java.lang.management.ManagementFactory.getOperatingSystemMXBean();
        long cpuStart = os.getProcessCpuTime();
        for (int i = 0; i < nanos.length; i++) {
            long t = System.nanoTime();
            source.load();
            nanos[i] = System.nanoTime() - t;
        }
        double cpuMsPerReload = (os.getProcessCpuTime() - cpuStart) / 1e6 / nanos.length;
        Arrays.sort(nanos);
        int triangles = first.parts().stream().mapToInt(p -> p.mesh().triangleCount()).sum();
        System.out.println(String.format(Locale.ROOT, "BENCH reload classroom-demo (%d parts, %d triangles, %d findings):"
                + " median %.0f ms, min %.0f ms, max %.0f ms wall; %.0f ms process CPU per reload; load average %.1f",
                first.parts().size(), triangles, first.findings().size(), nanos[nanos.length / 2] / 1e6, nanos[0] / 1e6,
                nanos[nanos.length - 1] / 1e6, cpuMsPerReload, os.getSystemLoadAverage()));
    }
}
