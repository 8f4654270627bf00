package org.convgrid.plotting.hr;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.TreeMap;
import java.util.function.Function;
import java.util.function.ToDoubleFunction;
import org.convgrid.output.track.TrackTimeline;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.track.TrackStep;
import org.convgrid.output.transitions.RefinedModelIds;
import org.convgrid.plotting.label.AgeGroups;
import org.convgrid.plotting.label.PhysicsKey;
import org.convgrid.plotting.tracks.TrackedModel;

/**
 * Builds HR-diagram data from catalogue rows (and evolution tracks, when the run has them) of one physics
 * combination: a pure function, no drawing. Models without a usable result (status not ok, missing L or Teff, no
 * structure class) are left out; the transition refinement's models are kept apart from the grid's, but for the
 * turn-off model of a slice it narrowed, where that slice's line ends ({@link IsochroneEnd}).
 */
public final class HrDiagram {

    /** Masses we try to label (solar masses); each gets the nearest grid mass within {@link #LABEL_TOLERANCE}. */
    static final double[] LABEL_TARGETS = {0.1, 0.2, 0.5, 1.0, 1.5, 2.0, 3.0, 5.0, 10.0, 20.0};
    /** Relative distance from a target within which a grid mass counts as "that mass". */
    static final double LABEL_TOLERANCE = 0.06;

    private HrDiagram() {
    }

    /** The diagram of the rows whose physics is {@code physics}, without tracks. */
    public static HrDiagramData build(PhysicsKey physics, List<CatalogueRow> rows) {
        return build(physics, rows, List.of());
    }

    /**
     * The diagram of the rows and tracks whose physics is {@code physics}. With tracks it also holds, per Z, one
     * isochrone per catalogue age (the usable models of that age joined in mass order, on to the turn-off model when
     * the refinement found it; an age with fewer than two such models has none); track steps without a positive L and
     * Teff are left out.
     */
    public static HrDiagramData build(PhysicsKey physics, List<CatalogueRow> rows, List<TrackedModel> tracked) {
        return build(physics, rows, tracked, id -> TrackTimeline.UNKNOWN);
    }

    /**
     * As {@link #build(PhysicsKey, List, List)}, with where each track's life stages lie. A track from birth is drawn
     * from the youngest age the catalogue has (its first steps, a few kyr old, lie far up the Hayashi line and would
     * squeeze every model into a corner), its pre-main-sequence part told apart.
     */
    public static HrDiagramData build(PhysicsKey physics, List<CatalogueRow> rows, List<TrackedModel> tracked,
                                      Function<String, TrackTimeline> timelines) {
        return build(physics, rows, tracked, timelines, AgeGroups.BY_AGE);
    }

    /**
     * As {@link #build(PhysicsKey, List, List, Function)}, its lines joining the models of equal age as
     * {@code ageGroups} groups them. Grouped by main-sequence fraction, the zero-age line of a Z joins its models of
     * the lowest fraction and there is one line per fraction with or without tracks: the grid's own lines, each star
     * at its own age (by age in Gyr they held one star each). A model whose id names no fraction is shown but on no
     * line.
     */
    public static HrDiagramData build(PhysicsKey physics, List<CatalogueRow> rows, List<TrackedModel> tracked,
                                      Function<String, TrackTimeline> timelines, AgeGroups ageGroups) {
        ToDoubleFunction<HrPoint> ageOf = p -> ageGroups.keyOf(p.modelId(), p.ageGyr());
        List<HrPoint> usable = rows.stream()
                .filter(r -> PhysicsKey.of(r).equals(physics) && r.isOk() && r.structureClass() != null
                        && r.luminosityLsun() > 0 && r.teffK() > 0)
                .map(r -> new HrPoint(r.modelId(), r.massMsun(), r.zInit(), r.ageGyr(), Math.log10(r.teffK()),
                        Math.log10(r.luminosityLsun()), r.structureClass()))
                .toList();
        // the refinement's models (the demo: 169 of 259 rows) bunch at the transition masses: lines and labels go
        // through the grid's own masses only
        List<HrPoint> points = usable.stream().filter(p -> !RefinedModelIds.isRefined(p.modelId())).toList();
        List<HrPoint> refinementPoints = usable.stream().filter(p -> RefinedModelIds.isRefined(p.modelId()))
                .toList();
        TreeMap<Double, List<HrPoint>> byZ = new TreeMap<>();
        points.stream().filter(p -> onLine(ageGroups, ageOf.applyAsDouble(p)))
                .forEach(p -> byZ.computeIfAbsent(p.zInit(), z -> new ArrayList<>()).add(p));
        // by fraction every star has an age of its own: there is no slice of one age to have a turn-off
        TurnoffModels turnoffs = new TurnoffModels(ageGroups.byFraction() ? List.of()
                : rows.stream().filter(r -> PhysicsKey.of(r).equals(physics)).toList());
        List<HrDiagramData.ZeroAgeLine> lines = new ArrayList<>();
        byZ.forEach((z, members) -> {
            double youngest = members.stream().mapToDouble(ageOf).min().orElseThrow();
            lines.add(line(z, youngest, members.stream().filter(p -> ageOf.applyAsDouble(p) == youngest).toList(),
                    turnoffs, refinementPoints));
        });
        // mass labels name grid masses only: a line that ends at a turn-off model has the refinement's mass there
        List<HrPoint> labels = lines.isEmpty() ? List.of() : massLabels(lines.get(lines.size() / 2).points().stream()
                .filter(p -> !RefinedModelIds.isRefined(p.modelId())).toList());
        List<Double> ages = points.stream().mapToDouble(ageOf).filter(a -> onLine(ageGroups, a)).boxed().distinct()
                .sorted().toList();
        // a track from birth starts at the catalogue's youngest age in Gyr, whatever the lines are keyed by
        double youngestGyr = youngestPositive(points.stream().map(HrPoint::ageGyr).toList());
        List<HrDiagramData.TrackLine> tracks = tracked.stream().filter(t -> t.origin().physics().equals(physics))
                .sorted(Comparator.comparingDouble((TrackedModel t) -> t.origin().zInit())
                        .thenComparingDouble(t -> t.origin().massMsun()))
                .map(t -> trackLine(t, timelines.apply(t.origin().trackId()), youngestGyr))
                .filter(t -> t.logL().size() >= 2).toList();
        List<HrDiagramData.ZeroAgeLine> isochrones = new ArrayList<>();
        if (!tracks.isEmpty() || ageGroups.byFraction()) {
            byZ.forEach((z, members) -> ages.forEach(age -> {
                HrDiagramData.ZeroAgeLine line = line(z, age, members.stream()
                        .filter(p -> ageOf.applyAsDouble(p) == age).toList(), turnoffs, refinementPoints);
                if (line.points().size() >= 2) {
                    isochrones.add(line);
                }
            }));
        }
        HrDiagramData drawn = new HrDiagramData(physics, List.copyOf(byZ.keySet()), ages, points, lines, labels,
                tracks, isochrones, refinementPoints, ageGroups);
        // a turn-off model a drawn line ends at is drawn as the line's end, not among the refinement's other models
        List<HrPoint> ends = drawn.turnoffModels();
        List<Double> withoutResult = rows.stream().filter(r -> PhysicsKey.of(r).equals(physics)
                        && (r.status() == ModelStatus.FAILED || r.status() == ModelStatus.NOT_CONVERGED))
                .map(CatalogueRow::massMsun).distinct().sorted().toList();
        return new HrDiagramData(physics, drawn.metallicities(), ages, points, lines, labels, tracks, isochrones,
                refinementPoints.stream().filter(p -> !ends.contains(p)).toList(), ageGroups, withoutResult);
    }

    /**
     * The line of the grid models {@code gridModels} of one Z and age, in mass order, extended to the slice's turn-off
     * model when the transition refinement found it ({@link TurnoffModels}): a turn-off up to a grid step above the
     * last grid mass on the main sequence left the line short of the end cluster researchers read first. The
     * refinement's other models stay off the line: they bunch at the fully convective limit and the core onset.
     */
    private static HrDiagramData.ZeroAgeLine line(double z, double age, List<HrPoint> gridModels,
                                                  TurnoffModels turnoffs, List<HrPoint> refinementModels) {
        // gridModels holds one age: a line of one Z and age is one slice (the age in Gyr, under BY_AGE)
        TurnoffModels.End end = gridModels.isEmpty() ? TurnoffModels.End.ALL_ON_MAIN_SEQUENCE
                : turnoffs.endOf(z, gridModels.get(0).ageGyr(), gridModels, refinementModels);
        List<HrPoint> members = new ArrayList<>(gridModels);
        end.turnoffModel().filter(m -> !members.contains(m)).ifPresent(members::add);
        members.sort(Comparator.comparingDouble(HrPoint::massMsun));
        return new HrDiagramData.ZeroAgeLine(z, age, members, end.kind());
    }

    private static HrDiagramData.TrackLine trackLine(TrackedModel t, TrackTimeline timeline, double from) {
        double start = timeline.startsAtBirth() && Double.isFinite(from) ? from : Double.NEGATIVE_INFINITY;
        List<TrackStep> steps = t.track().steps().stream().filter(TrackStep::hasSurface)
                .filter(s -> s.ageGyr() >= start).toList();
        double zams = timeline.zeroAgeMainSequenceGyr();
        int before = !timeline.startsAtBirth() ? 0 : Double.isNaN(zams) ? steps.size()
                : (int) steps.stream().filter(s -> s.ageGyr() < zams).count();
        return new HrDiagramData.TrackLine(t.origin().massMsun(), t.origin().zInit(),
                steps.stream().map(s -> Math.log10(s.teffK())).toList(),
                steps.stream().map(s -> Math.log10(s.luminosityLsun())).toList(), before);
    }

    /** Whether a model of this age joins a line: under a fraction grouping, not one whose id names no fraction. */
    private static boolean onLine(AgeGroups ageGroups, double age) {
        return !ageGroups.byFraction() || !Double.isNaN(age);
    }

    /** The youngest age above zero, Gyr; NaN when there is none. */
    private static double youngestPositive(List<Double> ages) {
        return ages.stream().mapToDouble(Double::doubleValue).filter(a -> a > 0).min().orElse(Double.NaN);
    }

    private static List<HrPoint> massLabels(List<HrPoint> line) {
        List<HrPoint> labels = new ArrayList<>();
        for (double target : LABEL_TARGETS) {
            line.stream().min(Comparator.comparingDouble(p -> Math.abs(p.massMsun() - target)))
                    .filter(p -> Math.abs(p.massMsun() - target) <= LABEL_TOLERANCE * target)
                    .filter(p -> !labels.contains(p))
                    .ifPresent(labels::add);
        }
        // a grid whose masses miss the round ones (1.2-2.4 Msun by 0.2 had the one label "2"): its line's ends too
        if (labels.size() < FEWEST_MASS_LABELS && !line.isEmpty()) {
            for (HrPoint end : List.of(line.get(0), line.get(line.size() - 1))) {
                if (!labels.contains(end)) {
                    labels.add(end);
                }
            }
            labels.sort(Comparator.comparingDouble(HrPoint::massMsun));
        }
        return labels;
    }

    /** Fewer round-mass labels than this, and the zero-age line's lowest and highest masses are labelled too. */
    static final int FEWEST_MASS_LABELS = 3;
}
