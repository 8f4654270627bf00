package org.convgrid.survey;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.convgrid.output.IronAbundance;
import org.convgrid.engine.birth.LifeEvents;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.request.OvershootScheme;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.units.Constants;
import org.convgrid.output.events.LifeEventReader;
import org.convgrid.output.events.LifeEventRow;
import org.convgrid.output.events.LifeEventWriter;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class LifeEventLogTest {

    private static final double MYR = 1.0e6 * Constants.YEAR;

    private static LifeEventRow star(String id, double massMsun, double exhaustedMyr) {
        ModelRequest first = new ModelRequest(id + "-a00", massMsun * Constants.M_SUN, 0.02, 0.28, 0.0,
                PhysicsOptions.DEFAULT);
        return LifeEventRow.of(id, first, new LifeEvents(1.0 * MYR, Double.NaN, 30.0 * MYR, Double.NaN, Double.NaN,
                Double.NaN, Double.NaN, Double.NaN, exhaustedMyr * MYR), 2000.0 * MYR);
    }

    @Test
    void aTableBegunBeforeTheExhaustionColumnIsRewrittenBeforeTheFirstAppend(@TempDir Path dir) throws Exception {
        // a run begun by the version without central_h_exhausted_myr, resumed by this one
        Path file = dir.resolve("life_events.csv");
        Files.writeString(file, """
                track_id,mass_msun,z_init,y_init,mixing_length,overshoot_hp,radiative_core_myr,zams_myr,\
                conv_core_onset_myr,conv_core_end_myr,li_halved_myr
                p0-z00-m000,1.0,0.02,0.28,1.8,0.0,1.7,48.85,,,12.5
                """);
        LifeEventLog log = new LifeEventLog(file, IronAbundance.DEFAULT);
        log.append(star("p0-z00-m001", 1.6, 1711.0));
        log.append(star("p0-z00-m002", 1.7, 1417.0));
        List<String> lines = Files.readAllLines(file);
        assertThat(lines.get(0)).isEqualTo(LifeEventWriter.header().strip());
        List<LifeEventRow> rows = LifeEventReader.read(file);
        assertThat(rows).extracting(LifeEventRow::trackId).containsExactly("p0-z00-m000", "p0-z00-m001",
                "p0-z00-m002");
        assertThat(rows.get(0).liHalvedMyr()).isEqualTo(12.5);
        assertThat(rows.get(0).centralHExhaustedMyr()).isNaN();
        assertThat(rows.get(0).trackEndMyr()).as("unknown to the older table").isNaN();
        assertThat(rows.get(2).centralHExhaustedMyr()).isEqualTo(1417.0);
        assertThat(rows.get(2).trackEndMyr()).isEqualTo(2000.0);
    }

    /**
     * A run of an earlier version resumed with every star already done appends nothing; tidying at the end still
     * names the grid's overshoot profile in its rows, as the catalogue's upgrade does (otherwise the
     * two tables disagreed, and whether a star happened to be recomputed decided it).
     */
    @Test
    void tidyingATableOfAnEarlierVersionFillsInTheGridsOvershootProfile(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("life_events.csv");
        Files.writeString(file, """
                track_id,mass_msun,z_init,y_init,mixing_length,overshoot_hp,radiative_core_myr,zams_myr,\
                conv_core_onset_myr,conv_core_end_myr,li_halved_myr
                p0-z00-m000,1.0,0.02,0.28,1.8,0.2,1.7,48.85,,,12.5
                """);
        LifeEventLog.tidy(file, OvershootScheme.MASS_RAMPED_STEP, IronAbundance.DEFAULT);
        assertThat(Files.readAllLines(file).get(0)).isEqualTo(LifeEventWriter.header().strip());
        assertThat(Files.readAllLines(file).get(1))
                .startsWith("p0-z00-m000,1.0,0.02,0.28,0.0668,1.8,0.2,uniform-ramped,");
        assertThat(LifeEventReader.read(file)).singleElement().satisfies(
                r -> assertThat(r.overshootProfile()).isEqualTo(OvershootScheme.MASS_RAMPED_STEP));
    }

    /**
     * A table written before fe_h_dex, of a grid given in [Fe/H] against its own Sun: tidying fills the column from
     * each row's z_init and y_init against that Sun, as a fresh run writes it (log10(0.02 / 0.70 / 0.0181) = 0.1983).
     */
    @Test
    void tidyingATableWrittenBeforeFeHFillsItAgainstTheGridsSun(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("life_events.csv");
        Files.writeString(file, """
                track_id,mass_msun,z_init,y_init,mixing_length,overshoot_hp,overshoot_profile,radiative_core_myr,\
                radiative_core_end_myr,zams_myr,conv_core_onset_myr,conv_core_end_myr,li_halved_myr,\
                central_h_exhausted_myr,track_end_myr
                p0-z00-m000,1.0,0.02,0.28,1.8,0.0,uniform,1.7,,48.85,,,12.5,,600.0
                p0-z01-m000,1.0,0.0,0.2471,1.8,0.0,uniform,1.7,,48.85,,,12.5,,600.0
                """);
        LifeEventLog.tidy(file, OvershootScheme.STEP, new IronAbundance(0.0181, true));
        assertThat(Files.readAllLines(file)).containsExactly(LifeEventWriter.header().strip(),
                "p0-z00-m000,1.0,0.02,0.28,0.1983,1.8,0.0,uniform,1.7,,48.85,,,,12.5,,,600.0",
                "p0-z01-m000,1.0,0.0,0.2471,,1.8,0.0,uniform,1.7,,48.85,,,,12.5,,,600.0");
    }

    @Test
    void aNewTableGetsTheHeaderOnce(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("life_events.csv");
        LifeEventLog log = new LifeEventLog(file, IronAbundance.DEFAULT);
        log.append(star("p0-z00-m000", 1.0, Double.NaN));
        log.append(star("p0-z00-m001", 1.6, 1711.0));
        assertThat(Files.readAllLines(file)).hasSize(3).first().isEqualTo(LifeEventWriter.header().strip());
    }
}
