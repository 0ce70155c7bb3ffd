package org.shearstack.check.design;

import org.shearstack.check.safety.RunawayModel;

/** Access to the per-run cache of runaway answers. */
public final class Caching {

    private Caching() {
    }

    /** A model that remembers its answers (for one check run). */
    public static RunawayModel wrap(RunawayModel model) {
        return model instanceof CachedRunaway ? model : new CachedRunaway(model);
    }
}
