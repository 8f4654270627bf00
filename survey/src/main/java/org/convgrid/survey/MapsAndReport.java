package org.convgrid.survey;

import java.io.IOException;
import java.util.Set;
import org.convgrid.plotting.report.ReportPage;
import org.convgrid.plotting.RunMaps;
import org.convgrid.plotting.style.ChartFiles;

/** The last step of every run and merge: draw the maps and write report.html from the run directory's files. */
public final class MapsAndReport implements RunFinisher {

    private final Set<ChartFiles.VectorFormat> vectorFormats;

    public MapsAndReport(Set<ChartFiles.VectorFormat> vectorFormats) {
        this.vectorFormats = Set.copyOf(vectorFormats);
    }

    @Override
    public void finish(FinishedRun run) throws IOException {
        RunMaps.drawAll(run.directory(), vectorFormats);
        ReportPage.write(run.directory());
    }
}
