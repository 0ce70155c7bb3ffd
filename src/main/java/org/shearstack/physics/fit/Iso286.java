package org.shearstack.physics.fit;

import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * ISO 286-1 limits for holes and shafts up to 80 mm, grades IT5–IT11, from tabulated data (see
 * {@code iso286.txt}). Supported: shafts f, g, h, j, js, k, m, n, p; holes F, G, H, J (IT6, IT7), JS, K, M, N
 * (to IT8), P (to IT7). Anything else is refused with a clear message rather than guessed.
 */
public final class Iso286 {

    private static final Iso286Table TABLE = Iso286Table.load();
    private static final Pattern CLASS = Pattern.compile("([A-Za-z]{1,2})(\\d{1,2})");

    private Iso286() {
    }

    /** Standard tolerance IT (µm) of a grade at a nominal size. */
    public static double standardToleranceMicrometres(int grade, double nominalMm) {
        double[] row = TABLE.it.get(grade);
        if (row == null) {
            throw new IllegalArgumentException("IT grade " + grade + " not tabulated (IT5 to IT11 are)");
        }
        return row[TABLE.rangeIndex(nominalMm)];
    }

    /**
     * The tolerance zone of a class such as "H7" (hole, upper-case letter) or "k5" (shaft, lower-case) at a
     * nominal size.
     */
    public static ToleranceZone zone(double nominalMm, String toleranceClass) {
        Matcher m = CLASS.matcher(toleranceClass.strip());
        if (!m.matches()) {
            throw new IllegalArgumentException("tolerance class: expected a letter code and a grade such as H7 or k5,"
                    + " found '" + toleranceClass + "'");
        }
        String letters = m.group(1);
        int grade = Integer.parseInt(m.group(2));
        boolean hole = Character.isUpperCase(letters.charAt(0));
        if (!(letters.equals(letters.toUpperCase(Locale.ROOT)) || letters.equals(letters.toLowerCase(Locale.ROOT)))) {
            throw new IllegalArgumentException("tolerance class '" + toleranceClass + "' mixes upper and lower case");
        }
        double[] dev = hole ? hole(letters, grade, nominalMm) : shaft(letters, grade, nominalMm);
        return new ToleranceZone(nominalMm, letters + grade, hole, dev[0], dev[1]);
    }

    private static double[] shaft(String letter, int grade, double size) {
        int i = TABLE.rangeIndex(size);
        double it = standardToleranceMicrometres(grade, size);
        if (TABLE.shaftEs.containsKey(letter)) {
            double es = TABLE.shaftEs.get(letter)[i];
            return new double[] {es, es - it};
        }
        switch (letter) {
            case "js":
                return new double[] {it / 2, -it / 2};
            case "j": {
                double[] row = TABLE.shaftEi.get("j" + grade);
                if (row == null) {
                    throw new IllegalArgumentException("shaft j" + grade + " not tabulated (j5, j6, j7 are)");
                }
                return new double[] {row[i] + it, row[i]};
            }
            case "k": {
                double ei = grade >= 4 && grade <= 7 ? TABLE.shaftEi.get("k")[i] : 0;
                return new double[] {ei + it, ei};
            }
            default: {
                double[] row = TABLE.shaftEi.get(letter);
                if (row == null) {
                    throw new IllegalArgumentException("shaft deviation '" + letter + "' not tabulated (f, g, h, j, js,"
                            + " k, m, n, p are)");
                }
                return new double[] {row[i] + it, row[i]};
            }
        }
    }

    private static double[] hole(String letter, int grade, double size) {
        int i = TABLE.rangeIndex(size);
        double it = standardToleranceMicrometres(grade, size);
        switch (letter) {
            case "F", "G", "H": {
                // Mirror rule for holes A...H: EI = -es of the same-letter shaft.
                double ei = -TABLE.shaftEs.get(letter.toLowerCase(Locale.ROOT))[i];
                return new double[] {ei + it, ei};
            }
            case "JS":
                return new double[] {it / 2, -it / 2};
            case "J": {
                double[][] pairs = TABLE.jHole.get(grade);
                if (pairs == null) {
                    throw new IllegalArgumentException("hole J" + grade + " not tabulated (J6, J7 are)");
                }
                return pairs[i].clone();
            }
            case "K", "M", "N", "P": {
                int maxGrade = letter.equals("P") ? 7 : 8;
                if (grade > maxGrade) {
                    throw new IllegalArgumentException("hole " + letter + grade + " not supported (the special rule"
                            + " covers " + letter + " up to IT" + maxGrade + ")");
                }
                // Special rule: ES = -ei(same-letter shaft) + Delta; no Delta up to 3 mm.
                double ei = TABLE.shaftEi.get(letter.toLowerCase(Locale.ROOT))[i];
                double d = i == 0 ? 0 : TABLE.delta.get(grade)[i];
                double es = -ei + d;
                return new double[] {es, es - it};
            }
            default:
                throw new IllegalArgumentException("hole deviation '" + letter + "' not tabulated (F, G, H, J, JS, K,"
                        + " M, N, P are)");
        }
    }
}
