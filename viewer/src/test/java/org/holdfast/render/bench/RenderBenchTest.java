package org.holdfast.render.bench;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ServiceLoader;

import org.holdfast.bench.BenchSuite;
import org.holdfast.render.SceneFrame;
import org.junit.jupiter.api.Test;

/** The suite is found by {@code holdfast bench}; its scene is what it claims. No timing here. */
class RenderBenchTest {

    @Test
    void suiteIsRegistered() {
        boolean found = false;
        for (BenchSuite s : ServiceLoader.load(BenchSuite.class)) {
            found |= s.name().equals("render") && s instanceof RenderBench;
        }
        assertTrue(found, "suite 'render' is listed in META-INF/services");
    }

    @Test
    void benchSceneIsReproducibleWithATenthFlowTracers() {
        SceneFrame a = BenchScene.build(5000, 1);
        SceneFrame b = BenchScene.build(5000, 1);
        int flow = 0;
        float[] p = new float[3];
        float[] q = new float[3];
        for (int i = 0; i < 5000; i++) {
            assertEquals(a.tracerPosition(i, p)[0], b.tracerPosition(i, q)[0]);
            flow += a.tracerHost(i) < 0 ? 1 : 0;
        }
        assertEquals(500, flow);
        assertEquals(5, a.galaxyCount());
    }
}
