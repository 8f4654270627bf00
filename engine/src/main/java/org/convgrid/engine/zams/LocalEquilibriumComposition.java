package org.convgrid.engine.zams;

import org.convgrid.engine.physics.nuclear.NuclearNetwork;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.structure.ShellComposition;

/**
 * The zero-age assumption as a {@link ShellComposition}: every shell holds {@code initial} with 3He and the CN
 * isotopes at their local equilibrium for its trial state ({@link NuclearNetwork#equilibrium}; common practice for
 * zero-age models, no single source; the network's own papers are named in its implementations). Its burning slopes
 * along that equilibrium are the network's analytic ones ({@link NuclearNetwork#equilibriumEnergy}) where the
 * structure burns with the same network; otherwise, or where the network has none, the caller differences.
 *
 * @param network the network whose equilibrium the shells hold
 * @param initial the composition the equilibrium is relaxed from
 */
record LocalEquilibriumComposition(NuclearNetwork network, Composition initial) implements ShellComposition {

    @Override
    public Composition at(int shell, double density, double temperature) {
        return network.equilibrium(density, temperature, initial);
    }

    @Override
    public Composition atWithBurning(int shell, double density, double temperature, NuclearNetwork burning,
                                     double[] into) {
        return burning == network ? network.equilibriumEnergy(density, temperature, initial, into) : null;
    }
}
