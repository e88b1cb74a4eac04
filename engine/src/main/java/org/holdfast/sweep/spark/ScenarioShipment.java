package org.holdfast.sweep.spark;

import java.io.IOException;
import java.io.Serializable;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

/**
 * A scenario file's name and text, sent to the executors, where {@link #localFile()} writes it
 * once per JVM (keyed by content) under the same file name, so that messages name it as the
 * user knows it.
 */
final class ScenarioShipment implements Serializable {

    private static final long serialVersionUID = 1L;

    private static final Map<String, Path> LOCAL = new ConcurrentHashMap<>();

    private final String fileName;
    private final String text;

    ScenarioShipment(String fileName, String text) {
        this.fileName = fileName;
        this.text = text;
    }

    /** The scenario as a file on this machine. */
    Path localFile() {
        return LOCAL.computeIfAbsent(hash(), h -> {
            try {
                Path dir = Files.createTempDirectory("holdfast-scenario-");
                dir.toFile().deleteOnExit();
                Path f = dir.resolve(fileName);
                Files.writeString(f, text, StandardCharsets.UTF_8);
                f.toFile().deleteOnExit();
                return f;
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        });
    }

    private String hash() {
        try {
            byte[] d = MessageDigest.getInstance("SHA-256").digest((fileName + "\n" + text).getBytes(StandardCharsets.UTF_8));
            return HexFormat.of().formatHex(d);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }
}
