package org.convgrid.benchmarks;

import org.convgrid.engine.physics.nuclear.NuclearNetwork;
import org.convgrid.engine.state.Composition;

/**
 * The (rho, T, X, Z) points the microphysics benchmarks time, by the name their {@code point} parameter gives: the
 * Sun's centre (a standard solar model's, from memory), the base of its convective envelope, an M dwarf's centre and
 * a K dwarf's photosphere.
 *
 * @param density g cm^-3
 * @param temperature K
 * @param x hydrogen mass fraction
 * @param z metal mass fraction
 */
record BenchmarkPoint(double density, double temperature, double x, double z) {

    static BenchmarkPoint named(String name) {
        return switch (name) {
            case "centre_sun" -> new BenchmarkPoint(152.9, 1.567e7, 0.346, 0.0188);
            case "envelope_sun" -> new BenchmarkPoint(0.19, 2.2e6, 0.70, 0.0188);
            case "centre_m_dwarf" -> new BenchmarkPoint(300.0, 6.0e6, 0.70, 0.0188);
            case "photosphere_k_dwarf" -> new BenchmarkPoint(3e-7, 5000.0, 0.70, 0.0188);
            default -> throw new IllegalArgumentException("no benchmark point named " + name);
        };
    }

    /** The point's scaled-solar mix with the CNO nuclei at {@code nuclear}'s equilibrium at its (rho, T). */
    Composition composition(NuclearNetwork nuclear) {
        return nuclear.equilibrium(density, temperature, Composition.scaledSolar(x, z));
    }
}
