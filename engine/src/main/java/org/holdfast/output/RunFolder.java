package org.holdfast.output;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Map;

import org.holdfast.scenario.ScenarioException;

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
        if (out != null) {
            if (Files.exists(out) && !(Files.isDirectory(out) && isEmpty(out))) {
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
