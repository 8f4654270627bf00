package org.convgrid.plotting.turnover;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.convgrid.engine.convection.StructureClass;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.track.Track;
import org.convgrid.output.transitions.RefinedModelIds;
import org.convgrid.output.transitions.TransitionRow;
import org.convgrid.plotting.label.PhysicsKey;

/** Builds the turnover-time-against-mass data of one metallicity and physics from the catalogue: a pure function. */
public final class TurnoverAgainstMass {

    private TurnoverAgainstMass() {
    }

    /**
     * The chart data of the rows of physics {@code physics} and metallicity {@code zInit}: per age, the grid models
     * with status ok and a positive local turnover time ({@code turnover_time_days}), by mass, each with its global
     * time when the catalogue has one. Left out: models of another physics or Z, any status but ok, models without a
     * convective envelope (empty time), and the transition refinement's models: they crowd within a few thousandths
     * of a solar mass of the transition masses, where the global time peaks steeply (README, definitions), and
     * joined into the grid's lines they would draw that spike as the trend. The fully convective limits come from
     * the transitions of the same slices.
     */
    public static TurnoverData build(PhysicsKey physics, double zInit, List<CatalogueRow> rows,
                                     List<TransitionRow> transitions) {
        List<CatalogueRow> gridRows = rows.stream()
                .filter(r -> PhysicsKey.of(r).equals(physics) && !RefinedModelIds.isRefined(r.modelId())).toList();
        if (eachStarItsOwnAge(gridRows.stream().filter(r -> r.zInit() == zInit).toList())) {
            return new TurnoverData(physics, zInit, List.of(), List.of(), List.of(), 0);
        }
        List<Double> ages = gridRows.stream().map(CatalogueRow::ageGyr).distinct().sorted().toList();
        List<TurnoverData.AgeLine> lines = new ArrayList<>();
        for (double age : ages) {
            List<TurnoverPoint> points = gridRows.stream()
                    .filter(r -> r.zInit() == zInit && r.ageGyr() == age && r.isOk())
                    .filter(r -> Double.isFinite(r.turnoverTimeDays()) && r.turnoverTimeDays() > 0)
                    .map(r -> new TurnoverPoint(r.modelId(), r.massMsun(), r.turnoverTimeDays(),
                            r.turnoverTimeGlobalDays(), r.structureClass() == StructureClass.FULLY_CONVECTIVE))
                    .sorted(Comparator.comparingDouble(TurnoverPoint::massMsun)).toList();
            if (!points.isEmpty()) {
                lines.add(new TurnoverData.AgeLine(age, points));
            }
        }
        List<Double> drawnAges = lines.stream().map(TurnoverData.AgeLine::ageGyr).toList();
        List<TurnoverData.FullyConvectiveLimit> limits = transitions.stream()
                .filter(t -> PhysicsKey.of(t.slice()).equals(physics) && t.slice().zInit() == zInit)
                .filter(t -> drawnAges.contains(t.slice().ageGyr()))
                .filter(t -> t.fullyConvective().found() && Double.isFinite(t.fullyConvective().massMsun()))
                .map(t -> new TurnoverData.FullyConvectiveLimit(t.slice().ageGyr(), t.fullyConvective().massMsun()))
                .sorted(Comparator.comparingDouble(TurnoverData.FullyConvectiveLimit::ageGyr)).toList();
        long pastMainSequence = gridRows.stream()
                .filter(r -> r.zInit() == zInit && r.status() == ModelStatus.PAST_MAIN_SEQUENCE).count();
        return new TurnoverData(physics, zInit, ages, lines, limits, pastMainSequence);
    }

    /**
     * Whether the grid's ages are fractions of each star's main-sequence lifetime ({@code ms_fraction}): then one age
     * of the grid (the {@code -aNN} of the model ids) is another age in Gyr for every star, and lines joining equal
     * ages would hold one star each (one unconnected dot per star and age). Such grids get
     * no turnover chart.
     */
    static boolean eachStarItsOwnAge(List<CatalogueRow> gridRows) {
        Map<String, Set<Double>> agesByIndex = new HashMap<>();
        for (CatalogueRow r : gridRows) {
            String agePart = Track.agePartOf(r.modelId());
            if (!agePart.isEmpty()) {
                agesByIndex.computeIfAbsent(agePart, k -> new HashSet<>()).add(r.ageGyr());
            }
        }
        return agesByIndex.values().stream().anyMatch(ages -> ages.size() > 1);
    }
}
