package org.shearstack.assembly;

import java.util.ArrayList;
import java.util.List;

import org.shearstack.part.Coupling;
import org.shearstack.part.Dims;
import org.shearstack.part.EndCover;
import org.shearstack.part.EndSpacer;
import org.shearstack.part.GeneratorBracket;
import org.shearstack.part.HousingRing;
import org.shearstack.part.HubShaft;
import org.shearstack.part.NozzleInsert;
import org.shearstack.part.RotorDisc;
import org.shearstack.part.SensorTarget;
import org.shearstack.part.Spacer;

/**
 * Which parts a design has and where every copy sits in the assembly frame (Z along the shaft, z = 0 at the
 * free cover's inner face; the axial layout is in {@link Dims}).
 */
public final class Layout {

    /** One copy of a part in the assembly. */
    public record Instance(String part, Placement placement) {
    }

    private Layout() {
    }

    public static List<PartDef> parts(Dims d) {
        List<PartDef> p = new ArrayList<>();
        int ports = d.portCount();
        int bolts = d.boltCount();
        if (d.integralSpacers()) {
            p.add(new PartDef("rotor-disc-with-spacer", "rotor", true, 1 + ports, (x, c) -> RotorDisc.solid(x, c, true)));
        } else {
            p.add(new PartDef("spacer", "spacer", true, 1, Spacer::solid));
        }
        p.add(new PartDef("rotor-disc", "rotor", true, 1 + ports, (x, c) -> RotorDisc.solid(x, c, false)));
        p.add(new PartDef("end-spacer", "spacer", true, 1, EndSpacer::solid));
        if (d.metalShaft()) {
            p.add(new PartDef("hub-sleeve", "shaft", true, 1, HubShaft::sleeve));
        } else {
            p.add(new PartDef("hub-shaft", "shaft", true, d.shaftBore() > 0 ? 1 : 0, HubShaft::solid));
        }
        p.add(new PartDef("housing-ring", "housing", false, d.nozzleInsert() ? 1 + bolts : 3 + bolts,
                HousingRing::solid));
        if (d.nozzleInsert()) {
            p.add(new PartDef("nozzle-insert", "nozzle", false, 1, NozzleInsert::solid));
        }
        int anchorHoles = d.anchor().equals("heat-set") ? 0 : bolts;
        p.add(new PartDef("cover-free", "cover", false, 1 + d.coverExhaustCount() + 1 + anchorHoles,
                (x, c) -> EndCover.solid(x, c, EndCover.Side.FREE)));
        p.add(new PartDef("cover-drive", "cover", false, 1 + d.coverExhaustCount() + bolts,
                (x, c) -> EndCover.solid(x, c, EndCover.Side.DRIVE)));
        p.add(new PartDef("sensor-target", "target", true, 1, SensorTarget::solid));
        if (d.generator()) {
            p.add(new PartDef("coupling-hub-turbine", "coupling", true, 1, Coupling::turbineHub));
            p.add(new PartDef("coupling-disc", "coupling", true, 0, Coupling::centreDisc));
            p.add(new PartDef("coupling-hub-generator", "coupling", true, 1, Coupling::generatorHub));
            p.add(new PartDef("generator-bracket", "bracket", false, GeneratorBracket.genus(d),
                    GeneratorBracket::solid));
        }
        return List.copyOf(p);
    }

    public static List<Instance> instances(Dims d) {
        List<Instance> out = new ArrayList<>();
        double z = d.packZ0();
        for (int i = 0; i < d.discs(); i++) {
            boolean last = i == d.discs() - 1;
            out.add(new Instance(d.integralSpacers() && !last ? "rotor-disc-with-spacer" : "rotor-disc", Placement.at(z)));
            z += d.discThickness();
            if (!last) {
                if (!d.integralSpacers()) {
                    out.add(new Instance("spacer", Placement.at(z)));
                }
                z += d.spacerThickness();
            }
        }
        // end spacers: printed wide face down; the free one turns over so its land faces the free bearing
        out.add(new Instance("end-spacer", Placement.flippedAt(d.packZ0())));
        out.add(new Instance("end-spacer", Placement.at(d.packZ1())));
        out.add(new Instance(d.metalShaft() ? "hub-sleeve" : "hub-shaft",
                Placement.at(d.metalShaft() ? d.packZ0() : d.shaftZ0())));
        out.add(new Instance("housing-ring", Placement.at(0)));
        if (d.nozzleInsert()) {
            out.add(new Instance("nozzle-insert", Placement.at(0)));
        }
        out.add(new Instance("cover-free", Placement.at(-d.coverThickness())));
        // the drive cover prints inner face up; in the assembly its inner face looks down onto the ring.
        // A half turn about X mirrors y, so the plenum (on +x) and the symmetric bolt circle stay in place.
        out.add(new Instance("cover-drive", Placement.flippedAt(d.chamberDepth() + d.coverThickness())));
        out.add(new Instance("sensor-target", Placement.at(-d.coverThickness() - 0.5 - d.targetThickness())));
        if (d.generator()) {
            double c0 = d.couplingZ0();
            out.add(new Instance("coupling-hub-turbine", Placement.at(c0)));
            double disc0 = c0 + d.couplingHub() + 0.5;
            out.add(new Instance("coupling-disc", Placement.at(disc0)));
            double genTop = disc0 + d.couplingDisc() + 0.5 + d.couplingHub();
            out.add(new Instance("coupling-hub-generator", Placement.flippedAt(genTop).rotated(90)));
            out.add(new Instance("generator-bracket", Placement.at(d.driveCoverTop())));
        }
        return List.copyOf(out);
    }
}
