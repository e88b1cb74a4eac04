package org.holdfast.sweep;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;

import org.holdfast.schema.ScenarioException;

/**
 * One varied parameter: a dotted scenario key and the values it takes, parsed from
 * {@code KEY=START:STOP:COUNT} (COUNT values evenly spaced, both ends included) or
 * {@code KEY=V1,V2,...}.
 *
 * @param key the dotted key, as {@code evolve --set} spells it
 * @param values the values, in the order given
 */
public record Axis(String key, List<Double> values) {

    /** The option that axes come from, for error messages. */
    public static final String OPTION = "--vary";

    public Axis {
        values = List.copyOf(values);
    }

    /**
     * Parses one {@code --vary} argument.
     *
     * @throws ScenarioException naming the option and the key for any malformed part
     */
    public static Axis parse(String spec) {
        int eq = spec.indexOf('=');
        if (eq <= 0) {
            throw new ScenarioException(OPTION, spec, "expected KEY=START:STOP:COUNT or KEY=V1,V2,...");
        }
        String key = spec.substring(0, eq).trim();
        String body = spec.substring(eq + 1).trim();
        if (body.isEmpty()) {
            throw new ScenarioException(OPTION, key, "no values given");
        }
        if (body.contains(":")) {
            return range(key, body);
        }
        List<Double> values = new ArrayList<>();
        for (String part : body.split(",", -1)) {
            values.add(number(key, part));
        }
        return new Axis(key, values);
    }

    private static Axis range(String key, String body) {
        String[] parts = body.split(":", -1);
        if (parts.length != 3) {
            throw new ScenarioException(OPTION, key, "expected START:STOP:COUNT, got '" + body + "'");
        }
        double start = number(key, parts[0]);
        double stop = number(key, parts[1]);
        BigDecimal a = new BigDecimal(parts[0].trim());
        BigDecimal span = new BigDecimal(parts[1].trim()).subtract(a);
        long count;
        try {
            count = Long.parseLong(parts[2].trim());
        } catch (NumberFormatException e) {
            throw new ScenarioException(OPTION, key, "COUNT must be a whole number, got '" + parts[2].trim() + "'");
        }
        if (count < 1) {
            throw new ScenarioException(OPTION, key, "COUNT must be at least 1, got " + count);
        }
        if (count == 1 && start != stop) {
            throw new ScenarioException(OPTION, key, "COUNT 1 needs START equal to STOP (or list the one value)");
        }
        if (count > Integer.MAX_VALUE / 2) {
            throw new ScenarioException(OPTION, key, "COUNT " + count + " is too large");
        }
        List<Double> values = new ArrayList<>((int) count);
        for (int i = 0; i < count; i++) {
            // In decimal, as typed, so that -1.4:-0.9:21 gives -1.35 and not -1.3499999999999999.
            BigDecimal v = count == 1 ? a
                    : a.add(span.multiply(BigDecimal.valueOf(i)).divide(BigDecimal.valueOf(count - 1), MathContext.DECIMAL64));
            values.add(v.doubleValue());
        }
        return new Axis(key, values);
    }

    private static double number(String key, String text) {
        String t = text.trim();
        try {
            double v = Double.parseDouble(t);
            if (Double.isFinite(v)) {
                return v;
            }
        } catch (NumberFormatException e) {
            // reported below
        }
        throw new ScenarioException(OPTION, key, "expected a number, got '" + t + "'");
    }

    /** The number of values. */
    public int size() {
        return values.size();
    }

    /**
     * A value as an override string: whole numbers without a decimal point (so that integer
     * keys such as a tracer count accept them), everything else as Java's shortest exact form.
     */
    public static String format(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e15) {
            return Long.toString((long) v);
        }
        return Double.toString(v);
    }
}
