package org.shearstack.family;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shearstack.io.family.FamilyRow;
import org.shearstack.io.family.Status;
import org.shearstack.spec.SpecReader;

/**
 * The runner's mechanics with a stand-in pipeline (the real one is exercised by the family command tests): family
 * order whatever the finishing order, at most N variants in flight, and a stop that keeps finished variants.
 */
class FamilyRunnerTest {

    @TempDir
    Path dir;

    private static FamilyPlan plan(int n) {
        StringBuilder v = new StringBuilder("rotor.discs=");
        for (int i = 0; i < n; i++) {
            v.append(i == 0 ? "" : ",").append(i + 2);
        }
        return FamilyPlan.of(SpecReader.read(FamilyPlanTest.DEMO).orThrow(), VaryOption.parse(List.of(v.toString())),
                false);
    }

    /** A report tree with a verdict and a shaft power equal to the number of discs. */
    private static JsonNode report(double discs) {
        ObjectNode r = new ObjectMapper().createObjectNode();
        r.put("verdict", discs == 4 ? "fail" : "pass");
        r.putObject("performance").putObject("operatingPoint").put("powerW", discs);
        if (discs == 4) {
            r.putArray("findings").addObject().put("code", "TEST-FAIL").put("severity", "fail").put("message", "m");
        }
        return r;
    }

    @Test
    void rowsComeInFamilyOrderAndNoMoreThanJobsRunAtOnce() {
        FamilyPlan plan = plan(12);
        AtomicInteger inFlight = new AtomicInteger();
        AtomicInteger most = new AtomicInteger();
        VariantPipeline slowFirst = (spec, folder) -> {
            int now = inFlight.incrementAndGet();
            most.accumulateAndGet(now, Math::max);
            double discs = spec.quantity("rotor.discs").orElseThrow().value();
            try {
                Thread.sleep((long) (14 - discs) * 3); // early variants finish last
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
            inFlight.decrementAndGet();
            return report(discs);
        };
        FamilyRunner.Result r = FamilyRunner.run(plan, slowFirst, dir, 3, true, (row, d, f, t) -> { },
                new FamilyRunner.Stop());
        assertTrue(most.get() <= 3, "at most 3 in flight, saw " + most.get());
        List<FamilyRow> rows = r.table().rows();
        assertEquals(12, rows.size());
        for (int i = 0; i < 12; i++) {
            assertEquals(i, rows.get(i).index());
            assertEquals("rotor.discs=" + (i + 2), rows.get(i).name());
            assertEquals(i + 2, rows.get(i).figure("shaft-power"), 0);
        }
        assertEquals(Status.FAIL, rows.get(2).status());
        assertEquals("TEST-FAIL: m", rows.get(2).firstFailure());
        assertEquals(1, r.table().failures());
    }

    @Test
    void aStopKeepsFinishedVariantsAndListsTheRestAsNotRun() throws Exception {
        FamilyPlan plan = plan(10);
        FamilyRunner.Stop stop = new FamilyRunner.Stop();
        VariantPipeline writes = (spec, folder) -> {
            Files.createDirectories(folder);
            Files.writeString(folder.resolve("report.json"), "{}");
            return report(spec.quantity("rotor.discs").orElseThrow().value());
        };
        FamilyRunner.Result r = FamilyRunner.run(plan, writes, dir, 1, true, (row, done, f, t) -> {
            if (done == 4) {
                stop.request();
            }
        }, stop);
        assertTrue(r.stopped());
        assertEquals(4, r.table().rows().stream().filter(x -> x.status() != Status.NOT_RUN).count());
        assertEquals(6, r.table().count(Status.NOT_RUN));
        assertEquals(10, r.table().rows().size());
        for (FamilyRow row : r.table().rows()) {
            assertEquals(row.status() != Status.NOT_RUN, Files.exists(dir.resolve(row.name()).resolve("report.json")),
                    row.name());
        }
    }

    @Test
    void aBrokenVariantIsListedAndTheOthersFinish() {
        FamilyPlan plan = plan(5);
        VariantPipeline breaksOnFour = (spec, folder) -> {
            double discs = spec.quantity("rotor.discs").orElseThrow().value();
            if (discs == 4) {
                throw new IllegalStateException("broken on purpose");
            }
            return report(discs);
        };
        FamilyRunner.Result r = FamilyRunner.run(plan, breaksOnFour, dir, 2, true, (row, d, f, t) -> { },
                new FamilyRunner.Stop());
        assertEquals(Status.ERROR, r.table().rows().get(2).status());
        assertEquals("internal error: java.lang.IllegalStateException: broken on purpose",
                r.table().rows().get(2).firstFailure());
        assertEquals(4, r.table().count(Status.PASS));
        assertTrue(r.firstError().isPresent());
    }
}
