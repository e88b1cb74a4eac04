package org.holdfast.replay;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.stream.Stream;

import org.holdfast.cli.Holdfast;
import org.holdfast.scenario.ScenarioException;

import picocli.CommandLine;

/**
 * A scenario evolved into a temporary run folder with {@code holdfast evolve}, so that it can be
 * replayed like any run; the folder is removed on {@link #close()}. Evolving first (rather than
 * stepping as frames are drawn) keeps every frame a pure function of its time: frames can be
 * drawn in any order, skipped on a restart and scrubbed back and forth in the window.
 */
public final class TemporaryRun implements AutoCloseable {

    private final Path dir;

    private TemporaryRun(Path dir) {
        this.dir = dir;
    }

    /**
     * Evolves {@code scenario} with the given {@code --set} overrides.
     *
     * @param progress where the evolve's progress goes, or null for none
     * @throws ScenarioException with the evolve's own one-line message when the scenario is bad
     */
    public static TemporaryRun evolve(Path scenario, List<String> sets, PrintWriter progress) {
        Path parent;
        try {
            parent = Files.createTempDirectory("holdfast-run-");
        } catch (IOException e) {
            throw new UncheckedIOException("cannot make a temporary run folder", e);
        }
        Path dir = parent.resolve("run");
        List<String> args = new ArrayList<>(List.of("evolve", scenario.toString(), "--out", dir.toString()));
        for (String s : sets) {
            args.add("--set");
            args.add(s);
        }
        if (progress == null) {
            args.add("--quiet");
        }
        CommandLine cl = Holdfast.commandLine();
        StringWriter err = new StringWriter();
        cl.setErr(new PrintWriter(err, true));
        cl.setOut(progress != null ? progress : new PrintWriter(new StringWriter(), true));
        int code = cl.execute(args.toArray(String[]::new));
        if (code != 0) {
            delete(parent);
            String line = err.toString().strip().lines().findFirst().orElse("evolve failed");
            throw new ScenarioException(null, null, line.replaceFirst("^holdfast evolve: ", ""));
        }
        return new TemporaryRun(dir);
    }

    /** The run folder. */
    public Path dir() {
        return dir;
    }

    @Override
    public void close() {
        delete(dir.getParent());
    }

    /** Removes a folder and everything in it; a folder that will not go is left behind. */
    static void delete(Path root) {
        if (root == null || !Files.exists(root)) {
            return;
        }
        try (Stream<Path> s = Files.walk(root)) {
            s.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        } catch (IOException e) {
            // a temporary folder left behind is harmless
        }
    }
}
