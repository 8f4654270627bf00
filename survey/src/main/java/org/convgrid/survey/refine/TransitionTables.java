package org.convgrid.survey.refine;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.time.Clock;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import org.convgrid.engine.request.ModelOutcome;
import org.convgrid.grids.GridSpec;
import org.convgrid.grids.words.Counts;
import org.convgrid.output.AtomicFiles;
import org.convgrid.output.IronAbundance;
import org.convgrid.output.OutputFormatException;
import org.convgrid.output.RunLayout;
import org.convgrid.output.Span;
import org.convgrid.output.catalogue.CatalogueReader;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.manifest.RunManifest;
import org.convgrid.output.manifest.RunManifestReader;
import org.convgrid.output.manifest.RunManifestWriter;
import org.convgrid.output.transitions.MassRangeText;
import org.convgrid.output.transitions.RefinedModelIds;
import org.convgrid.output.transitions.Slice;
import org.convgrid.output.transitions.TransitionEstimate;
import org.convgrid.output.transitions.TransitionFinder;
import org.convgrid.output.transitions.TransitionReader;
import org.convgrid.output.transitions.TransitionRow;
import org.convgrid.output.transitions.TransitionWriter;
import org.convgrid.survey.CatalogueAppender;
import org.convgrid.survey.EarlierCatalogueLayout;
import org.convgrid.survey.FinishedRun;
import org.convgrid.survey.RunDirectory;
import org.convgrid.survey.RunFinisher;
import org.convgrid.survey.RunFinishing;
import org.convgrid.survey.RecordedGrid;
import org.convgrid.survey.RunSetupException;
import org.convgrid.survey.UnfinishedSlices;

/**
 * {@code convgrid transitions}: rewrites a run directory's transitions.csv from its catalogue, after appending the
 * new models of a refinement when asked. Refinement needs a finished, unsharded run (its manifest gives the grid);
 * each round's new rows are appended in one go once all its searches have ended, then the table and the manifest's
 * counts are rewritten atomically.
 */
public final class TransitionTables {

    /**
     * What was written.
     *
     * @param transitions the rows of transitions.csv
     * @param catalogue every catalogue row after the update
     * @param added models appended to the catalogue
     * @param searches bisections run
     * @param finished the directory for the finishers, null when the run has no finished manifest
     */
    public record Update(List<TransitionRow> transitions, List<CatalogueRow> catalogue, List<ModelOutcome> added,
                         int searches, FinishedRun finished) {
    }

    /**
     * Refinement rounds at most: a round's new models can reveal crossings between earlier masses (a structure that
     * flickers with mass), which the next round refines; rounds stop early once one adds no model.
     */
    public static final int MAX_ROUNDS = 4;

    private TransitionTables() {
    }

    /**
     * Recomputes transitions.csv from the catalogue as it stands (no model computed), then calls the finishers when
     * the manifest says the run finished.
     */
    public static Update recompute(RunDirectory dir, TransitionFinder finder, List<RunFinisher> finishers)
            throws IOException {
        requireCatalogue(dir);
        List<CatalogueRow> rows = CatalogueReader.read(dir.catalogue());
        double tolerance = earlierTolerance(dir);
        RunManifest manifest = Files.isRegularFile(dir.manifest())
                ? RunManifestReader.read(Files.readString(dir.manifest())) : null;
        // an unfinished run's slices that lack some of their masses say so in the file itself, not on stderr alone
        List<TransitionRow> transitions = UnfinishedSlices.marked(withNotes(finder, rows, Map.of()).stream()
                .map(t -> t.withTolerance(tolerance)).toList(), rows, manifest);
        // the Sun the run's [Fe/H] is measured against: its manifest's, the default one without a manifest
        IronAbundance iron = manifest == null ? IronAbundance.DEFAULT : manifest.ironAbundance();
        AtomicFiles.write(dir.transitions(), out -> TransitionWriter.write(transitions, iron, out));
        return finish(new Update(transitions, rows, List.of(), 0, finished(dir, manifest, rows, transitions)),
                finishers);
    }

    /**
     * Brings a catalogue an earlier version wrote to this version's layout before new rows are appended to it (as
     * {@code run --resume} and {@code merge} do): appended under the old header, the new rows had a cell more than
     * the header named (found while adding fe_h_dex). Rewritten atomically; a catalogue of another layout is refused
     * with nothing changed.
     */
    private static void currentLayout(RunDirectory dir, GridSpec grid, RunManifest manifest) throws IOException {
        String text = Files.readString(dir.catalogue());
        String upgraded = EarlierCatalogueLayout.inCurrentLayout(dir.catalogue(), text,
                grid.physics().overshootScheme(), manifest.ironAbundance(), "append the refinement's models to it");
        if (!upgraded.equals(text)) {
            AtomicFiles.writeString(dir.catalogue(), upgraded);
        }
    }

    /**
     * Refines the transitions, appends the new models to the catalogue, rewrites transitions.csv and the manifest's
     * counts, then calls the finishers. When models were added, the manifest's end moves to now: its counts include
     * them, and a run whose refinement follows the sweep ends after it (it said the sweep's end, ~20 s early in the
     * demo, beside counts of 259 models of which 169 came later).
     *
     * @param clock the time of the manifest's new end
     * @throws RunSetupException when the directory is not a finished, unsharded run (nothing changed)
     */
    public static Update refine(RunDirectory dir, TransitionFinder finder, TransitionRefiner refiner,
                                List<RunFinisher> finishers, Clock clock) throws IOException, InterruptedException {
        requireCatalogue(dir);
        if (!Files.isRegularFile(dir.manifest())) {
            throw new RunSetupException(dir.root() + " has no " + RunLayout.MANIFEST
                    + ", so the grid of its models is unknown; cannot refine");
        }
        RunManifest manifest = RunManifestReader.read(Files.readString(dir.manifest()));
        if (manifest.finished() == null) {
            throw new RunSetupException("the run in " + dir.root() + " has not finished; complete it with "
                    + "'convgrid run --resume' before refining");
        }
        if (manifest.shard() != null) {
            throw new RunSetupException(dir.root() + " holds shard " + manifest.shard() + " of a grid; merge the "
                    + "shards with 'convgrid merge' and refine the merged directory");
        }
        GridSpec grid = RecordedGrid.of(manifest);
        List<CatalogueRow> rows = CatalogueReader.read(dir.catalogue());
        List<ModelOutcome> added = new ArrayList<>();
        int searches = 0;
        Map<Slice, List<String>> notes = Map.of();
        for (int round = 0; round < MAX_ROUNDS; round++) {
            TransitionRefiner.Result result = refiner.refine(grid, rows);
            searches += result.searches();
            notes = result.notes();
            if (result.newModels().isEmpty()) {
                break;
            }
            if (round == 0) {
                currentLayout(dir, grid, manifest);
            }
            try (CatalogueAppender sink = CatalogueAppender.open(dir.catalogue(), false, manifest.ironAbundance())) {
                for (ModelOutcome o : result.newModels()) {
                    sink.accept(o);
                }
            }
            added.addAll(result.newModels());
            rows = CatalogueReader.read(dir.catalogue());
        }
        Map<Slice, List<String>> remarks = notes;
        List<TransitionRow> transitions = withNotes(finder, rows, remarks).stream()
                .map(t -> refiner.allCrossings() ? t : withWideCrossings(t, refiner.toleranceMsun()))
                .map(t -> t.withTolerance(refiner.toleranceMsun())).toList();
        AtomicFiles.write(dir.transitions(),
                out -> TransitionWriter.write(transitions, manifest.ironAbundance(), out));
        RunManifest updated = manifest.finishedAt(added.isEmpty() ? manifest.finished() : clock.instant(),
                RunFinishing.countByStatus(rows), manifest.medianSecondsPerModel());
        AtomicFiles.writeString(dir.manifest(), RunManifestWriter.toYaml(updated));
        return finish(new Update(transitions, rows, added, searches,
                new FinishedRun(dir.root(), grid, updated, rows, transitions)), finishers);
    }

    private static Update finish(Update update, List<RunFinisher> finishers) throws IOException {
        if (update.finished() != null) {
            RunFinishing.callFinishers(update.finished(), finishers);
        }
        return update;
    }

    /**
     * The table of the catalogue with the refinement's remarks, and, when the catalogue holds refinement models, a
     * remark wherever a transition lies outside the bracket the grid models alone give, or a transient window shows
     * that the grid models alone do not: the new models found crossings between grid masses that the grid had missed. Depends on the catalogue alone (plus the remarks).
     */
    static List<TransitionRow> withNotes(TransitionFinder finder, List<CatalogueRow> catalogue,
                                         Map<Slice, List<String>> notes) {
        List<TransitionRow> rows = finder.find(catalogue);
        Map<Slice, TransitionRow> before = new HashMap<>();
        if (catalogue.stream().anyMatch(r -> RefinedModelIds.isRefined(r.modelId()))) {
            finder.find(catalogue.stream().filter(r -> !RefinedModelIds.isRefined(r.modelId())).toList())
                    .forEach(r -> before.put(r.slice(), r));
        }
        List<TransitionRow> out = new ArrayList<>(rows.size());
        for (TransitionRow row : rows) {
            List<String> all = new ArrayList<>();
            if (!row.notes().isEmpty()) {
                all.add(row.notes());
            }
            all.addAll(notes.getOrDefault(row.slice(), List.of()));
            TransitionRow old = before.get(row.slice());
            if (old != null) {
                moved("fully convective limit", old.fullyConvective(), row.fullyConvective(), all);
                moved("convective core onset", old.convCoreOnset(), row.convCoreOnset(), all);
                moved("turn-off", old.turnoff(), row.turnoff(), all);
                moved("lithium depletion boundary", old.lithiumDepletion().boundary(), row.lithiumDepletion().boundary(),
                        all);
                if (old.transientCore() == null && row.transientCore() != null) {
                    // one mass when a single refinement model found the cores: "at 0.2875", not "0.2875-0.2875"
                    all.add("the window of small transient cores " + (MassRangeText.isOneMass(row.transientCore())
                            ? "at " : "") + MassRangeText.of(row.transientCore()) + " Msun lies between grid masses: "
                            + "only the refinement models found it");
                }
            }
            out.add(row.withNotes(String.join("; ", all)));
        }
        return out;
    }

    /** A row with a remark for each transition whose other crossings are still wider than the tolerance. */
    private static TransitionRow withWideCrossings(TransitionRow t, double toleranceMsun) {
        List<String> notes = new ArrayList<>();
        if (!t.notes().isEmpty()) {
            notes.add(t.notes());
        }
        wide("fully convective", t.fullyConvective(), List.of(), toleranceMsun, notes);
        wide("convective core", t.convCoreOnset(), t.transientCoreCrossings(), toleranceMsun, notes);
        wide("turn-off", t.turnoff(), List.of(), toleranceMsun, notes);
        wide("lithium depletion", t.lithiumDepletion().boundary(), List.of(), toleranceMsun, notes);
        return t.withNotes(String.join("; ", notes));
    }

    private static void wide(String what, TransitionEstimate e, List<Span> alsoRefined, double toleranceMsun,
                             List<String> notes) {
        long wide = e.crossings().stream().filter(c -> !c.equals(e.bracket()) && !alsoRefined.contains(c)
                && c.hi() - c.lo() >= toleranceMsun).count();
        if (wide > 0) {
            notes.add(what + ": " + Counts.of(wide, "other crossing") + " wider than the tolerance, not refined "
                    + "(--all-crossings refines them)");
        }
    }

    /**
     * The refinement tolerance the run's grid file asks for (transitions tolerance_msun, or its default), Msun; NaN
     * when the directory has no manifest. The width a later refinement of the run aims at unless told otherwise, so
     * that finishing an interrupted refinement or a merged run's gives what a single run of the grid gives.
     */
    public static double gridTolerance(RunDirectory dir) throws IOException {
        if (!Files.isRegularFile(dir.manifest())) {
            return Double.NaN;
        }
        RunManifest manifest = RunManifestReader.read(Files.readString(dir.manifest()));
        return RecordedGrid.of(manifest).transitions().toleranceMsun();
    }

    /**
     * The tolerance a plain recompute states for refined rows: the one the table it replaces gave (the refinement
     * that added the models), else the grid file's; NaN when neither is known.
     */
    private static double earlierTolerance(RunDirectory dir) throws IOException {
        if (Files.isRegularFile(dir.transitions())) {
            try (Reader in = Files.newBufferedReader(dir.transitions(), StandardCharsets.UTF_8)) {
                OptionalDouble stated = TransitionReader.read(in).stream().mapToDouble(TransitionRow::toleranceMsun)
                        .filter(Double::isFinite).max();
                if (stated.isPresent()) {
                    return stated.getAsDouble();
                }
            } catch (OutputFormatException e) {
                // a table of the first layout states no tolerance: fall back on the grid file's
            }
        }
        return gridTolerance(dir);
    }

    private static void moved(String what, TransitionEstimate before, TransitionEstimate after, List<String> notes) {
        if (before.found() && after.found() && (after.bracket().lo() < before.bracket().lo()
                || after.bracket().hi() > before.bracket().hi())) {
            notes.add(what + " lies outside the grid bracket " + MassRangeText.of(before.bracket())
                    + " Msun: the refinement models found a crossing between grid masses that the grid had missed");
        }
    }

    private static void requireCatalogue(RunDirectory dir) {
        new RunLayout(dir.root()).refuseEarlierFormat();
        if (!Files.isRegularFile(dir.catalogue())) {
            throw new RunSetupException(dir.root() + " is not a run directory (no " + RunLayout.CATALOGUE + ")");
        }
    }

    /** The directory for the finishers when its manifest (null: none) says the run finished; null otherwise. */
    private static FinishedRun finished(RunDirectory dir, RunManifest manifest, List<CatalogueRow> rows,
                                        List<TransitionRow> transitions) {
        if (manifest == null || manifest.finished() == null) {
            return null;
        }
        GridSpec grid = RecordedGrid.of(manifest);
        return new FinishedRun(dir.root(), grid, manifest, rows, transitions);
    }
}
