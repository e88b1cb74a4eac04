package org.holdfast.run;

/**
 * How a run steps and what it includes.
 *
 * @param startGyr start time, Gyr from today
 * @param untilGyr end time, Gyr from today; below startGyr the run goes into the past
 * @param scheme the integrator
 * @param accuracy step-size parameter of the adaptive step; NaN for a fixed step
 * @param stepMyr the fixed step in Myr; NaN for an adaptive step
 * @param snapshotEveryMyr interval between snapshots
 * @param darkEnergyForce include the dark-energy term k(t) r
 * @param backgroundMatter include the pull of the mean cosmic matter density
 * @param seed for everything random (tracer placement)
 */
public record RunSettings(double startGyr, double untilGyr, Scheme scheme, double accuracy, double stepMyr,
        double snapshotEveryMyr, boolean darkEnergyForce, boolean backgroundMatter, long seed) {

    /** The integration schemes. */
    public enum Scheme {
        /** Kick-drift-kick leapfrog, second order. */
        LEAPFROG("leapfrog"),
        /** Yoshida's fourth-order composition of leapfrogs (Yoshida 1990, Phys. Lett. A 150, 262). */
        YOSHIDA4("yoshida4");

        private final String key;

        Scheme(String key) {
            this.key = key;
        }

        /** The name used in scenario files. */
        public String key() {
            return key;
        }

        /** The scheme of a scenario name, or null. */
        public static Scheme of(String key) {
            for (Scheme s : values()) {
                if (s.key.equals(key)) {
                    return s;
                }
            }
            return null;
        }
    }

    /** Whether the step is fixed (stepMyr given) rather than adaptive. */
    public boolean fixedStep() {
        return !Double.isNaN(stepMyr);
    }

    /** Whether the run goes into the past. */
    public boolean backward() {
        return untilGyr < startGyr;
    }
}
