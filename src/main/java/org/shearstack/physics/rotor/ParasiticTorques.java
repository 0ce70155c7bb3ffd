package org.shearstack.physics.rotor;

/**
 * Drag torques outside the gaps, each a named term (N·m, all resisting rotation).
 *
 * @param endFacesNm       outer faces of the pack against the covers (Daily &amp; Nece)
 * @param rimNm            disc rims against the housing bore
 * @param bearingLoadNm    bearing friction, load term
 * @param bearingSpeedNm   bearing friction, speed (lubricant) term
 * @param sealsNm          contact-seal drag
 */
public record ParasiticTorques(double endFacesNm, double rimNm, double bearingLoadNm, double bearingSpeedNm,
        double sealsNm) {

    public static final ParasiticTorques NONE = new ParasiticTorques(0, 0, 0, 0, 0);

    public double totalNm() {
        return endFacesNm + rimNm + bearingLoadNm + bearingSpeedNm + sealsNm;
    }
}
