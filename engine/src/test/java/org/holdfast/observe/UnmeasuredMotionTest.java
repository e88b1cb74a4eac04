package org.holdfast.observe;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;

import org.holdfast.group.GalaxySpec;
import org.holdfast.schema.Overrides;
import org.holdfast.scenario.Scenario;
import org.holdfast.scenario.ScenarioReader;
import org.holdfast.uncertain.UncertainNumbers;
import org.holdfast.uncertain.UncertainValue;
import org.junit.jupiter.api.Test;

/** Members without proper motions: no transverse motion in the central run, drawn isotropically in draws. */
class UnmeasuredMotionTest {

    private static final Path DEMO = Path.of("..", "scenarios", "observed-ossel-group.toml");
    private static final String KEY = "galaxy.Quillon.observed.unmeasured_transverse_kms.";

    private static Scenario read(UncertainNumbers n, String... set) {
        return ScenarioReader.read(DEMO, Overrides.parse(List.of(set)), n, Double.NaN);
    }

    private static GalaxySpec member(Scenario s, String name) {
        return s.group().galaxies().stream().filter(g -> g.name().equals(name)).findFirst().orElseThrow();
    }

    @Test
    void theCentralRunIsUnchanged() {
        UncertainNumbers central = UncertainNumbers.central();
        Scenario s = read(central);
        Scenario none = read(UncertainNumbers.central(), "observer.unmeasured_transverse=none");
        assertArrayEquals(member(none, "Quillon").velocityKms(), member(s, "Quillon").velocityKms(), 0.0);
        assertFalse(central.used().stream().anyMatch(u -> u.path().startsWith(KEY)), "nothing assumed centrally");
    }

    @Test
    void drawsCarryTheIgnoranceIsotropicallyWithTheStatedSigma() {
        int n = 400;
        double sum = 0;
        double sum2 = 0;
        for (int i = 0; i < n; i++) {
            UncertainNumbers draw = UncertainNumbers.sampling(11, i);
            Scenario s = read(draw, "observer.transverse_sigma_kms=80");
            UncertainValue ra = draw.used().stream().filter(u -> u.path().equals(KEY + "0")).findFirst().orElseThrow();
            UncertainValue dec = draw.used().stream().filter(u -> u.path().equals(KEY + "1")).findFirst().orElseThrow();
            assertTrue(ra.distribution().describe().contains("sigma 80"), ra.distribution().describe());
            sum += ra.value() + dec.value();
            sum2 += ra.value() * ra.value() + dec.value() * dec.value();
            if (i < 5) {
                // the same draw with the assumption switched off differs by exactly the drawn transverse part,
                // perpendicular to the line of sight (the observer is 8 kpc from the home centre, the member
                // hundreds of kpc away: within 2%)
                Scenario off = read(UncertainNumbers.sampling(11, i), "observer.transverse_sigma_kms=80",
                        "observer.unmeasured_transverse=none");
                double[] a = member(s, "Quillon").velocityKms();
                double[] b = member(off, "Quillon").velocityKms();
                double[] p = member(s, "Quillon").positionKpc();
                double[] h = member(s, "Ossel").positionKpc();
                double dv2 = 0;
                double dot = 0;
                double r2 = 0;
                for (int c = 0; c < 3; c++) {
                    dv2 += (a[c] - b[c]) * (a[c] - b[c]);
                    dot += (a[c] - b[c]) * (p[c] - h[c]);
                    r2 += (p[c] - h[c]) * (p[c] - h[c]);
                }
                assertEquals(Math.hypot(ra.value(), dec.value()), Math.sqrt(dv2), 1e-9 * 80);
                assertTrue(Math.abs(dot) < 0.02 * Math.sqrt(dv2 * r2), "transverse to the line of sight");
            }
        }
        // 2n normal values of sigma 80: the sample mean within 4 standard errors of 0, the rms within 10% (common practice)
        double mean = sum / (2 * n);
        double rms = Math.sqrt(sum2 / (2 * n));
        assertEquals(0, mean, 4 * 80 / Math.sqrt(2 * n));
        assertEquals(80, rms, 8);
    }
}
