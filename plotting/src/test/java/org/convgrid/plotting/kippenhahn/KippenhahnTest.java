package org.convgrid.plotting.kippenhahn;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.image.BufferedImage;
import java.io.StringReader;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import javax.imageio.ImageIO;
import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.engine.request.OvershootScheme;
import org.convgrid.output.Span;
import org.convgrid.output.track.Track;
import org.convgrid.output.track.TrackReader;
import org.convgrid.output.track.TrackStep;
import org.convgrid.plotting.TestTracks;
import org.convgrid.plotting.label.PhysicsKey;
import org.convgrid.plotting.style.AgeScale;
import org.convgrid.plotting.style.ChartFiles;
import org.convgrid.plotting.style.ChartStyle;
import org.convgrid.plotting.tracks.TrackOrigin;
import org.convgrid.plotting.zones.ZoneKind;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class KippenhahnTest {

    private static final PhysicsKey PHYSICS = new PhysicsKey(1.8, 0.0, OvershootScheme.STEP,
            StabilityCriterion.SCHWARZSCHILD, 1.0);

    private static Track track(double m) throws Exception {
        return new Track("t", TrackReader.read(new StringReader(TestTracks.text(m, 0.014, 60))));
    }

    private static KippenhahnData data(double m) throws Exception {
        return Kippenhahn.build(new TrackOrigin("t", m, 0.014, PHYSICS), track(m));
    }

    @Test
    void everyNoteOfTheAgeChartsIsASentenceOnOneLine() {
        // house style of chart notes (Kippenhahn.BURNING_NOTE, TOO_SHORT_NOTE, the zone maps' notes): a capital
        // first, a full stop last; "a convective shell too thin to show here" had been on the depth charts
        List<String> notes = new ArrayList<>(List.of(Kippenhahn.BURNING_NOTE, Kippenhahn.TOO_SHORT_NOTE));
        for (ZoneKind kind : ZoneKind.values()) {
            for (ZoneCoordinate y : ZoneCoordinate.values()) {
                notes.add(KippenhahnRenderer.tooThinNote(kind, y == ZoneCoordinate.MASS_FRACTION));
            }
        }
        assertThat(notes).allSatisfy(note -> {
            assertThat(Character.isUpperCase(note.charAt(0))).as(note).isTrue();
            assertThat(note).endsWith(".").doesNotContain("\n");
        });
        assertThat(KippenhahnRenderer.tooThinNote(ZoneKind.SHELL, false))
                .isEqualTo("Some convective shells are too thin to show here.");
        assertThat(KippenhahnRenderer.tooThinNote(ZoneKind.SHELL, true))
                .isEqualTo("Some convective shells are too thin to show here (see the depth chart).");
    }

    /**
     * A track from birth: fully convective, then a radiative core under an envelope whose base sits at
     * {@code envelopeBase}, with a central convective zone reaching m/M {@code coreTop} for a few steps.
     */
    private static KippenhahnData coreUnderEnvelope(double coreTop, double envelopeBase) throws Exception {
        StringBuilder b = new StringBuilder("age_gyr,phase,central_cz_top_mass_frac,env_cz_base_mass_frac,"
                + "burning_inner_mass_frac,burning_outer_mass_frac,nuclear_lum_frac\n");
        b.append("0.0,pre_main_sequence,1.0,0.0,,,0\n");
        for (int k = 0; k <= 60; k++) {
            double ageGyr = Math.pow(10, -5 + k * 0.1);
            boolean fullyConvective = ageGyr < 0.05;
            String core = fullyConvective ? "1.0" : ageGyr < 0.08 ? String.valueOf(coreTop) : "";
            String envelope = fullyConvective ? "0.0" : String.valueOf(envelopeBase);
            b.append(ageGyr).append(',').append(ageGyr >= 0.3 ? "main_sequence" : "pre_main_sequence").append(',')
                    .append(core).append(',').append(envelope).append(",0.0,0.3,1.0\n");
        }
        Track t = new Track("t", TrackReader.read(new StringReader(b.toString())));
        return Kippenhahn.build(new TrackOrigin("t", 0.3, 0.01738, PHYSICS), t);
    }

    @Test
    void aThinZoneNotePointsToTheDepthChartOnlyWhenOneIsDrawnAndShowsThatZone() throws Exception {
        // a 0.3 Msun, [Fe/H] = 0 chart said "Some convective cores are too thin to show here (see the depth
        // chart)." but its envelope is thick, so no depth chart was written (KippenhahnData.hasThinEnvelope)
        KippenhahnData thickEnvelope = coreUnderEnvelope(0.002, 0.5);
        assertThat(thickEnvelope.hasThinEnvelope()).isFalse();
        assertThat(KippenhahnRenderer.notes(thickEnvelope, ZoneCoordinate.MASS_FRACTION))
                .contains("Some convective cores are too thin to show here.")
                .noneMatch(note -> note.contains("depth chart"));
        // with a thin envelope a depth chart is drawn and shows the envelope, but it squeezes the core further still
        KippenhahnData thinEnvelope = coreUnderEnvelope(0.002, 0.9999);
        assertThat(thinEnvelope.hasThinEnvelope()).isTrue();
        assertThat(KippenhahnRenderer.notes(thinEnvelope, ZoneCoordinate.MASS_FRACTION))
                .contains("Some convective cores are too thin to show here.",
                        "Some convective envelopes are too thin to show here (see the depth chart).");
        assertThat(KippenhahnRenderer.notes(thinEnvelope, ZoneCoordinate.SURFACE_DEPTH))
                .noneMatch(note -> note.contains("depth chart"));
    }

    @Test
    void theDepthAxisLabelsTheCentreAndTheTopAndLeavesOutACoreItCannotShow() throws Exception {
        // a 1 Msun track from birth whose central convective zone reaches m/M 0.067 at most: 31 pixels in m/M, 2.7 on
        // the depth axis, where the border and the burning region's outline cover it
        StringBuilder b = new StringBuilder("age_gyr,phase,central_cz_top_mass_frac,env_cz_base_mass_frac,"
                + "burning_inner_mass_frac,burning_outer_mass_frac,nuclear_lum_frac\n");
        b.append("0.0,pre_main_sequence,1.0,0.0,,,0\n");
        for (int k = 0; k <= 60; k++) {
            double ageGyr = Math.pow(10, -6 + k * 0.1);
            boolean main = ageGyr >= 0.03;
            String core = ageGyr > 0.02 && ageGyr < 0.03 ? "0.067" : "";
            b.append(ageGyr).append(',').append(main ? "main_sequence" : "pre_main_sequence").append(',')
                    .append(core).append(",0.99,0.0,0.3,").append(ageGyr > 0.02 ? "1.0" : "0.0").append('\n');
        }
        Track t = new Track("t", TrackReader.read(new StringReader(b.toString())));
        KippenhahnData data = Kippenhahn.build(new TrackOrigin("t", 1.0, 0.008, PHYSICS), t);
        assertThat(data.zones()).extracting(AgeRect::kind).contains(ZoneKind.CORE);
        var depth = KippenhahnRenderer.render(data, ZoneCoordinate.SURFACE_DEPTH);
        assertThat(depth.getSeriesMap()).doesNotContainKey(ZoneKind.CORE.label())
                .containsKey(ZoneKind.ENVELOPE.label());
        assertThat(KippenhahnRenderer.render(data).getSeriesMap()).containsKey(ZoneKind.CORE.label());
        // the axis reaches a hair past 0 and 7, so XChart labels both ends (it leaves a tick on an end unlabelled)
        assertThat(depth.getStyler().getYAxisMin()).isLessThan(0.0).isGreaterThan(-1e-3);
        assertThat(depth.getStyler().getYAxisMax()).isGreaterThan(ZoneCoordinate.DEPTH_TOP)
                .isLessThan(ZoneCoordinate.DEPTH_TOP + 1e-3);
    }

    @Test
    void shadedIntervalsAreTheTrackZonesHeldToTheNextStep() throws Exception {
        for (double m : new double[] {1.0, 2.0}) {
            List<TrackStep> steps = track(m).steps();
            KippenhahnData data = data(m);
            for (int i = 0; i + 1 < steps.size(); i++) {
                int step = i;
                List<AgeRect> mine = data.zones().stream().filter(r -> r.step() == step).toList();
                assertThat(mine.stream().map(r -> new Span(r.lo(), r.hi())).toList()).as("step %d", i)
                        .isEqualTo(steps.get(i).convZones());
                assertThat(mine).allSatisfy(r -> {
                    assertThat(r.left()).isEqualTo(steps.get(step).ageGyr());
                    assertThat(r.right()).isEqualTo(steps.get(step + 1).ageGyr());
                });
            }
            int last = steps.size() - 1;
            assertThat(data.zones()).noneMatch(r -> r.step() == last);
            assertThat(data.ageMin()).isEqualTo(steps.get(0).ageGyr());
            assertThat(data.ageMax()).isEqualTo(steps.get(last).ageGyr());
            assertThat(data.notes()).isEmpty();
        }
    }

    @Test
    void burningBandIsTheTrackBurningZone() throws Exception {
        List<TrackStep> steps = track(1.0).steps();
        KippenhahnData data = data(1.0);
        assertThat(data.burning()).hasSize(steps.size() - 1);
        for (AgeRect r : data.burning()) {
            assertThat(new Span(r.lo(), r.hi())).isEqualTo(steps.get(r.step()).burningZone());
        }
        // The synthetic burning region leaves the centre near exhaustion: a shell, still one band.
        assertThat(data.burning().get(data.burning().size() - 1).lo()).isGreaterThan(0.0);
        assertThat(Bands.join(data.burning(), false)).hasSize(1);
    }

    @Test
    void bandsFollowTheZonesThroughTheSteps() throws Exception {
        // 1 Msun: a deepening envelope (one band) and an early transient core (one band).
        List<List<AgeRect>> sun = Bands.join(data(1.0).zones(), true);
        assertThat(sun).hasSize(2);
        List<AgeRect> envelope = sun.stream().filter(b -> b.get(0).kind() == ZoneKind.ENVELOPE).findFirst()
                .orElseThrow();
        assertThat(envelope.get(envelope.size() - 1).lo()).isLessThan(envelope.get(0).lo());
        // 2 Msun: one shrinking core.
        List<List<AgeRect>> massive = Bands.join(data(2.0).zones(), true);
        assertThat(massive).singleElement().satisfies(core -> {
            assertThat(core.get(0).kind()).isEqualTo(ZoneKind.CORE);
            assertThat(core.get(core.size() - 1).hi()).isLessThan(core.get(0).hi());
        });
        double[][] outline = Bands.outline(massive.get(0));
        assertThat(outline[0]).hasSize(4 * massive.get(0).size() + 1);
        assertThat(outline[0][0]).isEqualTo(outline[0][outline[0].length - 1]);
    }

    @Test
    void aSplittingZoneStartsNewBands() {
        List<AgeRect> rects = new ArrayList<>(List.of(new AgeRect(0, 0, 1, 0.5, 0.8), new AgeRect(1, 1, 2, 0.5, 0.6),
                new AgeRect(1, 1, 2, 0.7, 0.8)));
        assertThat(Bands.join(rects, true)).hasSize(3);
    }

    @Test
    void equalAgesAndSingleStepsAreHandled() throws Exception {
        String text = "age_gyr,central_cz_top_mass_frac,burning_inner_mass_frac,burning_outer_mass_frac\n"
                + "0,0.1,0,0.2\n0,0.3,0,0.2\n1,0.2,,\n";
        Track t = new Track("t", TrackReader.read(new StringReader(text)));
        KippenhahnData data = Kippenhahn.build(new TrackOrigin("t", 1.5, 0.014, PHYSICS), t);
        assertThat(data.zones()).singleElement().satisfies(r -> assertThat(r.hi()).isEqualTo(0.3));
        Track single = new Track("t", t.steps().subList(2, 3));
        assertThat(Kippenhahn.build(new TrackOrigin("t", 1.5, 0.014, PHYSICS), single).notes())
                .containsExactly(Kippenhahn.TOO_SHORT_NOTE);
    }

    @Test
    void aTrackFromBirthSaysSoOnItsAgeAxis() throws Exception {
        String text = "age_gyr,phase,central_cz_top_mass_frac,env_cz_base_mass_frac\n"
                + "0,pre_main_sequence,1.0,0.0\n0.01,pre_main_sequence,,0.6\n0.05,main_sequence,,0.97\n";
        Track t = new Track("t", TrackReader.read(new StringReader(text)));
        KippenhahnData data = Kippenhahn.build(new TrackOrigin("t", 1.0, 0.02, PHYSICS), t);
        assertThat(data.timeline().startsAtBirth()).isTrue();
        assertThat(KippenhahnRenderer.render(data).getXAxisTitle()).isEqualTo("age since birth / Gyr");
        assertThat(data.zones()).first().satisfies(r -> assertThat(r.hi()).isEqualTo(1.0));
        assertThat(Kippenhahn.build(new TrackOrigin("t", 1.5, 0.014, PHYSICS), new Track("z",
                TrackReader.read(new StringReader(TestTracks.text(1.5, 0.014, 5))))).timeline().startsAtBirth())
                .isFalse();
    }

    @Test
    void chartIsAPngOfTheStatedSize(@TempDir Path dir) throws Exception {
        Path png = dir.resolve("k.png");
        ChartFiles.writePng(KippenhahnRenderer.render(data(2.0)), png);
        BufferedImage image = ImageIO.read(png.toFile());
        assertThat(image.getWidth()).isEqualTo(ChartStyle.WIDTH);
        assertThat(image.getHeight()).isEqualTo(ChartStyle.HEIGHT);
    }

    /**
     * A made-up 1 Msun track from birth (shapes only, nothing under test): fully convective until 2 Myr, a
     * radiative core growing under a retreating envelope, the zero-age main sequence at 45 Myr, hydrogen burning
     * in the centre from then on; ages log-spaced from 1 kyr to 10 Gyr after a first step at birth.
     */
    static String birthTrack() {
        StringBuilder b = new StringBuilder("age_gyr,phase,central_cz_top_mass_frac,env_cz_base_mass_frac,"
                + "burning_inner_mass_frac,burning_outer_mass_frac\n");
        b.append("0.0,pre_main_sequence,1.0,0.0,,\n");
        for (int k = 0; k <= 70; k++) {
            double ageGyr = Math.pow(10, -6 + k * 0.1);
            boolean main = ageGyr >= 0.045;
            double base = ageGyr < 0.002 ? 0.0 : Math.min(0.98, 0.3 * Math.log10(ageGyr / 0.002) + 0.2);
            // fully convective while the envelope reaches the centre: one zone, centre to surface
            b.append(ageGyr).append(',').append(main ? "main_sequence" : "pre_main_sequence").append(',')
                    .append(base == 0.0 ? "1.0" : "").append(',').append(base).append(',')
                    .append(main ? "0.0,0.1" : ",").append('\n');
        }
        return b.toString();
    }

    @Test
    void aTrackFromBirthIsDrawnOnALogarithmicAgeAxisWithTheZeroAgeMainSequenceMarked(@TempDir Path dir)
            throws Exception {
        String text = birthTrack();
        org.convgrid.output.track.TrackTimeline timeline = org.convgrid.output.track.TrackTimeline.read(
                new StringReader(text));
        assertThat(timeline.startsAtBirth()).isTrue();
        assertThat(timeline.zeroAgeMainSequenceGyr()).isBetween(0.045, 0.06);
        Track t = new Track("t", TrackReader.read(new StringReader(text)));
        KippenhahnData data = Kippenhahn.build(new TrackOrigin("t", 1.0, 0.014, PHYSICS), t, timeline);
        AgeScale scale = AgeScale.of(true, data.ageMin(), 1e-6, data.ageMax());
        assertThat(scale.logarithmic()).isTrue();
        // 1 kyr to 10 Gyr in Myr, one labelled tick per decade, each in the unit that keeps it short
        assertThat(scale.decades()).containsExactly(1e-3, 1e-2, 1e-1, 1.0, 10.0, 100.0, 1e3, 1e4);
        assertThat(scale.decades().stream().map(AgeScale::label).toList()).containsExactly("1 kyr", "10 kyr",
                "100 kyr", "1 Myr", "10 Myr", "100 Myr", "1 Gyr", "10 Gyr");
        // birth (age 0) is held at the left end
        assertThat(scale.x(0.0)).isEqualTo(scale.min());
        // a track from the zero-age main sequence, or one without phases, keeps the linear axis in Gyr
        assertThat(AgeScale.of(false, 0.0, 1e-6, 10.0).logarithmic()).isFalse();
        // built without a timeline, the chart reads the track's own phases
        assertThat(Kippenhahn.build(new TrackOrigin("t", 1.0, 0.014, PHYSICS), t).timeline()).isEqualTo(timeline);
        assertThat(org.convgrid.output.track.TrackTimeline.read(new StringReader(TestTracks.text(1.0, 0.014, 5))))
                .isEqualTo(org.convgrid.output.track.TrackTimeline.UNKNOWN);
        Path png = dir.resolve("birth.png");
        ChartFiles.writePng(KippenhahnRenderer.render(data), png);
        assertThat(ImageIO.read(png.toFile()).getWidth()).isEqualTo(ChartStyle.WIDTH);
        // CONVGRID_KEEP_CHARTS=DIR keeps the charts to look at
        String keep = System.getenv("CONVGRID_KEEP_CHARTS");
        if (keep != null) {
            java.nio.file.Files.copy(png, Path.of(keep).resolve("zones-age-birth.png"),
                    java.nio.file.StandardCopyOption.REPLACE_EXISTING);
            ChartFiles.writePng(KippenhahnRenderer.render(data, ZoneCoordinate.SURFACE_DEPTH),
                    Path.of(keep).resolve("zones-age-birth-depth.png"));
        }
    }
    /**
     * The ZAMS label sits in the white margin between the title and the plot, over its line, on both vertical
     * coordinates and wherever the line lies: inside the plot its white box hid data (a 1 Msun, Z = 0.02
     * chart lost its thin envelope at m/M 0.97-1 from ~39 to ~80 Myr under it).
     */
    @Test
    void theZamsLabelCoversNoDataAndNoTitle() throws Exception {
        String text = birthTrack();
        Track t = new Track("t", TrackReader.read(new StringReader(text)));
        KippenhahnData data = Kippenhahn.build(new TrackOrigin("t", 1.0, 0.014, PHYSICS), t,
                org.convgrid.output.track.TrackTimeline.read(new StringReader(text)));
        for (ZoneCoordinate y : ZoneCoordinate.values()) {
            var chart = KippenhahnRenderer.render(data, y);
            BufferedImage image = new BufferedImage(ChartStyle.WIDTH, ChartStyle.HEIGHT, BufferedImage.TYPE_INT_RGB);
            java.awt.Graphics2D g = image.createGraphics();
            chart.paint(g, ChartStyle.WIDTH, ChartStyle.HEIGHT);
            java.awt.FontMetrics label = g.getFontMetrics(ChartStyle.ANNOTATION_FONT);
            java.awt.geom.Rectangle2D plot = chart.plotBounds();
            // the title's two lines end here (ChartStyle.newChart sets them from the chart's padding down)
            double titleFoot = chart.getStyler().getChartPadding() + g.getFontMetrics(ChartStyle.TITLE_FONT).getHeight()
                    + g.getFontMetrics(ChartStyle.SUBTITLE_FONT).getHeight();
            for (double sx : new double[] {plot.getMinX(), plot.getCenterX(), plot.getMaxX()}) {
                java.awt.geom.Rectangle2D box = KippenhahnRenderer.zamsLabelBox(chart, label, sx);
                String where = y + " at x = " + sx;
                assertThat(box.getMaxY()).as(where + ": above the plot").isLessThanOrEqualTo(plot.getMinY());
                assertThat(box.getMinY()).as(where + ": under the title").isGreaterThanOrEqualTo(titleFoot);
                assertThat(box.getMinX()).as(where).isGreaterThanOrEqualTo(0);
                assertThat(box.getMaxX()).as(where).isLessThanOrEqualTo(ChartStyle.WIDTH);
                assertThat(box.getCenterX()).as(where + ": over its line").isCloseTo(
                        Math.min(sx, ChartStyle.WIDTH - box.getWidth() / 2), org.assertj.core.data.Offset.offset(0.5));
            }
        }
    }
}
