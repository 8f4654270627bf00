package org.convgrid.plotting;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import javax.imageio.ImageIO;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.plotting.style.ChartFiles;
import org.convgrid.plotting.style.ChartStyle;
import org.convgrid.output.track.TrackStep;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class RunMapsTest {

    /**
     * Budget for drawing every map of a 1000-model run. The target is 10 s (measured 3-5 s warm on 2 cores); the
     * assertion allows twice that because CI cores are shared with other jobs.
     */
    private static final double THOUSAND_MODEL_BUDGET_SECONDS = 20.0;

    @Test
    void drawsEveryChartAsAPngOfTheStatedSize(@TempDir Path dir) throws Exception {
        TestRuns.write(dir, TestRuns.demoRows());
        List<Path> files = RunMaps.drawAll(dir).written();
        // 9 slices x (mass + radius) + 1 HR diagram + transitions against Z and against age + turnover times and
        // envelope masses per Z.
        assertThat(files).hasSize(27).allSatisfy(f -> {
            assertThat(f.getParent()).isEqualTo(dir.resolve("maps"));
            BufferedImage image = ImageIO.read(f.toFile());
            assertThat(image).as(f.toString()).isNotNull();
            assertThat(image.getWidth()).isEqualTo(ChartStyle.WIDTH);
            assertThat(image.getHeight()).isEqualTo(ChartStyle.HEIGHT);
        });
        assertThat(files).extracting(f -> f.getFileName().toString()).contains(
                "zones-mass_z0.014_age4.57gyr_a1.8_ov0_schwarzschild.png",
                "zones-radius_z0.004_zams_a1.8_ov0_schwarzschild.png", "hr_a1.8_ov0_schwarzschild.png",
                "transitions-vs-z_a1.8_ov0_schwarzschild.png", "transitions-vs-age_a1.8_ov0_schwarzschild.png",
                "turnover-vs-mass_z0.004_a1.8_ov0_schwarzschild.png", "turnover-vs-mass_z0.014_a1.8_ov0_schwarzschild.png",
                "turnover-vs-mass_z0.02_a1.8_ov0_schwarzschild.png",
                "envelope-mass-vs-teff_z0.004_a1.8_ov0_schwarzschild.png");
        try (var left = Files.list(dir.resolve("maps"))) {
            assertThat(left.filter(f -> f.getFileName().toString().endsWith(".tmp"))).isEmpty();
        }
    }

    @Test
    void aRedrawRemovesTheChartsAnEarlierVersionNamedWithoutTheAgesUnit(@TempDir Path dir) throws Exception {
        TestRuns.write(dir, TestRuns.rows(new double[] {0.5, 1.0}, new double[] {0.02}, new double[] {0.02}));
        Path maps = Files.createDirectories(dir.resolve("maps"));
        // what the version before 2026-12-05 drew for this slice (age 20 Myr written as 0.02, Gyr unsaid), and a
        // chart of the user's and one of another slice, which must stay
        Path formerPng = Files.writeString(maps.resolve("zones-mass_z0.02_age0.02_a1.8_ov0_schwarzschild.png"), "x");
        Path formerSvg = Files.writeString(maps.resolve("zones-radius_z0.02_age0.02_a1.8_ov0_schwarzschild.svg"), "x");
        Path otherSlice = Files.writeString(maps.resolve("zones-mass_z0.02_age0.03_a1.8_ov0_schwarzschild.png"), "x");
        Path users = Files.writeString(maps.resolve("zones-mass_mine.png"), "x");
        List<Path> files = RunMaps.drawAll(dir).written();
        assertThat(files).extracting(f -> f.getFileName().toString())
                .contains("zones-mass_z0.02_age20myr_a1.8_ov0_schwarzschild.png");
        assertThat(formerPng).doesNotExist();
        assertThat(formerSvg).doesNotExist();
        assertThat(otherSlice).exists();
        assertThat(users).exists();
    }

    @Test
    void tracksAddOneZonesAgainstAgeChartPerTrack(@TempDir Path dir) throws Exception {
        List<CatalogueRow> rows = TestRuns.rows(new double[] {1.0, 2.0}, new double[] {0.014}, new double[] {0, 1});
        TestRuns.write(dir, rows);
        TestTracks.write(dir, rows, 40);
        List<MapEntry> plan = RunMaps.plan(RunData.read(dir));
        assertThat(plan.stream().filter(e -> e.section().equals(MapEntry.ZONES_AGE))).extracting(MapEntry::fileName)
                .containsExactly("zones-age_m1_z0.014_a1.8_ov0_schwarzschild.png",
                        // the 1 Msun track's envelope is thin in m/M: a depth chart shows it
                        "zones-age-depth_m1_z0.014_a1.8_ov0_schwarzschild.png",
                        "zones-age_m2_z0.014_a1.8_ov0_schwarzschild.png");
        List<Path> files = RunMaps.drawAll(dir).written();
        assertThat(files).hasSize(plan.size()).allSatisfy(f -> {
            BufferedImage image = ImageIO.read(f.toFile());
            assertThat(image.getWidth()).isEqualTo(ChartStyle.WIDTH);
            assertThat(image.getHeight()).isEqualTo(ChartStyle.HEIGHT);
        });
    }

    @Test
    void zonesAgainstAgeCaptionNamesTheBurningRegionAsItsLegendDoes(@TempDir Path dir) throws Exception {
        List<CatalogueRow> rows = TestRuns.rows(new double[] {1.0}, new double[] {0.014}, new double[] {0, 1});
        TestRuns.write(dir, rows);
        TestTracks.write(dir, rows, 40);
        for (MapEntry entry : RunMaps.plan(RunData.read(dir))) {
            if (!entry.fileName().startsWith("zones-age_")) {
                continue;
            }
            // the caption said "hydrogen-burning region (outlined)" beside a legend saying "nuclear burning (hatched)"
            List<String> burning = entry.chart().get().getSeriesMap().values().stream()
                    .filter(series -> series.isShowInLegend()).map(series -> series.getName())
                    .filter(name -> name.contains("burning")).toList();
            assertThat(burning).as(entry.fileName()).hasSize(1);
            assertThat(entry.caption()).contains(burning.get(0)).doesNotContain("outlined", "hydrogen-burning");
        }
    }

    @Test
    void noTracksNoZonesAgainstAgeAndOneAgeNoAgeTrend(@TempDir Path dir) throws Exception {
        TestRuns.write(dir, TestRuns.rows(TestRuns.masses(0.2, 1.6, 8), new double[] {0.014}, new double[] {0}));
        assertThat(RunMaps.plan(RunData.read(dir))).extracting(MapEntry::section)
                .doesNotContain(MapEntry.ZONES_AGE, MapEntry.TRENDS_AGE);
    }

    @Test
    void aMetallicityWithFewerThanTwoTurnoverTimesGetsNoTurnoverChart(@TempDir Path dir) throws Exception {
        // at Z = 0.004 only the 1.0 Msun model has a convective envelope (1.6 and 2.0: none); at Z = 0.014 two do
        List<CatalogueRow> rows = new java.util.ArrayList<>(TestRuns.rows(new double[] {1.0, 1.6, 2.0},
                new double[] {0.004}, new double[] {0}));
        rows.addAll(TestRuns.rows(new double[] {0.5, 1.0}, new double[] {0.014}, new double[] {0}).stream()
                .map(r -> TestRuns.row(r.modelId().replace("-z00-", "-z01-"), r.massMsun(), r.zInit(), r.ageGyr(),
                        false)).toList());
        TestRuns.write(dir, rows);
        assertThat(RunMaps.plan(RunData.read(dir))).filteredOn(e -> e.section().equals(MapEntry.TURNOVER))
                .extracting(MapEntry::fileName, MapEntry::group)
                .containsExactly(org.assertj.core.groups.Tuple.tuple("turnover-vs-mass_z0.014_a1.8_ov0_schwarzschild.png",
                        "Z = 0.014"));
        assertThat(RunMaps.isChartFile(Path.of("turnover-vs-mass_z0.014_a1.8_ov0_schwarzschild.png"))).isTrue();
        // the caption names only what the chart has: 0.5 and 1 Msun are neither fully convective nor bracket a limit
        // (it named hollow markers and dotted lines whatever the chart held)
        assertThat(RunMaps.plan(RunData.read(dir))).filteredOn(e -> e.section().equals(MapEntry.TURNOVER))
                .singleElement().satisfies(e -> assertThat(e.caption()).doesNotContain("hollow")
                        .doesNotContain("dotted").contains("local (solid with markers) and global (dashed)"));
    }

    @Test
    void writesVectorFilesWhenAsked(@TempDir Path dir) throws Exception {
        TestRuns.write(dir, TestRuns.rows(TestRuns.masses(0.2, 1.6, 8), new double[] {0.014}, new double[] {0}));
        List<Path> files = RunMaps.drawAll(dir, Set.of(ChartFiles.VectorFormat.SVG, ChartFiles.VectorFormat.PDF)).written();
        Path svg = dir.resolve("maps/hr_a1.8_ov0_schwarzschild.svg");
        Path pdf = dir.resolve("maps/hr_a1.8_ov0_schwarzschild.pdf");
        assertThat(files).contains(svg, pdf);
        assertThat(Files.readString(svg)).contains("<svg");
        assertThat(new String(Files.readAllBytes(pdf), 0, 5, java.nio.charset.StandardCharsets.US_ASCII))
                .isEqualTo("%PDF-");
    }

    @Test
    void thousandModelRunIsDrawnWithinBudget(@TempDir Path dir) throws Exception {
        // 56 masses x 6 metallicities x 3 ages = 1008 models.
        TestRuns.write(dir, TestRuns.rows(TestRuns.masses(0.1, 2.85, 56),
                new double[] {0.002, 0.004, 0.008, 0.014, 0.02, 0.03}, new double[] {0, 1, 4.57}));
        long start = System.nanoTime();
        List<Path> files = RunMaps.drawAll(dir).written();
        double seconds = (System.nanoTime() - start) / 1e9;
        assertThat(files).hasSize(2 * 18 + 3 + 6 + 6);
        assertThat(seconds).as("seconds for %d maps", files.size()).isLessThan(THOUSAND_MODEL_BUDGET_SECONDS);
    }

    @Test
    void tenThousandModelsWithTracksGiveABoundedNumberOfCharts() {
        // 100 masses x 10 metallicities x 10 ages = 10 000 models, one track per (mass, Z): 1000 tracks
        double[] zs = {0.0, 0.001, 0.002, 0.004, 0.006, 0.008, 0.01, 0.014, 0.02, 0.03};
        double[] ages = {0, 0.1, 0.2, 0.4, 0.6, 0.8, 1, 2, 3, 4};
        List<CatalogueRow> rows = TestRuns.rows(TestRuns.masses(0.1, 2.08, 100), zs, ages);
        // one step each, enough to give the track's mass (from its log g and radius)
        List<org.convgrid.output.track.Track> tracks = rows.stream()
                .filter(r -> r.ageGyr() == 0).map(r -> new org.convgrid.output.track.Track(
                        org.convgrid.output.track.Track.trackIdOf(r.modelId()), List.of(new TrackStep(0, "",
                        r.luminosityLsun(), r.radiusRsun(), r.teffK(), r.logGCgs(), Double.NaN, Double.NaN,
                        Double.NaN, Double.NaN, List.of(), null)))).toList();
        RunData run = new RunData(rows, List.of(), false, null, java.util.Map.of(), tracks);
        List<MapEntry> plan = RunMaps.plan(run);
        assertThat(run.trackedModels()).hasSize(1000);
        assertThat(plan.stream().filter(e -> e.section().equals(MapEntry.ZONES_AGE)))
                .hasSizeLessThanOrEqualTo(org.convgrid.plotting.tracks.AgeChartSelection.MAX_CHARTS);
        // per slice a mass and a radius map, one HR diagram, a turnover and an envelope chart per Z, and the bounded
        // zones-against-age selection
        assertThat(plan).hasSizeLessThanOrEqualTo(2 * 100 + 1 + 10 + 10
                + org.convgrid.plotting.tracks.AgeChartSelection.MAX_CHARTS);
    }
}
