package org.holdfast.sweep.spark;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.File;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Collectors;

import org.holdfast.cli.CommandRunner;
import org.holdfast.sweep.RunFunctions;
import org.holdfast.sweep.SweepFiles;
import org.holdfast.sweep.ToyRunFunction;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A real local-mode Spark session ({@code local[2]}) makes the same sweep as the local engine,
 * with the toy physics: the tables must be equal (results.csv without its wall_s column).
 */
@Tag("slow")
class SparkEngineTest {

    @TempDir
    Path tmp;

    Path scenario;

    @BeforeEach
    void setUp() throws Exception {
        RunFunctions.install(new ToyRunFunction());
        scenario = ToyRunFunction.writeScenario(tmp);
    }

    @AfterEach
    void tearDown() {
        RunFunctions.install(null);
    }

    private CommandRunner.Result sweep(String out, String... engine) {
        List<String> args = new ArrayList<>(List.of("sweep", scenario.toString(), "--out",
                tmp.resolve(out).toString(), "--vary", "cosmology.dark_energy.w0=-1.3:-0.9:5", "--vary",
                "galaxy.Vesk.mass_msun=1e10,1e11", "--samples", "4", "--seed", "2024", "--workers", "2"));
        args.addAll(List.of(engine));
        return CommandRunner.run(args.toArray(String[]::new));
    }

    /**
     * The engine without Spark on its class path (as the runnable jar is): the local engine works
     * and --engine spark is one line of bad input.
     */
    @Test
    void withoutSparkOnTheClassPathOnlyTheSparkEngineIsRefused() throws Exception {
        String cp = Arrays.stream(System.getProperty("java.class.path").split(File.pathSeparator))
                .filter(e -> !e.contains("/org/apache/spark/") && !e.contains("/org/scala-lang/"))
                .collect(Collectors.joining(File.pathSeparator));
        String javaExe = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        for (String engine : List.of("local", "spark")) {
            Path log = tmp.resolve(engine + ".log");
            Process p = new ProcessBuilder(javaExe, "-cp", cp, org.holdfast.sweep.ToySweepMain.class.getName(), "0",
                    tmp.resolve("calls").toString(), "sweep", scenario.toString(), "--out", tmp.resolve("no-spark-" + engine).toString(),
                    "--vary", "cosmology.dark_energy.w0=-1.2,-1.0", "--engine", engine)
                    .redirectErrorStream(true).redirectOutput(log.toFile()).start();
            assertTrue(p.waitFor(60, TimeUnit.SECONDS));
            String text = Files.readString(log);
            if (engine.equals("local")) {
                assertEquals(0, p.exitValue(), text);
            } else {
                assertEquals(2, p.exitValue(), text);
                assertTrue(text.contains("--engine: spark: Apache Spark is not on the class path"), text);
                assertEquals(1, text.strip().lines().count(), text);
            }
        }
    }

    /**
     * The real physics under Spark, with a scenario that reads a w(a) table from a file beside it:
     * the executors get the table too, and the tables equal the local engine's (but for wall_s).
     */
    @Test
    void sparkShipsTheFilesAScenarioRefersToAndMatchesTheLocalEngineThroughTheRealPhysics() throws Exception {
        RunFunctions.install(null);
        Path data = tmp.resolve("data");
        Files.createDirectories(data);
        Files.copy(Path.of("../scenarios/drifting-w.csv"), data.resolve("drifting-w.csv"));
        String pair = Files.readString(Path.of("../scenarios/tethered-pair.toml"))
                .replace("w0 = -1.0\nwa = 0.0", "table = \"drifting-w.csv\"");
        assertTrue(pair.contains("table = \"drifting-w.csv\""), "the scenario reads the table");
        Path real = data.resolve("drifting-pair.toml");
        Files.writeString(real, pair);
        List<String> args = new ArrayList<>(List.of("sweep", real.toString(), "--vary",
                "galaxy.Wrenna.mass_msun=2e11,4e11", "--vary", "galaxy.Wrenna.velocity_kms.1=100,129.05",
                "--set", "galaxy.Harl.mass_msun={ median = 1.2e12, sigma_dex = 0.1 }", "--samples", "2",
                "--until", "20", "--seed", "11", "--workers", "2", "--pair", "Harl,Wrenna"));
        List<String> local = new ArrayList<>(args);
        local.addAll(List.of("--out", tmp.resolve("real-local").toString()));
        CommandRunner.Result l = CommandRunner.run(local.toArray(String[]::new));
        assertEquals(0, l.exitCode(), l.err());
        List<String> spark = new ArrayList<>(args);
        spark.addAll(List.of("--out", tmp.resolve("real-spark").toString(), "--engine", "spark", "--spark-master",
                "local[2]"));
        CommandRunner.Result s = CommandRunner.run(spark.toArray(String[]::new));
        assertEquals(0, s.exitCode(), s.err());
        assertTrue(s.out().contains("8 made now"), s.out());
        List<String> rows = SweepFiles.resultsWithoutWall(tmp.resolve("real-local"));
        assertEquals(rows, SweepFiles.resultsWithoutWall(tmp.resolve("real-spark")));
        assertTrue(rows.get(0).contains("galaxy.Harl.mass_msun"), "the drawn mass is a column: " + rows.get(0));
        assertEquals(Files.readString(tmp.resolve("real-local/fractions.csv")),
                Files.readString(tmp.resolve("real-spark/fractions.csv")));
    }

    @Test
    void sparkAndLocalEnginesGiveTheSameTables() throws Exception {
        CommandRunner.Result local = sweep("local");
        assertEquals(0, local.exitCode(), local.err());
        CommandRunner.Result spark = sweep("spark", "--engine", "spark", "--spark-master", "local[2]");
        assertEquals(0, spark.exitCode(), spark.err());
        assertTrue(spark.out().contains("40 made now"), spark.out());
        assertEquals(SweepFiles.resultsWithoutWall(tmp.resolve("local")), SweepFiles.resultsWithoutWall(tmp.resolve("spark")));
        assertEquals(Files.readString(tmp.resolve("local/fractions.csv")), Files.readString(tmp.resolve("spark/fractions.csv")));
    }
}
