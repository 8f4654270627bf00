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
                + olderFiles(unwritten) + afterwards(runDir));
    }

    /**
     * What became of the files an earlier drawing left under the names not written: removed (said, so that a user
     * who misses a chart knows why), or still there with older data (said, so that nobody reads them as new).
     */
    static String olderFiles(List<DrawnMaps.ChartFailure> unwritten) {
        long removed = unwritten.stream().filter(f -> f.olderFile() == DrawnMaps.ChartFailure.OlderFile.REMOVED)
                .count();
        long kept = unwritten.stream().filter(f -> f.olderFile() == DrawnMaps.ChartFailure.OlderFile.KEPT).count();
        String text = "";
        if (removed > 0) {
            text += "; the older file" + (removed == 1 ? " of 1 of them was" : "s of " + removed + " of them were")
                    + " removed, as " + (removed == 1 ? "it showed" : "they showed") + " earlier data";
        }
        if (kept > 0) {
            text += "; the older file" + (kept == 1 ? " of 1 of them" : "s of " + kept + " of them")
                    + " could not be removed and still show" + (kept == 1 ? "s" : "") + " earlier data";
        }
        return text;
    }

    /** What the user has and what to do, after a chart or the report could not be written. */
    public static String afterwards(Path runDir) {
        return "; the tables (" + RunLayout.CATALOGUE + ", " + RunLayout.ZONES + ", " + RunLayout.TRANSITIONS
                + ") are complete: make room, then 'convgrid plot " + runDir + "' draws the charts and the report "
                + "again";
    }
}
