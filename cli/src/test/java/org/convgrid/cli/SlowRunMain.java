package org.convgrid.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Set;

/** A convgrid process with a slow fake solver, for the kill-and-resume test (started in a child JVM). */
public final class SlowRunMain {

    /** Milliseconds per model: slow enough to kill the run part-way, fast enough for a test. */
    static final long MILLIS_PER_MODEL = 25;

    private SlowRunMain() {
    }

    public static void main(String[] args) {
        FakeChunkSolver solver = new FakeChunkSolver(Set.of(),
                Long.getLong("convgrid.test.millisPerModel", MILLIS_PER_MODEL));
        CommandContext context = new CommandContext(grid -> solver, List.of(), Map.of(), Path.of(""), false);
        System.exit(ConvgridMain.commandLine(new PrintWriter(System.out, true), new PrintWriter(System.err, true),
                context).execute(args));
    }
}
