package org.shearstack.check.flow;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.function.Function;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.shearstack.check.Finding;
import org.shearstack.check.Severity;
import org.shearstack.physics.rotor.DemoAccess;
import org.shearstack.physics.rotor.PerformanceMap;
import org.shearstack.physics.rotor.TurbineModel;

class FlowChecksTest {

    @Test
    void demoDesignFlagsTurbulentGapsIcingAndAHungryTurbine() {
        TurbineModel model = DemoAccess.demo();
        PerformanceMap map = model.map(10);
        Map<String, Finding> f = FlowChecks.check(model, map, OptionalDouble.of(50.0 / 60_000)).stream()
                .collect(Collectors.toMap(Finding::code, Function.identity()));
        // every point of the demo map is above the laminar limit (see TurbineModelTest)
        assertEquals(Severity.CAUTION, f.get("FLOW-GAP-REYNOLDS").severity());
        assertTrue(f.get("FLOW-GAP-REYNOLDS").message().startsWith("100 %"), f.get("FLOW-GAP-REYNOLDS").message());
        // a choked under-expanded jet from 6 bar(g) is far below 0 degC
        assertEquals(Severity.CAUTION, f.get("FLOW-JET-ICING").severity());
        // 50 L/min free air cannot feed about 180 L/min
        assertEquals(Severity.CAUTION, f.get("FLOW-COMPRESSOR").severity());
        // 9 gaps of 0.4 mm against 10 discs of 0.75 mm: 32 % of the jet faces gaps
        assertEquals(0.324, f.get("FLOW-ADMISSION").measured(), 0.001);
        assertEquals(map.runawayUpperBoundRadPerS() * 30 / Math.PI, f.get("FLOW-RUNAWAY-BAND").measured(), 1e-9);
        List<String> codes = FlowChecks.check(model, map, OptionalDouble.empty()).stream().map(Finding::code).toList();
        assertTrue(!codes.contains("FLOW-COMPRESSOR"));
    }
}
