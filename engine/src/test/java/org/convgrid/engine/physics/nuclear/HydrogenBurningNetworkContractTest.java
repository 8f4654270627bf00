package org.convgrid.engine.physics.nuclear;

/** The {@link NuclearNetworkContractTest} for the default network. */
class HydrogenBurningNetworkContractTest extends NuclearNetworkContractTest {

    private static final HydrogenBurningNetwork NETWORK = new HydrogenBurningNetwork();

    @Override
    NuclearNetwork network() {
        return NETWORK;
    }
}
