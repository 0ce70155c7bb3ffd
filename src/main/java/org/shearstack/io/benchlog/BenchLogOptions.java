package org.shearstack.io.benchlog;

import java.util.Optional;

/**
 * Units given outside the file (command-line options); empty means "take it from the header".
 *
 * @param timeUnit  unit of the time column
 * @param speedUnit unit of the speed column
 */
public record BenchLogOptions(Optional<LogTimeUnit> timeUnit, Optional<SpeedUnit> speedUnit) {
    /** No units given: the header must carry them. */
    public static final BenchLogOptions FROM_HEADER = new BenchLogOptions(Optional.empty(), Optional.empty());
}
