package org.holdfast.run;

import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.ContinuousSampler;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.apache.commons.rng.simple.RandomSource;
import org.holdfast.forces.Tracers;
import org.holdfast.group.FlowSpec;
import org.holdfast.group.StarsSpec;
import org.holdfast.halos.HaloProfile;
import org.holdfast.units.Units;

/**
 * Places massless tracers. Each galaxy's stars and the flow draw from their own random stream
 * (seed, index), so adding tracers to one member leaves the others unchanged.
 */
final class TracerSeeding {

    /** Outer cut of a stellar sphere, in scale radii. */
    private static final double SPHERE_CUT = 20;

    private TracerSeeding() {
    }

    private static UniformRandomProvider stream(long seed, int index) {
        return RandomSource.XO_SHI_RO_256_PP.create(new long[] {seed, index, 0x686f6c64L});
    }

    /**
     * An exponential disk of scale length R_d around a host at the origin of its own frame:
     * surface density exp(-R / R_d), so R follows a Gamma(2, R_d) law (Freeman 1970, ApJ 160,
     * 811 for the profile), in the plane normal to the spin axis, each star on the host's
     * circular speed counter-clockwise about the axis, plus a Gaussian dispersion per component.
     */
    static void disk(Tracers t, int from, int host, StarsSpec s, HaloProfile halo, double[] hostPos,
            double[] hostVel, long seed, int index) {
        UniformRandomProvider rng = stream(seed, index);
        ContinuousSampler gauss = ZigguratSampler.NormalizedGaussian.of(rng);
        double[] n = unit(s.normal());
        double[] e1 = perpendicular(n);
        double[] e2 = cross(n, e1);
        double sigma = Units.kmsToKpcPerGyr(s.dispersionKms());
        for (int j = from; j < from + s.count(); j++) {
            double r = -s.radiusKpc() * Math.log(rng.nextDouble(Double.MIN_NORMAL, 1) * rng.nextDouble(Double.MIN_NORMAL, 1));
            double phi = 2 * Math.PI * rng.nextDouble();
            double c = Math.cos(phi);
            double sn = Math.sin(phi);
            double vc = halo.circularSpeed(r);
            double[] pos = {r * (c * e1[0] + sn * e2[0]), r * (c * e1[1] + sn * e2[1]), r * (c * e1[2] + sn * e2[2])};
            double[] vel = {vc * (-sn * e1[0] + c * e2[0]), vc * (-sn * e1[1] + c * e2[1]), vc * (-sn * e1[2] + c * e2[2])};
            place(t, j, host, pos, vel, hostPos, hostVel, sigma, gauss);
        }
    }

    /**
     * An isotropic sphere with the density of a Plummer sphere of scale b (Plummer 1911; radii by
     * inverting M(&lt;r)/M = u, cut at 20 b), each star on a circular orbit of the host in a random
     * plane (isotropic orientations), plus a Gaussian dispersion per component.
     */
    static void sphere(Tracers t, int from, int host, StarsSpec s, HaloProfile halo, double[] hostPos,
            double[] hostVel, long seed, int index) {
        UniformRandomProvider rng = stream(seed, index);
        ContinuousSampler gauss = ZigguratSampler.NormalizedGaussian.of(rng);
        double sigma = Units.kmsToKpcPerGyr(s.dispersionKms());
        double b = s.radiusKpc();
        for (int j = from; j < from + s.count(); j++) {
            double r;
            do {
                double u = rng.nextDouble(Double.MIN_NORMAL, 1);
                r = b / Math.sqrt(Math.pow(u, -2.0 / 3) - 1);
            } while (!(r <= SPHERE_CUT * b));
            double[] dir = direction(rng);
            double[] e1 = perpendicular(dir);
            double[] e2 = cross(dir, e1);
            double psi = 2 * Math.PI * rng.nextDouble();
            double vc = halo.circularSpeed(r);
            double[] pos = {r * dir[0], r * dir[1], r * dir[2]};
            double[] vel = new double[3];
            for (int k = 0; k < 3; k++) {
                vel[k] = vc * (Math.cos(psi) * e1[k] + Math.sin(psi) * e2[k]);
            }
            place(t, j, host, pos, vel, hostPos, hostVel, sigma, gauss);
        }
    }

    /**
     * Flow tracers uniform in volume in a shell around the centre of mass, on the Hubble flow
     * v = H(t_start) r plus a Gaussian peculiar dispersion per component.
     */
    static void flow(Tracers t, int from, FlowSpec f, double hubble, long seed, int index) {
        UniformRandomProvider rng = stream(seed, index);
        ContinuousSampler gauss = ZigguratSampler.NormalizedGaussian.of(rng);
        double sigma = Units.kmsToKpcPerGyr(f.dispersionKms());
        double a3 = Math.pow(f.innerKpc(), 3);
        double b3 = Math.pow(f.outerKpc(), 3);
        double[] zero = {0, 0, 0};
        for (int j = from; j < from + f.count(); j++) {
            double r = Math.cbrt(a3 + rng.nextDouble() * (b3 - a3));
            double[] dir = direction(rng);
            double[] pos = {r * dir[0], r * dir[1], r * dir[2]};
            double[] vel = {hubble * pos[0], hubble * pos[1], hubble * pos[2]};
            place(t, j, -1, pos, vel, zero, zero, sigma, gauss);
        }
    }

    private static void place(Tracers t, int j, int host, double[] pos, double[] vel, double[] hostPos,
            double[] hostVel, double sigma, ContinuousSampler gauss) {
        t.host[j] = host;
        t.x[j] = hostPos[0] + pos[0];
        t.y[j] = hostPos[1] + pos[1];
        t.z[j] = hostPos[2] + pos[2];
        double gx = sigma == 0 ? 0 : sigma * gauss.sample();
        double gy = sigma == 0 ? 0 : sigma * gauss.sample();
        double gz = sigma == 0 ? 0 : sigma * gauss.sample();
        t.vx[j] = hostVel[0] + vel[0] + gx;
        t.vy[j] = hostVel[1] + vel[1] + gy;
        t.vz[j] = hostVel[2] + vel[2] + gz;
    }

    /** A uniformly random unit vector (Marsaglia-free: cos theta uniform in [-1, 1]). */
    private static double[] direction(UniformRandomProvider rng) {
        double cz = 2 * rng.nextDouble() - 1;
        double sz = Math.sqrt(Math.max(0, 1 - cz * cz));
        double phi = 2 * Math.PI * rng.nextDouble();
        return new double[] {sz * Math.cos(phi), sz * Math.sin(phi), cz};
    }

    static double[] unit(double[] v) {
        double len = Math.sqrt(v[0] * v[0] + v[1] * v[1] + v[2] * v[2]);
        if (!(len > 0) || !Double.isFinite(len)) {
            throw new IllegalArgumentException("normal: the disk's spin axis must be a non-zero vector");
        }
        return new double[] {v[0] / len, v[1] / len, v[2] / len};
    }

    /** A unit vector perpendicular to the unit vector n. */
    static double[] perpendicular(double[] n) {
        double[] helper = Math.abs(n[0]) < 0.9 ? new double[] {1, 0, 0} : new double[] {0, 1, 0};
        return unit(cross(n, helper));
    }

    static double[] cross(double[] a, double[] b) {
        return new double[] {a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]};
    }
}
