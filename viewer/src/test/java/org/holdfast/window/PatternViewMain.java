package org.holdfast.window;

import org.holdfast.viewer.HoldfastFull;

/** {@code holdfast} with the test pattern as the view's source, for tests that need a child process. */
public final class PatternViewMain {

    private PatternViewMain() {
    }

    public static void main(String[] args) {
        System.exit(HoldfastFull.commandLine((input, sets, keep) -> new PatternSource()).execute(args));
    }
}
