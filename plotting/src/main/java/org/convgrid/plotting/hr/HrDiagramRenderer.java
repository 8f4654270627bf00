package org.convgrid.plotting.hr;

import java.awt.FontMetrics;
import java.util.DoubleSummaryStatistics;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;
import org.convgrid.engine.convection.StructureClass;
import org.convgrid.engine.evolution.MainSequenceEvolver;
import org.convgrid.plotting.label.MetallicityNames;
import org.convgrid.plotting.label.SliceLabels;
import org.convgrid.plotting.layout.LabelPlacement;
import org.convgrid.plotting.layout.Obstacles;
import org.convgrid.plotting.layout.SeriesObstacles;
import org.convgrid.plotting.style.ChartNotes;
import org.convgrid.plotting.style.ChartStyle;
import org.convgrid.plotting.style.HollowMarker;
import org.convgrid.plotting.style.NominalPlot;
import org.convgrid.plotting.style.ScaledMarker;
import org.convgrid.plotting.style.StyledChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Turns {@link HrDiagramData} into a chart: log Teff on a reversed x axis (hot stars left), log L/Lsun up; one
 * colour per metallicity (zero-age lines, isochrones and models), one marker shape per structure class; evolution
 * tracks (thin, light grey) and isochrones (one dash pattern per age, {@link IsochroneDashes}) labelled with their
 * ages under the models when the run has tracks, one with stars past the main sequence ending at its turn-off model
 * (hollow) when the refinement found it, else noted as stopping below the turn-off; for an {@code ms_fraction} grid, lines of equal main-sequence
 * fraction in their place, keyed, labelled and titled by fraction ({@link HrDiagramData#ageGroups}); mass and age labels clear of every marker, line and other label,
 * with a leader line when they had to move away. XChart cannot reverse an axis, so the x values are -log Teff and
 * the tick labels drop the sign.
 */
public final class HrDiagramRenderer {

    /**
     * Isochrones whose labelled models ({@link AgeLabelAnchor}) lie within this many pixels of each other share the
     * room for {@link #AGE_LABELS_TOGETHER} age labels: at five ages 0.05 Gyr apart (0.9-1.1 Gyr) the five labels and
     * their leaders piled up within 20 pixels, crossing each other. A little over a label height.
     */
    static final double AGE_LABEL_SPACING_PX = 30.0;
    /** Age labels that fit side by side around one spot (the demo's 20 and 150 Myr, 12 pixels apart, do). */
    static final int AGE_LABELS_TOGETHER = 2;
    /** The note of a diagram that left out some isochrones' age labels, each age having a dash pattern of its own. */
    static final String AGES_LEFT_OUT_NOTE = "Some isochrones lie too close together to label each with its age: "
            + "the legend names every isochrone by its dash pattern.";
    /**
     * The same, when some ages share a dash pattern ({@link IsochroneDashes#sharingNote}, which follows it): the
     * legend then cannot name every isochrone, and saying so would be untrue.
     */
    static final String AGES_LEFT_OUT_SHARED_NOTE = "Some isochrones lie too close together to label each with its "
            + "age.";
    /**
     * The note of a diagram whose lines end at turn-off models ({@link HrDiagramData#turnoffModels}): what the hollow
     * end is, in the exhaustion threshold the catalogue's {@code past_main_sequence} status is read at.
     */
    static final String TURNOFF_NOTE = "Isochrones with stars past the main sequence end at the turn-off model "
            + "(hollow): the heaviest star still on it (central hydrogen above "
            + SliceLabels.number(MainSequenceEvolver.Settings.DEFAULT.endCentralHydrogen()) + ") at that age, "
            + "within the transition refinement's tolerance of one past it.";
    /**
     * How the note on lines that stop below the turn-off ends, after their names: why, and what computes the
     * turn-off models.
     */
    static final String BELOW_TURNOFF_NOTE_END = " at the last grid mass on the main sequence, up to a grid step "
            + "below the turn-off: no transition refinement found the turn-off model (run without --no-refine, or "
            + "convgrid transitions RUN_DIR --refine, then plot).";
    /** Margin added around the data range, in dex. */
    private static final double PAD_DEX = 0.04;
    /**
     * Room above the brightest model for the isochrones' age labels that go to their high-mass ends, as a share of
     * the luminosity range.
     */
    private static final double AGE_LABEL_ROOM_SHARE = 0.1;
    /**
     * Room right of the coolest model for the age labels that go to their isochrones' low-mass ends, as a share of
     * the log Teff range: about 100 of the plot's 720 pixels, a label as wide as "200 Myr" and its gap (the coolest
     * models of a 1-200 Myr grid lay 35-60 px from the plot's edge, and the labels went far off with
     * leaders across the crowd).
     */
    private static final double COOL_LABEL_ROOM_SHARE = 0.15;
    /** Leader lines from a moved label to its model, pixels. */
    private static final float LEADER_WIDTH = 1.0f;
    /**
     * The legend's line length, pixels: longer than the style's 36, so each isochrone's dash pattern shows more than
     * one period there (at 36 px the dash-dot, long-dash and dash-dot-dot keys of a six-age grid each showed one
     * dash and a dot or two, and read alike).
     */
    static final int LEGEND_LINE_PX = 60;
    /** Pixel spacing hint for the luminosity ticks (XChart's default gives 0.2 dex steps, too dense). */
    private static final int Y_TICK_SPACING = 90;

    /**
     * Track lines: light grey and a third as wide as the isochrones (1 px against 2, 3 for data lines), so that the
     * isochrones and the coloured models read first and the tracks as context behind them.
     */
    static final java.awt.Color TRACK_GREY = new java.awt.Color(190, 190, 190);
    static final float TRACK_WIDTH = 1.0f;
    static final String PRE_MAIN_SEQUENCE_LABEL = "pre-main-sequence tracks (dotted)";
    /** The pre-main-sequence part: the same light grey and width, dotted, so it is told apart without a colour. */
    private static final java.awt.BasicStroke PRE_MAIN_SEQUENCE_STROKE = new java.awt.BasicStroke(TRACK_WIDTH,
            java.awt.BasicStroke.CAP_ROUND, java.awt.BasicStroke.JOIN_ROUND, 1f, new float[] {2f, 4f}, 0f);
    /** The legend entry of the turn-off models the lines end at. */
    static final String TURNOFF_LABEL = "turn-off models (hollow)";
    /** The legend entry of the transition refinement's models. */
    static final String REFINEMENT_LABEL = "refinement models (small)";
    /** Refinement models' markers: this share of the grid's marker size, and paler. */
    private static final double REFINEMENT_MARKER_SHARE = 0.55;
    private static final double REFINEMENT_TINT = 0.35;
    /** The legend's class shapes: neutral, since colour stands for Z. */
    private static final java.awt.Color CLASS_LEGEND_GREY = new java.awt.Color(90, 90, 90);

    private HrDiagramRenderer() {
    }

    /** The chart of an HR diagram, its metallicities named by Z. */
    public static StyledChart render(HrDiagramData data) {
        return render(data, MetallicityNames.Z_ONLY);
    }

    /** The chart of an HR diagram, its metallicities named as {@code names} name them. */
    public static StyledChart render(HrDiagramData data, MetallicityNames names) {
        StyledChart chart = ChartStyle.newChart(title(data, names), data.physics().describe(),
                "log10(Teff / K)   (hotter to the left)", "log10(L / L\u2609)");
        ChartStyle.legendRight(chart);
        chart.getStyler().setLegendSeriesLineLength(LEGEND_LINE_PX);
        chart.getStyler().setxAxisTickLabelsFormattingFunction(v -> String.format(Locale.ROOT, "%.1f", -v + 0.0));
        chart.getStyler().setYAxisDecimalPattern("0.0");
        chart.getStyler().setYAxisTickMarkSpacingHint(Y_TICK_SPACING);
        if (!data.points().isEmpty()) {
            List<HrPoint> all = new java.util.ArrayList<>(data.points());
            all.addAll(data.refinementPoints());
            all.addAll(data.turnoffModels());
            DoubleSummaryStatistics teff = all.stream().mapToDouble(HrPoint::logTeff).summaryStatistics();
            DoubleSummaryStatistics lum = all.stream().mapToDouble(HrPoint::logL).summaryStatistics();
            data.tracks().forEach(t -> {
                t.logTeff().forEach(teff::accept);
                t.logL().forEach(lum::accept);
            });
            chart.getStyler().setXAxisMin(-teff.getMax() - PAD_DEX);
            chart.getStyler().setXAxisMax(-teff.getMin() + PAD_DEX);
            chart.getStyler().setYAxisMin(lum.getMin() - 2 * PAD_DEX);
            chart.getStyler().setYAxisMax(lum.getMax() + 2 * PAD_DEX);
            // room for the age labels beyond the isochrone ends they go to: above the brightest models, right of the
            // coolest (chosen on the axes without it: the room barely changes the scale they are chosen on)
            List<AgeAnchor> anchors = ageAnchors(data, chart);
            if (anchors.stream().anyMatch(a -> AgeLabelAnchor.atHighMassEnd(a.model(), a.line()))) {
                chart.getStyler().setYAxisMax(lum.getMax() + 2 * PAD_DEX
                        + AGE_LABEL_ROOM_SHARE * (lum.getMax() - lum.getMin()));
            }
            if (anchors.stream().anyMatch(a -> AgeLabelAnchor.atLowMassEnd(a.model(), a.line()))) {
                chart.getStyler().setXAxisMax(-teff.getMin() + PAD_DEX
                        + COOL_LABEL_ROOM_SHARE * (teff.getMax() - teff.getMin()));
            }
        }
        addTracks(chart, data);
        // With isochrones, the youngest one is the zero-age line: drawn once, as an isochrone.
        List<HrDiagramData.ZeroAgeLine> zeroAge = data.isochrones().isEmpty() ? data.zeroAgeLines() : List.of();
        for (HrDiagramData.ZeroAgeLine line : zeroAge) {
            int zIndex = data.metallicities().indexOf(line.zInit());
            XYSeries s = chart.addSeries((line.age() == 0 ? "zero age" : data.ageName(line.age()))
                            + ", " + names.of(line.zInit()),
                    line.points().stream().mapToDouble(p -> -p.logTeff()).toArray(),
                    line.points().stream().mapToDouble(HrPoint::logL).toArray());
            s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
            s.setMarker(SeriesMarkers.NONE);
            s.setLineColor(ChartStyle.seriesColor(zIndex));
            s.setLineStyle(ChartStyle.dashed(zIndex, 2.0f));
        }
        addIsochrones(chart, data, names);
        // Marker shape = structure class, colour = Z. The legend shows each shape once, in grey, from a series
        // drawn first at the same points, so the coloured markers painted next cover it.
        for (StructureClass c : StructureClass.values()) {
            List<HrPoint> members = data.points().stream().filter(p -> p.structureClass() == c).toList();
            // a class only refinement or turn-off models have gets its entry too, from a point-less series (NaN:
            // drawn nowhere): a radiative turn-off model's shape had no class to read it by
            boolean elsewhere = Stream.concat(data.refinementPoints().stream(), data.turnoffModels().stream())
                    .anyMatch(p -> p.structureClass() == c);
            if (members.isEmpty() && !elsewhere) {
                continue;
            }
            XYSeries s = members.isEmpty()
                    ? chart.addSeries(ChartStyle.classLabel(c), new double[] {Double.NaN}, new double[] {Double.NaN})
                    : chart.addSeries(ChartStyle.classLabel(c),
                    members.stream().mapToDouble(p -> -p.logTeff()).toArray(),
                    members.stream().mapToDouble(HrPoint::logL).toArray());
            s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
            s.setMarker(ChartStyle.classMarker(c));
            s.setMarkerColor(CLASS_LEGEND_GREY);
        }
        addRefinementModels(chart, data);
        int hidden = 0;
        for (StructureClass c : StructureClass.values()) {
            for (double z : data.metallicities()) {
                List<HrPoint> members = data.points().stream()
                        .filter(p -> p.structureClass() == c && p.zInit() == z).toList();
                if (members.isEmpty()) {
                    continue;
                }
                XYSeries s = chart.addSeries("models " + hidden++,
                        members.stream().mapToDouble(p -> -p.logTeff()).toArray(),
                        members.stream().mapToDouble(HrPoint::logL).toArray());
                s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
                s.setMarker(ChartStyle.classMarker(c));
                s.setMarkerColor(ChartStyle.seriesColor(data.metallicities().indexOf(z)));
                s.setShowInLegend(false);
            }
        }
        addTurnoffModels(chart, data);
        chart.addOverlay((g, c) -> {
            g.setFont(ChartStyle.ANNOTATION_FONT);
            g.setColor(ChartStyle.BLACK);
            g.setStroke(new java.awt.BasicStroke(LEADER_WIDTH));
            FontMetrics fm = g.getFontMetrics();
            List<Label> labels = labels(data, c);
            List<LabelPlacement.Placed> placed = layout(c, fm, labels);
            for (int i = 0; i < labels.size(); i++) {
                LabelPlacement.Placed p = placed.get(i);
                if (p.leader() != null) {
                    g.draw(p.leader());
                }
                g.drawString(labels.get(i).text(), (float) p.box().getX(), (float) (p.box().getY() + fm.getAscent()));
            }
        });
        ChartNotes.addRightOfPlot(chart, notes(data, chart, names));
        return chart;
    }

    /** The chart's title: its metallicities and its ages, or its main-sequence fractions when grouped by them. */
    static String title(HrDiagramData data, MetallicityNames names) {
        String ages = data.ageGroups().byFraction() ? data.ageGroups().fractionsTitle(data.ages()) : ages(data.ages());
        return "HR diagram, " + names.values(data.metallicities()) + ", " + ages;
    }

    /** The chart's notes ({@link #notes(HrDiagramData, StyledChart, MetallicityNames)}), metallicities named by Z. */
    static List<String> notes(HrDiagramData data, StyledChart chart) {
        return notes(data, chart, MetallicityNames.Z_ONLY);
    }

    /**
     * The chart's notes: that lines end at turn-off models, or which stop below the turn-off; that some isochrones
     * went without an age label (they lay too close together), and which ages share a dash pattern when the grid has
     * more ages than patterns.
     */
    static List<String> notes(HrDiagramData data, StyledChart chart, MetallicityNames names) {
        List<String> notes = new java.util.ArrayList<>();
        if (!data.turnoffModels().isEmpty()) {
            notes.add(TURNOFF_NOTE);
        }
        belowTurnoffNote(data, names).ifPresent(notes::add);
        java.util.Optional<String> sharing = IsochroneDashes.sharingNote(data);
        if (labels(data, chart).stream().filter(l -> !l.massLabel()).count() < middleIsochrones(data).size()) {
            notes.add(sharing.isPresent() ? AGES_LEFT_OUT_SHARED_NOTE : AGES_LEFT_OUT_NOTE);
        }
        sharing.ifPresent(notes::add);
        if (!data.withoutResult().isEmpty()) {
            notes.add(withoutResultNote(data.withoutResult()));
        }
        return notes;
    }

    /** The note naming the masses whose models have no result, so that their gap is not read as the grid's. */
    static String withoutResultNote(List<Double> masses) {
        int shown = Math.min(masses.size(), MASSES_NAMED);
        String named = masses.subList(0, shown).stream().map(SliceLabels::number)
                .collect(java.util.stream.Collectors.joining(", "));
        return "Not drawn: models of " + named + " M\u2609" + (masses.size() > shown ? " and " + (masses.size() - shown)
                + " more masses" : "") + " that failed or did not converge (report.html lists them).";
    }

    /** How many masses without a result the note names before counting the rest. */
    private static final int MASSES_NAMED = 6;

    /**
     * The note naming the lines that stop at the last grid mass on the main sequence
     * ({@link IsochroneEnd#BELOW_TURNOFF}): by age when every drawn line of that age does, else by age and metallicity.
     */
    static java.util.Optional<String> belowTurnoffNote(HrDiagramData data, MetallicityNames names) {
        List<HrDiagramData.ZeroAgeLine> drawn = data.drawnLines();
        List<String> named = new java.util.ArrayList<>();
        drawn.stream().map(HrDiagramData.ZeroAgeLine::age).distinct().sorted().forEach(age -> {
            List<HrDiagramData.ZeroAgeLine> ofAge = drawn.stream().filter(l -> l.age() == age).toList();
            List<HrDiagramData.ZeroAgeLine> stopping = ofAge.stream()
                    .filter(l -> l.end() == IsochroneEnd.BELOW_TURNOFF).toList();
            if (stopping.size() == ofAge.size()) {
                named.add(data.ageName(age));
            } else {
                stopping.forEach(l -> named.add(data.ageName(age) + " at " + names.of(l.zInit())));
            }
        });
        if (named.isEmpty()) {
            return java.util.Optional.empty();
        }
        String lines = named.size() == 1 ? named.get(0)
                : String.join(", ", named.subList(0, named.size() - 1)) + " and " + named.get(named.size() - 1);
        return java.util.Optional.of((named.size() == 1 ? "The isochrone of " : "The isochrones of ") + lines
                + (named.size() == 1 ? " stops" : " stop") + BELOW_TURNOFF_NOTE_END);
    }

    /**
     * The turn-off models the lines end at: hollow markers of their class and Z, as large as the grid's (they are on
     * a line), painted over everything else, with one grey legend entry. Hollow sets the end apart from the grid's
     * models while the shape and colour keep it a member of its line.
     */
    private static void addTurnoffModels(StyledChart chart, HrDiagramData data) {
        List<HrPoint> ends = data.turnoffModels();
        if (ends.isEmpty()) {
            return;
        }
        // the legend entry: at the first end, in its shape, so the coloured marker painted next covers it whole
        HrPoint first = ends.get(0);
        XYSeries legend = chart.addSeries(TURNOFF_LABEL, new double[] {-first.logTeff()}, new double[] {first.logL()});
        legend.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
        legend.setMarker(new HollowMarker(ChartStyle.classMarker(first.structureClass())));
        legend.setMarkerColor(CLASS_LEGEND_GREY);
        for (int i = 0; i < ends.size(); i++) {
            HrPoint end = ends.get(i);
            XYSeries s = chart.addSeries("turn-off model " + i, new double[] {-end.logTeff()},
                    new double[] {end.logL()});
            s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
            s.setMarker(new HollowMarker(ChartStyle.classMarker(end.structureClass())));
            s.setMarkerColor(ChartStyle.seriesColor(data.metallicities().indexOf(end.zInit())));
            s.setShowInLegend(false);
        }
    }

    /**
     * The refinement's models: small, pale markers of their class and Z, under the grid's, with one grey legend
     * entry. They bunch at the transition masses, so at full size they would outweigh the grid's models.
     */
    private static void addRefinementModels(StyledChart chart, HrDiagramData data) {
        if (data.refinementPoints().isEmpty()) {
            return;
        }
        // the legend entry: neutral grey (colour stands for Z), from a series under the coloured ones
        XYSeries legend = chart.addSeries(REFINEMENT_LABEL,
                data.refinementPoints().stream().mapToDouble(p -> -p.logTeff()).toArray(),
                data.refinementPoints().stream().mapToDouble(HrPoint::logL).toArray());
        legend.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
        legend.setMarker(new ScaledMarker(SeriesMarkers.CIRCLE, REFINEMENT_MARKER_SHARE));
        legend.setMarkerColor(CLASS_LEGEND_GREY);
        int n = 0;
        for (StructureClass c : StructureClass.values()) {
            for (double z : data.metallicities()) {
                List<HrPoint> members = data.refinementPoints().stream()
                        .filter(p -> p.structureClass() == c && p.zInit() == z).toList();
                if (members.isEmpty()) {
                    continue;
                }
                XYSeries s = chart.addSeries("refinement models " + n++,
                        members.stream().mapToDouble(p -> -p.logTeff()).toArray(),
                        members.stream().mapToDouble(HrPoint::logL).toArray());
                s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
                s.setMarker(new ScaledMarker(ChartStyle.classMarker(c), REFINEMENT_MARKER_SHARE));
                s.setMarkerColor(ChartStyle.tint(ChartStyle.seriesColor(data.metallicities().indexOf(z)),
                        REFINEMENT_TINT));
                s.setShowInLegend(false);
            }
        }
    }

    private static String massLabel(HrPoint p) {
        return SliceLabels.number(p.massMsun()) + " M\u2609";
    }

    /**
     * A label of the diagram.
     *
     * @param point the model it names
     * @param text what it says
     */
    record Label(HrPoint point, String text, boolean massLabel) {
    }

    /**
     * Every label, in the order they are placed: the mass labels ({@link HrDiagramData#massLabels}), then, with
     * isochrones, the age of each isochrone of the middle Z beside the model where it stands apart from the other
     * ages' isochrones ({@link AgeLabelAnchor}: for young ages, the cool end), leaving out an age whose model lies
     * within {@link #AGE_LABEL_SPACING_PX} of {@link #AGE_LABELS_TOGETHER} already labelled (the youngest and the
     * oldest are labelled first, so the labels span the ages). {@code chart}: the chart with its axis ranges set (not
     * yet painted).
     */
    static List<Label> labels(HrDiagramData data, StyledChart chart) {
        List<Label> labels = new java.util.ArrayList<>();
        ageAnchors(data, chart).forEach(a -> labels.add(new Label(a.model(), data.ageName(a.line().age()), false)));
        data.massLabels().forEach(p -> labels.add(new Label(p, massLabel(p), true)));
        return labels;
    }

    /**
     * An isochrone and the model its age label names.
     *
     * @param line the isochrone
     * @param model where its label goes ({@link AgeLabelAnchor})
     */
    record AgeAnchor(HrDiagramData.ZeroAgeLine line, HrPoint model) {
    }

    /**
     * The labelled isochrones of the middle Z, each with its labelled model, in the order of {@link #labels}: the
     * youngest, the oldest, then the ages between in order, leaving out one whose model lies within
     * {@link #AGE_LABEL_SPACING_PX} of {@link #AGE_LABELS_TOGETHER} already kept. {@code chart}: the chart with its
     * axis ranges set.
     */
    private static List<AgeAnchor> ageAnchors(HrDiagramData data, StyledChart chart) {
        List<HrDiagramData.ZeroAgeLine> middle = middleIsochrones(data);
        List<HrDiagramData.ZeroAgeLine> byPreference = new java.util.ArrayList<>(middle);
        byPreference.sort(java.util.Comparator.comparingDouble(HrDiagramData.ZeroAgeLine::age));
        if (byPreference.size() > 1) {
            byPreference.add(1, byPreference.remove(byPreference.size() - 1));
        }
        AgeLabelAnchor.Scale scale = new AgeLabelAnchor.Scale(
                NominalPlot.WIDTH_PX / (chart.getStyler().getXAxisMax() - chart.getStyler().getXAxisMin()),
                NominalPlot.HEIGHT_PX / (chart.getStyler().getYAxisMax() - chart.getStyler().getYAxisMin()));
        List<AgeAnchor> kept = new java.util.ArrayList<>();
        for (HrDiagramData.ZeroAgeLine line : byPreference) {
            HrPoint model = AgeLabelAnchor.of(line, data.isochrones(), scale, textSize(data.ageName(line.age())));
            if (kept.stream().filter(k -> nominalPixels(chart, k.model(), model) < AGE_LABEL_SPACING_PX)
                    .count() < AGE_LABELS_TOGETHER) {
                kept.add(new AgeAnchor(line, model));
            }
        }
        return kept;
    }

    /** The size of a label's text in the annotation font, pixels, before the chart is painted. */
    private static java.awt.geom.Dimension2D textSize(String text) {
        java.awt.font.FontRenderContext context = new java.awt.font.FontRenderContext(null, true, true);
        java.awt.font.LineMetrics line = ChartStyle.ANNOTATION_FONT.getLineMetrics(text, context);
        java.awt.Dimension size = new java.awt.Dimension();
        size.setSize(ChartStyle.ANNOTATION_FONT.getStringBounds(text, context).getWidth(),
                line.getAscent() + line.getDescent());
        return size;
    }

    /** The isochrones of the middle Z, the ones labelled with their ages. */
    private static List<HrDiagramData.ZeroAgeLine> middleIsochrones(HrDiagramData data) {
        if (data.isochrones().isEmpty()) {
            return List.of();
        }
        double middleZ = data.metallicities().get(data.metallicities().size() / 2);
        return data.isochrones().stream().filter(l -> l.zInit() == middleZ).toList();
    }

    /**
     * How far apart two models are on the chart, in pixels of a plot of nominal size ({@link NominalPlot}): the
     * labels are decided before the chart is painted, when XChart does not yet know where its axes lie.
     */
    private static double nominalPixels(StyledChart chart, HrPoint a, HrPoint b) {
        double dx = (a.logTeff() - b.logTeff()) / (chart.getStyler().getXAxisMax() - chart.getStyler().getXAxisMin());
        double dy = (a.logL() - b.logL()) / (chart.getStyler().getYAxisMax() - chart.getStyler().getYAxisMin());
        return Math.hypot(dx * NominalPlot.WIDTH_PX, dy * NominalPlot.HEIGHT_PX);
    }

    /**
     * Where each label goes on the painted chart {@code c}: beside its model, clear of every marker, every line
     * (tracks, isochrones, zero-age lines) and every other label ({@link LabelPlacement}), with a leader line when
     * it had to move away. For the overlay and for tests that check it.
     */
    static List<LabelPlacement.Placed> layout(StyledChart c, FontMetrics fm, List<Label> labels) {
        // a mass label always gets a leader: a model of every other Z lies near the one it names (the demo's
        // "1 M\u2609" sat between the Z = 0.014 and 0.02 models of 20 Myr, naming neither clearly)
        List<LabelPlacement.Wanted> wanted = labels.stream().map(l -> new LabelPlacement.Wanted(
                c.getScreenXFromChart(-l.point().logTeff()), c.getScreenYFromChart(l.point().logL()),
                fm.stringWidth(l.text()), fm.getAscent() + fm.getDescent(), ChartStyle.MARKER_SIZE / 2.0,
                l.massLabel() ? LabelPlacement.WITH_LEADER_PX : LabelPlacement.GAP_PX)).toList();
        return LabelPlacement.place(wanted, SeriesObstacles.addTo(new Obstacles(), c), plotArea(c));
    }

    /** The plot area, in screen pixels. */
    static java.awt.geom.Rectangle2D plotArea(StyledChart c) {
        double left = c.getScreenXFromChart(c.getStyler().getXAxisMin());
        double right = c.getScreenXFromChart(c.getStyler().getXAxisMax());
        double top = c.getScreenYFromChart(c.getStyler().getYAxisMax());
        double bottom = c.getScreenYFromChart(c.getStyler().getYAxisMin());
        return new java.awt.geom.Rectangle2D.Double(Math.min(left, right), top, Math.abs(right - left),
                bottom - top);
    }

    /**
     * Tracks in thin light grey (they are context for the coloured models and the isochrones), one legend entry for
     * all; the part of a track before the zero-age main sequence dotted, with its own legend entry.
     */
    private static void addTracks(StyledChart chart, HrDiagramData data) {
        int n = 0;
        boolean preShown = false;
        for (HrDiagramData.TrackLine t : data.tracks()) {
            int pre = t.preMainSequencePoints();
            if (pre > 0) {
                // up to and including the first main-sequence point, so the two parts join
                int end = Math.min(pre + 1, t.logL().size());
                XYSeries s = line(chart, preShown ? "pre-main-sequence track " + n : PRE_MAIN_SEQUENCE_LABEL,
                        t.logTeff().subList(0, end), t.logL().subList(0, end));
                s.setLineColor(TRACK_GREY);
                s.setLineStyle(PRE_MAIN_SEQUENCE_STROKE);
                s.setShowInLegend(!preShown);
                preShown = true;
            }
            if (t.logL().size() - pre >= 2) {
                boolean first = n == 0;
                XYSeries s = line(chart, first ? "evolution tracks" : "track " + n,
                        t.logTeff().subList(pre, t.logL().size()), t.logL().subList(pre, t.logL().size()));
                s.setLineColor(TRACK_GREY);
                s.setLineStyle(new java.awt.BasicStroke(TRACK_WIDTH));
                s.setShowInLegend(first);
            }
            n++;
        }
    }

    private static XYSeries line(StyledChart chart, String name, List<Double> logTeff, List<Double> logL) {
        XYSeries s = chart.addSeries(name, logTeff.stream().mapToDouble(v -> -v).toArray(),
                logL.stream().mapToDouble(Double::doubleValue).toArray());
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
        s.setMarker(SeriesMarkers.NONE);
        return s;
    }

    /** An age for people ({@link SliceLabels#age}: Myr below 1 Gyr, Gyr above). */
    static String age(double ageGyr) {
        return SliceLabels.age(ageGyr);
    }

    /**
     * The ages of the title: each with its unit when they are not all in Gyr, every one listed (an HR diagram's
     * isochrones are few and each is labelled on the chart).
     */
    static String ages(List<Double> agesGyr) {
        if (agesGyr.stream().allMatch(a -> a == 0 || a >= 1)) {
            return SliceLabels.ages(agesGyr);
        }
        return (agesGyr.size() == 1 ? "" : "ages ") + String.join(", ", agesGyr.stream()
                .map(HrDiagramRenderer::age).toList());
    }

    /**
     * Isochrones in the colour of their Z (the legend names each Z once), one dash pattern per age
     * ({@link IsochroneDashes}; the legend names each age once, in black); the isochrones of the middle Z are also
     * labelled with their ages where each stands apart from the others ({@link #labels}), each label where it covers
     * no mass label, no model marker and no other age label ({@link LabelPlacement}).
     */
    private static void addIsochrones(StyledChart chart, HrDiagramData data, MetallicityNames names) {
        if (data.isochrones().isEmpty()) {
            return;
        }
        double middleZ = data.metallicities().get(data.metallicities().size() / 2);
        List<HrDiagramData.ZeroAgeLine> middle = data.isochrones().stream().filter(l -> l.zInit() == middleZ)
                .toList();
        // legend-only series per age, in black (the key is the dash pattern, colour stands for Z), drawn first under
        // the coloured isochrone at the same points
        for (HrDiagramData.ZeroAgeLine line : middle) {
            // by fraction the lines are no isochrones (each star at its own age): the legend names the fraction alone
            XYSeries s = chart.addSeries((data.ageGroups().byFraction() ? "" : "isochrone, ")
                            + data.ageName(line.age()),
                    line.points().stream().mapToDouble(p -> -p.logTeff()).toArray(),
                    line.points().stream().mapToDouble(HrPoint::logL).toArray());
            s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
            s.setMarker(SeriesMarkers.NONE);
            s.setLineColor(ChartStyle.BLACK);
            s.setLineStyle(IsochroneDashes.stroke(data, line.age()));
        }
        int n = 0;
        for (HrDiagramData.ZeroAgeLine line : data.isochrones()) {
            int zIndex = data.metallicities().indexOf(line.zInit());
            boolean first = data.isochrones().stream().filter(o -> o.zInit() == line.zInit()).findFirst()
                    .get() == line;
            XYSeries s = chart.addSeries(first ? names.of(line.zInit()) : "isochrone " + n++,
                    line.points().stream().mapToDouble(p -> -p.logTeff()).toArray(),
                    line.points().stream().mapToDouble(HrPoint::logL).toArray());
            s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
            s.setMarker(SeriesMarkers.NONE);
            s.setLineColor(ChartStyle.seriesColor(zIndex));
            // the legend entry of a Z is drawn solid whatever the age of the isochrone that carries it
            s.setLineStyle(IsochroneDashes.stroke(data, line.age()));
            s.setShowInLegend(first);
        }
    }
}
