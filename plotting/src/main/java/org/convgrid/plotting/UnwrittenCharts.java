package org.convgrid.plotting;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import org.convgrid.output.RunLayout;

/**
 * The failure of a command whose charts were drawn but could not be written (a full disk, a file size limit): one
 * message with how many, the first chart and the operating system's reason, that the tables are complete, and how
 * to draw the charts again. A chart with nothing to show is no such failure: it stays a warning.
 */
public final class UnwrittenCharts {

    private UnwrittenCharts() {
    }

    /** The failure to report for {@code drawn} of the run in {@code runDir}; null when every drawn chart was written. */
    public static IOException of(DrawnMaps drawn, Path runDir) {
        List<DrawnMaps.ChartFailure> unwritten = drawn.failures().stream().filter(DrawnMaps.ChartFailure::notWritten)
                .toList();
        if (unwritten.isEmpty()) {
            return null;
        }
        int charts = unwritten.size() + (int) drawn.written().stream()
                .filter(p -> p.getFileName().toString().endsWith(".png")).count();
        DrawnMaps.ChartFailure first = unwritten.get(0);
        return new IOException(unwritten.size() + " of " + charts + " charts could not be written to "
                + new RunLayout(runDir).maps() + " (" + first.fileName() + ": " + first.reason() + ")"
                + afterwards(runDir));
    }

    /** What the user has and what to do, after a chart or the report could not be written. */
    public static String afterwards(Path runDir) {
        return "; the tables (" + RunLayout.CATALOGUE + ", " + RunLayout.ZONES + ", " + RunLayout.TRANSITIONS
                + ") are complete: make room, then 'convgrid plot " + runDir + "' draws the charts and the report "
                + "again";
    }
}
