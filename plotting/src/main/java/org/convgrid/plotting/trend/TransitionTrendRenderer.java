package org.convgrid.plotting.trend;

import java.util.List;
import org.convgrid.output.transitions.TransitionMethod;
import org.convgrid.plotting.label.MetallicityNames;
import org.convgrid.plotting.label.SliceLabels;
import org.convgrid.plotting.style.ChartNotes;
import org.convgrid.plotting.style.ChartStyle;
import org.convgrid.plotting.style.LogAxis;
import org.convgrid.plotting.style.StyledChart;
import org.convgrid.plotting.zones.TransitionMarker;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Turns {@link TransitionTrendData} into a chart: Z on a log axis labelled at the run's metallicities, transition
 * mass up (a linear Z axis when the run holds Z = 0); each series' brackets drawn as a shaded band (the reported
 * mass is one end of its bracket, so the band shows where the transition lies). Refined and grid values are
 * separate series, never joined; grid markers are paler. Each transient window of small cores is a faint dashed
 * box with a square at its middle. With few ages every marker carries its mass, rounded to the stated accuracy (the
 * refinement's tolerance, else the bracket), clear of every marker, line and box. Series of different ages are
 * nudged sideways by a few hundredths of a dex so that their markers do not hide each other, and a note under the
 * legend says so; the data keep the true Z. When the grid gave its compositions as [Fe/H] ({@link MetallicityNames}
 * names every metallicity by its [Fe/H]), x is [Fe/H] instead, in dex on a linear axis labelled at the run's values
 * (the tables' {@code fe_h_dex}), nudged by the same few hundredths of a dex: an old-population grid, asked
 * for [Fe/H] = -2, -1, 0, had to read 0.0001843, 0.001833 and 0.01738 off a Z axis.
 */
public final class TransitionTrendRenderer {

    /** Sideways nudge between ages, dex of Z. */
    private static final double DODGE_DEX = 0.03;
    /**
     * The widest the nudges of all ages may spread one metallicity's markers, dex: within the room the axis leaves
     * either side ({@link #Z_PAD}, 0.097 dex). A young cluster's grid with one Z and ten ages, nudged 0.03 dex apart,
     * spread them over 0.27 dex: its youngest and oldest markers fell outside the plot, and a transient window of the
     * oldest age was drawn over the legend.
     */
    private static final double MAX_SPREAD_DEX = 0.15;
    /** Room either side of a linear Z range (one holding Z = 0), as a share of it. */
    private static final double LINEAR_PAD_SHARE = 0.06;
    /** Grid (unrefined) markers are paler than refined ones, so the two read apart. */
    private static final double GRID_MARKER_TINT = 0.5;
    /** Transient windows' middle markers are lighter than the series colour. */
    private static final double WINDOW_MARKER_TINT = 0.35;
    /** Room either side of the Z range, as a factor. */
    private static final double Z_PAD = 1.25;
    /** Room either side of an [Fe/H] range, dex: log10 of {@link #Z_PAD}, so both axes leave the same room. */
    private static final double IRON_PAD_DEX = Math.log10(Z_PAD);
    /** The x-axis title of a grid given in [Fe/H]. */
    static final String IRON_AXIS_TITLE = "initial [Fe/H] (dex)";
    /** The x-axis title of a grid given in Z. */
    static final String Z_AXIS_TITLE = "initial metal mass fraction Z";

    private TransitionTrendRenderer() {
    }

    /** The chart of a transition trend, its metallicities named by Z. */
    public static StyledChart render(TransitionTrendData data) {
        return render(data, MetallicityNames.Z_ONLY);
    }

    /** The chart of a transition trend, its metallicities named in the title as {@code names} name them. */
    public static StyledChart render(TransitionTrendData data, MetallicityNames names) {
        Placement at = placement(data, names);
        List<Double> ages = at.ages();
        MethodNote method = methodNote(data);
        StyledChart chart = ChartStyle.newChart("Transition masses, "
                + names.values(data.metallicities()) + ", " + SliceLabels.ages(ages),
                method.subtitle(data.physics().describe()), at.inIron() ? IRON_AXIS_TITLE : Z_AXIS_TITLE,
                "transition mass M / M\u2609");
        ChartStyle.legendRight(chart);
        List<String> notes = new java.util.ArrayList<>(data.caveats());
        String nudge = nudgeNote(data, at.inIron());
        if (!nudge.isEmpty()) {
            notes.add(nudge);
        }
        ChartNotes.addRightOfPlot(chart, notes);
        double zMin = data.metallicities().isEmpty() ? 0.001 : data.metallicities().get(0) / Z_PAD;
        double top = data.series().stream().flatMap(s -> s.points().stream())
                .mapToDouble(p -> p.bracket() == null ? p.massMsun() : p.bracket().hi()).max().orElse(1.0);
        top = Math.max(top, data.windows().stream().mapToDouble(w -> w.masses().hi()).max().orElse(0.0));
        TransitionMassAxis.apply(chart, top);
        if (at.inIron()) {
            List<Double> irons = data.metallicities().stream().map(at.ironByZ()::get).sorted().toList();
            LogAxis.applyLinearX(chart, irons.get(0) - IRON_PAD_DEX, irons.get(irons.size() - 1) + IRON_PAD_DEX,
                    irons, MetallicityNames::signedDex);
        } else if (!at.linear()) {
            LogAxis.applyX(chart, zMin, at.zMax(), data.metallicities());
        } else {
            // Z = 0 has no place on a log axis: a linear one, labelled at the run's metallicities
            double span = Math.max(data.metallicities().get(data.metallicities().size() - 1), 1e-4);
            LogAxis.applyLinearX(chart, -LINEAR_PAD_SHARE * span, (1 + LINEAR_PAD_SHARE) * span,
                    data.metallicities());
        }
        for (TransitionTrendData.Series s : data.series()) {
            int ageIndex = ages.indexOf(s.ageGyr());
            boolean refined = s.method() == TransitionMethod.REFINED;
            double[] x = s.points().stream().mapToDouble(p -> at.x(p.zInit(), ageIndex)).toArray();
            BracketBands.add(chart, s.points().stream()
                    .map(p -> new BracketBands.At(at.x(p.zInit(), ageIndex), p.bracket())).toList(),
                    ChartStyle.seriesColor(ageIndex));
            XYSeries line = chart.addSeries(s.kind().label() + ", " + SliceLabels.age(s.ageGyr())
                            + method.legendSuffix(s.method()),
                    x, s.points().stream().mapToDouble(TrendPoint::massMsun).toArray());
            line.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
            line.setLineColor(ChartStyle.seriesColor(ageIndex));
            // each transition its own dash and marker, as against age; each age its own colour
            line.setLineStyle(ChartStyle.dashed(TransitionAgeTrendRenderer.dash(s.kind()), ChartStyle.LINE_WIDTH));
            line.setMarker(TransitionAgeTrendRenderer.marker(s.kind()));
            line.setMarkerColor(refined ? ChartStyle.seriesColor(ageIndex) : ChartStyle.tint(
                    ChartStyle.seriesColor(ageIndex), GRID_MARKER_TINT));
        }
        for (double age : at.windowAges()) {
            List<TransientWindow> windows = data.windows().stream().filter(w -> w.ageGyr() == age).toList();
            int ageIndex = at.colourIndex(age);
            java.awt.Color color = ChartStyle.seriesColor(ageIndex);
            TrendDrawing.windows(chart, windows.stream().map(w -> new TrendDrawing.Window(
                    at.x(w.zInit(), ageIndex), w.masses())).toList(), color);
            XYSeries middles = chart.addSeries("small transient cores, " + SliceLabels.age(age),
                    windows.stream().mapToDouble(w -> at.x(w.zInit(), ageIndex)).toArray(),
                    windows.stream().mapToDouble(w -> 0.5 * (w.masses().lo() + w.masses().hi())).toArray());
            middles.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
            middles.setMarker(SeriesMarkers.SQUARE);
            middles.setMarkerColor(ChartStyle.tint(color, WINDOW_MARKER_TINT));
        }
        TrendLegend.hideDrawnSeries(chart);
        List<String> colours = new java.util.ArrayList<>(ages.stream().map(SliceLabels::age).toList());
        at.windowOnlyAges().forEach(age -> colours.add(SliceLabels.age(age)));
        TrendLegend.add(chart, data.series().stream().map(TransitionTrendData.Series::kind).distinct().sorted()
                        .toList(), TrendLegend.methodsOf(method, data.series().stream()
                        .map(s -> java.util.Map.entry(s.kind(), s.method())).toList()),
                data.series().stream().allMatch(s -> s.method() == TransitionMethod.GRID), !data.windows().isEmpty(),
                colours, GRID_MARKER_TINT);
        TrendDrawing.labels(chart, valueLabels(data, at), windows(data, at));
        return chart;
    }

    /** How the chart says how the masses were found: once in the subtitle when every series agrees. */
    static MethodNote methodNote(TransitionTrendData data) {
        return MethodNote.of(data.series().stream().map(TransitionTrendData.Series::method).toList(),
                data.series().stream().flatMap(s -> s.points().stream()).map(TrendPoint::toleranceMsun).toList());
    }

    /** Where {@code data} is drawn along x, on a Z axis. */
    static Placement placement(TransitionTrendData data) {
        return placement(data, MetallicityNames.Z_ONLY);
    }

    /** Where {@code data} is drawn along x: in [Fe/H] when {@code names} give every metallicity one, else in Z. */
    static Placement placement(TransitionTrendData data, MetallicityNames names) {
        Placement inZ = zPlacement(data);
        return inIron(data.metallicities(), names) ? new Placement(inZ.ages(), inZ.windowAges(), false, inZ.zMax(), names.ironByZ()) : inZ;
    }

    /**
     * Whether the chart of these metallicities draws x in [Fe/H]: when the grid gave [Fe/H] and every one has it (Z = 0
     * has none, and keeps the chart in Z). The report's caption asks the same.
     */
    public static boolean inIron(java.util.Collection<Double> metallicities, MetallicityNames names) {
        return names.namesIron() && !metallicities.isEmpty()
                && metallicities.stream().allMatch(names.ironByZ()::containsKey);
    }

    private static Placement zPlacement(TransitionTrendData data) {
        List<Double> ages = data.series().stream().map(TransitionTrendData.Series::ageGyr).distinct().sorted()
                .toList();
        List<Double> windowAges = data.windows().stream().map(TransientWindow::ageGyr).distinct().sorted().toList();
        boolean linear = !data.metallicities().isEmpty() && data.metallicities().get(0) <= 0;
        double zMax = data.metallicities().isEmpty() ? 0.1
                : data.metallicities().get(data.metallicities().size() - 1) * Z_PAD;
        return new Placement(ages, windowAges, linear, zMax, java.util.Map.of());
    }

    /** Every marker's value label (none with more ages than can be labelled). */
    static List<TrendDrawing.Label> valueLabels(TransitionTrendData data, Placement at) {
        if (at.ages().size() > TrendDrawing.MAX_LABELLED_FAMILIES) {
            return List.of();
        }
        return data.series().stream().flatMap(s -> {
            int ageIndex = at.ages().indexOf(s.ageGyr());
            return s.points().stream().map(p -> new TrendDrawing.Label(at.x(p.zInit(), ageIndex), p.massMsun(),
                    p.bracket(), SliceLabels.massToAccuracy(p.massMsun(), p.bracket(), p.toleranceMsun()),
                    ChartStyle.seriesColor(ageIndex)));
        }).toList();
    }

    /**
     * The note printed under the legend when the series of several ages are drawn a little apart ({@link Placement}),
     * empty otherwise: a reader who reads Z off a marker must know that the marker of Z = 0.02 may sit at 0.019 or
     * 0.021 on purpose.
     */
    static String nudgeNote(TransitionTrendData data) {
        return nudgeNote(data, false);
    }

    /** {@link #nudgeNote(TransitionTrendData)} on an axis of Z or, when {@code inIron}, of [Fe/H]. */
    static String nudgeNote(TransitionTrendData data, boolean inIron) {
        long ages = java.util.stream.Stream.concat(data.series().stream().map(TransitionTrendData.Series::ageGyr),
                data.windows().stream().map(TransientWindow::ageGyr)).distinct().count();
        return ages > 1 ? "Each age is drawn slightly apart at its " + (inIron ? "[Fe/H]" : "Z") + " (youngest left) "
                + "so that markers do not hide each other." : "";
    }

    /** Every transient window, where it is drawn. */
    static List<TrendDrawing.Window> windows(TransitionTrendData data, Placement at) {
        return data.windows().stream().map(w -> new TrendDrawing.Window(at.x(w.zInit(), at.colourIndex(w.ageGyr())),
                w.masses())).toList();
    }

    /**
     * Where a metallicity is drawn: nudged sideways per age (by {@link #DODGE_DEX} dex on a log axis, by the same
     * share of the range on a linear one, less when that would spread the ages wider than {@link #MAX_SPREAD_DEX}) so
     * that markers of different ages do not hide each other; the ages with transient windows alone take places after
     * the others'.
     *
     * @param ages the ages of the series, increasing: each one's colour and nudge
     * @param windowAges the ages of the transient windows; one with no series comes after the series' ages
     * @param linear whether the Z axis is linear (it holds Z = 0)
     * @param zMax the Z axis maximum
     * @param ironByZ the [Fe/H] of every Z when x is [Fe/H] (dex, linear), empty when x is Z
     */
    record Placement(List<Double> ages, List<Double> windowAges, boolean linear, double zMax,
                     java.util.Map<Double, Double> ironByZ) {
        Placement {
            ironByZ = java.util.Map.copyOf(ironByZ);
        }

        /** Whether x is [Fe/H]. */
        boolean inIron() {
            return !ironByZ.isEmpty();
        }

        double x(double z, int ageIndex) {
            int slots = ages.size() + windowOnlyAges().size();
            double step = slots > 1 ? Math.min(DODGE_DEX, MAX_SPREAD_DEX / (slots - 1)) : 0.0;
            double offsetDex = step * (ageIndex - (slots - 1) / 2.0);
            if (inIron()) {
                return ironByZ.get(z) + offsetDex;
            }
            return linear ? z + offsetDex * zMax * 0.5 : z * Math.pow(10, offsetDex);
        }

        /**
         * The colour of an age: its place among the ages with a transition, then among the ages with transient
         * windows alone (counted apart, so that the colours follow each other as the legend lists them).
         */
        int colourIndex(double ageGyr) {
            return ages.contains(ageGyr) ? ages.indexOf(ageGyr) : ages.size() + windowOnlyAges().indexOf(ageGyr);
        }

        /** The ages with transient windows and no transition, increasing. */
        List<Double> windowOnlyAges() {
            return windowAges.stream().filter(age -> !ages.contains(age)).toList();
        }
    }
}
