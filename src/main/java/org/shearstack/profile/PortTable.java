package org.shearstack.profile;

import java.util.List;
import java.util.Optional;

/**
 * Threaded ports and the push-in pilot rule: pilot = tube OD + clearance, depth = factor × tube OD
 * (common practice).
 */
public record PortTable(String name, String source, String standard, List<Port> ports, double pushInClearanceMm,
                        double pushInDepthFactor) {

    public PortTable {
        ports = List.copyOf(ports);
    }

    public Optional<Port> find(String port) {
        return ports.stream().filter(p -> p.port().equals(port)).findFirst();
    }

    public double pushInPilotMm(double tubeOdMm) {
        return tubeOdMm + pushInClearanceMm;
    }

    public double pushInDepthMm(double tubeOdMm) {
        return tubeOdMm * pushInDepthFactor;
    }
}
