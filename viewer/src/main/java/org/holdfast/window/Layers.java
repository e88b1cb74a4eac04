package org.holdfast.window;

import java.util.StringJoiner;

/** An immutable set of {@link Layer}s that are switched on. */
public record Layers(int bits) {

    /** What a fresh view shows: everything but the key list. */
    public static final Layers DEFAULT = of(Layer.TRAILS, Layer.NAMES, Layer.STARS, Layer.TRACERS,
            Layer.CLOCK, Layer.EVENTS);

    public Layers {
        if ((bits & ~((1 << Layer.values().length) - 1)) != 0) {
            throw new IllegalArgumentException("unknown layer bits " + Integer.toBinaryString(bits));
        }
    }

    /** The set holding exactly the given layers. */
    public static Layers of(Layer... layers) {
        int b = 0;
        for (Layer l : layers) {
            b |= 1 << l.ordinal();
        }
        return new Layers(b);
    }

    public boolean has(Layer layer) {
        return (bits & (1 << layer.ordinal())) != 0;
    }

    /** This set with {@code layer} switched over. */
    public Layers toggle(Layer layer) {
        return new Layers(bits ^ (1 << layer.ordinal()));
    }

    @Override
    public String toString() {
        StringJoiner j = new StringJoiner(",", "[", "]");
        for (Layer l : Layer.values()) {
            if (has(l)) {
                j.add(l.name().toLowerCase(java.util.Locale.ROOT));
            }
        }
        return j.toString();
    }
}
