package org.convgrid.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import org.convgrid.output.OutputFormatException;
import org.convgrid.output.RunLayout;
import org.convgrid.output.catalogue.CatalogueReader;
import org.convgrid.output.manifest.RunManifest;
import org.convgrid.output.manifest.RunManifestReader;
import org.convgrid.output.manifest.UnfinishedRun;

/**
 * The warning of the commands that read a run directory ({@code transitions}, {@code plot}) when its run did not
 * finish: what they compute covers the models present only, and the user should know before reading a transition
 * mass or a chart as the grid's. The same when a finished run's catalogue holds fewer rows than its manifest counts.
 */
final class UnfinishedRunWarning {

    private UnfinishedRunWarning() {
    }

    /**
     * Prints one warning line when the directory's manifest says the run did not finish, or when it has a catalogue
     * and no manifest; nothing otherwise (also when the manifest cannot be read or there is no catalogue: the command
     * itself reports those).
     */
    static void printIfUnfinished(RunLayout layout, PrintWriter err) throws IOException {
        if (!Files.isRegularFile(layout.catalogue())) {
            return;
        }
        if (!Files.exists(layout.manifest())) {
            // a run or merge stopped before its manifest, or a manifest deleted: such a directory's charts were drawn
            // without a word (a merge cut short: zones.csv and life events missing)
            err.println("convgrid: warning: " + layout.root() + " has no " + RunLayout.MANIFEST + ": whether its run "
                    + "finished is unknown (a merge cut short, or the manifest deleted?); what follows covers the rows of "
                    + RunLayout.CATALOGUE + " only");
            err.flush();
            return;
        }
        if (!Files.isRegularFile(layout.manifest())) {
            return;
        }
        RunManifest manifest;
        try {
            manifest = RunManifestReader.read(Files.readString(layout.manifest()));
        } catch (OutputFormatException e) {
            return;
        }
        // a row cut short by the interruption is no model
        long rows = CatalogueReader.readCompleteLines(Files.readString(layout.catalogue())).size();
        if (!manifest.isUnfinished()) {
            if (rows < manifest.total()) {
                // a finished run's catalogue that lost rows (a hand edit, damage): 51 of 52 rows were drawn
                // without a word
                err.println("convgrid: warning: " + layout.catalogue() + " holds " + rows + " rows but the "
                        + "manifest of the finished run counts " + manifest.total() + ": rows were deleted by hand or "
                        + "the file was damaged; what follows covers the " + rows + " rows present only");
                err.flush();
            }
            return;
        }
        UnfinishedRun unfinished = UnfinishedRun.of(manifest, rows).orElseThrow();
        err.println("convgrid: warning: the run in " + layout.root() + " is unfinished: " + unfinished.describe()
                + " in " + RunLayout.CATALOGUE + "; what follows covers those only (continue it with: convgrid run "
                + RunInterruptHook.shellWord(manifest.gridFile()) + " --out "
                + RunInterruptHook.shellWord(layout.root().toString()) + " --resume)");
        err.flush();
    }
}
