package org.holdfast.observe;

import java.util.List;

/**
 * A member's state relative to the home galaxy's centre, in home-frame axes (see the package
 * note), with what was assumed on the way.
 *
 * @param positionKpc x, y, z
 * @param velocityKms vx, vy, vz
 * @param warnings assumptions made, one line each
 */
public record MemberState(double[] positionKpc, double[] velocityKms, List<String> warnings) {

    public MemberState {
        positionKpc = positionKpc.clone();
        velocityKms = velocityKms.clone();
        warnings = List.copyOf(warnings);
    }

    @Override
    public double[] positionKpc() {
        return positionKpc.clone();
    }

    @Override
    public double[] velocityKms() {
        return velocityKms.clone();
    }
}
