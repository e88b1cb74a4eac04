package org.holdfast.halos;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.holdfast.group.HaloSpec;
import org.holdfast.units.Units;
import org.junit.jupiter.api.Test;

class HaloProfileTest {

    private static final double RHO_CRIT = 3 * Math.pow(Units.hubbleToPerGyr(70), 2) / (8 * Math.PI * Units.G);

    private static List<HaloProfile> all() {
        return List.of(new PointHalo(1e11, 2), new PlummerHalo(2e11, 5), new HernquistHalo(3e11, 8),
                new NfwHalo(1e12, 20, 200), new IsothermalHalo(5e11, 150));
    }

    /** Mass inside r by integrating 4 pi r^2 rho numerically (in ln r), for comparison with the closed forms. */
    private static double integratedMass(HaloProfile h, double r) {
        IterativeLegendreGaussIntegrator gl = new IterativeLegendreGaussIntegrator(16, 1e-12, 1e-14);
        double lo = Math.log(r * 1e-9);
        return gl.integrate(100000, u -> {
            double s = Math.exp(u);
            return 4 * Math.PI * s * s * s * h.density(s);
        }, lo, Math.log(r)) + 0;
    }

    @Test
    void hernquistEnclosedMassMatchesClosedForm() {
        // Hernquist 1990, ApJ 356, 359, eq. 3: M(<r) = M r^2 / (r + a)^2; at r = a half of M/2... exactly M/4
        HaloProfile h = new HernquistHalo(3e11, 8);
        assertEquals(0.25 * 3e11, h.enclosedMass(8), 1e-6);
        for (double r : new double[] {0.5, 8, 40, 300}) {
            assertEquals(3e11 * r * r / ((r + 8) * (r + 8)), h.enclosedMass(r), 1e-9 * 3e11);
            assertEquals(h.enclosedMass(r), integratedMass(h, r), 1e-7 * h.enclosedMass(r));
        }
    }

    @Test
    void nfwEnclosedMassMatchesClosedForm() {
        // Navarro, Frenk & White 1996, ApJ 462, 563: M(<r) = 4 pi rho_s r_s^3 [ln(1+x) - x/(1+x)]
        NfwHalo h = new NfwHalo(1e12, 20, 200);
        double m0 = 1e12 / (Math.log(11) - 10.0 / 11);
        for (double r : new double[] {1, 20, 43.25, 199}) {
            double x = r / 20;
            assertEquals(m0 * (Math.log(1 + x) - x / (1 + x)), h.enclosedMass(r), 1e-9 * 1e12);
            assertEquals(h.enclosedMass(r), integratedMass(h, r), 1e-7 * h.enclosedMass(r));
        }
        assertEquals(1e12, h.enclosedMass(500), 0);
    }

    @Test
    void nfwCircularSpeedPeaksAtTwoPointOneSixScaleRadii() {
        // NFW: V_max at x = 2.16258 (physics-references.md, from the closed form of M(<r))
        NfwHalo h = new NfwHalo(1e12, 20, 400);
        double best = 0;
        double at = 0;
        for (double x = 1.5; x < 3; x += 1e-4) {
            double v = h.circularSpeed(20 * x);
            if (v > best) {
                best = v;
                at = x;
            }
        }
        assertEquals(2.16258, at, 2e-4);
    }

    @Test
    void nfwMassInsideR200IsTwoHundredTimesCriticalDensity() {
        // r_200 definition: mean density inside r_200 = 200 rho_crit (Navarro, Frenk & White 1996)
        HaloProfile h = Halos.build(new HaloSpec("nfw", Double.NaN, Double.NaN, 10, Double.NaN), 2e12, RHO_CRIT);
        double r200 = Halos.r200(2e12, RHO_CRIT);
        double mean = h.enclosedMass(r200) / (4.0 / 3 * Math.PI * Math.pow(r200, 3));
        assertEquals(200 * RHO_CRIT, mean, 1e-10 * 200 * RHO_CRIT);
        assertEquals(r200 / 10, h.lengthKpc(), 1e-12 * r200);
        assertEquals(r200, h.extentKpc(), 1e-12 * r200);
    }

    @Test
    void isothermalHasFlatCircularSpeed() {
        // Binney & Tremaine 2008, eq. 4.103: v_c^2 = G M / R inside R for a truncated singular isothermal sphere
        HaloProfile h = new IsothermalHalo(5e11, 150);
        double vc = Math.sqrt(Units.G * 5e11 / 150);
        for (double r : new double[] {0.1, 10, 149}) {
            assertEquals(vc, h.circularSpeed(r), 1e-12 * vc);
        }
        assertEquals(h.enclosedMass(100), integratedMass(h, 100), 1e-7 * h.enclosedMass(100));
    }

    @Test
    void potentialSlopeIsTheEnclosedMassPull() {
        // Poisson's equation for spherical bodies: dPhi/dr = G M(<r) / r^2 (Binney & Tremaine 2008, eq. 2.28); common practice
        for (HaloProfile h : all()) {
            for (double r : new double[] {0.3, 3, 30, 140, 400}) {
                double e = 1e-5 * r;
                double slope = (h.potential(r + e) - h.potential(r - e)) / (2 * e);
                double pull = h.pullOverR(r) * r;
                assertEquals(pull, slope, 1e-7 * pull, h + " at r = " + r);
            }
        }
    }

    @Test
    void potentialMomentIsTheIntegralOfPhiTimesS() {
        // Psi(s) = integral_0^s Phi(s') s' ds' by definition; compared with direct quadrature (common practice)
        IterativeLegendreGaussIntegrator gl = new IterativeLegendreGaussIntegrator(16, 1e-13, 1e-15);
        for (HaloProfile h : all()) {
            for (double s : new double[] {0.7, 25, 300}) {
                double edge = Math.min(s, Double.isFinite(h.extentKpc()) && h.extentKpc() > 0 ? h.extentKpc() : s);
                // in ln x: Phi(x) x^2 du, split at the halo's edge where Phi has a kink
                double direct = gl.integrate(100000, u -> h.potential(Math.exp(u)) * Math.exp(2 * u), Math.log(1e-9), Math.log(edge));
                if (edge < s) {
                    direct += gl.integrate(100000, x -> h.potential(x) * x, edge, s);
                }
                assertEquals(direct, h.potentialMoment(s), 1e-9 * Math.abs(direct), h + " at s = " + s);
            }
        }
    }

    @Test
    void truncatedProfilesJoinNewtonOutside() {
        // outside all the mass Phi = -G M / r (Newton's first theorem, Binney & Tremaine 2008, sec. 2.2.1)
        for (HaloProfile h : List.of(new NfwHalo(1e12, 20, 200), new IsothermalHalo(5e11, 150))) {
            double r = h.extentKpc();
            assertEquals(-Units.G * h.mass() / r, h.potential(r * (1 - 1e-12)), 1e-9 * Units.G * h.mass() / r);
            assertEquals(-Units.G * h.mass() / (2 * r), h.potential(2 * r), 1e-15 * Units.G * h.mass() / r);
        }
    }

    @Test
    void missingOrBadLengthsNameTheKey() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Halos.build(new HaloSpec("hernquist", Double.NaN, Double.NaN, Double.NaN, Double.NaN), 1e11, RHO_CRIT));
        assertTrue(e.getMessage().startsWith("scale_kpc"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class,
                () -> Halos.build(new HaloSpec("nfw", Double.NaN, 10, 8, Double.NaN), 1e11, RHO_CRIT));
        assertTrue(e.getMessage().startsWith("concentration"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class,
                () -> Halos.build(new HaloSpec("isothermal", Double.NaN, Double.NaN, Double.NaN, -3), 1e11, RHO_CRIT));
        assertTrue(e.getMessage().startsWith("truncation_kpc"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class,
                () -> Halos.build(new HaloSpec("blob", Double.NaN, Double.NaN, Double.NaN, Double.NaN), 1e11, RHO_CRIT));
        assertTrue(e.getMessage().startsWith("profile"), e.getMessage());
    }
}
