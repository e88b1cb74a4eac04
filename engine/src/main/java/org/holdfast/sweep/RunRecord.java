package org.holdfast.sweep;

import java.io.Serializable;

/**
 * One finished run, as the journal keeps it.
 *
 * @param run run index in the whole sweep
 * @param point grid-point index
 * @param sample sample index at that point
 * @param seed the run's own seed
 * @param outcome what the run found
 */
public record RunRecord(long run, int point, int sample, long seed, RunOutcome outcome) implements Serializable {

    private static final long serialVersionUID = 1L;
}
