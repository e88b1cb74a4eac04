package org.holdfast.expansion;

import org.holdfast.schema.ScenarioException;

/** A lookup of the expansion history at a time where it is not defined (past a rip, before the Big Bang). */
public final class ExpansionRangeException extends IllegalArgumentException {

    private static final long serialVersionUID = 1L;

    private final double tGyr;

    public ExpansionRangeException(double tGyr, String why) {
        super(why);
        this.tGyr = tGyr;
    }

    /** The time asked for, Gyr from today. */
    public double tGyr() {
        return tGyr;
    }

    /** The same problem as bad input of the option or key that asked for it. */
    public ScenarioException asInputError(String where, String key) {
        return new ScenarioException(where, key, getMessage());
    }
}
