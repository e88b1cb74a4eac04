package org.holdfast.sweep;

import java.io.Closeable;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;

/**
 * The append-only record of finished runs ({@code runs.jsonl}): one JSON object per line, each
 * line written with one write call and complete before the next starts. A process killed at any
 * moment (kill -9 included) leaves at most one partial last line; {@link #open} cuts it off, so
 * every run is either recorded whole or not at all and is made again on restart. The data is
 * in the operating system's hands once written, so killing the process loses nothing; a power
 * cut may lose the last lines, which are then simply made again.
 */
public final class Journal implements Closeable {

    /** The journal's file name inside a sweep folder. */
    public static final String FILE = "runs.jsonl";

    static final ObjectMapper JSON = new ObjectMapper();

    private final FileChannel channel;
    private final List<RunRecord> existing;

    private Journal(FileChannel channel, List<RunRecord> existing) {
        this.channel = channel;
        this.existing = existing;
    }

    /**
     * Opens (or creates) the journal of a sweep folder, cutting off a partial last line.
     *
     * @throws IOException if the file cannot be read or a complete line is not a run record
     */
    public static Journal open(Path dir) throws IOException {
        Path file = dir.resolve(FILE);
        FileChannel ch = FileChannel.open(file, StandardOpenOption.CREATE, StandardOpenOption.READ,
                StandardOpenOption.WRITE);
        try {
            byte[] bytes = Files.readAllBytes(file);
            int end = bytes.length;
            while (end > 0 && bytes[end - 1] != '\n') {
                end--;
            }
            if (end < bytes.length) {
                ch.truncate(end);
            }
            List<RunRecord> records = parse(file, new String(bytes, 0, end, StandardCharsets.UTF_8));
            ch.position(end);
            return new Journal(ch, records);
        } catch (IOException | RuntimeException e) {
            ch.close();
            throw e;
        }
    }

    /** Reads a journal without changing it (a partial last line is ignored). */
    public static List<RunRecord> read(Path dir) throws IOException {
        Path file = dir.resolve(FILE);
        if (!Files.exists(file)) {
            return new ArrayList<>();
        }
        String text = Files.readString(file);
        int end = text.lastIndexOf('\n') + 1;
        return parse(file, text.substring(0, end));
    }

    private static List<RunRecord> parse(Path file, String text) throws IOException {
        List<RunRecord> out = new ArrayList<>();
        int line = 0;
        for (String s : text.split("\n")) {
            line++;
            if (s.isEmpty()) {
                continue;
            }
            try {
                out.add(JSON.readValue(s, RunRecord.class));
            } catch (JsonProcessingException e) {
                throw new IOException(file + ":" + line + ": not a run record: " + e.getOriginalMessage());
            }
        }
        return out;
    }

    /** The records that were in the file when it was opened. */
    public List<RunRecord> existing() {
        return existing;
    }

    /** The run indices of {@link #existing()}. */
    public BitSet done() {
        BitSet done = new BitSet();
        for (RunRecord r : existing) {
            done.set((int) r.run());
        }
        return done;
    }

    /** Appends one record as one line. */
    public synchronized void append(RunRecord record) {
        try {
            ByteBuffer buf = ByteBuffer.wrap((JSON.writeValueAsString(record) + "\n").getBytes(StandardCharsets.UTF_8));
            while (buf.hasRemaining()) {
                channel.write(buf);
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Writes records as a complete journal file in one go (temporary file, then rename). */
    public static void writeAll(Path dir, List<RunRecord> records) throws IOException {
        StringBuilder sb = new StringBuilder();
        for (RunRecord r : records) {
            sb.append(JSON.writeValueAsString(r)).append('\n');
        }
        Outputs.writeAtomically(dir.resolve(FILE), sb.toString().getBytes(StandardCharsets.UTF_8));
    }

    @Override
    public void close() throws IOException {
        channel.close();
    }
}
