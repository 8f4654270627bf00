package org.convgrid.cli;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;

/**
 * Runs one convgrid command line per argument (words separated by '|') in this JVM and prints, for each, its exit
 * code, its duration in ms and its error output on one line; started with a small heap by {@link BoundedInputsTest}.
 */
public final class BoundedInputsMain {

    private BoundedInputsMain() {
    }

    public static void main(String[] lines) {
        CommandContext context = new CommandContext(grid -> FakeChunkSolver.fast(), List.of(), Map.of(), Path.of(""),
                false);
        for (String line : lines) {
            StringWriter err = new StringWriter();
            long start = System.nanoTime();
            int code = ConvgridMain.commandLine(new PrintWriter(new StringWriter()), new PrintWriter(err), context)
                    .execute(line.split("\\|"));
            long millis = (System.nanoTime() - start) / 1_000_000;
            System.out.println(code + "\t" + millis + "\t" + err.toString().replace('\n', ' '));
        }
    }
}
