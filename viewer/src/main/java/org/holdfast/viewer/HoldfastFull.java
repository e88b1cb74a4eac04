package org.holdfast.viewer;

import org.holdfast.cli.Holdfast;

import picocli.CommandLine;

/**
 * Entry point of {@code holdfast.jar}: the engine's command line plus the subcommands that
 * need the renderer or a window.
 */
public final class HoldfastFull {

    private HoldfastFull() {
    }

    /** The full command line. */
    public static CommandLine commandLine() {
        CommandLine cl = Holdfast.commandLine();
        return cl;
    }

    public static void main(String[] args) {
        System.exit(commandLine().execute(args));
    }
}
