package org.holdfast.sweep;

import java.util.Arrays;

import org.holdfast.cli.Holdfast;

/**
 * A {@code holdfast} process with the toy physics installed, for tests that must kill a real
 * sweep process. Arguments: SLEEP_MS CALL_LOG then the holdfast arguments.
 */
public final class ToySweepMain {

    private ToySweepMain() {
    }

    public static void main(String[] args) {
        RunFunctions.install(new ToyRunFunction(Long.parseLong(args[0]), args[1]));
        System.exit(Holdfast.commandLine().execute(Arrays.copyOfRange(args, 2, args.length)));
    }
}
