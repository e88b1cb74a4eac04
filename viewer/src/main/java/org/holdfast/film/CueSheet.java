package org.holdfast.film;

import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.holdfast.expansion.ExpansionTable;
import org.holdfast.render.ClockText;
import org.holdfast.render.FateEvent;
import org.holdfast.replay.RunArchive;

/**
 * {@code cues.csv} beside a film's frames: one row per frame with what an editor, a narrator or
 * a sound designer lines up against. Columns: {@code frame} (1-based, as in the file names),
 * {@code timecode} (HH:MM:SS:FF at the film's frame rate, non-drop, from 00:00:00:00),
 * {@code seconds} (film time), {@code t_gyr} (simulated time, Gyr from today),
 * {@code scale_factor} (from the run's expansion history at that time, the value
 * {@code holdfast expansion --at} gives), {@code clock} (the clock's first line as drawn),
 * {@code rip_in_gyr} (time left before the big rip, empty without one) and {@code events}
 * (what happens between the previous frame and this one: fates of members and, when the film
 * asks for them, the rungs of the rip ladder; "; " between several).
 *
 * <p>The sheet depends only on the film and the run, never on which frames a worker draws, so
 * every worker of a film split with {@code --frame-range} writes the same bytes; it is written
 * under a name of its own and renamed into place.
 */
final class CueSheet {

    static final String FILE = "cues.csv";

    static final String[] HEADER = {"frame", "timecode", "seconds", "t_gyr", "scale_factor", "clock", "rip_in_gyr",
        "events"};

    private CueSheet() {
    }

    /** A moment worth a cue that is not a member's fate: a rung of the rip ladder. */
    record Note(double tGyr, String text) {
    }

    /** Writes the sheet for every frame of the film into {@code dir}. */
    static void write(Path dir, FilmSpec film, RunArchive run, List<Note> notes) {
        StringWriter text = new StringWriter();
        ExpansionTable h = run.history();
        double dir1 = film.clock().simGyr(film.clock().endS()) >= film.clock().simGyr(0) ? 1 : -1;
        try (CSVPrinter p = new CSVPrinter(text, CSVFormat.DEFAULT.builder().setRecordSeparator("\n").get())) {
            p.printRecord((Object[]) HEADER);
            double prev = Double.NaN;
            for (int i = 1; i <= film.frameCount(); i++) {
                double s = film.filmSecondOf(i);
                double t = RenderCommand.frameGyr(film, run, i);
                double a = h != null && t >= h.earliestGyr() && t <= h.latestGyr() ? h.scaleFactor(t) : Double.NaN;
                double rip = run.ripGyr();
                p.printRecord(i, timecode(i, film.frameRate()), num(s), num(t), Double.isNaN(a) ? "" : num(a),
                        ClockText.headline(t, rip), Double.isFinite(rip) && rip > t ? num(rip - t) : "",
                        events(run.events(), notes, prev, t, dir1, i == 1));
                prev = t;
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        writeAtomically(dir.resolve(FILE), text.toString());
    }

    /** What happened in (prev, t] (at the first frame: up to and including t). */
    private static String events(List<FateEvent> fates, List<Note> notes, double prev, double t, double dir,
            boolean first) {
        List<String> out = new ArrayList<>();
        for (FateEvent e : fates) {
            if (within(e.tGyr(), prev, t, dir, first)) {
                out.add(e.describe());
            }
        }
        for (Note n : notes) {
            if (within(n.tGyr(), prev, t, dir, first)) {
                out.add(n.text());
            }
        }
        return String.join("; ", out);
    }

    private static boolean within(double e, double prev, double t, double dir, boolean first) {
        return !first && (e - t) * dir <= 0 && (e - prev) * dir > 0;
    }

    /** SMPTE-style non-drop timecode of frame {@code index} (1-based): HH:MM:SS:FF. */
    static String timecode(int index, int rate) {
        long f = index - 1L;
        long frames = f % rate;
        long secs = f / rate;
        String ff = rate > 100 ? "%03d" : "%02d";
        return String.format(Locale.ROOT, "%02d:%02d:%02d:" + ff, secs / 3600, secs / 60 % 60, secs % 60, frames);
    }

    /** Shortest text that reads back as the same double. */
    private static String num(double v) {
        return Double.toString(v);
    }

    static void writeAtomically(Path target, String content) {
        Path tmp = target.resolveSibling("." + target.getFileName() + "." + ProcessHandle.current().pid() + "."
                + Thread.currentThread().getId() + ".part");
        try {
            Files.writeString(tmp, content, StandardCharsets.UTF_8);
            try {
                Files.move(tmp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
            }
        } catch (IOException e) {
            try {
                Files.deleteIfExists(tmp);
            } catch (IOException ignored) {
                // the original error matters more
            }
            throw new UncheckedIOException("cannot write " + target, e);
        }
    }
}
