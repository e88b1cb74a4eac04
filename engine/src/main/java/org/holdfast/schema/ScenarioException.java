package org.holdfast.schema;

/**
 * A problem with a scenario or its input, reported as one line that names where it is:
 * {@code file:line: key: what is wrong}. The command line turns it into exit code 2.
 */
public final class ScenarioException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    private final String where;
    private final String key;

    /**
     * @param where "file:line" (or an option such as "--set"); may be null
     * @param key the dotted key at fault; may be null
     * @param message what is wrong, in plain words
     */
    public ScenarioException(String where, String key, String message) {
        super(format(where, key, message));
        this.where = where;
        this.key = key;
    }

    /** "file:line", or the option, that the problem was found in; may be null. */
    public String where() {
        return where;
    }

    /** The dotted key at fault; may be null. */
    public String key() {
        return key;
    }

    private static String format(String where, String key, String message) {
        StringBuilder sb = new StringBuilder();
        if (where != null) {
            sb.append(where).append(": ");
        }
        if (key != null && !key.isEmpty()) {
            sb.append(key).append(": ");
        }
        return sb.append(message).toString();
    }
}
