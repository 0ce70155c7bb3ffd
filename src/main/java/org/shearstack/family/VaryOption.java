package org.shearstack.family;

import java.util.ArrayList;
import java.util.List;
import org.shearstack.spec.BadInputException;
import org.shearstack.spec.FamilySection;
import org.shearstack.spec.Problem;

/**
 * Reads {@code --vary KEY=V1,V2,...} options. Problems name the option as written, with the column of the
 * offending part ("--vary rotor.diamter=60mm:1:8: ...").
 */
public final class VaryOption {

    private VaryOption() {
    }

    /** The varied keys of the options, in order; throws {@link BadInputException} with every shape problem. */
    public static List<FamilySection.Vary> parse(List<String> options) {
        List<FamilySection.Vary> out = new ArrayList<>();
        List<Problem> problems = new ArrayList<>();
        for (String o : options) {
            String file = "--vary " + o;
            int eq = o.indexOf('=');
            String key = eq < 0 ? o.strip() : o.substring(0, eq).strip();
            if (eq <= 0 || key.isEmpty()) {
                problems.add(new Problem(file, 1, 1, key, "KEY=V1,V2,... e.g. rotor.diameter=60mm,80mm",
                        "\"" + o + "\"", ""));
                continue;
            }
            String list = o.substring(eq + 1);
            if (list.isBlank()) {
                problems.add(new Problem(file, 1, eq + 2, key, "at least one value after " + key + "=",
                        "nothing", ""));
                continue;
            }
            int keyColumn = 1 + (o.length() - o.stripLeading().length());
            out.add(new FamilySection.Vary(key, file, 1, keyColumn,
                    FamilySection.split(key, list, file, 1, eq + 2)));
        }
        if (!problems.isEmpty()) {
            throw new BadInputException(problems);
        }
        return out;
    }
}
