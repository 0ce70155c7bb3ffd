package org.shearstack.profile;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.shearstack.spec.Problem;

/** Hardware tables: bearings, fasteners, seals, ports. Filled from profiles/ (see {@link Profiles}). */
public final class Hardware {

    private Hardware() {
    }

    static Hardware load(Optional<Path> userDir, List<Problem> problems) {
        return new Hardware();
    }
}
