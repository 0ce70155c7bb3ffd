package org.shearstack.rules;

import java.util.List;
import org.shearstack.profile.Bearing;
import org.shearstack.profile.Fastener;
import org.shearstack.profile.Hardware;
import org.shearstack.spec.Problem;
import org.shearstack.spec.QuantityFormat;
import org.shearstack.spec.Spec;
import org.shearstack.spec.Suggest;

/** Checks that hardware named in a spec exists in the loaded tables; problems list the known names. */
final class HardwareNames {

    /** Cross-sections closer than this are the same ring (1.78 vs 1.8 are distinct rows in the table). */
    private static final double CROSS_SECTION_MATCH_MM = 0.005;

    private HardwareNames() {
    }

    static void check(Spec spec, Hardware h, List<Problem> problems) {
        List<String> bearings = h.bearings().bearings().stream().map(Bearing::designation).toList();
        spec.text("bearings").filter(b -> !bearings.contains(b)).ifPresent(b -> problems.add(spec.problemAt("bearings",
                "auto or a known bearing (" + String.join(", ", bearings) + ")", "\"" + b + "\"", hint(b, bearings))));
        List<String> sizes = h.fasteners().sizes().stream().map(Fastener::size).toList();
        for (String key : List.of("fasteners.size", "generator.mount-screws")) {
            spec.text(key).filter(s -> !sizes.contains(s)).ifPresent(s -> problems.add(spec.problemAt(key,
                    "a known screw size (" + String.join(", ", sizes) + ")", "\"" + s + "\"", "")));
        }
        if (spec.text("seal").filter("o-ring"::equals).isPresent()) {
            double cs = spec.quantity("seal.size").orElseThrow().value();
            if (h.seals().find(cs, CROSS_SECTION_MATCH_MM).isEmpty()) {
                List<String> known = h.seals().glands().stream().map(g -> QuantityFormat.number(g.crossSectionMm()))
                        .toList();
                problems.add(spec.problemAt("seal.size", "an O-ring cross-section with a gland in the table ("
                        + String.join(", ", known) + " mm)", QuantityFormat.number(cs) + " mm", ""));
            }
        }
    }

    private static String hint(String found, List<String> known) {
        return Suggest.nearest(found, known).map(s -> "did you mean " + s + "?").orElse("");
    }
}
