package org.holdfast.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;

import org.holdfast.sweep.SweepMerge;

import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code holdfast sweep-merge}: the shard folders of one sweep into one folder. */
@Command(name = "sweep-merge",
        mixinStandardHelpOptions = true,
        header = "Combine the shard folders of one sweep.",
        description = {
            "Combines the folders of the shards of one sweep (made with --shard I/N)",
            "into one folder, as if the sweep had been made in one go. Checks that the",
            "folders belong to the same sweep, that every shard is there once and that",
            "each has finished.",
            "",
            "Example:",
            "  holdfast sweep-merge w-sweep-shard-* --out w-sweep"
        })
public final class SweepMergeCommand implements Callable<Integer> {

    @Parameters(arity = "1..*", paramLabel = "DIR", description = "The shard folders.")
    List<Path> dirs;

    @Option(names = "--out", required = true, paramLabel = "DIR", description = "The merged folder (new or empty).")
    Path out;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        PrintWriter stdout = spec.commandLine().getOut();
        List<Path> written = SweepMerge.merge(dirs, out);
        stdout.printf("sweep-merge: %d shard folders into %s%n", dirs.size(), out);
        for (Path p : written) {
            stdout.println("  wrote " + p);
        }
        stdout.flush();
        return 0;
    }
}
