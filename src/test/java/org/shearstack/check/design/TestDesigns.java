package org.shearstack.check.design;

import static org.shearstack.spec.Dimension.*;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.shearstack.design.ResolvedDesign;
import org.shearstack.rules.Derivation;
import org.shearstack.rules.Key;
import org.shearstack.spec.Dimension;

/**
 * Resolved designs written by hand for the check tests: an invented scenario with the keys the geometry rules
 * write, PETG or PLA data from physics.md §4.3, a 608 bearing (standards.md B1).
 */
final class TestDesigns {

    private final Map<Key, Double> numbers = new HashMap<>();
    private final Map<Key, String> texts = new HashMap<>();

    TestDesigns n(String name, Dimension d, double v) {
        numbers.put(Key.of(name, d), v);
        return this;
    }

    TestDesigns t(String name, String v) {
        texts.put(Key.of(name, TEXT), v);
        return this;
    }

    TestDesigns without(String name) {
        numbers.keySet().removeIf(k -> k.name().equals(name));
        texts.keySet().removeIf(k -> k.name().equals(name));
        return this;
    }

    ResolvedDesign build() {
        Map<Key, Derivation> der = new HashMap<>();
        numbers.keySet().forEach(k -> der.put(k, spec(k)));
        texts.keySet().forEach(k -> der.put(k, spec(k)));
        return ResolvedDesign.of("test", "test.yaml", numbers, texts, der, Map.of());
    }

    private static Derivation spec(Key k) {
        return new Derivation(k, Derivation.Origin.SPEC, k.name(), List.of(), "test value", "test");
    }

    /** A 100 mm PETG rotor on a metal 8 mm shaft in 608 bearings, M3 heat-set screws. */
    static TestDesigns petg(double supplyBarG, double discDiameterMm) {
        double ambient = 101_325;
        return new TestDesigns()
                .n("supply.pressure", PRESSURE, ambient + supplyBarG * 1e5)
                .n("supply.ambient", PRESSURE, ambient)
                .n("supply.temperature", TEMPERATURE, 293.15)
                .n("targets.safety-factor", DIMENSIONLESS, 3)
                .n("rotor.diameter", LENGTH, discDiameterMm)
                .n("rotor.discs", COUNT, 8)
                .n("rotor.exhaust-diameter", LENGTH, 0.3 * discDiameterMm)
                .n("disc.thickness", LENGTH, 1.2)
                .n("spacer.thickness", LENGTH, 0.8)
                .n("spacer.outside-diameter", LENGTH, 0.25 * discDiameterMm)
                .n("disc.bore-across-flats", LENGTH, 10.3)
                .n("hub.hex-across-flats", LENGTH, 10.0)
                .n("disc.port-circle-diameter", LENGTH, 0.25 * discDiameterMm)
                .n("disc.port-diameter", LENGTH, 0.05 * discDiameterMm)
                .n("filament.density", DENSITY, 1270)
                .n("filament.poisson-ratio", DIMENSIONLESS, 0.38)
                .n("filament.elastic-modulus", STRESS, 2.0e9)
                .n("filament.tensile-strength-xy", STRESS, 44e6)
                .n("filament.tensile-strength-z", STRESS, 25e6)
                .n("filament.softening-temperature", TEMPERATURE, 348.15)
                .n("housing.chamber-diameter", LENGTH, discDiameterMm + 3)
                .n("housing.chamber-depth", LENGTH, 8 * 1.2 + 7 * 0.8 + 2 * 0.6)
                .n("housing.end-play", LENGTH, 0.6)
                .n("housing.wall", LENGTH, 6)
                .n("cover.thickness", LENGTH, 8)
                .n("housing.bolt-circle-diameter", LENGTH, discDiameterMm + 12)
                .n("housing.bolt-count", COUNT, 16)
                .n("seal.groove-inner-diameter", LENGTH, discDiameterMm + 4)
                .n("seal.groove-width", LENGTH, 2.1)
                .n("bolt.anchor-hole-diameter", LENGTH, 4.2)
                .n("bolt.anchor-depth", LENGTH, 6)
                .t("fasteners.size", "M3")
                .t("fasteners.anchor", "heat-set")
                .t("rotor.shaft", "metal")
                .n("rotor.shaft.diameter", LENGTH, 8)
                .n("shaft.journal-diameter", LENGTH, 8)
                .t("rotor.balance-grade", "G6.3")
                .t("bearing.designation", "608")
                .n("bearing.bore", LENGTH, 8)
                .n("bearing.outside-diameter", LENGTH, 22)
                .n("bearing-seat.diameter", LENGTH, 22 + 0.2 - 0.05)
                .n("print.hole-compensation", LENGTH, 0.2)
                .n("print.outer-compensation", LENGTH, 0.1)
                .n("printer.compensation-scatter", LENGTH, 0.05);
    }
}
