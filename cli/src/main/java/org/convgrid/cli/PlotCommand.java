package org.convgrid.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.Callable;
import org.convgrid.output.RunLayout;
import org.convgrid.survey.MapsAndReport;
import org.convgrid.survey.RunLock;
import org.convgrid.survey.UnfinishedSlices;
import org.convgrid.survey.StaleTemporaryFiles;
import org.convgrid.grids.words.Counts;
import org.convgrid.plotting.RunData;
import org.convgrid.plotting.style.ChartFiles;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;

/** {@code convgrid plot}: redraw the maps and the report page of a run from its files alone. */
@Command(name = "plot", mixinStandardHelpOptions = true,
        description = "Redraw the PNG maps (RUN_DIR/maps/) and report.html of a run from its catalogue, "
                + "transitions and manifest.")
final class PlotCommand implements Callable<Integer> {

    @ParentCommand
    ConvgridMain main;

    @Parameters(index = "0", paramLabel = "RUN_DIR", description = "A run directory (holds catalogue.ecsv and zones.csv).")
    Path runDirectory;

    @Option(names = "--vector", split = ",", paramLabel = "svg|pdf",
            description = "Also write every chart as SVG and/or PDF (comma-separated).")
    List<ChartFiles.VectorFormat> vector = List.of();

    @Override
    public Integer call() throws Exception {
        RunLayout layout = new RunLayout(main.context().resolve(runDirectory));
        Path dir = layout.root();
        layout.refuseEarlierFormat();
        if (!Files.isRegularFile(layout.catalogue())) {
            throw new UsageException(dir + " is not a run directory (no " + RunLayout.CATALOGUE + ")");
        }
        Set<ChartFiles.VectorFormat> formats = vector.isEmpty()
                ? EnumSet.noneOf(ChartFiles.VectorFormat.class) : EnumSet.copyOf(vector);
        // the maps and the report are files of the run directory: drawn only while no run, merge or refinement
        // writes there
        try (RunLock lock = RunLock.acquire(dir)) {
            Locks.reportStale(lock, main.err());
            int staleTemporaries = StaleTemporaryFiles.remove(layout, StaleTemporaryFiles.Scope.CHARTS);
            if (staleTemporaries > 0) {
                main.err().println("convgrid: removed " + Counts.of(staleTemporaries, "temporary file")
                        + " that interrupted writes had left in " + dir);
            }
            UnfinishedRunWarning.printIfUnfinished(layout, main.err());
            RunData run = withUnfinishedSlicesMarked(RunData.read(dir));
            MapsAndReport.Written written = MapsAndReport.drawAndReport(run, dir, formats,
                    warning -> main.err().println("convgrid: warning: " + warning));
            // one chart is a PNG and, with --vector, a file per vector format: count charts, name the formats
            int files = written.maps().written().size();
            long charts = written.maps().written().stream().filter(p -> p.toString().endsWith(".png")).count();
            List<String> kinds = new java.util.ArrayList<>(List.of("PNG"));
            formats.forEach(f -> kinds.add(f.name()));
            main.out().println("wrote " + Counts.of(charts, "chart") + (formats.isEmpty() ? ""
                    : " (" + String.join(", ", kinds.subList(0, kinds.size() - 1)) + " and "
                    + kinds.get(kinds.size() - 1) + ", " + files + " files)") + " to " + layout.maps() + " and "
                    + written.report());
            return ExitCodes.OK;
        }
    }

    /**
     * The run with its transitions marked as {@code transitions} would write them for an unfinished run, when they
     * were found from the catalogue (no transitions.csv): the report's table then says which slices lack masses, as
     * the file would. A table read from transitions.csv is shown as written.
     */
    private static RunData withUnfinishedSlicesMarked(RunData run) {
        if (run.transitionsFromFile()) {
            return run;
        }
        return new RunData(run.catalogue(), UnfinishedSlices.marked(run.transitions(), run.catalogue(),
                run.manifest()), false, run.manifest(), run.radiusZones(), run.tracks(), run.timelines());
    }
}
