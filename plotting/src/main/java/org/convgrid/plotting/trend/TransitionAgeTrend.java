package org.convgrid.plotting.trend;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.function.Function;
import org.convgrid.output.transitions.TransitionEstimate;
import org.convgrid.output.transitions.TransitionMethod;
import org.convgrid.output.transitions.TransitionFinder;
import org.convgrid.plotting.label.SliceLabels;
import org.convgrid.output.transitions.TransitionRow;
import org.convgrid.plotting.label.MetallicityNames;
import org.convgrid.plotting.label.PhysicsKey;
import org.convgrid.plotting.zones.TransitionMarker;

/** Builds the transition-mass-against-age data from transitions.csv rows of one physics: a pure function. */
public final class TransitionAgeTrend {

    private TransitionAgeTrend() {
    }

    /**
     * The chart data of the rows whose physics is {@code physics}: per transition, Z and method the found masses in
     * age order, fully convective limit, then core onset, then main-sequence turn-off, then lithium depletion
     * boundary (unbracketed transitions are left out, so a series may have gaps in age; refined and grid values make
     * separate series, never one line), and every transient core window.
     */
    public static TransitionAgeTrendData build(PhysicsKey physics, List<TransitionRow> rows) {
        return build(physics, rows, MetallicityNames.Z_ONLY);
    }

    /** As {@link #build(PhysicsKey, List)}, its notes naming each metallicity as {@code names} name it. */
    public static TransitionAgeTrendData build(PhysicsKey physics, List<TransitionRow> rows, MetallicityNames names) {
        List<TransitionRow> mine = rows.stream().filter(r -> PhysicsKey.of(r.slice()).equals(physics)).toList();
        List<Double> zs = mine.stream().map(r -> r.slice().zInit()).distinct().sorted().toList();
        List<TransitionAgeTrendData.Series> series = new ArrayList<>();
        addAll(series, TransitionMarker.Kind.FULLY_CONVECTIVE_LIMIT, TransitionRow::fullyConvective, mine, zs);
        addAll(series, TransitionMarker.Kind.CONV_CORE_ONSET, TransitionRow::convCoreOnset, mine, zs);
        addAll(series, TransitionMarker.Kind.MAIN_SEQUENCE_TURNOFF, TransitionRow::turnoff, mine, zs);
        addAll(series, TransitionMarker.Kind.LITHIUM_DEPLETION_BOUNDARY, r -> r.lithiumDepletion().boundary(), mine,
                zs);
        List<Double> ages = mine.stream().map(r -> r.slice().ageGyr()).distinct().sorted().toList();
        List<TransientWindow> windows = mine.stream().flatMap(r -> TransientWindow.allOf(r).stream()).toList();
        List<String> caveats = new ArrayList<>(coolCoreCaveats(mine, names));
        caveats.addAll(lithiumBelowGridCaveats(mine, series, names));
        return new TransitionAgeTrendData(physics, ages, zs, series, windows, caveats);
    }

    /**
     * One sentence naming the core onsets above which the lowest cored stars burn too cool for the CNO cycle
     * ({@link TransitionFinder#notesCoolCores}): the chart's "core in every star above" line dips there (the demo at
     * 150 Myr: 0.381 and 0.420 Msun against ~1.1 at the other ages), and a reader takes the dip for CNO cores.
     */
    /** How the cool-core caveat starts, before its masses. */
    static final String CAVEAT_START = "Core in every star above (M\u2609) ";

    static List<String> coolCoreCaveats(List<TransitionRow> rows, MetallicityNames names) {
        List<String> at = rows.stream().filter(r -> r.convCoreOnset().found())
                .filter(r -> TransitionFinder.notesCoolCores(r.notes()))
                .sorted(Comparator.comparingDouble((TransitionRow r) -> r.slice().ageGyr())
                        .thenComparingDouble(r -> r.slice().zInit()))
                .map(r -> String.format(java.util.Locale.ROOT, "%.3f (%s, %s)", r.convCoreOnset().massMsun(),
                        names.of(r.slice().zInit()), SliceLabels.age(r.slice().ageGyr())))
                .toList();
        if (at.isEmpty()) {
            return List.of();
        }
        // the masses first and their unit beside them: "Cores from 1.027 (Z = 0.008, 20 Myr), ... Msun up:" put the
        // unit a line or more after the first mass
        return List.of(CAVEAT_START + String.join(", ", at) + ": the lowest of these cores burn where the CNO "
                + "cycle gives under " + TransitionFinder.COOL_CORE_SHARE_WORDS + " of the energy, "
                + TransitionFinder.COOL_CORES_WORDS
                + ": " + TransitionFinder.COOL_CORES_CAUSE + "; see the notes of transitions.csv.");
    }

    /**
     * One sentence naming the ages at which the lithium depletion boundary lies below the grid's lowest mass (every
     * star has burnt its lithium), where the chart's boundary line stops; only when the chart draws a boundary
     * somewhere, each age once when every metallicity has it there, else per metallicity.
     */
    static List<String> lithiumBelowGridCaveats(List<TransitionRow> rows, List<TransitionAgeTrendData.Series> drawn,
                                                MetallicityNames names) {
        if (drawn.stream().noneMatch(s -> s.kind() == TransitionMarker.Kind.LITHIUM_DEPLETION_BOUNDARY)) {
            return List.of();
        }
        java.util.Map<Double, List<Double>> agesByZ = new java.util.TreeMap<>();
        rows.stream().filter(r -> TransitionFinder.notesLithiumBelowGrid(r.notes()))
                .sorted(Comparator.comparingDouble((TransitionRow r) -> r.slice().ageGyr()))
                .forEach(r -> agesByZ.computeIfAbsent(r.slice().zInit(), z -> new ArrayList<>()).add(r.slice().ageGyr()));
        if (agesByZ.isEmpty()) {
            return List.of();
        }
        long zs = rows.stream().map(r -> r.slice().zInit()).distinct().count();
        boolean same = agesByZ.size() == zs && agesByZ.values().stream().distinct().count() == 1;
        String where = same ? ages(agesByZ.values().iterator().next())
                : String.join("; ", agesByZ.entrySet().stream().map(e -> ages(e.getValue()) + " ("
                + names.of(e.getKey()) + ")").toList());
        return List.of("Lithium depletion boundary below the lowest mass at " + where + ": every star there has burnt "
                + "99 % of its lithium.");
    }

    private static String ages(List<Double> agesGyr) {
        return String.join(", ", agesGyr.stream().map(SliceLabels::age).toList());
    }

    private static void addAll(List<TransitionAgeTrendData.Series> out, TransitionMarker.Kind kind,
                               Function<TransitionRow, TransitionEstimate> which, List<TransitionRow> rows,
                               List<Double> zs) {
        for (double z : zs) {
            for (TransitionMethod method : TransitionMethod.values()) {
                List<AgePoint> points = rows.stream().filter(r -> r.slice().zInit() == z && r.method() == method)
                        .filter(r -> which.apply(r).found() && Double.isFinite(which.apply(r).massMsun()))
                        .map(r -> new AgePoint(r.slice().ageGyr(), which.apply(r).massMsun(),
                                which.apply(r).bracket(), r.toleranceMsun()))
                        .sorted(Comparator.comparingDouble(AgePoint::ageGyr)).toList();
                if (!points.isEmpty()) {
                    out.add(new TransitionAgeTrendData.Series(kind, z, method, points));
                }
            }
        }
    }
}
