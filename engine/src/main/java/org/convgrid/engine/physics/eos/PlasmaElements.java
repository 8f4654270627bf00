package org.convgrid.engine.physics.eos;

import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;
import org.convgrid.engine.state.Composition;
import org.convgrid.engine.state.Element;
import org.convgrid.engine.state.MetalMixture;
import org.convgrid.engine.units.Constants;

/**
 * The ionisation model of {@link StellarPlasmaEos}, fixed per metal mixture: energies (erg), statistical-weight
 * ratios and excluded volumes (cm^3) of every bound state.
 *
 * <p>Metals: the first ionisation follows Saha with the atomic data of {@link AtomicData}; the remaining Z - 1
 * electrons of each metal are lumped into independent two-state sites with one mean binding energy,
 * (E_TF - chi_1)/(Z - 1), E_TF the Thomas-Fermi total binding energy. This is a cheap, thermodynamically
 * consistent way to make metals fully ionised at high temperature; it places their inner-shell ionisation only
 * roughly (metals supply ~1 % of the electrons there).
 *
 * <p>Excluded volumes: a bound state whose electron is bound by chi with net core charge z is given the hydrogenic
 * mean radius r = (3/2) a_0 z Ry/chi (for hydrogenic levels chi = z^2 Ry/n^2 and mean radius (3/2) n^2 a_0/z;
 * Bethe &amp; Salpeter 1957) and the volume (4 pi/3) r^3; see {@link StellarPlasmaEos} for how it enters.
 */
final class PlasmaElements {

    final double hydrogenChi = AtomicData.HYDROGEN * Constants.EV;
    final double heliumChi0 = AtomicData.HELIUM_FIRST * Constants.EV;
    final double heliumChi1 = AtomicData.HELIUM_SECOND * Constants.EV;
    final double hydrogenVolume = volume(1, AtomicData.HYDROGEN);
    final double heliumVolume0 = volume(1, AtomicData.HELIUM_FIRST);
    final double heliumVolume1 = volume(2, AtomicData.HELIUM_SECOND);

    /** Metals: C, N, O first (from their own mass fractions), then the other metals of the mixture. */
    final int metalCount;
    final int[] charge;
    final double[] firstChi;
    final double[] lnWeightRatio;
    final double[] neutralVolume;
    final double[] innerChi;
    final double[] innerVolume;
    private final Nuclides nuclides;

    PlasmaElements(MetalMixture mixture) {
        nuclides = new Nuclides(mixture);
        metalCount = 3 + nuclides.otherCount();
        charge = new int[metalCount];
        firstChi = new double[metalCount];
        lnWeightRatio = new double[metalCount];
        neutralVolume = new double[metalCount];
        innerChi = new double[metalCount];
        innerVolume = new double[metalCount];
        String[] cno = {"C", "N", "O"};
        int[] cnoCharge = {6, 7, 8};
        for (int m = 0; m < metalCount; m++) {
            String symbol = m < 3 ? cno[m] : nuclides.other(m - 3).symbol();
            int z = m < 3 ? cnoCharge[m] : nuclides.other(m - 3).charge();
            AtomicData data = AtomicData.metal(symbol);
            if (data == null) {
                throw new ConvgridException(ErrorKind.BAD_DATA, "no ionisation data for metal " + symbol, symbol);
            }
            charge[m] = z;
            firstChi[m] = data.firstPotential() * Constants.EV;
            lnWeightRatio[m] = Math.log(data.ionWeight() / data.neutralWeight());
            neutralVolume[m] = volume(1, data.firstPotential());
            double inner = (AtomicData.THOMAS_FERMI * Math.pow(z, 7.0 / 3.0) - data.firstPotential()) / (z - 1);
            innerChi[m] = inner * Constants.EV;
            innerVolume[m] = volume(0.5 * (z + 1), inner);
        }
    }

    /** Fills {@code out[0..1]} with H and He and {@code out[2..]} with the metals, particles per u. */
    void abundances(Composition c, double[] out) {
        out[0] = Nuclides.hydrogen(c);
        out[1] = Nuclides.helium(c);
        out[2] = c.c12() / Nuclides.MASS_C12_AMU;
        out[3] = c.n14() / Nuclides.MASS_N14_AMU;
        out[4] = c.o16() / Nuclides.MASS_O16_AMU;
        for (int i = 0; i < nuclides.otherCount(); i++) {
            out[5 + i] = nuclides.otherAbundance(i, c);
        }
    }

    double electronsFullyIonised(Composition c) {
        return nuclides.electronsFullyIonised(c);
    }

    private static double volume(double coreCharge, double potential) {
        double r = 1.5 * AtomicData.BOHR_RADIUS * coreCharge * AtomicData.RYDBERG / potential;
        return 4.0 * Math.PI / 3.0 * r * r * r;
    }
}
