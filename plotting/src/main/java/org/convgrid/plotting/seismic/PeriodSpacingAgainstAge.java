package org.convgrid.plotting.seismic;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.function.Function;
import org.convgrid.output.track.TrackStep;
import org.convgrid.output.track.TrackTimeline;
import org.convgrid.plotting.label.PhysicsKey;
import org.convgrid.plotting.tracks.AgeChartSelection;
import org.convgrid.plotting.tracks.TrackedModel;

/**
 * Builds the period-spacing chart of one metallicity and physics from the run's tracks: every track with a dipole
 * period spacing (a g-mode cavity, so a radiative region) at two steps or more, up to {@link #MAX_LINES} of them
 * spread over the masses.
 *
 * <p>The drawn range stops at {@link #CAP_OVER_MAIN_SEQUENCE} times the largest main-sequence spacing (or, when no
 * track reaches the main sequence, the largest last spacing): a radiative core that has just formed on the pre-main
 * sequence is a narrow cavity, and its spacing falls from ~1e6 s to a few 1e3 s within a few Myr (demo, 1.8 Msun at
 * Z = 0.02: 4.1e6 s at 0.5 Myr, 3.5e3 s at 16 Myr); drawn, that fall would squeeze the main sequence's few per cent
 * of change into a sliver. The chart says how many steps it leaves out.
 */
public final class PeriodSpacingAgainstAge {

    /** Lines on one chart at most: the palette's colours for a family of series, which repeat after seven. */
    public static final int MAX_LINES = 7;
    /** The drawn range's top over the largest main-sequence spacing. */
    static final double CAP_OVER_MAIN_SEQUENCE = 1.3;
    private static final String PRE_MAIN_SEQUENCE = "pre_main_sequence";

    private PeriodSpacingAgainstAge() {
    }

    /**
     * The chart's data for metallicity {@code zInit} and {@code physics} from the run's tracked models (any order);
     * {@code timeline} gives each track's life stages by id.
     */
    public static PeriodSpacingData build(PhysicsKey physics, double zInit, List<TrackedModel> tracked,
                                          Function<String, TrackTimeline> timeline) {
        List<TrackedModel> withSpacing = tracked.stream()
                .filter(t -> t.origin().physics().equals(physics) && t.origin().zInit() == zInit)
                .filter(t -> t.track().steps().stream().filter(PeriodSpacingAgainstAge::drawable).count() >= 2)
                .sorted(Comparator.comparingDouble(t -> t.origin().massMsun()))
                .toList();
        boolean fromBirth = withSpacing.stream().anyMatch(t -> timeline.apply(t.origin().trackId()).startsAtBirth());
        List<TrackedModel> chosen = AgeChartSelection.spread(withSpacing, MAX_LINES);
        double cap = CAP_OVER_MAIN_SEQUENCE * reference(chosen);
        List<SpacingLine> lines = new ArrayList<>();
        int above = 0;
        for (TrackedModel t : chosen) {
            List<SpacingPoint> points = new ArrayList<>();
            for (TrackStep s : t.track().steps()) {
                if (!drawable(s)) {
                    continue;
                }
                if (s.periodSpacingL1S() > cap) {
                    above++;
                    continue;
                }
                points.add(new SpacingPoint(s.ageGyr(), s.periodSpacingL1S(), PRE_MAIN_SEQUENCE.equals(s.phase())));
            }
            if (points.size() >= 2) {
                lines.add(new SpacingLine(t.origin().massMsun(), points));
            }
        }
        return new PeriodSpacingData(zInit, physics, fromBirth, lines, cap, above, withSpacing.size());
    }

    /**
     * The spacing the range is scaled to: the largest on the main sequence, else the largest last spacing of a
     * track; NaN when there is none.
     */
    private static double reference(List<TrackedModel> tracks) {
        double mainSequence = tracks.stream().flatMap(t -> t.track().steps().stream())
                .filter(s -> !PRE_MAIN_SEQUENCE.equals(s.phase()) && drawable(s))
                .mapToDouble(TrackStep::periodSpacingL1S).max().orElse(Double.NaN);
        if (!Double.isNaN(mainSequence)) {
            return mainSequence;
        }
        return tracks.stream().mapToDouble(t -> t.track().steps().stream()
                        .filter(PeriodSpacingAgainstAge::drawable).reduce((a, b) -> b)
                        .map(TrackStep::periodSpacingL1S).orElse(Double.NaN))
                .filter(Double::isFinite).max().orElse(Double.NaN);
    }

    /** Whether a step has a spacing the logarithmic axis can show: finite and above zero. */
    private static boolean drawable(TrackStep s) {
        return Double.isFinite(s.periodSpacingL1S()) && s.periodSpacingL1S() > 0;
    }
}
