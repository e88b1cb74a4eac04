package org.holdfast.sweep;

/**
 * The one place the sweep commands take their {@link RunFunction} from: the physics engine
 * by default; tests install a fake.
 */
public final class RunFunctions {

    private static volatile RunFunction installed;

    private RunFunctions() {
    }

    /** Makes {@code function} the one the sweep commands use; null removes it. */
    public static void install(RunFunction function) {
        installed = function;
    }

    /** The installed function, or the physics engine when none is. */
    public static RunFunction current() {
        RunFunction f = installed;
        return f == null ? ENGINE : f;
    }

    /** The physics engine, used unless another function is installed. */
    private static final RunFunction ENGINE = new EngineRunFunction();
}
