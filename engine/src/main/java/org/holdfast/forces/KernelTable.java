package org.holdfast.forces;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.IntStream;

import org.holdfast.halos.HaloProfile;
import org.holdfast.halos.PointHalo;

/**
 * The pair kernels of a group, one per pair of distinct halo shapes. Members with identical
 * halos share a shape id and so a table. A new shape (a merger remnant) is added with
 * {@link #shapeOf}; its kernels are built then.
 */
public final class KernelTable {

    private final List<HaloProfile> shapes = new ArrayList<>();
    private final Map<Object, Integer> ids = new HashMap<>();
    private PairKernel[] kernels = new PairKernel[0];

    /** The shape id of a halo, registering it (and building its kernels) if new. */
    public int shapeOf(HaloProfile halo) {
        Integer id = ids.get(halo.shapeKey());
        if (id != null) {
            return id;
        }
        return addAll(List.of(halo))[0];
    }

    /** Registers many halos at once, building the new kernels in parallel; returns their ids. */
    public int[] addAll(List<HaloProfile> halos) {
        int[] out = new int[halos.size()];
        int before = shapes.size();
        for (int i = 0; i < out.length; i++) {
            HaloProfile h = halos.get(i);
            Integer id = ids.get(h.shapeKey());
            if (id == null) {
                id = shapes.size();
                shapes.add(h);
                ids.put(h.shapeKey(), id);
            }
            out[i] = id;
        }
        if (shapes.size() > before) {
            rebuild(before);
        }
        return out;
    }

    private void rebuild(int before) {
        int n = shapes.size();
        int old = (int) Math.round(Math.sqrt(kernels.length));
        PairKernel[] next = new PairKernel[n * n];
        for (int a = 0; a < old; a++) {
            System.arraycopy(kernels, a * old, next, a * n, old);
        }
        int[] todo = IntStream.range(0, n * n).filter(p -> p / n >= before || p % n >= before)
                .filter(p -> p / n <= p % n).toArray();
        PairKernel[] built = new PairKernel[todo.length];
        IntStream.range(0, todo.length).parallel()
                .forEach(q -> built[q] = kernelFor(shapes.get(todo[q] / n), shapes.get(todo[q] % n)));
        for (int q = 0; q < todo.length; q++) {
            int a = todo[q] / n;
            int b = todo[q] % n;
            next[a * n + b] = built[q];
            next[b * n + a] = built[q];
        }
        kernels = next;
    }

    /** Number of distinct shapes. */
    public int shapeCount() {
        return shapes.size();
    }

    /** The halo registered under an id. */
    public HaloProfile shape(int id) {
        return shapes.get(id);
    }

    /** The kernel for two shape ids. */
    public PairKernel kernel(int a, int b) {
        return kernels[a * shapes.size() + b];
    }

    /** The flat kernel matrix, row-major by shape id (for the hot loop); replaced when shapes are added. */
    PairKernel[] matrix() {
        return kernels;
    }

    /**
     * The kernel of two halos: closed forms where one is a point mass
     * ({@link SoftenedPointKernel}, {@link PointInHaloKernel}), the tabulated exact interaction
     * otherwise.
     */
    public static PairKernel kernelFor(HaloProfile a, HaloProfile b) {
        if (a instanceof PointHalo pa && b instanceof PointHalo pb) {
            return new SoftenedPointKernel(pa.softeningKpc(), pb.softeningKpc());
        }
        if (a instanceof PointHalo pa) {
            return new PointInHaloKernel(b, pa.softeningKpc());
        }
        if (b instanceof PointHalo pb) {
            return new PointInHaloKernel(a, pb.softeningKpc());
        }
        return new TabulatedKernel(a, b);
    }
}
