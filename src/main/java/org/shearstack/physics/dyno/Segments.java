package org.shearstack.physics.dyno;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * The run-up, steady and coast-down stretches of one log; each may be absent.
 */
public record Segments(Optional<Segment> runUp, Optional<Segment> steady, Optional<Segment> coastDown) {
    /** The present segments in time order. */
    public List<Segment> all() {
        List<Segment> out = new ArrayList<>();
        runUp.ifPresent(out::add);
        steady.ifPresent(out::add);
        coastDown.ifPresent(out::add);
        return out;
    }
}
