package org.holdfast.film;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.Callable;

import org.holdfast.output.OutputPaths;
import org.holdfast.output.RunFolder;
import org.holdfast.render.CameraPose;
import org.holdfast.render.SceneFrame;
import org.holdfast.render.FrameFiles;
import org.holdfast.render.FrameRenderer;
import org.holdfast.render.RenderSettings;
import org.holdfast.replay.ReplayScene;
import org.holdfast.replay.RunArchive;
import org.holdfast.replay.TemporaryRun;
import org.holdfast.schema.ScenarioException;
import org.holdfast.window.Screenshots;

import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code holdfast render}: the frames of a film, a video of them, or one still, without a window. */
@Command(name = "render",
        mixinStandardHelpOptions = true,
        header = "Film a run without a window: PNG frames, a video, or one still.",
        description = {
            "Renders a run as numbered PNG frames (frame_000001.png, ...), flat, fulldome",
            "fisheye (dome master) or 360-degree panorama, and encodes them into a video when",
            "ffmpeg is on the PATH. A scenario file is first evolved into a temporary run",
            "folder (removed afterwards); render a run folder to keep the run. The film is",
            "the [film] table of --film FILE, else of the run's scenario, else a default:",
            "20 s, a quarter orbit around the group, a clock over the whole run (a countdown",
            "when the run stopped before a big rip). Options replace the table's keys. Run",
            "the same command again to carry on: finished frames are kept and skipped.",
            "Beside the frames, cues.csv lists each frame's timecode, time, scale factor,",
            "clock text and events; --frame-range lets several workers share one folder.",
            "",
            "Examples:",
            "  holdfast evolve scenarios/hollin-group.toml    # writes hollin-group-run/",
            "  holdfast render hollin-group-run --film scenarios/hollin-group-film.toml \\",
            "      --video hollin.mp4",
            "  holdfast render hollin-group-run --projection dome --size 2048 --fps 30 \\",
            "      --seconds 40 --out dome-frames --video hollin-dome.mp4",
            "  holdfast render hollin-group-run --still 4.2 --camera 40,25,350 \\",
            "      --out poster.png",
            "  holdfast render hollin-group-run --out frames --frame-range 1-300"
        })
public final class RenderCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "RUN_DIR|SCENARIO",
            description = "A run folder from holdfast evolve, or a scenario (.toml) to evolve first.")
    Path input;

    @Option(names = "--projection", paramLabel = "VIEW", description = "flat, dome or panorama.")
    String projection;

    @Option(names = "--size", paramLabel = "WxH",
            description = "Frame size in pixels, e.g. 1920x1080; a dome takes one number (2048). Even sides "
                    + "for a film's frames; a --still may be any size.")
    String size;

    @Option(names = "--fps", paramLabel = "N", description = "Frames per second of film, 1 to 240.")
    Integer fps;

    @Option(names = "--seconds", paramLabel = "S", description = "Film length in seconds.")
    Double seconds;

    @Option(names = "--from-gyr", paramLabel = "T", description = "Simulated time at the first frame, Gyr.")
    Double fromGyr;

    @Option(names = "--to-gyr", paramLabel = "T", description = "Simulated time at the last frame, Gyr.")
    Double toGyr;

    @Option(names = "--film", paramLabel = "FILE", description = "A TOML file whose [film] table sets the film.")
    Path filmFile;

    @Option(names = "--camera", paramLabel = "YAW,PITCH,DIST[,FOV]",
            description = "A fixed camera instead of the film's, as holdfast view --camera: yaw and pitch in "
                    + "degrees, distance from the centre in kpc, optional field of view, e.g. 30,15,4000.")
    String camera;

    @Option(names = "--still", paramLabel = "T",
            description = "Render only the frame at T Gyr, as one PNG (--out names the file; default "
                    + "NAME-still-T.png here).")
    Double still;

    @Option(names = "--out", paramLabel = "DIR",
            description = "Folder for the frames (default NAME-VIEW-frames here), or the PNG of a --still.")
    Path out;

    @Option(names = "--frame-range", paramLabel = "FIRST-LAST",
            description = "Draw only frames FIRST to LAST (1-based, inclusive) of the film, e.g. 1-300: several "
                    + "workers, or the nodes of a render farm, may draw parts of one film into one --out folder at "
                    + "the same time, and the frames are the same bytes as one worker's.")
    String frameRange;

    @Option(names = "--video", paramLabel = "FILE.mp4", description = "Also encode the frames with ffmpeg (H.264, yuv420p).")
    Path video;

    @Option(names = "--set", paramLabel = "KEY=VALUE",
            description = "With a scenario: override a value before evolving it (repeatable), as holdfast evolve --set.")
    List<String> set = new ArrayList<>();

    @Option(names = "--threads", paramLabel = "N", description = "Threads drawing each frame (default: all cores).")
    Integer threads;

    @Option(names = "--quiet", description = "Print nothing but errors.")
    boolean quiet;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        checkOptions();
        PrintWriter o = spec.commandLine().getOut();
        boolean scenario = !Files.isDirectory(input);
        TemporaryRun temp = null;
        try {
            Path runDir = input;
            if (scenario) {
                say(o, "evolving " + input + " into a temporary run folder first ...");
                temp = TemporaryRun.evolve(input, set, quiet ? null : o);
                runDir = temp.dir();
            }
            RunArchive run = RunArchive.open(runDir);
            FilmSpec film = FilmPlan.resolve(options(), run, runDir.resolve(RunFolder.SCENARIO_COPY));
            return still != null ? renderStill(o, run, film) : renderFilm(o, run, film);
        } finally {
            if (temp != null) {
                temp.close();
            }
        }
    }

    private FilmPlan.Options options() {
        return new FilmPlan.Options(projection, size, fps, seconds, fromGyr, toGyr, filmFile, camera, still != null);
    }

    /** Checks that need no run, before anything is evolved or written. */
    private void checkOptions() {
        FilmPlan.precheck(options());
        if (!Files.exists(input)) {
            throw new ScenarioException(input.toString(), null, "no such run folder or scenario file");
        }
        if (!Files.isDirectory(input) && !input.getFileName().toString().endsWith(".toml")) {
            throw new ScenarioException(input.toString(), null, "neither a run folder nor a scenario (.toml) file");
        }
        if (Files.isDirectory(input) && !set.isEmpty()) {
            throw new ScenarioException("--set", null, "only for a scenario; a run folder is already evolved");
        }
        if (threads != null && (threads < 1 || threads > 1024)) {
            throw new ScenarioException("--threads", null, "must be 1 to 1024 (got " + threads + ")");
        }
        if (still != null && !Double.isFinite(still)) {
            throw new ScenarioException("--still", null, "must be a time in Gyr (got " + still + ")");
        }
        if (still != null && video != null) {
            throw new ScenarioException("--video", null, "a still is one picture; leave out --video or --still");
        }
        if (still != null && out != null && !lowerName(out).endsWith(".png")) {
            throw new ScenarioException("--out", null, "a still is one PNG: give a file name ending in .png (got " + out + ")");
        }
        if (still == null && out != null && Files.exists(out) && !Files.isDirectory(out)) {
            throw new ScenarioException("--out", null, out + " is a file, not a folder for frames");
        }
        if (frameRange != null && still != null) {
            throw new ScenarioException("--frame-range", null, "a still is one picture; leave out --frame-range or --still");
        }
        if (frameRange != null) {
            range(frameRange, FilmPlan.MAX_FRAMES);
        }
        if (video != null && !lowerName(video).endsWith(".mp4")) {
            throw new ScenarioException("--video", null, "expected a file name ending in .mp4 (got " + video + ")");
        }
        // a path through an ordinary file, or into a folder that cannot be written, is refused before drawing
        if (out != null) {
            OutputPaths.check(out, still != null ? OutputPaths.Kind.FILE : OutputPaths.Kind.FOLDER, "--out");
        }
        if (video != null) {
            OutputPaths.check(video, OutputPaths.Kind.FILE, "--video");
        }
    }

    private int renderStill(PrintWriter o, RunArchive run, FilmSpec film) throws IOException {
        FilmPlan.checkTime("--still", still, run);
        double filmS = Math.max(0, Math.min(film.clock().endS(), film.clock().filmS(still)));
        Path file = out != null ? out : Path.of(String.format(Locale.ROOT, "%s-still-%s.png", stem(), FilmPlan.plain(still)));
        ReplayScene scene = new ReplayScene(run);
        try (FrameRenderer r = new FrameRenderer(film.projection(), settings(film, scene))) {
            SceneFrame frame = scene.at(still);
            CameraPose pose = film.camera().poseAt(film.cameraSecondAt(filmS), new CameraPose());
            if (film.follow() != null) {
                new FollowTarget(film.follow(), run.events()).shift(frame, pose);
            }
            BufferedImage img = r.render(frame, pose);
            int[] argb = img.getRGB(0, 0, img.getWidth(), img.getHeight(), null, 0, img.getWidth());
            Screenshots.writePng(file, argb, img.getWidth(), img.getHeight());
        }
        say(o, String.format(Locale.ROOT, "saved %s (%dx%d %s, t = %s Gyr)", file, film.widthPx(), film.heightPx(),
                film.view(), FilmPlan.shown(still)));
        return 0;
    }

    private int renderFilm(PrintWriter o, RunArchive run, FilmSpec film) throws IOException, InterruptedException {
        Path dir = out != null ? out : Path.of(stem() + "-" + film.view() + "-frames");
        int n = film.frameCount();
        int[] span = frameRange == null ? new int[] {1, n} : range(frameRange, n);
        boolean folderWasThere = Files.exists(dir);
        boolean manifestWasThere = Files.exists(dir.resolve(FilmManifest.FILE));
        FilmManifest.claim(dir, input, film, camera);
        FrameFiles files = new FrameFiles(dir);
        List<CueSheet.Note> notes = ladderNotes(film, run);
        CueSheet.write(dir, film, run, notes);
        List<Path> drawnNow = new ArrayList<>();
        try {
            drawFrames(o, run, film, dir, files, span, notes, drawnNow);
        } catch (ScenarioException e) {
            // bad input found while drawing (a damaged snapshot): take back what this command wrote
            undo(dir, drawnNow, !manifestWasThere, !folderWasThere);
            throw e;
        }
        if (video == null) {
            return 0;
        }
        for (int i = 1; i <= n; i++) {
            if (!files.isComplete(i)) {
                // a worker of a split film: the others are still drawing
                say(o, "frame " + i + " is not drawn yet, so no video was made; run this command again with"
                        + " --video once every --frame-range is done");
                return 0;
            }
        }
        return encode(dir, film);
    }

    private static void undo(Path dir, List<Path> drawn, boolean manifest, boolean folder) {
        try {
            for (Path p : drawn) {
                Files.deleteIfExists(p);
            }
            if (manifest) {
                Files.deleteIfExists(dir.resolve(CueSheet.FILE));
                Files.deleteIfExists(dir.resolve(FilmManifest.FILE));
            }
            if (folder) {
                Files.deleteIfExists(dir);
            }
        } catch (IOException e) {
            // not empty (someone else's files): leave the rest
        }
    }

    private void drawFrames(PrintWriter o, RunArchive run, FilmSpec film, Path dir, FrameFiles files, int[] span,
            List<CueSheet.Note> notes, List<Path> drawnNow) {
        int n = film.frameCount();
        say(o, String.format(Locale.ROOT, "rendering %s (%dx%d %s, %d per second, %s to %s Gyr) into %s",
                span[0] == 1 && span[1] == n ? n + " frames" : "frames " + span[0] + " to " + span[1] + " of " + n,
                film.widthPx(), film.heightPx(), film.view(), film.frameRate(), FilmPlan.shown(film.clock().simGyr(0)),
                FilmPlan.shown(film.clock().simGyr(film.filmSecondOf(n))), dir));
        ReplayScene scene = new ReplayScene(run);
        CameraPose pose = new CameraPose();
        FollowTarget follow = film.follow() == null ? null : new FollowTarget(film.follow(), run.events());
        int count = span[1] - span[0] + 1;
        FrameProgress progress = new FrameProgress(o, count, FrameProgress.onTerminal(), quiet);
        try (FrameRenderer r = new FrameRenderer(film.projection(), settings(film, scene)); progress) {
            for (int i = span[0]; i <= span[1]; i++) {
                if (files.isComplete(i)) {
                    progress.frameDone(false);
                    continue;
                }
                SceneFrame frame = scene.at(frameGyr(film, run, i));
                film.camera().poseAt(film.cameraSecondOf(i), pose);
                if (follow != null) {
                    follow.shift(frame, pose);
                }
                setNotes(frame, notes);
                FilmLook look = film.look();
                if (!look.deep() && !look.overlayLayer()) {
                    drawnNow.add(files.write(i, r.render(frame, pose)));
                } else {
                    BufferedImage picture = look.deep() ? r.renderDeep(frame, pose, !look.overlayLayer())
                            : r.renderPicture(frame, pose);
                    if (look.overlayLayer()) {
                        // the layer first: a frame file present means both are complete
                        drawnNow.add(files.writeLayer(i, r.overlayLayer(frame, pose)));
                    }
                    drawnNow.add(files.write(i, picture));
                }
                progress.frameDone(true);
            }
        }
        say(o, String.format(Locale.ROOT, "%d frames drawn, %d already there, in %.1f s", progress.drawn(),
                count - progress.drawn(), progress.seconds()));
    }

    /** The rip ladder's rungs passed by the frame's time, as notes under its events. */
    private static void setNotes(SceneFrame frame, List<CueSheet.Note> notes) {
        if (notes.isEmpty()) {
            return;
        }
        List<String> passed = new ArrayList<>();
        for (CueSheet.Note n : notes) {
            if (n.tGyr() <= frame.tGyr()) {
                passed.add(n.text());
            }
        }
        frame.setNotes(passed);
    }

    /** The simulated time frame {@code index} shows: the film clock's, kept inside the run. */
    static double frameGyr(FilmSpec film, RunArchive run, int index) {
        double t = film.clock().simGyr(film.filmSecondOf(index));
        return Math.max(run.earliestGyr(), Math.min(run.latestGyr(), t));
    }

    /**
     * FIRST-LAST, 1-based and inclusive, within a film of {@code frames} frames.
     *
     * @throws ScenarioException naming --frame-range
     */
    static int[] range(String text, int frames) {
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("\\s*(\\d{1,7})\\s*-\\s*(\\d{1,7})\\s*").matcher(text);
        if (!m.matches()) {
            throw new ScenarioException("--frame-range", null, "expected FIRST-LAST, two frame numbers from 1, e.g. "
                    + "1-300; got '" + text + "'");
        }
        int first = Integer.parseInt(m.group(1));
        int last = Integer.parseInt(m.group(2));
        if (first < 1 || last < first) {
            throw new ScenarioException("--frame-range", null, "FIRST must be at least 1 and LAST at least FIRST (got "
                    + text.trim() + ")");
        }
        if (last > frames) {
            throw new ScenarioException("--frame-range", null, "this film has " + frames + " frames; LAST is "
                    + last);
        }
        return new int[] {first, last};
    }

    /** The rungs of the rip ladder inside the film, when its [film] table asks for them. */
    private static List<CueSheet.Note> ladderNotes(FilmSpec film, RunArchive run) {
        List<CueSheet.Note> out = new ArrayList<>();
        if (!film.ladder() || run.history() == null) {
            return out;
        }
        for (RipLadderNotes.Note n : RipLadderNotes.of(run)) {
            out.add(new CueSheet.Note(n.tGyr(), n.text()));
        }
        return out;
    }

    private int encode(Path dir, FilmSpec film) throws IOException, InterruptedException {
        Optional<Path> ffmpeg = VideoEncoder.ffmpeg();
        PrintWriter err = spec.commandLine().getErr();
        if (ffmpeg.isEmpty()) {
            err.println("holdfast render: ffmpeg is not on the PATH, so no video was made; the frames are in " + dir
                    + "; encode them later with: " + String.join(" ",
                            VideoEncoder.command("ffmpeg", dir, film.frameRate(), video)));
            err.flush();
            return 0;
        }
        String complaint = VideoEncoder.encode(ffmpeg.get(), dir, film.frameRate(), video);
        if (complaint != null) {
            err.println("holdfast render: ffmpeg could not encode " + video + ": " + complaint + " (the frames are in "
                    + dir + ")");
            err.flush();
            return 1;
        }
        say(spec.commandLine().getOut(), "saved " + video);
        return 0;
    }

    /** The film's looks, with splats at their nominal brightness seen from the run's overview distance. */
    private RenderSettings settings(FilmSpec film, ReplayScene scene) {
        RenderSettings s = film.renderSettings().referenceDistanceKpc(scene.overviewDistanceKpc());
        return threads == null ? s : s.threads(threads);
    }

    private String stem() {
        Path name = input.toAbsolutePath().normalize().getFileName();
        return name == null ? "run" : name.toString().replaceFirst("\\.toml$", "");
    }

    private static String lowerName(Path p) {
        return p.getFileName() == null ? "" : p.getFileName().toString().toLowerCase(Locale.ROOT);
    }

    private void say(PrintWriter o, String line) {
        if (!quiet) {
            o.println(line);
            o.flush();
        }
    }
}
