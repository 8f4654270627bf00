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
        clock.set(10 * SECOND);
        reporter.progress(50, 200);
        clock.set(10 * SECOND + 1000);
        reporter.progress(51, 200);
        assertThat(text.toString())
                .isEqualTo("\r[######..................] 50/200 models (25%), 5.00 models/s, 30 s left");
        clock.set(40 * SECOND);
        reporter.progress(200, 200);
        reporter.finish();
        assertThat(text.toString()).endsWith("\r[########################] 200/200 models (100%), 5.00 models/s\n")
                .doesNotContain("51/200");
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
        assertThat(lines[0]).isEqualTo("convgrid: 50/1000 models (5%), 100.00 models/s, 10 s left");
        assertThat(lines[19]).isEqualTo("convgrid: 1000/1000 models (100%), 100.00 models/s");
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
                "convgrid: 2/10000 models (0%), 0.17 models/s, 16 h 39 min left",
                "convgrid: 4/10000 models (0%), 0.17 models/s, 16 h 39 min left",
                "convgrid: 6/10000 models (0%), 0.17 models/s, 16 h 39 min left",
                "convgrid: 8/10000 models (0%), 0.17 models/s, 16 h 39 min left",
                "convgrid: 10/10000 models (0%), 0.17 models/s, 16 h 39 min left");
    }
}
