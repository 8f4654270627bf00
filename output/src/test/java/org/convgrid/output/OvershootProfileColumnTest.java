package org.convgrid.output;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.io.StringReader;
import java.util.List;
import org.convgrid.output.IronAbundance;
import org.convgrid.engine.birth.LifeEvents;
import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.engine.request.GlobalProperties;
import org.convgrid.engine.request.ModelOutcome;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.request.OvershootScheme;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.convection.ConvectiveStructure;
import org.convgrid.engine.convection.ConvectiveZone;
import org.convgrid.engine.convection.StructureClass;
import org.convgrid.engine.physics.atmosphere.AtmosphereChoice;
import org.convgrid.engine.request.OpacityChoice;
import org.convgrid.engine.units.Constants;
import org.convgrid.output.catalogue.CatalogueColumns;
import org.convgrid.output.catalogue.CatalogueReader;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.catalogue.CatalogueWriter;
import org.convgrid.output.catalogue.OutcomeRows;
import org.convgrid.output.events.LifeEventReader;
import org.convgrid.output.events.LifeEventRow;
import org.convgrid.output.events.LifeEventWriter;
import org.convgrid.output.transitions.TransitionFinder;
import org.convgrid.output.transitions.TransitionReader;
import org.convgrid.output.transitions.TransitionRow;
import org.convgrid.output.transitions.TransitionWriter;
import org.junit.jupiter.api.Test;

/**
 * Every table that carries {@code overshoot_hp} says which profile it is the length of: under the uniform-ramped
 * profile 0.2 means 0.2 H_P from 2 Msun only, under the decaying one it is f, so the bare number misled (a
 * ramped run's tables and charts read like a uniform one's).
 */
class OvershootProfileColumnTest {

    private static PhysicsOptions physics(OvershootScheme profile, double length) {
        return new PhysicsOptions(1.8, length, StabilityCriterion.SCHWARZSCHILD, 1.0, OpacityChoice.BUILT_IN,
                AtmosphereChoice.DEFAULT, profile);
    }

    /** A cored 1.5 Msun model; the numbers are illustrative, not a computed model. */
    private static ModelOutcome coredStar(String id, PhysicsOptions physics) {
        ModelRequest request = new ModelRequest(id, 1.5 * Constants.M_SUN, 0.02, 0.28, 0.3 * Constants.GYR, physics);
        GlobalProperties global = new GlobalProperties(5.0 * Constants.L_SUN, 1.6 * Constants.R_SUN, 7000.0, 1.5e4,
                2.0e7, 80.0, 0.5);
        ConvectiveStructure convection = new ConvectiveStructure(List.of(new ConvectiveZone(0.0, 0.1, 0.0, 0.08)),
                StructureClass.CONV_CORE, 0.1, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN);
        return new ModelOutcome.Solved(request, global, convection, 5);
    }

    /** The overshoot_profile cell, which fe_h_dex and the g-mode period scale follow. */
    private static String profileCell(String line) {
        String[] cells = line.split(",", -1);
        return cells[CatalogueColumns.HEADER.indexOf(CatalogueColumns.OVERSHOOT_PROFILE)];
    }

    @Test
    void theCatalogueNamesEachRowsProfileAndReadsItBack() throws IOException {
        StringBuilder out = new StringBuilder();
        CatalogueWriter writer = CatalogueWriter.startingWithHeader(out);
        writer.write(OutcomeRows.toRow(coredStar("p0-z00-m000-a00", physics(OvershootScheme.MASS_RAMPED_STEP, 0.2))));
        writer.write(OutcomeRows.toRow(coredStar("p1-z00-m000-a00", physics(OvershootScheme.EXPONENTIAL, 0.016))));
        writer.write(OutcomeRows.toRow(coredStar("p2-z00-m000-a00", physics(OvershootScheme.STEP, 0.2))));
        writer.flush();
        List<String> lines = out.toString().lines().filter(l -> !l.startsWith("#")).toList();
        assertThat(profileCell(lines.get(0))).isEqualTo("overshoot_profile");
        assertThat(lines.subList(1, 4).stream().map(OvershootProfileColumnTest::profileCell))
                .containsExactly("uniform-ramped", "decaying", "uniform");
        assertThat(out.toString()).contains("{name: overshoot_profile, datatype: string, description: 'what"
                + " overshoot_hp is the length of");
        assertThat(CatalogueReader.readCompleteLines(out.toString()).stream().map(CatalogueRow::overshootProfile))
                .containsExactly(OvershootScheme.MASS_RAMPED_STEP, OvershootScheme.EXPONENTIAL, OvershootScheme.STEP);
    }

    @Test
    void aCatalogueWrittenBeforeTheColumnReadsAsUnknownAndABadNameIsAnError() throws IOException {
        StringBuilder out = new StringBuilder();
        CatalogueWriter writer = CatalogueWriter.startingWithHeader(out);
        writer.write(OutcomeRows.toRow(coredStar("p0-z00-m000-a00", physics(OvershootScheme.STEP, 0.2))));
        writer.flush();
        List<String> lines = out.toString().lines().filter(l -> !l.startsWith("#")).toList();
        // the layout before overshoot_profile had none of the columns added after it (fe_h_dex, the g-mode period
        // scale's two, the p-mode scales' two): its rows end that many cells earlier, the column's own included
        int dropped = CatalogueColumns.HEADER.size()
                - CatalogueColumns.HEADER.indexOf(CatalogueColumns.OVERSHOOT_PROFILE);
        String withoutColumn = lines.stream().map(l -> {
            int cut = l.length();
            for (int i = 0; i < dropped; i++) {
                cut = l.lastIndexOf(',', cut - 1);
            }
            return l.substring(0, cut) + "\n";
        }).reduce("", String::concat);
        CatalogueRow earlier = CatalogueReader.read(new StringReader(withoutColumn)).get(0);
        assertThat(earlier.overshootProfile()).isNull();
        assertThat(earlier.withOvershootProfileIfUnknown(OvershootScheme.EXPONENTIAL).overshootProfile())
                .isEqualTo(OvershootScheme.EXPONENTIAL);
        String misspelt = lines.get(0) + "\n" + lines.get(1).replace(",uniform", ",ramped") + "\n";
        assertThatThrownBy(() -> CatalogueReader.read(new StringReader(misspelt)))
                .isInstanceOf(OutputFormatException.class)
                .hasMessageContaining("column 'overshoot_profile'")
                .hasMessageContaining("unknown overshoot profile 'ramped' (known: uniform, decaying or uniform-ramped)");
    }

    @Test
    void transitionsNameTheProfileBesideTheLengthAndAnEarlierTableStillReads() throws IOException {
        CatalogueRow row = OutcomeRows.toRow(coredStar("p0-z00-m000-a00",
                physics(OvershootScheme.MASS_RAMPED_STEP, 0.2)));
        List<TransitionRow> rows = TransitionFinder.withDefaults().find(List.of(row));
        StringBuilder out = new StringBuilder();
        TransitionWriter.write(rows, out);
        String[] lines = out.toString().split("\n");
        assertThat(lines[0]).startsWith("z_init,y_init,fe_h_dex,age_gyr,mixing_length,overshoot_hp,overshoot_profile,"
                + "criterion,");
        assertThat(lines[1]).startsWith("0.02,0.28,0.0668,0.3,1.8,0.2,uniform-ramped,schwarzschild,");
        assertThat(TransitionReader.read(new StringReader(out.toString())).get(0).slice().overshootProfile())
                .isEqualTo(OvershootScheme.MASS_RAMPED_STEP);
        String earlier = out.toString().replace(",overshoot_profile,", ",").replace(",uniform-ramped,", ",");
        assertThat(TransitionReader.read(new StringReader(earlier)).get(0).slice().overshootProfile()).isNull();
    }

    @Test
    void lifeEventsNameTheProfileAndAnEarlierTableStillReads() throws IOException {
        ModelRequest first = new ModelRequest("p0-z00-m000-a00", 1.5 * Constants.M_SUN, 0.02, 0.28, 0.0,
                physics(OvershootScheme.EXPONENTIAL, 0.016));
        LifeEventRow row = LifeEventRow.of("p0-z00-m000", first, new LifeEvents(1.0e6 * Constants.YEAR, Double.NaN,
                Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN),
                5.0e6 * Constants.YEAR);
        String text = LifeEventWriter.header() + LifeEventWriter.line(row, IronAbundance.DEFAULT);
        assertThat(text).startsWith("track_id,mass_msun,z_init,y_init,fe_h_dex,mixing_length,overshoot_hp,"
                + "overshoot_profile,").contains("p0-z00-m000,1.5,0.02,0.28,0.0668,1.8,0.016,decaying,");
        assertThat(LifeEventReader.read(new StringReader(text)).get(0).overshootProfile())
                .isEqualTo(OvershootScheme.EXPONENTIAL);
        String earlier = text.replace(",overshoot_profile,", ",").replace(",decaying,", ",");
        assertThat(LifeEventReader.read(new StringReader(earlier)).get(0).overshootProfile()).isNull();
    }
}
