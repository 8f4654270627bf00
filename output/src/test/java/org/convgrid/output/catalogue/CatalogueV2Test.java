package org.convgrid.output.catalogue;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;
import org.convgrid.engine.convection.ConvectiveStructure;
import org.convgrid.engine.convection.ConvectiveZone;
import org.convgrid.engine.convection.StructureClass;
import org.convgrid.engine.request.GlobalProperties;
import org.convgrid.engine.request.ModelOutcome;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.units.Constants;
import org.convgrid.output.catalogue.CatalogueZone.ZoneKind;
import org.junit.jupiter.api.Test;
import org.snakeyaml.engine.v2.api.Load;
import org.snakeyaml.engine.v2.api.LoadSettings;

/** Catalogue v2 as the README's "Catalogue" and "Zones" sections fix it. */
class CatalogueV2Test {

    private static ModelOutcome outcome(String id, double massMsun, ConvectiveStructure convection) {
        ModelRequest request = new ModelRequest(id, massMsun * Constants.M_SUN, 0.014, 0.27, 0.0,
                PhysicsOptions.DEFAULT);
        GlobalProperties global = new GlobalProperties(Constants.L_SUN, Constants.R_SUN, 5000.0, 1e4, 1e7, 100.0,
                0.7);
        return new ModelOutcome.Solved(request, global, convection, 5);
    }

    /** A fully convective star as the engine reports it: one zone, core fraction 1, envelope base 0. */
    private static ModelOutcome fullyConvective() {
        return outcome("fc", 0.2, new ConvectiveStructure(List.of(new ConvectiveZone(0.0, 1.0, 0.0, 1.0)),
                StructureClass.FULLY_CONVECTIVE, 1.0, 0.0, 0.0, 0.2 * Constants.M_SUN, 50 * Constants.DAY,
                80 * Constants.DAY));
    }

    /** A core-only star (an A star): its thin surface zone too small for an envelope, listed as a shell. */
    private static ModelOutcome coreOnly() {
        return outcome("a", 2.5, new ConvectiveStructure(List.of(new ConvectiveZone(0.0, 0.21, 0.0, 0.13),
                new ConvectiveZone(0.9999999, 1.0, 0.99, 1.0)), StructureClass.CONV_CORE, 0.21, 1.0, 1.0, 0.0,
                Double.NaN, Double.NaN));
    }

    /** A core, a zero-width zone (both ends equal at 7 digits) and an envelope. */
    private static ModelOutcome coreAndEnvelope() {
        return outcome("b", 1.2, new ConvectiveStructure(List.of(new ConvectiveZone(0.0, 0.04, 0.0, 0.06),
                new ConvectiveZone(0.5, 0.50000000001, 0.4, 0.4), new ConvectiveZone(0.99, 1.0, 0.85, 1.0)),
                StructureClass.CONV_CORE_AND_ENVELOPE, 0.04, 0.99, 0.85, 0.012 * Constants.M_SUN,
                5 * Constants.DAY, 8 * Constants.DAY));
    }

    @Test
    void theEcsvHeaderIsYamlWithEveryColumnsNameUnitAndType() throws IOException {
        StringBuilder out = new StringBuilder();
        CatalogueWriter.startingWithHeader(out).flush();
        List<String> lines = out.toString().lines().toList();
        // ECSV 1.0 (astropy APE 6, Aldcroft et al. 2015): version line, '# ---', YAML with '# ' stripped
        assertThat(lines.get(0)).isEqualTo("# %ECSV 1.0");
        assertThat(lines.get(1)).isEqualTo("# ---");
        String yaml = lines.stream().skip(2).takeWhile(l -> l.startsWith("#")).map(l -> l.substring(2))
                .collect(Collectors.joining("\n"));
        @SuppressWarnings("unchecked")
        Map<String, Object> header = (Map<String, Object>) new Load(LoadSettings.builder().build())
                .loadFromString(yaml);
        assertThat(header.get("delimiter")).isEqualTo(",");
        assertThat(header.get("schema")).isEqualTo("astropy-2.0");
        @SuppressWarnings("unchecked")
        List<Map<String, Object>> columns = (List<Map<String, Object>>) header.get("datatype");
        assertThat(columns).extracting(c -> c.get("name")).containsExactlyElementsOf(CatalogueColumns.HEADER);
        assertThat(columns).allSatisfy(c -> {
            assertThat(c.get("datatype")).isIn("string", "float64", "int64");
            assertThat((String) c.get("description")).isNotBlank();
        });
        Map<Object, Object> units = columns.stream().filter(c -> c.containsKey("unit"))
                .collect(Collectors.toMap(c -> c.get("name"), c -> c.get("unit")));
        // astropy unit strings for the units the column names carry (common practice)
        assertThat(units).containsEntry("mass_msun", "solMass").containsEntry("age_gyr", "Gyr")
                .containsEntry("luminosity_lsun", "solLum").containsEntry("radius_rsun", "solRad")
                .containsEntry("teff_k", "K").containsEntry("central_temp_k", "K")
                .containsEntry("central_density_cgs", "g / cm3").containsEntry("env_cz_mass_msun", "solMass")
                .containsEntry("turnover_time_days", "d").containsEntry("log_g_cgs", "dex(cm / s2)");
        // the row after the YAML is the column names, in the fixed order
        assertThat(lines.get(lines.size() - 1)).isEqualTo(String.join(",", CatalogueColumns.HEADER));
    }

    @Test
    void theTurnoverTimeDescriptionGivesWhereTheCodeEvaluatesIt() {
        // ConvectiveZoneFinder: half a pressure scale height above the base, capped at the envelope's radial
        // midpoint, and r = R/2 for a fully convective star (README, "Catalogue"); the cap and the
        // fully convective point were missing from the file's own description
        String description = CatalogueColumns.DESCRIBED.stream()
                .filter(c -> c.name().equals(CatalogueColumns.TURNOVER_TIME_DAYS)).findFirst().orElseThrow()
                .description();
        assertThat(description).contains("half a pressure scale height above its base")
                .contains("no higher than its radial midpoint").contains("R/2 when fully convective");
    }

    @Test
    void aFullyConvectiveStarIsOneWholeStarZoneWithEmptyCoreColumns() {
        CatalogueRow row = OutcomeRows.toRow(fullyConvective());
        assertThat(row.coreCzMassFrac()).isNaN();
        assertThat(row.coreCzRadiusFrac()).isNaN();
        assertThat(row.envCzBaseMassFrac()).isEqualTo(0.0);
        assertThat(row.envCzBaseRadiusFrac()).isEqualTo(0.0);
        assertThat(row.envCzMassMsun()).isCloseTo(0.2, within(1e-12));
        assertThat(row.zones()).singleElement().extracting(CatalogueZone::kind).isEqualTo(ZoneKind.WHOLE_STAR);
        assertThat(String.join(",", CatalogueWriter.cells(row))).contains(",fully_convective,,,0.0,0.0,0.2,");
    }

    @Test
    void aCoreOnlyStarHasEmptyEnvelopeColumns() {
        CatalogueRow row = OutcomeRows.toRow(coreOnly());
        assertThat(row.coreCzMassFrac()).isEqualTo(0.21);
        assertThat(row.coreCzRadiusFrac()).isEqualTo(0.13);
        assertThat(row.envCzBaseMassFrac()).isNaN();
        assertThat(row.envCzBaseRadiusFrac()).isNaN();
        assertThat(row.envCzMassMsun()).isNaN();
        assertThat(row.turnoverTimeDays()).isNaN();
        assertThat(row.phase()).isEqualTo("main_sequence");
        assertThat(row.surfaceLiRel()).isNaN();
        assertThat(row.zones()).extracting(CatalogueZone::kind).containsExactly(ZoneKind.CORE, ZoneKind.SHELL);
        assertThat(String.join(",", CatalogueWriter.cells(row))).contains(",conv_core,0.21,0.13,,,,,5,");
    }

    @Test
    void zonesAgreeWithTheCatalogueColumnsAndZeroWidthZonesAreDropped() {
        CatalogueRow row = OutcomeRows.toRow(coreAndEnvelope());
        assertThat(row.zones()).extracting(CatalogueZone::kind).containsExactly(ZoneKind.CORE, ZoneKind.ENVELOPE);
        assertThat(row.zones().get(0).massFracOuter()).isEqualTo(row.coreCzMassFrac());
        assertThat(row.zones().get(0).radiusFracOuter()).isEqualTo(row.coreCzRadiusFrac());
        assertThat(row.zones().get(1).massFracInner()).isEqualTo(row.envCzBaseMassFrac());
        assertThat(row.zones().get(1).radiusFracInner()).isEqualTo(row.envCzBaseRadiusFrac());
        assertThat(ZoneTable.lines(row)).isEqualTo("""
                b,0,core,0.0,0.04,0.0,0.06,0.048
                b,1,envelope,0.99,1.0,0.85,1.0,0.012
                """);
    }

    /**
     * A 1.3 Msun star at 50 Myr (Z = 0.01) with a thin envelope, as the engine found it: base at m/M 1 - 1.952236e-6,
     * mass 2.537907e-06 Msun (zones.csv had said 2.6e-06, its written ends' difference).
     */
    private static ModelOutcome thinEnvelope() {
        double envelopeMassMsun = 1.952236e-6 * 1.3;
        return outcome("t", 1.3, new ConvectiveStructure(List.of(new ConvectiveZone(0.0, 0.02676708, 0.0, 0.0652935),
                new ConvectiveZone(1.0 - 1.952236e-6, 1.0, 0.9591172, 0.999985)),
                StructureClass.CONV_CORE_AND_ENVELOPE, 0.02676708, 1.0 - 1.952236e-6, 0.9591172,
                envelopeMassMsun * Constants.M_SUN, 0.29 * Constants.DAY, 3 * Constants.DAY));
    }

    @Test
    void aThinEnvelopesZoneMassIsTheCatalogueEnvelopeMassNotItsWrittenEndsDifference() {
        CatalogueRow row = OutcomeRows.toRow(thinEnvelope());
        String cells = String.join(",", CatalogueWriter.cells(row));
        assertThat(cells).contains(",0.999998,0.9591172,2.537907e-06,");
        assertThat(ZoneTable.lines(row)).isEqualTo("""
                t,0,core,0.0,0.02676708,0.0,0.0652935,0.0347972
                t,1,envelope,0.999998,1.0,0.9591172,0.999985,2.537907e-06
                """);
    }

    /**
     * A 1.8 Msun A star at 600 Myr (Z = 0.02, Teff ~7970 K) as the engine found it: a core, a shell just above it,
     * the helium II ionisation zone and the hydrogen (and helium I) ionisation zone reaching the surface, the
     * last two holding ~2e-9 and ~1e-10 of the mass (ends and masses measured on that model).
     */
    private static ModelOutcome aStarWithSurfaceIonisationZones() {
        return outcome("a18", 1.8, new ConvectiveStructure(List.of(new ConvectiveZone(0.0, 0.106871, 0.0, 0.087117),
                new ConvectiveZone(0.121336, 0.124215, 0.091828, 0.092820),
                new ConvectiveZone(1.0 - 3.3e-9, 1.0 - 1.25e-9, 0.990759, 0.994137),
                new ConvectiveZone(1.0 - 1.04e-10, 1.0, 0.998595, 1.0)), StructureClass.CONV_CORE, 0.106871, 1.0,
                1.0, 0.0, Double.NaN, Double.NaN));
    }

    @Test
    void surfaceIonisationZonesThinnerThanTheMassPrecisionAreListedWithTheirRadiiAndMass() {
        CatalogueRow row = OutcomeRows.toRow(aStarWithSurfaceIonisationZones());
        assertThat(row.zones()).extracting(CatalogueZone::kind)
                .containsExactly(ZoneKind.CORE, ZoneKind.SHELL, ZoneKind.SHELL, ZoneKind.SHELL);
        // both m/M ends read 1.0 at 7 digits; the extent is in r/R and the mass is the zone's own (its last digit
        // is the round-off of a double m/M next to 1, ~1e-16)
        assertThat(ZoneTable.lines(row)).isEqualTo("""
                a18,0,core,0.0,0.106871,0.0,0.087117,0.1923678
                a18,1,shell,0.121336,0.124215,0.091828,0.09282,0.0051822
                a18,2,shell,1.0,1.0,0.990759,0.994137,3.69e-09
                a18,3,shell,1.0,1.0,0.998595,1.0,1.872001e-10
                """);
        assertThat(String.join(",", CatalogueWriter.cells(row))).contains(",conv_core,0.106871,0.087117,,,,,5,");
    }

    @Test
    void surfaceIonisationZonesKeepTheirMassWhenReadBackAndWrittenAgain(
            @org.junit.jupiter.api.io.TempDir java.nio.file.Path dir) throws IOException {
        CatalogueRow row = OutcomeRows.toRow(aStarWithSurfaceIonisationZones());
        StringBuilder catalogue = new StringBuilder();
        CatalogueWriter.startingWithHeader(catalogue).writeAll(List.of(row));
        String written = ZoneTable.headerLine() + ZoneTable.lines(row);
        java.nio.file.Files.writeString(dir.resolve("catalogue.ecsv"), catalogue);
        java.nio.file.Files.writeString(dir.resolve("zones.csv"), written);
        CatalogueRow back = CatalogueReader.readWithZones(dir.resolve("catalogue.ecsv"), dir.resolve("zones.csv"))
                .get(0);
        // what a merge or a resume does: read the zones, write them again
        assertThat(ZoneTable.headerLine() + ZoneTable.lines(back)).isEqualTo(written);
    }

    @Test
    void zonesReadBackOntoTheirRows(@org.junit.jupiter.api.io.TempDir java.nio.file.Path dir) throws IOException {
        List<CatalogueRow> rows = List.of(OutcomeRows.toRow(fullyConvective()), OutcomeRows.toRow(coreOnly()),
                OutcomeRows.toRow(coreAndEnvelope()));
        StringBuilder catalogue = new StringBuilder();
        CatalogueWriter.startingWithHeader(catalogue).writeAll(rows);
        StringBuilder zones = new StringBuilder(ZoneTable.headerLine());
        rows.forEach(r -> zones.append(ZoneTable.lines(r)));
        java.nio.file.Files.writeString(dir.resolve("catalogue.ecsv"), catalogue);
        java.nio.file.Files.writeString(dir.resolve("zones.csv"), zones);
        List<CatalogueRow> back = CatalogueReader.readWithZones(dir.resolve("catalogue.ecsv"),
                dir.resolve("zones.csv"));
        // each zone comes back onto its row as written: its own mass at the file's seven digits, so the same lines
        assertThat(back).extracting(r -> r.zones().size()).containsExactly(1, 2, 2);
        assertThat(back.stream().map(ZoneTable::lines).toList())
                .containsExactlyElementsOf(rows.stream().map(ZoneTable::lines).toList());
    }
}
