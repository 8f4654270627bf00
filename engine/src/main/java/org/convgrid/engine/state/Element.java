package org.convgrid.engine.state;

/**
 * A chemical element of the metal mixture.
 *
 * @param symbol chemical symbol
 * @param charge nuclear charge Z
 * @param massAmu mean atomic mass, atomic mass units
 * @param logAbundance abundance on the astronomical scale, log10(n/n_H) + 12
 */
public record Element(String symbol, int charge, double massAmu, double logAbundance) {
}
