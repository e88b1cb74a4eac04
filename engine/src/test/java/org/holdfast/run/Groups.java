package org.holdfast.run;

import java.util.ArrayList;
import java.util.List;

import org.holdfast.group.GalaxySpec;
import org.holdfast.group.GroupSpec;
import org.holdfast.group.HaloSpec;
import org.holdfast.integrators.Scheme;

/** Small builders for test groups (invented members). */
final class Groups {

    private Groups() {
    }

    static GalaxySpec point(String name, double mass, double[] pos, double[] velKms) {
        return new GalaxySpec(name, mass, pos, velKms, HaloSpec.point(0), null);
    }

    static GroupSpec of(GalaxySpec... gs) {
        return new GroupSpec(new ArrayList<>(List.of(gs)), null);
    }

    static RunSettings fixed(Scheme scheme, double untilGyr, double stepMyr, boolean de) {
        return new RunSettings(0, untilGyr, scheme, Double.NaN, stepMyr, Double.NaN, de, false, 1);
    }

    static RunSettings adaptive(Scheme scheme, double untilGyr, double accuracy, boolean de) {
        return new RunSettings(0, untilGyr, scheme, accuracy, Double.NaN, Double.NaN, de, false, 1);
    }
}
