package org.holdfast.schema;

import org.holdfast.schema.ScenarioException;
import org.holdfast.schema.Node;

/**
 * Turns the raw TOML value of a numeric key into a number. The plain reader accepts only
 * numbers; a reader that understands uncertain numbers (a distribution written as an inline
 * table) can take its place, returning a central value or a random draw.
 */
@FunctionalInterface
public interface NumberReader {

    /**
     * @param node the table holding the key, for error messages
     * @param key the key inside that table
     * @param raw what the TOML parser returned: Long, Double, a table, or anything else
     * @return the number to use
     * @throws ScenarioException if the value is not a number this reader understands
     */
    double read(Node node, String key, Object raw);

    /**
     * Reads a key the caller requires to be strictly positive ({@link Node#positive}), so that
     * a reader of distributions can reject one that puts appreciable weight at or below zero.
     * The caller still checks the value returned.
     */
    default double readPositive(Node node, String key, Object raw) {
        return read(node, key, raw);
    }

    /**
     * Reads component {@code index} of the vector {@code key} ({@link Node#vector}), so that a
     * reader drawing random numbers can tell the components apart (its key path is
     * {@code key.index}, as overrides spell it).
     */
    default double readComponent(Node node, String key, int index, Object raw) {
        return read(node, key, raw);
    }

    /**
     * A number the scenario does not give but the reader assumes: component {@code index} of
     * {@code key} (an unmeasured quantity, such as the transverse velocity of a member with no
     * proper motion), normally distributed with this mean and sigma. A reader of central values
     * returns the mean and records nothing, so a central run is as if the number were the mean;
     * a drawing reader draws it as it would an uncertain key at that path, and records it.
     */
    default double assumeNormal(Node node, String key, int index, double mean, double sigma) {
        return mean;
    }

    /** The plain reader: integers and floats only. */
    NumberReader PLAIN = (node, key, raw) -> {
        if (raw instanceof Double d) {
            return d;
        }
        if (raw instanceof Long l) {
            return l.doubleValue();
        }
        throw node.error(key, "expected a number, got " + Node.describe(raw));
    };
}
