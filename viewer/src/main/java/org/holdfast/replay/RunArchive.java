package org.holdfast.replay;

import java.io.IOException;
import java.io.Reader;
import java.io.StringReader;
import java.nio.channels.Channels;
import java.nio.channels.SeekableByteChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.holdfast.output.RunFolder;
import org.holdfast.output.SnapshotWriter;
import org.holdfast.output.TrackWriter;
import org.holdfast.render.FateEvent;
import org.holdfast.run.RunEvent;
import org.holdfast.schema.ScenarioException;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import io.jhdf.HdfFile;
import io.jhdf.api.Attribute;

/**
 * A finished run folder, opened for replay: the times of its snapshots (read from each file's
 * {@code t_gyr} attribute), the galaxies' saved paths and velocities from {@code tracks.csv}
 * (for trails), and the fate events and rip time from {@code summary.json}. Snapshots are
 * loaded on demand and the two most recent are kept, which is all a film moving through time
 * needs.
 */
public final class RunArchive {

    private final Path dir;
    private final List<String> initialNames;
    private Path[] files;
    private double[] times;
    private List<FateEvent> events;
    private boolean summaryRead;
    private double ripGyr;
    private boolean stoppedBeforeRip;
    private Map<String, double[][]> tracks;
    /** The rows of tracks.csv read so far, per galaxy, and how many bytes of it they took. */
    private final Map<String, List<double[]>> trackRows = new LinkedHashMap<>();
    private long trackBytes;
    private String[] trackHeader;
    private final Snapshot[] cache = new Snapshot[2];
    private final int[] cached = {-1, -1};
    private int nextSlot;

    private RunArchive(Path dir, Path[] files, double[] times, List<String> initialNames) {
        this.dir = dir;
        this.files = files;
        this.times = times;
        this.initialNames = initialNames;
    }

    /**
     * Opens a run folder written by {@code holdfast evolve}.
     *
     * @throws ScenarioException naming the folder (or file) when it is not a usable run
     */
    public static RunArchive open(Path dir) {
        if (!Files.isDirectory(dir)) {
            throw new ScenarioException(dir.toString(), null, "not a run folder");
        }
        List<Path> found = snapshotFiles(dir);
        if (found.isEmpty()) {
            throw new ScenarioException(dir.toString(), null, "no snapshots (" + SnapshotWriter.FOLDER
                    + "/state_*.h5) in this folder; make a run folder with holdfast evolve");
        }
        List<String> names;
        try (HdfFile h = new HdfFile(found.get(0))) {
            names = initialNames(h);
        } catch (RuntimeException e) {
            throw new ScenarioException(found.get(0).toString(), null, "not a readable snapshot: " + e.getMessage());
        }
        RunArchive run = new RunArchive(dir, new Path[0], new double[0], names);
        run.addSnapshots(found);
        run.readSummary();
        // without its summary the run may still be writing: leave a half-written last row for later
        run.readTracks(!run.summaryRead);
        return run;
    }

    /**
     * Takes in what a run still being written has added since the last look: new snapshots,
     * the rows of {@code tracks.csv} written so far (a row still being written is left for next
     * time), and the summary once it appears. Indices of known snapshots do not change.
     *
     * @return whether anything new was found
     */
    public boolean refresh() {
        List<Path> found = snapshotFiles(dir);
        boolean more = found.size() > files.length;
        if (more) {
            addSnapshots(found);
            readTracks(true);
        }
        boolean summary = !summaryRead && readSummary();
        if (summary) {
            readTracks(false);
        }
        return more || summary;
    }

    /** Whether the run's summary has been read: the run is complete. */
    public boolean complete() {
        return summaryRead;
    }

    /** Fate events of a run still going, as they stand, used until the summary exists. */
    public void useEventsUntilSummary(List<FateEvent> provisional) {
        if (!summaryRead) {
            List<FateEvent> sorted = new ArrayList<>(provisional);
            sorted.sort((a, b) -> Double.compare(a.tGyr(), b.tGyr()));
            events = List.copyOf(sorted);
        }
    }

    /** Reads the times of the snapshots in {@code found} beyond those already known. */
    private void addSnapshots(List<Path> found) {
        int known = files.length;
        Path[] f = found.toArray(Path[]::new);
        double[] t = java.util.Arrays.copyOf(times, f.length);
        for (int i = known; i < f.length; i++) {
            try (HdfFile h = new HdfFile(f[i])) {
                t[i] = number(h.getAttribute("t_gyr"), f[i], "t_gyr");
            } catch (ScenarioException e) {
                throw e;
            } catch (RuntimeException e) {
                throw new ScenarioException(f[i].toString(), null, "not a readable snapshot: " + e.getMessage());
            }
            if (i > 0 && !((t[i] - t[i - 1]) * (i > 1 ? t[1] - t[0] : t[i] - t[i - 1]) > 0)) {
                throw new ScenarioException(f[i].toString(), "t_gyr", "snapshot times are not in order");
            }
        }
        files = f;
        times = t;
    }

    /** Reads events, rip time and stop reason from summary.json; false when there is none yet. */
    private boolean readSummary() {
        Path summary = dir.resolve(RunFolder.SUMMARY);
        List<FateEvent> found = new ArrayList<>();
        double rip = Double.NaN;
        boolean beforeRip = false;
        boolean present = Files.isRegularFile(summary);
        if (present) {
            try {
                JsonNode root = new ObjectMapper().readTree(summary.toFile());
                for (JsonNode e : root.path("events")) {
                    List<String> members = new ArrayList<>();
                    e.path("members").forEach(m -> members.add(m.asText()));
                    FateEvent event = e.path("t_gyr").isNumber()
                            ? event(e.path("kind").asText(), e.path("t_gyr").asDouble(), members) : null;
                    if (event != null) {
                        found.add(event);
                    }
                }
                JsonNode r = root.path("cosmology").path("rip_gyr");
                rip = r.isNumber() ? r.asDouble() : Double.NaN;
                beforeRip = "before_rip".equals(root.path("stop_reason").asText());
            } catch (IOException e) {
                throw new ScenarioException(summary.toString(), null, "not readable JSON: " + e.getMessage());
            }
        }
        found.sort((a, b) -> Double.compare(a.tGyr(), b.tGyr()));
        if (present || events == null) {
            events = List.copyOf(found);
            ripGyr = rip;
            stoppedBeforeRip = beforeRip;
        }
        summaryRead = present;
        return present;
    }

    private static List<Path> snapshotFiles(Path dir) {
        Path snaps = dir.resolve(SnapshotWriter.FOLDER);
        List<Path> out = new ArrayList<>();
        if (!Files.isDirectory(snaps)) {
            return out;
        }
        try (DirectoryStream<Path> s = Files.newDirectoryStream(snaps, "state_[0-9]*.h5")) {
            s.forEach(out::add);
        } catch (IOException e) {
            throw new ScenarioException(snaps.toString(), null, "cannot list snapshots: " + e.getMessage());
        }
        out.sort(null);
        return out;
    }

    private static List<String> initialNames(HdfFile h) {
        Attribute a = h.getAttribute("initial_galaxies");
        if (a != null && a.getData() instanceof String s && !s.isEmpty()) {
            return List.of(s.split(","));
        }
        return List.of((String[]) h.getDatasetByPath("galaxies/name").getData());
    }

    private static double number(Attribute a, Path file, String key) {
        if (a == null) {
            throw new ScenarioException(file.toString(), key, "missing attribute");
        }
        Object v = a.getData();
        if (v instanceof Number n) {
            return n.doubleValue();
        }
        if (v instanceof double[] d && d.length == 1) {
            return d[0];
        }
        throw new ScenarioException(file.toString(), key, "expected a number, got " + v);
    }

    /**
     * A fate event from its key in summary.json (one of {@link RunEvent.Kind}'s words) and
     * members; null for an unknown kind or no members.
     */
    static FateEvent event(String kindKey, double tGyr, List<String> members) {
        RunEvent.Kind kind = RunEvent.Kind.of(kindKey);
        return kind == null || members.isEmpty() ? null : new FateEvent(tGyr, kind, members);
    }

    /** Rows of a saved track: t (Gyr), x, y, z (kpc), vx, vy, vz (km/s). */
    static final int TRACK_ROWS = 7;

    /**
     * Reads the rows of tracks.csv written since the last read (each byte of the file is parsed
     * once, however often a growing run is refreshed) and makes the saved centre paths per galaxy
     * name: rows t, x, y, z, vx, vy, vz; empty when there is no tracks.csv.
     *
     * @param growing the file may still be written: a last line without its newline waits
     */
    private void readTracks(boolean growing) {
        Path file = dir.resolve(TrackWriter.FILE);
        if (Files.isRegularFile(file)) {
            byte[] fresh;
            try (SeekableByteChannel ch = Files.newByteChannel(file)) {
                ch.position(trackBytes);
                fresh = Channels.newInputStream(ch).readAllBytes();
            } catch (IOException e) {
                throw new ScenarioException(file.toString(), null, "cannot read the tracks: " + e.getMessage());
            }
            int end = fresh.length;
            if (growing) {
                // whole lines only: the row being written now is read next time
                while (end > 0 && fresh[end - 1] != '\n') {
                    end--;
                }
            }
            parseTrackRows(file, new String(fresh, 0, end, StandardCharsets.UTF_8));
            trackBytes += end;
        }
        Map<String, double[][]> out = new LinkedHashMap<>();
        trackRows.forEach((name, list) -> {
            double[][] a = new double[TRACK_ROWS][list.size()];
            for (int k = 0; k < list.size(); k++) {
                for (int c = 0; c < TRACK_ROWS; c++) {
                    a[c][k] = list.get(k)[c];
                }
            }
            out.put(name, a);
        });
        tracks = out;
    }

    /** Adds the rows in {@code text}, whole lines of tracks.csv; the first read takes the header too. */
    private void parseTrackRows(Path file, String text) {
        if (text.isEmpty()) {
            return;
        }
        CSVFormat f = trackHeader == null ? CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get()
                : CSVFormat.DEFAULT.builder().setHeader(trackHeader).get();
        try (Reader r = new StringReader(text); CSVParser p = CSVParser.parse(r, f)) {
            if (trackHeader == null) {
                trackHeader = p.getHeaderNames().toArray(String[]::new);
            }
            for (CSVRecord rec : p) {
                trackRows.computeIfAbsent(rec.get("name"), k -> new ArrayList<>()).add(new double[] {
                    Double.parseDouble(rec.get("t_gyr")), Double.parseDouble(rec.get("x_kpc")),
                    Double.parseDouble(rec.get("y_kpc")), Double.parseDouble(rec.get("z_kpc")),
                    Double.parseDouble(rec.get("vx_kms")), Double.parseDouble(rec.get("vy_kms")),
                    Double.parseDouble(rec.get("vz_kms"))});
            }
        } catch (IOException | RuntimeException e) {
            throw new ScenarioException(file.toString(), null, "cannot read the tracks: " + e.getMessage());
        }
    }

    public Path dir() {
        return dir;
    }

    /** Number of snapshots. */
    public int snapshotCount() {
        return files.length;
    }

    /** Time of snapshot i, Gyr. */
    public double timeOf(int i) {
        return times[i];
    }

    /** Time of the first snapshot (the run's start), Gyr. */
    public double firstGyr() {
        return times[0];
    }

    /** Time of the last snapshot (where the run stopped), Gyr. */
    public double lastGyr() {
        return times[times.length - 1];
    }

    /** Earliest of the first and last snapshot times. */
    public double earliestGyr() {
        return Math.min(firstGyr(), lastGyr());
    }

    /** Latest of the first and last snapshot times. */
    public double latestGyr() {
        return Math.max(firstGyr(), lastGyr());
    }

    /** The galaxies at the start, in order; a galaxy's colour is its index here. */
    public List<String> initialNames() {
        return initialNames;
    }

    /** Fate events from the summary, oldest first (empty when there is no summary). */
    public List<FateEvent> events() {
        return events;
    }

    /** The big rip of the run's universe, Gyr; NaN when there is none. */
    public double ripGyr() {
        return ripGyr;
    }

    /**
     * The run's expansion history, rebuilt from its recorded cosmology (see
     * {@link RunCosmology}); null for an older run folder that did not record it.
     */
    public org.holdfast.expansion.ExpansionTable history() {
        if (!historyRead) {
            history = RunCosmology.read(dir, Math.max(Math.abs(firstGyr()), Math.abs(lastGyr())));
            // a run still being written may not have its resolved.json yet: look again later
            historyRead = history != null || summaryRead;
        }
        return history;
    }

    private org.holdfast.expansion.ExpansionTable history;
    private boolean historyRead;

    /** Whether the run stopped because the rip was near. */
    public boolean stoppedBeforeRip() {
        return stoppedBeforeRip;
    }

    /**
     * Saved path of one galaxy: rows t (Gyr), x, y, z (kpc), vx, vy, vz (km/s), one column per
     * snapshot (null when unknown). A refresh replaces the arrays rather than changing them.
     */
    double[][] track(String name) {
        return tracks.get(name);
    }

    /** The index of the last snapshot at or before t in the run's direction, clamped to [0, n - 2]. */
    int bracket(double tGyr) {
        int n = times.length;
        if (n == 1) {
            return 0;
        }
        double dir = Math.signum(times[1] - times[0]);
        int lo = 0;
        int hi = n - 1;
        while (hi - lo > 1) {
            int mid = (lo + hi) >>> 1;
            if ((times[mid] - tGyr) * dir <= 0) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return Math.min(lo, n - 2);
    }

    /** Snapshot i, loaded (the two most recently used are kept). */
    Snapshot snapshot(int i) {
        for (int s = 0; s < 2; s++) {
            if (cached[s] == i) {
                return cache[s];
            }
        }
        Snapshot snap = load(files[i], initialNames);
        int slot = nextSlot;
        nextSlot = 1 - nextSlot;
        cache[slot] = snap;
        cached[slot] = i;
        return snap;
    }

    /**
     * Reads one snapshot. Its {@code tracers/host} indexes the galaxies of that same file (after a
     * merger the engine hands the absorbed galaxy's stars to the survivor and renumbers the rest),
     * so each host is turned here into the index of that galaxy among the run's initial members:
     * the index its colour comes from, so that stars always share their galaxy's colour.
     */
    private static Snapshot load(Path file, List<String> initialNames) {
        try (HdfFile h = new HdfFile(file)) {
            double t = number(h.getAttribute("t_gyr"), file, "t_gyr");
            double a = number(h.getAttribute("scale_factor"), file, "scale_factor");
            String[] names = (String[]) h.getDatasetByPath("galaxies/name").getData();
            double[][] pos = (double[][]) h.getDatasetByPath("galaxies/position_kpc").getData();
            double[][] vel = (double[][]) h.getDatasetByPath("galaxies/velocity_kms").getData();
            float[][] tp = new float[3][0];
            float[][] tv = new float[3][0];
            int[] host = new int[0];
            if (h.getChild("tracers") != null) {
                tp = (float[][]) h.getDatasetByPath("tracers/position_kpc").getData();
                tv = (float[][]) h.getDatasetByPath("tracers/velocity_kms").getData();
                host = initialHosts((int[]) h.getDatasetByPath("tracers/host").getData(), names, initialNames,
                        file);
            }
            return new Snapshot(t, a, names, pos, vel, tp, tv, host);
        } catch (ScenarioException e) {
            throw e;
        } catch (RuntimeException e) {
            throw new ScenarioException(file.toString(), null, "not a readable snapshot: " + e.getMessage());
        }
    }

    /**
     * Hosts as indices into the initial members: host h (an index into {@code names}, this
     * snapshot's galaxies) becomes the index of {@code names[h]} in {@code initialNames}; -1 (a
     * flow tracer) stays.
     *
     * @throws ScenarioException naming the file for a host that is no galaxy of it
     */
    static int[] initialHosts(int[] host, String[] names, List<String> initialNames, Path file) {
        int[] toInitial = new int[names.length];
        for (int g = 0; g < names.length; g++) {
            toInitial[g] = initialNames.indexOf(names[g]);
            if (toInitial[g] < 0) {
                throw new ScenarioException(file.toString(), "galaxies/name", "'" + names[g]
                        + "' is not one of the run's initial galaxies");
            }
        }
        int[] out = new int[host.length];
        for (int j = 0; j < host.length; j++) {
            int h = host[j];
            if (h < -1 || h >= names.length) {
                throw new ScenarioException(file.toString(), "tracers/host", "tracer " + j + " has host " + h
                        + ", but the file holds " + names.length + " galaxies");
            }
            out[j] = h < 0 ? -1 : toInitial[h];
        }
        return out;
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "%s: %d snapshots, %.4g to %.4g Gyr", dir, files.length, firstGyr(),
                lastGyr());
    }
}
