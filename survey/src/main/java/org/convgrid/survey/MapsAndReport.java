package org.convgrid.survey;

import java.io.IOException;
import java.util.Objects;
import java.util.Set;
import java.util.function.Consumer;
import org.convgrid.plotting.DrawnMaps;
import org.convgrid.plotting.RunData;
import org.convgrid.plotting.RunMaps;
import org.convgrid.plotting.report.ReportPage;
import org.convgrid.plotting.style.ChartFiles;

/**
 * The last step of every run and merge: draw the maps and write report.html from the run directory's files. A chart
 * that cannot be drawn is handed to the warning sink by name and left out of the report; it never fails the run,
 * so the exit code, catalogue, transitions and report still come out.
 */
public final class MapsAndReport implements RunFinisher {

    private final Set<ChartFiles.VectorFormat> vectorFormats;
    private final Consumer<String> warnings;

    /**
     * @param vectorFormats vector files to write beside each PNG
     * @param warnings receives one line per chart that could not be drawn (the survey layer never prints)
     */
    public MapsAndReport(Set<ChartFiles.VectorFormat> vectorFormats, Consumer<String> warnings) {
        this.vectorFormats = Set.copyOf(vectorFormats);
        this.warnings = Objects.requireNonNull(warnings, "warnings");
    }

    @Override
    public void finish(FinishedRun run) throws IOException {
        // read once for the charts and the report: with tracks, reading them is not small
        RunData data = RunData.read(run.directory());
        DrawnMaps drawn = RunMaps.drawAll(data, run.directory(), vectorFormats);
        drawn.failures().forEach(f -> warnings.accept(f.describe()));
        ReportPage.write(data, run.directory(), drawn.failures());
    }
}
