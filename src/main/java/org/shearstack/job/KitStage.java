package org.shearstack.job;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.shearstack.assembly.BomRow;
import org.shearstack.assembly.Kit;
import org.shearstack.assembly.KitPart;
import org.shearstack.assembly.PrintPlates;
import org.shearstack.design.ResolvedDesign;
import org.shearstack.io.report.BomLine;
import org.shearstack.io.report.KeyDimension;
import org.shearstack.io.report.PartData;
import org.shearstack.io.report.PlateData;
import org.shearstack.rules.Key;

/** Turns a built kit into the report's parts, bill of materials and plates. */
final class KitStage {

    /** The design keys shown beside each part's drawing (those the design has), by part name. */
    static final Map<String, List<String[]>> PART_KEYS = Map.ofEntries(
            Map.entry("rotor-disc", List.of(k("rotor.diameter", "outside diameter"), k("disc.thickness", "thickness"),
                    k("disc.bore-across-flats", "drive bore across flats"), k("disc.port-count", "exhaust ports"),
                    k("disc.port-diameter", "port diameter"), k("disc.port-circle-diameter", "port circle"))),
            Map.entry("rotor-disc-with-spacer", List.of(k("rotor.diameter", "outside diameter"),
                    k("disc.thickness", "disc thickness"), k("spacer.thickness", "boss height"))),
            Map.entry("spacer", List.of(k("spacer.outside-diameter", "outside diameter"),
                    k("spacer.thickness", "thickness"))),
            Map.entry("end-spacer", List.of(k("end-spacer.bore-diameter", "bore"),
                    k("end-spacer.land-diameter", "land diameter"), k("end-spacer.land-height", "land height"))),
            Map.entry("hub-sleeve", List.of(k("hub.hex-across-flats", "hex across flats"),
                    k("hub.sleeve-bore-diameter", "bore"))),
            Map.entry("hub-shaft", List.of(k("hub.hex-across-flats", "hex across flats"),
                    k("shaft.journal-diameter", "journal diameter"))),
            Map.entry("housing-ring", List.of(k("housing.chamber-diameter", "chamber diameter"),
                    k("housing.chamber-depth", "chamber depth"), k("housing.outside-diameter", "outside diameter"),
                    k("housing.bolt-circle-diameter", "bolt circle"), k("housing.bolt-count", "bolts"))),
            Map.entry("nozzle-insert", List.of(k("nozzle.throat-width", "throat width"),
                    k("nozzle.slot-height", "slot height"), k("nozzle.throat-area", "throat area"))),
            Map.entry("cover-free", List.of(k("cover.thickness", "thickness"),
                    k("bearing-seat.diameter", "bearing seat"), k("bearing-seat.depth", "seat depth"))),
            Map.entry("cover-drive", List.of(k("cover.thickness", "thickness"),
                    k("bearing-seat.diameter", "bearing seat"), k("bearing-seat.depth", "seat depth"))),
            Map.entry("sensor-target", List.of(k("target.outside-diameter", "outside diameter"),
                    k("target.thickness", "thickness"))),
            Map.entry("coupling-hub-turbine", List.of(k("coupling.outside-diameter", "outside diameter"),
                    k("coupling.turbine-bore", "bore"))),
            Map.entry("coupling-disc", List.of(k("coupling.outside-diameter", "outside diameter"),
                    k("coupling.disc-thickness", "thickness"))),
            Map.entry("coupling-hub-generator", List.of(k("coupling.outside-diameter", "outside diameter"),
                    k("coupling.generator-bore", "bore"))),
            Map.entry("generator-bracket", List.of(k("bracket.seat-diameter", "motor seat"),
                    k("bracket.standoff-height", "standoff height"))));

    private KitStage() {
    }

    private static String[] k(String key, String label) {
        return new String[] {key, label};
    }

    static List<PartData> parts(Kit kit, ResolvedDesign design) {
        String material = design.key("filament.name").flatMap(design::findText).orElse("filament");
        List<PartData> out = new ArrayList<>();
        for (KitPart p : kit.printedParts()) {
            BomRow row = kit.bom().stream().filter(r -> r.item().equals(p.name())).findFirst().orElse(null);
            double mass = row == null ? Double.NaN : row.massG();
            List<KeyDimension> dims = new ArrayList<>();
            for (String[] kd : PART_KEYS.getOrDefault(p.name(), List.of())) {
                design.key(kd[0]).ifPresent(key -> dims.add(dimension(design, key, kd[1])));
            }
            out.add(new PartData(p.name(), p.count(), material, mass, p.solid().volumeMm3(),
                    "as in parts/" + p.name() + ".stl (Z up, lowest face on the bed)",
                    p.solid(), dims));
        }
        return List.copyOf(out);
    }

    static List<BomLine> bom(Kit kit) {
        List<BomLine> out = new ArrayList<>();
        for (BomRow r : kit.bom()) {
            boolean printed = r.kind().equals("printed");
            out.add(new BomLine(r.item(), r.kind(), r.count(), r.description(),
                    printed ? r.massG() * r.count() : Double.NaN, printed ? r.printTimeS() * r.count() / 60 : Double.NaN));
        }
        return List.copyOf(out);
    }

    static List<PlateData> plates(Kit kit) {
        List<PlateData> out = new ArrayList<>();
        for (PrintPlates.Plate p : kit.plates()) {
            out.add(new PlateData("plates/plate-" + p.number() + ".3mf",
                    p.items().stream().map(i -> i.part() + " #" + i.copy()).toList()));
        }
        return List.copyOf(out);
    }

    private static KeyDimension dimension(ResolvedDesign d, Key k, String label) {
        boolean text = d.findText(k).isPresent();
        return new KeyDimension(k.name(), label, text ? Double.NaN : d.get(k),
                text ? "" : k.dimension().canonicalUnit(), d.display(k));
    }
}
