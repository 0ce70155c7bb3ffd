package org.shearstack.io.report;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.shearstack.physics.rotor.OperatingPoint;
import org.shearstack.physics.rotor.PerformanceMap;

/**
 * The predicted performance shown in the report: the map with its uncertainty band, the operating point and,
 * where the spec gives a generator, the generator's load curve.
 *
 * @param map             estimate, optimistic and pessimistic curves from stall to runaway
 * @param operatingPoint  the predicted operating point
 * @param operatingBasis  what sets the operating point, in words ("generator with a 15 ohm load")
 * @param generator       the generator load curve, when the spec has a generator
 */
public record PerformanceData(PerformanceMap map, OperatingPoint operatingPoint, String operatingBasis,
        Optional<GeneratorCurve> generator) {

    public PerformanceData {
        Objects.requireNonNull(map, "map");
        Objects.requireNonNull(operatingPoint, "operatingPoint");
        Objects.requireNonNull(operatingBasis, "operatingBasis");
        Objects.requireNonNull(generator, "generator");
    }

    /**
     * A DC generator on a resistive load: its torque and electrical power against speed.
     *
     * @param loadResistanceOhm  the load
     * @param points             the curve at the map's speeds
     * @param electricalPowerW   electrical power into the load at the operating point
     * @param terminalVoltageV   voltage across the load at the operating point
     */
    public record GeneratorCurve(double loadResistanceOhm, List<GeneratorSample> points, double electricalPowerW,
            double terminalVoltageV) {
        public GeneratorCurve {
            points = List.copyOf(points);
        }
    }

    /** One point of the generator curve. */
    public record GeneratorSample(double speedRadPerS, double torqueNm, double electricalPowerW) {
    }
}
