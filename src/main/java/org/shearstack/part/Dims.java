package org.shearstack.part;

import static org.shearstack.rules.geometry.GeoKeys.*;

import java.util.Locale;

import org.shearstack.rules.geometry.GeoKeys;

/**
 * Every dimension the part recipes use, read once from the resolved design (mm). The axial layout of the
 * assembly frame (Z up along the shaft, z = 0 at the free cover's inner face) is derived here, in one place,
 * so parts and placements agree.
 */
public record Dims(
        int discs, double discDiameter, double discThickness, double spacerThickness, double packHeight,
        double endPlay, double chamberDepth, double chamberDiameter, double radialClearance,
        String bearing, double bearingBore, double bearingOutside, double bearingWidth,
        double seatDiameter, double seatDepth, double leadInDiameter, double leadInDepth, double lipHole,
        double journal, double shaftBore, double flatDepth, double hexAcrossFlats, double discBoreAcrossFlats,
        double sleeveBore, boolean metalShaft, boolean integralSpacers,
        int portCount, double portDiameter, double portCircleDiameter, double spacerOutside,
        double endSpacerBore, double endSpacerLand, double endSpacerLandHeight,
        double coverExhaustInner, double coverExhaustOuter, int coverExhaustCount, double coverExhaustWeb,
        double wall, double plenumDiameter, double plenumRadius, String sealKind, double grooveDepth,
        double grooveWidth, double grooveInner, double oRingInner, double cordLength, String oRing,
        double oRingCrossSection, double insertLength,
        String fastener, String anchor, double boltClearance, double boltHead, double anchorHole, double anchorDepth,
        double nutAcrossFlats, double boltCircle, int boltCount, double housingOutside, double boltLength,
        String portThread, double portPilot, double portPilotDepth, double portFeed, double coverThickness,
        double nozzleHeight, double throatWidth, double exitWidth, double inletWidth, double nozzleAngleDeg,
        boolean nozzleInsert, double insertFit,
        boolean generator, double couplingDiameter, double couplingHub, double tongueHeight, double tongueWidth,
        double couplingDisc, double turbineBore, double generatorBore, double couplingClearance,
        double bracketStandoff, double bracketSeat, double bracketWall, double bracketPlate, double bracketCup,
        double bracketScrewHole, double bracketCentreHole, double bracketScrewLength, double bracketCountersink,
        double generatorHubDiameter, double motorSpacing,
        String motorScrews,
        double targetDiameter, double targetThickness, double stubLength, double driveLength,
        double layerHeight, double lineWidth, double holeCompensation) {

    /** Reads every dimension; the design must have run the GEO- rules. */
    public static Dims of(DesignValues v) {
        boolean gen = v.has(GENERATOR_BODY_DIAMETER);
        String shaft = v.has(ROTOR_SHAFT) ? v.text(ROTOR_SHAFT) : "printed";
        String spacers = v.has(ROTOR_SPACERS) ? v.text(ROTOR_SPACERS) : "separate";
        String insert = v.has(GeoKeys.NOZZLE_INSERT) ? v.text(GeoKeys.NOZZLE_INSERT) : "false";
        return new Dims((int) Math.round(v.get(ROTOR_DISCS)), v.get(ROTOR_DIAMETER), v.get(DISC_PRINTED_THICKNESS),
                v.get(SPACER_THICKNESS), v.get(PACK_HEIGHT), v.get(END_PLAY), v.get(CHAMBER_DEPTH),
                v.get(CHAMBER_DIAMETER), v.get(RADIAL_CLEARANCE),
                v.text(BEARING_DESIGNATION), v.get(BEARING_BORE), v.get(BEARING_OUTSIDE), v.get(BEARING_WIDTH),
                v.get(SEAT_DIAMETER), v.get(SEAT_DEPTH), v.get(SEAT_LEAD_IN_DIAMETER), v.get(SEAT_LEAD_IN_DEPTH),
                v.get(LIP_HOLE_DIAMETER), v.get(JOURNAL_DIAMETER), v.get(SHAFT_BORE), v.get(SHAFT_FLAT_DEPTH),
                v.get(HEX_ACROSS_FLATS), v.get(DISC_BORE_ACROSS_FLATS), v.get(HUB_SLEEVE_BORE),
                shaft.trim().toLowerCase(Locale.ROOT).startsWith("metal"),
                spacers.trim().equalsIgnoreCase("integral"),
                (int) Math.round(v.get(PORT_COUNT)), v.get(PORT_DIAMETER), v.get(PORT_CIRCLE_DIAMETER),
                v.get(SPACER_OUTSIDE), v.get(END_SPACER_BORE), v.get(END_SPACER_LAND), v.get(END_SPACER_LAND_HEIGHT),
                v.get(COVER_EXHAUST_INNER), v.get(COVER_EXHAUST_OUTER), (int) Math.round(v.get(COVER_EXHAUST_COUNT)),
                v.get(COVER_EXHAUST_WEB), v.get(WALL), v.get(PLENUM_DIAMETER), v.get(PLENUM_RADIUS),
                v.text(SEAL_KIND), v.get(GROOVE_DEPTH), v.get(GROOVE_WIDTH), v.get(GROOVE_INNER_DIAMETER),
                v.get(ORING_INNER_DIAMETER), v.get(CORD_LENGTH), v.text(ORING_DESIGNATION), v.get(ORING_CROSS_SECTION),
                v.get(INSERT_LENGTH),
                v.has(FASTENER_SIZE) ? v.text(FASTENER_SIZE) : "M3",
                v.has(FASTENER_ANCHOR) ? v.text(FASTENER_ANCHOR).trim().toLowerCase(Locale.ROOT) : "heat-set",
                v.get(BOLT_CLEARANCE), v.get(BOLT_HEAD_DIAMETER), v.get(BOLT_ANCHOR_HOLE), v.get(BOLT_ANCHOR_DEPTH),
                v.get(BOLT_NUT_ACROSS_FLATS), v.get(BOLT_CIRCLE), (int) Math.round(v.get(BOLT_COUNT)),
                v.get(HOUSING_OUTSIDE), v.get(BOLT_LENGTH),
                v.text(PORT_THREAD), v.get(PORT_PILOT_DIAMETER), v.get(PORT_PILOT_DEPTH), v.get(PORT_FEED_DIAMETER),
                v.get(COVER_THICKNESS),
                v.get(NOZZLE_HEIGHT), v.get(NOZZLE_THROAT_WIDTH), v.get(NOZZLE_EXIT_WIDTH), v.get(NOZZLE_INLET_WIDTH),
                v.get(NOZZLE_ANGLE), insert.trim().equalsIgnoreCase("true"), v.get(NOZZLE_INSERT_FIT),
                gen, v.get(COUPLING_DIAMETER), v.get(COUPLING_HUB_THICKNESS), v.get(COUPLING_TONGUE_HEIGHT),
                v.get(COUPLING_TONGUE_WIDTH), v.get(COUPLING_DISC_THICKNESS), v.get(COUPLING_TURBINE_BORE),
                v.get(COUPLING_GENERATOR_BORE), v.get(COUPLING_CLEARANCE),
                v.get(BRACKET_STANDOFF), v.get(BRACKET_SEAT_DIAMETER), v.get(BRACKET_WALL), v.get(BRACKET_PLATE),
                v.get(BRACKET_CUP_HEIGHT), v.get(BRACKET_SCREW_HOLE), v.get(BRACKET_CENTRE_HOLE), v.get(BRACKET_SCREW_LENGTH),
                v.get(BRACKET_COUNTERSINK), v.get(COUPLING_GENERATOR_HUB_DIAMETER),
                gen ? v.get(GENERATOR_MOUNT_SPACING) : 0, gen ? v.text(GENERATOR_MOUNT_SCREWS) : "",
                v.get(TARGET_DIAMETER), v.get(TARGET_THICKNESS), v.get(STUB_LENGTH), v.get(DRIVE_LENGTH),
                v.get(LAYER_HEIGHT), v.get(LINE_WIDTH), v.get(HOLE_COMPENSATION));
    }

    // ------------------------------------------------------------------ axial layout, assembly frame

    /** Bottom of the free bearing (it sits on the free cover's lip). */
    public double freeBearingZ0() {
        return -seatDepth;
    }

    /** Top face of the free bearing: where the free end spacer starts. */
    public double freeBearingZ1() {
        return -seatDepth + bearingWidth;
    }

    /** Bottom face of the lowest disc. */
    public double packZ0() {
        return endPlay;
    }

    public double packZ1() {
        return endPlay + packHeight;
    }

    public double driveBearingZ0() {
        return chamberDepth + seatDepth - bearingWidth;
    }

    public double driveBearingZ1() {
        return chamberDepth + seatDepth;
    }

    /** Outer face of the drive cover. */
    public double driveCoverTop() {
        return chamberDepth + coverThickness;
    }

    public double shaftZ0() {
        return -coverThickness - stubLength;
    }

    public double shaftZ1() {
        return driveCoverTop() + driveLength;
    }

    /** Thickness of each end spacer: from the bearing's face to the outer disc. */
    public double endSpacerThickness() {
        return endPlay + seatDepth - bearingWidth;
    }

    /** Hexagon circumradius of the disc bore (corner radius). */
    public double hexCornerRadius() {
        return discBoreAcrossFlats / Math.sqrt(3);
    }

    /** Radius where the exhaust ports start: an end spacer stays inside it. */
    public double portInnerRadius() {
        return portCircleDiameter / 2 - portDiameter / 2;
    }

    /** The bottom of the coupling's turbine hub (a running gap above the drive cover). */
    public double couplingZ0() {
        return driveCoverTop() + 0.5;
    }
}
