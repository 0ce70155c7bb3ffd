package org.shearstack.assembly;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;

import org.shearstack.check.Finding;
import org.shearstack.check.Findings;
import org.shearstack.check.Severity;
import org.shearstack.geom.Bounds2;

/**
 * Lays every printed copy out on the printer's bed in print orientation: shelf packing of the footprints'
 * bounding boxes (tallest first, then by name), a spacing between parts and to the bed's edge, as many
 * plates as needed. A part whose footprint does not fit the bed is a FAIL finding (PLATE-TOO-LARGE) and is
 * left off, never overlapped.
 */
public final class PrintPlates {

    /** One copy on a plate: its footprint's lower-left corner moves to (x, y). */
    public record Item(String part, int copy, double xMm, double yMm, Bounds2 footprint) {

        /** Translation that moves the part from its own frame to the plate. */
        public double dxMm() {
            return xMm - footprint.minXMm();
        }

        public double dyMm() {
            return yMm - footprint.minYMm();
        }
    }

    public record Plate(int number, List<Item> items) {
        public Plate {
            items = List.copyOf(items);
        }
    }

    public record Result(List<Plate> plates, List<Finding> findings) {
    }

    /** One footprint to place, with how many copies. */
    public record Footprint(String part, int count, Bounds2 bounds) {
    }

    private PrintPlates() {
    }

    public static Result pack(List<Footprint> parts, double bedXMm, double bedYMm, double spacingMm) {
        List<Finding> findings = new ArrayList<>();
        List<Footprint> fit = new ArrayList<>();
        for (Footprint f : parts) {
            double w = f.bounds().widthMm() + 2 * spacingMm;
            double h = f.bounds().heightMm() + 2 * spacingMm;
            if (w > bedXMm || h > bedYMm) {
                findings.add(Findings.of("PLATE-TOO-LARGE", Severity.FAIL,
                        String.format(Locale.ROOT, "%s needs %.1f × %.1f mm with margins; the bed is %.1f × %.1f mm",
                                f.part(), w, h, bedXMm, bedYMm),
                        Math.max(w / bedXMm, h / bedYMm), 1, "", 1 / Math.max(w / bedXMm, h / bedYMm), f.part(),
                        "footprint", "use a printer with a larger bed or a smaller rotor"));
            } else {
                fit.add(f);
            }
        }
        fit.sort(Comparator.comparingDouble((Footprint f) -> -f.bounds().heightMm()).thenComparing(Footprint::part));
        List<Plate> plates = new ArrayList<>();
        List<Item> current = new ArrayList<>();
        double x = spacingMm;
        double y = spacingMm;
        double shelf = 0;
        for (Footprint f : fit) {
            for (int c = 1; c <= f.count(); c++) {
                double w = f.bounds().widthMm();
                double h = f.bounds().heightMm();
                if (x + w + spacingMm > bedXMm) {
                    x = spacingMm;
                    y += shelf + spacingMm;
                    shelf = 0;
                }
                if (y + h + spacingMm > bedYMm) {
                    plates.add(new Plate(plates.size() + 1, current));
                    current = new ArrayList<>();
                    x = spacingMm;
                    y = spacingMm;
                    shelf = 0;
                }
                current.add(new Item(f.part(), c, x, y, f.bounds()));
                x += w + spacingMm;
                shelf = Math.max(shelf, h);
            }
        }
        if (!current.isEmpty()) {
            plates.add(new Plate(plates.size() + 1, current));
        }
        return new Result(List.copyOf(plates), List.copyOf(findings));
    }
}
