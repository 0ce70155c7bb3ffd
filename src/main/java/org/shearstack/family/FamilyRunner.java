package org.shearstack.family;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicReference;
import org.shearstack.io.family.FamilyRow;
import org.shearstack.io.family.FamilyTable;
import org.shearstack.io.family.Status;
import org.shearstack.spec.BadInputException;
import org.shearstack.spec.SpecResult;

/**
 * Runs every variant of a plan on a fixed pool of worker threads. Each worker takes the next variant number, runs
 * it to the end and only then takes another, so at most {@code jobs} variants are in memory at once whatever the
 * family's size; each variant's result shrinks to its table row as soon as its folder is written. A stop request
 * lets the variants in flight finish and starts no new one; the rest are listed as not run. The table is in family
 * order whatever order the variants finish in.
 */
public final class FamilyRunner {

    /** Told about progress; called from worker threads, one call at a time. */
    public interface Listener {
        /** Once, before the first variant. */
        default void started(int total, int jobs) {
        }

        /** After each variant: its row and the counts so far. */
        void finished(FamilyRow row, int done, int failed, int total);
    }

    /** A stop request shared with whoever may ask (a shutdown hook, a test). */
    public static final class Stop {
        private volatile boolean requested;

        public void request() {
            requested = true;
        }

        public boolean requested() {
            return requested;
        }
    }

    /**
     * What a run produced.
     *
     * @param table       the comparison table (every variant, in family order)
     * @param stopped     true when a stop request left variants not run
     * @param firstError  the first internal error of a variant, for the command line to show in full
     */
    public record Result(FamilyTable table, boolean stopped, Optional<Throwable> firstError) {
    }

    private FamilyRunner() {
    }

    /**
     * Runs the plan's variants into {@code outDir/<variant name>} with {@code jobs} workers.
     *
     * @param checkOnly  recorded in the table (the pipeline decides what it writes)
     */
    public static Result run(FamilyPlan plan, VariantPipeline pipeline, Path outDir, int jobs, boolean checkOnly,
            Listener listener, Stop stop) {
        Objects.requireNonNull(pipeline, "pipeline");
        if (jobs < 1) {
            throw new IllegalArgumentException("jobs must be at least 1, found " + jobs);
        }
        int total = plan.size();
        int workers = Math.min(jobs, total);
        FamilyRow[] rows = new FamilyRow[total];
        AtomicInteger next = new AtomicInteger();
        AtomicReference<Throwable> firstError = new AtomicReference<>();
        Object lock = new Object();
        int[] counts = new int[2]; // done, failed
        listener.started(total, workers);
        Runnable work = () -> {
            while (!stop.requested()) {
                int i = next.getAndIncrement();
                if (i >= total) {
                    return;
                }
                FamilyRow row = runOne(plan, plan.variant(i), pipeline, outDir, firstError);
                synchronized (lock) {
                    rows[i] = row;
                    counts[0]++;
                    counts[1] += row.status().failed() ? 1 : 0;
                    listener.finished(row, counts[0], counts[1], total);
                }
            }
        };
        List<Thread> threads = new ArrayList<>();
        for (int w = 0; w < workers; w++) {
            Thread t = new Thread(work, "family-worker-" + (w + 1));
            t.setDaemon(true);
            threads.add(t);
            t.start();
        }
        boolean interrupted = false;
        for (Thread t : threads) {
            while (t.isAlive()) {
                try {
                    t.join();
                } catch (InterruptedException e) {
                    interrupted = true;
                    stop.request();
                }
            }
        }
        if (interrupted) {
            Thread.currentThread().interrupt();
        }
        boolean stopped = false;
        List<FamilyRow> all = new ArrayList<>(total);
        synchronized (lock) {
            for (int i = 0; i < total; i++) {
                if (rows[i] == null) {
                    Variant v = plan.variant(i);
                    rows[i] = FamilyRow.without(i, v.name(), v.values(), Status.NOT_RUN,
                            "not run: the family was stopped");
                    stopped = true;
                }
            }
            all.addAll(Arrays.asList(rows));
        }
        FamilyTable table = new FamilyTable(plan.base().name(), plan.base().sourceFile(), plan.keys(), plan.zip(),
                checkOnly, all);
        return new Result(table, stopped, Optional.ofNullable(firstError.get()));
    }

    private static FamilyRow runOne(FamilyPlan plan, Variant v, VariantPipeline pipeline, Path outDir,
            AtomicReference<Throwable> firstError) {
        SpecResult spec = plan.spec(v);
        if (!spec.ok()) {
            return FamilyRow.without(v.index(), v.name(), v.values(), Status.BAD_INPUT,
                    spec.problems().get(0).format());
        }
        try {
            JsonNode report = pipeline.run(spec.spec().orElseThrow(), outDir.resolve(v.name()));
            return FamilyRow.fromReport(v.index(), v.name(), v.values(), report);
        } catch (BadInputException e) {
            return FamilyRow.without(v.index(), v.name(), v.values(), Status.BAD_INPUT, e.problems().get(0).format());
        } catch (IOException e) {
            firstError.compareAndSet(null, e);
            return FamilyRow.without(v.index(), v.name(), v.values(), Status.ERROR,
                    "could not write the variant's folder: " + e.getMessage());
        } catch (RuntimeException | StackOverflowError e) {
            firstError.compareAndSet(null, e);
            return FamilyRow.without(v.index(), v.name(), v.values(), Status.ERROR, "internal error: " + e);
        }
    }
}
