package org.holdfast.film;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;

import org.holdfast.render.CameraPose;
import org.holdfast.schema.ScenarioException;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;

/**
 * {@code film.json} in a frames folder: what film the frames belong to (input, view, size,
 * rate, frame count, the clock's mapping and its times on the first and last frames, the camera
 * at both ends). A restarted render skips the frames already there only when this matches, so
 * a changed option can never leave a folder with frames of two different films mixed.
 */
final class FilmManifest {

    /** File name inside the frames folder. */
    static final String FILE = "film.json";

    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private FilmManifest() {
    }

    /**
     * Takes the folder for this film: writes the manifest if it is new or empty, checks it if
     * frames are already there.
     *
     * @throws ScenarioException naming --out when the folder holds something else
     */
    static void claim(Path dir, Path input, FilmSpec film, String cameraOption) {
        Map<String, Object> m = describe(input, film, cameraOption);
        Path file = dir.resolve(FILE);
        try {
            removeDeadWorkersParts(dir);
            if (Files.isRegularFile(file)) {
                JsonNode had = JSON.readTree(file.toFile());
                if (!had.equals(JSON.valueToTree(m))) {
                    throw new ScenarioException("--out", null, dir + " holds frames of a different film (see its "
                            + FILE + "); choose another --out or remove that folder");
                }
                return;
            }
            if (Files.isDirectory(dir)) {
                // another worker of the same film may be writing its manifest or a frame right now:
                // its temporary files (hidden, ending in .part) do not make the folder another film's
                boolean others;
                try (var s = Files.list(dir)) {
                    others = s.anyMatch(p -> !p.getFileName().toString().startsWith("."));
                }
                if (others && Files.isRegularFile(file)) {
                    // a worker of the same film put its manifest in place since the first look: check it
                    claim(dir, input, film, cameraOption);
                    return;
                }
                if (others) {
                    throw new ScenarioException("--out", null, dir + " is not empty and holds no " + FILE
                            + "; choose another --out or remove that folder");
                }
            }
            Files.createDirectories(dir);
            // a name of this worker's own: workers of one film starting together each write the
            // same manifest and rename it into place, the last rename winning with the same bytes
            Path tmp = dir.resolve("." + FILE + "." + ProcessHandle.current().pid() + "."
                    + Thread.currentThread().getId() + ".part");
            JSON.writeValue(tmp.toFile(), m);
            Files.move(tmp, file, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            if (!JSON.readTree(file.toFile()).equals(JSON.valueToTree(m))) {
                throw new ScenarioException("--out", null, dir + " was claimed at the same moment by a different film"
                        + " (see its " + FILE + "); choose another --out");
            }
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write " + file, e);
        }
    }


    /** A temporary file of a worker: hidden, ".NAME.PID.THREAD.part". */
    private static final java.util.regex.Pattern PART =
            java.util.regex.Pattern.compile("\\..+\\.(\\d{1,18})\\.\\d+\\.part");

    /**
     * Removes the temporary files that workers no longer running left behind (a render killed
     * part-way), so that finishing the film leaves only whole files; a live worker's are kept.
     */
    private static void removeDeadWorkersParts(Path dir) throws IOException {
        if (!Files.isDirectory(dir)) {
            return;
        }
        try (var s = Files.list(dir)) {
            for (Path p : s.toList()) {
                java.util.regex.Matcher m = PART.matcher(p.getFileName().toString());
                if (m.matches() && !alive(Long.parseLong(m.group(1)))) {
                    Files.deleteIfExists(p);
                }
            }
        }
    }

    private static boolean alive(long pid) {
        return ProcessHandle.of(pid).map(ProcessHandle::isAlive).orElse(false);
    }

    private static Map<String, Object> describe(Path input, FilmSpec film, String cameraOption) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("input", input.toAbsolutePath().normalize().toString());
        m.put("view", film.view());
        m.put("width_px", film.widthPx());
        m.put("height_px", film.heightPx());
        m.put("frame_rate", film.frameRate());
        m.put("frames", film.frameCount());
        m.put("length_s", film.lengthS());
        m.put("first_gyr", film.clock().simGyr(0));
        m.put("last_gyr", film.clock().simGyr(film.filmSecondOf(film.frameCount())));
        m.put("clock", film.clock().describe());
        m.put("camera", cameraOption == null ? "film" : cameraOption);
        m.put("follow", film.follow());
        m.put("eye_first_kpc", eye(film, film.cameraSecondOf(1)));
        m.put("eye_last_kpc", eye(film, film.cameraSecondOf(film.frameCount())));
        m.put("look", film.look().toString());
        m.put("overlays", film.overlays().stream().map(o -> o.name().toLowerCase(Locale.ROOT)).sorted().toList());
        return m;
    }

    private static String eye(FilmSpec film, double s) {
        CameraPose p = film.camera().poseAt(s, new CameraPose());
        return String.format(Locale.ROOT, "%.6g, %.6g, %.6g, fov %.6g", p.eyeKpc().x(), p.eyeKpc().y(), p.eyeKpc().z(),
                p.fovDeg());
    }
}
