package org.holdfast.cli;

import java.io.PrintWriter;
import java.io.StringWriter;

import picocli.CommandLine;

/** Runs a command line in-process and captures its exit code and output, for tests. */
public final class CommandRunner {

    /** What a run printed and returned. */
    public record Result(int exitCode, String out, String err) {
    }

    private CommandRunner() {
    }

    /** Runs the engine's command line. */
    public static Result run(String... args) {
        return run(Holdfast.commandLine(), args);
    }

    /** Runs a given command line. */
    public static Result run(CommandLine cl, String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        cl.setOut(new PrintWriter(out, true));
        cl.setErr(new PrintWriter(err, true));
        int code = cl.execute(args);
        return new Result(code, out.toString(), err.toString());
    }
}
