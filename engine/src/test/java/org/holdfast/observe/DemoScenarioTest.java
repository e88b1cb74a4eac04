package org.holdfast.observe;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.holdfast.schema.Node;
import org.holdfast.schema.Overrides;
import org.holdfast.schema.ScenarioFile;
import org.holdfast.uncertain.UncertainNumbers;
import org.junit.jupiter.api.Test;

/** The shipped demo in observed form reads and converts, centrally and as a draw. */
class DemoScenarioTest {

    private static final Path DEMO = Path.of("..", "scenarios", "observed-ossel-group.toml");

    /** Reads every observed member; returns each one's distance from the home centre in kpc. */
    private static List<Double> homeDistances(UncertainNumbers reader, List<String> warnings) {
        Node root = ScenarioFile.open(DEMO, Overrides.none(), reader);
        ObserverSite observer = ObserverReader.read(root.requireTable("observer"));
        HomeFrame frame = new HomeFrame(observer);
        List<Double> out = new ArrayList<>();
        boolean homeFound = false;
        for (Node g : root.tables("galaxy", "name")) {
            g.positive("mass_msun");
            homeFound |= g.string("name").equals(observer.homeGalaxy());
            Node observed = g.table("observed");
            if (observed != null) {
                MemberState s = frame.toHome(ObservedReader.read(observed));
                warnings.addAll(s.warnings());
                double[] r = s.positionKpc();
                out.add(Math.sqrt(r[0] * r[0] + r[1] * r[1] + r[2] * r[2]));
            }
        }
        assertTrue(homeFound, "the observer's home galaxy is a member");
        return out;
    }

    @Test
    void demoReadsWithCentralValuesAndSaysWhichWereUncertain() {
        UncertainNumbers reader = UncertainNumbers.central();
        List<String> warnings = new ArrayList<>();
        List<Double> d = homeDistances(reader, warnings);
        assertEquals(4, d.size());
        for (double r : d) {
            assertTrue(r > 100 && r < 2000, "a group member, 0.1 to 2 Mpc from home: " + r);
        }
        // Quillon and Brennock have no proper motions: each gets its stated assumption.
        assertEquals(2, warnings.size(), warnings.toString());
        assertTrue(warnings.get(0).contains("galaxy.Quillon.observed"), warnings.get(0));
        assertTrue(reader.summary().startsWith("used central values for 20 uncertain values: "
                + "observer.distance_to_centre_kpc = 8.2 (normal(mean 8.2, sigma 0.1))"), reader.summary());
        assertTrue(reader.warnings().isEmpty(), reader.warnings().toString());
    }

    @Test
    void aDrawOfTheDemoIsReproducibleAndDiffersFromTheCentre() {
        List<Double> a = homeDistances(UncertainNumbers.sampling(2026, 4), new ArrayList<>());
        List<Double> b = homeDistances(UncertainNumbers.sampling(2026, 4), new ArrayList<>());
        List<Double> c = homeDistances(UncertainNumbers.central(), new ArrayList<>());
        assertEquals(a, b);
        assertNotEquals(a, c);
    }
}
