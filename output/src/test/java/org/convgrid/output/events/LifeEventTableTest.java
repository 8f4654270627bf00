package org.convgrid.output.events;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.StringReader;
import java.util.List;
import org.convgrid.output.IronAbundance;
import org.convgrid.engine.birth.LifeEvents;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.units.Constants;
import org.junit.jupiter.api.Test;

/** {@code life_events.csv}: Myr since birth, empty cells for events that did not happen, one row per star. */
class LifeEventTableTest {

    private static final double MYR = 1.0e6 * Constants.YEAR;

    private static LifeEventRow row(String id, double massMsun, double zamsMyr) {
        ModelRequest first = new ModelRequest(id + "-a00", massMsun * Constants.M_SUN, 0.02, 0.28, 0.0,
                PhysicsOptions.DEFAULT);
        return LifeEventRow.of(id, first, new LifeEvents(1.7 * MYR, Double.NaN, zamsMyr * MYR, Double.NaN,
                Double.NaN, 322.4412 * MYR, 12.5 * MYR, 16.25 * MYR, Double.NaN), 600.0 * MYR);
    }

    @Test
    void eventsAreWrittenInMyrWithEmptyCellsAndReadBack() throws Exception {
        StringBuilder text = new StringBuilder();
        LifeEventWriter.write(List.of(row("p0-z00-m001", 1.0, 48.85)), IronAbundance.DEFAULT, text);
        assertThat(text.toString()).isEqualTo("""
                track_id,mass_msun,z_init,y_init,fe_h_dex,mixing_length,overshoot_hp,overshoot_profile,\
                radiative_core_myr,radiative_core_end_myr,zams_myr,conv_core_onset_myr,conv_core_end_myr,\
                core_envelope_merge_myr,li_halved_myr,li_one_percent_myr,central_h_exhausted_myr,track_end_myr
                p0-z00-m001,1.0,0.02,0.28,0.0668,1.8,0.0,uniform,1.7,,48.85,,,322.4412,12.5,16.25,,600.0
                """);
        List<LifeEventRow> back = LifeEventReader.read(new StringReader(text.toString()));
        assertThat(back).singleElement().satisfies(r -> {
            assertThat(r.zamsMyr()).isCloseTo(48.85, within(1e-12));
            assertThat(r.convCoreOnsetMyr()).isNaN();
            assertThat(r.radiativeCoreEndMyr()).isNaN();
            assertThat(r.trackEndMyr()).isEqualTo(600.0);
            assertThat(r.liOnePercentMyr()).isCloseTo(16.25, within(1e-12));
            assertThat(r.coreEnvelopeMergeMyr()).isCloseTo(322.4412, within(1e-9));
        });
    }

    @Test
    void theEndOfATransientRadiativeCoreFollowsItsAppearance() throws Exception {
        // a 0.26 Msun star: a radiative core from 67.45 Myr, fully convective again from 117.6 Myr
        ModelRequest first = new ModelRequest("p0-z00-m000-a00", 0.26 * Constants.M_SUN, 0.02, 0.2771, 0.0,
                PhysicsOptions.DEFAULT);
        LifeEventRow transientCore = LifeEventRow.of("p0-z00-m000", first, new LifeEvents(67.44893 * MYR,
                117.6414 * MYR, Double.NaN, Double.NaN, Double.NaN, Double.NaN, 18.22713 * MYR, Double.NaN, Double.NaN),
                250.0 * MYR);
        String line = LifeEventWriter.line(transientCore, IronAbundance.DEFAULT);
        assertThat(line)
                .isEqualTo("p0-z00-m000,0.26,0.02,0.2771,0.065,1.8,0.0,uniform,67.44893,117.6414,,,,,18.22713,,,"
                        + "250.0\n");
        assertThat(LifeEventReader.read(new StringReader(LifeEventWriter.header() + line))).singleElement()
                .satisfies(r -> assertThat(r.radiativeCoreEndMyr()).isCloseTo(117.6414, within(1e-9)));
    }

    @Test
    void aRecomputedStarKeepsItsLastRowAndTheTableIsSortedByTrackId() throws Exception {
        StringBuilder text = new StringBuilder();
        LifeEventWriter.write(List.of(row("p0-z01-m000", 0.5, 200.0), row("p0-z00-m001", 1.0, 40.0),
                row("p0-z00-m001", 1.0, 48.85)), IronAbundance.DEFAULT, text);
        List<LifeEventRow> back = LifeEventReader.read(new StringReader(text.toString()));
        assertThat(back).extracting(LifeEventRow::trackId).containsExactly("p0-z00-m001", "p0-z01-m000");
        assertThat(back.get(0).zamsMyr()).isCloseTo(48.85, within(1e-12));
    }

    @Test
    void theEndOfTheMainSequenceIsWrittenInMyrAndReadBack() throws Exception {
        ModelRequest first = new ModelRequest("p0-z00-m002-a00", 1.6 * Constants.M_SUN, 0.02, 0.28, 0.0,
                PhysicsOptions.DEFAULT);
        LifeEventRow turnOff = LifeEventRow.of("p0-z00-m002", first, new LifeEvents(0.6 * MYR, Double.NaN,
                21.6 * MYR, 10.6 * MYR, 1705.6 * MYR, Double.NaN, Double.NaN, Double.NaN, Double.NaN)
                .withCentralHydrogenExhausted(1711.0 * MYR), 1711.0 * MYR);
        String line = LifeEventWriter.line(turnOff, IronAbundance.DEFAULT);
        assertThat(line).endsWith(",1705.6,,,,1711.0,1711.0\n");
        assertThat(LifeEventReader.read(new StringReader(LifeEventWriter.header() + line)))
                .singleElement().satisfies(r -> assertThat(r.centralHExhaustedMyr()).isCloseTo(1711.0, within(1e-9)));
    }

    @Test
    void aTableWrittenBeforeTheRadiativeCoreEndAndTrackEndColumnsReadsWithThemEmpty() throws Exception {
        String older = """
                track_id,mass_msun,z_init,y_init,mixing_length,overshoot_hp,radiative_core_myr,zams_myr,\
                conv_core_onset_myr,conv_core_end_myr,li_halved_myr,central_h_exhausted_myr
                p0-z00-m001,1.0,0.02,0.28,1.8,0.0,1.7,48.85,,,12.5,
                """;
        assertThat(LifeEventReader.read(new StringReader(older))).singleElement().satisfies(r -> {
            assertThat(r.zamsMyr()).isEqualTo(48.85);
            assertThat(r.radiativeCoreEndMyr()).isNaN();
            assertThat(r.trackEndMyr()).isNaN();
            assertThat(r.coreEnvelopeMergeMyr()).isNaN();
        });
    }

    @Test
    void aTableWrittenBeforeTheExhaustionColumnReadsWithItEmpty() throws Exception {
        String older = """
                track_id,mass_msun,z_init,y_init,mixing_length,overshoot_hp,radiative_core_myr,zams_myr,\
                conv_core_onset_myr,conv_core_end_myr,li_halved_myr
                p0-z00-m001,1.0,0.02,0.28,1.8,0.0,1.7,48.85,,,12.5
                """;
        assertThat(LifeEventReader.read(new StringReader(older))).singleElement().satisfies(r -> {
            assertThat(r.liHalvedMyr()).isEqualTo(12.5);
            assertThat(r.centralHExhaustedMyr()).isNaN();
        });
    }

    @Test
    void aRowCutShortByAnInterruptionIsLeftOut() throws Exception {
        String text = LifeEventWriter.header()
                + LifeEventWriter.line(row("p0-z00-m000", 0.3, 150.0), IronAbundance.DEFAULT)
                + "p0-z00-m001,1.0,0.02";
        assertThat(LifeEventReader.read(new StringReader(text))).extracting(LifeEventRow::trackId)
                .containsExactly("p0-z00-m000");
    }
}
