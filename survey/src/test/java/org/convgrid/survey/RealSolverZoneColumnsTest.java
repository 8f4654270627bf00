package org.convgrid.survey;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.convgrid.engine.batch.GridRequests;
import org.convgrid.engine.convection.StructureClass;
import org.convgrid.engine.evolution.TrackSink;
import org.convgrid.engine.request.ModelOutcome;
import org.convgrid.engine.request.ModelRequest;
import org.convgrid.engine.request.PhysicsOptions;
import org.convgrid.engine.units.Constants;
import org.convgrid.output.catalogue.CatalogueReader;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.output.catalogue.CatalogueWriter;
import org.convgrid.output.catalogue.CatalogueZone;
import org.convgrid.output.catalogue.CatalogueZone.ZoneKind;
import org.convgrid.output.catalogue.OutcomeRows;
import org.convgrid.output.catalogue.ZoneTable;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The catalogue's zone columns and zones.csv as the production solver fills them for two zero-age stars at Z = 0.02
 * whose layouts are textbook: a 2.5 Msun star has a convective core under a radiative envelope, a 0.2 Msun star is
 * convective throughout. Both files are written and read back as a run writes them.
 */
class RealSolverZoneColumnsTest {

    private static final double Z = 0.02;
    private static final double Y = 0.28;

    @TempDir
    static Path dir;

    private static Map<String, CatalogueRow> rows;
    private static Map<String, List<CatalogueZone>> zones;
    private static String zoneText;

    @BeforeAll
    static void solveAndWrite() throws IOException {
        GridRequests solver = new GridRequests(TrackSink.NONE);
        StringWriter catalogue = new StringWriter();
        StringBuilder zoneLines = new StringBuilder(ZoneTable.headerLine());
        try (CatalogueWriter writer = CatalogueWriter.startingWithHeader(catalogue)) {
            for (double mass : new double[] {0.2, 2.5}) {
                ModelRequest request = new ModelRequest("m" + mass, mass * Constants.M_SUN, Z, Y, 0.0,
                        PhysicsOptions.DEFAULT);
                ModelOutcome outcome = solver.solve(List.of(request)).get(0);
                CatalogueRow row = OutcomeRows.toRow(outcome);
                writer.write(row);
                zoneLines.append(ZoneTable.lines(row));
            }
        }
        Path catalogueFile = Files.writeString(dir.resolve("catalogue.ecsv"), catalogue.toString());
        Path zonesFile = Files.writeString(dir.resolve("zones.csv"), zoneLines);
        rows = new java.util.HashMap<>();
        CatalogueReader.read(catalogueFile).forEach(r -> rows.put(r.modelId(), r));
        zones = ZoneTable.read(zonesFile);
        zoneText = Files.readString(zonesFile);
    }

    @Test
    void aTwoAndAHalfSolarMassStarHasACoreAndEmptyEnvelopeColumns() {
        // intermediate-mass main-sequence stars burn hydrogen by the CNO cycle in a convective core under a
        // radiative envelope (Kippenhahn, Weigert & Weiss 2012, Stellar Structure and Evolution, 2nd ed., ch. 22;
        // from memory)
        CatalogueRow row = rows.get("m2.5");
        assertThat(row.isOk()).isTrue();
        assertThat(row.structureClass()).isEqualTo(StructureClass.CONV_CORE);
        assertThat(row.envCzBaseMassFrac()).isNaN();
        assertThat(row.envCzBaseRadiusFrac()).isNaN();
        assertThat(row.envCzMassMsun()).isNaN();
        assertThat(row.turnoverTimeDays()).isNaN();
        assertThat(row.turnoverTimeGlobalDays()).isNaN();
        // the core's 10-40 % of the mass at 2.5 Msun: from memory, loose
        assertThat(row.coreCzMassFrac()).isBetween(0.1, 0.4);
        // zones.csv: the core is its innermost zone and ends where the catalogue says; no envelope or whole star
        List<CatalogueZone> list = zones.get("m2.5");
        assertThat(list).isNotEmpty();
        assertThat(list).extracting(CatalogueZone::kind).doesNotContain(ZoneKind.ENVELOPE, ZoneKind.WHOLE_STAR);
        CatalogueZone core = list.get(0);
        assertThat(core.kind()).isEqualTo(ZoneKind.CORE);
        assertThat(core.massFracInner()).isZero();
        assertThat(core.massFracOuter()).isEqualTo(row.coreCzMassFrac());
        assertThat(core.radiusFracOuter()).isEqualTo(row.coreCzRadiusFrac());
        assertThat(list.stream().filter(z -> z.kind() == ZoneKind.CORE)).hasSize(1);
    }

    @Test
    void aFifthOfASolarMassIsOneZoneFromCentreToSurfaceWithEmptyCoreColumns() {
        // M dwarfs below ~0.35 Msun are fully convective on the main sequence (Chabrier & Baraffe 1997, A&A 327,
        // 1039; from memory)
        CatalogueRow row = rows.get("m0.2");
        assertThat(row.isOk()).isTrue();
        assertThat(row.structureClass()).isEqualTo(StructureClass.FULLY_CONVECTIVE);
        assertThat(row.coreCzMassFrac()).isNaN();
        assertThat(row.coreCzRadiusFrac()).isNaN();
        assertThat(row.envCzBaseMassFrac()).isZero();
        assertThat(row.envCzBaseRadiusFrac()).isZero();
        assertThat(row.envCzMassMsun()).isCloseTo(0.2, within(1e-9));
        assertThat(row.turnoverTimeDays()).isPositive();
        // zones.csv: exactly one zone, the whole star, agreeing with the envelope columns
        List<CatalogueZone> list = zones.get("m0.2");
        assertThat(list).hasSize(1);
        CatalogueZone whole = list.get(0);
        assertThat(whole.kind()).isEqualTo(ZoneKind.WHOLE_STAR);
        assertThat(whole.massFracInner()).isEqualTo(row.envCzBaseMassFrac());
        assertThat(whole.radiusFracInner()).isEqualTo(row.envCzBaseRadiusFrac());
        assertThat(whole.massFracOuter()).isEqualTo(1.0);
        assertThat(whole.radiusFracOuter()).isEqualTo(1.0);
        String line = zoneText.lines().filter(l -> l.startsWith("m0.2,")).findFirst().orElseThrow();
        double zoneMass = Double.parseDouble(line.substring(line.lastIndexOf(',') + 1));
        assertThat(zoneMass).isCloseTo(row.envCzMassMsun(), within(1e-6));
    }
}
