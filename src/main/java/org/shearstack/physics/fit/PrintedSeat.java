package org.shearstack.physics.fit;

/**
 * A printed seat for a bought part (bearing ring, metal shaft, insert): from the intended fit and the printer
 * to the CAD size, the expected printed size range and the resulting clearance/interference range.
 *
 * <p>The intent is a mean printed interference on diameter ({@code interferenceMm}, negative for a clearance):
 * a printed housing takes a bearing ring with 0–0.1 mm interference ("press" in the FDM design-rule pages
 * cited in standards.md §7, common practice). The seat is sized so that its expected printed size sits that far
 * from the mean size of the mating part.
 *
 * @param cadMm     size to model
 * @param printed   expected printed size range
 * @param mating    size range of the mating bought part
 * @param fit       resulting fit (printed seat against the mating part)
 */
public record PrintedSeat(double cadMm, SizeRange printed, SizeRange mating, Fit fit) {

    /** A printed hole (housing bore) around a bought external part such as a bearing outer ring. */
    public static PrintedSeat hole(ToleranceZone matingOuter, double interferenceMm, PrintProcess process) {
        SizeRange mating = matingOuter.range();
        double target = mating.meanMm() - interferenceMm;
        double cad = process.cadHoleMm(target);
        SizeRange printed = process.printedHole(cad);
        return new PrintedSeat(cad, printed, mating, Fit.between(printed, mating));
    }

    /** A printed shaft or journal inside a bought internal part such as a bearing bore. */
    public static PrintedSeat shaft(ToleranceZone matingInner, double interferenceMm, PrintProcess process) {
        SizeRange mating = matingInner.range();
        double target = mating.meanMm() + interferenceMm;
        double cad = process.cadOuterMm(target);
        SizeRange printed = process.printedOuter(cad);
        return new PrintedSeat(cad, printed, mating, Fit.between(mating, printed));
    }
}
