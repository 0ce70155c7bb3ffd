package org.shearstack.physics.bearing;

/**
 * Speed factors of rolling bearings and their common-practice limits for grease lubrication (physics.md §7).
 *
 * <p>n·d_m is rpm × mean diameter (d + D)/2 in mm; dn is rpm × bore in mm. Limits:
 * <ul>
 *   <li>n·d_m up to 150 000: general-purpose NLGI 2 grease; 150 000–400 000 needs high-speed grease or oil;
 *       beyond 400 000 oil jet, precision bearings, special cages (PTI glossary, common practice).</li>
 *   <li>Contact-sealed (2RS) bearings: dn ≤ 150 000, the lip seal limits them (FK bearing-unit page, common
 *       practice); shielded (ZZ) and open bearings run faster (from memory).</li>
 * </ul>
 * Always compare with the catalogue limiting speed of the actual bearing.
 */
public final class BearingSpeed {

    /** n·d_m up to which ordinary grease is fine (common practice, PTI glossary). */
    public static final double GENERAL_GREASE_NDM = 150_000;
    /** n·d_m beyond which grease lubrication is out of the question (common practice, PTI glossary). */
    public static final double HIGH_SPEED_GREASE_NDM = 400_000;
    /** dn limit for contact-sealed bearings (common practice, FK bearing-unit page). */
    public static final double CONTACT_SEAL_DN = 150_000;

    private BearingSpeed() {
    }

    /** Speed factor n·d_m (rpm·mm). */
    public static double ndm(double speedRpm, double boreMm, double outsideDiameterMm) {
        return speedRpm * (boreMm + outsideDiameterMm) / 2;
    }

    /** Speed factor dn (rpm·mm). */
    public static double dn(double speedRpm, double boreMm) {
        return speedRpm * boreMm;
    }

    /** How a bearing is closed. */
    public enum Closure { OPEN, SHIELDED, CONTACT_SEALED }

    /**
     * The highest speed (rpm) at which the common-practice limit is met: n·d_m ≤ 400 000 for open and shielded
     * bearings with high-speed grease, and additionally dn ≤ 150 000 for contact-sealed ones.
     */
    public static double limitRpm(double boreMm, double outsideDiameterMm, Closure closure) {
        double dm = (boreMm + outsideDiameterMm) / 2;
        double byNdm = HIGH_SPEED_GREASE_NDM / dm;
        return closure == Closure.CONTACT_SEALED ? Math.min(byNdm, CONTACT_SEAL_DN / boreMm) : byNdm;
    }

    /** The speed (rpm) up to which general-purpose grease suffices (n·d_m ≤ 150 000). */
    public static double generalGreaseRpm(double boreMm, double outsideDiameterMm) {
        return GENERAL_GREASE_NDM / ((boreMm + outsideDiameterMm) / 2);
    }
}
