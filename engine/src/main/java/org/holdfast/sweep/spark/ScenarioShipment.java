package org.holdfast.sweep.spark;

import java.io.IOException;
import java.io.Serializable;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.Collection;
import java.util.HexFormat;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.ConcurrentHashMap;

import org.tomlj.Toml;
import org.tomlj.TomlArray;
import org.tomlj.TomlParseResult;
import org.tomlj.TomlTable;

/**
 * A scenario file's name and text, and every file it refers to by a relative path (a w(a)
 * table, {@code table = "drifting-w.csv"}), sent to the executors. There {@link #localFile()}
 * writes them once per JVM (keyed by content) into a temporary folder, the scenario under its
 * own name and each other file at the same place relative to it, so that the run reads what the
 * driver would have read and messages name files as the user knows them.
 *
 * <p>A file is shipped when a string value of the scenario, or of an override, names an existing
 * file relative to the scenario's folder (as the reader resolves them); absolute paths are left
 * as they are and must exist on every executor.
 */
final class ScenarioShipment implements Serializable {

    private static final long serialVersionUID = 2L;

    /** The most bytes of referenced files a sweep ships. */
    static final long MAX_BYTES = 256L << 20;

    private static final Map<String, Path> LOCAL = new ConcurrentHashMap<>();

    private final String fileName;
    private final String text;
    private final TreeMap<String, byte[]> files;

    private ScenarioShipment(String fileName, String text, TreeMap<String, byte[]> files) {
        this.fileName = fileName;
        this.text = text;
        this.files = files;
    }

    /**
     * The scenario and the files it (or an override value) refers to.
     *
     * @param overrideValues values of --set and --vary, which may name files too
     */
    static ScenarioShipment of(Path scenario, Collection<String> overrideValues) throws IOException {
        String text = Files.readString(scenario, StandardCharsets.UTF_8);
        Path base = scenario.toAbsolutePath().getParent();
        TreeMap<String, byte[]> files = new TreeMap<>();
        TomlParseResult toml = Toml.parse(text);
        java.util.List<String> strings = new java.util.ArrayList<>(overrideValues);
        collect(toml, strings);
        long total = 0;
        for (String s : strings) {
            Path rel = relativeFile(base, s);
            if (rel == null || files.containsKey(rel.toString())) {
                continue;
            }
            byte[] bytes = Files.readAllBytes(base.resolve(rel));
            total += bytes.length;
            if (total > MAX_BYTES) {
                throw new IOException("the files " + scenario + " refers to hold more than " + (MAX_BYTES >> 20)
                        + " MB; put them where every executor can read them and give absolute paths");
            }
            files.put(rel.toString(), bytes);
        }
        return new ScenarioShipment(scenario.getFileName().toString(), text, files);
    }

    /** The relative path of an existing regular file that a string names, other than the scenario; or null. */
    private static Path relativeFile(Path base, String s) {
        if (s.isBlank() || s.length() > 4096 || base == null) {
            return null;
        }
        try {
            Path p = Path.of(s);
            if (p.isAbsolute()) {
                return null;
            }
            Path f = base.resolve(p).normalize();
            return Files.isRegularFile(f) ? p.normalize() : null;
        } catch (java.nio.file.InvalidPathException e) {
            return null;
        }
    }

    private static void collect(Object v, java.util.List<String> out) {
        if (v instanceof String s) {
            out.add(s);
        } else if (v instanceof TomlTable t) {
            for (String k : t.keySet()) {
                collect(t.get(java.util.List.of(k)), out);
            }
        } else if (v instanceof TomlArray a) {
            for (int i = 0; i < a.size(); i++) {
                collect(a.get(i), out);
            }
        }
    }

    /** The relative paths of the files shipped beside the scenario. */
    java.util.Set<String> shippedFiles() {
        return files.keySet();
    }

    /** The scenario as a file on this machine, with the files it refers to beside it. */
    Path localFile() {
        return LOCAL.computeIfAbsent(hash(), h -> {
            try {
                Path root = Files.createTempDirectory("holdfast-scenario-");
                // as many folders as the references climb out with "..", so that they land inside
                Path dir = root;
                for (int i = 0; i < climb(); i++) {
                    dir = dir.resolve("d" + i);
                }
                Files.createDirectories(dir);
                for (Map.Entry<String, byte[]> e : files.entrySet()) {
                    Path f = dir.resolve(e.getKey()).normalize();
                    Files.createDirectories(f.getParent());
                    Files.write(f, e.getValue());
                }
                Path f = dir.resolve(fileName);
                Files.writeString(f, text, StandardCharsets.UTF_8);
                deleteOnExit(root);
                return f;
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        });
    }

    private int climb() {
        int most = 0;
        for (String rel : files.keySet()) {
            int n = 0;
            for (Path part : Path.of(rel)) {
                if (!part.toString().equals("..")) {
                    break;
                }
                n++;
            }
            most = Math.max(most, n);
        }
        return most;
    }

    private static void deleteOnExit(Path root) throws IOException {
        // registered parents first: the JVM deletes in reverse order of registration
        try (var walk = Files.walk(root)) {
            walk.forEach(p -> p.toFile().deleteOnExit());
        }
    }

    private String hash() {
        try {
            MessageDigest d = MessageDigest.getInstance("SHA-256");
            d.update((fileName + "\n" + text).getBytes(StandardCharsets.UTF_8));
            for (Map.Entry<String, byte[]> e : files.entrySet()) {
                d.update(("\n" + e.getKey() + "\n").getBytes(StandardCharsets.UTF_8));
                d.update(e.getValue());
            }
            return HexFormat.of().formatHex(d.digest());
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }
}
