package org.holdfast.forces;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.holdfast.halos.HaloProfile;
import org.holdfast.halos.HernquistHalo;
import org.holdfast.halos.IsothermalHalo;
import org.holdfast.halos.NfwHalo;
import org.holdfast.halos.PlummerHalo;
import org.holdfast.halos.PointHalo;
import org.holdfast.units.Units;
import org.junit.jupiter.api.Test;

class PairKernelTest {

    private static final HaloProfile NFW_BIG = new NfwHalo(1.2e12, 22, 260);
    private static final HaloProfile NFW_SMALL = new NfwHalo(4e10, 6, 70);
    private static final HaloProfile HERNQUIST = new HernquistHalo(2e11, 10);
    private static final HaloProfile PLUMMER = new PlummerHalo(5e10, 4);
    private static final HaloProfile ISO = new IsothermalHalo(3e11, 120);

    @Test
    void interactionIsTheSameFromEitherSide() {
        // W = integral rho_1 Phi_2 = integral rho_2 Phi_1 (symmetry of the mutual potential energy,
        // Binney & Tremaine 2008, eq. 2.41 for the pair term); tests the quadrature itself
        List<HaloProfile[]> pairs = List.of(new HaloProfile[] {NFW_BIG, NFW_SMALL},
                new HaloProfile[] {HERNQUIST, PLUMMER}, new HaloProfile[] {ISO, NFW_SMALL},
                new HaloProfile[] {NFW_BIG, HERNQUIST});
        for (HaloProfile[] p : pairs) {
            for (double d : new double[] {0.05, 3, 30, 150, 400}) {
                double[] ab = InteractionIntegral.evaluate(p[0], p[1], d);
                double[] ba = InteractionIntegral.evaluate(p[1], p[0], d);
                assertEquals(ab[0], ba[0], 1e-9 * Math.abs(ab[0]), p[0] + " / " + p[1] + " W at d = " + d);
                assertEquals(ab[1], ba[1], 1e-7 * Math.abs(ab[1]) + 1e-12 * Math.abs(ab[0]) / d,
                        p[0] + " / " + p[1] + " dW/dd at d = " + d);
            }
        }
    }

    @Test
    void quadratureObeysNewtonsTheoremOutsideBoth() {
        // two truncated spheres that do not overlap attract as point masses (Newton's theorems,
        // Binney & Tremaine 2008, sec. 2.2.1): W = -G M1 M2 / d, dW/dd = G M1 M2 / d^2
        double d = 1.02 * (NFW_BIG.extentKpc() + ISO.extentKpc());
        double[] v = InteractionIntegral.evaluate(NFW_BIG, ISO, d);
        double gmm = Units.G * NFW_BIG.mass() * ISO.mass();
        assertEquals(-gmm / d, v[0], 1e-10 * gmm / d);
        assertEquals(gmm / (d * d), v[1], 1e-9 * gmm / (d * d));
    }

    @Test
    void shellMeanOfAPointPotentialIsNewtonsShell() {
        // mean of -G M / s over a sphere of radius r at distance d: -G M / max(r, d) (Newton's theorems)
        HaloProfile p = new PointHalo(1e10, 0);
        assertEquals(-Units.G * 1e10 / 5, InteractionIntegral.shellMean(p, 2, 5), 1e-14 * Units.G * 1e10);
        assertEquals(-Units.G * 1e10 / 7, InteractionIntegral.shellMean(p, 7, 5), 1e-14 * Units.G * 1e10);
    }

    @Test
    void everyPairForceIsMinusTheGradientOfItsPotential() {
        // force = -dW/dd, checked by central finite differences of the kernel's own energy (common practice)
        List<PairKernel> kernels = List.of(KernelTable.kernelFor(NFW_BIG, NFW_SMALL), KernelTable.kernelFor(HERNQUIST, PLUMMER),
                KernelTable.kernelFor(ISO, NFW_BIG), KernelTable.kernelFor(new PointHalo(1e9, 0.5), NFW_BIG),
                KernelTable.kernelFor(new PointHalo(1e9, 0.5), new PointHalo(3e9, 1)),
                KernelTable.kernelFor(new PointHalo(1e9, 0), HERNQUIST));
        for (PairKernel k : kernels) {
            for (double d : new double[] {1e-4, 0.01, 0.7, 9, 55, 240, 333, 2000, 3e5}) {
                double e = 1e-6 * d;
                double slope = (k.energy(d + e) - k.energy(d - e)) / (2 * e);
                double pull = k.pullOverD(d) * d;
                assertEquals(pull, slope, 2e-6 * Math.abs(pull) + 1e-9 * Math.abs(k.energy(d)) / d,
                        k.getClass().getSimpleName() + " at d = " + d);
            }
        }
    }

    @Test
    void tableAgreesWithTheQuadratureBetweenNodes() {
        // interpolation error of the cubic Hermite table against direct quadrature (common practice).
        // Where a truncated halo's edge meets the other's centre (d within 15% of R_1, R_2, |R_1 - R_2| or
        // R_1 + R_2) W is less smooth and the table less accurate; that band has its own, wider bound.
        for (HaloProfile[] p : List.of(new HaloProfile[] {NFW_BIG, HERNQUIST}, new HaloProfile[] {NFW_BIG, NFW_SMALL},
                new HaloProfile[] {HERNQUIST, PLUMMER})) {
            TabulatedKernel k = new TabulatedKernel(p[0], p[1]);
            double norm = p[0].mass() * p[1].mass();
            double[] worst = new double[4];
            for (double d = 0.013; d < 2e5; d *= 1.137) {
                double[] v = InteractionIntegral.evaluate(p[0], p[1], d);
                int band = nearEdge(p, d) ? 2 : 0;
                worst[band] = Math.max(worst[band], Math.abs(k.energy(d) * norm / v[0] - 1));
                worst[band + 1] = Math.max(worst[band + 1], Math.abs(k.pullOverD(d) * d * norm / v[1] - 1));
            }
            String what = p[0].kind() + "/" + p[1].kind() + ": ";
            assertTrue(worst[0] < 1e-7, what + "energy interpolation error " + worst[0]);
            assertTrue(worst[1] < 1e-5, what + "force interpolation error " + worst[1]);
            assertTrue(worst[2] < 2e-6, what + "energy interpolation error near an edge " + worst[2]);
            assertTrue(worst[3] < 1e-4, what + "force interpolation error near an edge " + worst[3]);
        }
    }

    private static boolean nearEdge(HaloProfile[] p, double d) {
        double r1 = p[0].extentKpc();
        double r2 = p[1].extentKpc();
        for (double e : new double[] {r1, r2, Math.abs(r1 - r2), r1 + r2}) {
            if (Double.isFinite(e) && Math.abs(d / e - 1) < 0.15) {
                return true;
            }
        }
        return false;
    }

    @Test
    void pointSatelliteInsideHostFeelsOnlyTheEnclosedMass() {
        // shell theorem: a point at r inside a spherical host feels G M(<r) / r^2 (Binney & Tremaine 2008, sec. 2.2.1)
        PairKernel k = KernelTable.kernelFor(new PointHalo(1e9, 0), NFW_BIG);
        for (double r : new double[] {5, 22, 100, 259}) {
            double expected = Units.G * NFW_BIG.enclosedMass(r) / (r * r);
            assertEquals(expected, k.pullOverD(r) * r * NFW_BIG.mass(), 1e-12 * expected);
        }
    }

    @Test
    void extendedHalosFarApartAttractAsPointMasses() {
        // Newton's law far outside both: the untruncated Hernquist and Plummer spheres differ from
        // point masses by O(a/d) (Hernquist 1990, eq. 5: Phi = -G M / (r + a))
        PairKernel k = KernelTable.kernelFor(HERNQUIST, PLUMMER);
        for (double d : new double[] {5e3, 5e4, 5e5}) {
            double newton = Units.G / (d * d);
            assertEquals(newton, k.pullOverD(d) * d, 3 * 10.0 / d * newton, "d = " + d);
        }
        PairKernel truncated = KernelTable.kernelFor(NFW_BIG, NFW_SMALL);
        double d = 400;
        assertEquals(Units.G / (d * d), truncated.pullOverD(d) * d, 1e-15 * Units.G / (d * d));
        assertEquals(-Units.G / d, truncated.energy(d), 1e-15 * Units.G / d);
    }

    @Test
    void overlappingHalosPullLessThanPointMasses() {
        // inside each other two extended halos attract less than two points (common practice),
        // and the pull vanishes at zero separation by symmetry
        PairKernel k = KernelTable.kernelFor(NFW_BIG, NFW_SMALL);
        for (double d : new double[] {1, 10, 100}) {
            assertTrue(k.pullOverD(d) * d < Units.G / (d * d), "d = " + d);
        }
        assertTrue(k.pullOverD(1e-6) * 1e-6 < 1e-3 * k.pullOverD(10) * 10);
    }
}
