package org.holdfast.expansion;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The dark-energy models, alone and inside a solved history. */
class DarkEnergyModelsTest {

    @TempDir
    Path dir;

    /**
     * w0–wa density in closed form: rho_de(a)/rho_de0 = a^(-3(1+w0+wa)) exp(-3 wa (1 - a))
     * (Linder 2003, PRL 90, 091301; Chevallier &amp; Polarski 2001, IJMPD 10, 213).
     */
    @Test
    void w0waDensityFollowsItsClosedForm() {
        double w0 = -0.9;
        double wa = -0.4;
        ExpansionTable t = new Cosmology(67.5, 0.31, 0, 0, new W0WaDarkEnergy(w0, wa)).solve();
        double rho0 = t.cosmology().omegaDe() * t.criticalDensityToday();
        for (double tt : new double[] {-13, -10, -4, 0, 2, 10, 60}) {
            double a = t.scaleFactor(tt);
            double closed = rho0 * Math.pow(a, -3 * (1 + w0 + wa)) * Math.exp(-3 * wa * (1 - a));
            assertEquals(closed, t.darkEnergyDensity(tt), 1e-10 * closed, "rho_de at t = " + tt);
            // k = -(1/2) H0^2 Omega_de f(a) (1 + 3 w(a)) (the interface's definition)
            double h0 = t.cosmology().h0PerGyr();
            double k = -0.5 * h0 * h0 * t.cosmology().omegaDe() * closed / rho0 * (1 + 3 * (w0 + wa * (1 - a)));
            assertEquals(k, t.darkEnergyAcceleration(tt), 1e-9 * Math.abs(k), "k at t = " + tt);
        }
    }

    /** A table of constant w must give the constant-w history (same physics, two code paths). */
    @Test
    void tableOfConstantWReproducesConstantW() throws IOException {
        Path csv = dir.resolve("flat-w.csv");
        Files.writeString(csv, "# constant w\na,w\n0.001,-1.3\n0.1,-1.3\n0.7,-1.3\n1.5,-1.3\n40,-1.3\n");
        Cosmology base = new Cosmology(70, 0.3, 8e-5, 0, new ConstantW(-1.3));
        ExpansionTable direct = base.solve();
        ExpansionTable table = base.withDarkEnergy(WTableCsv.read(csv)).solve();
        assertEquals(direct.ageGyr(), table.ageGyr(), 1e-8 * direct.ageGyr());
        assertEquals(direct.ripGyr().getAsDouble(), table.ripGyr().getAsDouble(), 1e-8 * direct.ripGyr().getAsDouble());
        for (double tt : new double[] {-13, -5, 0, 5, 20, 35}) {
            assertEquals(direct.scaleFactor(tt), table.scaleFactor(tt), 1e-8 * direct.scaleFactor(tt));
            assertEquals(direct.hubbleRate(tt), table.hubbleRate(tt), 1e-8 * direct.hubbleRate(tt));
            assertEquals(direct.darkEnergyAcceleration(tt), table.darkEnergyAcceleration(tt),
                    1e-8 * direct.darkEnergyAcceleration(tt));
        }
    }

    /**
     * The table model's density is the exact integral of its spline:
     * ln f(a) = -3 &int;_1^a (1 + w) da'/a' (energy conservation, e.g. Linder 2003, eq. 2), here
     * checked against an independent Gauss–Legendre quadrature of the interpolated w.
     */
    @Test
    void tableDensityIsTheIntegralOfItsW() {
        double[] a = {0.02, 0.3, 0.8, 1.2, 3, 10};
        double[] w = {-0.8, -0.85, -0.97, -1.05, -1.2, -1.1};
        TabulatedW model = new TabulatedW(a, w, "test");
        IterativeLegendreGaussIntegrator gl = new IterativeLegendreGaussIntegrator(8, 1e-15, 1e-300, 2, 64);
        for (double x : new double[] {0.01, 0.05, 0.5, 0.9, 1.1, 2.0, 7.0, 30.0}) {
            // split at the knots so that each piece is one polynomial
            double lnX = Math.log(x);
            double lo = Math.min(0, lnX);
            double hi = Math.max(0, lnX);
            double sum = 0;
            double prev = lo;
            for (double knot : a) {
                double k = Math.log(knot);
                if (k > prev && k < hi) {
                    sum += gl.integrate(1_000_000, l -> 1 + model.w(Math.exp(l)), prev, k);
                    prev = k;
                }
            }
            sum += gl.integrate(1_000_000, l -> 1 + model.w(Math.exp(l)), prev, hi);
            double expected = -3 * (lnX >= 0 ? sum : -sum);
            assertEquals(expected, model.lnDensityRatio(lnX), 1e-12 * Math.max(1, Math.abs(expected)), "at a = " + x);
        }
        // outside the table w is held at its end values (the documented rule)
        assertEquals(-0.8, model.w(1e-4), 0);
        assertEquals(-1.1, model.w(1e3), 0);
        // the spline passes through its points
        assertEquals(-0.97, model.w(0.8), 1e-15);
    }
}
