package org.convgrid.engine.physics;

import org.convgrid.engine.physics.eos.EosState;
import org.convgrid.engine.physics.eos.EquationOfState;
import org.convgrid.engine.physics.nuclear.BurningRate;
import org.convgrid.engine.physics.nuclear.NuclearNetwork;
import org.convgrid.engine.physics.opacity.Opacity;
import org.convgrid.engine.physics.opacity.OpacityValue;
import org.convgrid.engine.state.Composition;

/**
 * The microphysics at one (density, temperature, composition) point, as the structure solver sees it.
 *
 * @param requested the composition asked for
 * @param composition the composition used: the requested one with 3He and CN at local equilibrium
 * @param eos thermodynamic state
 * @param opacity Rosseland-mean opacity
 * @param burning hydrogen burning
 */
public record MicrophysicsPoint(Composition requested, Composition composition, EosState eos, OpacityValue opacity, BurningRate burning) {

    /**
     * Evaluates every component at one point; 3He and the CN isotopes are first set to their local equilibrium
     * abundances (as in a zero-age model), so the energy generation is that of matter that has been burning.
     *
     * @param density g cm^-3
     * @param temperature K
     */
    public static MicrophysicsPoint evaluate(EquationOfState eos, Opacity opacity, NuclearNetwork nuclear,
                                             double density, double temperature, Composition composition) {
        Composition burning = nuclear.equilibrium(density, temperature, composition);
        return new MicrophysicsPoint(composition, burning, eos.atDensity(density, temperature, burning),
                opacity.rosselandMean(density, temperature, burning),
                nuclear.burn(density, temperature, burning));
    }
}
