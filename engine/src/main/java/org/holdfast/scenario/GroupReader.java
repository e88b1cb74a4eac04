package org.holdfast.scenario;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.holdfast.group.FlowSpec;
import org.holdfast.group.GalaxySpec;
import org.holdfast.group.GroupSpec;
import org.holdfast.group.HaloSpec;
import org.holdfast.group.StarsSpec;
import org.holdfast.observe.HomeFrame;
import org.holdfast.observe.MemberState;
import org.holdfast.observe.ObservedReader;
import org.holdfast.observe.ObserverSite;
import org.holdfast.observe.ObserverReader;
import org.holdfast.units.Units;
import org.holdfast.schema.Node;

/**
 * Reads the members ({@code [[galaxy]]}) and the flow tracers ({@code [flow]}) of a scenario.
 * Physical checks that need no physics code happen here (masses, names, places); a member's
 * halo parameters are checked for consistency with its profile.
 */
public final class GroupReader {

    /** Upper limit on the tracers of one run, about 10^8 (some 5 GB of state). */
    public static final long MAX_TRACERS = 100_000_000L;

    /** Two members closer than this (kpc) are "at the same place". */
    static final double SAME_PLACE_KPC = 1e-6;

    private GroupReader() {
    }

    /** Reads the group from the scenario's root table. */
    public static GroupSpec read(Node root) {
        return read(root, new ArrayList<>());
    }

    /**
     * Reads the group from the scenario's root table; members given by observation are
     * converted to positions and velocities around the home galaxy, and the assumptions made
     * for them are added to {@code warnings}.
     */
    public static GroupSpec read(Node root, List<String> warnings) {
        List<Node> nodes = root.tables("galaxy", "name");
        if (nodes.isEmpty()) {
            throw root.error(null, "a scenario needs at least one [[galaxy]]");
        }
        Node firstObserved = null;
        for (Node g : nodes) {
            if (g.hasInFile("observed")) {
                firstObserved = g.requireTable("observed");
                break;
            }
        }
        ObserverSite observer = firstObserved == null ? null : ObserverReader.forObserved(root, firstObserved);
        Node home = observer == null ? null : homeNode(root, nodes, observer);
        double[] homePos = home == null ? null : home.vector("position_kpc", 3);
        double[] homeVel = home == null ? null
                : home.has("velocity_kms") ? home.vector("velocity_kms", 3) : new double[3];
        HomeFrame frame = observer == null ? null : new HomeFrame(observer);
        org.holdfast.observe.UnmeasuredMotion unmeasured = observer == null ? null
                : org.holdfast.observe.ObserverReader.unmeasured(root.table("observer"));
        List<GalaxySpec> galaxies = new ArrayList<>();
        Map<String, Node> byName = new HashMap<>();
        for (Node g : nodes) {
            GalaxySpec spec;
            if (g.hasInFile("observed")) {
                MemberState s = frame.toHome(ObservedReader.read(g.requireTable("observed"), unmeasured));
                warnings.addAll(s.warnings());
                spec = galaxy(g, add(homePos, s.positionKpc()), add(homeVel, s.velocityKms()));
            } else {
                spec = galaxy(g, null, null);
            }
            checkSpeed(g, spec, warnings);
            checkScale(g, spec);
            Node earlier = byName.put(spec.name(), g);
            if (earlier != null) {
                throw g.error("name", "duplicate galaxy name '" + spec.name() + "' (first used at line "
                        + earlier.lineOf("name") + ")");
            }
            for (int i = 0; i < galaxies.size(); i++) {
                GalaxySpec other = galaxies.get(i);
                if (distance(other.positionKpc(), spec.positionKpc()) < SAME_PLACE_KPC) {
                    throw g.error("position_kpc", "galaxy '" + spec.name() + "' is at the same place as '"
                            + other.name() + "'");
                }
            }
            galaxies.add(spec);
        }
        Node flowNode = root.table("flow");
        FlowSpec flow = flowNode == null ? null : flow(flowNode);
        GroupSpec group = new GroupSpec(List.copyOf(galaxies), flow);
        if (group.tracerCount() > MAX_TRACERS) {
            throw root.error(null, "the scenario asks for " + group.tracerCount() + " tracers, more than the "
                    + MAX_TRACERS + " one run can hold");
        }
        return group;
    }

    /**
     * A member's speed as given must be below c; above {@link Units#NEWTONIAN_LIMIT_FRACTION_OF_C}
     * of c the run is allowed, with a warning, since the Newtonian model is doubtful there.
     */
    static void checkSpeed(Node g, GalaxySpec spec, List<String> warnings) {
        double[] v = spec.velocityKms();
        double speed = Math.sqrt(v[0] * v[0] + v[1] * v[1] + v[2] * v[2]);
        String key = g.hasInFile("observed") ? "observed" : "velocity_kms";
        if (!(speed < Units.C_KMS)) {
            throw g.error(key, String.format(Locale.ROOT, "a speed of %.6g km/s is not below the speed of light"
                    + " (%.6g km/s)", speed, Units.C_KMS));
        }
        double doubtful = Units.NEWTONIAN_LIMIT_FRACTION_OF_C * Units.C_KMS;
        if (speed > doubtful) {
            warnings.add(String.format(Locale.ROOT, "%s: %s: a speed of %.4g km/s is %.2f c, above %.1f c, where"
                    + " the Newtonian model is doubtful", g.where(key), g.keyPath(key), speed, speed / Units.C_KMS,
                    Units.NEWTONIAN_LIMIT_FRACTION_OF_C));
        }
    }

    /** Farthest a member may be placed, kpc: 100 Gpc, far beyond the Hubble radius (4 Gpc for H0 = 70). */
    static final double MAX_DISTANCE_KPC = 1e8;

    /** Heaviest member, Msun: 1e20, 10^5 times a rich cluster of galaxies (about 1e15 Msun; from memory). */
    static final double MAX_MASS_MSUN = 1e20;

    /**
     * A member far beyond the Hubble radius lies outside this model, the Newtonian limit around a
     * point (valid for r much less than c/H; common practice), and numbers as large as 1e308
     * overflow the forces: such places and masses are refused.
     */
    static void checkScale(Node g, GalaxySpec spec) {
        double[] p = spec.positionKpc();
        double d = Math.sqrt(p[0] * p[0] + p[1] * p[1] + p[2] * p[2]);
        String key = g.hasInFile("observed") ? "observed" : "position_kpc";
        if (!(d < MAX_DISTANCE_KPC)) {
            throw g.error(key, String.format(Locale.ROOT, "%.4g kpc from the origin is beyond %.0e kpc, far outside"
                    + " the Hubble radius, where this Newtonian model does not hold", d, MAX_DISTANCE_KPC));
        }
        if (!(spec.massMsun() < MAX_MASS_MSUN)) {
            throw g.error("mass_msun", String.format(Locale.ROOT, "%.4g Msun is more than %.0e Msun, far heavier than"
                    + " any group of galaxies", spec.massMsun(), MAX_MASS_MSUN));
        }
    }

    /** A velocity dispersion must be >= 0 and below c. */
    private static double dispersion(Node n, double fallback) {
        double d = n.number("dispersion_kms", fallback);
        if (d < 0) {
            throw n.error("dispersion_kms", "must be >= 0 (got " + Node.fmt(d) + ")");
        }
        if (!(d < Units.C_KMS)) {
            throw n.error("dispersion_kms", "must be below the speed of light, " + Node.fmt(Units.C_KMS)
                    + " km/s (got " + Node.fmt(d) + ")");
        }
        return d;
    }

    private static Node homeNode(Node root, List<Node> nodes, ObserverSite observer) {
        for (Node g : nodes) {
            if (observer.homeGalaxy().equals(g.string("name"))) {
                if (g.hasInFile("observed")) {
                    throw g.error("observed", "the home galaxy '" + observer.homeGalaxy()
                            + "' is where the observer is: give its position_kpc, not an observed table");
                }
                return g;
            }
        }
        Node obs = root.requireTable("observer");
        throw obs.error("galaxy", "no [[galaxy]] is named '" + observer.homeGalaxy() + "'");
    }

    private static double[] add(double[] a, double[] b) {
        return new double[] {a[0] + b[0], a[1] + b[1], a[2] + b[2]};
    }

    /**
     * Reads one member; {@code pos} and {@code vel} replace position_kpc and velocity_kms for
     * a member given by observation (null otherwise).
     */
    static GalaxySpec galaxy(Node g, double[] observedPos, double[] observedVel) {
        g.allowOnly("name", "mass_msun", "position_kpc", "velocity_kms", "observed", "halo", "stars", "coulomb_log");
        String name = g.string("name");
        if (name.isBlank()) {
            throw g.error("name", "a galaxy name must not be empty");
        }
        if (!g.has("mass_msun")) {
            throw g.error(null, "galaxy '" + name + "' has no mass_msun");
        }
        double mass = g.positive("mass_msun");
        double[] pos;
        double[] vel;
        if (observedPos != null) {
            for (String k : new String[] {"position_kpc", "velocity_kms"}) {
                if (g.hasInFile(k)) {
                    throw g.error(k, "give either " + k + " or observed, not both");
                }
            }
            pos = observedPos;
            vel = observedVel;
        } else {
            pos = g.vector("position_kpc", 3);
            vel = g.has("velocity_kms") ? g.vector("velocity_kms", 3) : new double[3];
        }
        Node haloNode = g.table("halo");
        HaloSpec halo = haloNode == null ? HaloSpec.point(0.0) : halo(haloNode);
        Node starsNode = g.table("stars");
        StarsSpec stars = starsNode == null ? null : stars(starsNode, halo);
        return new GalaxySpec(name, mass, pos, vel, halo, stars, RunReader.coulombLog(g, null));
    }

    static HaloSpec halo(Node h) {
        String profile = h.choice("profile", HaloSpec.PROFILES);
        double nan = Double.NaN;
        switch (profile) {
            case "point" -> {
                h.allowOnly("profile", "softening_kpc");
                double eps = h.number("softening_kpc", 0.0);
                if (eps < 0) {
                    throw h.error("softening_kpc", "must be >= 0 (got " + Node.fmt(eps) + ")");
                }
                return new HaloSpec(profile, eps, nan, nan, nan);
            }
            case "plummer", "hernquist" -> {
                h.allowOnly("profile", "scale_kpc");
                return new HaloSpec(profile, nan, h.positive("scale_kpc"), nan, nan);
            }
            case "nfw" -> {
                h.allowOnly("profile", "scale_kpc", "concentration", "truncation_kpc");
                boolean hasScale = h.has("scale_kpc");
                boolean hasC = h.has("concentration");
                if (hasScale == hasC) {
                    throw h.error(null, "an nfw halo needs exactly one of scale_kpc and concentration");
                }
                return new HaloSpec(profile, nan, hasScale ? h.positive("scale_kpc") : nan,
                        hasC ? h.positive("concentration") : nan, h.positive("truncation_kpc", nan));
            }
            case "isothermal" -> {
                h.allowOnly("profile", "truncation_kpc");
                if (!h.has("truncation_kpc")) {
                    throw h.error(null, "an isothermal halo needs truncation_kpc (its mass would be infinite)");
                }
                return new HaloSpec(profile, nan, nan, nan, h.positive("truncation_kpc"));
            }
            default -> throw new IllegalStateException(profile);
        }
    }

    static StarsSpec stars(Node s, HaloSpec halo) {
        s.allowOnly("count", "shape", "radius_kpc", "normal", "dispersion_kms");
        int count = (int) s.integer("count", 0, Integer.MAX_VALUE - 8);
        String shape = s.choice("shape", StarsSpec.SHAPES, "disk");
        double radius = s.positive("radius_kpc");
        double[] normal = s.has("normal") ? s.vector("normal", 3) : new double[] {0, 0, 1};
        if (Math.sqrt(normal[0] * normal[0] + normal[1] * normal[1] + normal[2] * normal[2]) == 0) {
            throw s.error("normal", "the spin axis must not be the zero vector");
        }
        double dispersion = dispersion(s, 10.0);
        return new StarsSpec(count, shape, radius, normal, dispersion);
    }

    static FlowSpec flow(Node f) {
        f.allowOnly("count", "inner_kpc", "outer_kpc", "dispersion_kms");
        int count = (int) f.integer("count", 0, Integer.MAX_VALUE - 8);
        double inner = f.positive("inner_kpc");
        double outer = f.positive("outer_kpc");
        if (outer <= inner) {
            throw f.error("outer_kpc", "must be larger than inner_kpc (" + Node.fmt(inner) + ")");
        }
        double dispersion = dispersion(f, 0.0);
        return new FlowSpec(count, inner, outer, dispersion);
    }

    private static double distance(double[] a, double[] b) {
        double dx = a[0] - b[0];
        double dy = a[1] - b[1];
        double dz = a[2] - b[2];
        return Math.sqrt(dx * dx + dy * dy + dz * dz);
    }
}
