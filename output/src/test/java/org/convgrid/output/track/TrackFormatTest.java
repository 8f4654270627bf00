package org.convgrid.output.track;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.StringReader;
import java.util.List;
import org.convgrid.engine.convection.ConvectiveZone;
import org.convgrid.engine.evolution.EvolutionStep;
import org.convgrid.engine.units.Constants;
import org.convgrid.output.Span;
import org.junit.jupiter.api.Test;

/** What {@link TrackWriter} writes, {@link TrackReader} reads back: one column list serves both. */
class TrackFormatTest {

    private static EvolutionStep step(double ageGyr, double coreTop, double envelopeBase) {
        return new EvolutionStep(ageGyr * Constants.GYR, 1e6 * Constants.YEAR, 1.25 * Constants.L_SUN,
                0.9 * Constants.R_SUN, 5800.0, 1.5e7, 150.0, 0.7 - 0.1 * ageGyr,
                List.of(new ConvectiveZone(0.0, coreTop, 0.0, 0.05), new ConvectiveZone(envelopeBase, 1.0, 0.7, 1.0)),
                0.0, 0.3, 7);
    }

    @Test
    void whatTheWriterWritesTheReaderReads() throws Exception {
        StringBuilder text = new StringBuilder();
        TrackWriter.write(Constants.M_SUN, List.of(step(0.0, 0.1, 0.75), step(1.5, 0.08, 0.7)), text);
        assertThat(text.toString()).startsWith(String.join(",", TrackColumns.ALL) + "\n");
        List<TrackStep> steps = TrackReader.read(new StringReader(text.toString()));
        assertThat(steps).hasSize(2);
        TrackStep last = steps.get(1);
        assertThat(last.ageGyr()).isEqualTo(1.5);
        assertThat(last.luminosityLsun()).isEqualTo(1.25);
        assertThat(last.radiusRsun()).isEqualTo(0.9);
        assertThat(last.teffK()).isEqualTo(5800.0);
        assertThat(last.centralTempK()).isEqualTo(1.5e7);
        assertThat(last.centralDensityCgs()).isEqualTo(150.0);
        assertThat(last.centralHFrac()).isCloseTo(0.55, within(1e-12));
        assertThat(last.logGCgs()).isCloseTo(Math.log10(Constants.G * Constants.M_SUN
                / Math.pow(0.9 * Constants.R_SUN, 2)), within(1e-6));
        assertThat(last.convZones()).containsExactly(new Span(0.0, 0.08), new Span(0.7, 1.0));
        assertThat(last.burningZone()).isEqualTo(new Span(0.0, 0.3));
    }
}
