package org.shearstack.rules.sizing;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.shearstack.profile.Profiles;
import org.shearstack.rules.DesignResolver;
import org.shearstack.rules.Engine;
import org.shearstack.rules.Key;
import org.shearstack.rules.Rule;
import org.shearstack.rules.RuleCatalog;
import org.shearstack.rules.RuleInputs;
import org.shearstack.rules.RuleOutputs;
import org.shearstack.spec.Spec;
import org.shearstack.spec.SpecReader;

/** Benchmark (tag "bench"): thread CPU time of resolving the classroom demo, per SIZE- rule. */
@org.junit.jupiter.api.Tag("bench")
class SizingBenchmarkTest {
    @org.junit.jupiter.api.Test
    void resolveClassroomDemo() {
        Spec spec = SpecReader.read(Path.of("examples/classroom-demo.yaml")).orThrow();
        Profiles p = Profiles.shipped();
        var mx = java.lang.management.ManagementFactory.getThreadMXBean();
        List<Rule> wrapped = new ArrayList<>();
        java.util.Map<String, double[]> times = new java.util.TreeMap<>();
        for (Rule r : RuleCatalog.rules(p)) {
            wrapped.add(new Rule() {
                public String id() { return r.id(); }
                public List<Key> reads() { return r.reads(); }
                public List<Key> writes() { return r.writes(); }
                public void apply(RuleInputs in, RuleOutputs out) {
                    long c = mx.getCurrentThreadCpuTime();
                    try { r.apply(in, out); } finally {
                        times.computeIfAbsent(r.id(), k -> new double[1])[0] += (mx.getCurrentThreadCpuTime() - c) / 1e6;
                    }
                }
            });
        }
        Engine engine = Engine.of(wrapped);
        for (int i = 0; i < 4; i++) {
            times.clear();
            long c = mx.getCurrentThreadCpuTime();
            DesignResolver.resolve(spec, p, engine);
            System.out.println("BENCH resolve cpu ms " + (mx.getCurrentThreadCpuTime() - c) / 1e6);
        }
        times.forEach((k, v) -> { if (v[0] > 1) System.out.printf("  %s %.1f ms%n", k, v[0]); });
    }
}
