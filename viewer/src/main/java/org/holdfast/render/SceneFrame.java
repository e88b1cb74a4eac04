package org.holdfast.render;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/**
 * What is in view at one instant: the clock, the galaxies (names, centres, colours and the
 * recent paths of their centres), the star and flow tracers, and the fate events so far.
 * Positions are in kpc, in whatever frame the run uses (usually centred on the group's centre
 * of mass); times in Gyr from today.
 *
 * <p>A scene frame is a reusable holder: the arrays are kept by reference, not copied, so a
 * reader of a run folder or a live run can fill the same arrays frame after frame without
 * allocating. Fill it with {@link #setClock}, {@link #setGalaxies}, {@link #setTrail},
 * {@link #setTracers} and {@link #setEvents}; the renderer only reads it.
 */
public final class SceneFrame {

    private double tGyr;
    private double scaleFactor = 1;
    /** The big rip of the run's universe, Gyr from today; NaN when there is none. */
    private double ripGyr = Double.NaN;

    private int galaxyCount;
    private String[] names = new String[0];
    private int[] colourIndex = new int[0];
    private double[] galaxyX = new double[0];
    private double[] galaxyY = new double[0];
    private double[] galaxyZ = new double[0];

    private double[][] trailTGyr = new double[0][];
    private double[][] trailX = new double[0][];
    private double[][] trailY = new double[0][];
    private double[][] trailZ = new double[0][];
    private int[] trailCount = new int[0];

    private int tracerCount;
    private float[] tracerX = new float[0];
    private float[] tracerY = new float[0];
    private float[] tracerZ = new float[0];
    private int[] tracerHost = new int[0];

    private List<FateEvent> events = List.of();

    /** Sets the simulated time (Gyr from today) and the scale factor (1 today). */
    public SceneFrame setClock(double tGyr, double scaleFactor) {
        if (!Double.isFinite(tGyr) || !(scaleFactor > 0)) {
            throw new IllegalArgumentException("bad clock: t = " + tGyr + " Gyr, a = " + scaleFactor);
        }
        this.tGyr = tGyr;
        this.scaleFactor = scaleFactor;
        return this;
    }

    /**
     * Sets the galaxies and forgets all trails: set them again with {@link #setTrail} after
     * this call.
     *
     * @param count number of galaxies in view
     * @param names their names, at least count long
     * @param colourIndex index into the {@link Palette} for each galaxy
     * @param x centre positions in kpc (likewise y, z)
     */
    public SceneFrame setGalaxies(int count, String[] names, int[] colourIndex, double[] x, double[] y,
            double[] z) {
        checkLength("names", names.length, count);
        checkLength("colourIndex", colourIndex.length, count);
        checkLength("x", x.length, count);
        checkLength("y", y.length, count);
        checkLength("z", z.length, count);
        this.galaxyCount = count;
        this.names = names;
        this.colourIndex = colourIndex;
        this.galaxyX = x;
        this.galaxyY = y;
        this.galaxyZ = z;
        if (trailCount.length < count) {
            trailTGyr = new double[count][];
            trailX = new double[count][];
            trailY = new double[count][];
            trailZ = new double[count][];
            trailCount = new int[count];
        }
        java.util.Arrays.fill(trailCount, 0);
        return this;
    }

    /**
     * Sets the past path of one galaxy's centre, oldest sample first, for its trail.
     *
     * @param galaxy index of the galaxy
     * @param count number of samples used
     * @param tGyr time of each sample; x, y, z the centre positions then, in kpc
     */
    public SceneFrame setTrail(int galaxy, int count, double[] tGyr, double[] x, double[] y, double[] z) {
        if (galaxy < 0 || galaxy >= galaxyCount) {
            throw new IndexOutOfBoundsException("no galaxy " + galaxy + " (have " + galaxyCount + ")");
        }
        checkLength("trail tGyr", tGyr.length, count);
        checkLength("trail x", x.length, count);
        checkLength("trail y", y.length, count);
        checkLength("trail z", z.length, count);
        trailTGyr[galaxy] = tGyr;
        trailX[galaxy] = x;
        trailY[galaxy] = y;
        trailZ[galaxy] = z;
        trailCount[galaxy] = count;
        return this;
    }

    /**
     * Sets the tracers.
     *
     * @param count number of tracers used
     * @param x positions in kpc (likewise y, z)
     * @param host index of the galaxy each star belongs to, or -1 for a flow tracer
     */
    public SceneFrame setTracers(int count, float[] x, float[] y, float[] z, int[] host) {
        checkLength("tracer x", x.length, count);
        checkLength("tracer y", y.length, count);
        checkLength("tracer z", z.length, count);
        checkLength("tracer host", host.length, count);
        this.tracerCount = count;
        this.tracerX = x;
        this.tracerY = y;
        this.tracerZ = z;
        this.tracerHost = host;
        return this;
    }

    /** Sets the fate events so far (any order; the overlay sorts by time). */
    public SceneFrame setEvents(List<FateEvent> events) {
        List<FateEvent> sorted = new ArrayList<>(events);
        sorted.sort((a, b) -> Double.compare(a.tGyr(), b.tGyr()));
        this.events = Collections.unmodifiableList(sorted);
        return this;
    }

    private static void checkLength(String what, int length, int count) {
        if (count < 0 || length < count) {
            throw new IllegalArgumentException(what + " holds " + length + " values, " + count + " needed");
        }
    }

    public double tGyr() {
        return tGyr;
    }

    private List<String> notes = List.of();

    /** Sets notes shown under the events (the rip ladder's rungs passed so far); copied. */
    public SceneFrame setNotes(List<String> text) {
        this.notes = List.copyOf(text);
        return this;
    }

    /** Notes shown under the events, oldest first. */
    public List<String> notes() {
        return notes;
    }

    /** Sets the big rip the clock counts down to (NaN: none). */
    public SceneFrame setRip(double ripGyr) {
        this.ripGyr = ripGyr;
        return this;
    }

    /** The big rip of the run's universe, Gyr from today; NaN when there is none. */
    public double ripGyr() {
        return ripGyr;
    }

    public double scaleFactor() {
        return scaleFactor;
    }

    public int galaxyCount() {
        return galaxyCount;
    }

    public String name(int galaxy) {
        return names[galaxy];
    }

    public int colourIndex(int galaxy) {
        return colourIndex[galaxy];
    }

    public double galaxyX(int galaxy) {
        return galaxyX[galaxy];
    }

    public double galaxyY(int galaxy) {
        return galaxyY[galaxy];
    }

    public double galaxyZ(int galaxy) {
        return galaxyZ[galaxy];
    }

    /** Number of trail samples of a galaxy (0 when it has none). */
    public int trailCount(int galaxy) {
        return trailCount[galaxy];
    }

    public double trailTGyr(int galaxy, int sample) {
        return trailTGyr[galaxy][sample];
    }

    public double trailX(int galaxy, int sample) {
        return trailX[galaxy][sample];
    }

    public double trailY(int galaxy, int sample) {
        return trailY[galaxy][sample];
    }

    public double trailZ(int galaxy, int sample) {
        return trailZ[galaxy][sample];
    }

    public int tracerCount() {
        return tracerCount;
    }

    /** Position of one tracer in kpc, written into {@code dest} (3 floats). */
    public float[] tracerPosition(int i, float[] dest) {
        dest[0] = tracerX[i];
        dest[1] = tracerY[i];
        dest[2] = tracerZ[i];
        return dest;
    }

    /** Host galaxy of one tracer, or -1 for a flow tracer. */
    public int tracerHost(int i) {
        return tracerHost[i];
    }

    /** The tracer x array itself (read only), for the renderer's hot loop. */
    float[] tracerXs() {
        return tracerX;
    }

    float[] tracerYs() {
        return tracerY;
    }

    float[] tracerZs() {
        return tracerZ;
    }

    int[] tracerHosts() {
        return tracerHost;
    }

    /** Fate events so far, oldest first. */
    public List<FateEvent> events() {
        return events;
    }
}
