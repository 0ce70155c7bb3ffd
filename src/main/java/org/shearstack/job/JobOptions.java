package org.shearstack.job;

/**
 * How much a design job does.
 *
 * @param meshes     build the kit's meshes, plates and files (false for check-only sweeps)
 * @param preview    try to render the assembly picture (needs a display; skipped quietly without one)
 * @param mapPoints  speeds in the performance map, stall to runaway (at least 2)
 */
public record JobOptions(boolean meshes, boolean preview, int mapPoints) {

    public static final int DEFAULT_MAP_POINTS = 41;

    public JobOptions {
        if (mapPoints < 2) {
            throw new IllegalArgumentException("the performance map needs at least 2 points, found " + mapPoints);
        }
    }

    /** Everything: meshes, preview when a display is there, a 41-point map. */
    public static JobOptions full() {
        return new JobOptions(true, true, DEFAULT_MAP_POINTS);
    }

    /** Resolve, model and check only: no meshes, no picture, a coarser map (family sweeps). */
    public static JobOptions checkOnly() {
        return new JobOptions(false, false, 21);
    }

    public JobOptions withPreview(boolean value) {
        return new JobOptions(meshes, value, mapPoints);
    }
}
