package org.convgrid.engine.physics.opacity;

import java.util.Objects;
import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.state.Composition;

/**
 * Another opacity times a constant factor, for the {@code opacity_scale} physics input (1 = as published).
 * A constant factor leaves the logarithmic derivatives unchanged. No paper of its own: the physics is the scaled
 * opacity's, with its citations; scaling an opacity to test a model's sensitivity is common practice.
 *
 * @param inner the opacity to scale
 * @param factor positive multiplier
 */
public record ScaledOpacity(Opacity inner, double factor) implements Opacity {

    /** Largest factor accepted; anything beyond is surely a typing error. */
    public static final double MAX_FACTOR = 100.0;

    public ScaledOpacity {
        Objects.requireNonNull(inner, "inner");
        ConvgridException.requireInRange("opacityScale", factor, Double.MIN_NORMAL, MAX_FACTOR, "");
    }

    /** The inner opacity itself when the factor is exactly 1, otherwise a scaled wrapper. */
    public static Opacity of(Opacity inner, double factor) {
        return factor == 1.0 ? Objects.requireNonNull(inner) : new ScaledOpacity(inner, factor);
    }

    @Override
    public OpacityValue rosselandMean(double density, double temperature, Composition composition) {
        OpacityValue v = inner.rosselandMean(density, temperature, composition);
        return new OpacityValue(factor * v.kappa(), v.dlnKappaDlnRho(), v.dlnKappaDlnT());
    }

    /** The inner opacity at the composition, scaled alike. */
    @Override
    public OpacityAtComposition atComposition(Composition composition) {
        OpacityAtComposition at = inner.atComposition(composition);
        return (density, temperature) -> {
            OpacityValue v = at.rosselandMean(density, temperature);
            return new OpacityValue(factor * v.kappa(), v.dlnKappaDlnRho(), v.dlnKappaDlnT());
        };
    }

    /** The inner opacity's aid, scaled alike. */
    @Override
    public Opacity relaxationAid() {
        Opacity aid = inner.relaxationAid();
        return aid == inner ? this : of(aid, factor);
    }
}
