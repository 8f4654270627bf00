package org.convgrid.plotting;

import java.nio.file.Path;
import java.util.List;

/**
 * What drawing a run's charts gave: the files written and the charts that could not be drawn. A chart that fails
 * is left out and named here so the caller can warn; it never stops the other charts, the report or the run.
 *
 * @param written every file written, in report order
 * @param failures the charts that could not be drawn, in report order
 */
public record DrawnMaps(List<Path> written, List<ChartFailure> failures) {

    public DrawnMaps {
        written = List.copyOf(written);
        failures = List.copyOf(failures);
    }

    /**
     * One chart that could not be drawn.
     *
     * @param fileName the chart's PNG file name under maps/
     * @param reason what went wrong, for people
     */
    public record ChartFailure(String fileName, String reason) {

        /** One line for a warning: the chart, then the reason. */
        public String describe() {
            return "chart " + fileName + " not drawn: " + reason;
        }
    }
}
