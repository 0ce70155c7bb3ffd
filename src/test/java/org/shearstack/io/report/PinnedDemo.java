package org.shearstack.io.report;

import java.nio.file.Path;
import java.util.Optional;
import org.shearstack.job.DesignJob;
import org.shearstack.job.DesignResult;
import org.shearstack.job.JobOptions;
import org.shearstack.profile.Profiles;
import org.shearstack.spec.Spec;
import org.shearstack.spec.SpecReader;

/**
 * The invented classroom scenario with its rotor sizes pinned (src/test/resources/report/pinned-demo.yaml), run
 * through the design job, so the report has a performance map, a burst check and derivations whatever the sizing
 * rules would choose.
 */
public final class PinnedDemo {

    public static final Path SPEC = Path.of("src/test/resources/report/pinned-demo.yaml");

    private PinnedDemo() {
    }

    public static DesignResult run(int mapPoints) {
        Spec spec = SpecReader.read(SPEC).orThrow();
        Profiles profiles = Profiles.load(Optional.empty());
        return DesignJob.run(spec, profiles, new JobOptions(false, false, mapPoints));
    }
}
