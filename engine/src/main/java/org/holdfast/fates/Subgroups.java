package org.holdfast.fates;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import org.holdfast.forces.Binding;

/**
 * Hierarchical bound subgroups at one instant. Starting from single bodies, the most deeply
 * bound pair of subgroups (by {@link Binding.Result#depth()}, each subgroup taken as a point at
 * its centre of mass) is joined, again and again, until no two subgroups are bound to each
 * other. The order of joins is the hierarchy; the partition left is the answer.
 */
public final class Subgroups {

    /** One join: subgroups with these members became one at this depth. */
    public record Join(int[] left, int[] right, double depth) {
    }

    private final int[] groupOf;
    private final List<Join> joins;

    private Subgroups(int[] groupOf, List<Join> joins) {
        this.groupOf = groupOf;
        this.joins = joins;
    }

    /**
     * Finds the subgroups.
     *
     * @param n number of bodies
     * @param mass masses, Msun
     * @param x positions (x, y, z arrays), kpc
     * @param v velocities (vx, vy, vz arrays), kpc/Gyr
     * @param k dark-energy coefficient, 1/Gyr^2
     */
    public static Subgroups find(int n, double[] mass, double[][] x, double[][] v, double k) {
        return find(n, mass, x, v, k, null);
    }

    /** The interaction energy of two bodies at a distance per unit mass product. */
    public interface PairEnergy {
        double at(int i, int j, double dKpc);
    }

    /**
     * Finds the subgroups, judging two single bodies by their own interaction energy (their
     * pair kernel: overlapping halos are less bound than points) and joined subgroups as points
     * at their centres of mass.
     *
     * @param pairEnergy the bodies' interaction per unit mass product; null for point masses
     */
    public static Subgroups find(int n, double[] mass, double[][] x, double[][] v, double k, PairEnergy pairEnergy) {
        List<int[]> members = new ArrayList<>();
        List<double[]> state = new ArrayList<>(); // m, x, y, z, vx, vy, vz
        for (int i = 0; i < n; i++) {
            members.add(new int[] {i});
            state.add(new double[] {mass[i], x[0][i], x[1][i], x[2][i], v[0][i], v[1][i], v[2][i]});
        }
        List<Join> joins = new ArrayList<>();
        double[] dx = new double[3];
        double[] dv = new double[3];
        while (members.size() > 1) {
            int bestA = -1;
            int bestB = -1;
            double bestDepth = 0;
            for (int a = 0; a < members.size(); a++) {
                double[] sa = state.get(a);
                for (int b = a + 1; b < members.size(); b++) {
                    double[] sb = state.get(b);
                    for (int c = 0; c < 3; c++) {
                        dx[c] = sb[1 + c] - sa[1 + c];
                        dv[c] = sb[4 + c] - sa[4 + c];
                    }
                    Binding.Result r;
                    if (pairEnergy != null && members.get(a).length == 1 && members.get(b).length == 1) {
                        double d = Math.sqrt(dx[0] * dx[0] + dx[1] * dx[1] + dx[2] * dx[2]);
                        double phi = (sa[0] + sb[0]) * pairEnergy.at(members.get(a)[0], members.get(b)[0], d);
                        r = Binding.test(sa[0] + sb[0], k, dx, dv, phi);
                    } else {
                        r = Binding.test(sa[0] + sb[0], k, dx, dv);
                    }
                    if (r.bound() && (bestA < 0 || r.depth() > bestDepth)) {
                        bestA = a;
                        bestB = b;
                        bestDepth = r.depth();
                    }
                }
            }
            if (bestA < 0) {
                break;
            }
            int[] left = members.get(bestA);
            int[] right = members.get(bestB);
            joins.add(new Join(left, right, bestDepth));
            int[] joined = Arrays.copyOf(left, left.length + right.length);
            System.arraycopy(right, 0, joined, left.length, right.length);
            double[] sa = state.get(bestA);
            double[] sb = state.get(bestB);
            double m = sa[0] + sb[0];
            double[] s = new double[7];
            s[0] = m;
            for (int c = 1; c < 7; c++) {
                s[c] = (sa[0] * sa[c] + sb[0] * sb[c]) / m;
            }
            members.set(bestA, joined);
            state.set(bestA, s);
            members.remove(bestB);
            state.remove(bestB);
        }
        int[] groupOf = new int[n];
        for (int g = 0; g < members.size(); g++) {
            for (int i : members.get(g)) {
                groupOf[i] = g;
            }
        }
        return new Subgroups(groupOf, List.copyOf(joins));
    }

    /** Index of the heaviest body: the main group is the subgroup it belongs to. */
    public static int heaviest(int n, double[] mass) {
        int h = 0;
        for (int i = 1; i < n; i++) {
            if (mass[i] > mass[h]) {
                h = i;
            }
        }
        return h;
    }

    /** Members of the main group: the subgroup of the heaviest body. */
    public int[] mainGroup(double[] mass) {
        return membersWith(heaviest(groupOf.length, mass));
    }

    /** Subgroup index of body i (0-based, arbitrary order). */
    public int groupOf(int i) {
        return groupOf[i];
    }

    /** Members of the subgroup that body i belongs to. */
    public int[] membersWith(int i) {
        int g = groupOf[i];
        return java.util.stream.IntStream.range(0, groupOf.length).filter(j -> groupOf[j] == g).toArray();
    }

    /** Whether bodies i and j are in one bound subgroup. */
    public boolean together(int i, int j) {
        return groupOf[i] == groupOf[j];
    }

    /** Whether any subgroup has two or more members. */
    public boolean anyBoundPair() {
        return !joins.isEmpty();
    }

    /** The joins in the order made: the hierarchy. */
    public List<Join> joins() {
        return joins;
    }
}
