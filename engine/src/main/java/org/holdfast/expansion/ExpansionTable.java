package org.holdfast.expansion;

import java.util.Locale;
import java.util.OptionalDouble;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.holdfast.units.Units;

/**
 * A solved expansion history: a(t), H(t), the dark-energy term k(t) and their rates from a
 * table built once by {@link TableBuilder}, plus the landmarks a cosmologist asks for (age,
 * big rip, turnaround and crunch, onset of acceleration).
 *
 * <p>The table runs from 10 kyr after the Big Bang (or a millionth of the age, if that is
 * shorter) to whichever comes first of: a ten-millionth of the time from the Big Bang to a big
 * rip before the rip, a = e^600 on the way to a rip, the crunch (mirrored from the Big Bang,
 * since a recollapsing Friedmann universe retraces its expansion), or the far-future horizon
 * the cosmology was solved with. Lookups in the middle segment cost one multiply, a cast and a
 * fifth-order Horner sum.
 */
public final class ExpansionTable implements ExpansionHistory {

    private static final int LNA = 0;
    private static final int HUB = 1;
    private static final int HDOT = 2;
    private static final int K = 3;
    private static final int KDOT = 4;

    private final Cosmology cosmology;
    private final Segment early;
    private final Segment mid;
    private final Segment late;
    private final double tBB;
    private final double tRip;
    private final double tMax;
    private final double aMax;
    private final double earliest;
    private final double latest;
    private final double horizonGyr;
    private final double halfH02Om;
    // the middle segment, unpacked for the fast path
    private final double midStart;
    private final double midEnd;
    private final double midInvH;
    private final int midN;
    private final double[] midL;
    private final double[] midH;
    private final double[] midK;
    private final OptionalDouble accelerationBegan;

    ExpansionTable(Cosmology cosmology, Segment early, Segment mid, Segment late, double tBB, double tRip,
            double tMax, double aMax, double earliest, double latest, double horizonGyr) {
        this.cosmology = cosmology;
        this.early = early;
        this.mid = mid;
        this.late = late;
        this.tBB = tBB;
        this.tRip = tRip;
        this.tMax = Double.isNaN(tMax) ? Double.POSITIVE_INFINITY : tMax;
        this.aMax = aMax;
        this.earliest = earliest;
        this.latest = latest;
        this.horizonGyr = horizonGyr;
        double h0 = cosmology.h0PerGyr();
        this.halfH02Om = 0.5 * h0 * h0 * cosmology.omegaM();
        this.midStart = mid.u0;
        this.midEnd = mid.u1;
        this.midInvH = mid.invH;
        this.midN = mid.intervals;
        this.midL = mid.lnA;
        this.midH = mid.hub;
        this.midK = mid.k;
        this.accelerationBegan = findAccelerationOnset();
    }

    // ---- the hot lookups ------------------------------------------------------------------

    /** ln a(t). */
    public double lnScaleFactor(double tGyr) {
        if (tGyr >= midStart && tGyr <= midEnd) {
            double x = (tGyr - midStart) * midInvH;
            int i = (int) x;
            if (i >= midN) {
                i = midN - 1;
            }
            return Segment.value(midL, i, x - i);
        }
        return slow(tGyr, LNA);
    }

    @Override
    public double scaleFactor(double tGyr) {
        return Math.exp(lnScaleFactor(tGyr));
    }

    @Override
    public double hubbleRate(double tGyr) {
        if (tGyr >= midStart && tGyr <= midEnd) {
            double x = (tGyr - midStart) * midInvH;
            int i = (int) x;
            if (i >= midN) {
                i = midN - 1;
            }
            return Segment.value(midH, i, x - i);
        }
        return slow(tGyr, HUB);
    }

    @Override
    public double darkEnergyAcceleration(double tGyr) {
        if (tGyr >= midStart && tGyr <= midEnd) {
            double x = (tGyr - midStart) * midInvH;
            int i = (int) x;
            if (i >= midN) {
                i = midN - 1;
            }
            return Segment.value(midK, i, x - i);
        }
        return slow(tGyr, K);
    }

    @Override
    public double darkEnergyAccelerationRate(double tGyr) {
        return slow(tGyr, KDOT);
    }

    @Override
    public double totalAcceleration(double tGyr) {
        double h = hubbleRate(tGyr);
        return slow(tGyr, HDOT) + h * h;
    }

    @Override
    public double matterAcceleration(double tGyr) {
        return -halfH02Om * Math.exp(-3 * lnScaleFactor(tGyr));
    }

    private double slow(double tGyr, int what) {
        if (!(tGyr >= earliest && tGyr <= latest)) {
            throw outOfRange(tGyr);
        }
        double t = tGyr;
        double sign = 1;
        if (t > tMax) {
            t = 2 * tMax - t;
            sign = -1;
        }
        Segment seg;
        double u;
        double dtdu;
        if (t < midStart) {
            double tau = t - tBB;
            seg = early;
            u = Math.log(tau);
            dtdu = tau;
        } else if (t <= midEnd || late == null) {
            seg = mid;
            u = t;
            dtdu = 1;
        } else {
            double rho = tRip - t;
            seg = late;
            u = -Math.log(rho);
            dtdu = rho;
        }
        int i = seg.index(u);
        double s = (u - seg.u0) * seg.invH - i;
        switch (what) {
            case LNA:
                return Segment.value(seg.lnA, i, s);
            case HUB:
                return sign * Segment.value(seg.hub, i, s);
            case HDOT:
                return Segment.slope(seg.hub, i, s) * seg.invH / dtdu;
            case K:
                return Segment.value(seg.k, i, s);
            default:
                return sign * Segment.slope(seg.k, i, s) * seg.invH / dtdu;
        }
    }

    private ExpansionRangeException outOfRange(double t) {
        String at = String.format(Locale.ROOT, "t = %.6g Gyr", t);
        if (Double.isNaN(t)) {
            return new ExpansionRangeException(t, "the time asked for is not a number");
        }
        if (t < earliest) {
            if (t <= tBB) {
                return new ExpansionRangeException(t, String.format(Locale.ROOT,
                        "%s is before the Big Bang at t = %.6g Gyr", at, tBB));
            }
            return new ExpansionRangeException(t, String.format(Locale.ROOT,
                    "%s is too close to the Big Bang at t = %.6g Gyr; the expansion table starts at t = %.6g Gyr",
                    at, tBB, earliest));
        }
        if (!Double.isNaN(tRip)) {
            if (t >= tRip) {
                return new ExpansionRangeException(t, String.format(Locale.ROOT,
                        "%s is at or past the big rip at t = %.6g Gyr; H and rho_de diverge there", at, tRip));
            }
            return new ExpansionRangeException(t, String.format(Locale.ROOT,
                    "%s is past the end of the expansion table at t = %.6g Gyr (the big rip comes at t = %.6g Gyr)",
                    at, latest, tRip));
        }
        if (crunchGyr().isPresent()) {
            return new ExpansionRangeException(t, String.format(Locale.ROOT,
                    "%s is at or past the big crunch at t = %.6g Gyr; lookups end at t = %.6g Gyr",
                    at, crunchGyr().getAsDouble(), latest));
        }
        return new ExpansionRangeException(t, String.format(Locale.ROOT,
                "%s is past the far-future end of the expansion table at t = %.6g Gyr", at, latest));
    }

    // ---- landmarks --------------------------------------------------------------------------

    public Cosmology cosmology() {
        return cosmology;
    }

    /** Time since the Big Bang today, Gyr. */
    public double ageGyr() {
        return -tBB;
    }

    /** The Big Bang, Gyr from today (minus the age). */
    public double bigBangGyr() {
        return tBB;
    }

    /** Time of the big rip, Gyr from today, if the dark energy is phantom enough to rip. */
    public OptionalDouble ripGyr() {
        return Double.isNaN(tRip) ? OptionalDouble.empty() : OptionalDouble.of(tRip);
    }

    /** Time of maximum expansion (turnaround), Gyr from today, for a recollapsing universe. */
    public OptionalDouble maxExpansionGyr() {
        return Double.isInfinite(tMax) ? OptionalDouble.empty() : OptionalDouble.of(tMax);
    }

    /** The largest scale factor, at the turnaround, for a recollapsing universe. */
    public OptionalDouble maxScaleFactor() {
        return Double.isNaN(aMax) ? OptionalDouble.empty() : OptionalDouble.of(aMax);
    }

    /** Time of the big crunch, Gyr from today: as long after the turnaround as the Big Bang was before it. */
    public OptionalDouble crunchGyr() {
        return Double.isInfinite(tMax) ? OptionalDouble.empty() : OptionalDouble.of(2 * tMax - tBB);
    }

    /**
     * When the expansion began to accelerate (a''/a turned positive), Gyr from today: the most
     * recent onset before today if the expansion accelerates now, otherwise the next one in the
     * table, if any.
     */
    public OptionalDouble accelerationBeganGyr() {
        return accelerationBegan;
    }

    /** The far-future horizon the table was built for, Gyr after today. */
    public double horizonGyr() {
        return horizonGyr;
    }

    @Override
    public double earliestGyr() {
        return earliest;
    }

    @Override
    public double latestGyr() {
        return latest;
    }

    @Override
    public double criticalDensityToday() {
        return cosmology.criticalDensity();
    }

    @Override
    public double darkEnergyDensity(double tGyr) {
        double lnA = lnScaleFactor(tGyr);
        double ode = cosmology.omegaDe();
        return ode == 0 ? 0 : ode * cosmology.criticalDensity() * Math.exp(cosmology.darkEnergy().lnDensityRatio(lnA));
    }

    /** Dark-energy density at t in kg/m^3. */
    public double darkEnergyDensityKgM3(double tGyr) {
        return darkEnergyDensity(tGyr) * Units.MSUN_PER_KPC3_TO_KG_PER_M3;
    }

    /** Equation of state w at t. */
    public double equationOfState(double tGyr) {
        return cosmology.darkEnergy().w(scaleFactor(tGyr));
    }

    /** The end of the expanding branch: the turnaround, or the end of the table. */
    public double expandingUntilGyr() {
        return Math.min(tMax, latest);
    }

    /**
     * The time, Gyr from today, at which the expanding universe reaches scale factor a
     * (Brent's method on the table).
     *
     * @throws ExpansionRangeException if the expanding branch never reaches a
     */
    public double timeAtScaleFactor(double a) {
        double target = Math.log(a);
        double lo = earliest;
        double hi = expandingUntilGyr();
        if (!(target >= lnScaleFactor(lo) && target <= lnScaleFactor(hi))) {
            throw new ExpansionRangeException(Double.NaN, String.format(Locale.ROOT,
                    "the expansion table never reaches a = %.6g", a));
        }
        return new BrentSolver(1e-14, 1e-13).solve(200, t -> lnScaleFactor(t) - target, lo, hi);
    }

    /** Number of table intervals, all segments together. */
    public int intervals() {
        return early.intervals + mid.intervals + (late == null ? 0 : late.intervals);
    }

    /** Bytes held by the table. */
    public long tableBytes() {
        return early.bytes() + mid.bytes() + (late == null ? 0 : late.bytes());
    }

    private OptionalDouble findAccelerationOnset() {
        double lEnd = lnScaleFactor(expandingUntilGyr());
        double lStart = lnScaleFactor(earliest);
        boolean now = cosmology.accelerationOverH02(0) > 0;
        double step = 0.01;
        if (now) {
            for (double l = 0; l - step > lStart; l -= step) {
                if (cosmology.accelerationOverH02(l - step) <= 0) {
                    return OptionalDouble.of(timeAtLnA(root(l - step, l)));
                }
            }
            return OptionalDouble.empty();
        }
        for (double l = 0; l + step < lEnd; l += step) {
            if (cosmology.accelerationOverH02(l + step) > 0) {
                return OptionalDouble.of(timeAtLnA(root(l, l + step)));
            }
        }
        return OptionalDouble.empty();
    }

    private double root(double lo, double hi) {
        return new BrentSolver(1e-15, 1e-14).solve(200, cosmology::accelerationOverH02, lo, hi);
    }

    private double timeAtLnA(double lnA) {
        return timeAtScaleFactor(Math.exp(lnA));
    }
}
