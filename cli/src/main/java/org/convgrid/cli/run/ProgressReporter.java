package org.convgrid.cli.run;

import java.io.PrintWriter;
import java.util.Locale;
import java.util.function.LongSupplier;
import org.convgrid.engine.batch.ProgressListener;
import org.convgrid.grids.words.Counts;

/**
 * Progress of a run on the error stream. On a terminal: one line redrawn in place with a carriage return (bar,
 * models done/total, rate, time left), at most every {@link #REDRAW_NANOS}. A sweep's line counts the models saved,
 * their rows written in grid order, and says how many are computed: a user about to press Ctrl-C sees what it keeps
 * (the models computed after the first unfinished one are not written yet, and are lost). In a batch log: one plain
 * line every
 * {@link #LOG_EVERY_NANOS} or every {@link #LOG_EVERY_PERCENT} %, whichever comes first. Called from one thread at a
 * time, once per finished chunk of models (the sweep) or per new model (the refinement, whose total is unknown: the
 * count and the rate alone, no bar, a log line every {@link #LOG_EVERY_NANOS}).
 *
 * <p>The time left is the models still to do at the rate measured since the first report. The wait for the first
 * report holds the set-up (the JVM warming up, opacity tables read, physics built per composition, cold first
 * zero-age models): on the demo grid under load it took 71 s of a 144 s run, after which the rest came at three times
 * the mean rate, so a rate counted from the start said "3 min 13 s left" with 73 s to go. The other threads' first
 * chunks end just after the first report and would make the rate look too high, so the time left is shown only once
 * {@link #REPORTS_PER_THREAD} reports per thread (at least two) have followed the first.
 */
public final class ProgressReporter implements ProgressListener {

    /** Shortest interval between redraws of the terminal line: 5 per second is smooth and cheap. */
    static final long REDRAW_NANOS = 200_000_000L;
    /** Longest silence in a batch log, ns (10 s). */
    static final long LOG_EVERY_NANOS = 10_000_000_000L;
    /** Log a line at least at each multiple of this percentage. */
    static final int LOG_EVERY_PERCENT = 5;
    private static final int BAR_WIDTH = 24;
    /** Reports per worker thread after the first before the time left is shown (see the class comment). */
    static final int REPORTS_PER_THREAD = 2;

    private final PrintWriter err;
    private final boolean terminal;
    private final LongSupplier nanoTime;
    private final long start;
    private long lastShown;
    private long lastPercentStep;
    private boolean drawn;
    private long reports;
    private final int reportsBeforeTimeLeft;
    private long firstDone;
    private long firstTime;
    private final String counted;
    private long lastDone;
    private long lastTotal;
    private long shownDone;
    /**
     * Models computed, written or waiting for an earlier one to be written, as last told; -1 when the caller tells
     * one count only (the refinement).
     */
    private long computed = -1;
    /** Length of the line last drawn on the terminal. */
    private int drawnWidth;

    /**
     * @param err where to write
     * @param terminal whether err is a terminal (redraw in place) or a log (plain lines)
     * @param nanoTime the clock, {@code System::nanoTime} outside tests
     */
    public ProgressReporter(PrintWriter err, boolean terminal, LongSupplier nanoTime) {
        this(err, terminal, nanoTime, 1);
    }

    /**
     * @param err where to write
     * @param terminal whether err is a terminal (redraw in place) or a log (plain lines)
     * @param nanoTime the clock, {@code System::nanoTime} outside tests
     * @param threads worker threads of the run
     */
    public ProgressReporter(PrintWriter err, boolean terminal, LongSupplier nanoTime, int threads) {
        this(err, terminal, nanoTime, threads, "model");
    }

    /**
     * @param err where to write
     * @param terminal whether err is a terminal (redraw in place) or a log (plain lines)
     * @param nanoTime the clock, {@code System::nanoTime} outside tests
     * @param threads worker threads of the run
     * @param counted what is counted, singular ("new model" for the refinement, whose line then reads as the
     *     "N new models" of the run's summary)
     */
    public ProgressReporter(PrintWriter err, boolean terminal, LongSupplier nanoTime, int threads, String counted) {
        this.counted = counted;
        this.reportsBeforeTimeLeft = Math.max(2, REPORTS_PER_THREAD * threads);
        this.err = err;
        this.terminal = terminal;
        this.nanoTime = nanoTime;
        this.start = nanoTime.getAsLong();
        this.lastShown = start;
    }

    @Override
    public void progress(long done, long total) {
        report(done, -1, total);
    }

    /**
     * The sweep's report: the line counts the models saved (their rows written), which is what Ctrl-C keeps, and
     * says how many are computed; the bar, the percentage, the rate and the time left follow the saved ones.
     */
    @Override
    public void progress(long computed, long saved, long total) {
        report(saved, computed, total);
    }

    private void report(long done, long computed, long total) {
        this.computed = computed;
        long now = nanoTime.getAsLong();
        if (reports++ == 0) {
            firstDone = done;
            firstTime = now;
        }
        lastDone = done;
        lastTotal = total;
        boolean last = done >= total && total > 0;
        if (terminal) {
            if (last || now - lastShown >= REDRAW_NANOS) {
                draw(done, total, now);
            }
            return;
        }
        long step = total > 0 ? done * 100 / total / LOG_EVERY_PERCENT : -1;
        if (last || now - lastShown >= LOG_EVERY_NANOS || step > lastPercentStep) {
            log(done, total, now);
            lastPercentStep = step;
        }
    }

    private void log(long done, long total, long now) {
        err.println("convgrid: " + line(done, total, now, false));
        err.flush();
        lastShown = now;
        shownDone = done;
    }

    private void draw(long done, long total, long now) {
        String line = line(done, total, now, true);
        // spaces over what a longer line before it left on the terminal (its time left, a wider count)
        err.print("\r" + line + " ".repeat(Math.max(0, drawnWidth - line.length())));
        drawnWidth = line.length();
        err.flush();
        lastShown = now;
        shownDone = done;
        drawn = true;
    }

    /**
     * Ends the progress; call once the run is over. A count of unknown total has no last report of its own, so the
     * final count is shown once more when a later report fell within the interval: redrawn on a terminal, a last
     * line in a batch log (a log had stopped at 89 and at 148 new models while the summary said 169). A
     * count whose last report reached its total was shown then, and gets no second line.
     */
    public void finish() {
        if (lastDone > shownDone) {
            if (terminal) {
                draw(lastDone, lastTotal, nanoTime.getAsLong());
            } else {
                log(lastDone, lastTotal, nanoTime.getAsLong());
            }
        }
        if (terminal && drawn) {
            err.println();
            err.flush();
        }
    }

    String line(long done, long total, long now, boolean bar) {
        double seconds = Math.max(1e-9, (now - start) * 1e-9);
        double rate = done / seconds;
        StringBuilder text = new StringBuilder();
        if (computed >= 0) {
            // the sweep's: no bar (the percentage says it), and "saved" for the noun the start line gave, so that a
            // 100 000-model grid's line fits an 80-column terminal with its time left
            text.append(done).append(" of ").append(total).append(" saved");
        } else {
            if (bar && total > 0) {
                int filled = (int) (BAR_WIDTH * Math.min(1.0, (double) done / total));
                text.append('[').append("#".repeat(filled)).append(".".repeat(BAR_WIDTH - filled)).append("] ");
            }
            // "1 of 1 model": the count the noun agrees with is the total; "1/1 models" read oddly
            text.append(total < 0 ? Counts.of(done, counted) : done + " of " + Counts.of(total, counted));
        }
        if (total > 0) {
            text.append(String.format(Locale.ROOT, " (%d%%)", done * 100 / total));
        }
        if (computed >= 0) {
            text.append(", ").append(computed).append(" computed");
        }
        text.append(String.format(Locale.ROOT, ", %.2f models/s", rate));
        if (reports - 1 >= reportsBeforeTimeLeft && total > 0 && done > firstDone && done < total
                && now > firstTime) {
            double since = (done - firstDone) / ((now - firstTime) * 1e-9);
            text.append(", ").append(Durations.describe((total - done) / since)).append(" left");
        }
        return text.toString();
    }
}
