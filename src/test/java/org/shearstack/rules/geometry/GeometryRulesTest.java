package org.shearstack.rules.geometry;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.shearstack.rules.geometry.GeoKeys.*;

import org.junit.jupiter.api.Test;
import org.shearstack.profile.Profiles;
import org.shearstack.rules.InputRejectedException;

class GeometryRulesTest {

    static final double EXACT = 1e-9;
    /** The shipped profiles, loaded once (immutable). */
    static final Profiles PROFILES = Profiles.shipped();

    static java.util.List<org.shearstack.rules.Rule> rules() {
        return GeometryRules.rules(PROFILES);
    }

    /** The demo-like inputs: 0.4 mm nozzle, 0.25 mm layers, 80 mm discs (an invented scenario of our own). */
    static RuleHarness demo() {
        return new RuleHarness()
                .put(LAYER_HEIGHT, 0.25).put(LINE_WIDTH, 0.45).put(NOZZLE_DIAMETER, 0.4)
                .put(HOLE_COMPENSATION, 0.15).put(OUTER_COMPENSATION, 0.05)
                .put(ROTOR_DIAMETER, 80).put(ROTOR_DISCS, 8).put(ROTOR_DISC_THICKNESS, 0.75).put(ROTOR_GAP, 0.75)
                .put(ROTOR_EXHAUST_DIAMETER, 40).put(NOZZLE_THROAT_AREA, 5.0)
                .text(ROTOR_SHAFT, "printed").text(BEARINGS, "auto").text(FASTENER_SIZE, "M3")
                .text(FASTENER_ANCHOR, "heat-set").text(SEAL, "o-ring").put(SEAL_SIZE, 2.62)
                .text(INLET_PORT, "G1/8").text(NOZZLE_KIND, "converging")
                .put(GENERATOR_BODY_DIAMETER, 27.7).put(GENERATOR_BODY_LENGTH, 38).put(GENERATOR_SHAFT_DIAMETER, 2.3)
                .text(GENERATOR_MOUNT_SCREWS, "M2.5").put(GENERATOR_MOUNT_SPACING, 12.5);
    }

    @Test
    void discLimitsFollowTheNozzle() {
        RuleHarness h = demo().run(rules());
        // common practice: 0.75 mm discs and gaps on a 0.4 mm nozzle
        assertEquals(0.75, h.get(DISC_THICKNESS_PREFERRED), EXACT);
        assertEquals(0.75, h.get(GAP_PREFERRED), EXACT);
        // derived: 1.5 × 0.4 = 0.6 → 0.75 in 0.25 mm layers; far above the flimsy 0.25 mm
        assertEquals(0.75, h.get(DISC_THICKNESS_MIN), EXACT);
        RuleHarness fine = demo().put(NOZZLE_DIAMETER, 0.6).put(LAYER_HEIGHT, 0.3).run(rules());
        assertEquals(1.2, fine.get(DISC_THICKNESS_PREFERRED), EXACT); // 1.875 × 0.6 = 1.125 → 4 layers of 0.3
        assertTrue(fine.get(DISC_THICKNESS_MIN) > h.get(DISC_THICKNESS_MIN));
    }

    @Test
    void stackFillsTheChamberWithEndPlay() {
        RuleHarness h = demo().run(rules());
        // 8 discs × 0.75 + 7 gaps × 0.75 = 11.25 (geometry)
        assertEquals(11.25, h.get(PACK_HEIGHT), EXACT);
        assertEquals(h.get(PACK_HEIGHT) + 2 * h.get(END_PLAY), h.get(CHAMBER_DEPTH), EXACT);
        assertEquals(1.0, h.get(END_PLAY), EXACT); // max(0.75, 0.8, 0.5) = 0.8 → 4 layers of 0.25
        assertEquals(80 + 2 * h.get(RADIAL_CLEARANCE), h.get(CHAMBER_DIAMETER), EXACT);
        assertEquals(0.9, h.get(RADIAL_CLEARANCE), EXACT); // 2 × 0.45 line width beats 0.8 (1 %)
    }

    @Test
    void printedShaftGetsA608WithCompensatedSeat() {
        RuleHarness h = demo().run(rules());
        // standards.md §8 B1: 608 = 8 × 22 × 7, r_min 0.3 (CQW, BOLTS, OMDL)
        assertEquals("608", h.texts.get(BEARING_DESIGNATION));
        assertEquals(8, h.get(BEARING_BORE), EXACT);
        assertEquals(22, h.get(BEARING_OUTSIDE), EXACT);
        assertEquals(7, h.get(BEARING_WIDTH), EXACT);
        assertEquals(0.3, h.get(BEARING_CHAMFER), EXACT);
        assertEquals(22 + 0.15 - 0.05, h.get(SEAT_DIAMETER), EXACT);
        assertEquals(7.0, h.get(SEAT_DEPTH), EXACT);
        assertEquals(h.get(SEAT_DIAMETER) + 2 * h.get(SEAT_LEAD_IN_DEPTH), h.get(SEAT_LEAD_IN_DIAMETER), EXACT);
        assertEquals("GEO-BEARING-SEAT", h.writers.get(SEAT_DIAMETER));
    }

    @Test
    void holeSizesFollowThePrinterCompensation() {
        RuleHarness a = demo().run(rules());
        RuleHarness b = demo().put(HOLE_COMPENSATION, 0.35).run(rules());
        for (var k : new org.shearstack.rules.Key[] {SEAT_DIAMETER, BOLT_CLEARANCE, BOLT_ANCHOR_HOLE,
                PORT_PILOT_DIAMETER, DISC_BORE_ACROSS_FLATS, END_SPACER_BORE, LIP_HOLE_DIAMETER}) {
            assertEquals(0.2, b.get(k) - a.get(k), 1e-12, k.name());
        }
    }

    @Test
    void speedFactorPicksAThinnerBearingAtHighSpeed() {
        // physics.md §7 check value: 608 d_m = 15 mm, at 30 000 rpm n·d_m = 450 000 (> 400 000, PTI high-speed
        // grease limit); 628 (d_m 16) 480 000 and 698 (d_m 13.5) 405 000 also exceed it; 688 (8 × 16, d_m 12)
        // gives 360 000 (standards.md §1.2 dimensions)
        RuleHarness h = demo().put(TARGET_SPEED, 30000 * 2 * Math.PI / 60).run(rules());
        assertEquals("688", h.texts.get(BEARING_DESIGNATION));
        RuleHarness slow = demo().put(TARGET_SPEED, 20000 * 2 * Math.PI / 60).run(rules());
        assertEquals("608", slow.texts.get(BEARING_DESIGNATION)); // 20 000 × 15 = 300 000
    }

    @Test
    void fastenersAndSealFromTheStandards() {
        RuleHarness h = demo().run(rules());
        // ISO 273 medium M3 = 3.4 (standards.md §8 F1), + 0.15 compensation
        assertEquals(3.55, h.get(BOLT_CLEARANCE), 1e-12);
        // ISO 4762 M3 dk max knurled 5.68 (F3)
        assertEquals(5.68, h.get(BOLT_HEAD_DIAMETER), EXACT);
        // heat-set M3 pilot 4.0 (F9, common practice) + 0.15
        assertEquals(4.15, h.get(BOLT_ANCHOR_HOLE), 1e-12);
        // face groove for 2.62 mm cord: h 2.00, b 3.80 (O1, orings.co.uk)
        assertEquals(2.00, h.get(GROOVE_DEPTH), EXACT);
        assertEquals(3.80, h.get(GROOVE_WIDTH), EXACT);
        // O2 / O4: squeeze 23.66 %, fill 70.9 % (computed in standards.md §4.3)
        var g = PROFILES.hardware().seals().find(2.62, 0.005).orElseThrow();
        assertEquals(0.2366, g.squeeze(), 0.0005);
        assertEquals(0.709, g.fill(), 0.001);
        // G1/8 tap drill 8.8 (standards.md §5.1, MEPB/BSP)
        assertEquals("G1/8", h.texts.get(PORT_THREAD));
        assertEquals(8.95, h.get(PORT_PILOT_DIAMETER), 1e-12);
        assertEquals(0, h.get(BOLT_COUNT) % 2);
        assertTrue(h.get(BOLT_COUNT) >= 4);
        double pitch = Math.PI * h.get(BOLT_CIRCLE) / h.get(BOLT_COUNT);
        assertTrue(pitch <= 30 + EXACT, "pitch " + pitch);
        assertTrue(PROFILES.hardware().fasteners().lengthsMm().contains(h.get(BOLT_LENGTH)));
        // the O-ring the groove was sized for travels on as chosen: ID = groove OD − 2 × CS (standards.md §4.2)
        assertEquals(2.62, h.get(ORING_CROSS_SECTION), EXACT);
        assertEquals(HousingLayoutRule.num(h.get(ORING_INNER_DIAMETER)) + " × 2.62", h.texts.get(ORING_DESIGNATION));
    }

    @Test
    void portsAreAMultipleOfSixWithWideSpokes() {
        RuleHarness h = demo().run(rules());
        double n = h.get(PORT_COUNT);
        assertEquals(0, n % 6);
        assertTrue(h.get(SPOKE_WIDTH) >= ExhaustPortRule.SPOKE_LINES * 0.45 - EXACT);
        double hexCorner = h.get(DISC_BORE_ACROSS_FLATS) / Math.sqrt(3);
        assertTrue(h.get(PORT_CIRCLE_DIAMETER) / 2 - h.get(PORT_DIAMETER) / 2 > hexCorner);
    }

    @Test
    void metalShaftNeedsAMatchingBearing() {
        RuleHarness h = demo().text(ROTOR_SHAFT, "metal").put(ROTOR_SHAFT_DIAMETER, 10).run(rules());
        assertEquals(10, h.get(BEARING_BORE), EXACT);
        assertEquals(10, h.get(JOURNAL_DIAMETER), EXACT);
        assertTrue(h.get(HUB_SLEEVE_BORE) > 10);
        InputRejectedException e = assertThrows(InputRejectedException.class,
                () -> demo().text(ROTOR_SHAFT, "metal").put(ROTOR_SHAFT_DIAMETER, 7.5).run(rules()));
        assertEquals(ROTOR_SHAFT_DIAMETER, e.key());
    }

    @Test
    void noFittingBearingIsBadInputAtTheShaftKey() {
        // ISO 15 tables in the profile end at a 25 mm bore (standards.md §1.1): a 30 mm metal shaft fits none
        InputRejectedException e = assertThrows(InputRejectedException.class,
                () -> demo().text(ROTOR_SHAFT, "metal").put(ROTOR_SHAFT_DIAMETER, 30).run(rules()));
        assertEquals(ROTOR_SHAFT_DIAMETER, e.key());
        assertTrue(e.found().contains("30.000 mm"), e.found());
        InputRejectedException named = assertThrows(InputRejectedException.class,
                () -> demo().text(BEARINGS, "6099").run(rules()));
        assertEquals(BEARINGS, named.key());
        assertTrue(named.expected().contains("608"), named.expected());
    }

    @Test
    void everyValueHasAFormulaAndSource() {
        RuleHarness h = demo().run(rules());
        for (var r : rules()) {
            assertTrue(r.id().startsWith("GEO-"));
            for (var k : r.writes()) {
                assertFalse(h.formulas.get(k).isBlank(), k.name());
            }
        }
    }
}
