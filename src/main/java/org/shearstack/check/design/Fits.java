package org.shearstack.check.design;

import java.util.List;
import org.shearstack.check.Check;
import org.shearstack.check.DesignValues;
import org.shearstack.check.Finding;
import org.shearstack.check.fit.FitCheck;
import org.shearstack.design.ResolvedDesign;
import org.shearstack.physics.fit.PrintProcess;

/**
 * FIT-* checks on a resolved design, from the modelled (CAD) sizes the geometry rules chose and the printer's
 * compensation and scatter. The ISO 286 intent for a metal housing is H7 (general solid housings, standards.md
 * §2.5); a bought metal shaft is taken as h6 (ground rod, from memory).
 */
public final class Fits implements Check {

    @Override
    public String code() {
        return "FIT-BEARING-SEAT";
    }

    @Override
    public List<String> codes() {
        return List.of("FIT-BEARING-SEAT", "FIT-BEARING-JOURNAL", "FIT-SCREW-HOLE", "FIT-INSERT-PILOT", "FIT-NUT-POCKET",
                "FIT-DISC-BORE");
    }

    @Override
    public List<Finding> run(ResolvedDesign design) {
        DesignValues v = new DesignValues(design);
        String bearing = v.needText("bearing.designation");
        double d = v.need("bearing.bore");
        double od = v.need("bearing.outside-diameter");
        double seat = v.need("bearing-seat.diameter");
        double hole = v.need("print.hole-compensation");
        double outer = v.need("print.outer-compensation");
        double scatter = v.need("printer.compensation-scatter");
        String screw = v.needText("fasteners.size");
        String anchor = v.text("fasteners.anchor");
        boolean metal = v.text("rotor.shaft").equals("metal");
        double journal = v.optional("shaft.journal-diameter");
        double hubAf = v.optional("hub.hex-across-flats");
        double boreAf = v.optional("disc.bore-across-flats");
        if (!v.complete()) {
            return List.of(v.notChecked(code(), "fits"));
        }
        PrintProcess pp = new PrintProcess(hole, outer, scatter);
        double odMean = od + org.shearstack.physics.bearing.RingTolerance.outsideLowerDeviationMicrometres(od) / 2000.0;
        double seatInterference = odMean - (seat - hole);
        double boreMean = d + org.shearstack.physics.bearing.RingTolerance.boreLowerDeviationMicrometres(d) / 2000.0;
        double journalInterference = Double.isNaN(journal) ? 0 : (journal + outer) - boreMean;
        double hubTarget = Double.isNaN(hubAf) ? Double.NaN : hubAf + outer;
        double boreClearance = Double.isNaN(hubAf) || Double.isNaN(boreAf) ? 0 : (boreAf - hole) - hubTarget;
        return FitCheck.run(new FitCheck.Inputs(bearing, d, od, "H7", seatInterference, metal ? "h6" : null,
                journalInterference, pp, screw, anchor.isEmpty() ? "heat-set" : anchor,
                Double.isNaN(boreAf) ? Double.NaN : hubTarget, boreClearance));
    }
}
