package org.holdfast.expansion;

/**
 * An equation of state w(a) for dark energy and the density it implies. The density follows
 * from energy conservation, d ln rho_de / d ln a = -3 (1 + w(a)) (common practice; e.g.
 * Linder 2003, PRL 90, 091301, eq. 2), so a model gives w and its derivatives and the
 * logarithm of rho_de(a)/rho_de(1), in closed form where one exists.
 *
 * <p>Adding a model is one small class implementing these four methods.
 */
public interface DarkEnergyModel {

    /** Equation of state w = p/(rho c^2) at scale factor a. */
    double w(double a);

    /** dw/da. */
    double dwda(double a);

    /** d^2w/da^2. */
    double d2wda2(double a);

    /**
     * ln(rho_de(a)/rho_de(1)) at ln a. Taking ln a keeps the far future (a up to e^600) free of
     * overflow.
     */
    double lnDensityRatio(double lnA);

    /** One line for people: "w0 = -1.5, wa = 0". */
    String describe();

    /** w today. */
    default double wToday() {
        return w(1.0);
    }
}
