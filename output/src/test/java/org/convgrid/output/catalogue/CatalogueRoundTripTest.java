package org.convgrid.output.catalogue;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.io.StringReader;
import java.util.List;
import org.convgrid.engine.request.GlobalProperties;
import org.convgrid.engine.request.ModelOutcome;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.convection.ConvectiveStructure;
import org.convgrid.engine.convection.ConvectiveZone;
import org.convgrid.engine.convection.StabilityCriterion;
import org.convgrid.engine.convection.StructureClass;
import org.convgrid.engine.units.Constants;
import org.convgrid.output.OutputFormatException;
import org.convgrid.output.Span;
import org.junit.jupiter.api.Test;

class CatalogueRoundTripTest {

    /** A solar-like outcome in cgs; the numbers are illustrative, not a computed model. */
    static ModelOutcome sunLike() {
        ModelRequest request = new ModelRequest("p0-z01-m009-a00", 1.0 * Constants.M_SUN, 0.014, 0.268,
                4.57 * Constants.GYR, PhysicsOptions.DEFAULT);
        double g = Constants.GM_SUN / (Constants.R_SUN * Constants.R_SUN);
        GlobalProperties global = new GlobalProperties(Constants.L_SUN, Constants.R_SUN, 5772.0, g, 1.57e7, 150.0,
                0.34);
        ConvectiveStructure convection = new ConvectiveStructure(
                List.of(new ConvectiveZone(0.9755, 1.0, 0.713, 1.0)), StructureClass.CONV_ENVELOPE, 0.0, 0.9755,
                0.713, 0.0245 * Constants.M_SUN, 25.0 * Constants.DAY, 40.0 * Constants.DAY);
        return new ModelOutcome.Solved(request, global, convection, 7);
    }

    static ModelOutcome failed() {
        ModelRequest request = new ModelRequest("p0-z01-m010-a00", 1.1 * Constants.M_SUN, 0.014, 0.268, 0.0,
                new PhysicsOptions(2.0, 0.1, StabilityCriterion.LEDOUX, 1.0));
        return new ModelOutcome.Failed(request, ModelStatus.NOT_CONVERGED,
                "residual 3e-2 after 40 iterations, shell 512", 40);
    }

    @Test
    void outcomeMapsToSolarUnits() {
        CatalogueRow row = OutcomeRows.toRow(sunLike());
        assertThat(row.massMsun()).isCloseTo(1.0, within(1e-15));
        assertThat(row.ageGyr()).isCloseTo(4.57, within(1e-14));
        assertThat(row.luminosityLsun()).isEqualTo(1.0);
        assertThat(row.radiusRsun()).isEqualTo(1.0);
        // log g of the Sun = 4.438 (IAU 2015 B3 nominal GM and R: g = 27400 cm s^-2)
        assertThat(row.logGCgs()).isCloseTo(4.438, within(5e-4));
        assertThat(row.envCzMassMsun()).isCloseTo(0.0245, within(1e-15));
        assertThat(row.turnoverTimeDays()).isCloseTo(25.0, within(1e-12));
        assertThat(row.convZones()).containsExactly(new Span(0.9755, 1.0));
        assertThat(row.criterion()).isEqualTo(StabilityCriterion.SCHWARZSCHILD);
    }

    @Test
    void writesHeaderOnceAndCellsInConventionsOrder() throws IOException {
        StringBuilder out = new StringBuilder();
        CatalogueWriter writer = CatalogueWriter.startingWithHeader(out);
        writer.write(OutcomeRows.toRow(sunLike()));
        writer.write(OutcomeRows.toRow(failed()));
        writer.flush();
        String[] lines = out.toString().lines().filter(l -> !l.startsWith("#")).toArray(String[]::new);
        assertThat(lines).hasSize(3);
        // the column order of the README's "Catalogue" section
        assertThat(lines[0]).startsWith("model_id,mass_msun,z_init,y_init,mixing_length,overshoot_hp,age_gyr,phase,"
                + "status,status_detail,luminosity_lsun,radius_rsun,teff_k,log_g_cgs,central_temp_k,"
                + "central_density_cgs,central_h_frac,surface_li_rel,structure_class,core_cz_mass_frac,"
                + "core_cz_radius_frac,env_cz_base_mass_frac,env_cz_base_radius_frac,env_cz_mass_msun,"
                + "turnover_time_days,solver_iterations,criterion,opacity_scale,turnover_time_global_days,"
                + "core_mixed_mass_frac,overshoot_profile,fe_h_dex,buoyancy_period_pi0_s,period_spacing_l1_s,"
                + "large_separation_uhz,surface_cz_base_acoustic_depth_s,he_ii_ionisation_acoustic_depth_s,"
                + "moment_of_inertia_g_cm2,env_cz_moment_of_inertia_g_cm2");
        // no core: its two columns empty; reals keep their point; an outcome made without its model has no Pi_0
        assertThat(lines[1]).isEqualTo("p0-z01-m009-a00,1.0,0.014,0.268,1.8,0.0,4.57,main_sequence,ok,,1.0,1.0,"
                + "5772.0,4.438068,1.57e+07,150.0,0.34,,conv_envelope,,,0.9755,0.713,0.0245,25.0,7,schwarzschild,"
                + "1.0,40.0,,uniform,-0.0992,,,,,,,");
        assertThat(lines[2]).isEqualTo("p0-z01-m010-a00,1.1,0.014,0.268,2.0,0.1,0.0,,not_converged,"
                + "\"residual 3e-2 after 40 iterations, shell 512\",,,,,,,,,,,,,,,,40,ledoux,1.0,,,uniform,-0.0992,"
                + ",,,,,,");
    }

    @Test
    void readBackAndRewriteGivesTheSameText() throws IOException {
        String text = write(List.of(OutcomeRows.toRow(sunLike()), OutcomeRows.toRow(failed())));
        List<CatalogueRow> rows = CatalogueReader.read(new StringReader(text));
        assertThat(write(rows)).isEqualTo(text);
        assertThat(rows.get(1).status()).isEqualTo(ModelStatus.NOT_CONVERGED);
        assertThat(rows.get(1).luminosityLsun()).isNaN();
        assertThat(rows.get(1).structureClass()).isNull();
        assertThat(rows.get(0).convZones()).isEmpty(); // zones live in zones.csv
        assertThat(rows.get(0).centralTempK()).isEqualTo(1.57e7);
        assertThat(rows.get(0).structureClass()).isEqualTo(StructureClass.CONV_ENVELOPE);
    }

    @Test
    void toleratesExtraColumnsAndOlderCataloguesWithoutExtensions() throws IOException {
        String text = write(List.of(OutcomeRows.toRow(sunLike())));
        String ecsv = text.lines().filter(l -> l.startsWith("#")).map(l -> l + "\n")
                .reduce("", String::concat);
        String[] lines = text.lines().filter(l -> !l.startsWith("#")).toArray(String[]::new);
        String withExtra = lines[0] + ",shard_note\n" + lines[1] + ",from shard 2\n";
        assertThat(CatalogueReader.read(new StringReader(withExtra))).singleElement()
                .extracting(CatalogueRow::modelId).isEqualTo("p0-z01-m009-a00");
        assertThat(CatalogueReader.read(new StringReader(ecsv + withExtra))).hasSize(1);
        int extensions = CatalogueColumns.EXTENSIONS.size();
        String older = cut(lines[0], extensions) + "\n" + cut(lines[1], extensions) + "\n";
        CatalogueRow row = CatalogueReader.read(new StringReader(older)).get(0);
        assertThat(row.criterion()).isNull();
        assertThat(row.opacityScale()).isEqualTo(1.0);
        assertThat(row.turnoverTimeGlobalDays()).isNaN();
        assertThat(row.coreMixedMassFrac()).isNaN();
        assertThat(row.overshootProfile()).isNull();
        assertThat(row.buoyancyPeriodPi0S()).isNaN();
        assertThat(row.periodSpacingL1S()).isNaN();
        assertThat(row.largeSeparationUhz()).isNaN();
        assertThat(row.surfaceCzBaseAcousticDepthS()).isNaN();
        assertThat(row.turnoverTimeDays()).isEqualTo(25.0);
    }

    /** A request answered without a model: an age past core-hydrogen exhaustion. */
    static ModelOutcome pastMainSequence() {
        ModelRequest request = new ModelRequest("p0-z01-m011-a00", 2.0 * Constants.M_SUN, 0.014, 0.268,
                3.0 * Constants.GYR, PhysicsOptions.DEFAULT);
        return new ModelOutcome.Failed(request, ModelStatus.PAST_MAIN_SEQUENCE,
                "core hydrogen exhausted (X_c < 1.0e-04) at 1.1 Gyr", ModelOutcome.NO_MODEL_SOLVED);
    }

    @Test
    void aRowWithoutASolvedModelHasNoIterationCountAndOldZerosReadAsNone() throws IOException {
        // the conventions: an empty cell means "not applicable", never 0 standing in for "none"; a model that was
        // attempted and did not converge keeps the count it took
        int column = CatalogueColumns.HEADER.indexOf(CatalogueColumns.SOLVER_ITERATIONS);
        ModelOutcome attempted = new ModelOutcome.Failed(failed().request(), ModelStatus.NOT_CONVERGED,
                "residual 3e-2 after 40 iterations", 40);
        String text = write(List.of(OutcomeRows.toRow(pastMainSequence()), OutcomeRows.toRow(attempted)));
        List<String> lines = text.lines().filter(l -> !l.startsWith("#")).skip(1).toList();
        assertThat(lines.get(0).split(",", -1)[column]).isEmpty();
        assertThat(lines.get(1).split(",", -1)[column]).isEqualTo("40");
        List<CatalogueRow> rows = CatalogueReader.read(new StringReader(text));
        assertThat(rows.get(0).solverIterations()).isEqualTo(ModelOutcome.NO_MODEL_SOLVED);
        assertThat(rows.get(1).solverIterations()).isEqualTo(40);
        assertThat(write(rows)).isEqualTo(text);
        // a catalogue written before wrote 0 there: still read (resume, merge, transitions, plot), written again
        // as the empty cell; a 0 in a row that is not past the main sequence stays the number it is
        String old = text.replace(lines.get(0), withCell(lines.get(0), column, "0"))
                .replace(lines.get(1), withCell(lines.get(1), column, "0"));
        List<CatalogueRow> oldRows = CatalogueReader.read(new StringReader(old));
        assertThat(oldRows).extracting(CatalogueRow::solverIterations).containsExactly(ModelOutcome.NO_MODEL_SOLVED, 0);
        assertThat(write(oldRows)).isEqualTo(text.replace(lines.get(1), withCell(lines.get(1), column, "0")));
    }

    private static String withCell(String line, int column, String cell) {
        String[] cells = line.split(",", -1);
        cells[column] = cell;
        return String.join(",", cells);
    }

    @Test
    void interruptedLastLineIsDropped() throws IOException {
        String text = write(List.of(OutcomeRows.toRow(sunLike()), OutcomeRows.toRow(failed())));
        String cutShort = text.substring(0, text.length() - 20);
        assertThat(CatalogueReader.readCompleteLines(cutShort)).extracting(CatalogueRow::modelId)
                .containsExactly("p0-z01-m009-a00");
    }

    /** A file cut inside its header says so, not "last row cut short" nor "misses the column 'model_id'". */
    @Test
    void aFileCutInsideItsHeaderSaysSo(@org.junit.jupiter.api.io.TempDir java.nio.file.Path dir) throws IOException {
        String text = write(List.of(OutcomeRows.toRow(sunLike())));
        java.nio.file.Path file = dir.resolve("catalogue.ecsv");
        java.nio.file.Files.writeString(file, text.substring(0, 500));
        assertThat(CatalogueReader.headerCutShort(text.substring(0, 500))).isTrue();
        assertThat(CatalogueReader.headerCutShort(text)).isFalse();
        assertThatThrownBy(() -> CatalogueReader.read(file)).isInstanceOf(OutputFormatException.class)
                .hasMessageContaining("its header is cut short before the column names");
        assertThatThrownBy(() -> CatalogueReader.readCompleteLines(text.substring(0, 500)))
                .hasMessageContaining("its header is cut short before the column names");
    }

    @Test
    void aFileWhoseLastRowIsCutShortSaysSoAndHowToRepairIt(@org.junit.jupiter.api.io.TempDir java.nio.file.Path dir)
            throws IOException {
        String text = write(List.of(OutcomeRows.toRow(sunLike()), OutcomeRows.toRow(failed())));
        java.nio.file.Path file = dir.resolve("catalogue.ecsv");
        // cut within the last columns: the bare message named a column of a row it could not know was cut
        java.nio.file.Files.writeString(file, text.substring(0, text.length() - 40));
        assertThatThrownBy(() -> CatalogueReader.read(file)).isInstanceOf(OutputFormatException.class)
                .hasMessageContaining("its last row is cut short").hasMessageContaining("--resume");
        // cut within the last number: what is left parses, but the row is still cut
        java.nio.file.Files.writeString(file, text.substring(0, text.length() - 1));
        assertThatThrownBy(() -> CatalogueReader.read(file)).hasMessageContaining("its last row is cut short");
        // a whole file reads as before
        java.nio.file.Files.writeString(file, text);
        assertThat(CatalogueReader.read(file)).hasSize(2);
    }

    @Test
    void missingFixedColumnOrBadCellIsReported() throws IOException {
        assertThatThrownBy(() -> CatalogueReader.read(new StringReader("model_id,mass_msun\nx,1\n")))
                .isInstanceOf(OutputFormatException.class).hasMessageContaining("z_init");
        String text = write(List.of(OutcomeRows.toRow(sunLike()))).replace(",5772.0,", ",hot,");
        assertThatThrownBy(() -> CatalogueReader.read(new StringReader(text)))
                .isInstanceOf(OutputFormatException.class).hasMessageContaining("teff_k");
    }

    private static String cut(String line, int trailingColumns) {
        String result = line;
        for (int i = 0; i < trailingColumns; i++) {
            result = result.substring(0, result.lastIndexOf(','));
        }
        return result;
    }

    private static String write(List<CatalogueRow> rows) throws IOException {
        StringBuilder out = new StringBuilder();
        CatalogueWriter writer = CatalogueWriter.startingWithHeader(out);
        writer.writeAll(rows);
        writer.flush();
        return out.toString();
    }
}
