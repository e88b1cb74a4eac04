package org.holdfast.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.holdfast.fates.FateRun;
import org.holdfast.fates.FateTracker.Verdict;
import org.holdfast.fates.MemberFate;
import org.holdfast.fates.Fate;
import org.holdfast.uncertain.UncertainNumbers;
import org.holdfast.schema.Overrides;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/** The demo group's fates with dynamical friction: it holds with a cosmological constant, comes apart in a rip. */
@Tag("slow")
class DemoFatesTest {

    private static FateRun.Outcome run(String... overrides) {
        Overrides o = DemoGroupTest.withoutTracers(overrides);
        Scenario s = ScenarioReader.read(DemoGroupTest.DEMO, o, UncertainNumbers.central(), Double.NaN);
        FateRun.Outcome r = FateRun.run(s, List.of(), 1);
        r.simulation().close();
        return r;
    }

    @Test
    void withACosmologicalConstantTheGroupHoldsForAHundredGyr() {
        // common practice: a group of bound members stays bound when w = -1, since k = Omega_L H0^2 is constant and
        // the zero-gravity radius (Chernin and collaborators; physics-references) stays put
        FateRun.Outcome r = run("run.until_gyr", "100", "run.dynamical_friction", "true");
        assertTrue(r.verdict() == Verdict.BOUND || r.verdict() == Verdict.PARTLY_BOUND, r.verdict() + " " + r.members());
        for (MemberFate f : r.members()) {
            if (f.fate() == Fate.ESCAPED || f.fate() == Fate.RIPPED) {
                assertTrue(r.events().stream().anyMatch(e -> e.members().contains(f.name())), "no event for " + f);
            }
        }
        assertEquals(Fate.BOUND, r.members().get(0).fate(), "the largest spiral: " + r.members().get(0));
        assertTrue(r.members().stream().anyMatch(f -> f.fate() == Fate.MERGED && "Aldermere".equals(f.with())),
                "friction brings members down into the largest spiral: " + r.members());
        assertTrue(r.result().maxEnergyResidual() < 1e-3, "budget residual " + r.result().maxEnergyResidual());
    }

    @Test
    void strongPhantomDarkEnergyDissolvesItBeforeTheRip() {
        // Caldwell, Kamionkowski & Weinberg 2003, PRL 91, 071301: with w < -1 every bound system comes apart
        // before the rip, at t_rip - t0 ~ (2/3) |1+w|^-1 H0^-1 (1 - Om)^-1/2 = 3.7 Gyr for w = -4 (same paper)
        FateRun.Outcome r = run("cosmology.dark_energy.w0", "-4", "run.until_gyr", "10",
                "run.dynamical_friction", "true");
        double rip = 2.0 / 3 / 3 * 977.792 / 70 / Math.sqrt(0.7);
        assertEquals(Verdict.DISSOLVED, r.verdict(), r.members().toString());
        assertTrue(r.boundUntilGyr() < rip, "last bound pair separates at " + r.boundUntilGyr() + ", rip ~" + rip);
        assertTrue(r.members().stream().anyMatch(f -> f.fate() == Fate.RIPPED), r.members().toString());
    }
}
