package org.shearstack.physics.rotor;

import java.util.Locale;

final class DemoPrint {
    public static void main(String[] args) {
        TurbineModel m = DemoDesigns.demo();
        PerformanceMap map = m.map(12);
        for (PerformanceCurve c : java.util.List.of(map.estimate(), map.optimistic(), map.pessimistic())) {
            System.out.printf(Locale.ROOT, "%s runaway %.0f rpm stall %.4f Nm out %.2f%n", c.calibration().name(),
                    c.runawaySpeedRadPerS() * 30 / Math.PI, c.stallTorqueNm(), c.fractionOutOfRange());
            for (OperatingPoint p : c.points()) {
                System.out.printf(Locale.ROOT,
                        "  %7.0f rpm T %.5f rotor %.5f par %.5f P %.2f W m %.3f g/s p2 %.3f bar p1 %.4f eta %.3f Vj %.0f Re %.0f Ma %.2f swirl %.2f W exM %.3f%n",
                        p.speedRpm(), p.shaftTorqueNm(), p.rotorTorqueNm(), p.parasitic().totalNm(), p.shaftPowerW(),
                        p.massFlowKgPerS() * 1e3, p.rimPressurePa() / 1e5, p.exhaustPressurePa() / 1e5, p.efficiency(),
                        p.jetVelocityMPerS(), p.validity().gapReynolds(), p.validity().relativeMach(), p.exitSwirlLossW(),
                        p.exhaustMach());
            }
        }
    }
}
