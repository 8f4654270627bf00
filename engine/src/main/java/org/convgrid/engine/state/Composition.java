package org.convgrid.engine.state;

import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;

/**
 * Mass fractions of the species the engine follows. Carbon, nitrogen and oxygen are carried separately because
 * the CNO cycle reshuffles them; the other metals keep the proportions of the {@link MetalMixture}. Deuterium and
 * 7Li are trace species that only pre-main-sequence burning changes (their initial values: {@link BirthAbundances});
 * deuterium counts as hydrogen in {@link #x()}, 7Li as a metal in {@link #z()}. A composition made without them
 * (the seven-fraction constructor, {@link #scaledSolar}) has none, as a zero-age main-sequence star has burnt its
 * deuterium and is described here without its lithium.
 *
 * @param h1 hydrogen
 * @param he3 helium-3
 * @param he4 helium-4
 * @param c12 carbon (all isotopes, counted as 12C)
 * @param n14 nitrogen (all isotopes, counted as 14N)
 * @param o16 oxygen (all isotopes, counted as 16O)
 * @param otherMetals every other metal, in the proportions of the mixture
 * @param h2 deuterium
 * @param li7 lithium-7
 */
public record Composition(double h1, double he3, double he4, double c12, double n14, double o16,
                          double otherMetals, double h2, double li7) {

    /** Largest allowed |sum of mass fractions - 1|. */
    public static final double SUM_TOLERANCE = 1.0e-8;

    public Composition {
        // no array of the nine: compositions are made at every point of every composition step, where the JIT
        // did not always inline this constructor, and an array handed to the message escaped
        if (!(fraction(h1) && fraction(he3) && fraction(he4) && fraction(c12) && fraction(n14) && fraction(o16)
                && fraction(otherMetals) && fraction(h2) && fraction(li7))) {
            double[] parts = {h1, he3, he4, c12, n14, o16, otherMetals, h2, li7};
            for (double p : parts) {
                if (!fraction(p)) {
                    throw new ConvgridException(ErrorKind.BAD_COMPOSITION,
                            "mass fractions must lie in [0, 1], got " + java.util.Arrays.toString(parts), p);
                }
            }
        }
        double sum = h1 + he3 + he4 + c12 + n14 + o16 + otherMetals + h2 + li7;
        if (Math.abs(sum - 1.0) > SUM_TOLERANCE) {
            throw new ConvgridException(ErrorKind.BAD_COMPOSITION,
                    "mass fractions sum to " + sum + ", not 1", sum);
        }
    }

    private static boolean fraction(double p) {
        return p >= 0.0 && p <= 1.0;
    }

    /** A composition without deuterium and 7Li. */
    public Composition(double h1, double he3, double he4, double c12, double n14, double o16, double otherMetals) {
        this(h1, he3, he4, c12, n14, o16, otherMetals, 0.0, 0.0);
    }

    /**
     * Hydrogen X, metals Z, helium Y = 1 - X - Z all as 4He, metals in the scaled-solar mixture.
     *
     * @throws ConvgridException BAD_COMPOSITION when X or Z is negative or X + Z &gt; 1
     */
    public static Composition scaledSolar(double x, double z) {
        return scaled(x, z, MetalMixture.GS98);
    }

    /** Hydrogen X, metals Z in the given mixture, helium 1 - X - Z. */
    public static Composition scaled(double x, double z, MetalMixture mixture) {
        if (!(x >= 0.0 && z >= 0.0 && x + z <= 1.0)) {
            throw new ConvgridException(ErrorKind.BAD_COMPOSITION,
                    String.format("need X >= 0, Z >= 0 and X + Z <= 1, got X = %s, Z = %s", x, z), x, z);
        }
        double c = z * mixture.massFractionOfZ("C");
        double n = z * mixture.massFractionOfZ("N");
        double o = z * mixture.massFractionOfZ("O");
        double y = Math.max(0.0, 1.0 - x - z);
        return new Composition(x, 0.0, y, c, n, o, Math.max(0.0, z - c - n - o));
    }

    /** Hydrogen mass fraction X (1H + deuterium). */
    public double x() {
        return h1 + h2;
    }

    /** Helium mass fraction Y (3He + 4He). */
    public double y() {
        return he3 + he4;
    }

    /** Metal mass fraction Z (7Li included). */
    public double z() {
        return c12 + n14 + o16 + otherMetals + li7;
    }

    /** Carbon + nitrogen + oxygen mass fraction. */
    public double cno() {
        return c12 + n14 + o16;
    }

    public Composition withHydrogenAndHelium(double newH1, double newHe3, double newHe4) {
        return new Composition(newH1, newHe3, newHe4, c12, n14, o16, otherMetals, h2, li7);
    }

    public Composition withCno(double newC12, double newN14, double newO16) {
        return new Composition(h1, he3, he4, newC12, newN14, newO16, otherMetals, h2, li7);
    }

    /** The same composition with these deuterium and 7Li fractions, 1H and the other metals paying for them. */
    public Composition withTraceSpecies(double newH2, double newLi7) {
        return new Composition(h1 + h2 - newH2, he3, he4, c12, n14, o16, otherMetals + li7 - newLi7, newH2, newLi7);
    }
}
