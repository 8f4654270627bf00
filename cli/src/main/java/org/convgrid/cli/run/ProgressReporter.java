package org.convgrid.cli.run;

import java.io.PrintWriter;
import java.util.Locale;
import java.util.function.LongSupplier;
import org.convgrid.engine.batch.ProgressListener;

/**
 * Progress of a run on the error stream. On a terminal: one line redrawn in place with a carriage return (bar,
 * models done/total, rate, time left), at most every {@link #REDRAW_NANOS}. In a batch log: one plain line every
 * {@link #LOG_EVERY_NANOS} or every {@link #LOG_EVERY_PERCENT} %, whichever comes first. Called from one thread,
 * once per finished chunk of models.
 *
 * <p>The time left is the models still to do at the mean rate so far, shown from the second report on: the first
 * report comes when the first chunk is done, while the other threads' chunks, started at the same moment, are nearly
 * done too; a rate taken from it alone counts the set-up (tables read, physics built per composition, the first cold
 * zero-age models) and one thread's chunk as all the work done, and overstates the time left by about the thread count.
 */
public final class ProgressReporter implements ProgressListener {

    /** Shortest interval between redraws of the terminal line: 5 per second is smooth and cheap. */
    static final long REDRAW_NANOS = 200_000_000L;
    /** Longest silence in a batch log, ns (10 s). */
    static final long LOG_EVERY_NANOS = 10_000_000_000L;
    /** Log a line at least at each multiple of this percentage. */
    static final int LOG_EVERY_PERCENT = 5;
    private static final int BAR_WIDTH = 24;
    /** Reports before the time left is shown (see the class comment). */
    static final int MIN_REPORTS_FOR_TIME_LEFT = 2;

    private final PrintWriter err;
    private final boolean terminal;
    private final LongSupplier nanoTime;
    private final long start;
    private long lastShown;
    private long lastPercentStep;
    private boolean drawn;
    private long reports;

    /**
     * @param err where to write
     * @param terminal whether err is a terminal (redraw in place) or a log (plain lines)
     * @param nanoTime the clock, {@code System::nanoTime} outside tests
     */
    public ProgressReporter(PrintWriter err, boolean terminal, LongSupplier nanoTime) {
        this.err = err;
        this.terminal = terminal;
        this.nanoTime = nanoTime;
        this.start = nanoTime.getAsLong();
        this.lastShown = start;
    }

    @Override
    public void progress(long done, long total) {
        long now = nanoTime.getAsLong();
        reports++;
        boolean last = done >= total && total > 0;
        if (terminal) {
            if (last || now - lastShown >= REDRAW_NANOS) {
                err.print("\r" + line(done, total, now, true));
                err.flush();
                lastShown = now;
                drawn = true;
            }
            return;
        }
        long step = total > 0 ? done * 100 / total / LOG_EVERY_PERCENT : -1;
        if (last || now - lastShown >= LOG_EVERY_NANOS || step > lastPercentStep) {
            err.println("convgrid: " + line(done, total, now, false));
            err.flush();
            lastShown = now;
            lastPercentStep = step;
        }
    }

    /** Ends the terminal line; call once the run is over. */
    public void finish() {
        if (terminal && drawn) {
            err.println();
            err.flush();
        }
    }

    String line(long done, long total, long now, boolean bar) {
        double seconds = Math.max(1e-9, (now - start) * 1e-9);
        double rate = done / seconds;
        StringBuilder text = new StringBuilder();
        if (bar && total > 0) {
            int filled = (int) (BAR_WIDTH * Math.min(1.0, (double) done / total));
            text.append('[').append("#".repeat(filled)).append(".".repeat(BAR_WIDTH - filled)).append("] ");
        }
        text.append(done).append('/').append(total < 0 ? "?" : Long.toString(total)).append(" models");
        if (total > 0) {
            text.append(String.format(Locale.ROOT, " (%d%%)", done * 100 / total));
        }
        text.append(String.format(Locale.ROOT, ", %.2f models/s", rate));
        if (reports >= MIN_REPORTS_FOR_TIME_LEFT && total > 0 && done > 0 && done < total) {
            text.append(", ").append(Durations.describe((total - done) / rate)).append(" left");
        }
        return text.toString();
    }
}
