package org.convgrid.engine.physics.opacity;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;
import org.convgrid.engine.state.Composition;
import org.junit.jupiter.api.Test;

class ScaledOpacityTest extends OpacityContractTest {

    @Override
    Opacity opacity() {
        return new ScaledOpacity(AnalyticCompositeOpacity.standard(), 1.3);
    }

    @Test
    void multipliesKappaAndKeepsDerivatives() {
        Opacity base = AnalyticCompositeOpacity.standard();
        Composition c = Composition.scaledSolar(0.7, 0.02);
        OpacityValue a = base.rosselandMean(0.19, 2.2e6, c);
        OpacityValue b = new ScaledOpacity(base, 1.3).rosselandMean(0.19, 2.2e6, c);
        assertThat(b.kappa()).isCloseTo(1.3 * a.kappa(), within(1e-12 * a.kappa()));
        assertThat(b.dlnKappaDlnRho()).isEqualTo(a.dlnKappaDlnRho());
        assertThat(b.dlnKappaDlnT()).isEqualTo(a.dlnKappaDlnT());
        assertThat(ScaledOpacity.of(base, 1.0)).isSameAs(base);
    }

    @Test
    void rejectsNonPositiveFactor() {
        assertThatThrownBy(() -> new ScaledOpacity(AnalyticCompositeOpacity.standard(), 0.0))
                .isInstanceOfSatisfying(ConvgridException.class,
                        e -> assertThat(e.kind()).isEqualTo(ErrorKind.OUT_OF_RANGE));
    }
}
