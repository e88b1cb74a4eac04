package org.holdfast.sweep;

import java.nio.file.Path;
import java.util.List;
import java.util.function.Consumer;

/**
 * Makes a list of runs somewhere (threads on this machine, a Spark cluster) and hands each
 * finished run to a sink, one at a time, on the calling thread.
 */
public interface SweepEngine {

    /**
     * @param scenario the scenario file
     * @param spec what the runs share
     * @param tasks the runs to make
     * @param sink receives each finished run; called from the calling thread only
     * @throws Exception the first failure of a run, after stopping the others
     */
    void run(Path scenario, RunSpec spec, List<RunTask> tasks, Consumer<RunRecord> sink) throws Exception;
}
