package org.shearstack.spec;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Checks between pinned values that are each fine alone but contradict each other. Each problem is located
 * at the second key of the pair and names the first.
 */
final class SpecConsistency {

    private SpecConsistency() {
    }

    static List<Problem> check(Spec spec, double ambientPa) {
        List<Problem> p = new ArrayList<>();
        smaller(spec, p, "rotor.exhaust-diameter", "rotor.diameter", "the disc diameter");
        smaller(spec, p, "rotor.diameter", "housing.chamber-diameter", "the housing chamber diameter");
        smaller(spec, p, "rotor.shaft.diameter", "rotor.exhaust-diameter", "the exhaust diameter");
        smaller(spec, p, "generator.shaft-diameter", "generator.body-diameter", "the generator body diameter");
        smaller(spec, p, "supply.blowdown.to", "supply.blowdown.from", "the start pressure supply.blowdown.from");
        long ways = List.of("supply.conductance", "supply.free-air-flow", "supply.blowdown.tank").stream()
                .filter(k -> spec.entry(k).isPresent()).count();
        if (ways > 1) {
            Optional<String> second = List.of("supply.blowdown.tank", "supply.free-air-flow", "supply.conductance")
                    .stream().filter(k -> spec.entry(k).isPresent()).findFirst();
            p.add(spec.problemAt(second.orElseThrow(), "one of supply.conductance, supply.free-air-flow or "
                    + "supply.blowdown", ways + " of them", "give only one way to describe the supply"));
        }
        blowdownComplete(spec, p);
        return p;
    }

    /** smallKey must be strictly smaller than largeKey when both are pinned. */
    private static void smaller(Spec spec, List<Problem> p, String smallKey, String largeKey, String largeWords) {
        Optional<Quantity> small = spec.quantity(smallKey);
        Optional<Quantity> large = spec.quantity(largeKey);
        if (small.isPresent() && large.isPresent() && small.get().value() >= large.get().value()) {
            String smallWritten = spec.entry(smallKey).map(SpecEntry::written).orElse("");
            String largeWritten = spec.entry(largeKey).map(SpecEntry::written).orElse("");
            p.add(spec.problemAt(smallKey, "less than " + largeWords + " (" + largeKey + ": " + largeWritten + ")",
                    QuantityParser.quoted(smallWritten), "the two pinned values contradict each other"));
        }
    }

    private static void blowdownComplete(Spec spec, List<Problem> p) {
        List<String> parts = List.of("supply.blowdown.tank", "supply.blowdown.from", "supply.blowdown.to",
                "supply.blowdown.time");
        List<String> present = parts.stream().filter(k -> spec.entry(k).isPresent()).toList();
        if (!present.isEmpty() && present.size() < parts.size()) {
            for (String k : parts) {
                if (spec.entry(k).isEmpty()) {
                    SpecEntry near = spec.entry(present.get(0)).orElseThrow();
                    p.add(new Problem(spec.sourceFile(), near.line(), near.column(), k,
                            "tank, from, to and time for a blow-down test", "no " + k, ""));
                }
            }
        }
    }
}
