package org.holdfast.expansion;

/**
 * A cosmology that cannot be solved: a parameter out of range, H^2 &lt;= 0 somewhere between the
 * Big Bang and today, non-finite values. Names the parameter at fault (scenario key spelling,
 * e.g. {@code omega_m}), so readers can point at the file line or the option.
 */
public final class InvalidCosmologyException extends IllegalArgumentException {

    private static final long serialVersionUID = 1L;

    private final String parameter;

    public InvalidCosmologyException(String parameter, String message) {
        super(message);
        this.parameter = parameter;
    }

    /** The parameter at fault, as the scenario file spells it ({@code h0}, {@code omega_k}, ...). */
    public String parameter() {
        return parameter;
    }
}
