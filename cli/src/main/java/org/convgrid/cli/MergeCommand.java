package org.convgrid.cli;

import java.nio.file.Path;
import java.time.Clock;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.survey.FinishedRun;
import org.convgrid.survey.MergeInterruption;
import org.convgrid.survey.RunDirectory;
import org.convgrid.survey.RunFinishing;
import org.convgrid.survey.RunLock;
import org.convgrid.survey.ShardMerger;
import org.convgrid.grids.words.Counts;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;

/** {@code convgrid merge DIR... --out DIR}: joins shard run directories into one. */
@Command(name = "merge", mixinStandardHelpOptions = true,
        description = {"Join the run directories of the shards of one grid into one run directory, identical to "
                + "a single run of the grid before its refinement: rows in grid order, transitions.csv and a "
                + "merged manifest.yaml. Shards do not refine the transition masses (each holds part of every mass "
                + "line); when the grid refines (transitions: refine: true, the default), run 'convgrid transitions "
                + "DIR --refine' on the merged directory, which then equals a single run's.",
            "Refused (exit code 2, nothing written) when the shards come from different grids, or when a model is "
                + "missing from every shard or present in several. Exit code 3 when some merged models are not ok."})
final class MergeCommand implements Callable<Integer> {

    @ParentCommand
    ConvgridMain parent;

    @Parameters(arity = "1..*", paramLabel = "DIR", description = "Shard run directories (paths).")
    List<Path> shards;

    @Option(names = "--out", required = true, paramLabel = "DIR",
            description = "Merged run directory (path; created; must not hold a run yet).")
    Path out;

    @Override
    public Integer call() throws Exception {
        CommandContext context = parent.context();
        List<Path> dirs = shards.stream().map(context::resolve).toList();
        RunDirectory target = new RunDirectory(context.resolve(out));
        FinishedRun run;
        MergeInterruption interruption = new MergeInterruption();
        try (RunLock lock = RunLock.acquire(target.root());
             RunInterruptHook hook = RunInterruptHook.install(() -> {
                 MergeInterruption.Outcome outcome = interruption.stop();
                 // released as a normal end would: the lock's directory goes with it when the merge left it empty
                 Locks.closeQuietly(lock);
                 return interruptedLine(outcome, target.root().toString());
             }, parent.err())) {
            Locks.reportStale(lock, parent.err());
            run = new ShardMerger(ToolVersion.current(), ToolVersion.commit(), Clock.tickSeconds(java.time.ZoneOffset.UTC),
                    context.solvers().writesTracks(), warning -> parent.err().println("convgrid: warning: " + warning))
                    .merge(dirs, target, context.finishers(), interruption);
        } catch (MergeInterruption.Stopped e) {
            // the signal's handler has removed what the merge wrote, says so and ends the process
            return ExitCodes.INTERRUPTED;
        }
        Map<ModelStatus, Long> counts = RunFinishing.countByStatus(run.catalogue());
        parent.out().println(target.root() + ": merged " + Counts.of(dirs.size(), "shard directory",
                "shard directories") + ", " + Counts.of(run.catalogue().size(), "model") + " ("
                + RunCommand.describe(counts) + ")");
        parent.out().flush();
        if (run.grid().transitions().refine()) {
            // said on stderr even though nothing failed: without it the merged table silently holds the grid's
            // coarser brackets where a single run would hold refined ones
            parent.err().println("convgrid: the transition masses are not refined yet (shards do not refine); "
                    + "to match a single run: convgrid transitions " + RunInterruptHook.shellWord(
                    target.root().toString()) + " --refine");
            parent.err().flush();
        }
        return RunFinishing.someModelsFailed(counts) ? ExitCodes.SOME_MODELS_FAILED : ExitCodes.OK;
    }

    /** The line a signal's handler prints once the merge has stopped ({@link MergeInterruption#stop}). */
    static String interruptedLine(MergeInterruption.Outcome outcome, String dir) {
        String where = RunInterruptHook.shellWord(dir);
        return switch (outcome) {
            case NOTHING_WRITTEN -> "convgrid: merge interrupted before it wrote anything in " + where;
            case PARTIAL_REMOVED -> "convgrid: merge interrupted; what it had written in " + where + " is removed "
                    + "(the shards are untouched): merge again";
            case PARTIAL_LEFT -> "convgrid: merge interrupted; " + where + " holds a merge cut short that could not "
                    + "be removed: remove it and merge again (the shards are untouched)";
            case COMPLETE -> "convgrid: interrupted after the merge: " + where + " is complete, but its charts or "
                    + "report may be missing: convgrid plot " + where;
        };
    }
}
