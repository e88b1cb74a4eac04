package org.holdfast.window;

import java.util.List;

import org.holdfast.render.ProjectionKind;
import org.holdfast.render.Camera;

/**
 * A frame source for tests: a deterministic, lopsided colour pattern that changes with every
 * part of the view (camera, clock, projection, layers), so a frame shown for the wrong view, upside
 * down or shifted by a pixel does not match. Three invented members circle the origin.
 */
public class PatternSource implements FrameSource {

    public static final double START_GYR = 0.0;
    public static final double END_GYR = 10.0;
    public static final double[] EVENTS_GYR = {2.0, 5.5, 7.25};
    public static final List<String> NAMES = List.of("Tessera", "Ombrine", "Vask");
    public static final double ORBIT_KPC = 100.0;

    private int drawCount;
    private ViewState lastView;

    @Override
    public void draw(ViewState view, int width, int height, int[] argb) {
        drawCount++;
        lastView = view;
        Camera c = view.camera();
        int shiftR = (int) Math.floor(c.yawDeg());
        int shiftG = (int) Math.floor(3 * c.pitchDeg());
        int shiftB = (int) Math.floor(37 * view.clock().tGyr() + c.distanceKpc() + c.targetXKpc())
                + (c.projection() == ProjectionKind.DOME ? 128 : 0) + view.layers().bits();
        for (int y = 0; y < height; y++) {
            int g = (y * 256 / height + shiftG) & 0xFF;
            for (int x = 0; x < width; x++) {
                int r = (x * 256 / width + shiftR) & 0xFF;
                int b = ((x * 7 + y * 3) % 11 * 23 + shiftB) & 0xFF;
                argb[x + y * width] = 0xFF000000 | r << 16 | g << 8 | b;
            }
        }
    }

    /** The view of the latest frame drawn, or null. */
    public ViewState lastView() {
        return lastView;
    }

    /** A fresh frame of this pattern for {@code view}. */
    public static int[] frame(ViewState view, int width, int height) {
        int[] argb = new int[width * height];
        new PatternSource().draw(view, width, height, argb);
        return argb;
    }

    /** How many frames were drawn. */
    public int drawCount() {
        return drawCount;
    }

    @Override
    public double startGyr() {
        return START_GYR;
    }

    @Override
    public double endGyr() {
        return END_GYR;
    }

    @Override
    public double[] eventTimesGyr() {
        return EVENTS_GYR.clone();
    }

    @Override
    public List<String> memberNames() {
        return NAMES;
    }

    @Override
    public boolean memberCentreKpc(int index, double tGyr, double[] xyzKpc) {
        double phase = tGyr + index * 2.0 * Math.PI / 3.0;
        xyzKpc[0] = ORBIT_KPC * Math.cos(phase);
        xyzKpc[1] = ORBIT_KPC * Math.sin(phase);
        xyzKpc[2] = 10.0 * index;
        return true;
    }

    @Override
    public double overviewDistanceKpc() {
        return 600.0;
    }
}
