package org.shearstack.cli;

import java.io.PrintWriter;
import java.util.Locale;
import org.shearstack.profile.Bearing;
import org.shearstack.profile.Fastener;
import org.shearstack.profile.Gland;
import org.shearstack.profile.Hardware;
import org.shearstack.profile.Port;
import org.shearstack.spec.QuantityFormat;

/** Prints the hardware tables for {@code profiles}. */
final class HardwareText {

    private HardwareText() {
    }

    static void summary(Hardware h, PrintWriter out) {
        out.println("bearings:  " + String.join(", ", h.bearings().bearings().stream().map(Bearing::designation).toList()));
        out.println("fasteners: " + String.join(", ", h.fasteners().sizes().stream().map(Fastener::size).toList()));
        out.println("seals:     o-ring " + String.join(", ", h.seals().glands().stream()
                .map(g -> QuantityFormat.number(g.crossSectionMm())).toList()) + " mm");
        out.println("ports:     " + String.join(", ", h.ports().ports().stream().map(Port::port).toList())
                + ", push-in <tube OD>");
    }

    static void show(Hardware h, String kind, String name, PrintWriter out) {
        switch (kind) {
            case "bearings" -> bearings(h, name, out);
            case "fasteners" -> fasteners(h, name, out);
            case "seals" -> seals(h, out);
            default -> ports(h, out);
        }
    }

    private static void bearings(Hardware h, String name, PrintWriter out) {
        var t = h.bearings();
        out.println(t.name() + "  (" + t.source() + "; " + t.standard() + ")");
        out.println("  speed factor n·dm limit " + QuantityFormat.number(t.speedFactorLimitRpmMm()) + " rpm·mm: "
                + t.speedFactorSource());
        out.println("  designation   d      D      B   r_s min   (mm)");
        for (Bearing b : t.bearings()) {
            if (name == null || b.designation().equals(name)) {
                out.println(String.format(Locale.ROOT, "  %-10s %5s %6s %6s %7s", b.designation(),
                        QuantityFormat.number(b.boreMm()), QuantityFormat.number(b.outerMm()),
                        QuantityFormat.number(b.widthMm()), QuantityFormat.number(b.chamferMinMm())));
            }
        }
        if (name != null && t.find(name).isEmpty()) {
            throw ProfilesCommand.unknown("bearing", name,
                    String.join(", ", t.bearings().stream().map(Bearing::designation).toList()));
        }
    }

    private static void fasteners(Hardware h, String name, PrintWriter out) {
        var t = h.fasteners();
        out.println(t.name() + "  (" + t.source() + "; " + t.standard() + ")");
        out.println("  size  clearance f/m/c   head d x k   nut s x m   insert pilot x depth   tap drill   (mm)");
        for (Fastener f : t.sizes()) {
            if (name == null || f.size().equals(name)) {
                out.println(String.format(Locale.ROOT, "  %-5s %s/%s/%s   %s x %s   %s x %s   %s x %s   %s", f.size(),
                        n(f.clearanceFineMm()), n(f.clearanceMediumMm()), n(f.clearanceCoarseMm()), n(f.headDiameterMm()),
                        n(f.headHeightMm()), n(f.nutFlatsMm()), n(f.nutThicknessMm()), n(f.insertPilotMm()),
                        n(f.insertDepthMm()), n(f.tapDrillMm())));
            }
        }
        if (name != null && t.find(name).isEmpty()) {
            throw ProfilesCommand.unknown("fastener size", name,
                    String.join(", ", t.sizes().stream().map(Fastener::size).toList()));
        }
        out.println("  standard lengths: " + String.join(", ", t.lengthsMm().stream().map(HardwareText::n).toList())
                + " mm (" + t.lengthsSource() + ")");
    }

    private static void seals(Hardware h, PrintWriter out) {
        var t = h.seals();
        out.println(t.name() + "  (" + t.source() + "; " + t.standard() + ")");
        out.println("  cross-section  depth  width  squeeze  fill   (mm)");
        for (Gland g : t.glands()) {
            out.println(String.format(Locale.ROOT, "  %-13s %6s %6s %6.1f %% %5.1f %%", n(g.crossSectionMm()),
                    n(g.depthMm()), n(g.widthMm()), 100 * g.squeeze(), 100 * g.fill()));
        }
    }

    private static void ports(Hardware h, PrintWriter out) {
        var t = h.ports();
        out.println(t.name() + "  (" + t.source() + "; " + t.standard() + ")");
        for (Port p : t.ports()) {
            out.println(String.format(Locale.ROOT, "  %-5s major %s pitch %s pilot %s spot face %s depth %s (%s)",
                    p.port(), n(p.threadMajorMm()), n(p.pitchMm()), n(p.pilotMm()), n(p.spotFaceMm()), n(p.depthMm()),
                    p.source()));
        }
        out.println("  push-in: pilot = tube OD + " + n(t.pushInClearanceMm()) + " mm, depth = "
                + n(t.pushInDepthFactor()) + " x tube OD (common practice)");
    }

    private static String n(double v) {
        return QuantityFormat.number(v);
    }
}
