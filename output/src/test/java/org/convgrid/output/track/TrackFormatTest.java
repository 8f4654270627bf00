package org.convgrid.output.track;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.convgrid.engine.birth.Phase;
import org.convgrid.engine.birth.TrackPoint;
import org.convgrid.engine.convection.ConvectiveZone;
import org.convgrid.engine.error.ErrorKind;
import org.convgrid.engine.evolution.EvolutionStep;
import org.convgrid.engine.request.SeismicScales;
import org.convgrid.engine.units.Constants;
import org.convgrid.output.CsvNumbers;
import org.convgrid.output.OutputFormatException;
import org.convgrid.output.Span;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** What {@link TrackWriter} writes, {@link TrackReader} reads back: one column list serves both. */
class TrackFormatTest {

    private static EvolutionStep step(double ageGyr, List<ConvectiveZone> zones) {
        return new EvolutionStep(ageGyr * Constants.GYR, 1e6 * Constants.YEAR, 1.25 * Constants.L_SUN,
                0.9 * Constants.R_SUN, 5800.0, 1.5e7, 150.0, 0.7 - 0.1 * ageGyr, zones, 0.0, 0.3, 7);
    }

    /** A core, a shell and an envelope: more zones than the track's own columns hold. */
    private static List<ConvectiveZone> threeZones(double coreTop, double envelopeBase) {
        return List.of(new ConvectiveZone(0.0, coreTop, 0.0, 0.05), new ConvectiveZone(0.4, 0.45, 0.3, 0.32),
                new ConvectiveZone(envelopeBase, 1.0, 0.7, 1.0));
    }

    private static List<TrackPoint> track() {
        return List.of(
                new TrackPoint(step(0.001, List.of(new ConvectiveZone(0.0, 1.0, 0.0, 1.0))), Phase.PRE_MAIN_SEQUENCE,
                        0.2, 0.9, 1e-6),
                new TrackPoint(step(1.5, threeZones(0.08, 0.7)), Phase.MAIN_SEQUENCE, 1.0, 0.25, 0.0));
    }

    @Test
    void everyStepCarriesItsOvershootMixedCoreTop() throws Exception {
        List<ConvectiveZone> cored = threeZones(0.08, 0.7);
        EvolutionStep plain = step(1.0, cored);
        EvolutionStep overshot = new EvolutionStep(plain.age(), plain.timeStep(), plain.luminosity(), plain.radius(),
                plain.effectiveTemperature(), plain.centralTemperature(), plain.centralDensity(),
                plain.centralHydrogen(), cored, plain.burningInner(), plain.burningOuter(), plain.iterations(),
                new SeismicScales(3000.0, 3529.3, 2086.3, 630.0), 0.095, 25.0 * Constants.DAY,
                38.5 * Constants.DAY, 7.0e53, 1.5e52);
        StringBuilder text = new StringBuilder();
        TrackWriter.write(Constants.M_SUN, List.of(
                new TrackPoint(step(0.001, List.of(new ConvectiveZone(0.0, 1.0, 0.0, 1.0))), Phase.PRE_MAIN_SEQUENCE,
                        0.2, 0.9, 1e-6),
                new TrackPoint(plain, Phase.MAIN_SEQUENCE, 1.0, 0.25, 0.0),
                new TrackPoint(overshot, Phase.MAIN_SEQUENCE, 1.0, 0.25, 0.0)), text);
        String[] lines = text.toString().split("\n");
        int column = TrackColumns.ALL.indexOf(TrackColumns.CORE_MIXED);
        // the p-mode scales' three columns, the turnover times and the moments of inertia follow it
        assertThat(column).isEqualTo(TrackColumns.ALL.size() - 8);
        // fully convective: no core to mix; no overshoot: the zone's own top; overshoot: the mixed edge above it
        assertThat(lines[1].split(",", -1)[column]).isEmpty();
        assertThat(lines[2].split(",", -1)[column]).isEqualTo("0.08");
        assertThat(lines[3].split(",", -1)[column]).isEqualTo("0.095");
        // the step's p-mode scales, as the catalogue writes them: Delta nu = 1 / (2 T) in microHz (Tassoul 1980, ApJS
        // 43, 469; from memory), the envelope base's depth in s; empty for a step made without its model
        int separation = TrackColumns.ALL.indexOf(TrackColumns.LARGE_SEPARATION);
        assertThat(List.of(lines[3].split(",", -1)).subList(separation, separation + 3))
                .containsExactly(CsvNumbers.format(0.5e6 / 3529.3), "2086.3", "630.0");
        assertThat(List.of(lines[2].split(",", -1)).subList(separation, separation + 3))
                .containsExactly("", "", "");
        // the envelope's turnover times in days, as the catalogue gives them; empty for a step made without its model
        int turnover = TrackColumns.ALL.indexOf(TrackColumns.TURNOVER_TIME);
        assertThat(List.of(lines[3].split(",", -1)).subList(turnover, turnover + 2)).containsExactly("25.0", "38.5");
        assertThat(List.of(lines[2].split(",", -1)).subList(turnover, turnover + 2)).containsExactly("", "");
    }

    @Test
    void whatTheWriterWritesTheReaderReads(@TempDir Path dir) throws Exception {
        StringBuilder text = new StringBuilder();
        TrackWriter.write(Constants.M_SUN, track(), text);
        assertThat(text.toString()).startsWith(String.join(",", TrackColumns.ALL) + "\n");
        // one number or one label per cell: no packed lists
        assertThat(text.toString()).doesNotContain(";");
        List<TrackStep> steps = TrackReader.read(new StringReader(text.toString()));
        assertThat(steps).hasSize(2);
        TrackStep young = steps.get(0);
        assertThat(young.phase()).isEqualTo("pre_main_sequence");
        assertThat(young.surfaceLiRel()).isEqualTo(0.9);
        assertThat(young.convZones()).containsExactly(new Span(0.0, 1.0));
        TrackStep last = steps.get(1);
        assertThat(last.phase()).isEqualTo("main_sequence");
        assertThat(last.ageGyr()).isEqualTo(1.5);
        assertThat(last.luminosityLsun()).isEqualTo(1.25);
        assertThat(last.radiusRsun()).isEqualTo(0.9);
        assertThat(last.teffK()).isEqualTo(5800.0);
        assertThat(last.centralTempK()).isEqualTo(1.5e7);
        assertThat(last.centralDensityCgs()).isEqualTo(150.0);
        assertThat(last.centralHFrac()).isCloseTo(0.55, within(1e-12));
        assertThat(last.surfaceLiRel()).isEqualTo(0.25);
        assertThat(last.logGCgs()).isCloseTo(Math.log10(Constants.G * Constants.M_SUN
                / Math.pow(0.9 * Constants.R_SUN, 2)), within(1e-6));
        // without the zone table: the central and the surface zone from the track's own columns
        assertThat(last.convZones()).containsExactly(new Span(0.0, 0.08), new Span(0.7, 1.0));
        assertThat(last.burningZone()).isEqualTo(new Span(0.0, 0.3));

        // with the zone table beside it: every zone, the shell included
        StringBuilder zones = new StringBuilder();
        TrackWriter.writeZones(track(), zones);
        assertThat(zones.toString()).startsWith(String.join(",", TrackColumns.ZONES) + "\n");
        Files.writeString(dir.resolve("p0-z0-m0.csv"), text);
        Files.writeString(dir.resolve("p0-z0-m0.zones.csv"), zones);
        List<Track> all = TrackReader.readAll(dir);
        assertThat(all).hasSize(1);
        assertThat(all.get(0).trackId()).isEqualTo("p0-z0-m0");
        assertThat(all.get(0).steps().get(1).convZones())
                .containsExactly(new Span(0.0, 0.08), new Span(0.4, 0.45), new Span(0.7, 1.0));
        assertThat(all.get(0).steps().get(0).convZones()).containsExactly(new Span(0.0, 1.0));
    }

    @Test
    void aTrackFromTheZeroAgeMainSequenceLeavesLithiumAndTheNuclearFractionEmpty() throws Exception {
        StringBuilder text = new StringBuilder();
        TrackWriter.write(Constants.M_SUN, List.of(new TrackPoint(step(0.0, threeZones(0.1, 0.75)),
                Phase.MAIN_SEQUENCE, Double.NaN, Double.NaN, Double.NaN)), text);
        String row = text.toString().split("\n")[1];
        String[] cells = row.split(",", -1);
        assertThat(cells[TrackColumns.ALL.indexOf(TrackColumns.SURFACE_LI)]).isEmpty();
        assertThat(cells[TrackColumns.ALL.indexOf(TrackColumns.NUCLEAR_FRACTION)]).isEmpty();
        assertThat(cells[TrackColumns.ALL.indexOf(TrackColumns.CONV_ZONE_COUNT)]).isEqualTo("3");
        assertThat(TrackReader.read(new StringReader(text.toString())).get(0).surfaceLiRel()).isNaN();
    }

    @Test
    void theCentralAndEnvelopeColumnsFollowTheCataloguesRules() throws Exception {
        // 0.9999992 was written for a fully convective first step (documented: 1) and 1.0 for the envelope base
        // of 1.6 Msun main-sequence steps whose only surface zone is the thin hydrogen-ionisation layer, which the
        // catalogue does not count as an envelope (ConvectiveZoneFinder: under 1e-6 of the mass)
        List<ConvectiveZone> fullyConvective = List.of(new ConvectiveZone(0.0, 0.9999992, 0.0, 0.9995));
        List<ConvectiveZone> coreAndIonisationLayer = List.of(new ConvectiveZone(0.0, 0.15, 0.0, 0.1),
                new ConvectiveZone(1.0 - 3e-9, 1.0, 0.998, 1.0));
        List<ConvectiveZone> coreAndThinEnvelope = List.of(new ConvectiveZone(0.0, 0.15, 0.0, 0.1),
                new ConvectiveZone(1.0 - 2e-5, 1.0, 0.97, 1.0));
        StringBuilder text = new StringBuilder();
        TrackWriter.write(Constants.M_SUN, List.of(
                new TrackPoint(step(0.0, fullyConvective), Phase.PRE_MAIN_SEQUENCE, 0.0, 1.0, 1e-5),
                new TrackPoint(step(0.1, coreAndIonisationLayer), Phase.MAIN_SEQUENCE, 1.0, 1.0, 0.0),
                new TrackPoint(step(0.2, coreAndThinEnvelope), Phase.MAIN_SEQUENCE, 1.0, 1.0, 0.0)), text);
        String[] rows = text.toString().split("\n");
        int top = TrackColumns.ALL.indexOf(TrackColumns.CENTRAL_CZ_TOP);
        int base = TrackColumns.ALL.indexOf(TrackColumns.ENV_CZ_BASE);
        int count = TrackColumns.ALL.indexOf(TrackColumns.CONV_ZONE_COUNT);
        String[] first = rows[1].split(",", -1);
        assertThat(first[top]).isEqualTo("1.0");
        assertThat(first[base]).isEqualTo("0.0");
        String[] ionisation = rows[2].split(",", -1);
        assertThat(ionisation[top]).isEqualTo("0.15");
        assertThat(ionisation[base]).isEmpty();
        // still a zone of the step, listed in the zone table
        assertThat(ionisation[count]).isEqualTo("2");
        String[] envelope = rows[3].split(",", -1);
        assertThat(envelope[base]).isEqualTo("0.99998");
    }

    @Test
    void aTrackFileOfTheEarlierLayoutIsRefusedWithTheWayOut() {
        String old = "age_gyr,luminosity_lsun,conv_zones_mass_frac,burning_zone_mass_frac\n0.0,1.0,0-0.1;0.7-1,0-0.3\n";
        assertThatThrownBy(() -> TrackReader.read(new StringReader(old)))
                .isInstanceOfSatisfying(OutputFormatException.class,
                        e -> assertThat(e.kind()).isEqualTo(ErrorKind.RUN_CONFLICT))
                .hasMessageContaining("conv_zones_mass_frac").hasMessageContaining("run the grid again");
    }
}
