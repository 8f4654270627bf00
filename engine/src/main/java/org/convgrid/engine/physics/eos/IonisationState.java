package org.convgrid.engine.physics.eos;

/**
 * Ionisation equilibrium at one point of {@link StellarPlasmaEos}, for diagnostics and tests.
 *
 * @param eta electron degeneracy parameter, chemical potential over kT
 * @param hydrogenIonised fraction of hydrogen that is ionised
 * @param heliumSingly fraction of helium in He+
 * @param heliumDoubly fraction of helium in He++
 * @param electronsPerBaryon free electrons per atomic mass unit
 */
public record IonisationState(double eta, double hydrogenIonised, double heliumSingly, double heliumDoubly,
                              double electronsPerBaryon) {
}
