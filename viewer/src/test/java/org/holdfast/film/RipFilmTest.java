package org.holdfast.film;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.holdfast.render.SceneFrame;
import org.holdfast.replay.ReplayScene;
import org.holdfast.replay.RunArchive;
import org.holdfast.window.FrameSources;
import org.holdfast.window.ViewRun;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

/**
 * A film of a phantom universe's end, made through the real command line: an invented spiral and
 * a small companion far off, evolved to the big rip of w = -1.5, then a countdown film riding
 * with the spiral.
 */
class RipFilmTest {

    private static final String SCENARIO = """
            name = "Lone spiral"
            [cosmology]
            h0 = 70
            omega_m = 0.3
            [cosmology.dark_energy]
            w0 = -1.5
            [run]
            until_gyr = 40
            accuracy = 0.01
            snapshot_every_myr = 500
            [[galaxy]]
            name = "Harl"
            mass_msun = 1.2e12
            position_kpc = [0, 0, 0]
            velocity_kms = [0, 0, 0]
            halo = { profile = "nfw", concentration = 9 }
            stars = { count = 1500, shape = "disk", radius_kpc = 5, normal = [0.2, 0.1, 1.0] }
            [[galaxy]]
            name = "Wrenna"
            mass_msun = 1e10
            position_kpc = [0, 2000, 0]
            velocity_kms = [0, 0, 0]
            halo = { profile = "point", softening_kpc = 1 }
            """;

    private static final int FRAMES = 240;

    @TempDir
    static Path dir;
    static Path scenario;
    static Path run;
    static Path film;
    static Path frames;
    static double rip;

    @BeforeAll
    static void evolveAndFilm() throws IOException {
        scenario = dir.resolve("lone.toml");
        Files.writeString(scenario, SCENARIO);
        run = dir.resolve("run");
        ViewRun.Result e = ViewRun.run(FrameSources::open, "evolve", scenario.toString(), "--out", run.toString());
        assertEquals(0, e.exitCode(), e.err());
        rip = new ObjectMapper().readTree(run.resolve("summary.json").toFile()).path("cosmology").path("rip_gyr")
                .asDouble();
        double end = RunArchive.open(run).lastGyr();
        film = dir.resolve("film.toml");
        // overlays and trails off: the frames show the light alone, for measuring
        Files.writeString(film, String.format(Locale.ROOT, """
                [film]
                length_s = 8
                frame_rate = 30
                frame_px = [256, 144]
                clock = "countdown"
                from_gyr = 0
                to_gyr = %s
                final_gyr = %s
                follow = "Harl"
                [film.orbit]
                radius_kpc = 60
                rise_kpc = 20
                [film.show]
                clock = false
                scale_factor = false
                scale_bar = false
                names = false
                events = false
                trails = false
                """, Double.toString(end), Double.toString(rip)));
        frames = dir.resolve("frames");
        ViewRun.Result r = FilmRun.render(run.toString(), "--film", film.toString(), "--out", frames.toString(),
                "--quiet", "--threads", "2");
        assertEquals(0, r.exitCode(), r.err());
    }

    @Test
    void snapshotsCloseInOnTheRip() {
        RunArchive a = RunArchive.open(run);
        int n = a.snapshotCount();
        // the run and its snapshots end within a millionth of the rip time of it
        assertTrue(rip - a.lastGyr() < 1e-6 * rip, "last snapshot " + (rip - a.lastGyr()) + " Gyr before");
        // over the last stretch the time left shrinks by the same ratio, e^(-1/16), at every snapshot
        for (int i = n - 40; i < n - 2; i++) {
            double ratio = (rip - a.timeOf(i + 1)) / (rip - a.timeOf(i));
            assertEquals(Math.exp(-1.0 / 16), ratio, 1e-6, "snapshot " + i);
        }
        // no ten frames of the countdown film fall between two consecutive snapshots
        double[] t = new double[FRAMES];
        List<CSVRecord> cues = cues();
        for (int i = 0; i < FRAMES; i++) {
            t[i] = Double.parseDouble(cues.get(i).get("t_gyr"));
        }
        for (int s = 0; s + 1 < n; s++) {
            int inside = 0;
            for (double ti : t) {
                if (ti > a.timeOf(s) && ti < a.timeOf(s + 1)) {
                    inside++;
                }
            }
            assertTrue(inside < 10, inside + " frames between snapshots " + s + " and " + (s + 1));
        }
    }

    @Test
    void cueSheetScaleFactorsAreTheExpansionHistorys() throws IOException {
        List<CSVRecord> cues = cues();
        assertEquals(FRAMES, cues.size());
        assertEquals("00:00:07:29", cues.get(FRAMES - 1).get("timecode"));
        StringBuilder at = new StringBuilder();
        int[] rows = {0, 60, 120, 180, 200, 220, 230, 235, 238, 239};
        for (int k : rows) {
            at.append(at.length() == 0 ? "" : ",").append(cues.get(k).get("t_gyr"));
        }
        ViewRun.Result x = ViewRun.run(FrameSources::open, "expansion", scenario.toString(), "--at", at.toString(),
                "--json");
        assertEquals(0, x.exitCode(), x.err());
        JsonNode samples = new ObjectMapper().readTree(x.out()).path("samples");
        for (int j = 0; j < rows.length; j++) {
            double mine = Double.parseDouble(cues.get(rows[j]).get("scale_factor"));
            double theirs = samples.get(j).path("a").asDouble();
            assertEquals(theirs, mine, 1e-6 * theirs, "frame " + (rows[j] + 1));
        }
        // a grows by orders of magnitude over the film: the last frame is near the rip
        assertTrue(Double.parseDouble(cues.get(FRAMES - 1).get("scale_factor")) > 1e6);
    }

    @Test
    void clockTextChangesOnEveryFrameOfTheLastQuarter() {
        List<CSVRecord> cues = cues();
        for (int i = 3 * FRAMES / 4; i < FRAMES; i++) {
            assertNotEquals(cues.get(i - 1).get("clock"), cues.get(i).get("clock"), "frame " + (i + 1));
            assertTrue(cues.get(i).get("clock").startsWith("rip in "), cues.get(i).get("clock"));
        }
        // the units shrink: years at the end, not billions
        assertTrue(cues.get(FRAMES - 1).get("clock").endsWith(" years"));
        assertTrue(!cues.get(FRAMES - 1).get("clock").contains("million"), cues.get(FRAMES - 1).get("clock"));
    }

    @Test
    void twoWorkersMakeTheSameBytesAsOne() throws Exception {
        Path shared = dir.resolve("shared");
        ExecutorService pool = Executors.newFixedThreadPool(2);
        try {
            Future<ViewRun.Result> a = pool.submit(() -> FilmRun.render(run.toString(), "--film", film.toString(),
                    "--out", shared.toString(), "--quiet", "--threads", "1", "--frame-range", "1-120"));
            Future<ViewRun.Result> b = pool.submit(() -> FilmRun.render(run.toString(), "--film", film.toString(),
                    "--out", shared.toString(), "--quiet", "--threads", "1", "--frame-range", "121-240"));
            assertEquals(0, a.get().exitCode(), a.get().err());
            assertEquals(0, b.get().exitCode(), b.get().err());
        } finally {
            pool.shutdown();
        }
        for (int i = 1; i <= FRAMES; i++) {
            String name = String.format(Locale.ROOT, "frame_%06d.png", i);
            assertArrayEquals(Files.readAllBytes(frames.resolve(name)), Files.readAllBytes(shared.resolve(name)), name);
        }
        assertArrayEquals(Files.readAllBytes(frames.resolve("cues.csv")), Files.readAllBytes(shared.resolve("cues.csv")));
        try (var s = Files.list(shared)) {
            assertEquals(0, s.filter(p -> p.getFileName().toString().endsWith(".part")).count());
        }
    }

    @Test
    void frameRangeOutsideTheFilmIsRefused() {
        ViewRun.Result r = FilmRun.render(run.toString(), "--film", film.toString(), "--out",
                dir.resolve("bad").toString(), "--frame-range", "200-300");
        assertEquals(2, r.exitCode());
        assertTrue(r.err().contains("--frame-range"), r.err());
        assertTrue(!Files.exists(dir.resolve("bad")), "nothing written");
    }

    /**
     * The galaxy comes apart over many frames, not in one: at each frame's time, the share of
     * its stars still within 30 kpc of its centre (the positions the frame draws, from the
     * replayed scene) falls from 80% to 20% of what it was at the start over at least ten frames.
     */
    @Test
    void theGalaxyComesApartOverManyFrames() {
        List<CSVRecord> cues = cues();
        ReplayScene scene = new ReplayScene(RunArchive.open(run));
        double[] share = new double[FRAMES];
        float[] p = new float[3];
        for (int i = 0; i < FRAMES; i++) {
            SceneFrame f = scene.at(Double.parseDouble(cues.get(i).get("t_gyr")));
            int g = 0;
            while (!f.name(g).equals("Harl")) {
                g++;
            }
            int mine = 0;
            int near = 0;
            for (int k = 0; k < f.tracerCount(); k++) {
                if (f.tracerHost(k) == 0) {
                    f.tracerPosition(k, p);
                    double dx = p[0] - f.galaxyX(g);
                    double dy = p[1] - f.galaxyY(g);
                    double dz = p[2] - f.galaxyZ(g);
                    mine++;
                    near += dx * dx + dy * dy + dz * dz < 30 * 30 ? 1 : 0;
                }
            }
            share[i] = near / (double) mine;
        }
        assertTrue(share[0] > 0.8, "intact at the start: " + share[0]);
        int first = -1;
        int gone = -1;
        for (int i = 0; i < FRAMES; i++) {
            if (first < 0 && share[i] < 0.8 * share[0]) {
                first = i;
            }
            if (gone < 0 && share[i] < 0.2 * share[0]) {
                gone = i;
            }
        }
        assertTrue(first > 0 && gone > first, "the galaxy comes apart in the film: " + Arrays.toString(share));
        assertTrue(gone - first >= 10, "from frame " + (first + 1) + " to " + (gone + 1) + ": " + Arrays.toString(share));
        // and the frames show it: the last frame's light is spread thinner than the first's
        assertTrue(gone < FRAMES - 1);
    }

    private static List<CSVRecord> cues() {
        try {
            String text = Files.readString(frames.resolve("cues.csv"));
            return CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get()
                    .parse(new StringReader(text)).getRecords();
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }
}
