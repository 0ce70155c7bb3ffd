package org.shearstack.design;

import java.util.HashSet;
import java.util.Set;
import org.shearstack.rules.Derivation;
import org.shearstack.rules.Key;

/** Renders a derivation tree as indented plain text; a value shown once is referred to afterwards. */
final class ExplainText {

    private ExplainText() {
    }

    static String tree(ResolvedDesign design, Key key) {
        StringBuilder b = new StringBuilder();
        node(design, key, "", new HashSet<>(), b);
        return b.toString();
    }

    private static void node(ResolvedDesign d, Key key, String indent, Set<String> shown, StringBuilder b) {
        if (!d.has(key)) {
            b.append(indent).append(key.name()).append(" = (absent)\n");
            return;
        }
        Derivation der = d.derivation(key);
        b.append(indent).append(key.name()).append(" = ").append(d.display(key))
                .append("   [").append(origin(der)).append("]\n");
        if (!shown.add(key.name())) {
            b.setLength(b.length() - 1);
            b.append(" (see above)\n");
            return;
        }
        String detail = indent + "    ";
        if (!der.formula().isEmpty()) {
            b.append(detail).append("how: ").append(der.formula()).append('\n');
        }
        if (!der.source().isEmpty()) {
            b.append(detail).append("source: ").append(der.source()).append('\n');
        }
        d.overridden(key).ifPresent(o -> b.append(detail).append("pinned over rule ").append(o.derivation().ruleId())
                .append(", which gives ").append(o.value()).append(" (").append(o.derivation().formula()).append(")\n"));
        for (Derivation.Input in : der.inputs()) {
            if (d.has(in.key())) {
                node(d, in.key(), indent + "  | ", shown, b);
            } else {
                b.append(indent).append("  | ").append(in.key().name()).append(" = ").append(in.value()).append('\n');
            }
        }
    }

    private static String origin(Derivation der) {
        return switch (der.origin()) {
            case RULE -> "rule " + der.ruleId();
            case PINNED -> "pinned in spec";
            case SPEC -> "spec";
            case PROFILE -> "profile " + der.ruleId();
            case DEFAULT -> "default";
            case CALIBRATED -> "calibrated " + der.ruleId();
        };
    }
}
