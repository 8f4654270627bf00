package org.convgrid.output.transitions;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.convgrid.engine.convection.StructureClass;
import org.convgrid.engine.request.ModelStatus;
import org.convgrid.output.Span;
import org.convgrid.output.catalogue.CatalogueRow;
import org.junit.jupiter.api.Test;

/** The skipped models of a bracket in words, by catalogue status, singular or plural as the count asks. */
class SkippedModelsTextTest {

    private static CatalogueRow at(double mass, ModelStatus status) {
        return TransitionFinderTest.row(0.02, mass, StructureClass.CONV_ENVELOPE, 0.0, status);
    }

    @Test
    void eachStatusInPlainWordsJoinedWithAnd() {
        List<CatalogueRow> rows = List.of(at(0.3, ModelStatus.OK), at(0.31, ModelStatus.NOT_CONVERGED),
                at(0.32, ModelStatus.FAILED), at(0.33, ModelStatus.NOT_CONVERGED),
                at(0.34, ModelStatus.PAST_MAIN_SEQUENCE), at(0.4, ModelStatus.OK), at(0.45, ModelStatus.FAILED));
        assertThat(SkippedModelsText.of(rows, new Span(0.3, 0.4))).isEqualTo(
                "2 models that did not converge, 1 model beyond the main sequence and 1 failed model");
        assertThat(SkippedModelsText.of(rows, new Span(0.31, 0.33))).isEqualTo("1 failed model");
        assertThat(SkippedModelsText.of(rows, new Span(0.3, 0.32))).isEqualTo("1 model that did not converge");
        assertThat(SkippedModelsText.of(rows, new Span(0.4, 0.5))).isEqualTo("1 failed model");
        assertThat(SkippedModelsText.of(rows, new Span(0.34, 0.4))).isEmpty();
    }
}
