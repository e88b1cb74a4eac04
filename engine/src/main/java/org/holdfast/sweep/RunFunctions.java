package org.holdfast.sweep;

/**
 * The one place the sweep commands take their {@link RunFunction} from. The application
 * installs the physics engine at start-up; tests install a fake.
 */
public final class RunFunctions {

    private static volatile RunFunction installed;

    private RunFunctions() {
    }

    /** Makes {@code function} the one the sweep commands use; null removes it. */
    public static void install(RunFunction function) {
        installed = function;
    }

    /**
     * The installed function.
     *
     * @throws IllegalStateException if none is installed
     */
    public static RunFunction current() {
        RunFunction f = installed;
        if (f == null) {
            throw new IllegalStateException("no physics engine is connected to the sweep machinery "
                    + "(RunFunctions.install was never called)");
        }
        return f;
    }
}
