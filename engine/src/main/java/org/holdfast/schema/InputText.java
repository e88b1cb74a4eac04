package org.holdfast.schema;

import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;

import org.holdfast.schema.ScenarioException;

/**
 * Reads a user's text input file (a scenario, a film table, a w(a) table) with limits, so that
 * no input can exhaust the memory or the stack: at most {@link #MAX_BYTES} bytes, strict UTF-8
 * (a byte that is not UTF-8 is reported with its line), a leading byte-order mark dropped, and
 * for TOML at most {@link #MAX_NESTING} levels of nested arrays and inline tables, checked
 * before the parser (which recurses once per level) sees the text.
 */
public final class InputText {

    /** The largest input file read, bytes (a scenario of 10^4 members is about 2 MB). */
    public static final long MAX_BYTES = 8L << 20;

    /** The deepest nesting of arrays and inline tables in a TOML input. */
    public static final int MAX_NESTING = 64;

    /** The longest single line. */
    public static final int MAX_LINE_CHARS = 1 << 20;

    private InputText() {
    }

    /**
     * Reads a whole file as UTF-8 text.
     *
     * @param what the kind of file, for messages ("scenario file", "w(a) table")
     * @throws ScenarioException naming the file (and line) if it is too big, unreadable or not UTF-8
     */
    public static String read(Path file, String what) {
        byte[] bytes;
        try {
            long size = Files.size(file);
            if (size > MAX_BYTES) {
                throw tooBig(file, what, size);
            }
            try (InputStream in = Files.newInputStream(file)) {
                bytes = in.readNBytes((int) MAX_BYTES + 1);
            }
        } catch (IOException e) {
            throw new ScenarioException(file.toString(), null, "cannot read the " + what + ": "
                    + IoFailure.reason(e));
        }
        if (bytes.length > MAX_BYTES) {
            throw tooBig(file, what, bytes.length);
        }
        return decode(file, bytes);
    }

    private static ScenarioException tooBig(Path file, String what, long size) {
        return new ScenarioException(file.toString(), null, String.format(Locale.ROOT,
                "the %s is %,d bytes; at most %,d are read", what, size, MAX_BYTES));
    }

    /** Decodes strict UTF-8, dropping a leading byte-order mark; a bad byte is named with its line. */
    static String decode(Path file, byte[] bytes) {
        CharsetDecoder dec = StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        String text;
        try {
            CharBuffer cb = dec.decode(ByteBuffer.wrap(bytes));
            text = cb.toString();
        } catch (CharacterCodingException e) {
            int at = firstBadByte(bytes);
            int line = 1;
            for (int i = 0; i < at; i++) {
                if (bytes[i] == '\n') {
                    line++;
                }
            }
            throw new ScenarioException(file + ":" + line, null, String.format(Locale.ROOT,
                    "not UTF-8 text (byte 0x%02X at offset %d); save the file as UTF-8", bytes[at] & 0xff, at));
        }
        if (text.startsWith("\uFEFF")) {
            text = text.substring(1);
        }
        return text;
    }

    /** Offset of the first byte that does not start or continue a valid UTF-8 sequence. */
    private static int firstBadByte(byte[] b) {
        CharsetDecoder dec = StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        ByteBuffer in = ByteBuffer.wrap(b);
        CharBuffer out = CharBuffer.allocate(b.length + 1);
        var result = dec.decode(in, out, true);
        return result.isError() ? Math.min(in.position(), b.length - 1) : b.length - 1;
    }

    /**
     * Checks TOML text for nesting deeper than {@link #MAX_NESTING} and lines longer than
     * {@link #MAX_LINE_CHARS}, skipping strings and comments; reports the line where it happens.
     */
    public static void checkToml(Path file, String text) {
        int ln = 1;
        for (int from = 0; from < text.length(); ln++) {
            int end = text.indexOf('\n', from);
            end = end < 0 ? text.length() : end;
            if (end - from > MAX_LINE_CHARS) {
                throw new ScenarioException(file + ":" + ln, null, String.format(Locale.ROOT,
                        "a line longer than %,d characters; holdfast reads no longer lines", MAX_LINE_CHARS));
            }
            from = end + 1;
        }
        int depth = 0;
        int line = 1;
        int n = text.length();
        for (int i = 0; i < n; i++) {
            char c = text.charAt(i);
            if (c == '\n') {
                line++;
                continue;
            }
            if (c == '#') {
                while (i + 1 < n && text.charAt(i + 1) != '\n') {
                    i++;
                }
            } else if (c == '"' || c == '\'') {
                boolean multi = text.startsWith(String.valueOf(c).repeat(3), i);
                int end = skipString(text, i, c, multi);
                for (int j = i; j < end && j < n; j++) {
                    if (text.charAt(j) == '\n') {
                        line++;
                    }
                }
                i = end - 1;
            } else if (c == '[' || c == '{') {
                depth++;
                if (depth > MAX_NESTING) {
                    throw new ScenarioException(file + ":" + line, null, String.format(Locale.ROOT,
                            "arrays or inline tables nested more than %d deep", MAX_NESTING));
                }
            } else if (c == ']' || c == '}') {
                depth = Math.max(0, depth - 1);
            }
        }
    }

    /** The index just past the string starting at i (or the end of the text if it is unclosed). */
    private static int skipString(String text, int i, char q, boolean multi) {
        int n = text.length();
        if (multi) {
            String close = String.valueOf(q).repeat(3);
            int end = text.indexOf(close, i + 3);
            return end < 0 ? n : end + 3;
        }
        for (int j = i + 1; j < n; j++) {
            char c = text.charAt(j);
            if (c == '\\' && q == '"') {
                j++;
            } else if (c == q || c == '\n') {
                return j + 1;
            }
        }
        return n;
    }
}
