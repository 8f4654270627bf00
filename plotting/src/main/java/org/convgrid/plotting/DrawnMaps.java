package org.convgrid.plotting;

import java.nio.file.Path;
import java.util.List;

/**
 * What drawing a run's charts gave: the files written and the charts that could not be drawn. A chart that fails
 * is left out and named here; it never stops the other charts or the report. The caller warns of a chart with
 * nothing to show, and fails the command when a chart could not be written ({@link UnwrittenCharts}).
 *
 * @param written every file written, in report order
 * @param failures the charts that could not be drawn, in report order
 */
public record DrawnMaps(List<Path> written, List<ChartFailure> failures) {

    public DrawnMaps {
        written = List.copyOf(written);
        failures = List.copyOf(failures);
    }

    /** Whether some chart was drawn but could not be written (a full disk, a file size limit). */
    public boolean someNotWritten() {
        return failures.stream().anyMatch(ChartFailure::notWritten);
    }

    /**
     * One chart that could not be drawn.
     *
     * @param fileName the chart's PNG file name under maps/
     * @param reason what went wrong, for people
     * @param notWritten whether the chart was drawn but writing its file failed (the operating system's reason in
     *                   {@code reason}): unlike a chart with nothing to show, that is a failure of the command
     * @param olderFile what became of the file an earlier drawing left under the name not written
     */
    public record ChartFailure(String fileName, String reason, boolean notWritten, OlderFile olderFile) {

        /**
         * The file of the same name an earlier drawing left in maps/, when this one could not write it: a chart of
         * older data beside tables of new data (one was listed as failed in report.html and still there).
         */
        public enum OlderFile {
            /** There was none (or nothing was to be written). */
            NONE,
            /** It was removed, so maps/ holds no chart of older data under that name. */
            REMOVED,
            /** It could not be removed, and still shows older data. */
            KEPT
        }

        public ChartFailure {
            java.util.Objects.requireNonNull(olderFile, "olderFile");
        }

        /** A chart that could not be drawn (nothing to show, a chart library error). */
        public ChartFailure(String fileName, String reason) {
            this(fileName, reason, false, OlderFile.NONE);
        }

        /** One line for a warning: the chart, the reason, and what became of an older file of its name. */
        public String describe() {
            return "chart " + fileName + " not drawn: " + reason + switch (olderFile) {
                case NONE -> "";
                case REMOVED -> "; its older file in maps/ was removed, as it showed earlier data";
                case KEPT -> "; its older file in maps/ could not be removed and shows earlier data";
            };
        }
    }
}
