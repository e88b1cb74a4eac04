package org.holdfast.replay;

import java.nio.file.Path;
import java.util.List;

/** A JVM that evolves the demo live into the folder args[0] and waits to be told to quit. */
public final class LiveRunChild {

    private LiveRunChild() {
    }

    public static void main(String[] args) throws InterruptedException {
        LiveRun.start(DemoRun.SCENARIO, List.of("run.snapshot_every_myr=100"), Path.of(args[0]));
        Thread.sleep(Long.MAX_VALUE);
    }
}
