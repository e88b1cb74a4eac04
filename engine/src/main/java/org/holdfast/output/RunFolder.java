package org.holdfast.output;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Map;

import org.holdfast.schema.ScenarioException;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;

/**
 * A run's output folder. Chosen and checked before the run starts (so bad input leaves
 * nothing behind); JSON files are written to a temporary name and renamed, so a reader never
 * sees half a file.
 */
public final class RunFolder {

    /** The summary of a run. */
    public static final String SUMMARY = "summary.json";

    /** The scenario exactly as given. */
    public static final String SCENARIO_COPY = "scenario.toml";

    /** Everything the run used, resolved: overrides applied, uncertain numbers fixed. */
    public static final String RESOLVED = "resolved.json";

    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private final Path dir;

    private RunFolder(Path dir) {
        this.dir = dir;
    }

    /** The folder. */
    public Path dir() {
        return dir;
    }

    /**
     * Picks the folder: {@code out} if given (it must not exist, or be empty), otherwise a new
     * folder named after the scenario in the working directory ({@code NAME-run},
     * {@code NAME-run-2}, ...). Nothing is created yet.
     */
    public static Path choose(Path out, Path scenarioFile) {
        return choose(out, scenarioFile, false);
    }

    /**
     * As {@link #choose(Path, Path)}; with {@code restart}, an {@code out} that holds a run killed
     * before its end ({@link #isInterrupted}) is accepted too, for the caller to
     * {@link #clearInterrupted clear} once everything else is checked.
     */
    public static Path choose(Path out, Path scenarioFile, boolean restart) {
        if (out != null) {
            if (Files.exists(out) && !(Files.isDirectory(out) && (isEmpty(out) || restart && isInterrupted(out)))) {
                throw new ScenarioException("--out", null, out + " already exists and is not an empty folder;"
                        + " choose another --out or remove it");
            }
            return out;
        }
        String stem = scenarioFile.getFileName().toString().replaceFirst("\\.toml$", "");
        Path p = Path.of(stem + "-run");
        for (int i = 2; Files.exists(p); i++) {
            p = Path.of(stem + "-run-" + i);
        }
        return p;
    }

    /**
     * Creates an output folder the user named (or that was named for them) before anything is
     * announced or written, so that a folder that cannot be made is reported as bad input: one
     * line naming the option and the reason.
     *
     * @param option the option that names the folder ("--out"), for the message
     * @return the topmost folder this call created (the folder itself or a parent), for
     *     {@link #removeCreated}; null when the folder was already there
     * @throws ScenarioException if the folder cannot be made
     */
    public static Path makeFolder(Path dir, String option) {
        Path abs = dir.toAbsolutePath().normalize();
        Path top = null;
        for (Path p = abs; p != null && !Files.exists(p); p = p.getParent()) {
            top = p;
        }
        try {
            Files.createDirectories(abs);
        } catch (IOException e) {
            removeCreated(abs, top);
            throw new ScenarioException(option, null, "cannot create the folder " + dir + ": " + reason(e));
        }
        if (!Files.isWritable(abs)) {
            throw new ScenarioException(option, null, "cannot write in the folder " + dir + ": permission denied");
        }
        return top;
    }

    /**
     * Removes the folders {@link #makeFolder} created, from {@code dir} up to {@code top}, each
     * only if it is empty; does nothing when {@code top} is null.
     */
    public static void removeCreated(Path dir, Path top) {
        if (top == null) {
            return;
        }
        Path stop = top.toAbsolutePath().normalize();
        for (Path p = dir.toAbsolutePath().normalize(); p != null && p.startsWith(stop); p = p.getParent()) {
            try {
                Files.deleteIfExists(p);
            } catch (IOException e) {
                return; // not empty (someone else's files), or not ours to remove
            }
        }
    }

    /** Kept for its callers: see {@link org.holdfast.schema.IoFailure#reason}. */
    public static String reason(IOException e) {
        return org.holdfast.schema.IoFailure.reason(e);
    }

    /** Creates the folder and copies the scenario file into it. */
    public static RunFolder create(Path dir, Path scenarioFile) {
        try {
            Files.createDirectories(dir);
            Files.copy(scenarioFile, dir.resolve(SCENARIO_COPY), StandardCopyOption.REPLACE_EXISTING);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot create the run folder " + dir, e);
        }
        return new RunFolder(dir);
    }

    /** What a run folder holds besides its summary (and their temporary names, with .part). */
    private static final java.util.Set<String> RUN_FILES = java.util.Set.of(SCENARIO_COPY, RESOLVED, TrackWriter.FILE,
            FateWriter.FILE, SnapshotWriter.FOLDER, RunPlots.DISTANCES, RunPlots.ENERGY, RunPlots.HUBBLE);

    /**
     * Whether {@code dir} holds a run that was killed before its end (kill -9, a power cut): no
     * summary, and nothing but a run folder's own files, whole or temporary. Such a folder is
     * started over by the next run into it ({@link #clearInterrupted}).
     */
    public static boolean isInterrupted(Path dir) {
        if (!Files.isDirectory(dir) || Files.exists(dir.resolve(SUMMARY)) || !Files.exists(dir.resolve(SCENARIO_COPY))) {
            return false;
        }
        try (var s = Files.list(dir)) {
            for (Path p : s.toList()) {
                String name = p.getFileName().toString();
                if (!RUN_FILES.contains(name.replaceFirst("\\.part$", "")) && !name.equals(SUMMARY + ".part")) {
                    return false;
                }
            }
        } catch (IOException e) {
            return false;
        }
        Path snaps = dir.resolve(SnapshotWriter.FOLDER);
        if (Files.isDirectory(snaps)) {
            try (var s = Files.list(snaps)) {
                return s.allMatch(p -> p.getFileName().toString().matches("state_[0-9]{6}\\.h5(\\.part)?"));
            } catch (IOException e) {
                return false;
            }
        }
        return true;
    }

    /**
     * Empties a folder {@link #isInterrupted} accepted, so the new run does not mix with the old
     * one's snapshots or leave its temporary files; does nothing to any other folder.
     *
     * @return whether there was an interrupted run to clear
     */
    public static boolean clearInterrupted(Path dir) {
        if (!isInterrupted(dir)) {
            return false;
        }
        try (var s = Files.walk(dir)) {
            for (Path p : s.sorted(java.util.Comparator.reverseOrder()).toList()) {
                if (!p.equals(dir)) {
                    Files.deleteIfExists(p);
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException("cannot clear the interrupted run in " + dir, e);
        }
        return true;
    }

    /** Writes a JSON file inside the folder, atomically. */
    public void writeJson(String name, Map<String, Object> content) {
        Path target = dir.resolve(name);
        Path tmp = dir.resolve(name + ".part");
        try {
            JSON.writeValue(tmp.toFile(), content);
            Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write " + target, e);
        }
    }

    private static boolean isEmpty(Path d) {
        try (var s = Files.list(d)) {
            return s.findAny().isEmpty();
        } catch (IOException e) {
            return false;
        }
    }
}
