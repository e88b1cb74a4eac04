package org.holdfast.fates;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.holdfast.fates.Fate;
import org.holdfast.run.RunEvent;
import org.junit.jupiter.api.Test;

class FateReportTest {

    @Test
    void timesReadAsAPresenterWouldSayThem() {
        assertEquals("in 12.4 billion years", FateReport.when(12.4));
        assertEquals("1.5 billion years ago", FateReport.when(-1.5));
        assertEquals("in 250 million years", FateReport.when(0.25));
        assertEquals("now", FateReport.when(0));
    }

    @Test
    void tableAndTimelineNameEveryMember() {
        List<MemberFate> f = List.of(new MemberFate("Orla", Fate.BOUND, Double.NaN, null),
                new MemberFate("Pim", Fate.MERGED, 3.2, "Orla"),
                new MemberFate("Quist", Fate.RIPPED, 20.1, null));
        String t = FateReport.table(f);
        assertTrue(t.contains("Pim    merges into Orla in 3.2 billion years"), t);
        assertTrue(t.contains("Quist  is torn away by dark energy in 20.1 billion years"), t);
        String line = FateReport.timeline(List.of(new RunEvent(3.2, RunEvent.Kind.MERGED, List.of("Orla", "Pim"))));
        assertTrue(line.contains("Orla and Pim merge"), line);
    }

    @Test
    void aRippedMemberShowsBothTimesAndUnboundSaysFromTheStart() {
        List<MemberFate> f = List.of(new MemberFate("Orla", Fate.RIPPED, 20.1, 20.4, null),
                new MemberFate("Quist", Fate.RIPPED, 20.1, 20.4, null),
                new MemberFate("Rusk", Fate.UNBOUND, 0.0, null));
        String apart = FateReport.table(f, FateTracker.Verdict.DISSOLVED);
        assertTrue(apart.contains("Orla   is torn away by dark energy in 20.1 billion years (beyond the zero-gravity"
                + " radius in 20.4 billion years)"), apart);
        assertTrue(apart.contains("Rusk   is not bound to the group from the start"), apart);
        assertTrue(!apart.contains("stays bound"), apart);
    }
}
