package org.shearstack.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import org.junit.jupiter.api.Test;

class SupplyCommandTest {

    private record Run(int code, String out, String err) {
    }

    private static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.run(args, new PrintWriter(out, true), new PrintWriter(err, true));
        return new Run(code, out.toString(), err.toString());
    }

    @Test
    void tradeBlowdownShowsConductanceAndExplainsFreeAirSpeed() {
        // Common practice, no published source: 100 L receiver, 10 -> 6.5 bar(g) in 64 s, 6 mm bore, about 190 m/s.
        // C values derived with physics.md §2.3 (see SupplyTest.tradeBlowdownCaseMeansConductanceNotJetSpeed).
        Run r = run("supply", "--tank", "100 L", "--from", "10 bar(g)", "--to", "6.5 bar(g)", "--time", "64 s",
                "--ambient", "1.013 bar(a)", "--pressure", "6 bar(g)");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("C isothermal tank 0.599, polytropic n = 1.2 0.507 (used), adiabatic tank 0.440"),
                r.out());
        assertTrue(r.out().contains("that is 194 m/s"), r.out());
        assertTrue(r.out().contains("really moves at about 21 m/s"), r.out());
        assertTrue(r.out().contains("a* = √(2γRT₀/(γ+1)) = 313 m/s"), r.out());
        assertTrue(r.out().contains("Tank alone"), r.out());
    }

    @Test
    void conductanceGivenDirectly() {
        // PN-01 (derived, physics.md §2.1): C = 1 dm3/(s bar) choked from 7 bar abs gives 8.295 g/s; here the
        // table row 6 bar(g) over a 1 bar(a) ambient is 7 bar(a).
        Run r = run("supply", "--conductance", "1 dm3/(s*bar)", "--ambient", "1 bar(a)", "--critical-ratio", "0.5");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("6.00 bar(g)    8.30 g/s"), r.out());
        assertTrue(r.out().contains("effective orifice area S = 5.02 mm²"), r.out());
    }

    @Test
    void incompleteOrMissingInputIsBadInput() {
        Run partial = run("supply", "--tank", "24 L", "--from", "8 bar(g)");
        assertEquals(2, partial.code());
        assertTrue(partial.err().contains("--tank/--from/--to/--time"), partial.err());
        Run none = run("supply");
        assertEquals(2, none.code());
        Run bad = run("supply", "--conductance", "fast");
        assertEquals(2, bad.code());
        assertTrue(bad.err().contains("--conductance: expected a sonic conductance"), bad.err());
    }

    @Test
    void readsTheSpecSupplySection() {
        Run r = run("supply", "examples/classroom-demo.yaml");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("blow-down of 24.0 L from 8.00 bar(g) to 5.00 bar(g) in 14.0 s"), r.out());
    }
}
