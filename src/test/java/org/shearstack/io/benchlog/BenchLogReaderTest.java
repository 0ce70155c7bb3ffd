package org.shearstack.io.benchlog;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.shearstack.check.Finding;
import org.shearstack.physics.dyno.SpeedLog;

class BenchLogReaderTest {
    private static final double TIGHT = 1e-12;

    /** n samples "t<sep>rpm" at 0.1 s steps, decimal separator as given. */
    private static String rows(int n, String sep, char decimal) {
        StringBuilder s = new StringBuilder();
        for (int i = 0; i < n; i++) {
            String t = String.format(java.util.Locale.ROOT, "%.1f", 0.1 * i).replace('.', decimal);
            s.append(t).append(sep).append(100 * i).append('\n');
        }
        return s.toString();
    }

    private static BenchLog read(String text) throws Exception {
        return read(text, BenchLogOptions.FROM_HEADER);
    }

    private static BenchLog read(String text, BenchLogOptions o) throws BenchLogException, IOException {
        return BenchLogReader.read(new StringReader(text), "run.csv", o);
    }

    private static String error(String text, BenchLogOptions o) {
        return assertThrows(BenchLogException.class, () -> read(text, o)).getMessage();
    }

    @Test
    void readsHeaderUnitsDecimalCommasCommentsAndBlankLines() throws Exception {
        String text = "# invented test data\n\ntime [s];speed (rpm)\n" + rows(25, ";", ',').replace("\n1,0;", "\n\n1,0;");
        BenchLog b = read(text);
        SpeedLog log = b.log();
        assertEquals(25, log.size());
        assertEquals(1.2, log.timeS(12), TIGHT);
        // 1200 rpm = 1200·π/30 rad/s (definition of the revolution per minute)
        assertEquals(1200 * Math.PI / 30, log.speedRadPerS(12), TIGHT);
        assertTrue(b.findings().isEmpty(), b.findings().toString());
        assertEquals("time in column 1 (s), speed in column 2 (rpm)", b.columns());
    }

    @Test
    void convertsMillisecondsAndHertzFromBareUnitHeaders() throws Exception {
        StringBuilder s = new StringBuilder("ms\tHz\n");
        for (int i = 0; i < 30; i++) {
            s.append(50 * i).append('\t').append(i).append(",5\n");
        }
        SpeedLog log = read(s.toString()).log();
        assertEquals(0.5, log.timeS(10), TIGHT);
        assertEquals(10.5 * 2 * Math.PI, log.speedRadPerS(10), TIGHT);
    }

    @Test
    void readsElectricalColumnsInMilliunits() throws Exception {
        StringBuilder s = new StringBuilder("t_s, omega [rad/s], voltage [V], current [mA], temp [C]\n");
        for (int i = 0; i < 20; i++) {
            s.append(i).append(", ").append(10.0 * i).append(", 3.5, 250, 21\n");
        }
        BenchLog b = read(s.toString());
        assertTrue(b.log().hasElectrical());
        assertEquals(0.25, b.log().currentsA().orElseThrow()[3], TIGHT);
        assertEquals(30.0, b.log().speedRadPerS(3), TIGHT);
        assertEquals("LOG-COLUMN-UNUSED", b.findings().get(0).code());
    }

    @Test
    void headerlessLogNeedsUnitOptions() {
        assertEquals("run.csv:1:1: expected a header such as 'time [s]' or the option --time-unit s|ms, found a data"
                + " line without a header\nrun.csv:1:2: expected a header such as 'speed [rpm]' or the option"
                + " --speed-unit rpm|Hz|rad/s, found a data line without a header",
                error(rows(25, ",", '.'), BenchLogOptions.FROM_HEADER));
    }

    @Test
    void headerlessLogWithOptions() throws Exception {
        SpeedLog log = read(rows(25, ",", '.'), new BenchLogOptions(Optional.of(LogTimeUnit.SECOND),
                Optional.of(SpeedUnit.RAD_PER_S))).log();
        assertEquals(2400, log.speedRadPerS(24), TIGHT);
    }

    @Test
    void headerWithoutTimeUnit() {
        assertEquals("run.csv:1:1: expected a unit for the time column, in the header ('time [s]') or as"
                + " --time-unit s|ms, found 'time' without a unit", error("time,rpm\n" + rows(25, ",", '.'),
                        BenchLogOptions.FROM_HEADER));
    }

    @Test
    void optionContradictingHeader() {
        assertEquals("run.csv:1:1: expected the time unit given as option, ms, found 's' in the header",
                error("time [s],rpm\n" + rows(25, ",", '.'),
                        new BenchLogOptions(Optional.of(LogTimeUnit.MILLISECOND), Optional.empty())));
    }

    @Test
    void unknownSpeedUnit() {
        assertEquals("run.csv:1:2: expected a speed unit rpm|Hz|rad/s, found 'deg/s'",
                error("time [s],speed [deg/s]\n" + rows(25, ",", '.'), BenchLogOptions.FROM_HEADER));
    }

    @Test
    void missingSpeedColumn() {
        assertEquals("run.csv:1: expected a speed column in the header (e.g. 'speed [rpm]'), found columns 'time [s]',"
                + " 'pressure [bar]'", error("time [s],pressure [bar]\n" + rows(25, ",", '.'),
                        BenchLogOptions.FROM_HEADER));
    }

    @Test
    void badLinesAreSkippedAndReportedWithTheirLineNumbers() throws Exception {
        String text = "time [s],rpm\n" + rows(25, ",", '.').replace("\n0.5,500\n", "\n0.5,5OO\n")
                .replace("\n0.7,700\n", "\n0.7,700,12\n");
        BenchLog b = read(text);
        assertEquals(23, b.log().size());
        assertEquals("Skipped run.csv:7:2: expected a number for speed, found '5OO'.", b.findings().get(0).message());
        assertEquals("Skipped run.csv:9: expected 2 fields (decimal commas need ';' or tab as separator),"
                + " found 3 fields.", b.findings().get(1).message());
        assertEquals(7, b.findings().get(0).measured());
    }

    @Test
    void negativeSpeedIsABadLine() throws Exception {
        BenchLog b = read("time [s],rpm\n" + rows(25, ",", '.').replace("\n0.3,300\n", "\n0.3,-300\n"));
        assertEquals("Skipped run.csv:5:2: expected a speed >= 0, found '-300'.", b.findings().get(0).message());
    }

    @Test
    void tooManyBadLinesRefuseTheLog() {
        String text = "time [s],rpm\n" + rows(25, ",", '.').replaceAll("(?m)^(0\\.[1-5]),.*$", "$1,x");
        String msg = error(text, BenchLogOptions.FROM_HEADER);
        assertTrue(msg.startsWith("run.csv:3:2: expected a number for speed, found 'x'\n"), msg);
        assertTrue(msg.endsWith("run.csv: expected at most a tenth of the data lines bad, found 5 of 25 bad"), msg);
    }

    @Test
    void timeGoingBackwardsIsRefused() {
        String text = "time [s],rpm\n" + rows(25, ",", '.').replace("\n1.1,1100\n", "\n0.4,1100\n");
        assertEquals("run.csv:13:1: expected a time after 1 s (line 12); samples must be in time order (two logs"
                + " joined together?), found 0.4 s", error(text, BenchLogOptions.FROM_HEADER));
    }

    @Test
    void repeatedTimesAreDroppedWithAFinding() throws Exception {
        String text = "time [s],rpm\n" + rows(25, ",", '.').replace("\n1.1,1100\n", "\n1.0,1100\n");
        BenchLog b = read(text);
        assertEquals(24, b.log().size());
        Finding f = b.findings().get(0);
        assertEquals("LOG-TIME-REPEAT", f.code());
        assertEquals("Skipped 1 sample(s) that repeat the time of the line before (lines 13); the first sample at each"
                + " time is kept.", f.message());
    }

    @Test
    void tooFewSamples() {
        assertEquals("run.csv: expected at least 20 samples, found 19",
                error("time [s],rpm\n" + rows(19, ",", '.'), BenchLogOptions.FROM_HEADER));
    }

    @Test
    void emptyLog() {
        assertEquals("run.csv: expected a header line and samples, found no data lines",
                error("# nothing logged\n\n", BenchLogOptions.FROM_HEADER));
    }

    @Test
    void thousandsSeparatorsAreNotGuessed() throws Exception {
        BenchLog b = read("time [s];rpm\n" + rows(25, ";", '.').replace("\n0.3;300\n", "\n0.3;1.300,5\n"));
        assertFalse(b.findings().isEmpty());
        assertEquals("Skipped run.csv:5:2: expected a number for speed, found '1.300,5'.", b.findings().get(0).message());
    }
}
