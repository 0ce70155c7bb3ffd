package org.shearstack.rules.geometry;

import static org.shearstack.spec.Dimension.ANGLE;
import static org.shearstack.spec.Dimension.ANGULAR_SPEED;
import static org.shearstack.spec.Dimension.AREA;
import static org.shearstack.spec.Dimension.COUNT;
import static org.shearstack.spec.Dimension.LENGTH;
import static org.shearstack.spec.Dimension.TEXT;

import org.shearstack.rules.Key;

/**
 * Every key the geometry (GEO-) rules read or write. Inputs come from the spec, the printer profile and the
 * flow sizing (SIZE-) rules; outputs are the dimensions the part recipes in {@code org.shearstack.part} use.
 * All lengths in mm.
 */
public final class GeoKeys {

    private GeoKeys() {
    }

    private static Key len(String name) {
        return Key.of(name, LENGTH);
    }

    private static Key count(String name) {
        return Key.of(name, COUNT);
    }

    private static Key text(String name) {
        return Key.of(name, TEXT);
    }

    // ------------------------------------------------------------------ inputs: printer profile
    public static final Key LAYER_HEIGHT = len("printer.layer-height");
    public static final Key LINE_WIDTH = len("printer.line-width");
    public static final Key NOZZLE_DIAMETER = len("printer.nozzle-diameter");
    /** How much smaller holes print than modelled, on diameter. */
    public static final Key HOLE_COMPENSATION = len("print.hole-compensation");
    /** How much larger outer dimensions print than modelled, on diameter. */
    public static final Key OUTER_COMPENSATION = len("print.outer-compensation");

    // ------------------------------------------------------------------ inputs: spec and flow sizing
    public static final Key ROTOR_DIAMETER = len("rotor.diameter");
    public static final Key ROTOR_DISCS = count("rotor.discs");
    public static final Key ROTOR_DISC_THICKNESS = len("rotor.disc-thickness");
    public static final Key ROTOR_GAP = len("rotor.gap");
    public static final Key ROTOR_EXHAUST_DIAMETER = len("rotor.exhaust-diameter");
    /** "printed" or "metal"; a metal shaft has {@link #ROTOR_SHAFT_DIAMETER}. */
    public static final Key ROTOR_SHAFT = text("rotor.shaft");
    public static final Key ROTOR_SHAFT_DIAMETER = len("rotor.shaft.diameter");
    public static final Key ROTOR_SPACERS = text("rotor.spacers");
    public static final Key BEARINGS = text("bearings");
    public static final Key FASTENER_SIZE = text("fasteners.size");
    public static final Key FASTENER_ANCHOR = text("fasteners.anchor");
    /** "o-ring", "gasket" or "none"; the size is {@link #SEAL_SIZE}. */
    public static final Key SEAL = text("seal");
    public static final Key SEAL_SIZE = len("seal.size");
    /** "push-in" (tube size in {@link #INLET_PORT_SIZE}), "G1/8", "G1/4" or "M5". */
    public static final Key INLET_PORT = text("inlet-port");
    public static final Key INLET_PORT_SIZE = len("inlet-port.size");
    public static final Key NOZZLE_KIND = text("nozzle.kind");
    /** "true" to make the nozzle a drop-in block. */
    public static final Key NOZZLE_INSERT = text("nozzle.insert");
    public static final Key NOZZLE_THROAT_AREA = Key.of("nozzle.throat-area", AREA);
    public static final Key NOZZLE_EXIT_AREA = Key.of("nozzle.exit-area", AREA);
    public static final Key NOZZLE_JET_ANGLE = Key.of("nozzle.jet-angle", ANGLE);
    public static final Key TARGET_SPEED = Key.of("targets.speed", ANGULAR_SPEED);
    public static final Key GENERATOR_BODY_DIAMETER = len("generator.body-diameter");
    public static final Key GENERATOR_BODY_LENGTH = len("generator.body-length");
    public static final Key GENERATOR_SHAFT_DIAMETER = len("generator.shaft-diameter");
    public static final Key GENERATOR_MOUNT_SCREWS = text("generator.mount-screws");
    public static final Key GENERATOR_MOUNT_SPACING = len("generator.mount-spacing");

    // ------------------------------------------------------------------ outputs: discs and stack
    public static final Key DISC_THICKNESS_MIN = len("rotor.disc-thickness-min");
    public static final Key DISC_THICKNESS_PREFERRED = len("rotor.disc-thickness-preferred");
    public static final Key GAP_MIN = len("rotor.gap-min");
    public static final Key GAP_PREFERRED = len("rotor.gap-preferred");
    public static final Key DISC_PRINTED_THICKNESS = len("disc.thickness");
    public static final Key SPACER_THICKNESS = len("spacer.thickness");
    public static final Key PACK_HEIGHT = len("rotor.pack-height");
    public static final Key END_PLAY = len("housing.end-play");
    public static final Key CHAMBER_DEPTH = len("housing.chamber-depth");
    public static final Key RADIAL_CLEARANCE = len("housing.radial-clearance");
    public static final Key CHAMBER_DIAMETER = len("housing.chamber-diameter");

    // ------------------------------------------------------------------ outputs: bearing, shaft, hub
    public static final Key SHAFT_MIN_JOURNAL = len("shaft.minimum-journal");
    public static final Key BEARING_DESIGNATION = text("bearing.designation");
    public static final Key BEARING_BORE = len("bearing.bore");
    public static final Key BEARING_OUTSIDE = len("bearing.outside-diameter");
    public static final Key BEARING_WIDTH = len("bearing.width");
    public static final Key BEARING_CHAMFER = len("bearing.chamfer");
    public static final Key BEARING_INNER_LAND = len("bearing.inner-land-diameter");
    public static final Key SEAT_DIAMETER = len("bearing-seat.diameter");
    public static final Key SEAT_DEPTH = len("bearing-seat.depth");
    public static final Key SEAT_LEAD_IN_DIAMETER = len("bearing-seat.lead-in-diameter");
    public static final Key SEAT_LEAD_IN_DEPTH = len("bearing-seat.lead-in-depth");
    public static final Key LIP_HOLE_DIAMETER = len("cover.lip-hole-diameter");
    public static final Key LIP_THICKNESS = len("cover.lip-thickness");
    public static final Key JOURNAL_DIAMETER = len("shaft.journal-diameter");
    public static final Key SHAFT_BORE = len("shaft.bore-diameter");
    public static final Key SHAFT_FLAT_DEPTH = len("shaft.drive-flat-depth");
    public static final Key HEX_ACROSS_FLATS = len("hub.hex-across-flats");
    public static final Key DISC_BORE_ACROSS_FLATS = len("disc.bore-across-flats");
    public static final Key HUB_SLEEVE_BORE = len("hub.sleeve-bore-diameter");

    // ------------------------------------------------------------------ outputs: exhaust, spacers
    public static final Key PORT_COUNT = count("disc.port-count");
    public static final Key PORT_DIAMETER = len("disc.port-diameter");
    public static final Key PORT_CIRCLE_DIAMETER = len("disc.port-circle-diameter");
    public static final Key DISC_EXHAUST_AREA = Key.of("disc.exhaust-area", AREA);
    public static final Key SPOKE_WIDTH = len("disc.spoke-width");
    public static final Key SPACER_OUTSIDE = len("spacer.outside-diameter");
    public static final Key END_SPACER_BORE = len("end-spacer.bore-diameter");
    public static final Key END_SPACER_LAND = len("end-spacer.land-diameter");
    public static final Key END_SPACER_LAND_HEIGHT = len("end-spacer.land-height");
    public static final Key COVER_EXHAUST_INNER = len("cover.exhaust-inner-diameter");
    public static final Key COVER_EXHAUST_OUTER = len("cover.exhaust-outer-diameter");
    public static final Key COVER_EXHAUST_COUNT = count("cover.exhaust-count");
    public static final Key COVER_EXHAUST_WEB = len("cover.exhaust-web-width");

    // ------------------------------------------------------------------ outputs: housing, seal, bolts, port
    public static final Key WALL = len("housing.wall");
    public static final Key PLENUM_DIAMETER = len("housing.plenum-diameter");
    public static final Key PLENUM_RADIUS = len("housing.plenum-centre-radius");
    public static final Key SEAL_KIND = text("seal.kind");
    public static final Key GROOVE_DEPTH = len("seal.groove-depth");
    public static final Key GROOVE_WIDTH = len("seal.groove-width");
    public static final Key GROOVE_INNER_DIAMETER = len("seal.groove-inner-diameter");
    public static final Key ORING_INNER_DIAMETER = len("seal.o-ring-inner-diameter");
    public static final Key CORD_LENGTH = len("seal.cord-length");
    /** The chosen O-ring, "ID × CS" in mm (empty without an O-ring): the bill of materials prints it as is. */
    public static final Key ORING_DESIGNATION = text("seal.o-ring");
    public static final Key ORING_CROSS_SECTION = len("seal.o-ring-cross-section");
    public static final Key BOLT_CLEARANCE = len("bolt.clearance-diameter");
    public static final Key BOLT_HEAD_DIAMETER = len("bolt.head-diameter");
    public static final Key BOLT_ANCHOR_HOLE = len("bolt.anchor-hole-diameter");
    public static final Key BOLT_ANCHOR_DEPTH = len("bolt.anchor-depth");
    public static final Key BOLT_NUT_ACROSS_FLATS = len("bolt.nut-pocket-across-flats");
    public static final Key BOLT_CIRCLE = len("housing.bolt-circle-diameter");
    public static final Key BOLT_COUNT = count("housing.bolt-count");
    public static final Key HOUSING_OUTSIDE = len("housing.outside-diameter");
    public static final Key PORT_THREAD = text("port.thread");
    public static final Key PORT_PILOT_DIAMETER = len("port.pilot-diameter");
    public static final Key PORT_PILOT_DEPTH = len("port.pilot-depth");
    public static final Key PORT_FEED_DIAMETER = len("port.feed-diameter");
    public static final Key COVER_THICKNESS = len("cover.thickness");
    public static final Key BOLT_LENGTH = len("bolt.length");
    /** Length of a heat-set insert (0 for other anchors). */
    public static final Key INSERT_LENGTH = len("bolt.insert-length");

    // ------------------------------------------------------------------ outputs: nozzle
    public static final Key NOZZLE_HEIGHT = len("nozzle.slot-height");
    public static final Key NOZZLE_THROAT_WIDTH = len("nozzle.throat-width");
    public static final Key NOZZLE_EXIT_WIDTH = len("nozzle.exit-width");
    public static final Key NOZZLE_INLET_WIDTH = len("nozzle.inlet-width");
    public static final Key NOZZLE_ANGLE = Key.of("nozzle.slot-angle", ANGLE);
    public static final Key NOZZLE_INSERT_FIT = len("nozzle.insert-clearance");

    // ------------------------------------------------------------------ outputs: coupling, bracket, target
    public static final Key STUB_LENGTH = len("shaft.free-stub-length");
    public static final Key DRIVE_LENGTH = len("shaft.drive-end-length");
    public static final Key COUPLING_DIAMETER = len("coupling.outside-diameter");
    public static final Key COUPLING_HUB_THICKNESS = len("coupling.hub-thickness");
    public static final Key COUPLING_TONGUE_HEIGHT = len("coupling.tongue-height");
    public static final Key COUPLING_TONGUE_WIDTH = len("coupling.tongue-width");
    public static final Key COUPLING_DISC_THICKNESS = len("coupling.disc-thickness");
    public static final Key COUPLING_TURBINE_BORE = len("coupling.turbine-bore");
    public static final Key COUPLING_GENERATOR_BORE = len("coupling.generator-bore");
    public static final Key COUPLING_CLEARANCE = len("coupling.slot-clearance");
    public static final Key BRACKET_STANDOFF = len("bracket.standoff-height");
    public static final Key BRACKET_SEAT_DIAMETER = len("bracket.seat-diameter");
    public static final Key BRACKET_WALL = len("bracket.wall");
    public static final Key BRACKET_PLATE = len("bracket.plate-thickness");
    public static final Key BRACKET_CUP_HEIGHT = len("bracket.cup-height");
    public static final Key BRACKET_SCREW_HOLE = len("bracket.screw-hole-diameter");
    public static final Key BRACKET_CENTRE_HOLE = len("bracket.centre-hole-diameter");
    public static final Key BRACKET_SCREW_LENGTH = len("bracket.motor-screw-length");
    /** Countersink of the motor screws, entered from the coupling side (their heads sit in the plate's cone). */
    public static final Key BRACKET_COUNTERSINK = len("bracket.countersink-diameter");
    /** The generator's coupling hub: small enough to turn inside the motor screws' heads. */
    public static final Key COUPLING_GENERATOR_HUB_DIAMETER = len("coupling.generator-hub-diameter");
    public static final Key TARGET_DIAMETER = len("target.outside-diameter");
    public static final Key TARGET_THICKNESS = len("target.thickness");
}
