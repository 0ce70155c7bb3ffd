package org.shearstack.rules.geometry;

import static org.shearstack.rules.geometry.GeoKeys.*;

import java.util.SplittableRandom;

import org.shearstack.part.DesignValues;

/** Designs for part and kit tests, resolved by the GEO- rules over pinned inputs (scenarios of our own). */
public final class TestDesigns {

    private TestDesigns() {
    }

    /** The workshop demo: 80 mm discs, 0.4 mm nozzle, 608 bearings, M3 heat-set, 2.62 mm O-ring, generator. */
    public static RuleHarness demoInputs() {
        return GeometryRulesTest.demo().text(NOZZLE_INSERT, "false").text(ROTOR_SPACERS, "separate");
    }

    public static DesignValues resolve(RuleHarness inputs) {
        RuleHarness h = inputs.run(GeometryRulesTest.rules());
        return DesignValues.of(h::get, h.texts::get, k -> h.numbers.containsKey(k) || h.texts.containsKey(k));
    }

    public static DesignValues demo() {
        return resolve(demoInputs());
    }

    /** Smallest allowed rotor (20 mm, 2 discs), bare turbine, nut anchors, no seal, M5 port. */
    public static DesignValues smallest() {
        RuleHarness h = demoInputs().put(ROTOR_DIAMETER, 20).put(ROTOR_DISCS, 2).put(ROTOR_EXHAUST_DIAMETER, 8)
                .put(NOZZLE_THROAT_AREA, 0.8).text(SEAL, "none").text(FASTENER_ANCHOR, "nut")
                .text(FASTENER_SIZE, "M2.5").text(INLET_PORT, "M5");
        h.numbers.remove(GENERATOR_BODY_DIAMETER);
        return resolve(h);
    }

    /** Largest allowed rotor (300 mm, 60 discs), metal 25 mm shaft, tapped M5, insert nozzle, 0.6 mm nozzle. */
    public static DesignValues largest() {
        return resolve(demoInputs().put(ROTOR_DIAMETER, 300).put(ROTOR_DISCS, 60).put(ROTOR_EXHAUST_DIAMETER, 150)
                .put(NOZZLE_DIAMETER, 0.6).put(LINE_WIDTH, 0.68).put(LAYER_HEIGHT, 0.3).put(ROTOR_DISC_THICKNESS, 1.2)
                .put(ROTOR_GAP, 1.2).put(NOZZLE_THROAT_AREA, 60).text(ROTOR_SHAFT, "metal").put(ROTOR_SHAFT_DIAMETER, 25)
                .text(FASTENER_SIZE, "M5").text(FASTENER_ANCHOR, "tapped").text(SEAL, "o-ring").put(SEAL_SIZE, 3.53)
                .text(INLET_PORT, "G1/4").text(NOZZLE_INSERT, "true").text(ROTOR_SPACERS, "integral"));
    }

    /** A seeded random design inside the allowed ranges. */
    public static DesignValues random(long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        double dia = 30 + r.nextDouble() * 170;
        int discs = 2 + r.nextInt(20);
        double exhaust = dia * (0.3 + 0.3 * r.nextDouble());
        RuleHarness h = demoInputs().put(ROTOR_DIAMETER, dia).put(ROTOR_DISCS, discs).put(ROTOR_EXHAUST_DIAMETER, exhaust)
                .put(ROTOR_DISC_THICKNESS, 0.5 + r.nextDouble()).put(ROTOR_GAP, 0.3 + r.nextDouble())
                .put(NOZZLE_THROAT_AREA, 1 + r.nextDouble() * 10)
                .put(HOLE_COMPENSATION, r.nextDouble() * 0.3)
                .text(FASTENER_ANCHOR, new String[] {"heat-set", "nut", "tapped"}[r.nextInt(3)])
                .text(NOZZLE_INSERT, r.nextBoolean() ? "true" : "false")
                .text(ROTOR_SPACERS, r.nextBoolean() ? "integral" : "separate")
                .text(NOZZLE_KIND, "converging-diverging").put(NOZZLE_EXIT_AREA, 12);
        if (r.nextBoolean()) {
            h.numbers.remove(GENERATOR_BODY_DIAMETER);
        }
        return resolve(h);
    }
}
