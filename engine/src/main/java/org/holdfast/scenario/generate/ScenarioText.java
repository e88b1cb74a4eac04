package org.holdfast.scenario.generate;

import java.util.List;
import java.util.Locale;

/** Writes a generated group as a scenario file (TOML) in the format {@code evolve} reads. */
public final class ScenarioText {

    private ScenarioText() {
    }

    /** The scenario's text. */
    public static String of(GroupRecipe r, List<GroupGenerator.Member> members) {
        StringBuilder sb = new StringBuilder();
        String groupName = members.get(0).name() + " group";
        sb.append("name = ").append(quote(groupName)).append('\n');
        sb.append("description = ").append(quote(String.format(Locale.ROOT,
                "Random group: %d giants, %d dwarfs, %.4g Msun within %.4g kpc, virial ratio %.4g, seed %d "
                        + "(holdfast new)", r.giants(), r.dwarfs(), r.massMsun(), r.radiusKpc(), r.virialRatio(), r.seed())))
                .append("\n\n");
        sb.append("# Planck 2018 results VI (A&A 641, A6, 2020), Table 2, TT,TE,EE+lowE+lensing+BAO\n");
        sb.append("[cosmology]\n");
        sb.append("h0 = ").append(num(GroupGenerator.PLANCK18_H0)).append('\n');
        sb.append("omega_m = ").append(num(GroupGenerator.PLANCK18_OMEGA_M)).append("\n\n");
        sb.append("[cosmology.dark_energy]\nw0 = -1.0\nwa = 0.0\n\n");
        sb.append("[run]\n");
        sb.append("until_gyr = ").append(num(r.untilGyr())).append('\n');
        sb.append("snapshot_every_myr = 100\n");
        sb.append("seed = ").append(r.seed()).append('\n');
        for (GroupGenerator.Member m : members) {
            sb.append("\n[[galaxy]]\n");
            sb.append("name = ").append(quote(m.name())).append('\n');
            sb.append("mass_msun = ").append(num(m.massMsun())).append('\n');
            sb.append("position_kpc = ").append(vec(m.positionKpc())).append('\n');
            sb.append("velocity_kms = ").append(vec(m.velocityKms())).append('\n');
            sb.append("halo = { profile = \"nfw\", concentration = ").append(num(m.concentration())).append(" }\n");
            int count = m.giant() ? r.starsPerGiant() : r.starsPerDwarf();
            sb.append("stars = { count = ").append(count).append(", shape = \"").append(m.giant() ? "disk" : "sphere")
                    .append("\", radius_kpc = ").append(num(m.starRadiusKpc()));
            if (m.giant()) {
                sb.append(", normal = ").append(vec(m.spinAxis()));
            }
            sb.append(" }\n");
        }
        return sb.toString();
    }

    /** Java's shortest exact form, which TOML reads as the same double. */
    private static String num(double v) {
        return Double.toString(v);
    }

    private static String vec(double[] v) {
        return "[" + num(v[0]) + ", " + num(v[1]) + ", " + num(v[2]) + "]";
    }

    private static String quote(String s) {
        return "\"" + s.replace("\\", "\\\\").replace("\"", "\\\"") + "\"";
    }
}
