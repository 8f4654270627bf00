package org.convgrid.plotting.hr;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import javax.imageio.ImageIO;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.track.Track;
import org.convgrid.output.track.TrackReader;
import org.convgrid.output.track.TrackTimeline;
import org.convgrid.plotting.TestRuns;
import org.convgrid.plotting.label.PhysicsKey;
import org.convgrid.plotting.style.ChartFiles;
import org.convgrid.plotting.style.ChartStyle;
import org.convgrid.plotting.tracks.TrackOrigin;
import org.convgrid.plotting.tracks.TrackedModel;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The HR diagram of a run from birth: pre-main-sequence tracks told apart from the main-sequence parts, young
 * isochrones labelled in Myr. The stars are made up (shapes only, nothing under test): a contraction down a cool,
 * nearly vertical line to a zero-age main sequence reached at 50 Myr (M / Msun)^-2.5.
 */
class HrPreMainSequenceTest {

    private static final double[] MASSES = {0.3, 0.5, 0.8, 1.0, 1.5, 2.0};
    private static final double[] AGES_MYR = {1, 3, 10, 30, 100};

    /** log10 Teff and log10 L of the made-up star of mass m at an age in Gyr. */
    private static double[] surface(double m, double ageGyr) {
        double zams = 0.05 * Math.pow(m, -2.5);
        double lumZams = m < 0.43 ? 0.23 * Math.pow(m, 2.3) : Math.pow(m, 4.0);
        double radiusZams = Math.pow(m, m < 1 ? 0.9 : 0.8);
        double teffZams = 5772.0 * Math.pow(lumZams / (radiusZams * radiusZams), 0.25);
        double s = Math.min(1.0, ageGyr / zams);
        double radius = radiusZams * (1.0 + 4.0 * Math.pow(1.0 - s, 1.5) / Math.pow(s + 0.01, 0.35));
        double teff = Math.min(teffZams, 3600.0 * Math.pow(m, 0.25) + (teffZams - 3600.0 * Math.pow(m, 0.25))
                * Math.pow(s, 2.0));
        double lum = radius * radius * Math.pow(teff / 5772.0, 4.0);
        return new double[] {Math.log10(teff), Math.log10(lum)};
    }

    private static String track(double m) {
        StringBuilder b = new StringBuilder("age_gyr,phase,luminosity_lsun,teff_k,central_cz_top_mass_frac,env_cz_base_mass_frac\n");
        double zams = 0.05 * Math.pow(m, -2.5);
        for (int k = 0; k <= 70; k++) {
            double age = Math.pow(10, -6 + k * 0.1);
            double[] sf = surface(m, age);
            b.append(age).append(',').append(age < zams ? "pre_main_sequence" : "main_sequence").append(',')
                    .append(Math.pow(10, sf[1])).append(',').append(Math.pow(10, sf[0])).append(",1.0,0.0\n");
        }
        return b.toString();
    }

    private static CatalogueRow at(CatalogueRow r, double ageGyr) {
        double[] sf = surface(r.massMsun(), ageGyr);
        return r.toBuilder().ageGyr(ageGyr).luminosityLsun(Math.pow(10, sf[1])).teffK(Math.pow(10, sf[0])).build();
    }

    @Test
    void preMainSequenceTracksAndYoungIsochronesLabelledInMyr(@TempDir Path dir) throws Exception {
        List<CatalogueRow> rows = new ArrayList<>();
        int i = 0;
        for (double myr : AGES_MYR) {
            for (double m : MASSES) {
                rows.add(at(TestRuns.row("p0-z00-m00" + (i % MASSES.length) + "-a0" + (i / MASSES.length), m, 0.014,
                        myr / 1000, false), myr / 1000));
                i++;
            }
        }
        List<TrackedModel> tracked = new ArrayList<>();
        Map<String, TrackTimeline> timelines = new HashMap<>();
        for (int k = 0; k < MASSES.length; k++) {
            String id = "p0-z00-m00" + k;
            String text = track(MASSES[k]);
            tracked.add(new TrackedModel(new TrackOrigin(id, MASSES[k], 0.014, PhysicsKey.of(rows.get(0))),
                    new Track(id, TrackReader.read(new StringReader(text)))));
            timelines.put(id, TrackTimeline.read(new StringReader(text)));
        }
        HrDiagramData data = HrDiagram.build(PhysicsKey.of(rows.get(0)), rows, tracked, timelines::get);
        // drawn from the youngest catalogue age (1 Myr), the part before the ZAMS counted
        assertThat(data.tracks()).hasSize(MASSES.length).allSatisfy(t -> {
            assertThat(t.preMainSequencePoints()).isPositive().isLessThan(t.logL().size());
        });
        HrDiagramData.TrackLine sun = data.tracks().get(3);
        // 1 kyr to 10 Gyr in 0.1 dex steps: from 1 Myr (step 30) on; the ZAMS at 50 Myr, after step 46
        assertThat(sun.logL()).hasSize(71 - 30);
        assertThat(sun.preMainSequencePoints()).isEqualTo(17);
        assertThat(data.isochrones()).extracting(HrDiagramData.ZeroAgeLine::age)
                .containsExactly(0.001, 0.003, 0.01, 0.03, 0.1);
        assertThat(HrDiagramRenderer.age(0.003)).isEqualTo("3 Myr");
        assertThat(HrDiagramRenderer.age(4.57)).isEqualTo("4.57 Gyr");
        assertThat(HrDiagramRenderer.ages(data.ages())).isEqualTo("ages 1 Myr, 3 Myr, 10 Myr, 30 Myr, 100 Myr");
        // without phases the same tracks are main-sequence tracks, drawn whole
        assertThat(HrDiagram.build(PhysicsKey.of(rows.get(0)), rows, tracked).tracks())
                .allSatisfy(t -> assertThat(t.preMainSequencePoints()).isZero());
        Path png = dir.resolve("hr.png");
        ChartFiles.writePng(HrDiagramRenderer.render(data), png);
        assertThat(ImageIO.read(png.toFile()).getWidth()).isEqualTo(ChartStyle.WIDTH);
        // CONVGRID_KEEP_CHARTS=DIR keeps the chart to look at
        String keep = System.getenv("CONVGRID_KEEP_CHARTS");
        if (keep != null) {
            Files.copy(png, Path.of(keep).resolve("hr-birth.png"), StandardCopyOption.REPLACE_EXISTING);
        }
    }
}
