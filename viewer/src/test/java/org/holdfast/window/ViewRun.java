package org.holdfast.window;

import java.io.PrintWriter;
import java.io.StringWriter;

import org.holdfast.viewer.HoldfastFull;

import picocli.CommandLine;

/** Runs the full command line in-process with a given frame source, capturing exit code and output. */
public final class ViewRun {

    /** What a run printed and returned. */
    public record Result(int exitCode, String out, String err) {
    }

    private ViewRun() {
    }

    public static Result run(FrameSources.SourceOpener sources, String... args) {
        CommandLine cl = HoldfastFull.commandLine(sources);
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        cl.setOut(new PrintWriter(out, true));
        cl.setErr(new PrintWriter(err, true));
        int code = cl.execute(args);
        return new Result(code, out.toString(), err.toString());
    }
}
