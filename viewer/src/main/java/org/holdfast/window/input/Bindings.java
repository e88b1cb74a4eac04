package org.holdfast.window.input;

import static org.lwjgl.glfw.GLFW.*;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.holdfast.window.Controls;

/**
 * The key table of {@code holdfast view}: which key (with or without Shift) does which
 * {@link Action}. Key codes are GLFW's, which are plain constants, so this class works without a
 * window. {@link #helpLines()} is what the help layer lists.
 */
public final class Bindings {

    /** One key (Shift held or not) and what it does. */
    public record Binding(int key, boolean shift, Action action, String label) {
    }

    private static final List<Binding> TABLE = List.of(
            b(GLFW_KEY_SPACE, false, Action.PLAY_PAUSE, "Space"),
            b(GLFW_KEY_UP, false, Action.FASTER, "Up"),
            b(GLFW_KEY_DOWN, false, Action.SLOWER, "Down"),
            b(GLFW_KEY_R, false, Action.REVERSE, "R"),
            b(GLFW_KEY_RIGHT, false, Action.SCRUB_LATER, "Right"),
            b(GLFW_KEY_LEFT, false, Action.SCRUB_EARLIER, "Left"),
            b(GLFW_KEY_RIGHT, true, Action.NUDGE_LATER, "Shift+Right"),
            b(GLFW_KEY_LEFT, true, Action.NUDGE_EARLIER, "Shift+Left"),
            b(GLFW_KEY_N, false, Action.NEXT_EVENT, "N"),
            b(GLFW_KEY_B, false, Action.PREVIOUS_EVENT, "B"),
            b(GLFW_KEY_HOME, false, Action.TO_START, "Home"),
            b(GLFW_KEY_END, false, Action.TO_END, "End"),
            b(GLFW_KEY_TAB, false, Action.CHOOSE_NEXT, "Tab"),
            b(GLFW_KEY_TAB, true, Action.CHOOSE_PREVIOUS, "Shift+Tab"),
            b(GLFW_KEY_C, false, Action.FOLLOW_CHOSEN, "C"),
            b(GLFW_KEY_G, false, Action.CENTRE_GROUP, "G"),
            b(GLFW_KEY_V, false, Action.SWITCH_DOME, "V"),
            b(GLFW_KEY_EQUAL, false, Action.CLOSER, "="),
            b(GLFW_KEY_KP_ADD, false, Action.CLOSER, "Keypad +"),
            b(GLFW_KEY_MINUS, false, Action.FARTHER, "-"),
            b(GLFW_KEY_KP_SUBTRACT, false, Action.FARTHER, "Keypad -"),
            b(GLFW_KEY_LEFT_BRACKET, false, Action.NARROWER, "["),
            b(GLFW_KEY_RIGHT_BRACKET, false, Action.WIDER, "]"),
            b(GLFW_KEY_1, false, Action.SHOW_TRAILS, "1"),
            b(GLFW_KEY_2, false, Action.SHOW_NAMES, "2"),
            b(GLFW_KEY_3, false, Action.SHOW_STARS, "3"),
            b(GLFW_KEY_4, false, Action.SHOW_TRACERS, "4"),
            b(GLFW_KEY_5, false, Action.SHOW_CLOCK, "5"),
            b(GLFW_KEY_6, false, Action.SHOW_EVENTS, "6"),
            b(GLFW_KEY_H, false, Action.SHOW_HELP, "H"),
            b(GLFW_KEY_F1, false, Action.SHOW_HELP, "F1"),
            b(GLFW_KEY_W, false, Action.WHOLE_SCREEN, "W"),
            b(GLFW_KEY_P, false, Action.SCREENSHOT, "P"),
            b(GLFW_KEY_P, true, Action.SCREENSHOT_LARGE, "Shift+P"),
            b(GLFW_KEY_ESCAPE, false, Action.QUIT, "Esc"),
            b(GLFW_KEY_Q, false, Action.QUIT, "Q"));

    /** Mouse lines of the key list (the mouse is handled by {@link Controls} directly). */
    private static final List<String> MOUSE_LINES = List.of(
            "left drag        turn the camera around the group",
            "wheel            move the camera closer or farther");

    private Bindings() {
    }

    private static Binding b(int key, boolean shift, Action action, String label) {
        return new Binding(key, shift, action, label);
    }

    /** Every binding, in the order of the key list. */
    public static List<Binding> all() {
        return TABLE;
    }

    /**
     * The action for a key press. Shift picks the Shift binding when there is one; a key with
     * only a plain binding does the same with Shift held.
     */
    public static Optional<Action> actionFor(int key, boolean shift) {
        Binding plain = null;
        for (Binding b : TABLE) {
            if (b.key() == key) {
                if (b.shift() == shift) {
                    return Optional.of(b.action());
                }
                if (!b.shift()) {
                    plain = b;
                }
            }
        }
        return Optional.ofNullable(plain).map(Binding::action);
    }

    /** The key list: one line per action ("Space  play or pause the clock"), then the mouse. */
    public static List<String> helpLines() {
        List<String> lines = new ArrayList<>();
        Action last = null;
        StringBuilder keys = new StringBuilder();
        for (Binding b : TABLE) {
            if (b.action() != last && last != null) {
                lines.add(String.format("%-16s %s", keys, last.description()));
                keys.setLength(0);
            }
            if (keys.length() > 0) {
                keys.append(" or ");
            }
            keys.append(b.label());
            last = b.action();
        }
        lines.add(String.format("%-16s %s", keys, last.description()));
        lines.addAll(MOUSE_LINES);
        return List.copyOf(lines);
    }
}
