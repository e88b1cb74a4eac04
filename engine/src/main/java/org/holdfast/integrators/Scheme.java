package org.holdfast.integrators;

/** The integration schemes. */
public enum Scheme {
    /** Kick-drift-kick leapfrog, second order. */
    LEAPFROG("leapfrog"),
    /** Yoshida's fourth-order composition of leapfrogs (Yoshida 1990, Phys. Lett. A 150, 262). */
    YOSHIDA4("yoshida4"),
    /** IAS15, 15th-order Gauss-Radau with its own step control (Rein &amp; Spiegel 2015, MNRAS 446, 1424). */
    IAS15("ias15");

    private final String key;

    Scheme(String key) {
        this.key = key;
    }

    /** A new integrator of this scheme. */
    public Integrator integrator() {
        return Integrator.of(this);
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
