package org.convgrid.engine.physics.nuclear;

import java.util.Objects;
import java.util.Optional;

/**
 * {@link NuclearNetwork#burn} at one point with the {@link RateFactors} of the same rates: for a caller that needs the
 * composition rates and their Jacobian at the same point (the start of a composition step).
 *
 * @param rate energy generation and composition rates
 * @param factors the factors of the composition rates, empty for a network whose rates have no such form
 */
public record BurningAndFactors(BurningRate rate, Optional<RateFactors> factors) {

    public BurningAndFactors {
        Objects.requireNonNull(rate, "rate");
        Objects.requireNonNull(factors, "factors");
    }
}
