package org.convgrid.output.transitions;

import static org.assertj.core.api.Assertions.assertThat;
import static org.convgrid.output.transitions.TransitionFinderTest.failedAt;
import static org.convgrid.output.transitions.TransitionFinderTest.ok;

import java.io.IOException;
import java.io.StringReader;
import java.util.List;
import org.convgrid.engine.convection.StructureClass;
import org.junit.jupiter.api.Test;

class TransitionFileTest {

    @Test
    void writesConventionsColumnsFirstAndReadsBack() throws IOException {
        List<TransitionRow> rows = TransitionFinder.withDefaults().find(List.of(
                ok(0.3, StructureClass.FULLY_CONVECTIVE, 1), failedAt(0.35), ok(0.4, StructureClass.CONV_ENVELOPE, 0),
                ok(1.2, StructureClass.CONV_CORE_AND_ENVELOPE, 0.04)));
        StringBuilder out = new StringBuilder();
        TransitionWriter.write(rows, out);
        String[] lines = out.toString().split("\n");
        assertThat(lines[0]).startsWith("z_init,age_gyr,fully_convective_limit_msun,fully_convective_bracket_msun,"
                + "conv_core_onset_msun,conv_core_bracket_msun,method,");
        assertThat(lines[1]).isEqualTo("0.02,0.0,0.3,0.3-0.4,1.2,0.4-1.2,grid,1.8,0.0,schwarzschild,1.0,1,0.3-0.4,1,1,"
                + "0.4-1.2,0,1.2,0.4-1.2,fully convective bracket widened past 1 unusable model(s)");
        assertThat(TransitionReader.read(new StringReader(out.toString()))).isEqualTo(rows);
    }

    @Test
    void readsAFileWithOnlyTheFixedColumns() throws IOException {
        String text = "z_init,age_gyr,fully_convective_limit_msun,fully_convective_bracket_msun,conv_core_onset_msun,"
                + "conv_core_bracket_msun,method\n0.014,1,0.35,0.34-0.36,,,refined\n";
        TransitionRow row = TransitionReader.read(new StringReader(text)).get(0);
        assertThat(row.method()).isEqualTo(TransitionMethod.REFINED);
        assertThat(row.fullyConvective().massMsun()).isEqualTo(0.35);
        assertThat(row.convCore().found()).isFalse();
        assertThat(row.slice().criterion()).isNull();
    }
}
