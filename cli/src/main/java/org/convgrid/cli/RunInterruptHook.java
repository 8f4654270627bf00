package org.convgrid.cli;

import java.io.PrintWriter;
import java.util.concurrent.Callable;
import java.util.regex.Pattern;
import org.convgrid.output.RunLayout;
import org.convgrid.survey.GridRun;
import org.convgrid.grids.words.Counts;

/**
 * What {@code run} does on SIGINT (Ctrl-C) or SIGTERM (a batch system's stop): a JVM shutdown hook, installed once
 * the run directory's lock is taken (before the directory is prepared; its callback waits for that) and removed when
 * the command ends, that has the sweep stopped between two catalogue
 * rows and its manifest rewritten honestly ({@link GridRun#interrupt}), prints one line on stderr saying how far the
 * run got and how to continue it, and ends the process at once with exit code {@link ExitCodes#INTERRUPTED}: the
 * JVM's own exit would wait for nothing useful, and worker threads must not write after the manifest. The hook's
 * thread is the only state it keeps; everything it needs comes in through {@code onSignal}.
 */
final class RunInterruptHook implements AutoCloseable {

    /** Words a shell takes as they are; anything else is quoted in the command the line suggests. */
    private static final Pattern PLAIN_WORD = Pattern.compile("[A-Za-z0-9_./:=@%+-]+");

    private final Thread thread;

    private RunInterruptHook(Thread thread) {
        this.thread = thread;
    }

    /**
     * Installs the hook.
     *
     * @param onSignal stops the run and returns the line to print (called once, on the hook's thread)
     * @param err where the line goes
     */
    static RunInterruptHook install(Callable<String> onSignal, PrintWriter err) {
        Thread thread = new Thread(() -> {
            String line;
            try {
                line = onSignal.call();
            } catch (Exception | Error e) {
                line = "convgrid: interrupted; the run's manifest could not be rewritten: " + e.getMessage();
            }
            err.println(line);
            err.flush();
            Runtime.getRuntime().halt(ExitCodes.INTERRUPTED);
        }, "convgrid-interrupt");
        Runtime.getRuntime().addShutdownHook(thread);
        return new RunInterruptHook(thread);
    }

    /** Removes the hook: the command ended on its own, and its exit code is its own. */
    @Override
    public void close() {
        try {
            Runtime.getRuntime().removeShutdownHook(thread);
        } catch (IllegalStateException e) {
            // the JVM is shutting down: the hook is running and will end the process itself
        }
    }

    /**
     * The line for an interrupted run.
     *
     * @param left what the run left
     * @param grid the grid file as the user named it
     * @param out the run directory
     * @param refines whether the run refines its transitions after the sweep
     */
    static String line(GridRun.Interrupted left, String grid, String out, boolean refines) {
        if (!left.swept()) {
            // the catalogue is written in grid order, so models that finished after the first unfinished one are
            // not in it, though their tracks are on disk and can be taken for kept ones
            return "convgrid: interrupted: " + left.rows() + " of " + Counts.of(left.expected(), "model") + " in "
                    + RunLayout.CATALOGUE + " (models finished out of grid order are not kept); continue with: "
                    + "convgrid run " + shellWord(grid) + " --out " + shellWord(out) + " --resume"
                    // a run without refinement continues without it (following the line had started a refinement)
                    + (refines ? "" : " --no-refine");
        }
        // the sweep and its manifest were complete: what was cut short is the refinement or the charts
        return "convgrid: interrupted after the sweep: all " + Counts.of(left.expected(), "model") + " in "
                + RunLayout.CATALOGUE
                + "; finish with: " + (refines
                ? "convgrid transitions " + shellWord(out) + " --refine" : "convgrid plot " + shellWord(out));
    }

    /** A path as one shell word: as it is when plain, in single quotes otherwise. */
    static String shellWord(String text) {
        return PLAIN_WORD.matcher(text).matches() ? text : "'" + text.replace("'", "'\\''") + "'";
    }
}
