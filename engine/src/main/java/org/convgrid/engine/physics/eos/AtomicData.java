package org.convgrid.engine.physics.eos;

import java.util.Map;

/**
 * Atomic data of the metals: first ionisation potential (eV, NIST Atomic Spectra Database
 * values, from memory) and the statistical weights of the ground terms of the neutral atom and of the singly
 * charged ion, (2S+1)(2L+1) (from memory; the fine-structure levels of these terms are populated at the
 * temperatures where these atoms ionise).
 *
 * @param firstPotential eV
 * @param neutralWeight ground-term weight of the atom
 * @param ionWeight ground-term weight of the singly charged ion
 */
record AtomicData(double firstPotential, double neutralWeight, double ionWeight) {

    /** Hydrogen ionisation potential, eV (NIST Atomic Spectra Database, from memory). */
    static final double HYDROGEN = 13.5984;
    /** Helium first and second ionisation potentials, eV (NIST, from memory). */
    static final double HELIUM_FIRST = 24.5874;
    static final double HELIUM_SECOND = 54.4178;
    /** Rydberg energy, eV (CODATA 2018: 13.605693 eV, from memory). */
    static final double RYDBERG = 13.605693;
    /** Bohr radius, cm (CODATA 2018: 5.29177e-9 cm). */
    static final double BOHR_RADIUS = 5.29177210903e-9;
    /**
     * Thomas-Fermi total binding energy of a neutral atom, E = 0.7687 Z^(7/3) hartree = 20.92 Z^(7/3) eV (Landau &amp;
     * Lifshitz, Quantum Mechanics, par. 70; from memory). Overestimates light atoms by ~30 %.
     */
    static final double THOMAS_FERMI = 0.7687 * 2.0 * RYDBERG;

    private static final Map<String, AtomicData> METALS = Map.ofEntries(
            Map.entry("C", new AtomicData(11.2603, 9, 6)),
            Map.entry("N", new AtomicData(14.5341, 4, 9)),
            Map.entry("O", new AtomicData(13.6181, 9, 4)),
            Map.entry("Ne", new AtomicData(21.5645, 1, 6)),
            Map.entry("Na", new AtomicData(5.1391, 2, 1)),
            Map.entry("Mg", new AtomicData(7.6462, 1, 2)),
            Map.entry("Al", new AtomicData(5.9858, 6, 1)),
            Map.entry("Si", new AtomicData(8.1517, 9, 6)),
            Map.entry("S", new AtomicData(10.3600, 9, 4)),
            Map.entry("Ar", new AtomicData(15.7596, 1, 6)),
            Map.entry("Ca", new AtomicData(6.1132, 1, 2)),
            Map.entry("Fe", new AtomicData(7.9024, 25, 30)),
            Map.entry("Ni", new AtomicData(7.6399, 21, 10)));

    /** Data for a metal, or null when the element is not tabulated. */
    static AtomicData metal(String symbol) {
        return METALS.get(symbol);
    }
}
