package org.shearstack.assembly;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.shearstack.part.DesignValues;
import org.shearstack.part.Dims;
import org.shearstack.part.HubShaft;
import org.shearstack.rules.ProfileKeys;

/**
 * The bill of materials: printed parts with volume, mass from the filament density and a print-time estimate
 * from the printer's volumetric flow (solid parts; a slicer's time with infill and travel will differ), and
 * the hardware with sizes and standards.
 */
public final class Bom {

    /** Filament density when the design has none: PETG ≈ 1270 kg/m³ (from memory), stated in the row. */
    static final double DEFAULT_DENSITY_KG_M3 = 1270;
    /** Volumetric flow when the design has none: 8 mm³/s, a cautious hobby-printer figure (common practice). */
    static final double DEFAULT_FLOW_MM3_S = 8;

    private Bom() {
    }

    static List<BomRow> rows(Dims d, List<KitPart> printed, DesignValues v) {
        double density = v.has(ProfileKeys.DENSITY) ? v.get(ProfileKeys.DENSITY) : DEFAULT_DENSITY_KG_M3;
        double flow = v.has(ProfileKeys.VOLUMETRIC_FLOW) ? v.get(ProfileKeys.VOLUMETRIC_FLOW) * 1e9 : DEFAULT_FLOW_MM3_S;
        List<BomRow> rows = new ArrayList<>();
        for (KitPart p : printed) {
            double vol = p.solid().volumeMm3();
            rows.add(new BomRow("printed", p.name(), p.count(), "solid, print orientation as in parts/" + p.name() + ".stl",
                    vol, vol * density * 1e-6, vol / flow));
        }
        rows.add(hw("bearing " + d.bearing(), 2, String.format(Locale.ROOT, "deep-groove ball bearing %s × %s × %s mm "
                + "(ISO 15), shielded", n(d.bearingBore()), n(d.bearingOutside()), n(d.bearingWidth()))));
        rows.add(hw("screw " + d.fastener() + " × " + n(d.boltLength()), d.boltCount(),
                "socket head cap screw ISO 4762 " + d.fastener() + " × " + n(d.boltLength()) + " mm"));
        switch (d.anchor()) {
            case "nut" -> rows.add(hw("nut " + d.fastener(), d.boltCount(), "hex nut ISO 4032 " + d.fastener()));
            case "tapped" -> rows.add(hw("tap " + d.fastener(), 1, "tap the free cover's pilots " + d.fastener()));
            default -> rows.add(hw("heat-set insert " + d.fastener(), d.boltCount(),
                    "threaded heat-set insert " + d.fastener() + ", about " + n(d.insertLength()) + " mm long"));
        }
        if (d.sealKind().equals("o-ring")) {
            // the ring the GEO-HOUSING-LAYOUT rule sized the groove for, as it chose it
            double cs = d.oRingCrossSection();
            rows.add(hw("o-ring " + d.oRing(), 2, String.format(Locale.ROOT,
                    "O-ring ID %s mm × CS %s mm, or %s mm of %s mm cord each", n(d.oRingInner()), n(cs),
                    n(d.cordLength()), n(cs))));
        } else if (d.sealKind().equals("gasket")) {
            rows.add(hw("gasket", 2, "flat gasket cut to the housing face, inside the bolt circle"));
        }
        rows.add(hw("inlet fitting " + d.portThread(), 1, "fitting with " + d.portThread()
                + " male thread and sealing washer; tap the inlet pilot " + d.portThread()));
        if (d.metalShaft()) {
            rows.add(hw("shaft Ø" + n(d.journal()), 1, String.format(Locale.ROOT,
                    "ground steel shaft Ø%s mm × %s mm with a %s mm flat at both ends", n(d.journal()),
                    n(HubShaft.metalShaftLength(d)), n(d.flatDepth()))));
        }
        if (d.generator()) {
            rows.add(hw("screw " + d.motorScrews() + " × " + n(d.bracketScrewLength()), 2,
                    "countersunk motor face screws (90°, e.g. ISO 7046-1) " + d.motorScrews()
                            + ", entered from the coupling side into the bracket's countersinks"));
            rows.add(hw("generator", 1, "cylindrical DC motor as in the spec"));
        }
        return List.copyOf(rows);
    }

    private static BomRow hw(String item, int count, String description) {
        return new BomRow("hardware", item, count, description, 0, 0, 0);
    }

    static String n(double v) {
        String s = String.format(Locale.ROOT, "%.2f", v);
        return s.contains(".") ? s.replaceAll("0+$", "").replaceAll("\\.$", "") : s;
    }
}
