package org.convgrid.engine.state;

import java.util.List;

/**
 * The relative abundances of the metals (everything heavier than helium), scaled with the total metallicity Z.
 *
 * <p>The default is the Grevesse &amp; Sauval 1998 (Space Sci. Rev. 85, 161) photospheric mixture; the
 * log-abundances of the thirteen most abundant metals are from memory and are checked in the tests against the
 * published present-day Z/X = 0.0231 of that mixture (Asplund, Amarsi &amp; Grevesse 2021, A&amp;A 653, A141,
 * Table 4). Elements not listed are negligible for the equation of state, opacity and nuclear rates used here.
 */
public final class MetalMixture {

    /** Grevesse &amp; Sauval 1998 photospheric log-abundances (from memory; see the class comment). */
    public static final MetalMixture GS98 = new MetalMixture(List.of(
            new Element("C", 6, 12.011, 8.52),
            new Element("N", 7, 14.007, 7.92),
            new Element("O", 8, 15.999, 8.83),
            new Element("Ne", 10, 20.180, 8.08),
            new Element("Na", 11, 22.990, 6.33),
            new Element("Mg", 12, 24.305, 7.58),
            new Element("Al", 13, 26.982, 6.47),
            new Element("Si", 14, 28.085, 7.55),
            new Element("S", 16, 32.06, 7.33),
            new Element("Ar", 18, 39.948, 6.40),
            new Element("Ca", 20, 40.078, 6.36),
            new Element("Fe", 26, 55.845, 7.50),
            new Element("Ni", 28, 58.693, 6.25)));

    private final List<Element> elements;
    private final double[] massFractionsOfZ;

    public MetalMixture(List<Element> elements) {
        this.elements = List.copyOf(elements);
        this.massFractionsOfZ = new double[elements.size()];
        double total = 0.0;
        for (int i = 0; i < elements.size(); i++) {
            Element e = elements.get(i);
            massFractionsOfZ[i] = Math.pow(10.0, e.logAbundance() - 12.0) * e.massAmu();
            total += massFractionsOfZ[i];
        }
        for (int i = 0; i < massFractionsOfZ.length; i++) {
            massFractionsOfZ[i] /= total;
        }
    }

    public List<Element> elements() {
        return elements;
    }

    /** Mass fraction of element {@code index} within the metals (the fractions sum to one). */
    public double massFractionOfZ(int index) {
        return massFractionsOfZ[index];
    }

    /** Mass fraction within the metals of the element with this symbol; 0 when absent. */
    public double massFractionOfZ(String symbol) {
        for (int i = 0; i < elements.size(); i++) {
            if (elements.get(i).symbol().equals(symbol)) {
                return massFractionsOfZ[i];
            }
        }
        return 0.0;
    }

    /** Metal-to-hydrogen mass ratio Z/X implied by the log-abundances (hydrogen at 12, atomic mass 1.00794). */
    public double metalToHydrogenMassRatio() {
        double metals = 0.0;
        for (Element e : elements) {
            metals += Math.pow(10.0, e.logAbundance() - 12.0) * e.massAmu();
        }
        return metals / 1.00794;
    }
}
