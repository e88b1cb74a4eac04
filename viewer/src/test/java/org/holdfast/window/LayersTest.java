package org.holdfast.window;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class LayersTest {

    @Test
    void freshViewShowsAllButTheKeyList() {
        for (Layer l : Layer.values()) {
            assertEquals(l != Layer.HELP, Layers.DEFAULT.has(l), l.name());
        }
    }

    @Test
    void toggleTwiceIsTheSameSet() {
        Layers l = Layers.of(Layer.NAMES);
        assertTrue(l.toggle(Layer.STARS).has(Layer.STARS));
        assertFalse(l.toggle(Layer.NAMES).has(Layer.NAMES));
        assertEquals(l, l.toggle(Layer.TRACERS).toggle(Layer.TRACERS));
        assertEquals("[names,stars]", l.toggle(Layer.STARS).toString());
    }

    @Test
    void unknownBitsAreRefused() {
        assertThrows(IllegalArgumentException.class, () -> new Layers(1 << Layer.values().length));
    }
}
