package org.shearstack.physics.fit;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.HashMap;
import java.util.Map;

/**
 * The ISO 286-1 data read from {@code iso286.txt} beside this class: size ranges, IT grades, shaft
 * fundamental deviations, the Δ values and the tabulated J holes. Immutable after loading.
 */
final class Iso286Table {

    private static final String RESOURCE = "iso286.txt";

    final double[] rangeLimitsMm;
    final Map<Integer, double[]> it = new HashMap<>();
    final Map<String, double[]> shaftEs = new HashMap<>();
    final Map<String, double[]> shaftEi = new HashMap<>();
    final Map<Integer, double[]> delta = new HashMap<>();
    final Map<Integer, double[][]> jHole = new HashMap<>();

    private Iso286Table(double[] rangeLimitsMm) {
        this.rangeLimitsMm = rangeLimitsMm;
    }

    static Iso286Table load() {
        try (InputStream in = Iso286Table.class.getResourceAsStream(RESOURCE)) {
            if (in == null) {
                throw new IllegalStateException("missing resource " + RESOURCE + " beside " + Iso286Table.class);
            }
            return parse(new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8)));
        } catch (IOException e) {
            throw new UncheckedIOException("reading " + RESOURCE, e);
        }
    }

    private static Iso286Table parse(BufferedReader reader) throws IOException {
        Iso286Table table = null;
        String line;
        int lineNo = 0;
        while ((line = reader.readLine()) != null) {
            lineNo++;
            String s = line.strip();
            if (s.isEmpty() || s.startsWith("#")) {
                continue;
            }
            String[] f = s.split("\\s+");
            try {
                if (f[0].equals("ranges")) {
                    table = new Iso286Table(numbers(f, 1));
                    continue;
                }
                if (table == null) {
                    throw new IllegalStateException("'ranges' must come first");
                }
                int n = table.rangeLimitsMm.length - 1;
                switch (f[0]) {
                    case "it" -> table.it.put(Integer.parseInt(f[1]), sized(numbers(f, 2), n));
                    case "es" -> table.shaftEs.put(f[1], sized(numbers(f, 2), n));
                    case "ei" -> table.shaftEi.put(f[1], sized(numbers(f, 2), n));
                    case "delta" -> table.delta.put(Integer.parseInt(f[1]), sized(numbers(f, 2), n));
                    case "J" -> {
                        double[][] pairs = new double[n][];
                        if (f.length - 2 != n) {
                            throw new IllegalStateException("expected " + n + " pairs, found " + (f.length - 2));
                        }
                        for (int i = 0; i < n; i++) {
                            String[] p = f[i + 2].split("/");
                            pairs[i] = new double[] {Double.parseDouble(p[0]), Double.parseDouble(p[1])};
                        }
                        table.jHole.put(Integer.parseInt(f[1]), pairs);
                    }
                    default -> throw new IllegalStateException("unknown keyword '" + f[0] + "'");
                }
            } catch (RuntimeException e) {
                throw new IllegalStateException(RESOURCE + " line " + lineNo + ": " + e.getMessage(), e);
            }
        }
        if (table == null) {
            throw new IllegalStateException(RESOURCE + ": no 'ranges' line");
        }
        return table;
    }

    private static double[] numbers(String[] f, int from) {
        return Arrays.stream(f, from, f.length).mapToDouble(Double::parseDouble).toArray();
    }

    private static double[] sized(double[] v, int n) {
        if (v.length != n) {
            throw new IllegalStateException("expected " + n + " values, found " + v.length);
        }
        return v;
    }

    /** Index of the size range holding a nominal size ("over ... up to and including"). */
    int rangeIndex(double sizeMm) {
        if (sizeMm > 0) {
            for (int i = 1; i < rangeLimitsMm.length; i++) {
                if (sizeMm <= rangeLimitsMm[i]) {
                    return i - 1;
                }
            }
        }
        throw new IllegalArgumentException("nominal size " + sizeMm + " mm outside the tabulated ISO 286 range (over 0"
                + " up to " + rangeLimitsMm[rangeLimitsMm.length - 1] + " mm)");
    }
}
