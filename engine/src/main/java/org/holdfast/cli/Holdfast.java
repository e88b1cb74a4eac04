package org.holdfast.cli;

import java.io.PrintWriter;

import org.holdfast.cli.BenchCommand;
import org.holdfast.schema.ScenarioException;
import org.holdfast.console.Version;

import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Spec;

/**
 * The {@code holdfast} command line. Each subcommand is one class; the viewer module adds its
 * own ({@code render}, {@code view}) to the same command through {@link #commandLine()}.
 */
@Command(name = "holdfast",
        mixinStandardHelpOptions = true,
        versionProvider = Version.class,
        description = {
            "Galaxy groups against dark energy: evolve a group in an expanding universe, decide who",
            "stays bound, merges, escapes or is ripped away, sweep parameters, watch and film it.",
            "",
            "Example:",
            "  holdfast evolve scenarios/hollin-group.toml"
        },
        subcommands = {
            CommandLine.HelpCommand.class,
            ExpansionCommand.class,
            ValidateCommand.class,
            EvolveCommand.class,
            SweepCommand.class,
            SweepMergeCommand.class,
            ThresholdCommand.class,
            NewCommand.class,
            BenchCommand.class,
            TimingCommand.class
        })
public final class Holdfast implements Runnable {

    /** Exit code for bad input: an unknown option, a malformed value, an unphysical scenario. */
    public static final int EXIT_BAD_INPUT = 2;

    /** Exit code for a failure that is not the user's input. */
    public static final int EXIT_FAILURE = 1;

    @Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    /** The engine's command line, with error handling in place. */
    public static CommandLine commandLine() {
        CommandLine cl = new CommandLine(new Holdfast());
        cl.setExecutionExceptionHandler(Holdfast::handleFailure);
        cl.setParameterExceptionHandler(Holdfast::handleBadOption);
        cl.setCaseInsensitiveEnumValuesAllowed(true);
        cl.setUsageHelpWidth(100);
        return cl;
    }

    public static void main(String[] args) {
        System.exit(execute(commandLine(), args));
    }

    /** Runs a command line as {@link #main} does, with even a JVM error reported as one line. */
    public static int execute(CommandLine cl, String[] args) {
        int code;
        try {
            code = cl.execute(args);
        } catch (StackOverflowError | OutOfMemoryError e) {
            // the readers limit what they read, so this is not the input's fault: one line, no trace
            System.err.println("holdfast: failed: " + (e instanceof OutOfMemoryError
                    ? "out of memory (give the JVM more with -Xmx)" : "the stack overflowed"));
            code = EXIT_FAILURE;
        }
        return code;
    }

    /** A malformed command line: one line naming the option, a pointer to the help, exit code 2. */
    static int handleBadOption(CommandLine.ParameterException e, String[] args) {
        CommandLine cl = e.getCommandLine();
        PrintWriter err = cl.getErr();
        String name = cl.getCommandSpec().qualifiedName();
        err.println(name + ": " + e.getMessage() + " (see '" + name + " --help')");
        err.flush();
        return EXIT_BAD_INPUT;
    }

    /**
     * Bad input becomes one line and exit code 2; anything else one line and exit code 1,
     * with the stack trace only under {@code HOLDFAST_DEBUG=1}.
     */
    static int handleFailure(Exception e, CommandLine cl, CommandLine.ParseResult parsed) {
        PrintWriter err = cl.getErr();
        Throwable cause = e;
        while (cause.getCause() != null && !(cause instanceof ScenarioException)) {
            cause = cause.getCause();
        }
        if (cause instanceof ScenarioException se) {
            err.println("holdfast " + cl.getCommandName() + ": " + se.getMessage());
            err.flush();
            return EXIT_BAD_INPUT;
        }
        if (cause instanceof CommandLine.ParameterException pe) {
            err.println("holdfast " + cl.getCommandName() + ": " + pe.getMessage());
            err.flush();
            return EXIT_BAD_INPUT;
        }
        err.println("holdfast " + cl.getCommandName() + ": failed: " + e);
        if ("1".equals(System.getenv("HOLDFAST_DEBUG"))) {
            e.printStackTrace(err);
        } else {
            err.println("(set HOLDFAST_DEBUG=1 to see the stack trace)");
        }
        err.flush();
        return EXIT_FAILURE;
    }
}
