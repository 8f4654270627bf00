package org.convgrid.engine.structure;

import org.convgrid.engine.error.ConvgridException;
import org.convgrid.engine.error.ErrorKind;
import org.convgrid.engine.state.Composition;

/**
 * The state the structure equations solve for, on a mass mesh: ln r, ln rho, ln T and L at every point, with
 * the composition of every shell (fixed during a structure solve). Used both as a starting guess and as a
 * solution. Immutable: arrays are copied in and out.
 */
public final class ModelState {

    private final MassMesh mesh;
    private final Composition[] composition;
    private final double[] lnRadius;
    private final double[] lnDensity;
    private final double[] lnTemperature;
    private final double[] luminosity;

    /**
     * @param mesh the mass coordinates
     * @param composition per point
     * @param lnRadius ln r, r in cm
     * @param lnDensity ln rho, rho in g cm^-3
     * @param lnTemperature ln T, T in K
     * @param luminosity L, erg s^-1
     */
    public ModelState(MassMesh mesh, Composition[] composition, double[] lnRadius, double[] lnDensity,
                      double[] lnTemperature, double[] luminosity) {
        int n = mesh.size();
        if (composition.length != n || lnRadius.length != n || lnDensity.length != n || lnTemperature.length != n
                || luminosity.length != n) {
            throw new ConvgridException(ErrorKind.BAD_DATA, "model arrays must all have the mesh size " + n, n);
        }
        this.mesh = mesh;
        this.composition = composition.clone();
        this.lnRadius = lnRadius.clone();
        this.lnDensity = lnDensity.clone();
        this.lnTemperature = lnTemperature.clone();
        this.luminosity = luminosity.clone();
    }

    public MassMesh mesh() {
        return mesh;
    }

    public int size() {
        return mesh.size();
    }

    public Composition composition(int k) {
        return composition[k];
    }

    public Composition[] compositions() {
        return composition.clone();
    }

    public double lnRadius(int k) {
        return lnRadius[k];
    }

    public double lnDensity(int k) {
        return lnDensity[k];
    }

    public double lnTemperature(int k) {
        return lnTemperature[k];
    }

    /** L at point k, erg s^-1. */
    public double luminosity(int k) {
        return luminosity[k];
    }

    /** Surface luminosity, erg s^-1. */
    public double surfaceLuminosity() {
        return luminosity[size() - 1];
    }

    /** Radius of the fitting point, cm. */
    public double radius() {
        return Math.exp(lnRadius[size() - 1]);
    }

    public double[] lnRadii() {
        return lnRadius.clone();
    }

    public double[] lnDensities() {
        return lnDensity.clone();
    }

    public double[] lnTemperatures() {
        return lnTemperature.clone();
    }

    public double[] luminosities() {
        return luminosity.clone();
    }

    /** The same structure with another composition per shell. */
    public ModelState withCompositions(Composition[] newComposition) {
        return new ModelState(mesh, newComposition, lnRadius, lnDensity, lnTemperature, luminosity);
    }
}
