package org.holdfast.window.input;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.lwjgl.glfw.GLFW.GLFW_KEY_N;
import static org.lwjgl.glfw.GLFW.GLFW_KEY_P;

import java.util.EnumSet;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;

import org.junit.jupiter.api.Test;

class BindingsTest {

    @Test
    void everyActionHasAKeyAndNoKeyTwoActions() {
        Set<Action> bound = EnumSet.noneOf(Action.class);
        Set<String> seen = new HashSet<>();
        for (Bindings.Binding b : Bindings.all()) {
            bound.add(b.action());
            assertTrue(seen.add(b.key() + (b.shift() ? "+shift" : "")), "bound twice: " + b.label());
        }
        assertEquals(EnumSet.allOf(Action.class), bound);
    }

    @Test
    void shiftFallsBackToThePlainBinding() {
        assertEquals(Optional.of(Action.NEXT_EVENT), Bindings.actionFor(GLFW_KEY_N, true));
        assertEquals(Optional.of(Action.SCREENSHOT_LARGE), Bindings.actionFor(GLFW_KEY_P, true));
        assertEquals(Optional.empty(), Bindings.actionFor(-1, false));
    }

    @Test
    void helpListsEveryActionOnce() {
        List<String> lines = Bindings.helpLines();
        for (Action a : Action.values()) {
            long n = lines.stream().filter(l -> l.endsWith(" " + a.description())).count();
            assertEquals(1, n, a + " in " + lines);
        }
        assertTrue(lines.stream().anyMatch(l -> l.startsWith("Esc or Q ")), lines.toString());
        assertTrue(lines.stream().anyMatch(l -> l.contains("drag")), lines.toString());
    }
}
