package org.convgrid.cli.run;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.concurrent.atomic.AtomicLong;
import org.junit.jupiter.api.Test;

class ProgressReporterTest {

    private static final long SECOND = 1_000_000_000L;

    private final AtomicLong clock = new AtomicLong(0);
    private final StringWriter text = new StringWriter();

    @Test
    void terminalRedrawsOneLineWithRateAndTimeLeft() {
        ProgressReporter reporter = new ProgressReporter(new PrintWriter(text), true, clock::get);
        clock.set(5 * SECOND);
        reporter.progress(25, 200);
        clock.set(7 * SECOND);
        reporter.progress(35, 200);
        clock.set(10 * SECOND);
        reporter.progress(50, 200);
        clock.set(10 * SECOND + 1000);
        reporter.progress(51, 200);
        // 150 models at 25 / 5 s since the first report
        assertThat(text.toString()).isEqualTo("\r[###.....................] 25 of 200 models (12%), 5.00 models/s"
                + "\r[####....................] 35 of 200 models (17%), 5.00 models/s"
                + "\r[######..................] 50 of 200 models (25%), 5.00 models/s, 30 s left");
        clock.set(40 * SECOND);
        reporter.progress(200, 200);
        reporter.finish();
        // spaces over the end of the longer line before it (its ", 30 s left" had stayed on the terminal)
        assertThat(text.toString()).endsWith("\r[########################] 200 of 200 models (100%), 5.00 models/s"
                + " ".repeat(9) + "\n").doesNotContain("51/200");
    }

    /**
     * The sweep's line says how many of the models computed are saved: rows are written in grid order, so those
     * computed after the first unfinished one wait, and an interrupt loses them (the user could not tell,
     * before pressing Ctrl-C, what was safe on disk).
     */
    @Test
    void theSweepsLineSaysHowManyModelsAreSaved() {
        ProgressReporter reporter = new ProgressReporter(new PrintWriter(text), false, clock::get, 2);
        clock.set(10 * SECOND);
        reporter.progress(26, 24, 90);
        assertThat(text.toString()).isEqualTo("convgrid: 24 of 90 saved (26%), 26 computed, 2.40 models/s\n");

        StringWriter terminal = new StringWriter();
        clock.set(0);
        ProgressReporter drawn = new ProgressReporter(new PrintWriter(terminal), true, clock::get, 2);
        clock.set(10 * SECOND);
        drawn.progress(26, 24, 90);
        assertThat(terminal.toString()).isEqualTo("\r24 of 90 saved (26%), 26 computed, 2.40 models/s");
    }

    /** The sweep's line fits an 80-column terminal, also with a large grid's long counts and its time left. */
    @Test
    void theTerminalLineFitsEightyColumns() {
        ProgressReporter reporter = new ProgressReporter(new PrintWriter(text), true, clock::get, 1);
        clock.set(100 * SECOND);
        reporter.progress(1234, 1200, 2000);
        clock.set(200 * SECOND);
        reporter.progress(2468, 2400, 99_999);
        clock.set(300 * SECOND);
        reporter.progress(3702, 3600, 99_999);
        String[] lines = text.toString().substring(1).split("\r");
        assertThat(lines).hasSize(3).allSatisfy(l -> assertThat(l.length()).isLessThanOrEqualTo(79));
        assertThat(lines[0]).isEqualTo("1200 of 2000 saved (60%), 1234 computed, 12.00 models/s");
        assertThat(lines[2].strip()).isEqualTo("3600 of 99999 saved (3%), 3702 computed, 12.00 models/s, 2 h 13 min left");
    }

    @Test
    void batchLogPrintsPlainLinesEveryFivePercentOrTenSeconds() {
        ProgressReporter reporter = new ProgressReporter(new PrintWriter(text), false, clock::get);
        for (int done = 1; done <= 1000; done++) {
            clock.addAndGet(SECOND / 100);
            reporter.progress(done, 1000);
        }
        reporter.finish();
        String[] lines = text.toString().split("\n");
        // 20 steps of 5 %, and 10 s have passed once, at 1000 models (already a step)
        assertThat(lines).hasSize(20);
        assertThat(lines[0]).isEqualTo("convgrid: 50 of 1000 models (5%), 100.00 models/s, 10 s left");
        assertThat(lines[19]).isEqualTo("convgrid: 1000 of 1000 models (100%), 100.00 models/s");
        assertThat(text.toString()).doesNotContain("\r");
    }

    @Test
    void batchLogSpeaksAtLeastEveryTenSecondsOnASlowRun() {
        ProgressReporter reporter = new ProgressReporter(new PrintWriter(text), false, clock::get);
        for (int done = 1; done <= 10; done++) {
            clock.addAndGet(6 * SECOND);
            reporter.progress(done, 10_000);
        }
        assertThat(text.toString().split("\n")).containsExactly(
                // 9998 models at 1/6 per second: 59988 s = 16 h 39.8 min
                "convgrid: 2 of 10000 models (0%), 0.17 models/s",
                "convgrid: 4 of 10000 models (0%), 0.17 models/s, 16 h 39 min left",
                "convgrid: 6 of 10000 models (0%), 0.17 models/s, 16 h 39 min left",
                "convgrid: 8 of 10000 models (0%), 0.17 models/s, 16 h 39 min left",
                "convgrid: 10 of 10000 models (0%), 0.17 models/s, 16 h 39 min left");
    }

    @Test
    void theTimeLeftLeavesOutTheSetUpBeforeTheFirstChunk() {
        // the demo grid measured on 2 threads under load (180 models, 144 s in all): the first two chunks of 24
        // models came back together after 71 s, then 60 at 83 s, 84 and 108 at 111 s. Told model by model, the
        // first line used to say "1/180 ... 57 min 51 s left"; a rate counted from the start said "3 min 13 s left"
        // at 48 models and "1 min 14 s" at 108, with 33 s to go.
        ProgressReporter reporter = new ProgressReporter(new PrintWriter(text), false, clock::get, 2);
        long[][] reports = {{71_000, 24}, {71_010, 48}, {83_000, 60}, {111_000, 84}, {111_010, 108}};
        for (long[] r : reports) {
            clock.set(r[0] * SECOND / 1000);
            reporter.progress(r[1], 180);
        }
        String[] lines = text.toString().split("\n");
        assertThat(lines[0]).isEqualTo("convgrid: 24 of 180 models (13%), 0.34 models/s");
        assertThat(lines[3]).isEqualTo("convgrid: 84 of 180 models (46%), 0.76 models/s");
        // 72 models at 84 / 40.01 s since the first report: 34 s (33 s were left)
        assertThat(lines[4]).isEqualTo("convgrid: 108 of 180 models (60%), 0.97 models/s, 34 s left");
    }

    @Test
    void oneModelIsSingular() {
        ProgressReporter reporter = new ProgressReporter(new PrintWriter(text), false, clock::get);
        clock.set(SECOND);
        reporter.progress(1, 1);
        assertThat(text.toString()).startsWith("convgrid: 1 of 1 model (100%), ");
    }

    @Test
    void aCountOfUnknownTotalShowsTheCountAndRateAndEndsOnItsFinalCount() {
        // the refinement's new models: no total is known ahead, so no bar, percentage or time left
        ProgressReporter reporter = new ProgressReporter(new PrintWriter(text), true, clock::get, 2, "new model");
        clock.set(SECOND);
        reporter.progress(1, -1);
        clock.set(SECOND + 1000);
        reporter.progress(2, -1);
        assertThat(text.toString()).isEqualTo("\r1 new model, 1.00 models/s");
        clock.set(2 * SECOND);
        reporter.finish();
        // the report that fell within the redraw interval is drawn before the line ends
        assertThat(text.toString()).isEqualTo("\r1 new model, 1.00 models/s\r2 new models, 1.00 models/s\n");
    }

    @Test
    void aCountOfUnknownTotalInABatchLogSpeaksEveryTenSeconds() {
        ProgressReporter reporter = new ProgressReporter(new PrintWriter(text), false, clock::get, 2, "new model");
        for (int done = 1; done <= 50; done++) {
            clock.addAndGet(SECOND / 2);
            reporter.progress(done, -1);
        }
        reporter.finish();
        // then the final count once, as the run's summary gives it (the log had ended on 40)
        assertThat(text.toString().split("\n")).containsExactly("convgrid: 20 new models, 2.00 models/s",
                "convgrid: 40 new models, 2.00 models/s", "convgrid: 50 new models, 2.00 models/s");
    }

    @Test
    void aBatchLogEndsOnceOnTheFinalCount() {
        // the last count already shown: no second line
        ProgressReporter reporter = new ProgressReporter(new PrintWriter(text), false, clock::get, 2, "new model");
        for (int done = 1; done <= 40; done++) {
            clock.addAndGet(SECOND / 2);
            reporter.progress(done, -1);
        }
        reporter.finish();
        assertThat(text.toString().split("\n")).containsExactly("convgrid: 20 new models, 2.00 models/s",
                "convgrid: 40 new models, 2.00 models/s");

        // the sweep: its 100 % line is its last, and finish adds nothing
        StringWriter sweepText = new StringWriter();
        ProgressReporter sweep = new ProgressReporter(new PrintWriter(sweepText), false, clock::get);
        for (int done = 1; done <= 3; done++) {
            clock.addAndGet(SECOND);
            sweep.progress(done, 3);
        }
        String before = sweepText.toString();
        assertThat(before).endsWith("convgrid: 3 of 3 models (100%), 1.00 models/s\n");
        sweep.finish();
        assertThat(sweepText.toString()).isEqualTo(before);
    }
}
