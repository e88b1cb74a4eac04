package org.holdfast.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

/**
 * The sweep's outcomes read off a run's start and end: together, pairs, and the verdict over the
 * members bound at the start. States are made by hand in kpc, kpc/Gyr and Msun; "bound" is
 * decided by {@link org.holdfast.fates.Subgroups} (two bodies are bound when their relative
 * energy is below the barrier; at a few kpc and rest they are, at 10^6 kpc and 10^4 kpc/Gyr
 * apart they are not: common practice, the escape speed of 10^12 Msun at 10^6 kpc is about
 * 3 kpc/Gyr).
 */
class GroupAnalysisTest {

    private static GroupAnalysis.State state(String[] names, double[] mass, double[] x, double[] vx) {
        int n = names.length;
        return new GroupAnalysis.State(names, mass, new double[][] {x, new double[n], new double[n]},
                new double[][] {vx, new double[n], new double[n]}, 0.0);
    }

    private static MemberOutcome fate(String name, String fate) {
        return new MemberOutcome(name, fate, fate.equals("bound") ? null : 5.0, null);
    }

    @Test
    void aPairThatFliesApartIsNotTogetherWhicheverIsHeavier() {
        for (double[] m : new double[][] {{1e12, 4e11}, {4e11, 1e12}}) {
            String[] names = {"Arro", "Belk"};
            GroupAnalysis.State start = state(names, m, new double[] {0, 100}, new double[] {0, 0});
            GroupAnalysis.State end = state(names, m, new double[] {0, 1e6}, new double[] {0, 1e4});
            // the old fates call the heavier one bound; the answer must not care
            String heavy = m[0] > m[1] ? "Arro" : "Belk";
            List<MemberOutcome> fates = List.of(fate("Arro", heavy.equals("Arro") ? "bound" : "ripped"),
                    fate("Belk", heavy.equals("Belk") ? "bound" : "ripped"));
            GroupAnalysis.Result r = GroupAnalysis.analyse(fates, start, end);
            assertEquals("dissolved", r.verdict());
            for (MemberOutcome f : r.members()) {
                assertFalse(f.together(), f.toString());
                assertTrue(f.boundAtStart(), f.toString());
            }
            RunOutcome o = new RunOutcome(r.verdict(), 5.0, r.members(), 0, 0, null);
            assertFalse(Outcomes.pairTogether(o, "Arro", "Belk"));
            assertFalse(Outcomes.pairTogether(o, "Belk", "Arro"));
        }
    }

    @Test
    void aMemberMergedIntoTheHoldingGroupIsTogetherAndAnUnboundOneDoesNotSpoilTheVerdict() {
        String[] names = {"Arro", "Belk", "Cwen", "Dusk"};
        double[] m = {1e12, 5e11, 1e10, 1e10};
        // Dusk starts far away and fast: unbound from the start
        GroupAnalysis.State start = state(names, m, new double[] {0, 200, 50, 1e6}, new double[] {0, 0, 0, 1e4});
        // at the end Cwen has merged into Belk, which stays bound to Arro; Dusk is gone
        String[] endNames = {"Arro", "Belk", "Dusk"};
        GroupAnalysis.State end = state(endNames, new double[] {1e12, 5.1e11, 1e10}, new double[] {0, 150, 3e6},
                new double[] {0, 0, 1e4});
        List<MemberOutcome> fates = List.of(fate("Arro", "bound"), fate("Belk", "bound"),
                new MemberOutcome("Cwen", "merged", 3.0, "Belk"), fate("Dusk", "escaped"));
        GroupAnalysis.Result r = GroupAnalysis.analyse(fates, start, end);
        assertEquals("bound", r.verdict(), "the three bound at the start end together");
        RunOutcome o = new RunOutcome(r.verdict(), null, r.members(), 0, 0, null);
        assertTrue(Outcomes.together(o, "Arro"));
        assertTrue(Outcomes.together(o, "Cwen"), "merged into a galaxy that stays bound");
        assertFalse(Outcomes.together(o, "Dusk"));
        assertFalse(o.member("Dusk").boundAtStart());
        assertTrue(Outcomes.pairTogether(o, "Cwen", "Arro"));
        assertTrue(Outcomes.pairTogether(o, "Belk", "Cwen"));
        assertFalse(Outcomes.pairTogether(o, "Dusk", "Arro"));
        assertEquals(o.member("Belk").group(), o.member("Cwen").group());
        assertEquals(1, o.member("Arro").group(), "subgroups numbered from 1 in member order");
    }

    @Test
    void noBoundPairAtTheStartIsUnboundAndAPartialBreakIsPartlyBound() {
        String[] names = {"Arro", "Belk", "Cwen"};
        double[] m = {1e12, 1e12, 1e12};
        GroupAnalysis.State apart = state(names, m, new double[] {0, 1e6, 2e6}, new double[] {0, 1e4, 2e4});
        List<MemberOutcome> fates = List.of(fate("Arro", "bound"), fate("Belk", "escaped"), fate("Cwen", "escaped"));
        assertEquals("unbound", GroupAnalysis.analyse(fates, apart, apart).verdict());
        GroupAnalysis.State close = state(names, m, new double[] {0, 100, 200}, new double[] {0, 0, 0});
        GroupAnalysis.State oneLeft = state(names, m, new double[] {0, 100, 2e6}, new double[] {0, 0, 2e4});
        GroupAnalysis.Result r = GroupAnalysis.analyse(fates, close, oneLeft);
        assertEquals("partly-bound", r.verdict());
        RunOutcome o = new RunOutcome(r.verdict(), null, r.members(), 0, 0, null);
        assertTrue(Outcomes.together(o, "Belk"));
        assertFalse(Outcomes.together(o, "Cwen"));
    }

    @Test
    void runsThatRecordedOnlyFatesFallBackOnThem() {
        RunOutcome o = new RunOutcome("partly-bound", null, List.of(fate("Arro", "bound"), fate("Belk", "ripped"),
                new MemberOutcome("Cwen", "merged", 2.0, "Arro"), new MemberOutcome("Dusk", "merged", 2.0, "Belk")), 0, 0, null);
        assertTrue(Outcomes.together(o, "Cwen"));
        assertFalse(Outcomes.together(o, "Dusk"), "merged into a galaxy that was ripped");
        assertTrue(Outcomes.pairTogether(o, "Dusk", "Belk"));
        assertTrue(Outcomes.pairTogether(o, "Belk", "Dusk"));
        assertFalse(Outcomes.pairTogether(o, "Arro", "Belk"));
        assertNull(o.member("Arro").group());
    }
}
