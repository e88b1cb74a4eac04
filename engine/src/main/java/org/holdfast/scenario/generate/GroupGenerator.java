package org.holdfast.scenario.generate;

import java.util.ArrayList;
import java.util.List;

import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.ContinuousSampler;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.apache.commons.rng.simple.RandomSource;
import org.holdfast.units.Units;

/**
 * Builds a random, plausible group from a {@link GroupRecipe}.
 *
 * <ul>
 * <li>Masses: drawn from a power-law mass function dN/dM &prop; M^-1.9, the slope of the
 * subhalo mass function of Springel et al. 2008 (MNRAS 391, 1685; slope from memory), giants
 * between 0.25 and 1 and dwarfs between 0.001 and 0.025 of a common upper mass, then all
 * scaled together so that they add up to the total asked for.</li>
 * <li>Places: uniform inside the sphere, no two members closer than a tenth of the mean
 * spacing; then shifted so that the centre of mass is at the origin and, if that shift took a
 * member outside the sphere, all drawn in towards the centre by one factor so that the
 * farthest lies on it (the shape of the group is kept; a heavy member off-centre is what
 * moves the centre of mass).</li>
 * <li>Velocities: isotropic Gaussian directions and sizes, the centre-of-mass velocity removed,
 * then scaled by one factor so that 2T/|W| equals the virial ratio asked for, where T is the
 * kinetic energy and W = -sum G m_i m_j / r_ij the potential energy of the members as point
 * masses (halo overlap ignored: the members start well apart).</li>
 * <li>Halos: NFW with the z = 0 mass–concentration relation of Dutton &amp; Macci&ograve; 2014
 * (MNRAS 441, 3359, eqs. 7 and 8, for M_200c, Planck cosmology; coefficients from memory):
 * log10 c = 0.905 - 0.101 log10(M / 10^12 h^-1 Msun).</li>
 * <li>Stars: giants get a disk, dwarfs a sphere, with scale length lambda r_200 / sqrt 2,
 * lambda = 0.035 (the disk-size estimate of Mo, Mao &amp; White 1998, MNRAS 295, 319, eq. 12
 * without its order-unity profile factors; from memory), spin axes in random directions.</li>
 * </ul>
 */
public final class GroupGenerator {

    /** Planck 2018 (A&amp;A 641, A6, 2020, Table 2, TT,TE,EE+lowE+lensing+BAO): H0 in km/s/Mpc. */
    public static final double PLANCK18_H0 = 67.66;

    /** Planck 2018, same column: matter density parameter. */
    public static final double PLANCK18_OMEGA_M = 0.3111;

    /** Slope of the mass function dN/dM &prop; M^-ALPHA. */
    static final double ALPHA = 1.9;

    /** Dimensionless spin parameter used for disk sizes. */
    static final double SPIN_LAMBDA = 0.035;

    /** One generated member. */
    public record Member(String name, boolean giant, double massMsun, double[] positionKpc, double[] velocityKms,
            double concentration, double starRadiusKpc, double[] spinAxis) {
    }

    private GroupGenerator() {
    }

    /** The members, in order: giants first, then dwarfs. */
    public static List<Member> generate(GroupRecipe r) {
        UniformRandomProvider rng = RandomSource.L64_X128_MIX.create(r.seed());
        ContinuousSampler gauss = ZigguratSampler.NormalizedGaussian.of(rng);
        int n = r.members();
        double[] m = masses(r, rng);
        double[][] x = places(n, r.radiusKpc(), rng);
        double[][] v = new double[n][3];
        for (double[] vi : v) {
            for (int k = 0; k < 3; k++) {
                vi[k] = gauss.sample();
            }
        }
        centre(m, x);
        fitInside(x, r.radiusKpc());
        centre(m, v);
        double t = kineticEnergy(m, v);
        double w = potentialEnergy(m, x);
        double scale = t > 0 ? Math.sqrt(r.virialRatio() * Math.abs(w) / (2 * t)) : 0;
        for (double[] vi : v) {
            for (int k = 0; k < 3; k++) {
                vi[k] *= scale;
            }
        }
        NameMaker names = new NameMaker(rng);
        List<Member> out = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            out.add(new Member(names.next(), i < r.giants(), m[i], x[i], v[i], concentration(m[i]),
                    starRadiusKpc(m[i]), unitVector(gauss)));
        }
        return out;
    }

    private static double[] masses(GroupRecipe r, UniformRandomProvider rng) {
        int n = r.members();
        double[] m = new double[n];
        double sum = 0;
        for (int i = 0; i < n; i++) {
            boolean giant = i < r.giants();
            m[i] = powerLaw(giant ? 0.25 : 0.001, giant ? 1.0 : 0.025, rng.nextDouble());
            sum += m[i];
        }
        for (int i = 0; i < n; i++) {
            m[i] *= r.massMsun() / sum;
        }
        return m;
    }

    /** Inverse of the cumulative distribution of dN/dM &prop; M^-ALPHA on [lo, hi]. */
    static double powerLaw(double lo, double hi, double u) {
        double e = 1 - ALPHA;
        double a = Math.pow(lo, e);
        double b = Math.pow(hi, e);
        return Math.pow(a + u * (b - a), 1 / e);
    }

    private static double[][] places(int n, double radius, UniformRandomProvider rng) {
        double minSep = 0.1 * radius / Math.cbrt(n);
        double[][] x = new double[n][];
        for (int i = 0; i < n; i++) {
            for (int attempt = 0; ; attempt++) {
                double[] p = {radius * (2 * rng.nextDouble() - 1), radius * (2 * rng.nextDouble() - 1),
                    radius * (2 * rng.nextDouble() - 1)};
                if (p[0] * p[0] + p[1] * p[1] + p[2] * p[2] > radius * radius) {
                    continue;
                }
                boolean clear = true;
                for (int j = 0; j < i && clear; j++) {
                    clear = distance(p, x[j]) >= minSep;
                }
                if (clear || attempt > 100_000) {
                    x[i] = p;
                    break;
                }
            }
        }
        return x;
    }

    /** Scales positions about the origin by one factor, if needed, so that none lies beyond the radius. */
    static void fitInside(double[][] x, double radius) {
        double far = 0;
        for (double[] p : x) {
            far = Math.max(far, Math.sqrt(p[0] * p[0] + p[1] * p[1] + p[2] * p[2]));
        }
        if (far <= radius) {
            return;
        }
        double f = radius / far;
        for (double[] p : x) {
            for (int k = 0; k < 3; k++) {
                p[k] *= f;
            }
        }
    }

    /** Moves a set of vectors to their mass-weighted mean. */
    static void centre(double[] m, double[][] q) {
        double mt = 0;
        double[] c = new double[3];
        for (int i = 0; i < m.length; i++) {
            mt += m[i];
            for (int k = 0; k < 3; k++) {
                c[k] += m[i] * q[i][k];
            }
        }
        for (double[] qi : q) {
            for (int k = 0; k < 3; k++) {
                qi[k] -= c[k] / mt;
            }
        }
    }

    /** T = sum m v^2 / 2, in Msun (km/s)^2. */
    public static double kineticEnergy(double[] m, double[][] vKms) {
        double t = 0;
        for (int i = 0; i < m.length; i++) {
            double[] v = vKms[i];
            t += 0.5 * m[i] * (v[0] * v[0] + v[1] * v[1] + v[2] * v[2]);
        }
        return t;
    }

    /** W = -sum over pairs G m_i m_j / r_ij, in Msun (km/s)^2 (point masses). */
    public static double potentialEnergy(double[] m, double[][] xKpc) {
        double g = Units.G * Units.KPC_PER_GYR_TO_KMS * Units.KPC_PER_GYR_TO_KMS;
        double w = 0;
        for (int i = 0; i < m.length; i++) {
            for (int j = i + 1; j < m.length; j++) {
                w -= g * m[i] * m[j] / distance(xKpc[i], xKpc[j]);
            }
        }
        return w;
    }

    /** NFW concentration c_200c at z = 0 (Dutton &amp; Macci&ograve; 2014, eqs. 7-8). */
    public static double concentration(double m200Msun) {
        double h = PLANCK18_H0 / 100;
        return Math.pow(10, 0.905 - 0.101 * Math.log10(m200Msun * h / 1e12));
    }

    /** r_200c in kpc: the radius inside which the mean density is 200 times critical (Planck 2018 H0). */
    public static double r200Kpc(double m200Msun) {
        double hubble = Units.hubbleToPerGyr(PLANCK18_H0);
        double rhoCrit = 3 * hubble * hubble / (8 * Math.PI * Units.G);
        return Math.cbrt(3 * m200Msun / (4 * Math.PI * 200 * rhoCrit));
    }

    static double starRadiusKpc(double m200Msun) {
        return SPIN_LAMBDA / Math.sqrt(2) * r200Kpc(m200Msun);
    }

    private static double[] unitVector(ContinuousSampler gauss) {
        while (true) {
            double[] u = {gauss.sample(), gauss.sample(), gauss.sample()};
            double len = Math.sqrt(u[0] * u[0] + u[1] * u[1] + u[2] * u[2]);
            if (len > 1e-9) {
                return new double[] {u[0] / len, u[1] / len, u[2] / len};
            }
        }
    }

    private static double distance(double[] a, double[] b) {
        double dx = a[0] - b[0];
        double dy = a[1] - b[1];
        double dz = a[2] - b[2];
        return Math.sqrt(dx * dx + dy * dy + dz * dz);
    }
}
