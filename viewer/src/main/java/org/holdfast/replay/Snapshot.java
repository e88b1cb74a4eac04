package org.holdfast.replay;

/**
 * One saved state of a run, as {@link org.holdfast.output.SnapshotWriter} lays it out: galaxies
 * (names, masses, positions in kpc, velocities in km/s as float64[3][N]) and tracers (float32
 * positions and velocities as [3][M]). The file's host indexes its own galaxies; here each host
 * is already the index of the star's galaxy among the run's initial members (its colour index),
 * -1 for flow.
 */
record Snapshot(double tGyr, double scaleFactor, String[] names, double[][] positionKpc, double[][] velocityKms,
        float[][] tracerKpc, float[][] tracerKms, int[] tracerHost) {

    int galaxyCount() {
        return names.length;
    }

    int tracerCount() {
        return tracerHost.length;
    }

    /** Index of the galaxy called {@code name}, or -1. */
    int indexOf(String name) {
        for (int i = 0; i < names.length; i++) {
            if (names[i].equals(name)) {
                return i;
            }
        }
        return -1;
    }
}
