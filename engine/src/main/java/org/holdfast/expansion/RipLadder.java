package org.holdfast.expansion;

import java.util.ArrayList;
import java.util.List;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.holdfast.units.Units;

/**
 * When bound systems of different sizes come apart before a big rip: a group of galaxies, a
 * galaxy, a planetary system, a planet, an atom.
 *
 * <p>For the gravitational ones, two answers. <b>holdfast's criterion</b> is the one its fate
 * tracker applies ({@code fates.Binding}): a pair of total mass M sees the effective potential
 * U(r) = -G M / r - k r^2 / 2 + L^2 / (2 r^2) (Nesseris &amp; Perivolaropoulos 2004, PRD 70,
 * 123529, journal reference from memory). A circular orbit of radius R keeps its angular
 * momentum, L^2 = G M R, while k grows slowly; it stays bound as long as U has a barrier,
 * which holds while k &lt; (27/256) G M / R^3 (U' = U'' = 0 at r = 4R/3: the minimum the orbit
 * sits in merges with the barrier). A body at rest on a planet's surface (L = 0) stays while the
 * zero-gravity radius (G M / k)^(1/3) lies outside it: k &lt; G M / R^3. <b>The rougher rule</b>
 * of Caldwell, Kamionkowski &amp; Weinberg 2003 (PRL 91, 071301): a system of period P comes
 * apart about P sqrt(2 |1 + 3w|) / (6 pi |1 + w|) before the rip, the moment the dark-energy
 * push k R equals gravity's pull G M / R^2 (their rule is k = G M / R^3 with k from the
 * constant-w solution, the same as holdfast's for L = 0; for an orbit holdfast's criterion
 * comes sqrt(256/27) = 3.08 times earlier, as Nesseris &amp; Perivolaropoulos found).
 *
 * <p>The atom is held by electromagnetism, not gravity: its row is the usual order-of-magnitude
 * estimate, the same rule applied to the period of the Bohr orbit, and is marked as such.
 *
 * <p>Beyond the end of the expansion table (a ten-millionth of the age at the rip before it) k is
 * continued as k_end (tau_end / tau)^2, the late-time form of a rip at constant w, where
 * H = 2 / (3 |1 + w| tau) (Caldwell, Kamionkowski &amp; Weinberg 2003, from a ~ tau^(2/(3(1+w))))
 * and k = -(1 + 3w) H^2 / 2 once dark energy dominates.
 */
public final class RipLadder {

    /** Nominal terrestrial mass parameter GM_E, m^3/s^2 (IAU 2015 Resolution B3). */
    static final double GM_EARTH_SI = 3.986004e14;
    /** Nominal equatorial radius of the Earth, m (IAU 2015 Resolution B3). */
    static final double R_EARTH_M = 6.3781e6;
    /** Bohr radius, m (CODATA 2018). */
    static final double BOHR_RADIUS_M = 5.29177210903e-11;
    /** Speed of the electron on the Bohr orbit, alpha c, m/s (CODATA 2018 fine-structure constant). */
    static final double BOHR_SPEED_MS = 7.2973525693e-3 * Units.C_SI;
    /** Sun's distance from the galactic centre, kpc (GRAVITY Collaboration 2018, A&amp;A 615, L15). */
    static final double GALAXY_RADIUS_KPC = 8.122;
    /**
     * Circular speed there, km/s: the Sun's V = 245.6 km/s (Drimmel &amp; Poggio 2018, RNAAS 2,
     * 210) less its 12.24 km/s lead over the local standard of rest (Schoenrich, Binney &amp;
     * Dehnen 2010, MNRAS 403, 1829).
     */
    static final double GALAXY_SPEED_KMS = 245.6 - 12.24;

    /**
     * One system on the ladder.
     *
     * @param system what it is, in words
     * @param key a short key for JSON and cue sheets
     * @param massMsun the mass holding it together (NaN for the atom)
     * @param radiusKpc its size (orbit radius, or the planet's radius)
     * @param periodGyr its orbital period (for the planet: of an orbit grazing its surface)
     * @param holdfastBeforeRipGyr holdfast's criterion: time before the rip it comes apart (0 or
     *        less: already unbound today; NaN for the atom)
     * @param ckwBeforeRipGyr Caldwell, Kamionkowski &amp; Weinberg's rule
     * @param orderOfMagnitude true for the atom's estimate
     */
    public record Rung(String system, String key, double massMsun, double radiusKpc, double periodGyr,
            double holdfastBeforeRipGyr, double ckwBeforeRipGyr, boolean orderOfMagnitude) {

        /** The time before the rip to show: holdfast's where it applies, else the rougher rule. */
        public double beforeRipGyr() {
            return Double.isNaN(holdfastBeforeRipGyr) ? ckwBeforeRipGyr : holdfastBeforeRipGyr;
        }
    }

    private final ExpansionTable table;
    private final double rip;
    private final double tauEnd;
    private final double kEnd;
    private final double wEnd;

    private RipLadder(ExpansionTable table) {
        this.table = table;
        this.rip = table.ripGyr().getAsDouble();
        this.tauEnd = rip - table.latestGyr();
        this.kEnd = table.darkEnergyAcceleration(table.latestGyr());
        this.wEnd = table.equationOfState(table.latestGyr());
    }

    /**
     * The ladder for a universe that ends in a rip: the group (mass and radius given, or none
     * when {@code groupMassMsun} is NaN), a large spiral galaxy like our own, a planetary system like the
     * Sun's, an Earth-like planet and a hydrogen atom; empty without a rip.
     */
    public static List<Rung> of(ExpansionTable table, String groupName, double groupMassMsun, double groupRadiusKpc) {
        if (table.ripGyr().isEmpty()) {
            return List.of();
        }
        RipLadder l = new RipLadder(table);
        List<Rung> out = new ArrayList<>();
        if (groupMassMsun > 0 && groupRadiusKpc > 0) {
            out.add(l.orbit(groupName, "group", groupMassMsun, groupRadiusKpc));
        }
        double galaxyMass = GALAXY_SPEED_KMS * GALAXY_SPEED_KMS * GALAXY_RADIUS_KPC / (Units.G * Units.KPC_PER_GYR_TO_KMS
                * Units.KPC_PER_GYR_TO_KMS);
        out.add(l.orbit("a large spiral galaxy like ours (a star 8.1 kpc out)", "galaxy", galaxyMass,
                GALAXY_RADIUS_KPC));
        out.add(l.orbit("a solar system (the Earth's orbit)", "solar_system", 1.0, Units.AU_M / Units.KPC_M));
        out.add(l.surface("an Earth-like planet (by its gravity alone)", "planet", GM_EARTH_SI / Units.GM_SUN_SI,
                R_EARTH_M / Units.KPC_M));
        double bohrPeriodGyr = 2 * Math.PI * BOHR_RADIUS_M / BOHR_SPEED_MS / Units.GYR_S;
        out.add(new Rung("an atom (order of magnitude only)", "atom", Double.NaN, BOHR_RADIUS_M / Units.KPC_M,
                bohrPeriodGyr, Double.NaN, l.ckw(bohrPeriodGyr), true));
        return out;
    }

    /**
     * The mass and radius of a group as one circular orbit: the total mass, and the mass-weighted
     * mean distance of the other members from the heaviest (for a pair, their separation).
     *
     * @param mass members' masses, Msun
     * @param pos members' positions, kpc, pos[i] = {x, y, z}
     * @return {M, R}; R is NaN for fewer than two members
     */
    public static double[] groupScale(double[] mass, double[][] pos) {
        int heavy = 0;
        double total = 0;
        for (int i = 0; i < mass.length; i++) {
            total += mass[i];
            if (mass[i] > mass[heavy]) {
                heavy = i;
            }
        }
        double sum = 0;
        double weight = 0;
        for (int i = 0; i < mass.length; i++) {
            if (i != heavy) {
                double dx = pos[i][0] - pos[heavy][0];
                double dy = pos[i][1] - pos[heavy][1];
                double dz = pos[i][2] - pos[heavy][2];
                sum += mass[i] * Math.sqrt(dx * dx + dy * dy + dz * dz);
                weight += mass[i];
            }
        }
        return new double[] {total, weight > 0 ? sum / weight : Double.NaN};
    }

    /** A circular orbit of radius r about mass m. */
    private Rung orbit(String name, String key, double m, double r) {
        double gm = Units.G * m;
        double period = 2 * Math.PI * Math.sqrt(r * r * r / gm);
        double kCrit = 27.0 / 256.0 * gm / (r * r * r);
        return new Rung(name, key, m, r, period, timeLeftAt(kCrit), ckw(period), false);
    }

    /** A body at rest on the surface of a sphere of mass m and radius r. */
    private Rung surface(String name, String key, double m, double r) {
        double gm = Units.G * m;
        double period = 2 * Math.PI * Math.sqrt(r * r * r / gm);
        return new Rung(name, key, m, r, period, timeLeftAt(gm / (r * r * r)), ckw(period), false);
    }

    /** Caldwell, Kamionkowski &amp; Weinberg 2003: P sqrt(2 |1 + 3w|) / (6 pi |1 + w|), w at the rip. */
    double ckw(double periodGyr) {
        return periodGyr * Math.sqrt(2 * Math.abs(1 + 3 * wEnd)) / (6 * Math.PI * Math.abs(1 + wEnd));
    }

    /**
     * Time before the rip at which k(t) first reaches kCrit, from today on: 0 or less when it
     * already has today (the value is then minus the time since).
     */
    double timeLeftAt(double kCrit) {
        double now = Math.max(0, table.earliestGyr());
        if (table.darkEnergyAcceleration(now) >= kCrit) {
            return rip - now;
        }
        if (kCrit > kEnd) {
            return tauEnd * Math.sqrt(kEnd / kCrit);
        }
        // scan in ln(time left) for the first crossing, then refine with Brent's method
        double lnHi = Math.log(rip - now);
        double lnLo = Math.log(tauEnd);
        int n = 400;
        double prevT = now;
        for (int i = 1; i <= n; i++) {
            double t = i == n ? table.latestGyr() : rip - Math.exp(lnHi + (lnLo - lnHi) * i / n);
            if (table.darkEnergyAcceleration(t) >= kCrit) {
                double lo = prevT;
                double hit = new BrentSolver(1e-14, 1e-15 * Math.max(1, rip)).solve(200,
                        x -> table.darkEnergyAcceleration(x) - kCrit, lo, t);
                return rip - hit;
            }
            prevT = t;
        }
        return tauEnd * Math.sqrt(kEnd / kCrit);
    }
}
