package org.convgrid.plotting.tracks;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;
import org.convgrid.plotting.label.SliceLabels;

/**
 * Which evolution tracks get a zones-against-age chart: one PNG per star would grow without bound on a large grid,
 * so the charts cover a selection, a pure function of the tracks. When the grid names masses (grid key
 * {@code output: age_charts_for_masses_msun}), the tracks nearest each named mass are charted for every Z and
 * physics; otherwise up to {@link #MASSES_PER_GROUP} masses spread evenly over each (physics, Z) group's masses,
 * lowest and highest included. Either way at most {@link #MAX_CHARTS} charts, the groups thinned evenly beyond that.
 *
 * @param chosen the tracks to chart, grouped by physics then Z, masses increasing
 * @param available how many tracks the run has
 * @param namedMasses the masses the grid asked for, empty for the automatic choice
 */
public record AgeChartSelection(List<TrackedModel> chosen, int available, List<Double> namedMasses) {

    /** Masses per (physics, Z) group in the automatic choice. */
    public static final int MASSES_PER_GROUP = 6;
    /** Upper bound on the number of zones-against-age charts of one run, whatever its size. */
    public static final int MAX_CHARTS = 60;

    public AgeChartSelection {
        chosen = List.copyOf(chosen);
        namedMasses = List.copyOf(namedMasses);
    }

    /** The selection from the run's tracked models (any order) and the grid's named masses (may be empty). */
    public static AgeChartSelection of(List<TrackedModel> tracked, List<Double> namedMasses) {
        Map<String, List<TrackedModel>> groups = new LinkedHashMap<>();
        tracked.stream().sorted(Comparator.comparing((TrackedModel t) -> t.origin().physics().fileStem())
                        .thenComparingDouble(t -> t.origin().zInit()).thenComparingDouble(t -> t.origin().massMsun()))
                .forEach(t -> groups.computeIfAbsent(t.origin().physics().fileStem() + "|" + t.origin().zInit(),
                        k -> new ArrayList<>()).add(t));
        List<List<TrackedModel>> picked = new ArrayList<>();
        for (List<TrackedModel> group : groups.values()) {
            picked.add(namedMasses.isEmpty() ? spread(group, MASSES_PER_GROUP) : nearest(group, namedMasses));
        }
        int total = picked.stream().mapToInt(List::size).sum();
        List<TrackedModel> chosen = new ArrayList<>();
        if (total <= MAX_CHARTS) {
            picked.forEach(chosen::addAll);
        } else {
            // too many groups: keep fewer masses per group, then fewer groups, both spread evenly
            int perGroup = Math.max(1, MAX_CHARTS / picked.size());
            List<List<TrackedModel>> thinned = picked.stream().map(g -> spread(g, perGroup)).toList();
            int groupsKept = Math.min(thinned.size(), MAX_CHARTS / perGroup);
            spread(thinned, groupsKept).forEach(chosen::addAll);
        }
        return new AgeChartSelection(chosen, tracked.size(), namedMasses);
    }

    /** One sentence for the report: what the zones-against-age charts cover. */
    public String describe() {
        if (available == 0) {
            return "No evolution tracks in this run.";
        }
        String how = namedMasses.isEmpty()
                ? "up to " + MASSES_PER_GROUP + " masses per metallicity, spread over the grid's masses (name the "
                        + "masses with the grid key output: age_charts_for_masses_msun)"
                : "the tracks nearest the masses named by the grid key output: age_charts_for_masses_msun ("
                        + namedMasses.stream().map(SliceLabels::number).collect(Collectors.joining(", ")) + " M\u2609)";
        return chosen.size() + " of the run's " + available + " tracks are charted: " + how
                + "; at most " + MAX_CHARTS + " charts per run. Every track is in the tracks/ directory.";
    }

    /** {@code n} items spread evenly over the list, first and last included (all of them when there are few). */
    public static <T> List<T> spread(List<T> items, int n) {
        if (items.size() <= n) {
            return List.copyOf(items);
        }
        List<T> out = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            int index = n == 1 ? 0 : (int) Math.round(i * (items.size() - 1) / (double) (n - 1));
            if (out.isEmpty() || out.get(out.size() - 1) != items.get(index)) {
                out.add(items.get(index));
            }
        }
        return out;
    }

    private static List<TrackedModel> nearest(List<TrackedModel> group, List<Double> masses) {
        List<TrackedModel> out = new ArrayList<>();
        for (double m : masses) {
            group.stream().min(Comparator.comparingDouble(t -> Math.abs(Math.log(t.origin().massMsun() / m))))
                    .filter(t -> !out.contains(t)).ifPresent(out::add);
        }
        out.sort(Comparator.comparingDouble(t -> t.origin().massMsun()));
        return out;
    }
}
