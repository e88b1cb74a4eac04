package org.holdfast.faults;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import org.holdfast.cli.CommandRunner;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Property-based test of every engine command against damaged input, seeded and reproducible:
 * valid scenarios and command lines are mutated (numbers to NaN, infinities, 0, -1, 1e308 and
 * huge counts; lines deleted, duplicated, swapped, truncated; bytes garbled) and every command
 * must answer with exit code 0, or 2 with one line that names no exception, within a bounded
 * time, and leave nothing behind on exit 2. A failure names the seed of its case; set
 * {@code -Dholdfast.fuzz.seed=S} to run only that case, {@code -Dholdfast.fuzz.cases=N} for
 * more cases.
 */
class MutationFuzzTest {

    private static final long BASE_SEED = 0x5eed_f00dL;
    private static final int CASES = Integer.getInteger("holdfast.fuzz.cases", 90);
    private static final Duration LIMIT = Duration.ofSeconds(60);
    private static final Pattern NUMBER = Pattern.compile("(?<![A-Za-z_.])-?[0-9]+(\\.[0-9]+)?([eE][-+]?[0-9]+)?");
    private static final Pattern EXCEPTION = Pattern.compile("\\b[A-Za-z]+(Exception|Error)\\b|\\n\\s+at ");
    private static final String[] WEIRD = {"nan", "inf", "-inf", "0", "-1", "1e308", "-1e308", "1e-308", "1e9",
        "4294967296", "9223372036854775807", "-0.0", "1e-9", "3"};
    private static final String[] WEIRD_OPTION = {"NaN", "Infinity", "-Infinity", "0", "-1", "1e308", "-1e308",
        "1e-308", "1e9", "4294967296", "9223372036854775807", "x", "", "1e5", "-20", "2"};
    private static final String[] SET_KEYS = {"run.until_gyr", "run.start_gyr", "run.snapshot_every_myr",
        "run.accuracy", "run.step_myr", "run.seed", "run.merge_within_kpc", "run.coulomb_log", "cosmology.h0",
        "cosmology.omega_m", "cosmology.omega_r", "cosmology.omega_k", "cosmology.dark_energy.w0",
        "cosmology.dark_energy.wa", "galaxy.Harl.mass_msun", "galaxy.Wrenna.position_kpc.0",
        "galaxy.Wrenna.velocity_kms.1", "galaxy.Harl.halo.softening_kpc", "galaxy.Nobody.mass_msun"};
    private static final String[] JUNK_LINES = {"[[galaxy]]", "[run]", "x = ", "= 3", "name = \"Harl\"",
        "[cosmology.dark_energy]", "until_gyr = \"soon\"", "mass_msun = { median = 1e12, sigma_dex = 50 }",
        "[flow]\ncount = 4294967296\ninner_kpc = 1\nouter_kpc = 2", "stars = { count = 1e9 }",
        "x = [[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[1]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]"
            + "]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]]"};

    @TempDir
    Path tmp;

    @Test
    void everyCommandAnswersDamagedInputWithExitZeroOrOneLineAndExitTwo() throws Exception {
        String pair = Files.readString(Path.of("..", "scenarios", "tethered-pair.toml"))
                .replace("until_gyr = 60", "until_gyr = 4").replace("snapshot_every_myr = 500", "snapshot_every_myr = 2000");
        String observed = Files.readString(Path.of("..", "scenarios", "observed-ossel-group.toml"));
        String drifting = Files.readString(Path.of("..", "scenarios", "drifting-w.toml"));
        byte[] table = Files.readAllBytes(Path.of("..", "scenarios", "drifting-w.csv"));
        Long only = Long.getLong("holdfast.fuzz.seed");
        List<String> failures = new ArrayList<>();
        int[] exits = new int[3];
        for (int c = 0; c < CASES; c++) {
            long seed = only != null ? only : BASE_SEED + c;
            if (only != null && c > 0) {
                break;
            }
            Random rnd = new Random(seed);
            Path dir = Files.createDirectories(tmp.resolve("case-" + seed));
            List<String> args;
            switch ((int) (seed % 6)) {
                case 0, 1 -> args = evolveCase(rnd, dir, pair);
                case 2 -> args = validateCase(rnd, dir, rnd.nextBoolean() ? observed : pair);
                case 3 -> args = expansionCase(rnd, dir, drifting, table);
                case 4 -> args = optionsCase(rnd, dir);
                default -> args = sweepCase(rnd, dir, pair);
            }
            String problem = check(dir, args, exits);
            if (problem != null) {
                failures.add("seed " + seed + ": holdfast " + String.join(" ", args) + "\n    " + problem);
            }
        }
        if (!failures.isEmpty()) {
            fail(failures.size() + " of " + CASES + " cases broke a promise:\n" + String.join("\n", failures));
        }
        System.out.printf("mutation fuzz: %d cases, %d answered (exit 0), %d refused (exit 2)%n", CASES, exits[0],
                exits[2]);
        if (only == null) {
            // the mutations reach past the first check: a good share of the damaged inputs still runs
            assertTrue(exits[0] >= CASES / 20 && exits[2] >= CASES / 4, "exit 0: " + exits[0] + ", exit 2: " + exits[2]);
        }
    }

    /** Runs one case; returns what went wrong, or null. */
    private String check(Path dir, List<String> args, int[] exits) throws IOException {
        Path out = dir.resolve("out");
        CommandRunner.Result r;
        try {
            r = assertTimeoutPreemptively(LIMIT, () -> CommandRunner.run(args.toArray(String[]::new)));
        } catch (org.opentest4j.AssertionFailedError e) {
            return "no answer within " + LIMIT.toSeconds() + " s";
        } catch (StackOverflowError | OutOfMemoryError e) {
            return "JVM error " + e;
        }
        String err = r.err().strip();
        exits[Math.min(2, Math.max(0, r.exitCode()))]++;
        if (EXCEPTION.matcher(err).find()) {
            return "an exception name or trace: " + err;
        }
        if (r.exitCode() == 0) {
            if (args.get(0).equals("evolve") && !Files.exists(out.resolve("summary.json"))) {
                return "exit 0 without summary.json";
            }
            return null;
        }
        if (r.exitCode() != 2) {
            return "exit " + r.exitCode() + ": " + err;
        }
        if (err.lines().count() != 1 || err.isEmpty()) {
            return "not one line: " + err;
        }
        if (Files.exists(out)) {
            return "exit 2 left " + out + " behind: " + err;
        }
        try (Stream<Path> s = Files.list(dir)) {
            List<String> names = s.map(p -> p.getFileName().toString()).filter(n -> !n.startsWith("in")).toList();
            if (!names.isEmpty()) {
                return "exit 2 left " + names + " behind: " + err;
            }
        }
        return null;
    }

    // ---- cases ------------------------------------------------------------------------------------

    private static List<String> evolveCase(Random rnd, Path dir, String scenario) throws IOException {
        Path f = dir.resolve("in.toml");
        boolean mutateFile = rnd.nextInt(3) > 0;
        write(f, mutateFile ? mutate(rnd, scenario) : scenario.getBytes(StandardCharsets.UTF_8));
        List<String> args = new ArrayList<>(List.of("evolve", f.toString(), "--out", dir.resolve("out").toString(),
                "--quiet"));
        if (!mutateFile || rnd.nextBoolean()) {
            args.addAll(options(rnd));
        }
        return args;
    }

    private static List<String> validateCase(Random rnd, Path dir, String scenario) throws IOException {
        Path f = dir.resolve("in.toml");
        write(f, mutate(rnd, scenario));
        List<String> args = new ArrayList<>(List.of("validate", f.toString()));
        if (rnd.nextBoolean()) {
            args.add("--json");
        }
        return args;
    }

    private static List<String> expansionCase(Random rnd, Path dir, String scenario, byte[] table) throws IOException {
        Path f = dir.resolve("in.toml");
        Path csv = dir.resolve("drifting-w.csv");
        if (rnd.nextBoolean()) {
            write(f, scenario.getBytes(StandardCharsets.UTF_8));
            write(csv, mutate(rnd, new String(table, StandardCharsets.UTF_8)));
        } else {
            write(f, mutate(rnd, scenario));
            write(csv, table);
        }
        Files.move(csv, dir.resolve("in-w.csv"));
        Files.writeString(f, Files.readString(f, StandardCharsets.ISO_8859_1).replace("drifting-w.csv", "in-w.csv"),
                StandardCharsets.ISO_8859_1);
        return new ArrayList<>(List.of("expansion", f.toString(), "--at", pick(rnd, WEIRD_OPTION) + ",1"));
    }

    /** Command lines of the commands that read no scenario, with weird numbers. */
    private static List<String> optionsCase(Random rnd, Path dir) {
        return switch (rnd.nextInt(3)) {
            case 0 -> new ArrayList<>(List.of("expansion", "--h0", pick(rnd, WEIRD_OPTION), "--omega-m",
                    pick(rnd, WEIRD_OPTION), "--w0", pick(rnd, WEIRD_OPTION), "--wa", rnd.nextBoolean() ? "0" : pick(rnd,
                            WEIRD_OPTION), "--omega-r", rnd.nextBoolean() ? "cmb" : pick(rnd, WEIRD_OPTION)));
            case 1 -> new ArrayList<>(List.of("timing", "--separation-kpc", pick(rnd, WEIRD_OPTION),
                    "--radial-velocity-kms", pick(rnd, WEIRD_OPTION), "--h0", "70", "--omega-m", "0.3"));
            default -> new ArrayList<>(List.of("new", "--giants", pick(rnd, WEIRD_OPTION), "--dwarfs",
                    pick(rnd, WEIRD_OPTION), "--mass", pick(rnd, WEIRD_OPTION), "--radius-kpc", pick(rnd, WEIRD_OPTION),
                    "--out", dir.resolve("out").resolve("g.toml").toString()));
        };
    }

    private static List<String> sweepCase(Random rnd, Path dir, String scenario) throws IOException {
        Path f = dir.resolve("in.toml");
        write(f, rnd.nextInt(4) == 0 ? mutate(rnd, scenario) : scenario.getBytes(StandardCharsets.UTF_8));
        String key = pick(rnd, SET_KEYS);
        String vary = rnd.nextBoolean() ? key + "=" + pick(rnd, WEIRD_OPTION) + "," + pick(rnd, WEIRD_OPTION)
                : key + "=" + pick(rnd, WEIRD_OPTION) + ":" + pick(rnd, WEIRD_OPTION) + ":" + pick(rnd, WEIRD_OPTION);
        List<String> args = new ArrayList<>(List.of("sweep", f.toString(), "--vary", vary, "--out",
                dir.resolve("out").toString(), "--workers", "1"));
        if (rnd.nextBoolean()) {
            args.addAll(List.of("--samples", pick(rnd, WEIRD_OPTION)));
        }
        return args;
    }

    private static List<String> options(Random rnd) {
        List<String> o = new ArrayList<>();
        int n = 1 + rnd.nextInt(2);
        for (int i = 0; i < n; i++) {
            switch (rnd.nextInt(3)) {
                case 0 -> o.addAll(List.of("--until", pick(rnd, WEIRD_OPTION)));
                case 1 -> o.addAll(List.of("--set", pick(rnd, SET_KEYS) + "=" + pick(rnd, WEIRD_OPTION)));
                default -> o.addAll(List.of("--sample", pick(rnd, WEIRD_OPTION)));
            }
        }
        return o;
    }

    // ---- mutations --------------------------------------------------------------------------------

    /** One to three random mutations of a text, as bytes (garbling may leave it not UTF-8). */
    static byte[] mutate(Random rnd, String text) {
        String t = text;
        int n = 1 + rnd.nextInt(3);
        byte[] bytes = null;
        for (int i = 0; i < n; i++) {
            int kind = rnd.nextInt(8);
            if (kind == 7) {
                bytes = garble(rnd, (bytes != null ? new String(bytes, StandardCharsets.ISO_8859_1) : t)
                        .getBytes(StandardCharsets.ISO_8859_1));
                continue;
            }
            if (bytes != null) {
                t = new String(bytes, StandardCharsets.ISO_8859_1);
                bytes = null;
            }
            t = switch (kind) {
                case 0, 1 -> replaceNumber(rnd, t);
                case 2 -> editLines(rnd, t, 0);
                case 3 -> editLines(rnd, t, 1);
                case 4 -> editLines(rnd, t, 2);
                case 5 -> t.substring(0, rnd.nextInt(t.length() + 1));
                default -> editLines(rnd, t, 3);
            };
        }
        return bytes != null ? bytes : t.getBytes(StandardCharsets.UTF_8);
    }

    private static String replaceNumber(Random rnd, String t) {
        Matcher m = NUMBER.matcher(t);
        List<int[]> spans = new ArrayList<>();
        while (m.find()) {
            spans.add(new int[] {m.start(), m.end()});
        }
        if (spans.isEmpty()) {
            return t;
        }
        int[] s = spans.get(rnd.nextInt(spans.size()));
        return t.substring(0, s[0]) + pick(rnd, WEIRD) + t.substring(s[1]);
    }

    /** 0: delete a line, 1: duplicate one, 2: swap two, 3: insert a junk line. */
    private static String editLines(Random rnd, String t, int how) {
        List<String> lines = new ArrayList<>(Arrays.asList(t.split("\n", -1)));
        int i = rnd.nextInt(lines.size());
        switch (how) {
            case 0 -> lines.remove(i);
            case 1 -> lines.add(i, lines.get(i));
            case 2 -> {
                int j = rnd.nextInt(lines.size());
                String a = lines.get(i);
                lines.set(i, lines.get(j));
                lines.set(j, a);
            }
            default -> lines.add(i, pick(rnd, JUNK_LINES));
        }
        return String.join("\n", lines);
    }

    private static byte[] garble(Random rnd, byte[] b) {
        byte[] g = b.clone();
        int n = 1 + rnd.nextInt(3);
        for (int i = 0; i < n && g.length > 0; i++) {
            g[rnd.nextInt(g.length)] = (byte) (rnd.nextBoolean() ? 0x80 + rnd.nextInt(128) : rnd.nextInt(256));
        }
        return g;
    }

    private static String pick(Random rnd, String[] from) {
        return from[rnd.nextInt(from.length)];
    }

    private static void write(Path f, byte[] content) throws IOException {
        Files.write(f, content);
    }

    @Test
    void theMutationsAreReproducible() {
        String text = "a = 1\nb = [2, 3.5]\nc = \"x\"\n";
        byte[] one = mutate(new Random(7), text);
        byte[] two = mutate(new Random(7), text);
        assertTrue(Arrays.equals(one, two));
        boolean changed = false;
        for (int s = 0; s < 20; s++) {
            changed |= !Arrays.equals(mutate(new Random(s), text), text.getBytes(StandardCharsets.UTF_8));
        }
        assertTrue(changed, "the mutations change the text");
        assertFalse(Arrays.equals(mutate(new Random(1), text), mutate(new Random(2), text)));
    }
}
