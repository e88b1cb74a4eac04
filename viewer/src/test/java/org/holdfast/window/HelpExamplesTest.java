package org.holdfast.window;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import org.holdfast.film.RenderCommand;
import org.holdfast.output.RunFolder;
import org.holdfast.replay.DemoRun;
import org.holdfast.viewer.HoldfastFull;
import org.holdfast.window.gl.GlWindow;
import org.holdfast.viewer.ViewCommand;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.ParseResult;

/**
 * The examples in the help of {@code holdfast render} and {@code holdfast view} work as a user
 * of the README would type them: every one parses, names files the repository has or the run
 * folder its own evolve example writes, and the quick ones (a still, a one-frame window, the
 * key list) run against such a folder.
 */
@Tag("slow")
class HelpExamplesTest {

    /** The repository root, seen from the viewer module where Surefire runs. */
    private static final Path ROOT = Path.of("..");

    @TempDir
    Path dir;

    /** The example command lines of a command's help, continuation lines joined, comments cut. */
    static List<List<String>> examples(Class<?> command) {
        String[] lines = command.getAnnotation(Command.class).description();
        int at = Arrays.asList(lines).indexOf("Examples:");
        assertTrue(at >= 0, command.getSimpleName() + " has examples");
        List<List<String>> out = new ArrayList<>();
        StringBuilder b = new StringBuilder();
        for (int i = at + 1; i < lines.length; i++) {
            String line = lines[i].replaceFirst("\\s+#.*$", "").strip();
            boolean more = line.endsWith("\\");
            b.append(' ').append(more ? line.substring(0, line.length() - 1) : line);
            if (!more) {
                out.add(List.of(b.toString().strip().split("\\s+")));
                b.setLength(0);
            }
        }
        return out;
    }

    @Test
    void everyExampleParsesAndNamesFilesThatExist() {
        for (Class<?> c : List.of(RenderCommand.class, ViewCommand.class)) {
            List<List<String>> all = examples(c);
            List<String> runFolders = new ArrayList<>();
            for (List<String> e : all) {
                if (e.get(1).equals("evolve")) {
                    Path scenario = Path.of(e.get(2));
                    assertTrue(Files.isRegularFile(ROOT.resolve(scenario)), "exists: " + scenario);
                    runFolders.add(RunFolder.choose(null, scenario).toString());
                }
            }
            for (List<String> e : all) {
                assertEquals("holdfast", e.get(0), String.join(" ", e));
                ParseResult p = HoldfastFull.commandLine().parseArgs(e.subList(1, e.size()).toArray(String[]::new));
                ParseResult sub = p.subcommand();
                for (CommandLine.Model.PositionalParamSpec input : sub.matchedPositionals()) {
                    String name = input.getValue().toString();
                    assertTrue(Files.exists(ROOT.resolve(name)) || runFolders.contains(name),
                            name + " in '" + String.join(" ", e) + "' is a repository file or the folder of "
                                    + runFolders);
                }
                if (sub.hasMatchedOption("--film")) {
                    assertTrue(Files.isRegularFile(ROOT.resolve(sub.matchedOption("--film").getValue().toString())));
                }
            }
            assertFalse(runFolders.isEmpty(), c.getSimpleName() + " shows where its run folder comes from");
        }
    }

    /** The example, run in {@code dir} against the cut-down demo run standing in for hollin-group-run. */
    private ViewRun.Result runHere(List<String> example) throws Exception {
        Path run = dir.resolve("hollin-group-run");
        if (!Files.exists(run)) {
            Files.createSymbolicLink(run, DemoRun.mergerFolder().toAbsolutePath());
        }
        List<String> args = new ArrayList<>();
        for (int i = 1; i < example.size(); i++) {
            String a = example.get(i);
            String before = example.get(i - 1);
            boolean file = a.equals("hollin-group-run") || before.equals("--out") || before.equals("--screenshot");
            args.add(file ? dir.resolve(a).toString() : a.startsWith("scenarios/") ? ROOT.resolve(a).toString() : a);
        }
        return ViewRun.run(FrameSources::open, args.toArray(String[]::new));
    }

    @Test
    void theQuickExamplesRun() throws Exception {
        int ran = 0;
        for (Class<?> c : List.of(RenderCommand.class, ViewCommand.class)) {
            for (List<String> e : examples(c)) {
                boolean window = e.contains("--frames");
                if (!(e.contains("--still") || e.contains("--keys") || window)) {
                    continue; // films of hundreds of full-size frames, an interactive window, a full evolve
                }
                if (window && !GlWindow.displayNamed()) {
                    continue;
                }
                ViewRun.Result r = runHere(e);
                assertEquals(0, r.exitCode(), String.join(" ", e) + ": " + r.err());
                int out = Math.max(e.indexOf("--out"), e.indexOf("--screenshot"));
                if (out > 0) {
                    assertTrue(Files.isRegularFile(dir.resolve(e.get(out + 1))), "wrote " + e.get(out + 1));
                }
                ran++;
            }
        }
        assertTrue(ran >= 2, "examples run: " + ran);
    }
}
