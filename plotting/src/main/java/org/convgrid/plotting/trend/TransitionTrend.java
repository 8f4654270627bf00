package org.convgrid.plotting.trend;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.function.Function;
import org.convgrid.output.transitions.TransitionEstimate;
import org.convgrid.output.transitions.TransitionMethod;
import org.convgrid.output.transitions.TransitionRow;
import org.convgrid.plotting.label.MetallicityNames;
import org.convgrid.plotting.label.PhysicsKey;
import org.convgrid.plotting.zones.TransitionMarker;

/** Builds the transition-mass-against-Z data from transitions.csv rows of one physics: a pure function. */
public final class TransitionTrend {

    private TransitionTrend() {
    }

    /**
     * The chart data of the rows whose physics is {@code physics}: the fully convective limit, the mass above which
     * every star has a core, the main-sequence turn-off and the lithium depletion boundary; unbracketed transitions
     * are left out; refined and grid values make separate series, never one line; every transient core window.
     */
    public static TransitionTrendData build(PhysicsKey physics, List<TransitionRow> rows) {
        return build(physics, rows, MetallicityNames.Z_ONLY);
    }

    /** As {@link #build(PhysicsKey, List)}, its notes naming each metallicity as {@code names} name it. */
    public static TransitionTrendData build(PhysicsKey physics, List<TransitionRow> rows, MetallicityNames names) {
        List<TransitionRow> mine = rows.stream().filter(r -> PhysicsKey.of(r.slice()).equals(physics)).toList();
        List<Double> ages = mine.stream().map(r -> r.slice().ageGyr()).distinct().sorted().toList();
        List<TransitionTrendData.Series> series = new ArrayList<>();
        addAll(series, TransitionMarker.Kind.FULLY_CONVECTIVE_LIMIT, TransitionRow::fullyConvective, mine, ages);
        addAll(series, TransitionMarker.Kind.CONV_CORE_ONSET, TransitionRow::convCoreOnset, mine, ages);
        addAll(series, TransitionMarker.Kind.MAIN_SEQUENCE_TURNOFF, TransitionRow::turnoff, mine, ages);
        addAll(series, TransitionMarker.Kind.LITHIUM_DEPLETION_BOUNDARY, r -> r.lithiumDepletion().boundary(), mine,
                ages);
        List<Double> zs = mine.stream().map(r -> r.slice().zInit()).distinct().sorted().toList();
        List<TransientWindow> windows = mine.stream().flatMap(r -> TransientWindow.allOf(r).stream()).toList();
        return new TransitionTrendData(physics, zs, series, windows, TransitionAgeTrend.coolCoreCaveats(mine, names));
    }

    private static void addAll(List<TransitionTrendData.Series> out, TransitionMarker.Kind kind,
                               Function<TransitionRow, TransitionEstimate> which, List<TransitionRow> rows,
                               List<Double> ages) {
        for (double age : ages) {
            for (TransitionMethod method : TransitionMethod.values()) {
                List<TrendPoint> points = rows.stream().filter(r -> r.slice().ageGyr() == age && r.method() == method)
                        .filter(r -> which.apply(r).found() && Double.isFinite(which.apply(r).massMsun()))
                        .map(r -> new TrendPoint(r.slice().zInit(), which.apply(r).massMsun(),
                                which.apply(r).bracket(), r.toleranceMsun()))
                        .sorted(Comparator.comparingDouble(TrendPoint::zInit)).toList();
                if (!points.isEmpty()) {
                    out.add(new TransitionTrendData.Series(kind, age, method, points));
                }
            }
        }
    }
}
