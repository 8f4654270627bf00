package org.convgrid.output.transitions;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.convgrid.output.transitions.TransitionFinderTest.failedAt;
import static org.convgrid.output.transitions.TransitionFinderTest.ok;

import java.io.IOException;
import java.io.StringReader;
import java.util.List;
import org.convgrid.engine.convection.StructureClass;
import org.convgrid.output.OutputFormatException;
import org.convgrid.output.Span;
import org.junit.jupiter.api.Test;

class TransitionFileTest {

    /** The header before the turn-off columns were added at its end. */
    private static final String BEFORE_TURNOFF_HEADER = "z_init,y_init,fe_h_dex,age_gyr,mixing_length,overshoot_hp,"
            + "overshoot_profile,criterion,opacity_scale,"
            + "fully_convective_limit_msun,fully_convective_bracket_lo_msun,fully_convective_bracket_hi_msun,"
            + "conv_core_onset_msun,conv_core_bracket_lo_msun,conv_core_bracket_hi_msun,transient_core_lo_msun,"
            + "transient_core_hi_msun,notes,method,tolerance_msun";
    /** The header before the lithium depletion boundary's columns were added at its end. */
    private static final String BEFORE_LITHIUM_HEADER = BEFORE_TURNOFF_HEADER
            + ",turnoff_mass_msun,turnoff_bracket_lo_msun,turnoff_bracket_hi_msun";
    private static final String HEADER = BEFORE_LITHIUM_HEADER
            + ",li_depletion_boundary_msun,li_depletion_bracket_lo_msun,li_depletion_bracket_hi_msun,"
            + "li_depletion_boundary_luminosity_lsun";

    private static String written(List<TransitionRow> rows) throws IOException {
        StringBuilder out = new StringBuilder();
        TransitionWriter.write(rows, out);
        return out.toString();
    }

    @Test
    void writesTheVersionTwoColumnsAsRealsWithEmptyCellsAndReadsBack() throws IOException {
        List<TransitionRow> rows = TransitionFinder.withDefaults().find(List.of(
                ok(0.3, StructureClass.FULLY_CONVECTIVE, 1), failedAt(0.35), ok(0.4, StructureClass.CONV_ENVELOPE, 0),
                ok(2.0, StructureClass.CONV_CORE_AND_ENVELOPE, 0.04)));
        String text = written(rows);
        String[] lines = text.split("\r?\n");
        assertThat(lines[0]).isEqualTo(HEADER);
        // no transient window: its cells are empty; a grid row has no tolerance; 2 Msun is written as 2.0
        assertThat(lines[1]).isEqualTo("0.02,0.27,0.0606,0.0,1.8,0.0,uniform,schwarzschild,1.0,0.3,0.3,0.4,2.0,0.4,"
                + "2.0,,,"
                + "fully convective bracket widened past 1 failed model,grid,,,,,,,,");
        List<TransitionRow> back = TransitionReader.read(new StringReader(text));
        assertThat(back).hasSize(1);
        assertThat(back.get(0).fullyConvective().bracket()).isEqualTo(rows.get(0).fullyConvective().bracket());
        assertThat(back.get(0).transientCore()).isNull();
        assertThat(written(back)).isEqualTo(text);
    }

    @Test
    void aRefinedRowWithAWindowKeepsItsToleranceAndWindow() throws IOException {
        TransitionRow row = TransitionFinder.withDefaults().find(List.of(ok(0.36, StructureClass.FULLY_CONVECTIVE, 1),
                ok(0.37, StructureClass.CONV_CORE_AND_ENVELOPE, 0.01), ok(0.45, StructureClass.CONV_ENVELOPE, 0),
                ok(1.1, StructureClass.CONV_ENVELOPE, 0), ok(1.2, StructureClass.CONV_CORE_AND_ENVELOPE, 0.03)))
                .get(0);
        TransitionRow refined = new TransitionRow(row.slice(), row.yInit(), row.fullyConvective(), row.convCoreOnset(),
                row.transientCore(), TransitionMethod.REFINED, Double.NaN, "").withTolerance(0.002);
        String text = written(List.of(refined));
        assertThat(text.split("\r?\n")[1]).isEqualTo("0.02,0.27,0.0606,0.0,1.8,0.0,uniform,schwarzschild,1.0,0.36,"
                + "0.36,0.37,"
                + "1.2,1.1,"
                + "1.2,0.37,0.37,,refined,0.002,,,,,,,");
        TransitionRow back = TransitionReader.read(new StringReader(text)).get(0);
        assertThat(back.toleranceMsun()).isEqualTo(0.002);
        assertThat(back.method()).isEqualTo(TransitionMethod.REFINED);
        assertThat(back.transientCore()).isEqualTo(refined.transientCore());
        // the tolerance belongs to refined rows only
        assertThat(row.withTolerance(0.002).toleranceMsun()).isNaN();
    }

    @Test
    void theTurnoffIsWrittenAtTheEndAndReadsBack() throws IOException {
        List<TransitionRow> rows = TransitionFinder.withDefaults().find(List.of(
                ok(0.3, StructureClass.FULLY_CONVECTIVE, 1), ok(0.4, StructureClass.CONV_ENVELOPE, 0),
                ok(0.8, StructureClass.CONV_ENVELOPE, 0), TransitionFinderTest.pastAt(0.85)));
        String text = written(rows);
        assertThat(text.split("\r?\n")[1]).endsWith(",grid,,0.8,0.8,0.85,,,,");
        TransitionRow back = TransitionReader.read(new StringReader(text)).get(0);
        assertThat(back.turnoff().massMsun()).isEqualTo(0.8);
        assertThat(back.turnoff().bracket()).isEqualTo(rows.get(0).turnoff().bracket());
        assertThat(written(List.of(back))).isEqualTo(text);
    }

    @Test
    void aTableWrittenBeforeTheTurnoffColumnsReadsAsOneWithoutATurnoff() throws IOException {
        String earlier = BEFORE_TURNOFF_HEADER + "\n0.02,0.27,0.0606,0.0,1.8,0.0,uniform,schwarzschild,1.0,0.3,0.3,0.4,"
                + "2.0,0.4,2.0,,,,refined,0.002\n";
        TransitionRow back = TransitionReader.read(new StringReader(earlier)).get(0);
        assertThat(back.turnoff().found()).isFalse();
        assertThat(back.turnoff().massMsun()).isNaN();
        assertThat(back.fullyConvective().massMsun()).isEqualTo(0.3);
        assertThat(back.toleranceMsun()).isEqualTo(0.002);
        assertThat(back.lithiumDepletion().found()).isFalse();
        // written again, it gains seven empty cells at the end and nothing else changes
        assertThat(written(List.of(back))).isEqualTo(earlier.replace(BEFORE_TURNOFF_HEADER, HEADER)
                .replace("0.002\n", "0.002,,,,,,,\n"));
    }

    @Test
    void theLithiumDepletionBoundaryIsWrittenLastAndReadsBack() throws IOException {
        List<TransitionRow> rows = TransitionFinder.withDefaults().find(List.of(
                ok(0.1, StructureClass.FULLY_CONVECTIVE, 1).toBuilder().surfaceLiRel(0.97).luminosityLsun(1.3e-3).build(),
                ok(0.2, StructureClass.FULLY_CONVECTIVE, 1).toBuilder().surfaceLiRel(2e-3).luminosityLsun(6e-3).build()));
        String text = written(rows);
        assertThat(text.split("\r?\n")[1]).endsWith(",grid,,,,,0.1,0.1,0.2,0.0013");
        TransitionRow back = TransitionReader.read(new StringReader(text)).get(0);
        assertThat(back.lithiumDepletion().boundary().massMsun()).isEqualTo(0.1);
        assertThat(back.lithiumDepletion().boundary().bracket()).isEqualTo(new Span(0.1, 0.2));
        assertThat(back.lithiumDepletion().luminosityLsun()).isEqualTo(1.3e-3);
        assertThat(written(List.of(back))).isEqualTo(text);
        // a table written before the lithium columns (with the turn-off's) reads as one without a boundary
        String earlier = text.replace(HEADER, BEFORE_LITHIUM_HEADER).replace(",0.1,0.1,0.2,0.0013", "");
        assertThat(TransitionReader.read(new StringReader(earlier)).get(0).lithiumDepletion().found()).isFalse();
        // a table whose luminosity column was dropped (the added columns are optional one by one) keeps its boundary
        String noLuminosity = text.replace(",li_depletion_boundary_luminosity_lsun", "").replace(",0.0013", "");
        TransitionRow without = TransitionReader.read(new StringReader(noLuminosity)).get(0);
        assertThat(without.lithiumDepletion().boundary().bracket()).isEqualTo(new Span(0.1, 0.2));
        assertThat(without.lithiumDepletion().luminosityLsun()).isNaN();
    }

    @Test
    void aFileOfTheFirstLayoutIsRefusedWithAWayOut() {
        String v1 = "z_init,age_gyr,fully_convective_limit_msun,fully_convective_bracket_msun,conv_core_onset_msun,"
                + "conv_core_bracket_msun,method\n0.014,1,0.35,0.34-0.36,,,refined\n";
        assertThatThrownBy(() -> TransitionReader.read(new StringReader(v1)))
                .isInstanceOf(OutputFormatException.class)
                .hasMessageContaining("layout before version 2")
                .hasMessageContaining("convgrid transitions RUN_DIR");
    }

    @Test
    void aMissingColumnOrAHalfBracketIsAnError() {
        assertThatThrownBy(() -> TransitionReader.read(new StringReader(HEADER.replace(",tolerance_msun", "") + "\n")))
                .isInstanceOf(OutputFormatException.class).hasMessageContaining("tolerance_msun");
        String halfBracket = HEADER + "\n0.02,0.27,0.0606,0.0,1.8,0.0,uniform,schwarzschild,1.0,0.3,0.3,,,,,,,,grid,,,,,,,"
                + "\n";
        assertThatThrownBy(() -> TransitionReader.read(new StringReader(halfBracket)))
                .isInstanceOf(OutputFormatException.class).hasMessageContaining("both be empty or both be masses");
        String halfTurnoff = HEADER + "\n0.02,0.27,0.0606,0.0,1.8,0.0,uniform,schwarzschild,1.0,,,,,,,,,,grid,,0.8,0.8,,,,"
                + "\n";
        assertThatThrownBy(() -> TransitionReader.read(new StringReader(halfTurnoff)))
                .isInstanceOf(OutputFormatException.class).hasMessageContaining("turnoff_bracket_hi_msun");
    }
}
