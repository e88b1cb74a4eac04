package org.holdfast.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import picocli.CommandLine;

/**
 * Every example in the engine's --help texts names shipped files, keys and members, and runs.
 * Output paths go to a temporary folder; an evolve example runs for 0.01 Gyr; a sweep example
 * makes its first run only (as shard 1 of very many, after its check of every varied value);
 * the benchmark example is parsed only.
 */
@Tag("slow")
class HelpExamplesTest {

    /** The repository root, where the examples' relative paths start. */
    static final Path ROOT = Path.of("..");

    @TempDir
    Path tmp;

    /** The example command lines of a help text, continuation lines joined, without "holdfast". */
    static List<List<String>> examples(String help) {
        List<List<String>> out = new ArrayList<>();
        boolean inExamples = false;
        StringBuilder cmd = null;
        for (String line : help.lines().toList()) {
            String s = line.strip();
            if (s.equals("Example:") || s.equals("Examples:")) {
                inExamples = true;
                continue;
            }
            if (!inExamples) {
                continue;
            }
            if (cmd != null) {
                cmd.append(' ').append(s);
            } else if (s.startsWith("holdfast ")) {
                cmd = new StringBuilder(s);
            } else {
                break;
            }
            if (cmd.toString().endsWith("\\")) {
                cmd.setLength(cmd.length() - 1);
            } else {
                List<String> tokens = new ArrayList<>(List.of(cmd.toString().strip().split("\\s+")));
                tokens.remove(0);
                out.add(tokens);
                cmd = null;
            }
        }
        return out;
    }

    @Test
    void everyExampleNamesShippedFilesAndRuns() throws Exception {
        CommandLine root = Holdfast.commandLine();
        List<String> helps = new ArrayList<>(List.of(CommandRunner.run("--help").out()));
        for (String name : root.getSubcommands().keySet()) {
            if (!name.equals("help")) {
                helps.add(CommandRunner.run(name, "--help").out());
            }
        }
        int checked = 0;
        for (String help : helps) {
            List<List<String>> examples = examples(help);
            assertFalse(examples.isEmpty(), "a help text without an example:\n" + help);
            for (List<String> example : examples) {
                check(example);
                checked++;
            }
        }
        assertTrue(checked >= 12, "examples checked: " + checked);
    }

    private void check(List<String> example) throws Exception {
        List<String> args = new ArrayList<>();
        for (int i = 0; i < example.size(); i++) {
            String a = example.get(i);
            boolean output = i > 0 && List.of("--out", "--plot").contains(example.get(i - 1));
            if (output) {
                args.add(tmp.resolve("ex" + System.nanoTime() + "-" + Path.of(a).getFileName()).toString());
            } else if (a.startsWith("scenarios/")) {
                Path f = ROOT.resolve(a);
                assertTrue(Files.isRegularFile(f), "an example names " + a + ", which is not shipped: " + example);
                args.add(f.toString());
            } else {
                args.add(a);
            }
        }
        String command = args.get(0);
        switch (command) {
            case "bench" -> {
                // takes minutes: parse only (and drop the shell redirection)
                Holdfast.commandLine().parseArgs(args.subList(0, args.indexOf(">")).toArray(String[]::new));
                return;
            }
            case "evolve" -> {
                args.addAll(List.of("--until", "0.01", "--quiet"));
                if (!args.contains("--out")) {
                    // without --out evolve names a folder in the working directory: keep it out of the tree
                    args.addAll(List.of("--out", tmp.resolve("ex" + System.nanoTime()).toString()));
                }
            }
            case "sweep" -> args.addAll(List.of("--shard", "1/1000000"));
            case "sweep-merge" -> shardsFor(args);
            default -> {
            }
        }
        CommandRunner.Result r = CommandRunner.run(args.toArray(String[]::new));
        assertEquals(0, r.exitCode(), example + ":\n" + r.err());
    }

    /** Makes the shard folders a sweep-merge example names with a glob, and puts them in its place. */
    private void shardsFor(List<String> args) {
        String glob = args.stream().filter(a -> a.endsWith("*")).findFirst().orElseThrow();
        int at = args.indexOf(glob);
        args.remove(at);
        for (int i = 1; i <= 2; i++) {
            Path shard = tmp.resolve(glob.replace("*", Integer.toString(i)));
            CommandRunner.Result r = CommandRunner.run("sweep", ROOT.resolve("scenarios/tethered-pair.toml").toString(),
                    "--vary", "cosmology.dark_energy.w0=-1.6:-1.0:4", "--until", "1", "--shard", i + "/2", "--out", shard.toString());
            assertEquals(0, r.exitCode(), r.err());
            args.add(at + i - 1, shard.toString());
        }
    }
}
