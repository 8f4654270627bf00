package org.convgrid.engine.physics.nuclear;

import java.util.Optional;
import org.convgrid.engine.state.Composition;

/** Hydrogen burning: energy generation and composition rates. Implementations are immutable and thread-safe. */
public interface NuclearNetwork {

    /**
     * @param density g cm^-3
     * @param temperature K
     * @param composition mass fractions
     * @return energy generation (net of neutrino losses) and composition rates
     */
    BurningRate burn(double density, double temperature, Composition composition);

    /**
     * {@link #burn}'s energy generation alone, written into {@code into}: [0] eps, erg g^-1 s^-1, [1] dln eps/dln rho,
     * [2] dln eps/dln T (the same values as {@link #burn}'s, or zeros where the network states that its energy
     * generation is negligible, e.g. {@link NegligibleBurning}). For a caller that evaluates many points and needs no
     * composition rates (the structure equations), with a scratch array of its own: a network may give these
     * without making the whole {@link BurningRate} (this default takes them from {@link #burn}).
     *
     * @param into at least three elements
     */
    default void energy(double density, double temperature, Composition composition, double[] into) {
        BurningRate r = burn(density, temperature, composition);
        into[0] = r.eps();
        into[1] = r.dlnEpsDlnRho();
        into[2] = r.dlnEpsDlnT();
    }

    /**
     * An upper bound of every composition rate |dX_i/dt| of {@link #burn} at this point (deuterium and 7Li
     * included), s^-1, where the network can state one without evaluating its reactions (e.g.
     * {@link NegligibleBurning#RATE_BOUND} where {@link NegligibleBurning} holds); positive infinity, no bound, by
     * default and wherever it cannot. For a caller that need not evaluate rates whose effect it can bound (the
     * composition step, over a step whose change they could not make matter).
     *
     * @param density g cm^-3
     * @param temperature K
     * @param composition mass fractions
     */
    default double rateBound(double density, double temperature, Composition composition) {
        return Double.POSITIVE_INFINITY;
    }

    /**
     * The composition with 3He and the CN isotopes at their local equilibrium abundances where these are reached
     * (used for zero-age models); hydrogen, 4He, oxygen and the other metals are unchanged apart from the
     * mass moved between them to keep the sum one.
     */
    Composition equilibrium(double density, double temperature, Composition composition);

    /**
     * {@link #equilibrium}'s composition, returned, and {@link #energy}'s values there written into {@code into}
     * with the slopes taken as the composition follows the state: [0] eps, erg g^-1 s^-1, [1] d ln eps/d ln rho and
     * [2] d ln eps/d ln T along the equilibrium (eps's own slopes plus sum_i d ln eps/d X_i dX_i/d ln x). For the
     * structure of a zero-age model, whose 3He and CN follow each trial state. Null, {@code into} untouched, by
     * default and wherever a network has no analytic form of these slopes (a caller then differences).
     *
     * @param initial the composition that {@link #equilibrium} relaxes
     * @param into at least three elements
     */
    default Composition equilibriumEnergy(double density, double temperature, Composition initial, double[] into) {
        return null;
    }

    /**
     * {@link #burn} with the factors of its composition rates at this point, from which the Jacobian of the rates
     * follows without further calls of {@link #burn} ({@link RateFactors}, taken from the same evaluation of the
     * rates); no factors for a network whose rates have no such form (a caller then differences {@link #burn}).
     */
    default BurningAndFactors burnAndFactors(double density, double temperature, Composition composition) {
        return new BurningAndFactors(burn(density, temperature, composition), Optional.empty());
    }

    /**
     * This network without the proton captures of deuterium and 7Li: its {@link #burn} and {@link #burnAndFactors}
     * leave out those two reactions (their energy, their dh2Dt and dli7Dt, and their share of the 1H, 3He and 4He
     * rates), at the same screening (the composition, deuterium and 7Li included, is the same). For a caller that
     * burns the two in their own exact step and takes their share out of the other rates: a network that does not
     * offer this gives itself, and the caller's taking out does the same to rounding.
     */
    default NuclearNetwork withoutLightElementCaptures() {
        return this;
    }

    /**
     * The destruction rates per unit abundance of deuterium and 7Li at this point, the same as {@link #burn}'s
     * -dh2Dt/X_D and -dli7Dt/X_Li; 0 for a species the composition does not hold. For a caller that needs these
     * two alone (the light elements' own exact step): this default takes them from {@link #burn}, and a network
     * may evaluate the two captures without the rest.
     *
     * @param density g cm^-3
     * @param temperature K
     * @param composition mass fractions
     */
    default LightElementCaptures lightElementCaptures(double density, double temperature, Composition composition) {
        double d = composition.h2();
        double li = composition.li7();
        if (!(d > 0.0) && !(li > 0.0)) {
            return LightElementCaptures.NONE;
        }
        BurningRate r = burn(density, temperature, composition);
        return new LightElementCaptures(d > 0.0 ? -r.dh2Dt() / d : 0.0, li > 0.0 ? -r.dli7Dt() / li : 0.0);
    }
}
