package org.convgrid.plotting.envelope;

import java.awt.Color;
import java.util.ArrayList;
import java.util.DoubleSummaryStatistics;
import java.util.List;
import java.util.Locale;
import org.convgrid.plotting.label.MetallicityNames;
import org.convgrid.plotting.label.SliceLabels;
import org.convgrid.plotting.style.AgeLineWords;
import org.convgrid.plotting.style.ChartNotes;
import org.convgrid.plotting.style.ChartStyle;
import org.convgrid.plotting.style.HollowMarker;
import org.convgrid.plotting.style.LogAxis;
import org.convgrid.plotting.style.StyledChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.Marker;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Turns {@link EnvelopeMassData} into a chart: effective temperature along x, hotter to the left as on the HR
 * diagram, the convective envelope's mass up a logarithmic y axis (envelopes of F stars are 1e-6 to 1e-3 Msun, those
 * of K dwarfs a tenth of the star: only a log axis shows both); per age one colour and marker, the ages' order as on
 * the turnover charts; fully convective models hollow (the envelope is the whole star). The legend names each age
 * once, then what hollow means, in grey.
 */
public final class EnvelopeMassRenderer {

    static final String TITLE = "Convective envelope mass against Teff, ";
    static final String X_TITLE = "effective temperature Teff / K   (hotter to the left)";
    static final String Y_TITLE = "convective envelope mass / M\u2609 (logarithmic)";
    /** Room either side of the temperatures, as a share of their range. */
    private static final double TEFF_PAD_SHARE = 0.05;
    /** Room above and below the envelope masses, as a factor. */
    private static final double MASS_PAD_FACTOR = 2.0;

    private EnvelopeMassRenderer() {
    }

    /** Why a line stops at the hottest star with an envelope (without it the hotter stars just vanish). */
    static String withoutEnvelopeNote(long models) {
        return models + (models == 1 ? " hotter model has" : " hotter models have") + " no convective envelope: not "
                + "drawn.";
    }

    /** The chart of one metallicity's envelopes, named by Z; {@code data} must hold at least one model. */
    public static StyledChart render(EnvelopeMassData data) {
        return render(data, MetallicityNames.Z_ONLY);
    }

    /** The chart of one metallicity's envelopes, named as {@code names} name it. */
    public static StyledChart render(EnvelopeMassData data, MetallicityNames names) {
        StyledChart chart = ChartStyle.newChart(TITLE + names.of(data.zInit()), data.physics().describe(), X_TITLE,
                Y_TITLE);
        ChartStyle.legendRight(chart);
        List<EnvelopePoint> all = data.lines().stream().flatMap(l -> l.points().stream()).toList();
        DoubleSummaryStatistics teff = all.stream().mapToDouble(EnvelopePoint::teffK).summaryStatistics();
        DoubleSummaryStatistics mass = all.stream().mapToDouble(EnvelopePoint::envelopeMassMsun).summaryStatistics();
        // XChart cannot reverse an axis: x is -Teff, its labels written without the sign
        double pad = TEFF_PAD_SHARE * Math.max(teff.getMax() - teff.getMin(), 100.0);
        chart.getStyler().setXAxisMin(-teff.getMax() - pad);
        chart.getStyler().setXAxisMax(-teff.getMin() + pad);
        chart.getStyler().setxAxisTickLabelsFormattingFunction(v -> String.format(Locale.ROOT, "%.0f", -v + 0.0));
        double yMin = mass.getMin() / MASS_PAD_FACTOR;
        double yMax = mass.getMax() * MASS_PAD_FACTOR;
        List<Double> labels = LogAxis.sparseRoundValues(yMin, yMax);
        LogAxis.applyY(chart, yMin, yMax, labels, LogAxis.compactLabels(labels));
        List<String> notes = new ArrayList<>(List.of(AgeLineWords.GRID_ONLY_NOTE));
        if (data.withoutEnvelope() > 0) {
            notes.add(withoutEnvelopeNote(data.withoutEnvelope()));
        }
        if (data.pastMainSequence() > 0) {
            notes.add(AgeLineWords.pastMainSequenceNote(data.pastMainSequence()));
        }
        ChartNotes.addRightOfPlot(chart, notes);

        for (EnvelopeMassData.AgeLine line : data.lines()) {
            XYSeries s = chart.addSeries(SliceLabels.age(line.ageGyr()), minusTeff(line.points()),
                    masses(line.points()));
            s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
            s.setLineColor(colour(data, line.ageGyr()));
            s.setLineStyle(ChartStyle.dashed(0, ChartStyle.LINE_WIDTH));
            s.setMarker(marker(data, line.ageGyr()));
            s.setMarkerColor(colour(data, line.ageGyr()));
        }
        all.stream().filter(EnvelopePoint::fullyConvective).findFirst().ifPresent(p -> {
            XYSeries key = chart.addSeries(AgeLineWords.FULLY_CONVECTIVE_LABEL, new double[] {-p.teffK()},
                    new double[] {p.envelopeMassMsun()});
            key.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
            key.setMarker(new HollowMarker(SeriesMarkers.CIRCLE));
            key.setMarkerColor(ChartStyle.KEY_GREY);
        });
        int n = 0;
        for (EnvelopeMassData.AgeLine line : data.lines()) {
            List<EnvelopePoint> hollow = line.points().stream().filter(EnvelopePoint::fullyConvective).toList();
            if (hollow.isEmpty()) {
                continue;
            }
            // over the line's filled markers: a fully convective star reads hollow
            XYSeries s = chart.addSeries("fully convective " + n++, minusTeff(hollow), masses(hollow));
            s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
            s.setMarker(new HollowMarker(marker(data, line.ageGyr())));
            s.setMarkerColor(colour(data, line.ageGyr()));
            s.setShowInLegend(false);
        }
        return chart;
    }

    /** An age's colour: its place among all the grid's ages of this physics, as on the turnover charts. */
    private static Color colour(EnvelopeMassData data, double ageGyr) {
        return ChartStyle.seriesColor(data.ages().indexOf(ageGyr));
    }

    private static Marker marker(EnvelopeMassData data, double ageGyr) {
        return ChartStyle.seriesMarker(data.ages().indexOf(ageGyr));
    }

    private static double[] minusTeff(List<EnvelopePoint> points) {
        return points.stream().mapToDouble(p -> -p.teffK()).toArray();
    }

    private static double[] masses(List<EnvelopePoint> points) {
        return points.stream().mapToDouble(EnvelopePoint::envelopeMassMsun).toArray();
    }
}
