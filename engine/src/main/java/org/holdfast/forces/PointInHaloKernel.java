package org.holdfast.forces;

import org.holdfast.halos.HaloProfile;

/**
 * A point mass with softening eps and an extended halo: w(d) = Phi_host(sqrt(d^2 + eps^2)) / M_host.
 * For eps = 0 this is exact, the point feels G M_host(&lt;d) / d^2 (Newton's shell theorem,
 * Binney &amp; Tremaine 2008, sec. 2.2.1); for eps &gt; 0 it is the host's potential softened the
 * way Plummer softening softens a point's (documented approximation). Far outside the host it
 * is Newton's law.
 */
public final class PointInHaloKernel implements PairKernel {

    private final HaloProfile host;
    private final double eps2;
    private final double perMass;

    public PointInHaloKernel(HaloProfile host, double softeningKpc) {
        this.host = host;
        this.eps2 = softeningKpc * softeningKpc;
        this.perMass = 1.0 / host.mass();
    }

    @Override
    public double energy(double d) {
        return host.potential(Math.sqrt(d * d + eps2)) * perMass;
    }

    @Override
    public double pullOverD(double d) {
        double s = Math.sqrt(d * d + eps2);
        return s == 0 ? 0 : host.pullOverR(s) * perMass;
    }

    @Override
    public double lengthKpc() {
        return Math.sqrt(eps2 + host.lengthKpc() * host.lengthKpc());
    }
}
