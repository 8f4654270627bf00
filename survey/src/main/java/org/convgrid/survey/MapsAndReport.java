package org.convgrid.survey;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Objects;
import java.util.Set;
import java.util.function.Consumer;
import org.convgrid.plotting.DrawnMaps;
import org.convgrid.plotting.RunData;
import org.convgrid.plotting.RunMaps;
import org.convgrid.plotting.UnwrittenCharts;
import org.convgrid.plotting.report.ReportPage;
import org.convgrid.plotting.style.ChartFiles;

/**
 * The last step of every run and merge: draw the maps and write report.html from the run directory's files. A chart
 * with nothing to draw is handed to the warning sink by name and left out of the report; it never fails the run.
 * A chart or report that could not be written (a full disk) fails it with the file system's reason, once the other
 * charts and the report were tried: the tables are complete by then, and the message says so and how to redraw.
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
        drawAndReport(RunData.read(run.directory()), run.directory(), vectorFormats, warnings);
    }

    /** What {@link #drawAndReport} wrote: the charts (and those not drawn), and report.html. */
    public record Written(DrawnMaps maps, Path report) {
    }

    /**
     * Draws every chart of {@code data} into the run directory and writes report.html: the steps of a run's end and
     * of {@code plot} alike. A chart not drawn goes to {@code warnings}; a chart or the report not written fails
     * with one message, once everything else was tried.
     *
     * @throws IOException the report or some chart could not be written
     */
    public static Written drawAndReport(RunData data, Path runDir, Set<ChartFiles.VectorFormat> vectorFormats,
                                        Consumer<String> warnings) throws IOException {
        DrawnMaps drawn = RunMaps.drawAll(data, runDir, vectorFormats);
        // charts not written are said once, in the failure below, not as one warning each
        drawn.failures().stream().filter(f -> !f.notWritten()).forEach(f -> warnings.accept(f.describe()));
        Path report;
        try {
            report = ReportPage.write(data, runDir, drawn.failures());
        } catch (IOException e) {
            throw reportNotWritten(e, runDir);
        }
        IOException unwritten = UnwrittenCharts.of(drawn, runDir);
        if (unwritten != null) {
            throw unwritten;
        }
        return new Written(drawn, report);
    }

    /**
     * The failure of a command whose report.html could not be written ({@code e}): the reason, that the tables are
     * complete, and what draws the charts and the report again; {@code run}, {@code merge} and {@code plot} all
     * reach it through {@link #drawAndReport}.
     */
    static IOException reportNotWritten(IOException e, Path runDir) {
        return new IOException(IoMessages.reason(e) + UnwrittenCharts.afterwards(runDir), e);
    }
}
