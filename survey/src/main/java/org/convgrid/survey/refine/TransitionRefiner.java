package org.convgrid.survey.refine;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.DoubleFunction;
import java.util.function.Function;
import org.convgrid.engine.batch.ProgressListener;
import org.convgrid.engine.request.ModelOutcome;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.refine.BracketSide;
import org.convgrid.engine.refine.MassBisection;
import org.convgrid.engine.refine.MassLine;
import org.convgrid.engine.refine.MassLineFactory;
import org.convgrid.engine.refine.Refinement;
import org.convgrid.engine.units.Constants;
import org.convgrid.grids.GridSpec;
import org.convgrid.output.CsvNumbers;
import org.convgrid.output.Span;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.catalogue.OutcomeRows;
import org.convgrid.output.transitions.RefinedModelIds;
import org.convgrid.output.transitions.Slice;
import org.convgrid.output.transitions.TransitionEstimate;
import org.convgrid.output.transitions.TransitionFinder;
import org.convgrid.output.transitions.TransitionRow;
import org.convgrid.survey.RunSetupException;
import org.convgrid.survey.parallel.ParallelWork;
import org.convgrid.grids.words.MessageNumbers;

/**
 * Narrows the brackets of a catalogue's transitions by bisection with new models ({@link MassBisection}), at every
 * (Z, age, physics) slice. Each new model is the slice's own grid request (composition, physics and its
 * {@link org.convgrid.engine.request.Age}, whatever its origin) at a new mass, so at ages above zero it is evolved as
 * a grid model of that mass would be. One search per (slice, transition crossing) still wider than the tolerance, each
 * on its own fresh {@link MassLine} (so it depends on nothing but its slice and bracket; two searches of the same
 * bracket share one); all searches of every slice run at once on the command's {@link ParallelWork} (the one grid runs
 * use), no slice waiting for another, and are gathered in slice order, fully convective limit first, so the result is
 * the same for any thread count. By default the crossings the table reports are refined: the fully convective limit
 * (the highest crossing out of full convection), the mass above which every star has a convective core, the two
 * crossings that bound the transient window of small cores and the main-sequence turn-off (its side read off the
 * status: a new model whose central hydrogen runs out before the slice's age comes back past the main sequence, the
 * high side); on request every crossing of a slice whose structure flickers with mass.
 * Midpoints are rounded to masses the catalogue writes exactly, so a catalogue row's mass is the mass computed.
 */
public final class TransitionRefiner {

    /**
     * Why a grid of main-sequence fractions is never refined, for the commands that say so: a fraction is an age of
     * each star's own, so a new mass would sit at an age of its own, off its slice (with origin zams every fraction-0
     * slice holds all the masses, and refining it broke the catalogue's slices).
     */
    public static final String FRACTION_AGES_NOT_REFINED = "ms_fraction ages are not refined: a fraction is an age "
            + "of each star's own, so a new mass would not sit at its slice's age";

    /**
     * The new models, ready to append, and what the table should say about each slice.
     *
     * @param newModels every new model, in slice order then increasing mass, with its final refinement id
     * @param notes remarks per slice (bisections that stopped early), in slice order
     * @param searches bisections run
     */
    public record Result(List<ModelOutcome> newModels, Map<Slice, List<String>> notes, int searches) {
    }

    private enum Kind {
        FULLY_CONVECTIVE("fully convective"), CONV_CORE("convective core"), TURNOFF("turn-off"),
        LITHIUM_DEPLETION("lithium depletion");

        final String label;

        Kind(String label) {
            this.label = label;
        }
    }

    /**
     * One bisection; {@code lowState} is the kind's state (fully convective, has a core, on the main sequence, keeps
     * its lithium) below
     * the crossing;
     * {@code failed} the slice's catalogue rows that are not usable, by mass in g.
     */
    private record Search(Slice slice, Kind kind, Span bracket, boolean lowState, ModelRequest template,
                          Map<Double, CatalogueRow> failed) {
    }

    private final MassLineFactory lines;
    private final TransitionFinder finder;
    private final MassBisection bisection;
    private final ParallelWork work;
    private final boolean allCrossings;
    private final RefinementProgress progress;

    /**
     * @param lines opens the line of each search
     * @param finder decides each model's side of a transition (its core threshold)
     * @param toleranceMsun the refined brackets must be narrower than this, solar masses
     * @param work the command's worker threads, on which the searches run
     * @param allCrossings refine every crossing of a slice that flickers, not only the one the table reports
     */
    public TransitionRefiner(MassLineFactory lines, TransitionFinder finder, double toleranceMsun, ParallelWork work,
                             boolean allCrossings) {
        this(lines, finder, toleranceMsun, work, allCrossings, new RefinementProgress(ProgressListener.NONE));
    }

    /**
     * As {@link #TransitionRefiner(MassLineFactory, TransitionFinder, double, ParallelWork, boolean)}, telling
     * {@code progress} of each new model as it is computed.
     */
    public TransitionRefiner(MassLineFactory lines, TransitionFinder finder, double toleranceMsun, ParallelWork work,
                             boolean allCrossings, RefinementProgress progress) {
        this.lines = lines;
        this.finder = finder;
        this.bisection = new MassBisection(toleranceMsun * Constants.M_SUN, TransitionRefiner::catalogueMass);
        this.work = work;
        this.allCrossings = allCrossings;
        this.progress = progress;
    }

    /** The tolerance, solar masses. */
    public double toleranceMsun() {
        return bisection.tolerance() / Constants.M_SUN;
    }

    /** Whether every crossing is refined, not only the reported one. */
    public boolean allCrossings() {
        return allCrossings;
    }

    /**
     * @param grid the grid of the run: each slice's request, found by a grid model id of the slice
     * @param catalogue every row of the run's catalogue, grid and earlier refinement rows alike
     */
    public Result refine(GridSpec grid, List<CatalogueRow> catalogue) throws InterruptedException {
        Map<Slice, List<CatalogueRow>> members = new LinkedHashMap<>();
        catalogue.forEach(r -> members.computeIfAbsent(Slice.of(r), s -> new ArrayList<>()).add(r));
        Map<Slice, List<String>> notes = new LinkedHashMap<>();
        List<Search> searches = new ArrayList<>();
        for (TransitionRow row : finder.find(catalogue)) {
            Slice slice = row.slice();
            notes.put(slice, new ArrayList<>());
            CatalogueRow gridRow = members.get(slice).stream().filter(r -> !RefinedModelIds.isRefined(r.modelId()))
                    .findFirst().orElseThrow(() -> new RunSetupException("slice at Z = "
                            + MessageNumbers.format(slice.zInit())
                            + " has no grid model; the catalogue was edited"));
            ModelRequest template = ModelIds.gridRequest(grid, gridRow.modelId());
            if (template.age() instanceof org.convgrid.engine.request.Age.MainSequenceFraction) {
                // FRACTION_AGES_NOT_REFINED
                continue;
            }
            Map<Double, CatalogueRow> failed = new HashMap<>();
            members.get(slice).stream().filter(r -> !r.isOk() || r.structureClass() == null)
                    .forEach(r -> failed.put(r.massMsun() * Constants.M_SUN, r));
            for (Kind kind : Kind.values()) {
                TransitionEstimate e = switch (kind) {
                    case FULLY_CONVECTIVE -> row.fullyConvective();
                    case CONV_CORE -> row.convCoreOnset();
                    case TURNOFF -> row.turnoff();
                    case LITHIUM_DEPLETION -> row.lithiumDepletion().boundary();
                };
                for (Span span : allCrossings ? e.crossings() : reported(kind, e, row)) {
                    if (span.hi() - span.lo() >= bisection.tolerance() / Constants.M_SUN) {
                        // the turn-off's ends are told apart by status alone; the others need a structure
                        CatalogueRow below = members.get(slice).stream().filter(r -> r.massMsun() == span.lo()
                                && (kind == Kind.TURNOFF || r.isOk() && r.structureClass() != null)).findFirst()
                                .orElseThrow();
                        searches.add(new Search(slice, kind, span, inState(kind, below), template, failed));
                    }
                }
            }
        }
        List<Search> flat = tasks(searches).stream().flatMap(List::stream).toList();
        List<Refinement> done = runAll(tasks(searches)).stream().flatMap(List::stream).toList();
        Map<Slice, Map<Double, ModelOutcome>> added = new LinkedHashMap<>();
        for (int i = 0; i < flat.size(); i++) {
            Search s = flat.get(i);
            Map<Double, ModelOutcome> byMass = added.computeIfAbsent(s.slice(), k -> new LinkedHashMap<>());
            // two searches of one bracket share their line: the second one's models repeat the first one's
            done.get(i).newModels().forEach(o -> byMass.putIfAbsent(o.request().mass(), o));
            RefinementRemarks.describe(s.kind().label, done.get(i), notes.get(s.slice()));
        }
        return new Result(named(added, members), notes, searches.size());
    }

    /**
     * The crossings the table reports of the transition {@code estimate} of kind {@code kind}: its bracket, or, for the
     * core, the two crossings that bound the transient window and the mass above which every star has a core, in mass
     * order without repeats.
     */
    private static List<Span> reported(Kind kind, TransitionEstimate estimate, TransitionRow row) {
        if (kind != Kind.CONV_CORE) {
            return estimate.found() ? List.of(estimate.bracket()) : List.of();
        }
        List<Span> spans = new ArrayList<>(row.transientCoreCrossings());
        if (estimate.found() && !spans.contains(estimate.bracket())) {
            spans.add(estimate.bracket());
        }
        return spans;
    }

    /**
     * Searches grouped by line: both transitions of a slice share one line when their grid brackets coincide (a
     * star that leaves full convection straight into a convective core), so the second search reuses the first
     * one's converged models instead of computing them again.
     */
    private static List<List<Search>> tasks(List<Search> searches) {
        Map<List<Object>, List<Search>> byBracket = new LinkedHashMap<>();
        searches.forEach(s -> byBracket.computeIfAbsent(List.of(s.slice(), s.bracket()), k -> new ArrayList<>())
                .add(s));
        return List.copyOf(byBracket.values());
    }

    private List<List<Refinement>> runAll(List<List<Search>> tasks) throws InterruptedException {
        return work.mapInOrder(tasks, this::run);
    }

    /** The searches of one task, in order, on one fresh line. */
    private List<Refinement> run(List<Search> task) {
        Search first = task.get(0);
        ModelRequest t = first.template();
        MassLine line = skippingKnownFailures(counting(lines.open(t.physics(), t.initialMetals(), t.initialHelium()),
                first.bracket()), first.failed());
        List<Refinement> done = new ArrayList<>(task.size());
        for (Search s : task) {
            Function<ModelOutcome, BracketSide> sideOf = o -> side(s, o);
            DoubleFunction<ModelRequest> at = mass -> new ModelRequest("pending", mass, t.initialMetals(),
                    t.initialHelium(), t.age(), t.physics());
            double lo = s.bracket().lo() * Constants.M_SUN;
            double hi = s.bracket().hi() * Constants.M_SUN;
            // zero-age lines seed each model from the recomputed ends; a model at an age (every turn-off's) is evolved
            // on its own, so recomputing the ends the catalogue already holds would only double the cost of a search
            done.add(t.age().isZeroAge() ? bisection.refineBySide(line, at, lo, hi, sideOf)
                    : bisection.refineWithinKnownEndsBySide(line, at, lo, hi, sideOf));
        }
        return done;
    }

    /**
     * The side of a new model in search {@code s}: the turn-off's by the status alone (ok is on the main sequence,
     * {@code past_main_sequence} past it, any other status stops the search), the other kinds' by the solved model's
     * structure or surface lithium (an unsolved model stops the search).
     */
    private BracketSide side(Search s, ModelOutcome o) {
        if (s.kind() == Kind.TURNOFF) {
            return switch (o.status()) {
                case OK -> sideOf(true, s);
                case PAST_MAIN_SEQUENCE -> sideOf(false, s);
                case FAILED, NOT_CONVERGED -> BracketSide.UNUSABLE;
            };
        }
        if (!(o instanceof ModelOutcome.Solved solved)) {
            return BracketSide.UNUSABLE;
        }
        CatalogueRow row = OutcomeRows.toRow(solved);
        // a model without a lithium value cannot say which side of the lithium depletion boundary it lies on
        return s.kind() == Kind.LITHIUM_DEPLETION && !TransitionFinder.followsLithium(row) ? BracketSide.UNUSABLE
                : sideOf(inState(s.kind(), row), s);
    }

    /** The low side when a model is in the state the search's bracket has below its crossing, else the high side. */
    private static BracketSide sideOf(boolean inState, Search s) {
        return inState == s.lowState() ? BracketSide.LOW : BracketSide.HIGH;
    }

    /**
     * A line that tells the progress of each new mass it computes: not the bracket's ends (recomputed at zero age to
     * seed the midpoints, already in the catalogue) nor a mass a search sharing the line asks again (the catalogue
     * gets it once), so the count ends at the new models the run reports.
     */
    private MassLine counting(MassLine line, Span bracket) {
        Set<Double> counted = new HashSet<>();
        return request -> {
            ModelOutcome outcome = line.solve(request);
            // the ends in g as run() asks for them
            boolean end = request.mass() == bracket.lo() * Constants.M_SUN
                    || request.mass() == bracket.hi() * Constants.M_SUN;
            if (!end && counted.add(request.mass())) {
                progress.modelDone();
            }
            return outcome;
        };
    }

    /**
     * A model an earlier refinement found unusable is answered from the catalogue instead of being computed and
     * appended again, so refining a run twice stops where the first refinement stopped.
     */
    private static MassLine skippingKnownFailures(MassLine line, Map<Double, CatalogueRow> failed) {
        return request -> {
            CatalogueRow known = failed.get(request.mass());
            return known == null ? line.solve(request)
                    : new ModelOutcome.Failed(request, known.status(), known.statusDetail(),
                            ModelOutcome.NO_MODEL_SOLVED);
        };
    }

    private boolean inState(Kind kind, CatalogueRow row) {
        return switch (kind) {
            case FULLY_CONVECTIVE -> TransitionFinder.isFullyConvective(row);
            case CONV_CORE -> finder.hasConvectiveCore(row);
            case TURNOFF -> row.isOk();
            case LITHIUM_DEPLETION -> TransitionFinder.keepsLithium(row);
        };
    }

    /** The new models of each slice by mass, numbered after the slice's highest refinement counter. */
    private static List<ModelOutcome> named(Map<Slice, Map<Double, ModelOutcome>> added,
                                            Map<Slice, List<CatalogueRow>> members) {
        List<ModelOutcome> all = new ArrayList<>();
        added.forEach((slice, outcomes) -> {
            List<CatalogueRow> rows = members.get(slice);
            String gridId = rows.stream().map(CatalogueRow::modelId).filter(id -> !RefinedModelIds.isRefined(id))
                    .findFirst().orElseThrow();
            int next = 1 + rows.stream().mapToInt(r -> RefinedModelIds.counter(r.modelId())).max().orElse(-1);
            List<ModelOutcome> byMass = new ArrayList<>(outcomes.values());
            byMass.sort(Comparator.comparingDouble(o -> o.request().mass()));
            for (ModelOutcome o : byMass) {
                ModelRequest r = o.request();
                if (rows.stream().anyMatch(row -> row.massMsun() * Constants.M_SUN == r.mass())) {
                    continue;
                }
                all.add(o.withRequest(r.withModelId(RefinedModelIds.of(gridId, next++))));
            }
        });
        return all;
    }

    /** The mass (g) nearest to {@code mass} whose catalogue text reads back exactly. */
    static double catalogueMass(double mass) {
        return CsvNumbers.parse(CsvNumbers.format(mass / Constants.M_SUN)) * Constants.M_SUN;
    }
}
