package org.convgrid.plotting.hr;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.convgrid.output.catalogue.CatalogueRow;
import org.convgrid.plotting.PhysicsKey;
import org.convgrid.plotting.TestRuns;
import org.junit.jupiter.api.Test;

class HrDiagramTest {

    private final List<CatalogueRow> rows = TestRuns.demoRows();
    private final HrDiagramData data = HrDiagram.build(PhysicsKey.of(rows.get(0)), rows);

    @Test
    void everyUsableModelIsAPointWithItsClass() {
        List<CatalogueRow> ok = rows.stream().filter(CatalogueRow::isOk).toList();
        assertThat(data.points()).hasSize(ok.size());
        assertThat(ok.size()).isLessThan(rows.size());
        CatalogueRow first = ok.get(0);
        HrPoint p = data.points().get(0);
        assertThat(p.modelId()).isEqualTo(first.modelId());
        assertThat(p.logTeff()).isCloseTo(Math.log10(first.teffK()), within(1e-12));
        assertThat(p.logL()).isCloseTo(Math.log10(first.luminosityLsun()), within(1e-12));
        assertThat(p.structureClass()).isEqualTo(first.structureClass());
    }

    @Test
    void oneZeroAgeLinePerMetallicityInMassOrder() {
        assertThat(data.zeroAgeLines()).extracting(HrDiagramData.ZeroAgeLine::zInit)
                .containsExactly(0.004, 0.014, 0.02);
        assertThat(data.zeroAgeLines()).allSatisfy(line -> {
            assertThat(line.ageGyr()).isZero();
            assertThat(line.points()).hasSize(39).isSortedAccordingTo(
                    java.util.Comparator.comparingDouble(HrPoint::massMsun));
            assertThat(line.points()).allSatisfy(p -> assertThat(p.ageGyr()).isZero());
        });
        assertThat(data.ages()).containsExactly(0.0, 1.0, 4.57);
    }

    @Test
    void aFewRoundMassesAreLabelled() {
        assertThat(data.massLabels()).extracting(HrPoint::massMsun).containsExactly(0.1, 0.2, 0.5, 1.0, 1.5, 2.0);
        assertThat(data.massLabels()).allSatisfy(p -> assertThat(p.zInit()).isEqualTo(0.014));
    }
}
