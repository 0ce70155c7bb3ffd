package org.shearstack.rules.sizing;

import org.shearstack.design.ResolvedDesign;
import org.shearstack.rules.Key;
import org.shearstack.rules.RuleInputs;

/** Read access shared by rule inputs and a resolved design, so one builder serves both. */
interface Values {

    double get(Key key);

    String text(Key key);

    boolean has(Key key);

    static Values of(RuleInputs in) {
        return new Values() {
            @Override
            public double get(Key key) {
                return in.get(key);
            }

            @Override
            public String text(Key key) {
                return in.text(key);
            }

            @Override
            public boolean has(Key key) {
                return in.has(key);
            }
        };
    }

    static Values of(ResolvedDesign design) {
        return new Values() {
            @Override
            public double get(Key key) {
                return design.get(key);
            }

            @Override
            public String text(Key key) {
                return design.text(key);
            }

            @Override
            public boolean has(Key key) {
                return design.has(key);
            }
        };
    }
}
