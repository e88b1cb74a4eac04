package org.holdfast.weighing;

/**
 * A pair today: separation, radial and tangential relative velocity, and the time since the
 * Big Bang.
 *
 * @param separationKpc today's separation, &gt; 0
 * @param radialKms relative radial velocity, km/s (negative: approaching)
 * @param tangentialKms relative tangential velocity, km/s (&gt;= 0)
 * @param ageGyr time since the Big Bang, Gyr
 */
public record PairMotion(double separationKpc, double radialKms, double tangentialKms, double ageGyr) {

    /** Checks the numbers; the message names what is wrong. */
    public PairMotion {
        if (!(separationKpc > 0) || Double.isInfinite(separationKpc)) {
            throw new IllegalArgumentException("separation must be a positive number of kpc, got " + separationKpc);
        }
        if (!Double.isFinite(radialKms)) {
            throw new IllegalArgumentException("radial velocity must be a finite number of km/s, got " + radialKms);
        }
        if (!(tangentialKms >= 0) || Double.isInfinite(tangentialKms)) {
            throw new IllegalArgumentException("tangential velocity must be >= 0 km/s, got " + tangentialKms);
        }
        if (!(ageGyr > 0) || Double.isInfinite(ageGyr)) {
            throw new IllegalArgumentException("age must be a positive number of Gyr, got " + ageGyr);
        }
    }
}
