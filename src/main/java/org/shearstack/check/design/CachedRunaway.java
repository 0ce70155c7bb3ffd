package org.shearstack.check.design;

import java.util.HashMap;
import java.util.Map;
import org.shearstack.check.safety.RunawayModel;

/** Remembers the answers of a slow runaway model for one check run (per instance, never shared). */
final class CachedRunaway implements RunawayModel {

    private final RunawayModel model;
    private final Map<Variant, Double> answers = new HashMap<>();

    CachedRunaway(RunawayModel model) {
        this.model = model;
    }

    @Override
    public double runawayRadPerS(Variant variant) {
        return answers.computeIfAbsent(variant, model::runawayRadPerS);
    }

    @Override
    public String description() {
        return model.description();
    }
}
