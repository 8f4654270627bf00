package org.convgrid.plotting.seismic;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.image.BufferedImage;
import java.io.StringReader;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import javax.imageio.ImageIO;
import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.engine.request.OvershootScheme;
import org.convgrid.output.track.Track;
import org.convgrid.output.track.TrackReader;
import org.convgrid.output.track.TrackStep;
import org.convgrid.output.track.TrackTimeline;
import org.convgrid.plotting.label.MetallicityNames;
import org.convgrid.plotting.label.PhysicsKey;
import org.convgrid.plotting.style.ChartFiles;
import org.convgrid.plotting.tracks.TrackOrigin;
import org.convgrid.plotting.tracks.TrackedModel;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The period-spacing chart's data: which tracks it draws, and the pre-main-sequence steps it leaves out above its
 * range. The spacings are shaped like the demo run's (tracks/p0-z02-m009.csv, 2 Msun at Z = 0.02: 3.4e8 s at birth,
 * 4.7e3 s at 7 Myr, 3.7e3 s on arriving on the main sequence at 11 Myr); shapes only, nothing physical under test.
 */
class PeriodSpacingAgainstAgeTest {

    private static final PhysicsKey PHYSICS = new PhysicsKey(1.8, 0.0, OvershootScheme.STEP,
            StabilityCriterion.SCHWARZSCHILD, 1.0);
    private static final PhysicsKey OTHER_PHYSICS = new PhysicsKey(2.0, 0.0, OvershootScheme.STEP,
            StabilityCriterion.SCHWARZSCHILD, 1.0);

    private static TrackStep step(double ageGyr, String phase, double spacingS) {
        return new TrackStep(ageGyr, phase, 1.0, 1.0, 5000, 4.4, 1e7, 50, 0.7, 1.0, List.of(), null, Double.NaN,
                spacingS);
    }

    /** A star from birth: no cavity, then a spacing falling from 3.4e8 s, then a main sequence near 3.7e3 s. */
    private static TrackedModel star(String id, double massMsun, double zInit, PhysicsKey physics) {
        List<TrackStep> steps = new ArrayList<>();
        steps.add(step(0.0, "pre_main_sequence", Double.NaN));
        steps.add(step(0.0005, "pre_main_sequence", 3.4e8));
        steps.add(step(0.002, "pre_main_sequence", 4.1e5));
        steps.add(step(0.007, "pre_main_sequence", 4.7e3));
        steps.add(step(0.011, "main_sequence", 3.7e3 * massMsun));
        steps.add(step(0.3, "main_sequence", 3.6e3 * massMsun));
        steps.add(step(0.6, "main_sequence", 3.5e3 * massMsun));
        return new TrackedModel(new TrackOrigin(id, massMsun, zInit, physics), new Track(id, steps));
    }

    private static TrackTimeline birth(String id) {
        return new TrackTimeline(true, 0.011);
    }

    @Test
    void dropsTheSpikeOfANewRadiativeCoreAboveItsRangeAndSaysHowMuch() {
        PeriodSpacingData data = PeriodSpacingAgainstAge.build(PHYSICS, 0.02,
                List.of(star("a", 1.0, 0.02, PHYSICS)), PeriodSpacingAgainstAgeTest::birth);

        // range: 1.3 x the largest main-sequence spacing, 3.7e3 s
        assertThat(data.capS()).isCloseTo(1.3 * 3.7e3, org.assertj.core.data.Offset.offset(1e-9));
        assertThat(data.stepsAboveCap()).isEqualTo(2);
        assertThat(data.fromBirth()).isTrue();
        assertThat(data.lines()).singleElement().satisfies(line -> {
            assertThat(line.points()).extracting(SpacingPoint::spacingS).containsExactly(4.7e3, 3.7e3, 3.6e3, 3.5e3);
            assertThat(line.points()).extracting(SpacingPoint::preMainSequence)
                    .containsExactly(true, false, false, false);
        });
    }

    @Test
    void aYoungGridsSpacingsFromAFewMyrAreDrawnOnALogarithmicAgeAxis() {
        // a cavity from 3 Myr to a last age of 250 Myr (a young cluster's grid): linear in Gyr, the pre-main sequence
        // was squeezed against the left edge under a tick reading ".05"
        TrackedModel young = new TrackedModel(new TrackOrigin("y", 1.0, 0.02, PHYSICS), new Track("y", List.of(
                step(0.0, "pre_main_sequence", Double.NaN), step(0.003, "pre_main_sequence", 7.0e3),
                step(0.02, "main_sequence", 3.1e3), step(0.25, "main_sequence", 3.0e3))));
        PeriodSpacingData data = PeriodSpacingAgainstAge.build(PHYSICS, 0.02, List.of(young), id ->
                new TrackTimeline(true, 0.02));
        var chart = PeriodSpacingAgainstAgeRenderer.render(data, MetallicityNames.Z_ONLY);
        assertThat(chart.getStyler().isXAxisLogarithmic()).isTrue();
        assertThat(chart.getXAxisTitle()).isEqualTo("age since birth (logarithmic)");
    }

    @Test
    void drawsOnlyTheStarsOfItsMetallicityAndPhysicsWithACavity() {
        TrackedModel fullyConvective = new TrackedModel(new TrackOrigin("fc", 0.2, 0.02, PHYSICS),
                new Track("fc", List.of(step(0.0, "pre_main_sequence", Double.NaN),
                        step(0.6, "main_sequence", Double.NaN))));
        PeriodSpacingData data = PeriodSpacingAgainstAge.build(PHYSICS, 0.02, List.of(star("b", 1.2, 0.02, PHYSICS),
                star("c", 1.0, 0.014, PHYSICS), star("d", 1.0, 0.02, OTHER_PHYSICS), fullyConvective,
                star("a", 0.8, 0.02, PHYSICS)), PeriodSpacingAgainstAgeTest::birth);

        assertThat(data.lines()).extracting(SpacingLine::massMsun).containsExactly(0.8, 1.2);
        assertThat(data.tracksWithSpacing()).isEqualTo(2);
    }

    @Test
    void spreadsASelectionOverTheMassesLowestAndHighestIncluded() {
        List<TrackedModel> many = new ArrayList<>();
        for (int i = 0; i < 12; i++) {
            many.add(star("m" + i, 0.5 + 0.1 * i, 0.02, PHYSICS));
        }
        PeriodSpacingData data = PeriodSpacingAgainstAge.build(PHYSICS, 0.02, many,
                PeriodSpacingAgainstAgeTest::birth);

        assertThat(data.lines()).hasSize(PeriodSpacingAgainstAge.MAX_LINES);
        assertThat(data.tracksWithSpacing()).isEqualTo(12);
        assertThat(data.lines().get(0).massMsun()).isEqualTo(0.5);
        assertThat(data.lines().get(data.lines().size() - 1).massMsun()).isCloseTo(1.6,
                org.assertj.core.data.Offset.offset(1e-12));
        assertThat(PeriodSpacingAgainstAgeRenderer.selectionNote(7, 12)).startsWith("7 of the 12 stars");
    }

    @Test
    void withoutAMainSequenceTheRangeFollowsTheLastSpacings() {
        TrackedModel young = new TrackedModel(new TrackOrigin("y", 1.0, 0.02, PHYSICS), new Track("y", List.of(
                step(0.0005, "pre_main_sequence", 3.4e8), step(0.002, "pre_main_sequence", 6.0e3),
                step(0.004, "pre_main_sequence", 5.0e3))));
        PeriodSpacingData data = PeriodSpacingAgainstAge.build(PHYSICS, 0.02, List.of(young),
                PeriodSpacingAgainstAgeTest::birth);

        assertThat(data.capS()).isCloseTo(1.3 * 5.0e3, org.assertj.core.data.Offset.offset(1e-9));
        assertThat(data.lines()).singleElement()
                .satisfies(l -> assertThat(l.points()).extracting(SpacingPoint::spacingS).containsExactly(6.0e3, 5.0e3));
    }

    @Test
    void readsThePeriodSpacingOfATrackFileAndNothingFromOneWrittenBeforeIt() throws Exception {
        String withColumn = "age_gyr,phase,period_spacing_l1_s\n0.1,main_sequence,3711.406\n0.2,main_sequence,\n";
        String without = "age_gyr,phase\n0.1,main_sequence\n";

        assertThat(TrackReader.read(new StringReader(withColumn))).extracting(TrackStep::periodSpacingL1S)
                .containsExactly(3711.406, Double.NaN);
        assertThat(TrackReader.read(new StringReader(without))).extracting(TrackStep::periodSpacingL1S)
                .containsExactly(Double.NaN);
    }

    @Test
    void drawsAChartOfTheStandardSize(@TempDir Path dir) throws Exception {
        PeriodSpacingData data = PeriodSpacingAgainstAge.build(PHYSICS, 0.02, List.of(star("a", 1.0, 0.02, PHYSICS),
                star("b", 1.5, 0.02, PHYSICS)), PeriodSpacingAgainstAgeTest::birth);
        Path png = dir.resolve("period-spacing-vs-age.png");
        ChartFiles.writePng(PeriodSpacingAgainstAgeRenderer.render(data, MetallicityNames.Z_ONLY), png);

        BufferedImage image = ImageIO.read(png.toFile());
        assertThat(image.getWidth()).isEqualTo(1200);
        assertThat(image.getHeight()).isEqualTo(800);
    }
}
