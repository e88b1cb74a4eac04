package org.holdfast.viewer;

import org.holdfast.cli.Holdfast;
import org.holdfast.film.RenderCommand;
import org.holdfast.window.FrameSources;
import org.holdfast.viewer.ViewCommand;

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
        return commandLine(FrameSources::open);
    }

    /** The full command line, with {@code holdfast view} taking its frames from {@code sources}. */
    public static CommandLine commandLine(FrameSources.SourceOpener sources) {
        CommandLine cl = Holdfast.commandLine();
        cl.addSubcommand("render", new RenderCommand());
        cl.addSubcommand("view", new ViewCommand(sources));
        return cl;
    }

    public static void main(String[] args) {
        System.exit(Holdfast.execute(commandLine(), args));
    }
}
