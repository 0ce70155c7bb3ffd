package org.shearstack.physics.fit;

/**
 * How a printer reproduces modelled sizes, on diameter (mm): holes print smaller than modelled by
 * {@code holeCompensationMm}, outer features larger by {@code outerCompensationMm}, and any printed size
 * scatters by ± {@code scatterMm} around that expectation. Compensations come from the printer profile or the
 * user's measurements; a typical desktop printer holds about ± 0.1–0.2 mm (common practice, standards.md §7).
 */
public record PrintProcess(double holeCompensationMm, double outerCompensationMm, double scatterMm) {

    public PrintProcess {
        if (!(Math.abs(holeCompensationMm) < 2 && Math.abs(outerCompensationMm) < 2 && scatterMm >= 0
                && scatterMm < 2)) {
            throw new IllegalArgumentException("print compensations must be under 2 mm and scatter in [0, 2) mm,"
                    + " found hole " + holeCompensationMm + ", outer " + outerCompensationMm + ", scatter "
                    + scatterMm);
        }
    }

    /** CAD diameter of a hole meant to print at {@code targetMm}. */
    public double cadHoleMm(double targetMm) {
        return targetMm + holeCompensationMm;
    }

    /** CAD diameter of an outer feature meant to print at {@code targetMm}. */
    public double cadOuterMm(double targetMm) {
        return targetMm - outerCompensationMm;
    }

    /** Expected printed range of a hole modelled at {@code cadMm}. */
    public SizeRange printedHole(double cadMm) {
        return SizeRange.centred(cadMm - holeCompensationMm, scatterMm);
    }

    /** Expected printed range of an outer feature modelled at {@code cadMm}. */
    public SizeRange printedOuter(double cadMm) {
        return SizeRange.centred(cadMm + outerCompensationMm, scatterMm);
    }
}
