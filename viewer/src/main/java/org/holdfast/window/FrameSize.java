package org.holdfast.window;

import java.util.regex.Matcher;
import java.util.regex.Pattern;

/** A frame size in pixels, written {@code WIDTHxHEIGHT} on the command line ("1280x720"). */
public record FrameSize(int width, int height) {

    /** Largest side accepted, pixels. */
    public static final int MAX_SIDE = 16384;

    private static final Pattern FORM = Pattern.compile("\\s*(\\d{1,6})\\s*[xX]\\s*(\\d{1,6})\\s*");

    public FrameSize {
        if (width < 1 || height < 1 || width > MAX_SIDE || height > MAX_SIDE) {
            throw new IllegalArgumentException("size " + width + "x" + height
                    + " outside 1.." + MAX_SIDE + " pixels a side");
        }
    }

    /**
     * Reads {@code WIDTHxHEIGHT}.
     *
     * @throws IllegalArgumentException with a message fit for the user
     */
    public static FrameSize parse(String text) {
        Matcher m = FORM.matcher(text);
        if (!m.matches()) {
            throw new IllegalArgumentException("expected WIDTHxHEIGHT in pixels, e.g. 1280x720; got '" + text + "'");
        }
        return new FrameSize(Integer.parseInt(m.group(1)), Integer.parseInt(m.group(2)));
    }

    @Override
    public String toString() {
        return width + "x" + height;
    }
}
