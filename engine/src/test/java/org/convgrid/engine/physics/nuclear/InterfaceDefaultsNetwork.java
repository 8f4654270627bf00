package org.convgrid.engine.physics.nuclear;

import org.convgrid.engine.state.Composition;

/**
 * Test fixture: a network's {@link NuclearNetwork#burn} and {@link NuclearNetwork#equilibrium} behind a wrapper that
 * overrides nothing else, so every other method takes the interface's default (no rate factors, the light-element
 * captures divided out of burn's rates): the path a network without those overrides takes.
 */
public final class InterfaceDefaultsNetwork implements NuclearNetwork {

    private final NuclearNetwork wrapped;

    public InterfaceDefaultsNetwork(NuclearNetwork wrapped) {
        this.wrapped = wrapped;
    }

    @Override
    public BurningRate burn(double density, double temperature, Composition composition) {
        return wrapped.burn(density, temperature, composition);
    }

    @Override
    public Composition equilibrium(double density, double temperature, Composition composition) {
        return wrapped.equilibrium(density, temperature, composition);
    }
}
